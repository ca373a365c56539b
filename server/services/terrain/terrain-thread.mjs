// Entry of the terrain worker thread. A worker started from vitest does not inherit a
// TypeScript loader (under `tsx` it does), so the thread loads its TypeScript through tsx's
// API, which works in both.
import { tsImport } from 'tsx/esm/api';

await tsImport('./terrain-thread.ts', import.meta.url);
