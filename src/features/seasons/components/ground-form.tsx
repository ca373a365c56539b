// Typed ground of a field: slope % and slope length m, and whether it is drained and how deep
// the drains keep the water table. Without an elevation model slope and length are needed; with
// one, the model gives the slope and LS, and the typed length only limits what a support
// practice can do. Farmers and advisors edit (version read; 409 shows theirs).
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { LastChange } from '../../../components/last-change';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { formatLength } from '../../../lib/units';
import type { Units } from '../../../../shared/schemas/auth';
import { GroundUpdate } from '../../../../shared/schemas/season';
import { useGround, type GroundRecord } from '../api/get-ground';
import { useUpdateGround } from '../api/update-ground';
import { plainMessage, toNumberOrNull } from '../../../lib/form-values';
import { saveErrorMessage } from './save-error-message';
import { formatSlope } from '../../../lib/quantities';

type Values = z.input<typeof GroundUpdate>;
const num = { setValueAs: toNumberOrNull };

function GroundEditor({ ground, hasTerrain, saving, onSave }: { ground: GroundRecord; hasTerrain: boolean; saving: boolean; onSave: (v: Values) => void }) {
  const form = useForm<Values, unknown, z.output<typeof GroundUpdate>>({
    resolver: zodResolver(GroundUpdate),
    defaultValues: { slopePct: ground.slopePct, slopeLengthM: ground.slopeLengthM, drained: ground.drained, drainedWaterTableDepthCm: ground.drainedWaterTableDepthCm },
  });
  const { register, handleSubmit, formState, control } = form;
  const drained = useWatch({ control, name: 'drained' });
  return (
    <form
      className="flex flex-col gap-3"
      data-testid="ground-form"
      noValidate
      onSubmit={handleSubmit((v) =>
        onSave({ ...v, drainedWaterTableDepthCm: v.drained ? v.drainedWaterTableDepthCm : null, ...(ground.version !== null ? { version: ground.version } : {}) }),
      )}
    >
      <div className="grid gap-3 sm:grid-cols-2">
        {hasTerrain ? null : (
          <TextField
            label="Slope (%)"
            inputMode="decimal"
            className="num"
            hint="The typical steepness where the field loses soil: rise ÷ run × 100."
            error={plainMessage(formState.errors.slopePct?.message)}
            data-testid="ground-slope"
            {...register('slopePct', num)}
          />
        )}
        <TextField
          label={`Slope length (m)${hasTerrain ? ', optional' : ''}`}
          inputMode="decimal"
          className="num"
          hint={
            hasTerrain
              ? 'From where water starts to run to where it slows or reaches a channel; here it limits what contouring and strips can do.'
              : 'From where water starts to run to where it slows or reaches a channel (RUSLE caps it at 305 m).'
          }
          error={plainMessage(formState.errors.slopeLengthM?.message)}
          data-testid="ground-length"
          {...register('slopeLengthM', num)}
        />
      </div>
      <label className="flex items-center gap-2 text-sm font-medium">
        <input type="checkbox" data-testid="ground-drained" {...register('drained')} />
        The field is drained (tile or ditches)
      </label>
      {drained ? (
        <TextField
          label="Depth the drains keep the water table at (cm), optional"
          inputMode="decimal"
          className="num max-w-sm"
          hint="On a soil with a dual group (A/D, B/D, C/D) the first letter counts only from 60 cm down; without a depth the group is taken as D."
          error={plainMessage(formState.errors.drainedWaterTableDepthCm?.message)}
          data-testid="ground-drained-depth"
          {...register('drainedWaterTableDepthCm', num)}
        />
      ) : null}
      <Button type="submit" size="sm" className="self-start" disabled={saving} data-testid="ground-save">
        {saving ? 'Saving…' : 'Save the ground'}
      </Button>
    </form>
  );
}

type Props = { fieldId: number; hasTerrain: boolean; canEdit: boolean; units: Units };

export function GroundPanel({ fieldId, hasTerrain, canEdit, units }: Props) {
  const ground = useGround(fieldId);
  const update = useUpdateGround(fieldId);
  if (ground.isPending) return <p className="text-sm text-ink-soft">Loading the typed slope…</p>;
  if (ground.isError) return <Notice tone="error">{ground.error.message}</Notice>;
  const g = ground.data;

  return (
    <section className="flex flex-col gap-3" data-testid="ground-panel" aria-labelledby="ground-typed-heading">
      <h3 id="ground-typed-heading" className="text-base font-semibold">
        {hasTerrain ? 'Typed slope length and drainage' : 'Typed slope and drainage'}
      </h3>
      {!hasTerrain && (g.slopePct === null || g.slopeLengthM === null) ? (
        <Notice tone="caution" testId="ground-missing">
          No elevation model covers this field: type its slope and slope length so its risk can be worked out.
        </Notice>
      ) : null}
      {canEdit ? (
        <GroundEditor key={g.version ?? 'new'} ground={g} hasTerrain={hasTerrain} saving={update.isPending} onSave={(v) => update.mutate(v)} />
      ) : (
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" data-testid="ground-summary">
          {!hasTerrain ? (
            <>
              <dt className="text-ink-soft">Slope</dt>
              <dd className="num">{g.slopePct === null ? 'not given' : formatSlope(g.slopePct)}</dd>
            </>
          ) : null}
          <dt className="text-ink-soft">Slope length</dt>
          <dd className="num">{g.slopeLengthM === null ? 'not given' : formatLength(g.slopeLengthM, units)}</dd>
          <dt className="text-ink-soft">Drainage</dt>
          <dd className="num">
            {!g.drained ? 'not drained' : g.drainedWaterTableDepthCm === null ? 'drained, water-table depth not given' : `drained, water table kept at ${g.drainedWaterTableDepthCm} cm`}
          </dd>
        </dl>
      )}
      <LastChange change={g.lastChange} testId="ground-last-change" />
      {update.isError ? (
        <Notice tone="error" testId="ground-error">
          {saveErrorMessage(update.error, 'slope')}
        </Notice>
      ) : null}
      {update.isSuccess && !update.isPending ? (
        <p role="status" className="text-sm text-ink-soft">
          Saved. The Risk tab now uses this slope and drainage.
        </p>
      ) : null}
    </section>
  );
}
