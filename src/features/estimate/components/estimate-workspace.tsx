// Quick estimate: the form on the left, the answer beside it. The answer follows every
// keystroke through the shared engine (estimate() in shared/erosion), and the same inputs go
// to POST /api/estimate once typing pauses; a page older than the server's method says so.
import { useMemo, useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import { Notice } from '../../../components/ui/notice';
import { lossFigure } from '../../../lib/loss-units';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { estimate } from '../../../../shared/erosion';
import type { EstimateInput, EstimateSuccess } from '../../../../shared/schemas/estimate';
import { useServerEstimate } from '../api/run-estimate';
import { CoverSection } from './cover-section';
import { DEFAULT_VALUES, describeFailure, estimateResolver, toEstimateInput, type EstimateFormValues } from './estimate-form-values';
import { EstimateResults, type DisplayUnits } from './estimate-results';
import { PracticeSection, TargetSection } from './practice-section';
import { RainSection } from './rain-section';
import { RunoffSection } from './runoff-section';
import { SlopeSection } from './slope-section';
import { SoilSection } from './soil-section';

/** The server is asked once typing has paused this long, ms. */
const SERVER_CHECK_DELAY_MS = 600;

const sameFigures = (a: EstimateSuccess, b: EstimateSuccess) =>
  Math.abs(a.soilLoss.tPerHaYr - b.soilLoss.tPerHaYr) <= 1e-9 * Math.max(1, a.soilLoss.tPerHaYr) &&
  (a.runoff?.runoffMm ?? 0) === (b.runoff?.runoffMm ?? 0);

/** Says so only when the page's figures and the current method disagree (the page was loaded before an update). */
function ServerCheck({ input, local, units }: { input: EstimateInput | null; local: EstimateSuccess | null; units: DisplayUnits }) {
  const settled = useDebouncedValue(input, SERVER_CHECK_DELAY_MS);
  const server = useServerEstimate(settled);
  const current = settled === input && !server.isPlaceholderData;
  if (!input || !local || !current || server.isFetching || !server.data || sameFigures(server.data, local)) return null;
  const loss = lossFigure(server.data.soilLoss.tPerHaYr, units === 'us' ? 'ac' : 'ha').main;
  return (
    <p role="status" data-testid="server-check" className="text-sm text-alert">
      The current method gives {loss} for these inputs: reload the page to bring its figures up to date.
    </p>
  );
}

export function EstimateWorkspace({ defaultUnits }: { defaultUnits: DisplayUnits }) {
  const form = useForm<EstimateFormValues>({ resolver: estimateResolver, defaultValues: DEFAULT_VALUES, mode: 'onChange' });
  const [units, setUnits] = useState<DisplayUnits>(defaultUnits);
  const values = useWatch({ control: form.control }) as EstimateFormValues;
  const input = useMemo(() => toEstimateInput(values), [values]);
  const result = useMemo(() => estimate(input), [input]);
  const kFromSoil = values.k.from !== 'value';

  return (
    <FormProvider {...form}>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
        <form noValidate aria-label="Estimate inputs" className="flex flex-col gap-4" onSubmit={(e) => e.preventDefault()} data-testid="estimate-form">
          <RainSection />
          <SoilSection textureClass={result.ok ? result.textureClass : undefined} />
          <SlopeSection />
          <CoverSection />
          <PracticeSection />
          <TargetSection />
          <RunoffSection kFromSoil={kFromSoil} />
          <button
            type="button"
            className="self-start text-sm font-semibold text-clay-dark underline"
            onClick={() => form.reset(DEFAULT_VALUES)}
          >
            Start again from the example
          </button>
        </form>

        <section aria-label="Estimate results" className="flex flex-col gap-3 lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-y-auto">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <h2 className="text-xl font-semibold">Results</h2>
            <div role="group" aria-label="Units of the results" className="flex items-center gap-1 text-sm">
              <span className="text-ink-soft">Show in</span>
              {(['si', 'us'] as const).map((u) => (
                <button
                  key={u}
                  type="button"
                  aria-pressed={units === u}
                  data-testid={`results-units-${u}`}
                  onClick={() => setUnits(u)}
                  className={`rounded border px-2 py-0.5 font-medium ${
                    units === u ? 'border-clay-dark bg-clay text-paper' : 'border-ink-faint bg-paper text-ink hover:bg-paper-deep'
                  }`}
                >
                  {u === 'si' ? 'SI (t/ha)' : 'US (t/ac)'}
                </button>
              ))}
            </div>
          </div>
          <ServerCheck input={result.ok ? input : null} local={result.ok ? result : null} units={units} />
          {result.ok ? (
            <EstimateResults result={result} units={units} />
          ) : (
            <Notice title="Not worked out yet" testId="estimate-incomplete">
              <p>{describeFailure(result)}</p>
              <p className="mt-1 text-ink-soft">Fill in or correct the marked inputs; the figures follow as you type.</p>
            </Notice>
          )}
        </section>
      </div>
    </FormProvider>
  );
}
