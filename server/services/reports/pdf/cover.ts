// The first page: farm, season, the plan's state and who approved it when, the plan in a few
// figures, who the copy was made for and in what units, and what the pages hold.
import { formatArea, UNIT_LABELS } from '../../../../shared/format/units';
import { formatMoney } from '../../../../shared/format/money';
import { tonnesFigure } from '../../../../shared/format/loss-units';
import type { Units } from '../../../../shared/schemas/auth';
import type { Plan } from '../../../../shared/schemas/plans';
import type { ReportData } from '../report-data';
import { dateWords, stateWords } from '../report-words';
import { INK } from './fonts';
import type { PageFrame } from './page-frame';

/** Tonnes a year the plan keeps on the fields, and how many fields' work could not be predicted. */
function keptWords(plan: Plan, units: Units): string {
  const missed = plan.prediction.fields.filter((f) => !f.ok).length;
  const kept = tonnesFigure(plan.prediction.tonnesSavedPerYr, units).main;
  return missed ? `${kept} (work on ${missed} field${missed === 1 ? '' : 's'} could not be predicted: see its page)` : kept;
}

export function drawCover(frame: PageFrame, data: ReportData): void {
  const { doc } = frame;
  const { plan, reader } = data;
  doc.font('semi').fontSize(9).fillColor(INK.accent).text('FIELDSHED · SEASON PLAN ON PAPER', frame.left, frame.top, { characterSpacing: 1.2 });
  doc.moveDown(2.5);
  doc.font('heading').fontSize(28).fillColor(INK.text).text(data.farmName, { width: frame.width });
  doc.font('heading').fontSize(18).fillColor(INK.soft).text(`Season ${plan.season}`, { width: frame.width });
  doc.moveDown(1.2);

  const approved = plan.state === 'approved';
  const boxY = doc.y;
  doc.font('semi').fontSize(11);
  const words = stateWords(plan);
  const boxH = doc.heightOfString(words, { width: frame.width - 24 }) + 30;
  doc.rect(frame.left, boxY, frame.width, boxH).fill(approved ? '#eef3e6' : INK.cautionLight);
  doc.font('semi').fontSize(8).fillColor(INK.soft).text(`THE PLAN'S STATE: ${plan.state.toUpperCase()}`, frame.left + 12, boxY + 8, { characterSpacing: 0.8 });
  doc.font('semi').fontSize(11).fillColor(INK.text).text(words, frame.left + 12, doc.y + 2, { width: frame.width - 24 });
  doc.y = boxY + boxH + 18;

  const area = data.fields.reduce((s, f) => s + f.areaHa, 0);
  const figures: [string, string][] = [
    ['Fields in this copy', `${data.fields.length} (${formatArea(area, reader.units)})`],
    ['Planned actions', String(plan.actions.length)],
    ['Planned cost', formatMoney(plan.totals.cost, plan.currency)],
    ['Soil kept on the fields, predicted', keptWords(plan, reader.units)],
  ];
  for (const [label, value] of figures) {
    const y = doc.y;
    doc.font('body').fontSize(10).fillColor(INK.soft).text(label, frame.left, y, { width: frame.width * 0.45 });
    // The value column sets doc.x; the lines below start at the margin again.
    doc.font('semi').fontSize(10).fillColor(INK.text).text(value, frame.left + frame.width * 0.45, y, { width: frame.width * 0.55, features: ['tnum'] });
    doc.x = frame.left;
    doc.moveDown(0.35);
  }
  doc.moveDown(1);

  const only = reader.role === 'landowner' ? ' This copy holds only the fields you own, as the plan was last approved.' : '';
  doc
    .font('body')
    .fontSize(9)
    .fillColor(INK.soft)
    .text(
      `Made on ${dateWords(data.madeAt)} for ${reader.name} (${reader.role}). Areas in ${UNIT_LABELS[reader.units]}; soil loss in ${reader.units === 'ac' ? 'US tons per acre a year, with tonnes per hectare beside' : 'tonnes per hectare a year'}.${only}`,
      { width: frame.width, lineGap: 1.5 },
    );
  doc.moveDown(1);
  doc.font('semi').fontSize(10).fillColor(INK.text).text('In this report');
  doc.font('body').fontSize(9).fillColor(INK.text);
  for (const line of ['The map: each field coloured by its risk class', 'Field by field: the figures behind each estimate, the planned work and A after the plan', 'Farm totals', 'Month by month: when the work is planned', 'Take care: cautions for the work in this plan']) {
    doc.text(`·  ${line}`, { width: frame.width, lineGap: 2 });
  }
  doc.moveDown(1.2);
  doc
    .font('body')
    .fontSize(8)
    .fillColor(INK.soft)
    .text(
      'Soil loss is estimated with RUSLE (USDA Agriculture Handbook 703) and runoff with the curve-number method (NRCS National Engineering Handbook part 630). The estimates are planning aids for comparing fields and treatments, not measurements or designs.',
      { width: frame.width, lineGap: 1.5 },
    );
}
