// The name an imported feature gets from one of its attributes; the import preview on the client
// and the import on the server read names the same way.
import { cleanText } from './text-rules';

/** Longest name kept (the FieldName schema in shared/schemas/field.ts allows 120). */
export const MAX_NAME_LENGTH = 120;

/** The value of `key` as a field name: trimmed text without control or hidden characters or a finite number; null when empty or absent. */
export function nameFromAttribute(attributes: Record<string, unknown> | null, key: string | null): string | null {
  if (!attributes || key === null || !Object.hasOwn(attributes, key)) return null;
  const value = attributes[key];
  const text = typeof value === 'string' ? cleanText(value).replace(/\s+/g, ' ').trim()
    : typeof value === 'number' && Number.isFinite(value) ? String(value)
    : '';
  return text ? text.slice(0, MAX_NAME_LENGTH).trimEnd() : null;
}
