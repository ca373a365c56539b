// The selected field: name (renamed in place by a farmer), area, perimeter, centre, overlaps.
import { lazy, Suspense, useState, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { Loading } from '../../../components/ui/spinner';
import { formatArea, formatLength } from '../../../lib/units';
import type { Units } from '../../../../shared/schemas/auth';
import type { FieldFeature } from '../../../../shared/schemas/field';
import { useDeleteField } from '../api/delete-field';
import { fieldEditErrorMessage } from './conflict-message';
import { OpenFieldLink } from '../../field-screen/components/open-field-link';

// The form's libraries (react-hook-form, zod) load when a person first renames a field, not with the map.
const RenameFieldForm = lazy(() => import('./rename-field-form').then((m) => ({ default: m.RenameFieldForm })));

type Props = {
  field: FieldFeature;
  units: Units;
  canEdit: boolean;
  onClose: () => void;
  onDeleted: () => void;
  /** More about the field from other features (terrain figures), under the outline facts. */
  children?: ReactNode;
};

const formatCentre = ([lng, lat]: [number, number]) =>
  `${Math.abs(lat).toFixed(5)}° ${lat >= 0 ? 'N' : 'S'}, ${Math.abs(lng).toFixed(5)}° ${lng >= 0 ? 'E' : 'W'}`;

export function FieldDetails({ field, units, canEdit, onClose, onDeleted, children }: Props) {
  const [renaming, setRenaming] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const deleteField = useDeleteField(field.properties.farmId);
  const p = field.properties;

  return (
    <section aria-labelledby="field-details-heading" data-testid="field-details" className="rounded-md border border-clay bg-white/60 p-3">
      <div className="flex items-start justify-between gap-2">
        <p className="text-xs font-semibold uppercase tracking-wide text-clay-dark">Field</p>
        <Button variant="quiet" size="sm" onClick={onClose}>
          Close
        </Button>
      </div>
      {renaming ? (
        <Suspense fallback={<Loading label="Opening the form…" />}>
          <RenameFieldForm key={field.id} field={field} onDone={() => setRenaming(false)} />
        </Suspense>
      ) : (
        <div className="flex flex-wrap items-center gap-2">
          <h2 id="field-details-heading" className="text-xl font-semibold" data-testid="field-details-name">
            {p.name}
          </h2>
          {canEdit ? (
            <Button variant="secondary" size="sm" onClick={() => setRenaming(true)}>
              Rename
            </Button>
          ) : null}
        </div>
      )}
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-soft">Area</dt>
        <dd className="num" data-testid="field-details-area">{formatArea(p.areaHa, units)}</dd>
        <dt className="text-ink-soft">Perimeter</dt>
        <dd className="num" data-testid="field-details-perimeter">{formatLength(p.perimeterM, units)}</dd>
        {p.centroid ? (
          <>
            <dt className="text-ink-soft">Centre</dt>
            <dd className="num">{formatCentre(p.centroid)}</dd>
          </>
        ) : null}
      </dl>
      <OpenFieldLink farmId={p.farmId} fieldId={field.id} className="mt-2 text-sm" />
      {p.overlaps.length > 0 ? (
        <Notice tone="caution" title="Overlaps other fields" className="mt-2">
          <ul className="list-inside list-disc">
            {p.overlaps.map((o) => (
              <li key={o.fieldId}>
                {o.name}: <span className="num">{formatArea(o.areaHa, units)}</span> shared
              </li>
            ))}
          </ul>
          <p className="mt-1">Redraw one of the outlines so that each piece of ground is counted once.</p>
        </Notice>
      ) : null}
      {children}
      {canEdit ? (
        <div className="mt-3 flex flex-col gap-2 border-t border-paper-edge pt-2">
          {confirmDelete ? (
            <div className="flex flex-wrap items-center gap-2">
              <span className="text-sm">Delete {p.name} for good?</span>
              <Button
                variant="danger"
                size="sm"
                disabled={deleteField.isPending}
                onClick={() => deleteField.mutate(field.id, { onSuccess: onDeleted })}
              >
                {deleteField.isPending ? 'Deleting…' : 'Yes, delete the field'}
              </Button>
              <Button variant="secondary" size="sm" onClick={() => setConfirmDelete(false)}>
                Keep it
              </Button>
            </div>
          ) : (
            <Button variant="danger" size="sm" className="self-start" onClick={() => setConfirmDelete(true)}>
              Delete field
            </Button>
          )}
          {deleteField.isError ? <Notice tone="error">{fieldEditErrorMessage(deleteField.error, 'deletion')}</Notice> : null}
        </div>
      ) : null}
    </section>
  );
}
