import { describe, expect, it } from '@jest/globals';
import { hashPassword, verifyPassword } from './password.js';

describe('password hashing (scrypt, OWASP Password Storage Cheat Sheet minimum N=2^17, r=8, p=1)', () => {
  it('salts every hash and verifies only the right password', async () => {
    const a = await hashPassword('sedge-meadow-2026');
    const b = await hashPassword('sedge-meadow-2026');
    expect(a).not.toBe(b);
    expect(a.split('$').slice(0, 4)).toEqual(['scrypt', '131072', '8', '1']);
    await expect(verifyPassword('sedge-meadow-2026', a)).resolves.toBe(true);
    await expect(verifyPassword('sedge-meadow-2027', a)).resolves.toBe(false);
  });

  it('rejects hashes of another scheme instead of guessing', async () => {
    await expect(verifyPassword('x', 'md5$abc')).resolves.toBe(false);
  });
});
