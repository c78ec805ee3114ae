import { createHash, randomBytes } from 'node:crypto';

/** A private link's secret: 32 random bytes as 43 base64url characters. Only its SHA-256 is stored. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export const hashToken = (token: string): string => createHash('sha256').update(token).digest('hex');
