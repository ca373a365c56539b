// Text for a shapefile's .dbf. dBase stores one byte per character and @mapbox/shp-write writes
// each character's code as one byte, so text is kept to ISO-8859-1 (Latin-1, named in the .cpg
// beside it): Latin-1 letters stay as they are (é, ß, ×), other letters lose their accents (ő → o),
// dashes and curly quotes become their plain forms, anything else becomes "?".
const PLAIN: Record<string, string> = { '–': '-', '—': '-', '‘': "'", '’': "'", '“': '"', '”': '"', '…': '...', '≤': '<=', '≥': '>=' };

export const DBF_CODE_PAGE = 'ISO-8859-1';

export function dbfText(text: string): string {
  let out = '';
  for (const ch of text) {
    if (ch.charCodeAt(0) <= 0xff && ch.length === 1) out += ch;
    else if (PLAIN[ch]) out += PLAIN[ch];
    else {
      const base = ch.normalize('NFKD').replace(/[\u0300-\u036f]/g, '');
      out += base.length && [...base].every((c) => c.charCodeAt(0) <= 0xff) ? base : '?';
    }
  }
  return out;
}
