// GET /api/dev/mailbox: what the local fake mail server caught. Mounted only while the fake is in
// use (SMTP_URL unset); with a real mail server the route does not exist (404). It needs no
// sign-in, so that someone who forgot their password can read the reset mail in development.
import { Router } from 'express';
import { devMailbox } from '../services/mail/dev-mailbox.service';

export function devMailboxRoutes(): Router {
  const r = Router();
  r.get('/mailbox', async (req, res) => {
    res.json(await devMailbox(typeof req.query.to === 'string' ? req.query.to : undefined));
  });
  return r;
}
