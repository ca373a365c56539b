// The landowner's view: the approved plan for the fields they own and nothing else — a map of
// the risk now and one after the planned work (colours always with words), each field's work,
// when it is planned and whether it is done, and who approved the plan and when. Drafts and plans
// in review never show.
import { useMemo } from 'react';
import { riskClassOf, type RiskClass } from '../../../../shared/erosion/risk-class';
import type { Units } from '../../../../shared/schemas/auth';
import type { FieldFeature } from '../../../../shared/schemas/field';
import type { Plan } from '../../../../shared/schemas/plans';
import { RiskLegend } from '../../../components/risk/risk-legend';
import { RiskMap } from '../../../components/risk/risk-map';
import { Notice } from '../../../components/ui/notice';
import { Loading } from '../../../components/ui/spinner';
import { amountWords } from '../../../lib/amount-words';
import { tonnesFigure } from '../../../lib/loss-units';
import { useSeasonPlan } from '../api/get-season-plan';
import { FieldPrediction } from './field-prediction';
import { byWhen, dayWords, whenWords } from './plan-words';

type Props = { farmId: number; season: string; fields: FieldFeature[]; units: Units; tileUrl?: string | null; tileAttribution?: string | null };

function classes(plan: Plan, which: 'current' | 'planned'): Map<number, RiskClass | null> {
  return new Map(plan.prediction.fields.map((f) => [f.fieldId, f.ok ? riskClassOf(f[which].aOverT) : null]));
}

function Maps({ plan, fields, tileUrl, tileAttribution }: { plan: Plan; fields: FieldFeature[]; tileUrl?: string | null; tileAttribution?: string | null }) {
  const inPlan = useMemo(() => fields.filter((f) => plan.actions.some((a) => a.fieldId === f.id)), [fields, plan.actions]);
  const now = useMemo(() => classes(plan, 'current'), [plan]);
  const after = useMemo(() => classes(plan, 'planned'), [plan]);
  return (
    <div className="grid gap-3 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_240px]">
      <figure className="flex flex-col gap-1">
        <figcaption className="text-sm font-semibold">Risk now</figcaption>
        <div className="h-64 overflow-hidden rounded-md border border-paper-edge sm:h-80">
          <RiskMap fields={inPlan} classes={now} tileUrl={tileUrl} tileAttribution={tileAttribution} testId="landowner-map-now" label="Your fields coloured by their risk now" />
        </div>
      </figure>
      <figure className="flex flex-col gap-1">
        <figcaption className="text-sm font-semibold">Risk after the planned work</figcaption>
        <div className="h-64 overflow-hidden rounded-md border border-paper-edge sm:h-80">
          <RiskMap fields={inPlan} classes={after} tileUrl={tileUrl} tileAttribution={tileAttribution} testId="landowner-map-after" label="Your fields coloured by their risk after the planned work" />
        </div>
      </figure>
      <div className="flex flex-col gap-1">
        <p className="text-sm font-semibold">Key</p>
        <RiskLegend />
      </div>
    </div>
  );
}

export function LandownerPlan({ farmId, season, fields, units, tileUrl, tileAttribution }: Props) {
  const q = useSeasonPlan(farmId, season);
  if (q.isPending) return <Loading label="Opening the approved plan…" />;
  if (q.isError) return <Notice tone="error" title="The plan could not be loaded">{q.error.message}</Notice>;
  const plan = q.data;
  if (!plan)
    return (
      <Notice testId="landowner-no-plan" title={`No approved plan for ${season} yet`}>
        The farmer and the advisor are still working on it. It shows here once the advisor approves it.
      </Notice>
    );
  return (
    <div className="flex flex-col gap-4" data-testid="landowner-plan">
      <p className="text-sm" data-testid="landowner-approved-by">
        Revision {plan.revision}, approved by <span className="font-semibold">{byWhen(plan.approvedBy, plan.approvedAt)}</span>.
        {plan.prediction.tonnesSavedPerYr > 0 ? <> On your fields the work saves about <span className="num font-semibold">{tonnesFigure(plan.prediction.tonnesSavedPerYr, units).main}</span> of topsoil.</> : null}
      </p>
      {plan.actions.length === 0 ? (
        <Notice testId="landowner-nothing">The approved plan has no work on your fields this season.</Notice>
      ) : (
        <>
          <Maps plan={plan} fields={fields} tileUrl={tileUrl} tileAttribution={tileAttribution} />
          {plan.totals.fields.map((t) => (
            <section key={t.fieldId} aria-label={t.fieldName} className="flex flex-col gap-2 rounded-lg border border-paper-edge bg-paper p-3 shadow-sm" data-testid="landowner-field" data-field-id={t.fieldId}>
              <h3 className="font-serif text-lg font-semibold">{t.fieldName}</h3>
              <FieldPrediction p={plan.prediction.fields.find((f) => f.fieldId === t.fieldId)} units={units} />
              <table className="w-full text-sm">
                <caption className="sr-only">Work planned on {t.fieldName}</caption>
                <thead className="border-b border-paper-edge text-left text-ink-soft">
                  <tr>
                    <th scope="col" className="py-1 pr-2 font-medium">Work</th>
                    <th scope="col" className="py-1 pr-2 font-medium">Amount</th>
                    <th scope="col" className="py-1 pr-2 font-medium">When</th>
                    <th scope="col" className="py-1 font-medium">Done</th>
                  </tr>
                </thead>
                <tbody>
                  {plan.actions
                    .filter((a) => a.fieldId === t.fieldId)
                    .map((a) => (
                      <tr key={a.id} className="border-b border-paper-edge align-top last:border-b-0" data-testid="landowner-action">
                        <td className="py-1 pr-2 font-semibold">{a.title}</td>
                        <td className="num py-1 pr-2">{a.quantity != null && a.unit ? amountWords(a.quantity, a.unit, units) : '—'}</td>
                        <td className="py-1 pr-2">{whenWords(a)}</td>
                        <td className="py-1" data-testid="landowner-action-done">
                          {a.status === 'planned' ? <span className="text-ink-soft">not yet</span> : `${a.doneOn ? dayWords(a.doneOn) : 'done'}${a.status === 'checked' ? ', checked' : ''}`}
                        </td>
                      </tr>
                    ))}
                </tbody>
              </table>
            </section>
          ))}
        </>
      )}
    </div>
  );
}
