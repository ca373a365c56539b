// What each import warning means, in plain words, with areas in the user's unit.
import type { Units } from '../../../../shared/schemas/auth';
import type { ImportWarning, PreviewFeature } from '../../../../shared/schemas/field-import';
import { formatArea } from '../../../lib/units';
import { nameFromAttribute } from '../../../../shared/feature-name';

export function warningWords(warning: ImportWarning, units: Units): string {
  switch (warning.kind) {
    case 'no_prj_assumed_wgs84':
      return `The shapefile layer "${warning.layer}" came without its .prj file, so its coordinates were read as plain longitude and latitude (WGS84). If the outline sits in the wrong place, add the .prj to the zip.`;
    case 'repaired':
      // PostGIS's reason ends with the spot in brackets ("Self-intersection[-91.77 42.30]"); the map shows where.
      return `The outline in the file crosses itself or is otherwise not a clean shape (${warning.reason.replace(/\s*\[.*\]\s*$/, '')}). Fieldshed untangled it; the dashed line on the map is the original. Accept the repaired outline to import it.`;
    case 'parts_left_out':
      return `Some parts were left out: ${warning.detail}.`;
    case 'overlaps_field':
      return `It overlaps your field "${warning.name}" by ${formatArea(warning.overlapHa, units)}.`;
    case 'same_as_field':
      return `It is the same as your field "${warning.name}", so it is left unticked. Tick it only if you want a second copy.`;
  }
}

export const isRepaired = (f: PreviewFeature) => f.warnings.some((w) => w.kind === 'repaired');
export const isDuplicate = (f: PreviewFeature) => f.warnings.some((w) => w.kind === 'same_as_field');

/** The name a feature would get from `attribute`, or null when it holds none (the server then numbers it). */
export const previewName = (f: PreviewFeature, attribute: string | null) => nameFromAttribute(f.attributes, attribute);
