// Number boxes of the forms: empty is null ("not given"), a comma may be the decimal
// mark; and the schema's messages without the field path the label already names.
export const toNumberOrNull = (raw: unknown): number | null => {
  if (typeof raw === 'number') return Number.isNaN(raw) ? null : raw;
  const s = String(raw ?? '').trim().replace(',', '.');
  return s === '' ? null : Number(s);
};

export function plainMessage(message: string | undefined): string | undefined {
  if (!message) return undefined;
  const m = /^[a-z][\w.-]*\s+(must be|is required|needs)(.*)$/i.exec(message);
  if (!m) return message;
  const verb = m[1] === 'is required' ? 'Required' : `${m[1][0].toUpperCase()}${m[1].slice(1)}`;
  return `${verb}${m[2]}`;
}
