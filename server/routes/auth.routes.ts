import { Router } from 'express';
import rateLimit, { ipKeyGenerator } from 'express-rate-limit';
import type { Sequelize } from 'sequelize';
import type { Config } from '../config';
import { Login, Register, UpdateMe } from '../../shared/schemas/auth';
import { validate } from '../middleware/validate';
import { requireUser } from '../middleware/auth';
import { register, signIn, updateProfile } from '../services/auth.service';
import { presentUser } from '../presenters/user.presenter';
import { clearSession, issueSession } from '../services/sessions';

export function authRoutes(sequelize: Sequelize, config: Config): Router {
  const r = Router();
  // Per address and e-mail, so one person's typing does not lock out a whole office.
  const loginLimit = rateLimit({
    windowMs: 10 * 60 * 1000,
    limit: 20,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '').toLowerCase()}`,
    handler: (_req, res) => {
      res.status(429).json({ error: 'too_many_attempts', message: 'Too many sign-in attempts; wait ten minutes and try again.' });
    },
  });

  r.post('/register', validate(Register), async (req, res) => {
    const user = await register(sequelize, req.body);
    issueSession(res, config, user.id);
    res.status(201).json({ user: presentUser(user) });
  });

  r.post('/login', loginLimit, validate(Login), async (req, res) => {
    const user = await signIn(req.body.email, req.body.password);
    issueSession(res, config, user.id);
    res.json({ user: presentUser(user) });
  });

  r.post('/logout', (_req, res) => {
    clearSession(res, config);
    res.status(204).end();
  });

  r.get('/me', requireUser(config), (req, res) => {
    res.json({ user: presentUser(req.user!) });
  });

  r.patch('/me', requireUser(config), validate(UpdateMe), async (req, res) => {
    res.json({ user: presentUser(await updateProfile(req.user!, req.body)) });
  });
  return r;
}
