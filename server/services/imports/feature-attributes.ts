// A feature's attributes as the preview shows them, and the attribute a field's name comes from.

export type AttributeValue = string | number | boolean | null;

/** Longest name kept (the FieldName schema in shared/schemas/field.ts allows 120). */
export const MAX_NAME_LENGTH = 120;

/** Plain values only: dates as ISO text, other objects as JSON text. */
export function plainAttributes(properties: Record<string, unknown> | null): Record<string, AttributeValue> {
  const out: Record<string, AttributeValue> = {};
  for (const [key, value] of Object.entries(properties ?? {})) {
    if (value === null || value === undefined) out[key] = null;
    else if (typeof value === 'string' || typeof value === 'boolean') out[key] = value;
    else if (typeof value === 'number') out[key] = Number.isFinite(value) ? value : null;
    else if (value instanceof Date) out[key] = Number.isNaN(value.getTime()) ? null : value.toISOString().slice(0, 10);
    else out[key] = JSON.stringify(value);
  }
  return out;
}

/** The value of `key` as a field name: trimmed text or a finite number; null when empty. */
export function nameFrom(properties: Record<string, unknown> | null, key: string | null): string | null {
  if (!properties || key === null || !Object.hasOwn(properties, key)) return null;
  const value = properties[key];
  const text = typeof value === 'string' ? value.replace(/\s+/g, ' ').trim()
    : typeof value === 'number' && Number.isFinite(value) ? String(value)
    : '';
  return text ? text.slice(0, MAX_NAME_LENGTH).trimEnd() : null;
}

/** Every key of `rows`, in first-seen order. */
export function attributeKeys(rows: (Record<string, unknown> | null)[]): string[] {
  const keys = new Set<string>();
  for (const row of rows) for (const key of Object.keys(row ?? {})) keys.add(key);
  return [...keys];
}
