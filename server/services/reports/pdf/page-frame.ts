// The report's pages: margins, the room left on the current page, and each page's footer. A
// page that lists careful work (earthwork, drainage, lime, gypsum) carries that work's cautions
// and the deferral to local standards and licensed professionals in its footer; the footer's
// height is reserved as the work is listed, so nothing runs into it. Footers (page numbers, the
// date made) are drawn once every page exists.
import { CAREFUL_WORK, CAUTIONS, DEFER_TO_LOCAL_PRACTICE, TREATMENT_CAUTIONS } from '../../../../shared/erosion/treatments/cautions';
import type { TreatmentKey } from '../../../../shared/erosion/treatments/types';
import { INK } from './fonts';

const MARGIN = 48;
const FOOTER_LINE = 22;
const CAUTION_SIZE = 7.5;

export type FooterWords = { left: string; right: string };

export class PageFrame {
  readonly left = MARGIN;
  readonly top = MARGIN;
  private careful: Set<TreatmentKey>[] = [new Set()];

  constructor(readonly doc: PDFKit.PDFDocument) {}

  get right(): number {
    return this.doc.page.width - MARGIN;
  }
  get width(): number {
    return this.right - this.left;
  }
  get y(): number {
    return this.doc.y;
  }
  private get page(): number {
    return this.careful.length - 1;
  }

  /** The caution sentences for careful work, with the deferral; none when no careful work is listed. */
  private cautionText(keys: Set<TreatmentKey>): string | null {
    const shown = [...keys].filter((k) => CAREFUL_WORK.includes(k));
    if (!shown.length) return null;
    const sentences = [...new Set(shown.flatMap((k) => TREATMENT_CAUTIONS[k].map((c) => CAUTIONS[c])))];
    return `Take care. ${DEFER_TO_LOCAL_PRACTICE} ${sentences.join(' ')}`;
  }

  private cautionHeight(keys: Set<TreatmentKey>): number {
    const text = this.cautionText(keys);
    if (!text) return 0;
    this.doc.font('body').fontSize(CAUTION_SIZE);
    return this.doc.heightOfString(text, { width: this.width - 12, lineGap: 1 }) + 14;
  }

  /** The lowest y content may reach on this page with this work listed on it. */
  private floor(keys: Set<TreatmentKey>): number {
    return this.doc.page.height - MARGIN - FOOTER_LINE - this.cautionHeight(keys);
  }

  /** Whether a block this tall, listing this work, fits on the current page. */
  fits(height: number, work: TreatmentKey[] = []): boolean {
    const keys = new Set([...this.careful[this.page], ...work]);
    return this.doc.y + height <= this.floor(keys);
  }

  /** Starts a new page unless the block fits; records the work listed. True when a page was added. */
  ensure(height: number, work: TreatmentKey[] = []): boolean {
    const added = !this.fits(height, work);
    if (added) this.newPage();
    for (const k of work) this.careful[this.page].add(k);
    return added;
  }

  newPage(): void {
    this.doc.addPage();
    this.careful.push(new Set());
    this.doc.x = this.left;
    this.doc.y = this.top;
  }

  /** Draws every page's footer: its cautions, then the words and "page n of N". */
  finish(words: FooterWords): void {
    const { doc } = this;
    const range = doc.bufferedPageRange();
    for (let i = 0; i < range.count; i++) {
      doc.switchToPage(range.start + i);
      // Text below the bottom margin would start a new page: lift the margin while drawing the footer.
      const margin = doc.page.margins.bottom;
      doc.page.margins.bottom = 0;
      const lineY = doc.page.height - MARGIN - 10;
      const caution = this.cautionText(this.careful[i] ?? new Set());
      if (caution) {
        const h = this.cautionHeight(this.careful[i]);
        const boxY = lineY - h;
        doc.save().rect(this.left, boxY, this.width, h - 6).fill(INK.cautionLight).restore();
        doc.rect(this.left, boxY, 2.5, h - 6).fill(INK.caution);
        doc.font('body').fontSize(CAUTION_SIZE).fillColor(INK.text).text(caution, this.left + 8, boxY + 4, { width: this.width - 12, lineGap: 1 });
      }
      doc.moveTo(this.left, lineY).lineTo(this.right, lineY).lineWidth(0.5).strokeColor(INK.rule).stroke();
      doc.font('body').fontSize(7.5).fillColor(INK.soft);
      doc.text(words.left, this.left, lineY + 5, { width: this.width * 0.7, lineBreak: false });
      doc.text(`${words.right} · page ${i + 1} of ${range.count}`, this.left, lineY + 5, { width: this.width, align: 'right', lineBreak: false });
      doc.page.margins.bottom = margin;
    }
  }
}
