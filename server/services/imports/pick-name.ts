// The field name of an imported feature, from the first name-like property that holds one.
import { nameFromAttribute as nameFrom } from '../../../shared/feature-name';

/** Property keys tried in this order, compared without regard to case. */
export const NAME_KEYS = ['name', 'fieldname', 'field', 'field_name', 'label', 'title', 'id'] as const;

/** The first non-empty string or finite number under a name-like key, trimmed; null if none. */
export function pickName(properties: Record<string, unknown> | null): string | null {
  if (!properties || typeof properties !== 'object') return null;
  const keys = Object.keys(properties);
  for (const wanted of NAME_KEYS) {
    for (const key of keys) {
      if (key.toLowerCase() !== wanted) continue;
      const name = nameFrom(properties, key);
      if (name) return name;
    }
  }
  return null;
}

/** The first key (in NAME_KEYS order) among `keys` that gives a name in at least one of `rows`. */
export function proposeNameAttribute(keys: string[], rows: (Record<string, unknown> | null)[]): string | null {
  for (const wanted of NAME_KEYS) {
    for (const key of keys) {
      if (key.toLowerCase() === wanted && rows.some((row) => nameFrom(row, key) !== null)) return key;
    }
  }
  return null;
}
