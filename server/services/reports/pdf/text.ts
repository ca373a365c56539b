// Headings and paragraphs that keep clear of the page's footer.
import type { TreatmentKey } from '../../../../shared/erosion/treatments/types';
import { INK } from './fonts';
import type { PageFrame } from './page-frame';

export function heading(frame: PageFrame, text: string, size = 15, keepWith = 60): void {
  const { doc } = frame;
  // ensure() measures the footer in its own type: set the type again after it.
  frame.ensure(doc.font('heading').fontSize(size).heightOfString(text, { width: frame.width }) + keepWith);
  doc.font('heading').fontSize(size).fillColor(INK.text).text(text, frame.left, doc.y, { width: frame.width });
  doc.moveDown(0.3);
}

/** A paragraph; `work` names careful work it lists, so its page carries that work's cautions. */
export function paragraph(frame: PageFrame, text: string, opts: { size?: number; colour?: string; font?: 'body' | 'semi' | 'bold'; work?: TreatmentKey[] } = {}): void {
  const { doc } = frame;
  const type = () => doc.font(opts.font ?? 'body').fontSize(opts.size ?? 9);
  frame.ensure(type().heightOfString(text, { width: frame.width, lineGap: 1.5 }), opts.work);
  type().fillColor(opts.colour ?? INK.text).text(text, frame.left, doc.y, { width: frame.width, lineGap: 1.5 });
  doc.moveDown(0.4);
}

/** A colour swatch and the risk class's words on one line. */
export function riskLine(frame: PageFrame, colour: string, words: string): void {
  const { doc } = frame;
  frame.ensure(14);
  const y = doc.y;
  doc.rect(frame.left, y + 1, 12, 9).fillAndStroke(colour, INK.faint);
  doc.font('semi').fontSize(9).fillColor(INK.text).text(words, frame.left + 17, y, { width: frame.width - 17 });
  doc.moveDown(0.3);
}

/** A small bold line that heads a table or a few lines, kept with `keepWith` points of what follows. */
export function label(frame: PageFrame, text: string, colour: string = INK.text, keepWith = 40): void {
  const { doc } = frame;
  frame.ensure(keepWith);
  doc.font('semi').fontSize(10).fillColor(colour).text(text, frame.left, doc.y, { width: frame.width });
  doc.moveDown(0.2);
}
