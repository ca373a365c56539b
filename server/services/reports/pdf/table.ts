// A plain table for the report: a header row, rows whose cells wrap, figures right-aligned in
// tabular figures, and the header drawn again when a table runs onto a new page. A row that
// lists careful work tells the page frame, which reserves that page's cautions.
import type { TreatmentKey } from '../../../../shared/erosion/treatments/types';
import { INK, type FontName } from './fonts';
import type { PageFrame } from './page-frame';

export type Column = { header: string; width: number; align?: 'left' | 'right'; font?: FontName };
export type Cell = string | { text: string; note?: string };
export type Row = { cells: Cell[]; work?: TreatmentKey[]; bold?: boolean };

const SIZE = 8.5;
const NOTE_SIZE = 7;
const PAD = 3;

const textOf = (c: Cell) => (typeof c === 'string' ? c : c.text);
const noteOf = (c: Cell) => (typeof c === 'string' ? undefined : c.note);

/** Column widths as fractions of the frame's width. */
function xs(frame: PageFrame, columns: Column[]): { x: number; w: number }[] {
  let x = frame.left;
  return columns.map((c) => {
    const w = c.width * frame.width;
    const at = { x, w };
    x += w;
    return at;
  });
}

function cellHeight(doc: PDFKit.PDFDocument, cell: Cell, w: number, font: FontName): number {
  doc.font(font).fontSize(SIZE);
  let h = doc.heightOfString(textOf(cell) || ' ', { width: w - 2 * PAD });
  const note = noteOf(cell);
  if (note) {
    doc.font('body').fontSize(NOTE_SIZE);
    h += doc.heightOfString(note, { width: w - 2 * PAD }) + 1;
  }
  return h;
}

function drawHeader(frame: PageFrame, columns: Column[]): void {
  const { doc } = frame;
  const at = xs(frame, columns);
  const y = doc.y;
  doc.font('semi').fontSize(7.5).fillColor(INK.soft);
  const h = Math.max(...columns.map((c, i) => doc.heightOfString(c.header, { width: at[i].w - 2 * PAD })));
  columns.forEach((c, i) => doc.text(c.header, at[i].x + PAD, y, { width: at[i].w - 2 * PAD, align: c.align ?? 'left' }));
  const bottom = y + h + PAD;
  doc.moveTo(frame.left, bottom).lineTo(frame.right, bottom).lineWidth(0.75).strokeColor(INK.faint).stroke();
  doc.y = bottom + PAD;
}

export function drawTable(frame: PageFrame, columns: Column[], rows: Row[]): void {
  const { doc } = frame;
  const at = xs(frame, columns);
  frame.ensure(40, rows[0]?.work);
  drawHeader(frame, columns);
  for (const row of rows) {
    const font = (i: number): FontName => (row.bold ? 'semi' : (columns[i].font ?? 'body'));
    const h = Math.max(...row.cells.map((c, i) => cellHeight(doc, c, at[i].w, font(i)))) + 2 * PAD;
    if (frame.ensure(h, row.work)) drawHeader(frame, columns);
    const y = doc.y;
    row.cells.forEach((cell, i) => {
      // Figures (right-aligned columns) in tabular figures, so they line up down the column.
      const opts = { width: at[i].w - 2 * PAD, align: columns[i].align ?? 'left', ...(columns[i].align === 'right' ? { features: ['tnum' as const] } : {}) };
      doc.font(font(i)).fontSize(SIZE).fillColor(INK.text).text(textOf(cell), at[i].x + PAD, y + PAD, opts);
      const note = noteOf(cell);
      if (note) doc.font('body').fontSize(NOTE_SIZE).fillColor(INK.soft).text(note, at[i].x + PAD, doc.y + 1, opts);
    });
    doc.moveTo(frame.left, y + h).lineTo(frame.right, y + h).lineWidth(0.4).strokeColor(INK.rule).stroke();
    doc.y = y + h;
  }
  doc.x = frame.left;
  doc.moveDown(0.6);
}
