import { createHash } from 'node:crypto';
import { HttpException, HttpStatus, Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { ApiError, WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { IsNull, Not, Repository } from 'typeorm';
import { SignInFailureRow } from './sign-in-failure.entity.js';

/** Failures allowed before an address is held back (OWASP Authentication Cheat Sheet: a handful). */
export const FREE_FAILURES = 5;
/** The first hold; each further failure doubles it, up to the cap. */
const FIRST_HOLD_MS = 60_000;
const MAX_HOLD_MS = 15 * 60_000;
/** A quiet day forgives old failures. */
const FORGET_AFTER_MS = 24 * 60 * 60_000;

/**
 * Per-account back-off for sign-in, beside the per-address limit: after {@link FREE_FAILURES} wrong
 * passwords for one e-mail address, further attempts for it wait 1, 2, 4 … up to 15 minutes, from any
 * address. Counted per address typed, whether or not an account exists, so the answer never tells who
 * has one; kept in the database so several API instances share it.
 */
@Injectable()
export class SignInBackoffService {
  constructor(@InjectRepository(SignInFailureRow) private readonly rows: Repository<SignInFailureRow>) {}

  /** Throws 429 with Retry-After while the address is held back. */
  async assertAllowed(email: string, now = new Date(), locale: WordLocale = 'en'): Promise<void> {
    const row = await this.rows.findOneBy({ emailKey: keyFor(email) });
    if (!row?.lockedUntil || row.lockedUntil <= now) return;
    const seconds = Math.ceil((row.lockedUntil.getTime() - now.getTime()) / 1000);
    const body: ApiError & { retryAfterSeconds: number } = {
      statusCode: 429,
      error: 'Too Many Requests',
      message: apiWords(locale)('auth.tooManyWrong', { count: Math.ceil(seconds / 60) }),
      retryAfterSeconds: seconds,
    };
    throw new HttpException(body, HttpStatus.TOO_MANY_REQUESTS);
  }

  /** Counts one wrong password and holds the address back once the free failures are used up. */
  async recordFailure(email: string, now = new Date()): Promise<void> {
    const emailKey = keyFor(email);
    const row = await this.rows.findOneBy({ emailKey });
    const stale = !row || now.getTime() - row.lastFailureAt.getTime() > FORGET_AFTER_MS;
    const failures = stale ? 1 : row.failures + 1;
    const over = failures - FREE_FAILURES + 1;
    const lockedUntil =
      over > 0 ? new Date(now.getTime() + Math.min(MAX_HOLD_MS, FIRST_HOLD_MS * 2 ** (over - 1))) : null;
    await this.rows.save({ emailKey, failures, lastFailureAt: now, lockedUntil });
  }

  /** A right password clears the count. */
  async recordSuccess(email: string): Promise<void> {
    await this.rows.delete({ emailKey: keyFor(email) });
  }

  /** Which of these addresses are held back now (for the admin's people page), in one query. */
  async heldEmails(emails: readonly string[], now = new Date()): Promise<Set<string>> {
    const byKey = new Map(emails.map((e) => [keyFor(e), e]));
    // Compared here rather than in SQL: the drivers store datetimes in different text forms, and the
    // table only ever holds the addresses with recent failures.
    const rows = await this.rows.find({ where: { lockedUntil: Not(IsNull()) } });
    return new Set(
      rows
        .filter((r) => r.lockedUntil !== null && r.lockedUntil > now)
        .map((r) => byKey.get(r.emailKey))
        .filter((e): e is string => e !== undefined),
    );
  }

  /** Whether the address is held back now (for the admin's people page). */
  async isLocked(email: string, now = new Date()): Promise<boolean> {
    const row = await this.rows.findOneBy({ emailKey: keyFor(email) });
    return !!row?.lockedUntil && row.lockedUntil > now;
  }
}

function keyFor(email: string): string {
  return createHash('sha256').update(email.trim().toLowerCase()).digest('hex');
}
