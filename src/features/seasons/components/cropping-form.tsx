// The field's cropping for one season: crop, tillage, residue cover (or ground cover for grass),
// a cover crop with its seeding and termination dates, and the support practice. Farmers and
// advisors edit it (react-hook-form + the shared CroppingUpdate schema); a 409 shows the other
// person's record. Cautions sit beside the practice that needs them.
import { useForm, useWatch } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { LastChange } from '../../../components/last-change';
import { Notice } from '../../../components/ui/notice';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { formatLength } from '../../../lib/units';
import { STRIP_ROTATION_WORDS, STRIP_ROTATIONS } from '../../../../shared/erosion';
import type { Units } from '../../../../shared/schemas/auth';
import type { Cropping } from '../../../../shared/schemas/season';
import { useCropping } from '../api/get-cropping';
import { useUpdateCropping } from '../api/update-cropping';
import {
  CROPS,
  croppingResolver,
  formValuesOf,
  isGrass,
  PRACTICE_LABELS,
  PRACTICES,
  TILLAGES,
  type CroppingFormValues,
  type CroppingPayload,
} from './cropping-form-values';
import { plainMessage, toNumberOrNull } from '../../../lib/form-values';
import { saveErrorMessage } from './save-error-message';

export const TERRACE_CAUTION =
  'Terraces need a design to local standards by a qualified person; check for buried utilities before digging.';

const num = { setValueAs: toNumberOrNull };

function CroppingSummary({ cropping, units }: { cropping: Cropping; units: Units }) {
  const grass = isGrass(cropping.crop);
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" data-testid="cropping-summary">
      <dt className="text-ink-soft">Crop</dt>
      <dd>{cropping.crop}</dd>
      {!grass ? (
        <>
          <dt className="text-ink-soft">Tillage</dt>
          <dd>{cropping.tillage ?? 'not given'}</dd>
          <dt className="text-ink-soft">Residue cover</dt>
          <dd className="num">{cropping.residuePct === null ? 'not given' : `${cropping.residuePct} %`}</dd>
        </>
      ) : (
        <>
          <dt className="text-ink-soft">Ground cover</dt>
          <dd className="num">{cropping.groundCoverPct === null ? 'not given' : `${cropping.groundCoverPct} %`}</dd>
        </>
      )}
      <dt className="text-ink-soft">Cover crop</dt>
      <dd className="num">
        {cropping.coverCrop
          ? `${cropping.coverCrop.species}${cropping.coverCrop.seededOn ? `, seeded ${cropping.coverCrop.seededOn}` : ''}${
              cropping.coverCrop.terminatedOn ? `, ended ${cropping.coverCrop.terminatedOn}` : ''
            }`
          : 'none'}
      </dd>
      <dt className="text-ink-soft">Support practice</dt>
      <dd className="num">
        {PRACTICE_LABELS[cropping.practice]}
        {cropping.practice === 'terraces' && cropping.terraceIntervalM !== null ? `, ${formatLength(cropping.terraceIntervalM, units)} apart` : ''}
        {cropping.practice === 'strip cropping' && cropping.stripRotation ? `: ${STRIP_ROTATION_WORDS[cropping.stripRotation]}` : ''}
        {cropping.practice === 'strip cropping' && cropping.stripWidthM !== null ? `, strips ${formatLength(cropping.stripWidthM, units)} wide` : ''}
      </dd>
    </dl>
  );
}

type FormProps = {
  cropping: Cropping | null;
  season: string;
  saving: boolean;
  onSave: (payload: CroppingPayload) => void;
};

function CroppingEditor({ cropping, season, saving, onSave }: FormProps) {
  const form = useForm<CroppingFormValues, unknown, CroppingPayload>({
    resolver: croppingResolver(season, cropping?.version),
    defaultValues: formValuesOf(cropping),
  });
  const { register, control, handleSubmit, formState } = form;
  const crop = useWatch({ control, name: 'crop' });
  const practice = useWatch({ control, name: 'practice' });
  const hasCoverCrop = useWatch({ control, name: 'hasCoverCrop' });
  const grass = isGrass(crop);
  const e = formState.errors;

  return (
    <form className="flex flex-col gap-4" data-testid="cropping-form" onSubmit={handleSubmit(onSave)} noValidate>
      <fieldset className="flex flex-col gap-3 rounded-md border border-paper-edge bg-white/40 p-3">
        <legend className="px-1 font-serif text-lg font-semibold">Crop and cover</legend>
        <div className="grid gap-3 sm:grid-cols-2">
          <SelectField label="Crop" data-testid="cropping-crop" {...register('crop')}>
            {CROPS.map((c) => (
              <option key={c} value={c}>
                {c}
              </option>
            ))}
          </SelectField>
          {!grass ? (
            <SelectField label="Tillage" error={plainMessage(e.tillage?.message)} data-testid="cropping-tillage" {...register('tillage')}>
              <option value="">Pick one</option>
              {TILLAGES.map((t) => (
                <option key={t} value={t}>
                  {t}
                </option>
              ))}
            </SelectField>
          ) : null}
          {!grass ? (
            <TextField
              label="Residue cover after planting (%), optional"
              inputMode="decimal"
              className="num"
              hint="Share of the ground covered by crop residue; the tillage's usual cover when empty."
              error={plainMessage(e.residuePct?.message)}
              data-testid="cropping-residue"
              {...register('residuePct', num)}
            />
          ) : (
            <TextField
              label={`Ground cover (%)${crop === 'pasture' ? '' : ', optional'}`}
              inputMode="decimal"
              className="num"
              hint="Living plants and litter touching the soil."
              error={plainMessage(e.groundCoverPct?.message)}
              data-testid="cropping-ground-cover"
              {...register('groundCoverPct', num)}
            />
          )}
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-3 rounded-md border border-paper-edge bg-white/40 p-3">
        <legend className="px-1 font-serif text-lg font-semibold">Cover crop</legend>
        <label className="flex items-center gap-2 text-sm font-medium">
          <input type="checkbox" data-testid="cropping-cover-crop" {...register('hasCoverCrop')} />A cover crop is grown
          between cash crops
        </label>
        {hasCoverCrop ? (
          <div className="grid gap-3 sm:grid-cols-3">
            <TextField
              label="Species"
              placeholder="cereal rye"
              error={plainMessage(e.coverCrop?.species?.message)}
              data-testid="cropping-cover-species"
              {...register('coverCrop.species')}
            />
            <TextField
              label="Seeded on, optional"
              type="date"
              className="num"
              error={plainMessage(e.coverCrop?.seededOn?.message)}
              data-testid="cropping-cover-seeded"
              {...register('coverCrop.seededOn')}
            />
            <TextField
              label="Ended on, optional"
              type="date"
              className="num"
              error={plainMessage(e.coverCrop?.terminatedOn?.message)}
              data-testid="cropping-cover-ended"
              {...register('coverCrop.terminatedOn')}
            />
          </div>
        ) : null}
      </fieldset>

      <fieldset className="flex flex-col gap-3 rounded-md border border-paper-edge bg-white/40 p-3">
        <legend className="px-1 font-serif text-lg font-semibold">Support practice</legend>
        <div className="grid gap-3 sm:grid-cols-2">
          <SelectField label="Practice" data-testid="cropping-practice" {...register('practice')}>
            {PRACTICES.map((p) => (
              <option key={p} value={p}>
                {PRACTICE_LABELS[p]}
              </option>
            ))}
          </SelectField>
          {practice === 'strip cropping' ? (
            <>
              <SelectField
                label="What the strips grow, year by year"
                className="sm:col-span-2"
                error={plainMessage(e.stripRotation?.message)}
                data-testid="cropping-strip-rotation"
                {...register('stripRotation')}
              >
                <option value="">Pick one</option>
                {STRIP_ROTATIONS.map((r) => (
                  <option key={r} value={r}>
                    {STRIP_ROTATION_WORDS[r]}
                  </option>
                ))}
              </SelectField>
              <TextField
                label="Width of each strip (m), optional"
                inputMode="decimal"
                className="num"
                hint="Checked against the widest strip the P table allows on this slope."
                error={plainMessage(e.stripWidthM?.message)}
                data-testid="cropping-strip-width"
                {...register('stripWidthM', num)}
              />
            </>
          ) : null}
          {practice === 'terraces' ? (
            <TextField
              label="Distance between terraces (m)"
              inputMode="decimal"
              className="num"
              error={plainMessage(e.terraceIntervalM?.message)}
              data-testid="cropping-terrace-interval"
              {...register('terraceIntervalM', num)}
            />
          ) : null}
        </div>
        {practice === 'terraces' ? (
          <Notice tone="caution" title="Before building terraces" testId="cropping-terrace-caution">
            {TERRACE_CAUTION}
          </Notice>
        ) : null}
        {practice === 'contouring' || practice === 'strip cropping' ? (
          <p className="text-sm text-ink-soft">
            Rows and strips must follow the contour across the slope; on long or very steep slopes the effect fades, and the
            Risk tab says when it does.
          </p>
        ) : null}
      </fieldset>

      <Button type="submit" className="self-start" disabled={saving} data-testid="cropping-save">
        {saving ? 'Saving…' : `Save cropping for ${season}`}
      </Button>
    </form>
  );
}

type Props = { fieldId: number; season: string; canEdit: boolean; units: Units };

export function CroppingPanel({ fieldId, season, canEdit, units }: Props) {
  const cropping = useCropping(fieldId, season);
  const update = useUpdateCropping(fieldId);

  if (cropping.isPending) return <p className="text-sm text-ink-soft">Loading the cropping…</p>;
  if (cropping.isError) return <Notice tone="error">{cropping.error.message}</Notice>;

  return (
    <div className="flex max-w-3xl flex-col gap-3" data-testid="cropping-panel">
      {cropping.data === null ? (
        <Notice tone="caution" testId="cropping-missing">
          No cropping recorded for {season} yet: the field's risk waits for it.
        </Notice>
      ) : null}
      {canEdit ? (
        <CroppingEditor
          key={`${season}:${cropping.data?.version ?? 'new'}`}
          cropping={cropping.data}
          season={season}
          saving={update.isPending}
          onSave={(payload) => update.mutate(payload)}
        />
      ) : cropping.data ? (
        <>
          <CroppingSummary cropping={cropping.data} units={units} />
          {cropping.data.practice === 'terraces' ? <Notice tone="caution">{TERRACE_CAUTION}</Notice> : null}
        </>
      ) : null}
      <LastChange change={cropping.data?.lastChange} testId="cropping-last-change" />
      {update.isError ? (
        <Notice tone="error" testId="cropping-error">
          {saveErrorMessage(update.error, 'cropping')}
        </Notice>
      ) : null}
      {update.isSuccess && !update.isPending ? (
        <p role="status" className="text-sm text-ink-soft" data-testid="cropping-saved">
          Saved. The Risk tab and the Priority board now use this cropping.
        </p>
      ) : null}
    </div>
  );
}
