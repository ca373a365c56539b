// Rename a field in place. Sends the version that was read; a 409 reloads the field and says so.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { FieldName, type FieldFeature } from '../../../../shared/schemas/field';
import { useUpdateField } from '../api/update-field';
import { fieldEditErrorMessage } from './conflict-message';

const RenameForm = z.object({ name: FieldName });

export function RenameFieldForm({ field, onDone }: { field: FieldFeature; onDone: () => void }) {
  const updateField = useUpdateField(field.properties.farmId);
  const form = useForm<z.input<typeof RenameForm>, unknown, z.output<typeof RenameForm>>({
    resolver: zodResolver(RenameForm),
    defaultValues: { name: field.properties.name },
  });

  return (
    <form
      noValidate
      aria-label={`Rename ${field.properties.name}`}
      className="flex flex-col gap-2"
      onSubmit={form.handleSubmit(({ name }) => {
        if (name === field.properties.name) return onDone();
        updateField.mutate(
          // The version of the field as shown now (it follows the cache after a conflict).
          { fieldId: field.id, input: { version: field.properties.version, name } },
          { onSuccess: onDone },
        );
      })}
    >
      <TextField
        label="Field name"
        autoFocus
        data-testid="rename-input"
        error={form.formState.errors.name?.message ?? (updateField.error ? fieldEditErrorMessage(updateField.error, 'new name') : undefined)}
        onKeyDown={(e) => e.key === 'Escape' && onDone()}
        {...form.register('name')}
      />
      <div className="flex gap-2">
        <Button type="submit" size="sm" disabled={updateField.isPending}>
          {updateField.isPending ? 'Saving…' : 'Save name'}
        </Button>
        <Button variant="secondary" size="sm" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
