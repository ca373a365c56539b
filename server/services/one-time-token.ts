// Random tokens for links and sessions: 32 random bytes (256 bits) in base64url; the database
// keeps only the SHA-256 hash, so a copy of the database opens nothing.
import { createHash, randomBytes } from 'node:crypto';

export const hashToken = (token: string): string => createHash('sha256').update(token, 'utf8').digest('hex');

export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}
