// The field name of an imported feature, from the first name-like property that holds one.
import { cleanText } from '../../../shared/schemas/plain-text';

/** Property keys tried in this order, compared without regard to case. */
export const NAME_KEYS = ['name', 'field', 'field_name', 'label', 'title', 'id'] as const;
/** Longest name kept (the FieldName schema in shared/schemas/field.ts allows 120). */
export const MAX_NAME_LENGTH = 120;

/** The first non-empty string or finite number under a name-like key, trimmed; null if none. */
export function pickName(properties: Record<string, unknown> | null): string | null {
  if (!properties || typeof properties !== 'object') return null;
  const keys = Object.keys(properties);
  for (const wanted of NAME_KEYS) {
    for (const key of keys) {
      if (key.toLowerCase() !== wanted) continue;
      const value = properties[key];
      const text = typeof value === 'string' ? cleanText(value).replace(/\s+/g, ' ').trim()
        : typeof value === 'number' && Number.isFinite(value) ? String(value)
        : '';
      if (text) return text.slice(0, MAX_NAME_LENGTH).trimEnd();
    }
  }
  return null;
}
