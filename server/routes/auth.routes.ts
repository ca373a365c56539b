import { Router } from 'express';
import rateLimit, { ipKeyGenerator } from 'express-rate-limit';
import type { Sequelize } from 'sequelize';
import type { Config } from '../config';
import { Login, Register, UpdateMe } from '../../shared/schemas/auth';
import { ChangePassword, ForgotPassword, NoticeSettingsUpdate, ResetPassword } from '../../shared/schemas/people';
import { validate } from '../middleware/validate';
import { requireUser } from '../middleware/auth';
import { perIpLimit } from '../middleware/rate-limits';
import { register, signIn, updateProfile } from '../services/auth.service';
import { changePassword, forgotPassword, resetPassword } from '../services/people/passwords.service';
import { noticeSettings, putNoticeSettings } from '../services/notice-settings.service';
import { LINK_USES_PER_IP, RESETS_PER_IP } from '../services/people/abuse-limits';
import { presentUser } from '../presenters/user.presenter';
import { endSession, issueSession, SESSION_COOKIE } from '../services/sessions';

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

  const forgotLimit = perIpLimit(RESETS_PER_IP, 'Too many requests for a new password from this network; wait a quarter of an hour.');
  const linkLimit = perIpLimit(LINK_USES_PER_IP, 'Too many attempts from this network; wait a quarter of an hour.');

  r.post('/register', validate(Register), async (req, res) => {
    const user = await register(sequelize, req.body);
    await issueSession(res, config, user.id);
    res.status(201).json({ user: presentUser(user) });
  });

  r.post('/login', loginLimit, validate(Login), async (req, res) => {
    const user = await signIn(req.body.email, req.body.password);
    await issueSession(res, config, user.id);
    res.json({ user: presentUser(user) });
  });

  r.post('/logout', async (req, res) => {
    await endSession(res, config, req.cookies?.[SESSION_COOKIE]);
    res.status(204).end();
  });

  // The same answer whether or not the address has an account.
  r.post('/forgot', forgotLimit, validate(ForgotPassword), async (req, res) => {
    await forgotPassword(sequelize, config, req.body.email);
    res.status(202).json({ ok: true, message: 'If that address has an account, a link to choose a new password is on its way.' });
  });

  r.post('/reset', linkLimit, validate(ResetPassword), async (req, res) => {
    const user = await resetPassword(sequelize, req.body.token, req.body.password);
    await issueSession(res, config, user.id);
    res.json({ user: presentUser(user) });
  });

  r.post('/password', linkLimit, requireUser(config), validate(ChangePassword), async (req, res) => {
    await changePassword(sequelize, req.user!, res.locals.sessionTokenHash as string, req.body);
    res.status(204).end();
  });

  r.get('/me/notices', requireUser(config), async (req, res) => {
    res.json(await noticeSettings(req.user!.id));
  });

  r.put('/me/notices', requireUser(config), validate(NoticeSettingsUpdate), async (req, res) => {
    res.json(await putNoticeSettings(req.user!.id, req.body));
  });

  r.get('/me', requireUser(config), (req, res) => {
    res.json({ user: presentUser(req.user!) });
  });

  r.patch('/me', requireUser(config), validate(UpdateMe), async (req, res) => {
    res.json({ user: presentUser(await updateProfile(req.user!, req.body)) });
  });
  return r;
}
