// Cross-site request forgery defence: a state-changing request (POST, PUT, PATCH, DELETE, multipart
// included) must come from the product's own pages. Browsers name the page's origin in the Origin
// header of every request that is not GET or HEAD (WHATWG Fetch, "append a request Origin header";
// "null" where the origin is hidden, which is refused), and Referer is read when Origin is missing.
// Allowed: PUBLIC_URL's origin, ALLOWED_ORIGINS, and the origin of the Host the request was sent to
// (same-host: the app itself, the Vite dev proxy, a server reached by its own address).
// A request with neither Origin nor Referer is not from a browser page (a script, curl, a test):
// it cannot carry a victim's cookie without the victim's browser, so it passes. OWASP CSRF
// Prevention Cheat Sheet, "Verifying origin with standard headers".
import type { RequestHandler } from 'express';
import { HttpError } from '../lib/http-error';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

function originOf(value: string): string | null {
  try {
    const u = new URL(value);
    return u.protocol === 'http:' || u.protocol === 'https:' ? u.origin : null;
  } catch {
    return null;
  }
}

export function sameOrigin(allowedOrigins: string[]): RequestHandler {
  const allowed = new Set(allowedOrigins.map(originOf).filter((o): o is string => o !== null));
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const header = req.get('origin') ?? req.get('referer');
    if (header === undefined) return next();
    const origin = originOf(header);
    if (origin && (allowed.has(origin) || new URL(origin).host === req.get('host'))) return next();
    throw new HttpError(403, 'cross_site_request', `This request came from another site (${header.slice(0, 100)}); Fieldshed takes changes only from its own pages.`);
  };
}
