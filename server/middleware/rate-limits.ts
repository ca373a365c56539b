// Per-IP limits on the routes that send mail or take one-time links (express-rate-limit, memory
// store: each API instance counts its own). The per-sender and per-address limits are in the services.
import rateLimit, { ipKeyGenerator } from 'express-rate-limit';
import { IP_WINDOW_MS } from '../services/people/abuse-limits';

export function perIpLimit(limit: number, message: string) {
  return rateLimit({
    windowMs: IP_WINDOW_MS,
    limit,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    keyGenerator: (req) => ipKeyGenerator(req.ip ?? ''),
    handler: (_req, res) => {
      res.status(429).json({ error: 'too_many_requests', message });
    },
  });
}
