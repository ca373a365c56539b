// Signed JWT in an httpOnly SameSite cookie: the API stays stateless (DESIGN.md scale path).
import jwt from 'jsonwebtoken';
import type { Response } from 'express';
import type { Config } from '../config';

export const SESSION_COOKIE = 'fieldshed_session';

export function issueSession(res: Response, config: Config, userId: number): void {
  const token = jwt.sign({ sub: String(userId) }, config.sessionSecret, { expiresIn: `${config.sessionHours}h` });
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
    const payload = jwt.verify(token, config.sessionSecret) as { sub?: string };
    const id = Number(payload.sub);
    return Number.isInteger(id) && id > 0 ? id : null;
  } catch {
    return null;
  }
}
