// Limits on the routes that sign in, create accounts, send mail or take one-time links
// (express-rate-limit, memory store: each API instance counts its own). Per network address, and
// per e-mail address normalised as the schemas do (trim, NFKC, lower case), so " Farmer@X" and
// "farmer@x" share one allowance. The per-sender and per-account limits are in the services.
import rateLimit, { ipKeyGenerator } from 'express-rate-limit';
import { normaliseEmail } from '../../shared/schemas/auth';
import { IP_WINDOW_MS } from '../services/people/abuse-limits';

function limiter(limit: number, key: (req: import('express').Request) => string | null, error: string, message: string) {
  return rateLimit({
    windowMs: IP_WINDOW_MS,
    limit,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    // A request without an address is not counted here; the schema answers it 400.
    skip: (req) => key(req) === null,
    keyGenerator: (req) => key(req)!,
    handler: (_req, res) => {
      res.status(429).json({ error, message });
    },
  });
}

export function perIpLimit(limit: number, message: string, error = 'too_many_requests') {
  return limiter(limit, (req) => ipKeyGenerator(req.ip ?? ''), error, message);
}

/** Keyed on the body's `email`, normalised; every network address counts towards the same limit. */
export function perAddressLimit(limit: number, message: string, error = 'too_many_requests') {
  return limiter(limit, (req) => (typeof req.body?.email === 'string' && req.body.email.trim() ? normaliseEmail(req.body.email) : null), error, message);
}
