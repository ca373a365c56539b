// The text of each page of a PDF, as a person copying it out would read it: PDF.js (pdfjs-dist,
// Mozilla's reader) pulls each page's text items in reading order; no canvas or native code.
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

export async function pdfPageTexts(pdf: Buffer): Promise<string[]> {
  const doc = await getDocument({ data: new Uint8Array(pdf), isEvalSupported: false, useSystemFonts: false, verbosity: 0 }).promise;
  const pages: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent();
    pages.push(
      content.items
        .map((item) => ('str' in item ? item.str + (item.hasEOL ? '\n' : ' ') : ''))
        .join('')
        .replace(/[ \t]+/g, ' '),
    );
  }
  await doc.destroy();
  return pages;
}
