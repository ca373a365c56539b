import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import type { Config } from '../config';
import { Login, Register, REGISTER_ANSWER, RegisterConfirm, UpdateMe } from '../../shared/schemas/auth';
import { ChangePassword, ForgotPassword, NoticeSettingsUpdate, ResetPassword } from '../../shared/schemas/people';
import { validate } from '../middleware/validate';
import { requireUser } from '../middleware/auth';
import { perAddressLimit, perIpLimit } from '../middleware/rate-limits';
import { signIn, updateProfile } from '../services/auth.service';
import { confirmRegistration, requestRegistration } from '../services/people/registration.service';
import { changePassword, forgotPassword, resetPassword } from '../services/people/passwords.service';
import { noticeSettings, putNoticeSettings } from '../services/notice-settings.service';
import { LINK_USES_PER_IP, REGISTRATIONS_PER_IP, RESETS_PER_IP, SIGNINS_PER_ADDRESS, SIGNINS_PER_IP } from '../services/people/abuse-limits';
import { presentUser } from '../presenters/user.presenter';
import { endSession, issueSession, SESSION_COOKIE } from '../services/sessions';

export function authRoutes(sequelize: Sequelize, config: Config): Router {
  const r = Router();
  const signInIpLimit = perIpLimit(SIGNINS_PER_IP, 'Too many sign-in attempts from this network; wait a quarter of an hour and try again.', 'too_many_attempts');
  const signInAddressLimit = perAddressLimit(SIGNINS_PER_ADDRESS, 'Too many sign-in attempts for this address; wait a quarter of an hour and try again.', 'too_many_attempts');
  const registerLimit = perIpLimit(REGISTRATIONS_PER_IP, 'Too many new accounts asked for from this network; wait a quarter of an hour.');
  const forgotLimit = perIpLimit(RESETS_PER_IP, 'Too many requests for a new password from this network; wait a quarter of an hour.');
  const forgotAddressLimit = perAddressLimit(RESETS_PER_IP, 'Too many requests for a new password for this address; wait a quarter of an hour.');
  const linkLimit = perIpLimit(LINK_USES_PER_IP, 'Too many attempts from this network; wait a quarter of an hour.');

  // The same answer whether or not the address has an account: the rest happens by mail.
  r.post('/register', registerLimit, validate(Register), async (req, res) => {
    await requestRegistration(sequelize, config, req.body);
    res.status(202).json({ ok: true, message: REGISTER_ANSWER });
  });

  r.post('/register/confirm', linkLimit, validate(RegisterConfirm), async (req, res) => {
    const user = await confirmRegistration(sequelize, req.body.token);
    await issueSession(res, config, user.id);
    res.status(201).json({ user: presentUser(user) });
  });

  r.post('/login', signInIpLimit, signInAddressLimit, validate(Login), async (req, res) => {
    const user = await signIn(req.body.email, req.body.password);
    await issueSession(res, config, user.id);
    res.json({ user: presentUser(user) });
  });

  r.post('/logout', async (req, res) => {
    await endSession(res, config, req.cookies?.[SESSION_COOKIE]);
    res.status(204).end();
  });

  // The same answer whether or not the address has an account.
  r.post('/forgot', forgotLimit, forgotAddressLimit, validate(ForgotPassword), async (req, res) => {
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
