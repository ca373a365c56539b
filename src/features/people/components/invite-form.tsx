// Invite someone by e-mail with a role; a landowner with the fields that are theirs.
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { ChoiceGroup } from '../../../components/ui/choice-group';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { InvitationCreate } from '../../../../shared/schemas/people';
import { useInvitePerson } from '../api/invite-person';
import { FieldChecklist, type FieldChoice } from './field-checklist';
import { ROLE_CHOICES } from './role-words';

type Input = z.input<typeof InvitationCreate>;

export function InviteForm({ farmId, fields }: { farmId: number; fields: FieldChoice[] }) {
  const invite = useInvitePerson(farmId);
  const form = useForm<Input, unknown, z.output<typeof InvitationCreate>>({
    resolver: zodResolver(InvitationCreate),
    defaultValues: { email: '', role: 'advisor', fieldIds: [] },
  });
  const role = form.watch('role');
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) =>
    invite.mutate(
      { ...values, fieldIds: values.role === 'landowner' ? values.fieldIds : undefined },
      { onSuccess: () => form.reset({ email: '', role: values.role, fieldIds: [] }) },
    ),
  );

  return (
    <form noValidate aria-label="Invite someone" onSubmit={submit} className="flex flex-col gap-3 rounded-lg border border-paper-edge bg-white/50 p-4">
      <h2 className="text-lg font-semibold">Invite someone</h2>
      <TextField label="Their e-mail" type="email" autoComplete="off" data-testid="invite-email" error={errors.email?.message} {...form.register('email')} />
      <ChoiceGroup label="Role on this farm" choices={ROLE_CHOICES} inputProps={form.register('role')} testId="invite-role" />
      <p className="text-sm text-ink-soft">{ROLE_CHOICES.find((r) => r.value === role)?.hint}</p>
      {role === 'landowner' ? (
        <Controller
          control={form.control}
          name="fieldIds"
          render={({ field }) => <FieldChecklist fields={fields} value={field.value ?? []} onChange={field.onChange} error={errors.fieldIds?.message} testId="invite-fields" />}
        />
      ) : null}
      {invite.isError ? <Notice tone="error">{invite.error.message}</Notice> : null}
      {invite.isSuccess ? (
        <Notice testId="invite-sent">
          An invitation is on its way to {invite.data.email}. The link works once, for seven days.
        </Notice>
      ) : null}
      <div>
        <Button type="submit" data-testid="invite-send" disabled={invite.isPending}>
          {invite.isPending ? 'Sending…' : 'Send the invitation'}
        </Button>
      </div>
    </form>
  );
}
