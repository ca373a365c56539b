// KML text → raw features, with @xmldom/xmldom and @tmcw/togeojson. Documents with a DOCTYPE
// or ENTITY declaration are refused before parsing: no external entities, no entity expansion.
import { DOMParser } from '@xmldom/xmldom';
import { kml } from '@tmcw/togeojson';
import { failure, type RawFeature, type ReadResult } from './import-types';

const DECLARATION = /<!\s*(DOCTYPE|ENTITY)\b/i;
// Scanned left to right like an XML tokenizer, so a comment cannot hide a declaration.
const CDATA_OR_COMMENT = /<!\[CDATA\[[\s\S]*?\]\]>|<!--[\s\S]*?-->/g;

/** Reads KML 2.2; the Placemark's <name> becomes properties.name. */
export function readKml(text: string): ReadResult {
  // HTML in a CDATA description may say <!DOCTYPE html>; that is text, not a declaration.
  const declared = DECLARATION.exec(text.replace(CDATA_OR_COMMENT, ''));
  if (declared) {
    return failure(400, 'xml_declaration_not_allowed',
      `The KML file contains a <!${declared[1].toUpperCase()}> declaration. For safety Fieldshed does not read XML with DOCTYPE or ENTITY declarations: remove that block (KML does not need it) and upload again.`);
  }
  let problem: string | null = null;
  let doc;
  try {
    doc = new DOMParser({
      locator: true,
      onError: (level, message, context) => {
        if (level === 'warning') return;
        const line = (context as { locator?: { lineNumber?: number } } | undefined)?.locator?.lineNumber;
        problem ??= line ? `line ${line}: ${message}` : message;
        throw new Error(message);
      },
    }).parseFromString(text, 'text/xml');
  } catch (e) {
    const message = (problem ?? ((e as Error).message || 'unreadable')).replace(/\s+/g, ' ').trim();
    return failure(400, 'invalid_xml', `The KML file is not well-formed XML (${message}). Check that it was saved completely.`);
  }
  let features: RawFeature[];
  try {
    features = kml(doc).features.map((f) => ({ geometry: f.geometry, properties: (f.properties ?? null) as Record<string, unknown> | null }));
  } catch (e) {
    return failure(400, 'invalid_kml', `The KML could not be read (${(e as Error).message}).`);
  }
  return { ok: true, features, warnings: [] };
}
