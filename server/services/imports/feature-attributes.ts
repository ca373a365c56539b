// A feature's attributes as the preview shows them.

export type AttributeValue = string | number | boolean | null;

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

/** Every key of `rows`, in first-seen order. */
export function attributeKeys(rows: (Record<string, unknown> | null)[]): string[] {
  const keys = new Set<string>();
  for (const row of rows) for (const key of Object.keys(row ?? {})) keys.add(key);
  return [...keys];
}
