// Words for where in a Polygon or MultiPolygon a schema issue sits ("polygon 2, hole 1, point 4").
import type { z } from 'zod';

/** Path of a zod issue on an AreaGeometry → words; '' when the issue is about the whole geometry. */
export function describePath(type: 'Polygon' | 'MultiPolygon', path: readonly PropertyKey[]): string {
  if (path[0] !== 'coordinates') return '';
  const rest = path.slice(1).filter((k): k is number => typeof k === 'number');
  const parts: string[] = [];
  if (type === 'MultiPolygon' && rest.length > 0) parts.push(`polygon ${rest.shift()! + 1}`);
  const ring = rest.shift();
  if (ring !== undefined) parts.push(ring === 0 ? 'outer ring' : `hole ${ring}`);
  const point = rest.shift();
  if (point !== undefined) parts.push(`point ${point + 1}`);
  return parts.join(', ');
}

/** The first issue, placed: "outer ring: a ring needs at least 3 distinct corners". */
export function describeIssue(type: 'Polygon' | 'MultiPolygon', error: z.ZodError): string {
  const issue = error.issues[0];
  const where = describePath(type, issue.path);
  return where ? `${where}: ${issue.message}` : issue.message;
}
