// Ground: the slope figures from the farm's elevation model when one covers the field, and
// the typed slope (all of it without a model; only the slope length with one).
import { Notice } from '../../../components/ui/notice';
import type { Units } from '../../../../shared/schemas/auth';
import type { FieldFeature } from '../../../../shared/schemas/field';
import { GroundPanel } from '../../seasons/components/ground-form';
import { isNoTerrain, isTerrainPending, useFieldTerrain } from '../../terrain/api/get-field-terrain';
import { FieldTerrainFigures } from '../../terrain/components/field-terrain-figures';

export function GroundTab({ field, canEdit, units }: { field: FieldFeature; canEdit: boolean; units: Units }) {
  const terrain = useFieldTerrain({ id: field.id, version: field.properties.version });
  const hasTerrain = terrain.isSuccess;
  const noTerrain = terrain.isError && isNoTerrain(terrain.error);
  return (
    <section className="flex max-w-3xl flex-col gap-4" data-testid="ground-tab" aria-label="Ground">
      {hasTerrain ? (
        <div>
          <FieldTerrainFigures fieldId={field.id} fieldVersion={field.properties.version} farmId={field.properties.farmId} units={units} />
          <p className="mt-2 text-sm text-ink-soft">
            The risk uses the mean LS of these cells; a typed slope % is not needed while the elevation model covers the field.
          </p>
        </div>
      ) : terrain.isPending ? (
        <p className="text-sm text-ink-soft">Looking for the elevation model's figures…</p>
      ) : noTerrain ? null : isTerrainPending(terrain.error) ? (
        <p className="text-sm text-ink-soft">The slope figures are being worked out from the elevation model…</p>
      ) : (
        <Notice tone="error">{terrain.error?.message}</Notice>
      )}
      {!terrain.isPending ? <GroundPanel fieldId={field.id} hasTerrain={hasTerrain} canEdit={canEdit} units={units} /> : null}
      {!canEdit ? <p className="text-sm text-ink-soft">You can read the ground figures; the farmer and the advisor change them.</p> : null}
    </section>
  );
}
