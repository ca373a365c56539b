// Signed JWT in an httpOnly SameSite cookie: the API stays stateless (DESIGN.md scale path).
import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import type { Response } from 'express';
import type { Config } from '../config';

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

export function issueSession(res: Response, config: Config, userId: number): void {
  const token = jwt.sign({ sub: String(userId) }, sessionKey(config), { algorithm: 'HS256', expiresIn: `${config.sessionHours}h` });
  res.cookie(SESSION_COOKIE, token, {
    httpOnly: true,
    sameSite: 'lax',
    secure: config.isProduction,
    maxAge: config.sessionHours * 3600 * 1000,
    path: '/',
  });
}

export function clearSession(res: Response, config: Config): void {
  res.clearCookie(SESSION_COOKIE, { httpOnly: true, sameSite: 'lax', secure: config.isProduction, path: '/' });
}

/** The user id in a valid, unexpired token, or null. */
export function readSession(token: string | undefined, config: Config): number | null {
  if (!token) return null;
  try {
    const payload = jwt.verify(token, sessionKey(config), { algorithms: ['HS256'] }) as { sub?: string };
    const id = Number(payload.sub);
    return Number.isInteger(id) && id > 0 ? id : null;
  } catch {
    return null;
  }
}
