// The session cookie: a signed JWT naming the user and a random session token. The token's hash is
// a row in user_sessions, so signing out, a new password or an expiry ends the session at once;
// the row is checked in the same query that loads the user (User.findSignedIn).
import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import type { Response } from 'express';
import type { Transaction } from 'sequelize';
import type { Config } from '../config';
import { UserSession } from '../models';
import { hashToken, newToken } from './one-time-token';

export const SESSION_COOKIE = 'fieldshed_session';

const keys = new Map<string, KeyObject>();

/**
 * The HMAC key as a KeyObject, made once per secret. Given a string, jsonwebtoken first tries
 * to read it as a PEM public key and throws, on every request: ~10 % of a field list's time.
 */
function sessionKey(config: Config): KeyObject {
  let key = keys.get(config.sessionSecret);
  if (!key) {
    key = createSecretKey(Buffer.from(config.sessionSecret, 'utf8'));
    keys.set(config.sessionSecret, key);
  }
  return key;
}

/** Starts a session for the user and sets its cookie; gives the new session's token hash. */
export async function issueSession(res: Response, config: Config, userId: number, transaction?: Transaction): Promise<string> {
  const { token, hash } = newToken();
  await UserSession.removeExpiredOf(userId);
  await UserSession.create({ userId, tokenHash: hash, expiresAt: new Date(Date.now() + config.sessionHours * 3600 * 1000) }, { transaction });
  const signed = jwt.sign({ sub: String(userId), sid: token }, sessionKey(config), { algorithm: 'HS256', expiresIn: `${config.sessionHours}h` });
  res.cookie(SESSION_COOKIE, signed, {
    httpOnly: true,
    sameSite: 'lax',
    secure: config.isProduction,
    maxAge: config.sessionHours * 3600 * 1000,
    path: '/',
  });
  return hash;
}

/** Ends the session in the cookie (if any) and clears the cookie. */
export async function endSession(res: Response, config: Config, cookie: string | undefined): Promise<void> {
  const session = readSession(cookie, config);
  if (session) await UserSession.endByHash(session.tokenHash);
  res.clearCookie(SESSION_COOKIE, { httpOnly: true, sameSite: 'lax', secure: config.isProduction, path: '/' });
}

/** The user id and session token hash of a validly signed, unexpired cookie, or null. */
export function readSession(cookie: string | undefined, config: Config): { userId: number; tokenHash: string } | null {
  if (!cookie) return null;
  try {
    const payload = jwt.verify(cookie, sessionKey(config), { algorithms: ['HS256'] }) as { sub?: string; sid?: string };
    const userId = Number(payload.sub);
    if (!Number.isInteger(userId) || userId <= 0 || typeof payload.sid !== 'string') return null;
    return { userId, tokenHash: hashToken(payload.sid) };
  } catch {
    return null;
  }
}
