// One field: its name, area and risk class; the factor table with each figure's source; the
// planned actions; and A after the plan (the plan's prediction from the season's assessment).
import { lossFigure, tonnesFigure } from '../../../../shared/format/loss-units';
import { formatFigure } from '../../../../shared/format/figure';
import { formatArea } from '../../../../shared/format/units';
import type { Units } from '../../../../shared/schemas/auth';
import type { Plan } from '../../../../shared/schemas/plans';
import type { ReportField } from '../report-data';
import { factorLines } from '../report-words';
import { INK } from './fonts';
import type { PageFrame } from './page-frame';
import { drawTable } from './table';
import { heading, label, paragraph, riskLine } from './text';
import { ACTION_COLUMNS, actionRow } from './action-rows';

function afterThePlan(frame: PageFrame, field: ReportField, plan: Plan, units: Units): void {
  const p = plan.prediction.fields.find((f) => f.fieldId === field.fieldId);
  if (!p) return;
  label(frame, 'A after the plan', INK.text, 50);
  if (!p.ok) {
    paragraph(frame, `Not predicted: ${p.reason}`, { colour: INK.soft });
    return;
  }
  const now = lossFigure(p.current.soilLossTPerHaYr, units).main;
  const after = lossFigure(p.planned.soilLossTPerHaYr, units).main;
  const verdict = p.reachesT ? 'at or under T after the plan' : 'still above T after the plan';
  paragraph(
    frame,
    `A now ${now} (A/T ${formatFigure(p.current.aOverT)}); after the planned treatments ${after} (A/T ${formatFigure(p.planned.aOverT)}): ${verdict}. Soil kept on the field: ${tonnesFigure(p.tonnesSavedPerYr, units).main}.`,
    { font: 'semi' },
  );
  const typed = plan.actions.some((a) => a.fieldId === field.fieldId && a.treatment === 'other');
  const notes = [...p.effects, ...(typed ? ['Work typed by hand (not one of the listed treatments) is not part of the prediction.'] : [])];
  for (const e of notes) paragraph(frame, `·  ${e}`, { size: 8, colour: INK.soft });
}

export function drawFieldSection(frame: PageFrame, field: ReportField, plan: Plan, units: Units): void {
  const a = field.assessment;
  heading(frame, field.name, 15, 120);
  paragraph(frame, `${formatArea(field.areaHa, units)} · season ${plan.season}`, { colour: INK.soft, size: 9 });
  if (a?.riskClass && a.aOverT != null) riskLine(frame, a.riskClass.colour, `Risk class: ${a.riskClass.label} (A/T ${formatFigure(a.aOverT)})`);

  if (!a || !a.estimate) {
    const why = a?.gaps.length ? a.gaps.map((g) => g.message).join(' ') : (a?.failure ?? 'No assessment is stored for this season.');
    paragraph(frame, `Not assessed yet. ${why}`, { colour: INK.soft });
  } else {
    drawTable(
      frame,
      [
        { header: 'Figure', width: 0.27, font: 'semi' },
        { header: 'Value', width: 0.1, align: 'right' },
        { header: 'Unit', width: 0.17 },
        { header: 'Where it comes from', width: 0.46 },
      ],
      factorLines(a, units).map((l) => ({ cells: [l.name, l.value, l.note ? { text: l.unit, note: l.note } : l.unit, l.source] })),
    );
  }

  const actions = plan.actions.filter((x) => x.fieldId === field.fieldId);
  label(frame, 'Planned work');
  if (actions.length) drawTable(frame, ACTION_COLUMNS, actions.map((x) => actionRow(x, units)));
  else paragraph(frame, 'No work planned on this field this season.', { colour: INK.soft });
  afterThePlan(frame, field, plan, units);
  frame.doc.moveDown(0.8);
}
