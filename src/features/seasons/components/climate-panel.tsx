// The farm's climate: R (typed, from the mean annual precipitation, or from a rainfall record) and the design storm
// depth for runoff. Farmers and advisors edit it (with the version read; a 409 shows the other
// person's values); everyone else reads it. The form loads on demand (climate-form.tsx).
import { lazy, Suspense } from 'react';
import { LastChange } from '../../../components/last-change';
import { Notice } from '../../../components/ui/notice';
import { mmToIn } from '../../../../shared/erosion/units';
import type { Climate } from '../../../../shared/schemas/season';
import type { Units } from '../../../../shared/schemas/auth';
import { formatFigure } from '../../../lib/format-figure';
import { useClimate } from '../api/get-climate';
import { useUpdateClimate } from '../api/update-climate';
import { saveErrorMessage } from './save-error-message';
import { RainfallRecordUpload } from './rainfall-record-upload';

const ClimateForm = lazy(() => import('./climate-form').then((m) => ({ default: m.ClimateForm })));

const R_UNIT = 'MJ·mm/(ha·h·yr)';

function ClimateText({ climate, units }: { climate: Climate; units: Units }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" data-testid="climate-summary">
      <dt className="text-ink-soft">R, rainfall erosivity</dt>
      <dd className="num">
        {climate.rFrom === 'record' && climate.record
          ? `${formatFigure(climate.rValue ?? 0)} ${R_UNIT}, from ${climate.record.years} year${climate.record.years === 1 ? '' : 's'} of rainfall record (${climate.record.erosiveStorms} erosive storms)`
          : climate.rFrom === 'value'
            ? `${formatFigure(climate.rValue ?? 0)} ${R_UNIT}, typed`
            : `from ${formatFigure(climate.annualPrecipitationMm ?? 0)} mm of rain a year`}
      </dd>
      <dt className="text-ink-soft">Design storm</dt>
      <dd className="num">
        {formatFigure(climate.designStormMm)} mm
        {units === 'ac' ? <span className="text-ink-soft"> ({formatFigure(mmToIn(climate.designStormMm))} in)</span> : null}
      </dd>
    </dl>
  );
}

export function ClimatePanel({ farmId, canEdit, units }: { farmId: number; canEdit: boolean; units: Units }) {
  const climate = useClimate(farmId);
  const update = useUpdateClimate(farmId);

  return (
    <details className="rounded-md border border-paper-edge bg-white/40 p-3" data-testid="climate-panel" open={climate.data === null ? true : undefined}>
      <summary className="cursor-pointer font-serif text-lg font-semibold">Farm climate</summary>
      <div className="mt-2 flex flex-col gap-3">
        {climate.isPending ? (
          <p className="text-sm text-ink-soft">Loading the climate…</p>
        ) : climate.isError ? (
          <Notice tone="error">{climate.error.message}</Notice>
        ) : (
          <>
            {climate.data ? (
              <ClimateText climate={climate.data} units={units} />
            ) : (
              <Notice tone="caution" testId="climate-missing">
                No climate yet: every field waits for R and the design storm.
              </Notice>
            )}
            {canEdit ? (
              <Suspense fallback={<p className="text-sm text-ink-soft">Opening the form…</p>}>
                <ClimateForm
                  key={climate.data?.version ?? 'new'}
                  climate={climate.data}
                  units={units}
                  saving={update.isPending}
                  onSave={(input) => update.mutate(input)}
                />
              </Suspense>
            ) : null}
            {canEdit ? <RainfallRecordUpload farmId={farmId} climate={climate.data} /> : null}
            <LastChange change={climate.data?.lastChange} testId="climate-last-change" />
            {update.isError ? <Notice tone="error">{saveErrorMessage(update.error, 'climate')}</Notice> : null}
            {update.isSuccess && !update.isPending ? (
              <p role="status" className="text-sm text-ink-soft">
                Saved. Every field's figures are being worked out again.
              </p>
            ) : null}
          </>
        )}
      </div>
    </details>
  );
}
