import { describe, expect, it } from '@jest/globals';
import { validateEnv } from './env.validation.js';

describe('environment validation', () => {
  it('fills defaults for a fresh machine', () => {
    expect(validateEnv({})).toMatchObject({ PORT: 3000, DATABASE: 'data/homeground.sqlite', NODE_ENV: 'development' });
  });

  it('refuses to start on bad values and names every bad variable', () => {
    expect(() => validateEnv({ PORT: 'eighty', JWT_SECRET: 'short', NODE_ENV: 'staging' })).toThrow(
      /PORT[\s\S]*JWT_SECRET|JWT_SECRET[\s\S]*PORT/,
    );
    expect(() => validateEnv({ NODE_ENV: 'staging' })).toThrow(/NODE_ENV/);
  });
});
