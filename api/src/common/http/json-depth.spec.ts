import { describe, expect, it } from '@jest/globals';
import { assertJsonDepth, firstTooDeep, JsonTooDeepError } from './json-depth.js';

const bytes = (s: string) => Buffer.from(s);

describe('JSON depth scan (raw bytes, before parsing)', () => {
  it.each([
    ['a flat object', '{"a":1}', 1, -1],
    ['two levels within a limit of two', '{"a":[1]}', 2, -1],
    ['three levels over a limit of two', '{"a":[{}]}', 2, 6],
    ['brackets inside strings do not count', '{"a":"[[[[{{{{"}', 1, -1],
    ['an escaped quote does not end the string', '{"a":"\\"[[["}', 1, -1],
    ['an escaped backslash before the closing quote', '{"a":"\\\\","b":[[1]]}', 2, 15],
    ['sibling arrays do not add up', '[[1],[2],[3]]', 2, -1],
  ])('%s', (_what, json, max, at) => {
    expect(firstTooDeep(bytes(json), max)).toBe(at);
  });

  it('refuses 2,000 levels in a 4 KB body with a 400 naming the field', () => {
    const deep = '['.repeat(2000) + ']'.repeat(2000);
    expect(() => assertJsonDepth(deep, 32, 'file')).toThrow(JsonTooDeepError);
    try {
      assertJsonDepth(deep, 32, 'file');
    } catch (e) {
      expect((e as JsonTooDeepError).status).toBe(400);
      expect((e as JsonTooDeepError).fields).toEqual([
        { field: 'file', message: 'is nested more than 32 levels deep' },
      ]);
    }
  });
});
