// The report's words for figures, dates, the plan's state and its months. Pure.
import type { FieldAssessment } from '../../../shared/schemas/assessment';
import type { Units } from '../../../shared/schemas/auth';
import type { Provenance } from '../../../shared/schemas/estimate';
import type { Plan, PlanAction } from '../../../shared/schemas/plans';
import { formatFigure } from '../../../shared/format/figure';
import { lossFigure, runoffFigure } from '../../../shared/format/loss-units';
import { mmToIn, tPerHaToTonPerAc } from '../../../shared/erosion/units';

/** "3 December 2026" (the day as UTC has it). */
export function dateWords(iso: string): string {
  return new Date(iso.length === 10 ? `${iso}T00:00:00Z` : iso).toLocaleDateString('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });
}

/** Who moved the plan to its state, and when; approved plans name the approver. */
export function stateWords(plan: Plan): string {
  const by = (p: Plan['approvedBy'], at: string | null) => `${p ? ` by ${p.name}` : ''}${at ? ` on ${dateWords(at)}` : ''}`;
  switch (plan.state) {
    case 'approved':
      return `Approved${by(plan.approvedBy, plan.approvedAt)} (revision ${plan.revision}).`;
    case 'submitted':
      return `Submitted${by(plan.submittedBy, plan.submittedAt)} and waiting for the advisor: not approved yet.`;
    case 'returned':
      return `Returned${by(plan.returnedBy, plan.returnedAt)} for changes: not approved yet.`;
    case 'draft':
      return plan.approvedRevision
        ? `Draft of revision ${plan.revision}, being changed after revision ${plan.approvedRevision} was approved: not approved yet.`
        : 'Draft: not submitted or approved yet.';
  }
}

/** Where a factor came from, in plain words: its source, a typed value's note, or a check to make. */
export function sourceWords(p: Provenance): { text: string; note?: string } {
  if (p.override) return { text: `typed for this field: ${p.override.note}${p.override.by ? `, by ${p.override.by}` : ''}`, note: 'in place of the worked-out figure' };
  const flag = p.flag === 'memory' ? ' (check against the handbook)' : p.flag === 'practice' ? ' (rule of thumb)' : '';
  return { text: `${p.source}${flag}`, note: p.method };
}

export type FactorLine = { name: string; value: string; unit: string; note?: string; source: { text: string; note?: string } };

/** A loss in the reader's units: t/ha/yr, or US t/ac/yr for acre users. */
const loss = (tPerHaYr: number, units: Units) =>
  units === 'ac' ? { value: formatFigure(tPerHaToTonPerAc(tPerHaYr)), unit: 'US t/ac/yr' } : { value: formatFigure(tPerHaYr), unit: 't/ha/yr' };

const factorValue = (p: Provenance, units: Units) => (units === 'ac' && p.us ? p.us : { value: p.value, unit: p.unit });

/** R, K, LS, C, P, A, T, A/T and runoff of a field's assessment, in the reader's units, with their sources. */
export function factorLines(a: FieldAssessment, units: Units): FactorLine[] {
  const e = a.estimate;
  if (!e) return [];
  const f = e.factors;
  const factor = (name: string, p: Provenance): FactorLine => {
    const v = factorValue(p, units);
    return { name, value: formatFigure(v.value), unit: v.unit || 'no unit', source: sourceWords(p) };
  };
  const alt = lossFigure(e.soilLoss.tPerHaYr, units).alt;
  const lines: FactorLine[] = [
    factor('R, rainfall erosivity', f.r),
    factor('K, soil erodibility', f.k),
    factor('LS, slope length and steepness', f.ls),
    factor('C, cover and management', f.c),
    factor('P, support practice', f.p),
    { name: 'A, average yearly soil loss', ...loss(e.soilLoss.tPerHaYr, units), note: alt, source: { text: 'RUSLE: A = R × K × LS × C × P (AH-703, ch. 1)', note: 'sheet and rill erosion only, not gullies' } },
    { name: 'T, soil-loss tolerance', ...loss(f.t.value, units), source: sourceWords(f.t) },
    { name: 'A/T', value: formatFigure(e.aOverT), unit: 'no unit', source: { text: `A ÷ T; ${a.riskClass ? `risk class "${a.riskClass.label}"` : 'no risk class'}`, note: 'class limits: rule of thumb (NSSH part 618 ranks fields by A/T)' } },
  ];
  if (e.runoff) {
    const storm = runoffFigure(e.runoff.rainfallMm, units);
    lines.push({
      name: 'Runoff from the design storm',
      ...(units === 'ac' ? { value: formatFigure(mmToIn(e.runoff.runoffMm)), unit: 'in' } : { value: formatFigure(e.runoff.runoffMm), unit: 'mm' }),
      source: { text: `curve number ${formatFigure(e.runoff.cn.value)} (${sourceWords(e.runoff.cn).text}); storm of ${storm.main}`, note: 'SCS curve-number method (NEH 630 ch. 10; TR-55 ch. 2)' },
    });
  }
  return lines;
}

/** The month an action starts in ("2027-04"), or null without a date. */
const startMonth = (a: PlanAction): string | null => (a.plannedOn ?? a.plannedFrom ?? a.plannedTo)?.slice(0, 7) ?? null;

/** Actions by the month they start in, months in order, then those without a date. */
export function byMonth(actions: PlanAction[]): { month: string; actions: PlanAction[] }[] {
  const groups = new Map<string, PlanAction[]>();
  for (const a of actions) {
    const m = startMonth(a) ?? 'none';
    groups.set(m, [...(groups.get(m) ?? []), a]);
  }
  const months = [...groups.keys()].filter((m) => m !== 'none').sort();
  const sorted = months.map((m) => ({
    month: new Date(`${m}-01T00:00:00Z`).toLocaleDateString('en-GB', { month: 'long', year: 'numeric', timeZone: 'UTC' }),
    actions: groups.get(m)!.sort((x, y) => ((x.plannedOn ?? x.plannedFrom ?? x.plannedTo)! < (y.plannedOn ?? y.plannedFrom ?? y.plannedTo)! ? -1 : 1)),
  }));
  return groups.has('none') ? [...sorted, { month: 'No date set yet', actions: groups.get('none')! }] : sorted;
}
