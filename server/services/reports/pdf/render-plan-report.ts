// Draws the plan report: the cover, the map, a section per field (highest risk first), farm
// totals, the work month by month and the cautions; then every page's footer. Letter paper for
// readers who work in acres, A4 for hectares.
import PDFDocument from 'pdfkit';
import type { ReportData, ReportField } from '../report-data';
import { dateWords } from '../report-words';
import { drawCover } from './cover';
import { drawFieldSection } from './field-section';
import { drawCautions, drawRanking, drawSchedule, drawTotals } from './farm-sections';
import { registerFonts } from './fonts';
import { PageFrame } from './page-frame';
import { drawRiskMap } from './risk-map';
import { heading, paragraph } from './text';

/** Highest A/T first, as the priority board ranks fields; fields not assessed last, by name. */
function ranked(fields: ReportField[]): ReportField[] {
  const at = (f: ReportField) => f.assessment?.aOverT ?? -1;
  return [...fields].sort((x, y) => at(y) - at(x) || x.name.localeCompare(y.name));
}

export function renderPlanReport(data: ReportData): Promise<Buffer> {
  const doc = new PDFDocument({
    size: data.reader.units === 'ac' ? 'LETTER' : 'A4',
    margin: 48,
    bufferPages: true,
    info: { Title: `${data.farmName}: season plan ${data.plan.season}`, Author: 'Fieldshed', Subject: 'Season plan report', CreationDate: new Date(data.madeAt) },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  registerFonts(doc);
  const frame = new PageFrame(doc);

  drawCover(frame, data);

  frame.newPage();
  heading(frame, 'The map: each field by its risk class');
  if (data.fields.length) {
    const box = { x: frame.left, y: doc.y + 4, w: frame.width, h: Math.min(frame.width * 0.9, doc.page.height * 0.55) };
    doc.y = drawRiskMap(doc, box, data.fields, data.relief, data.reader.units) + 12;
    drawRanking(frame, ranked(data.fields), data);
  } else {
    paragraph(frame, 'There are no fields to show.');
  }

  frame.newPage();
  heading(frame, 'Field by field', 18, 80);
  for (const field of ranked(data.fields)) drawFieldSection(frame, field, data.plan, data.reader.units);

  frame.newPage();
  drawTotals(frame, data);
  doc.moveDown(0.8);
  drawSchedule(frame, data);
  doc.moveDown(0.8);
  drawCautions(frame, data);

  frame.finish({ left: `${data.farmName} · season plan ${data.plan.season} · ${data.plan.state}`, right: `made ${dateWords(data.madeAt)}` });
  doc.end();
  return done;
}
