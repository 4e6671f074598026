import { createHash, randomBytes } from 'node:crypto';

/** A fresh secret for an e-mail link and the hash we store instead of it. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

/** SHA-256 hex of a link secret: a leaked table does not give working links. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export const VERIFY_TTL_MS = 48 * 3600_000;
export const RESET_TTL_MS = 3600_000;
