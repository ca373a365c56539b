// The second step of an import: the file's features on a small map and in a list, the attribute
// their names come from, a tick box each. Nothing is stored until "Import" is pressed.
import { lazy, Suspense, useMemo, useState } from 'react';
import type { Units } from '../../../../shared/schemas/auth';
import type { FieldFeature } from '../../../../shared/schemas/field';
import type { ImportOptions, ImportPreview } from '../../../../shared/schemas/field-import';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { ImportPreviewList } from './import-preview-list';
import { isDuplicate, isRepaired } from './import-warning-words';

const ImportPreviewMap = lazy(() => import('./import-preview-map'));

type Props = {
  preview: ImportPreview;
  existing: FieldFeature[];
  units: Units;
  pending: boolean;
  onConfirm: (options: ImportOptions) => void;
};

/** Ticked at first: every feature that can be imported, is not already on the farm and was not repaired. */
const firstTicked = (preview: ImportPreview) =>
  new Set(preview.features.filter((f) => f.geometry && !isDuplicate(f) && !isRepaired(f)).map((f) => f.index));

export function ImportPreviewStep({ preview, existing, units, pending, onConfirm }: Props) {
  const [nameAttribute, setNameAttribute] = useState<string | null>(preview.proposedNameAttribute);
  const [ticked, setTicked] = useState<ReadonlySet<number>>(() => firstTicked(preview));
  const [focusIndex, setFocusIndex] = useState<number | null>(null);
  const importable = preview.features.filter((f) => f.geometry !== null);

  const tick = (index: number, on: boolean) =>
    setTicked((old) => {
      const next = new Set(old);
      if (on) next.add(index);
      else next.delete(index);
      return next;
    });

  const chosen = useMemo(() => preview.features.filter((f) => ticked.has(f.index)), [preview.features, ticked]);
  const confirm = () =>
    onConfirm({
      nameAttribute,
      indexes: chosen.map((f) => f.index),
      acceptRepaired: chosen.some(isRepaired),
      allowDuplicates: chosen.some(isDuplicate),
    });

  return (
    <div className="flex flex-col gap-3" data-testid="import-preview">
      <p className="text-sm">
        The file holds <span className="num">{preview.features.length}</span>{' '}
        {preview.features.length === 1 ? 'feature' : 'features'}
        {importable.length < preview.features.length ? (
          <>
            , of which <span className="num">{importable.length}</span> can become fields
          </>
        ) : null}
        . Tick the ones to import; nothing is stored until you press Import.
      </p>
      <div className="h-56 overflow-hidden rounded-md border border-paper-edge sm:h-64" data-testid="import-preview-map">
        <Suspense fallback={<p className="p-3 text-sm text-ink-soft">Loading the map…</p>}>
          <ImportPreviewMap
            features={preview.features}
            ticked={ticked}
            focusIndex={focusIndex}
            existing={existing}
          />
        </Suspense>
      </div>
      <SelectField
        label="Name the fields from"
        value={nameAttribute ?? ''}
        onChange={(e) => setNameAttribute(e.target.value || null)}
        data-testid="import-name-attribute"
        hint={preview.attributeKeys.length ? 'An attribute of the file; fields without a value are numbered.' : 'The file has no attributes, so the fields are numbered.'}
      >
        {preview.attributeKeys.map((key) => (
          <option key={key} value={key}>
            {key}
          </option>
        ))}
        <option value="">No name: number them</option>
      </SelectField>
      <div className="max-h-72 overflow-auto rounded-md border border-paper-edge bg-white/40 px-3">
        <ImportPreviewList
          features={preview.features}
          nameAttribute={nameAttribute}
          ticked={ticked}
          units={units}
          onTick={tick}
          onShow={setFocusIndex}
        />
      </div>
      <div className="sticky bottom-0 -mx-1 flex flex-wrap items-center justify-end gap-2 bg-paper px-1 py-2">
        <Button data-testid="import-confirm" disabled={pending || chosen.length === 0} onClick={confirm}>
          {pending ? 'Importing…' : chosen.length === 0 ? 'Tick a feature to import' : `Import ${chosen.length} ${chosen.length === 1 ? 'field' : 'fields'}`}
        </Button>
      </div>
    </div>
  );
}
