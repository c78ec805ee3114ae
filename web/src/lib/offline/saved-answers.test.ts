import { describe, expect, it } from 'vitest';
import { ApiRequestError, NETWORK_ERROR_STATUS } from '../api-request-error.js';
import { forgetSavedAnswers, tokenOwner, withSavedCopy } from './saved-answers.js';

/**
 * The device's kept answers (fake-indexeddb in jsdom). What is checked is the app's own promise on
 * My batches: with no signal the last answer shows with when it was taken, only to the person it
 * belongs to, never instead of a refusal, and not after signing out.
 */
const offline = () =>
  Promise.reject(new ApiRequestError({ statusCode: NETWORK_ERROR_STATUS, error: 'Network error', message: 'offline' }));

describe('withSavedCopy', () => {
  it('answers fresh data online and the kept copy, with its time, offline', async () => {
    const fresh = await withSavedCopy('amara', 'batches:larkfield', () => Promise.resolve({ n: 1 }));
    expect(fresh).toEqual({ data: { n: 1 }, savedAt: null });
    const kept = await withSavedCopy('amara', 'batches:larkfield', offline);
    expect(kept.data).toEqual({ n: 1 });
    expect(Number.isNaN(Date.parse(kept.savedAt ?? ''))).toBe(false);
  });

  it("never gives one person's copy to another", async () => {
    await withSavedCopy('amara', 'batches:larkfield', () => Promise.resolve({ who: 'amara' }));
    await expect(withSavedCopy('theo', 'batches:larkfield', offline)).rejects.toThrow('offline');
  });

  it('passes a refusal on rather than showing the copy', async () => {
    await withSavedCopy('amara', 'batches:larkfield', () => Promise.resolve({ n: 2 }));
    const refused = new ApiRequestError({ statusCode: 403, error: 'Forbidden', message: 'not a grower' });
    await expect(withSavedCopy('amara', 'batches:larkfield', () => Promise.reject(refused))).rejects.toBe(refused);
  });

  it('keeps nothing after signing out', async () => {
    await withSavedCopy('amara', 'batches:larkfield', () => Promise.resolve({ n: 3 }));
    await forgetSavedAnswers();
    await expect(withSavedCopy('amara', 'batches:larkfield', offline)).rejects.toThrow('offline');
  });

  it('keys a session by a digest of its token, never the token itself', async () => {
    const owner = await tokenOwner('header.payload.signature');
    expect(owner).toMatch(/^token:[0-9a-f]{64}$/);
    expect(owner).not.toContain('payload');
    expect(await tokenOwner('header.payload.signature')).toBe(owner);
  });
});
