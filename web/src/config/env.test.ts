import { describe, expect, it } from 'vitest';
import { parseEnv } from './env.js';

describe('parseEnv', () => {
  it('defaults to the same origin', () => {
    expect(parseEnv({})).toEqual({ apiBaseUrl: '' });
  });

  it('accepts a URL or a path and drops the trailing slash', () => {
    expect(parseEnv({ VITE_API_BASE_URL: 'https://api.example.org/' }).apiBaseUrl).toBe('https://api.example.org');
    expect(parseEnv({ VITE_API_BASE_URL: '/homeground/' }).apiBaseUrl).toBe('/homeground');
  });

  it('names the bad variable', () => {
    expect(() => parseEnv({ VITE_API_BASE_URL: 'ftp://x' })).toThrow(/VITE_API_BASE_URL/);
  });
});
