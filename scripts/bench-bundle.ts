// `npm run bench` (after the terrain benchmark): the client's script per screen, as the browser
// fetches it before the screen can be used: the app entry and the screen's chunk with every chunk
// they import statically (chunks loaded later on demand, such as charts and the drawing tools, are
// listed apart). Sizes are of the brotli and gzip copies the build writes (scripts/precompress-plugin.ts)
// and the server sends. Builds the client first unless `--no-build`; `--no-write` prints only.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { writeDocSection } from './doc-section';

type Chunk = { file: string; isEntry?: boolean; isDynamicEntry?: boolean; imports?: string[]; dynamicImports?: string[]; css?: string[] };

const args = process.argv.slice(2);
const dist = path.resolve('dist');
if (!args.includes('--no-build')) {
  const built = spawnSync('npx', ['vite', 'build', '--logLevel', 'error'], { stdio: 'inherit' });
  if (built.status !== 0) throw new Error('vite build failed');
}
const manifest = JSON.parse(readFileSync(path.join(dist, '.vite/manifest.json'), 'utf8')) as Record<string, Chunk>;

/** The screens, by the page module the router loads for them, with the targets of the plan for a lean client. */
const SCREENS: Array<{ name: string; page: string | null; targetKb?: number }> = [
  { name: 'Farms (the app entry alone)', page: null },
  { name: 'Sign in', page: 'src/pages/sign-in-page.tsx' },
  { name: 'Farm map', page: 'src/pages/farm-map-page.tsx', targetKb: 200 },
  { name: 'Field', page: 'src/pages/field-page.tsx', targetKb: 250 },
  { name: 'Priority board', page: 'src/pages/board-page.tsx', targetKb: 250 },
  { name: 'Treatments and budget', page: 'src/pages/budget-page.tsx' },
  { name: 'Season plan', page: 'src/pages/plan-page.tsx' },
  { name: 'Landowner view', page: 'src/pages/landowner-plan-page.tsx' },
  { name: 'Quick estimate', page: 'src/pages/estimate-page.tsx' },
  { name: 'People', page: 'src/pages/people-page.tsx' },
];

/** Bytes of a file's compressed copy (made now if the build wrote none). */
function compressedBytes(file: string, ext: '.gz' | '.br'): number {
  const p = path.join(dist, file);
  if (existsSync(p + ext)) return statSync(p + ext).size;
  return ext === '.gz' ? gzipSync(readFileSync(p), { level: 9 }).length : statSync(p).size;
}

/** Every script a chunk pulls in statically, itself included. */
function staticClosure(key: string, seen = new Set<string>()): Set<string> {
  if (seen.has(key)) return seen;
  seen.add(key);
  for (const k of manifest[key]?.imports ?? []) staticClosure(k, seen);
  return seen;
}

const entry = Object.keys(manifest).find((k) => manifest[k].isEntry);
if (!entry) throw new Error('the manifest names no entry');
const kb = (b: number) => (b / 1024).toFixed(1);
const rows = SCREENS.map((s) => {
  const keys = staticClosure(entry);
  if (s.page) staticClosure(s.page, keys);
  const scripts = [...keys].map((k) => manifest[k].file).filter((f) => f.endsWith('.js'));
  const later = new Set<string>();
  for (const k of keys) for (const d of manifest[k].dynamicImports ?? []) if (!keys.has(d) && !manifest[d].file.includes('-page-')) later.add(d);
  const laterKeys = new Set<string>();
  for (const d of later) staticClosure(d, laterKeys);
  const laterScripts = [...laterKeys].filter((k) => !keys.has(k)).map((k) => manifest[k].file).filter((f) => f.endsWith('.js'));
  return {
    ...s,
    chunks: scripts.length,
    rawBytes: scripts.reduce((a, f) => a + statSync(path.join(dist, f)).size, 0),
    gzBytes: scripts.reduce((a, f) => a + compressedBytes(f, '.gz'), 0),
    brBytes: scripts.reduce((a, f) => a + compressedBytes(f, '.br'), 0),
    laterGzBytes: laterScripts.reduce((a, f) => a + compressedBytes(f, '.gz'), 0),
    later: [...later].map((k) => path.basename(k).replace(/\.tsx?$/, '')),
  };
});

const lines = [
  '# Client bundle',
  '',
  `Run with \`npm run bench\` (scripts/bench-bundle.ts) after \`vite build\`; Vite ${JSON.parse(readFileSync('node_modules/vite/package.json', 'utf8')).version}.`,
  'Script a screen needs before it can be used: the app entry and the screen\'s own chunk with every chunk both import',
  'statically, counted as the brotli and gzip copies the build writes and the server sends (the server picks brotli',
  'when the browser accepts it). Chunks loaded later, when a chart or the drawing tools first show, are counted apart.',
  'Stylesheets and fonts are not counted.',
  '',
  '| screen | chunks | script KB | gzip KB | brotli KB | target, gzip KB | loaded later on the screen (gzip KB) |',
  '|---|---:|---:|---:|---:|---|---|',
  ...rows.map((r) => `| ${r.name} | ${r.chunks} | ${kb(r.rawBytes)} | ${kb(r.gzBytes)} | ${kb(r.brBytes)} | ${r.targetKb ? `≤ ${r.targetKb} ${r.gzBytes / 1024 <= r.targetKb ? '(met)' : '(not met)'}` : '—'} | ${r.later.length ? `${r.later.join(', ')} (${kb(r.laterGzBytes)})` : '—'} |`),
];
console.log(lines.join('\n'));
if (!args.includes('--no-write')) writeDocSection('docs/benchmarks.md', 'bundle-benchmark', lines.join('\n'));
