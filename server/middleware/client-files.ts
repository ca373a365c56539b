// Serves the client build (dist/): the brotli or gzip copy written at build time
// (scripts/precompress-plugin.ts) when the browser accepts it, else the file itself. Files under
// assets/ carry a content hash in their names, so they are cached for a year and never
// revalidated; anything else (icons, the app shell) is revalidated on every use.
import express, { type RequestHandler } from 'express';
import { existsSync } from 'node:fs';
import path from 'node:path';

const HASHED = /^\/assets\//;
const YEAR_S = 365 * 24 * 3600;
const ENCODINGS = [
  { name: 'br', ext: '.br' },
  { name: 'gzip', ext: '.gz' },
] as const;

/** Which compressed copies exist beside each file, looked up once per path. */
function copiesOf(dist: string): (urlPath: string) => Set<string> {
  const known = new Map<string, Set<string>>();
  return (urlPath) => {
    let found = known.get(urlPath);
    if (!found) {
      const file = path.join(dist, urlPath);
      found = new Set(ENCODINGS.filter((e) => existsSync(file + e.ext)).map((e) => e.name));
      if (known.size < 10_000) known.set(urlPath, found);
    }
    return found;
  };
}

export function clientFiles(dist: string): RequestHandler[] {
  const copies = copiesOf(dist);
  const cacheHeaders = (res: express.Response, urlPath: string) =>
    res.setHeader('Cache-Control', HASHED.test(urlPath) ? `public, max-age=${YEAR_S}, immutable` : 'no-cache');
  const compressed: RequestHandler = (req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    let urlPath: string;
    try {
      urlPath = decodeURIComponent(req.path);
    } catch {
      return next();
    }
    // Only plain paths inside dist/ (no dot segments, which express.static also refuses).
    if (urlPath.includes('..') || urlPath.includes('\0') || urlPath.endsWith('/')) return next();
    const available = copies(urlPath);
    if (available.size === 0) return next();
    const accepted = ENCODINGS.find((e) => available.has(e.name) && req.acceptsEncodings(e.name) === e.name);
    res.vary('Accept-Encoding');
    if (!accepted) return next();
    res.type(path.extname(urlPath));
    res.setHeader('Content-Encoding', accepted.name);
    cacheHeaders(res, urlPath);
    res.sendFile(path.join(dist, urlPath + accepted.ext), { cacheControl: false, dotfiles: 'deny' }, (e) => e && next(e));
  };
  const plain = express.static(dist, { index: false, cacheControl: false, setHeaders: (res, file) => cacheHeaders(res as express.Response, '/' + path.relative(dist, file).split(path.sep).join('/')) });
  return [compressed, plain];
}
