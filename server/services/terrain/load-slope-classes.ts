// The one file of the terrain service that reads from disk: the farm-wide default slope classes
// from data/reference/slope-classes.json when that file exists and parses, else the inline default.
import { readFileSync, existsSync } from 'node:fs';
import { DEFAULT_SLOPE_CLASSES, parseSlopeClasses, type SlopeClass } from './slope-classes';

export function loadDefaultSlopeClasses(path = 'data/reference/slope-classes.json'): SlopeClass[] {
  if (!existsSync(path)) return DEFAULT_SLOPE_CLASSES.map((c) => ({ ...c }));
  const parsed = parseSlopeClasses(JSON.parse(readFileSync(path, 'utf8')));
  return parsed.ok ? parsed.classes : DEFAULT_SLOPE_CLASSES.map((c) => ({ ...c }));
}
