// The terrain thread's code as one JavaScript file, so the thread starts in plain Node: no
// TypeScript loader to start inside it, and one file to parse instead of some 200 modules
// (geotiff, proj4 and their decoders included). esbuild bundles terrain-thread.ts into
// node_modules/.cache/fieldshed/, the file named by a hash of every input's name and contents,
// of this file (which holds the build options) and of the source tree's path: any change gives a
// new file, so a bundle never runs code older than its sources. A small manifest per source tree
// lists the inputs, so a start with the bundle in place only reads and hashes them; a missing or
// stale bundle is built again (a fraction of a second) and the one it replaces is removed.
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { BuildOptions, Plugin } from 'esbuild';

const ROOT = fileURLToPath(new URL('../../../', import.meta.url));
const THIS_FILE = fileURLToPath(import.meta.url);
const ENTRY = fileURLToPath(new URL('./terrain-thread.ts', import.meta.url));
const CACHE_DIR = path.join(ROOT, 'node_modules', '.cache', 'fieldshed');

/**
 * Modules under shared/schemas only declare zod schemas, so loading one does nothing else: one
 * whose exports go unused may be left out, and zod with it (0.75 MB of script the thread would
 * load only because slope-classes.ts validates class lists with it).
 */
const schemasHaveNoSideEffects: Plugin = {
  name: 'schemas-have-no-side-effects',
  setup(build) {
    build.onResolve({ filter: /\/schemas\// }, async (args) => {
      if (args.pluginData === 'resolved') return undefined;
      const resolved = await build.resolve(args.path, { kind: args.kind, importer: args.importer, resolveDir: args.resolveDir, pluginData: 'resolved' });
      const inSchemas = resolved.path.startsWith(path.join(ROOT, 'shared', 'schemas') + path.sep);
      return inSchemas ? { ...resolved, sideEffects: false } : resolved;
    });
  },
};

/**
 * How Fieldshed bundles code to run in plain Node (this thread, and the benchmark's job process):
 * one ESM file per entry with the packages inside; esbuild itself stays outside (only imported
 * to build).
 */
export const NODE_BUNDLE_OPTIONS: BuildOptions = {
  absWorkingDir: ROOT,
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  external: ['esbuild'],
  plugins: [schemasHaveNoSideEffects],
  logLevel: 'warning',
};

type Manifest = { key: string; inputs: string[] };
const manifestFile = path.join(CACHE_DIR, `terrain-thread-${createHash('sha256').update(ROOT).digest('hex').slice(0, 12)}.json`);
const bundleFile = (key: string) => path.join(CACHE_DIR, `terrain-thread-${key}.mjs`);

/** Hash of the inputs (names and contents), the build options' file and the source tree; null when an input is gone. */
function keyOf(inputs: string[]): string | null {
  const hash = createHash('sha256').update(ROOT).update('\0').update(readFileSync(THIS_FILE));
  for (const input of inputs) {
    const file = path.resolve(ROOT, input);
    if (!existsSync(file)) return null;
    hash.update('\0').update(input).update('\0').update(readFileSync(file));
  }
  return hash.digest('hex').slice(0, 16);
}

function readManifest(): Manifest | null {
  try {
    return JSON.parse(readFileSync(manifestFile, 'utf8')) as Manifest;
  } catch {
    return null;
  }
}

/** Writes a whole file or nothing (another process may be reading or writing the same name). */
function writeWhole(file: string, contents: string | Uint8Array): void {
  const part = `${file}.${process.pid}.${Math.random().toString(36).slice(2)}.part`;
  writeFileSync(part, contents);
  renameSync(part, file);
}

async function build(previous: Manifest | null): Promise<string> {
  const esbuild = await import('esbuild');
  const result = await esbuild.build({ ...NODE_BUNDLE_OPTIONS, entryPoints: [ENTRY], write: false, metafile: true });
  const inputs = Object.keys(result.metafile.inputs);
  const key = keyOf(inputs);
  if (!key) throw new Error('A source file of the terrain thread went missing while it was bundled.');
  mkdirSync(CACHE_DIR, { recursive: true });
  writeWhole(bundleFile(key), result.outputFiles[0].contents);
  writeWhole(manifestFile, JSON.stringify({ key, inputs } satisfies Manifest));
  if (previous && previous.key !== key) rmSync(bundleFile(previous.key), { force: true });
  return bundleFile(key);
}

/** The path of an up-to-date bundle of terrain-thread.ts, built when missing or stale. */
export async function terrainThreadFile(): Promise<string> {
  const manifest = readManifest();
  if (manifest) {
    const key = keyOf(manifest.inputs);
    if (key === manifest.key && existsSync(bundleFile(key))) return bundleFile(key);
  }
  return build(manifest);
}
