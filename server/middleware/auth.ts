import type { RequestHandler } from 'express';
import type { Config } from '../config';
import { User } from '../models';
import { unauthorized } from '../lib/http-error';
import { readSession, SESSION_COOKIE } from '../services/sessions';

/** Loads req.user (and req.memberships) from the session cookie; 401 when nobody is signed in. */
export function requireUser(config: Config): RequestHandler {
  return async (req, _res, next) => {
    const id = readSession(req.cookies?.[SESSION_COOKIE], config);
    const signedIn = id ? await User.findSignedIn(id) : null;
    if (!signedIn) throw unauthorized();
    req.user = signedIn.user;
    req.memberships = signedIn.memberships;
    next();
  };
}
