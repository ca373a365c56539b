// Each benchmark owns one marked section of docs/benchmarks.md and replaces only that section,
// so running one benchmark keeps the others' figures.
import { existsSync, readFileSync, writeFileSync } from 'node:fs';

/** Writes `body` between `<!-- name:start -->` and `<!-- name:end -->` in `path`, appending the section when it is missing. */
export function writeDocSection(path: string, name: string, body: string): void {
  const start = `<!-- ${name}:start -->`;
  const end = `<!-- ${name}:end -->`;
  const section = `${start}\n${body.trim()}\n${end}`;
  const doc = existsSync(path) ? readFileSync(path, 'utf8') : '';
  const from = doc.indexOf(start);
  const to = doc.indexOf(end);
  const next = from >= 0 && to > from ? doc.slice(0, from) + section + doc.slice(to + end.length) : `${doc.trimEnd()}\n\n${section}\n`;
  writeFileSync(path, next.trimStart());
}
