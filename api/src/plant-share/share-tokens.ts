import { createHash, randomBytes } from 'node:crypto';

/** A private link's secret: 32 random bytes as 43 base64url characters. Only its SHA-256 is stored. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export const hashToken = (token: string): string => createHash('sha256').update(token).digest('hex');

/**
 * Private-link secrets for one unit of work, made outside it: a unit may run again after a deadlock
 * (share-tx.ts), and each run must hand out the same secrets in the same order, so the links e-mailed
 * after it commits are the ones whose hashes it wrote. `rewind()` starts each run from the first one.
 */
export class TokenSupply {
  private readonly made: { token: string; hash: string }[] = [];
  private next = 0;

  /** Starts a (new) run of the unit from the first secret; answers itself for use in the work factory. */
  rewind(): this {
    this.next = 0;
    return this;
  }

  /** The next secret of this run: the same one a previous run had at this point, else a new one. */
  take(): { token: string; hash: string } {
    if (this.next === this.made.length) this.made.push(newToken());
    return this.made[this.next++];
  }
}
