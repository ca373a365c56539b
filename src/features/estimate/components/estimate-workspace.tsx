// Quick estimate: the form on the left, the answer beside it. The answer follows every
// keystroke through the shared engine (estimate() in shared/erosion), and the same inputs go
// to POST /api/estimate once typing pauses, so the server confirms the figures.
import { useMemo, useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import { Notice } from '../../../components/ui/notice';
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

function ServerCheck({ input, local }: { input: EstimateInput | null; local: EstimateSuccess | null }) {
  const settled = useDebouncedValue(input, SERVER_CHECK_DELAY_MS);
  const server = useServerEstimate(settled);
  const current = settled === input && !server.isPlaceholderData;
  let text: string;
  let tone: 'info' | 'error' = 'info';
  if (!input || !local) text = 'The server is asked once the inputs are complete.';
  else if (!current || server.isFetching) text = 'Checking these figures with the server…';
  else if (server.isError) {
    text = `The server did not confirm these figures: ${server.error.message}`;
    tone = 'error';
  } else if (server.data && sameFigures(server.data, local)) text = 'The server worked out the same figures.';
  else if (server.data) {
    text = `The server worked out ${server.data.soilLoss.tPerHaYr.toFixed(2)} t/ha/yr; reload the page to get the current version of the figures.`;
    tone = 'error';
  } else text = 'Checking these figures with the server…';
  return (
    <p role="status" data-testid="server-check" className={`text-sm ${tone === 'error' ? 'text-alert' : 'text-ink-soft'}`}>
      {text}
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
          <ServerCheck input={result.ok ? input : null} local={result.ok ? result : null} />
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
