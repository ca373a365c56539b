// Reads the committed import fixtures (made by scripts/make-import-fixtures.ts) and parses them.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { Position } from 'geojson';
import { parseBoundaryFile, type ParseResult, type ParsedBoundary, type ParsedItem, type RejectedFeature } from '../../../server/services/imports/parse-boundaries';

const dir = fileURLToPath(new URL('../../fixtures/imports/', import.meta.url));

export const fixture = (name: string): Buffer => readFileSync(dir + name);
export const fixtureJson = <T = unknown>(name: string): T => JSON.parse(readFileSync(dir + name, 'utf8')) as T;

export function parseFixture(name: string): Promise<ParseResult> {
  return parseBoundaryFile({ buffer: fixture(name), originalName: name });
}
export function parseText(text: string, originalName = 'upload.geojson'): Promise<ParseResult> {
  return parseBoundaryFile({ buffer: Buffer.from(text, 'utf8'), originalName });
}

/** The items of a successful parse; fails the test with the message otherwise. */
export function itemsOf(result: ParseResult): ParsedItem[] {
  if (!result.ok) throw new Error(`expected a parsed file, got ${result.status} ${result.error}: ${result.message}`);
  return result.items;
}
export function boundary(item: ParsedItem): ParsedBoundary {
  if ('rejected' in item) throw new Error(`expected a boundary, got rejected: ${item.rejected}`);
  return item;
}
export function rejection(item: ParsedItem): RejectedFeature {
  if (!('rejected' in item)) throw new Error(`expected a rejection, got boundary ${item.name}`);
  return item;
}

/** Every position of a geometry's coordinates. */
export function allPositions(coords: unknown): Position[] {
  if (!Array.isArray(coords)) return [];
  if (typeof coords[0] === 'number') return [coords as Position];
  return coords.flatMap(allPositions);
}
