// Risk: the field's assessment for the season. A in t/ha/yr and US t/ac/yr against T, A/T
// with its risk class, tonnes a year, the design storm's runoff; how A builds up, every factor
// with its source, what went in and what is missing, problem clay, what to do about it (the
// treatments and the what-if, for farmers and advisors), and the cautions.
import { lazy, Suspense } from 'react';
import { Link } from 'react-router-dom';
import { Notice } from '../../../components/ui/notice';
import { paths } from '../../../lib/paths';
import { CAUTION_TERRACES } from '../../../../shared/erosion/estimate';
import type { FieldAssessment, Gap, GapTab } from '../../../../shared/schemas/assessment';
import type { Units } from '../../../../shared/schemas/auth';
import { RiskBadge } from '../../../components/risk/risk-badge';
import { lossFigure, runoffFigure, tonnesFigure, volumeFigure, type Figure } from '../../../lib/loss-units';
import { FactorTable } from '../../estimate/components/factor-table';
import { formatFigure } from '../../../lib/format-figure';
import { formatCount } from '../../../lib/quantities';
import { useAssessment } from '../../seasons/api/get-assessment';
import { useFactorOverrides } from '../../seasons/api/get-factor-overrides';
import { OVERRIDE_FACTORS, type OverrideFactor } from '../../../../shared/schemas/overrides';
import { FactorOverrideControl } from './factor-override-control';
import { TERRACE_CAUTION } from '../../seasons/components/cropping-form';
import { AssessmentInputs } from './assessment-inputs';
import type { FieldTab } from './field-tabs';
import { WhatToDo } from './what-to-do';

// Loaded on first use: charts (recharts) load with the chart, not with the field screen.
const FactorBuildUpChart = lazy(() => import('./factor-build-up-chart').then((m) => ({ default: m.FactorBuildUpChart })));

function Big({ label, figure, testId }: { label: string; figure: Figure | null; testId?: string }) {
  return (
    <div className="flex flex-col">
      <dt className="text-sm text-ink-soft">{label}</dt>
      <dd data-testid={testId}>
        {figure ? (
          <>
            <span className="num text-2xl font-semibold">{figure.main}</span>
            <span className="num block text-sm text-ink-soft">{figure.alt}</span>
          </>
        ) : (
          <span className="text-ink-faint">not worked out</span>
        )}
      </dd>
    </div>
  );
}

const TAB_WORDS: Record<Exclude<GapTab, 'farm-climate'>, string> = { ground: 'Ground', soil: 'Soil', cropping: 'Cropping' };

/** The control that takes a person to where the gap is filled: a tab here, or the farm's climate on the board. */
function FixIt({ gap, farmId, onOpenTab }: { gap: Gap; farmId: number; onOpenTab?: (tab: FieldTab) => void }) {
  const className = 'font-semibold text-clay-dark underline underline-offset-2';
  if (gap.tab === 'farm-climate') {
    return (
      <Link to={paths.board.getHref(farmId)} className={className}>
        Set the farm climate on the Priority board
      </Link>
    );
  }
  if (!onOpenTab) return null;
  const tab = gap.tab;
  return (
    <button type="button" className={className} onClick={() => onOpenTab(tab)}>
      Open the {TAB_WORDS[tab]} tab
    </button>
  );
}

function Gaps({ gaps, farmId, onOpenTab }: { gaps: Gap[]; farmId: number; onOpenTab?: (tab: FieldTab) => void }) {
  return (
    <section aria-labelledby="gaps-heading" data-testid="assessment-gaps" className="flex flex-col gap-1">
      <h3 id="gaps-heading" className="font-serif text-lg font-semibold">
        What is missing
      </h3>
      {gaps.length ? (
        <ul className="list-inside list-disc text-sm">
          {gaps.map((g) => (
            <li key={g.key} data-testid={`gap-${g.key}`}>
              {g.message} <FixIt gap={g} farmId={farmId} onOpenTab={onOpenTab} />
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-ink-soft">Nothing: every input the estimate needs is there.</p>
      )}
    </section>
  );
}

/** Problem clay (the clay itself) and wet ground (a seasonal water table) are separate verdicts. */
function groundTitle(a: FieldAssessment): string {
  if (a.problemClay && a.groundAdvice) return 'Problem clay on wet ground: amending will not fix it';
  if (a.groundAdvice) return 'Wet ground: amending will not fix it';
  return a.problemClay ? 'Problem clay' : 'Drainage';
}

function ProblemClay({ a }: { a: FieldAssessment }) {
  if (!a.problemClay && !a.groundAdvice && !a.drainageClass) return null;
  return (
    <Notice title={groundTitle(a)} testId="assessment-problem-clay">
      {a.drainageClass ? (
        <p>
          Drainage from the soil checks: <span className="font-semibold">{a.drainageClass}</span>.
        </p>
      ) : null}
      {a.problemClayReasons.length ? (
        <ul className="mt-1 list-inside list-disc">
          {a.problemClayReasons.map((r) => (
            <li key={r}>{r}</li>
          ))}
        </ul>
      ) : null}
      {a.groundAdvice ? (
        <p className="mt-1" data-testid="assessment-ground-advice">
          {a.groundAdvice}
        </p>
      ) : null}
    </Notice>
  );
}

type Props = {
  farmId: number;
  fieldId: number;
  season: string;
  units: Units;
  /** Farmers and advisors: they override factors and see the treatments and the what-if; a landowner does neither. */
  canEdit: boolean;
  onOpenTab?: (tab: FieldTab) => void;
};

const isOverridable = (key: string): key is OverrideFactor => (OVERRIDE_FACTORS as readonly string[]).includes(key);

export function RiskTab({ farmId, fieldId, season, units, canEdit, onOpenTab }: Props) {
  const q = useAssessment(fieldId, season);
  const overrides = useFactorOverrides(fieldId);
  if (q.isPending) return <p className="text-sm text-ink-soft">Working out the risk…</p>;
  if (q.isError) return <Notice tone="error" title="The risk could not be worked out">{q.error.message}</Notice>;
  const a = q.data;
  const e = a.estimate;
  const ro = e?.runoff;
  const terraces = e?.practice?.practice === 'terraces';

  return (
    <div className="flex flex-col gap-5" data-testid="risk-tab">
      {e && a.riskClass && a.soilLossTPerHaYr !== null && a.aOverT !== null ? (
        <section aria-labelledby="risk-heading" className="flex flex-col gap-3 rounded-md border border-clay bg-white/60 p-3">
          <h3 id="risk-heading" className="text-xs font-semibold uppercase tracking-wide text-clay-dark">
            Estimated soil loss, RUSLE, season {a.season}
          </h3>
          <dl className="grid gap-3 sm:grid-cols-3">
            <Big label="A, average yearly loss" figure={lossFigure(a.soilLossTPerHaYr, units)} testId="assessment-soil-loss" />
            <Big label="T, what the soil can stand" figure={a.toleranceTPerHaYr !== null ? lossFigure(a.toleranceTPerHaYr, units) : null} testId="assessment-tolerance" />
            <Big label="From the whole field" figure={a.tonnesPerYr !== null ? tonnesFigure(a.tonnesPerYr, units) : null} testId="assessment-tonnes" />
          </dl>
          <p className="flex flex-wrap items-center gap-2 border-t border-paper-edge pt-2" data-testid="assessment-risk">
            <span className="text-sm text-ink-soft">A/T</span>
            <span className="num text-xl font-semibold" data-testid="assessment-a-over-t">
              {formatFigure(a.aOverT)}
            </span>
            <RiskBadge riskClass={a.riskClass} size="md" />
            <span className="text-sm text-ink-soft">
              {a.aOverT > 1
                ? `The field loses soil ${formatFigure(a.aOverT)} times as fast as it is tolerated.`
                : 'The field loses soil no faster than it is tolerated.'}
            </span>
          </p>
          {ro ? (
            <div className="flex flex-col gap-2 border-t border-paper-edge pt-2" data-testid="assessment-runoff">
              <dl className="grid gap-3 sm:grid-cols-3">
                <Big label={`Runoff from a ${runoffFigure(ro.rainfallMm, units).main} design storm`} figure={runoffFigure(ro.runoffMm, units)} testId="assessment-runoff-depth" />
                <Big label="Runoff volume from the field" figure={a.runoffM3 !== null ? volumeFigure(a.runoffM3, units) : null} testId="assessment-runoff-volume" />
                <div className="flex flex-col">
                  <dt className="text-sm text-ink-soft">Curve number</dt>
                  <dd className="num text-2xl font-semibold">
                    {formatCount(ro.cn.value)}
                    {ro.hsg ? <span className="block text-sm font-normal text-ink-soft">hydrologic soil group {ro.hsg}</span> : null}
                  </dd>
                </div>
              </dl>
            </div>
          ) : null}
          <p className="text-xs text-ink-soft">
            Slope from the {a.lsSource ?? 'typed slope'}; method version {a.engineVersion}, worked out{' '}
            {new Date(a.computedAt).toLocaleString('en-US', { dateStyle: 'medium', timeStyle: 'short' })}.
          </p>
        </section>
      ) : (
        <Notice tone="caution" title="Not assessed yet" testId="assessment-not-ready">
          {a.failure ? <p>{a.failure}</p> : <p>The estimate waits for the inputs listed under "What is missing".</p>}
        </Notice>
      )}

      <Gaps gaps={a.gaps} farmId={farmId} onOpenTab={onOpenTab} />
      <ProblemClay a={a} />
      {canEdit && e ? <WhatToDo farmId={farmId} fieldId={fieldId} season={season} units={units} onOpenTab={onOpenTab} /> : null}
      {e && a.riskClass ? (
        <Suspense fallback={null}>
          <FactorBuildUpChart estimate={e} riskColour={a.riskClass.colour} units={units} />
        </Suspense>
      ) : null}
      {e ? (
        <FactorTable
          factors={e.factors}
          units={units === 'ac' ? 'us' : 'si'}
          extra={ro ? [{ name: 'CN, curve number', p: ro.cn }] : undefined}
          control={
            canEdit
              ? (key) =>
                  isOverridable(key) ? (
                    <FactorOverrideControl fieldId={fieldId} factor={key} current={overrides.data?.find((o) => o.factor === key)} />
                  ) : null
              : undefined
          }
        />
      ) : null}
      <AssessmentInputs inputs={a.inputs} units={units} />

      {e?.practice && e.practice.notes.length > 0 ? (
        <Notice title="About the practice">
          <ul className="list-inside list-disc">
            {e.practice.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </Notice>
      ) : null}
      {e && e.warnings.length > 0 ? (
        <Notice title="Points to check" testId="assessment-warnings">
          <ul className="list-inside list-disc">
            {e.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </Notice>
      ) : null}
      <Notice title="Before you act on these figures" testId="assessment-cautions">
        <ul className="list-inside list-disc">
          {(e?.cautions ?? ['These figures are planning aids, not designs.']).map((c) => (
            <li key={c}>{c}</li>
          ))}
          {terraces && !(e?.cautions ?? []).includes(CAUTION_TERRACES) ? <li>{TERRACE_CAUTION}</li> : null}
        </ul>
      </Notice>
    </div>
  );
}
