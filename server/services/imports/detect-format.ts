// Tells an upload's kind from its content (magic bytes, first characters), using the file
// name's extension only to word the answer when the content is not recognised.
import { decodeText, looksBinary } from './decode-text';
import { failure, type ImportFailure } from './import-types';

export const ACCEPTED_FORMATS =
  'Fieldshed reads field boundaries from GeoJSON (.geojson or .json), a zipped shapefile ' +
  '(a .zip holding the .shp, .shx, .dbf and .prj of a layer), KML (.kml) or KMZ (.kmz)';

export type DetectedFormat = { kind: 'zip' } | { kind: 'json'; text: string } | { kind: 'kml'; text: string };

const startsWith = (bytes: Uint8Array, sig: number[]) => sig.every((b, i) => bytes[i] === b);

/** Binary kinds people upload by mistake, with a word of advice for each. */
const KNOWN_BINARIES: { sig: number[]; what: string }[] = [
  { sig: [0x89, 0x50, 0x4e, 0x47], what: 'a PNG image' },
  { sig: [0xff, 0xd8, 0xff], what: 'a JPEG image' },
  { sig: [0x47, 0x49, 0x46, 0x38], what: 'a GIF image' },
  { sig: [0x25, 0x50, 0x44, 0x46], what: 'a PDF document' },
  { sig: [0x49, 0x49, 0x2a, 0x00], what: 'a TIFF image (an elevation model belongs under Ground, not here)' },
  { sig: [0x4d, 0x4d, 0x00, 0x2a], what: 'a TIFF image (an elevation model belongs under Ground, not here)' },
  { sig: [0x00, 0x00, 0x27, 0x0a], what: 'a bare .shp file (zip it together with its .shx, .dbf and .prj)' },
  { sig: [0x1f, 0x8b], what: 'a gzip archive (use a .zip instead)' },
  { sig: [0x52, 0x61, 0x72, 0x21], what: 'a RAR archive (use a .zip instead)' },
  { sig: [0x37, 0x7a, 0xbc, 0xaf], what: 'a 7z archive (use a .zip instead)' },
];

const KML_ROOT = /<(?:[A-Za-z_][\w.-]*:)?kml[\s>/]/;

function unsupported(what: string): ImportFailure {
  return failure(415, 'unsupported_file_type', `This file is ${what}. ${ACCEPTED_FORMATS}.`);
}

function extensionOf(name: string): string {
  const dot = name.lastIndexOf('.');
  return dot < 0 ? '' : name.slice(dot + 1).toLowerCase();
}

/** The upload's format, or the failure to answer with (empty or unsupported file). */
export function detectFormat(bytes: Uint8Array, originalName: string): DetectedFormat | ImportFailure {
  const ext = extensionOf(originalName);
  if (bytes.length === 0) {
    return failure(400, 'empty_file', `The file is empty (0 bytes). ${ACCEPTED_FORMATS}.`);
  }
  if (startsWith(bytes, [0x50, 0x4b, 0x03, 0x04]) || startsWith(bytes, [0x50, 0x4b, 0x05, 0x06])) return { kind: 'zip' };
  if (ext === 'zip' || ext === 'kmz') {
    const what = ext === 'zip' ? 'zip archive' : 'KMZ (zip) archive';
    const known = KNOWN_BINARIES.find((b) => startsWith(bytes, b.sig));
    const found = known ? `: it is ${known.what}` : ': it does not start with the zip signature "PK"';
    return failure(400, 'invalid_zip', `The file is named .${ext} but is not a ${what}${found}.`);
  }
  const known = KNOWN_BINARIES.find((b) => startsWith(bytes, b.sig));
  if (known) return unsupported(known.what);
  if (looksBinary(bytes)) return unsupported('binary data of a kind Fieldshed does not read');

  const text = decodeText(bytes);
  const body = text.trimStart();
  if (body.length === 0) {
    return failure(400, 'empty_file', `The file holds only blank space. ${ACCEPTED_FORMATS}.`);
  }
  if (body[0] === '{' || body[0] === '[') return { kind: 'json', text };
  if (body[0] === '<') {
    if (KML_ROOT.test(body)) return { kind: 'kml', text };
    const root = /<([A-Za-z_][\w.:-]*)[\s>/]/.exec(body.replace(/<\?[\s\S]*?\?>|<!--[\s\S]*?-->|<![^>]*>/g, ''))?.[1];
    return unsupported(root ? `an XML document whose root is <${root}>, not KML` : 'XML, but not KML');
  }
  const start = JSON.stringify(body.slice(0, 20));
  if (ext === 'geojson' || ext === 'json') {
    return failure(400, 'invalid_json', `The file is not valid JSON: it should start with "{" but starts with ${start}.`);
  }
  if (ext === 'kml') {
    return failure(400, 'invalid_xml', `The file is not valid KML: it should start with "<" but starts with ${start}.`);
  }
  return unsupported(`text that is neither JSON nor KML (it starts with ${start})`);
}
