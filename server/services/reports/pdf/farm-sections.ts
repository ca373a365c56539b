// The farm as a whole: totals now and after the plan, the work month by month, and the
// cautions for the work in the plan with the deferral to local standards and professionals.
import { CAUTIONS, DEFER_TO_LOCAL_PRACTICE, TREATMENT_CAUTIONS } from '../../../../shared/erosion/treatments/cautions';
import { CAUTION_PLANNING_AID, CAUTION_SHEET_AND_RILL } from '../../../../shared/erosion/estimate';
import { TREATMENT_TITLES } from '../../../../shared/erosion/treatments/field-treatments';
import { formatMoney } from '../../../../shared/format/money';
import { tonnesFigure } from '../../../../shared/format/loss-units';
import { formatArea } from '../../../../shared/format/units';
import type { ReportData, ReportField } from '../report-data';
import { formatFigure } from '../../../../shared/format/figure';
import { tPerHaToTonPerAc } from '../../../../shared/erosion/units';
import { byMonth } from '../report-words';
import { ACTION_COLUMNS, actionRow, isTreatmentKey } from './action-rows';
import { INK } from './fonts';
import type { PageFrame } from './page-frame';
import { drawTable } from './table';
import { heading, label, paragraph } from './text';

/** The fields highest risk first, as the priority board ranks them, with their planned work. */
export function drawRanking(frame: PageFrame, fields: ReportField[], data: ReportData): void {
  const units = data.reader.units;
  label(frame, 'Fields, highest risk first', INK.text, 60);
  drawTable(
    frame,
    [
      { header: 'Field', width: 0.2, font: 'semi' },
      { header: 'Area', width: 0.12, align: 'right' },
      { header: units === 'ac' ? 'A, US t/ac/yr' : 'A, t/ha/yr', width: 0.12, align: 'right' },
      { header: 'A/T', width: 0.08, align: 'right' },
      { header: 'Risk class', width: 0.24 },
      { header: 'Planned work', width: 0.24 },
    ],
    fields.map((f) => {
      const a = f.assessment;
      const loss = a?.soilLossTPerHaYr == null ? '—' : formatFigure(units === 'ac' ? tPerHaToTonPerAc(a.soilLossTPerHaYr) : a.soilLossTPerHaYr);
      const work = data.plan.actions.filter((x) => x.fieldId === f.fieldId);
      return {
        cells: [f.name, formatArea(f.areaHa, units), loss, a?.aOverT == null ? '—' : formatFigure(a.aOverT), a?.riskClass?.label ?? 'not assessed yet', work.map((x) => x.title).join(', ') || '—'],
        work: work.map((x) => x.treatment).filter(isTreatmentKey),
      };
    }),
  );
}

export function drawTotals(frame: PageFrame, data: ReportData): void {
  const { plan, fields, reader } = data;
  const units = reader.units;
  const predicted = new Map(plan.prediction.fields.map((p) => [p.fieldId, p]));
  let now = 0;
  let after = 0;
  let aboveNow = 0;
  let aboveAfter = 0;
  for (const f of fields) {
    const a = f.assessment;
    if (a?.tonnesPerYr == null || a.aOverT == null) continue;
    const p = predicted.get(f.fieldId);
    const planned = p?.ok ? p.planned : { tonnesPerYr: a.tonnesPerYr, aOverT: a.aOverT };
    now += a.tonnesPerYr;
    after += planned.tonnesPerYr;
    if (a.aOverT > 1) aboveNow += 1;
    if (planned.aOverT > 1) aboveAfter += 1;
  }
  const unassessed = fields.filter((f) => f.assessment?.tonnesPerYr == null).length;
  heading(frame, 'Farm totals', 15, 140);
  drawTable(
    frame,
    [
      { header: '', width: 0.55 },
      { header: 'Now', width: 0.225, align: 'right' },
      { header: 'After the plan', width: 0.225, align: 'right' },
    ],
    [
      { cells: ['Fields in this copy', `${fields.length}`, `${fields.length}`] },
      { cells: ['Their area', formatArea(fields.reduce((s, f) => s + f.areaHa, 0), units), ''] },
      { cells: ['Soil lost a year, all assessed fields', tonnesFigure(now, units).main, tonnesFigure(after, units).main] },
      { cells: ['Fields losing soil faster than T (A/T over 1)', `${aboveNow}`, `${aboveAfter}`] },
      { cells: ['Planned cost', '', formatMoney(plan.totals.cost, plan.currency)], bold: true },
    ],
  );
  if (unassessed) paragraph(frame, `${unassessed} field${unassessed === 1 ? ' is' : 's are'} not assessed yet and not counted in the soil figures.`, { size: 8, colour: INK.soft });
}

export function drawSchedule(frame: PageFrame, data: ReportData): void {
  heading(frame, 'Month by month', 15, 100);
  if (!data.plan.actions.length) {
    paragraph(frame, 'No work is planned yet.', { colour: INK.soft });
    return;
  }
  const columns = [
    { header: 'Field', width: 0.17 },
    { header: 'Action', width: 0.27 },
    ...ACTION_COLUMNS.filter((c) => ['Amount', 'Cost'].includes(c.header)),
    { header: 'When', width: 0.22 },
    { header: 'Status', width: 0.1 },
  ];
  for (const group of byMonth(data.plan.actions)) {
    label(frame, group.month, INK.accent, 50);
    drawTable(
      frame,
      columns,
      group.actions.map((a) => {
        // The field's pages carry the notes and who does the work; here, what happens when.
        const row = actionRow({ ...a, notes: null }, data.reader.units);
        return { ...row, cells: [a.fieldName, ...row.cells.slice(0, 5)] };
      }),
    );
  }
}

export function drawCautions(frame: PageFrame, data: ReportData): void {
  heading(frame, 'Take care', 15, 120);
  paragraph(frame, DEFER_TO_LOCAL_PRACTICE, { font: 'semi' });
  const planned = [...new Set(data.plan.actions.map((a) => a.treatment).filter(isTreatmentKey))];
  for (const key of planned) {
    const cautions = TREATMENT_CAUTIONS[key];
    if (!cautions.length) continue;
    paragraph(frame, `${TREATMENT_TITLES[key]}: ${cautions.map((c) => CAUTIONS[c]).join(' ')}`, { size: 9, work: [key] });
  }
  paragraph(frame, `${CAUTION_SHEET_AND_RILL} ${CAUTION_PLANNING_AID} Figures marked "rule of thumb" or "example value" should be replaced with local ones where they are known.`, { size: 9, colour: INK.soft });
}
