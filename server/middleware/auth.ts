import type { RequestHandler } from 'express';
import type { Config } from '../config';
import { User } from '../models';
import { unauthorized } from '../lib/http-error';
import { readSession, SESSION_COOKIE } from '../services/sessions';

/**
 * Loads req.user (and req.memberships) for a live session in the cookie; 401 when nobody is
 * signed in. One query: the session row, the user and their memberships.
 */
export function requireUser(config: Config): RequestHandler {
  return async (req, res, next) => {
    const session = readSession(req.cookies?.[SESSION_COOKIE], config);
    const signedIn = session ? await User.findSignedIn(session.userId, session.tokenHash) : null;
    if (!signedIn || !session) throw unauthorized();
    req.user = signedIn.user;
    req.memberships = signedIn.memberships;
    res.locals.sessionTokenHash = session.tokenHash;
    next();
  };
}
