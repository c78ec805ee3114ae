import type { IncomingMessage, ServerResponse } from 'node:http';
import type { FieldProblem } from '../validation/bad-request.js';

/** Deepest nesting of objects and arrays a request body may have; real requests need fewer than 10. */
export const MAX_JSON_DEPTH = 32;

/** A body nested too deeply: refused with a 400 before it is parsed, naming the path where it went too deep. */
export class JsonTooDeepError extends Error {
  readonly status = 400;
  readonly statusCode = 400;
  readonly expose = true;
  readonly type = 'entity.too.deep';
  readonly fields: FieldProblem[];

  constructor(at: string, max: number) {
    super(`The request body is nested more than ${max} levels deep.`);
    this.fields = [{ field: at || 'body', message: `is nested more than ${max} levels deep` }];
  }
}

const QUOTE = 0x22;
const BACKSLASH = 0x5c;
const OPEN = new Set([0x7b, 0x5b]); // { [
const CLOSE = new Set([0x7d, 0x5d]); // } ]

/**
 * The nesting depth of raw JSON bytes, scanned without parsing (strings are skipped, escapes
 * honoured), so a small body nested thousands of levels deep never reaches JSON.parse or a
 * validator's recursion. Returns the offset where `max` is first exceeded, or -1.
 */
export function firstTooDeep(bytes: Uint8Array, max: number): number {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < bytes.length; i++) {
    const b = bytes[i];
    if (inString) {
      if (b === BACKSLASH) i++;
      else if (b === QUOTE) inString = false;
    } else if (b === QUOTE) inString = true;
    else if (OPEN.has(b)) {
      if (++depth > max) return i;
    } else if (CLOSE.has(b)) depth--;
  }
  return -1;
}

/** Throws JsonTooDeepError when `text` or `bytes` nest deeper than `max`; `label` names the field (e.g. an uploaded file). */
export function assertJsonDepth(bytes: Uint8Array | string, max = MAX_JSON_DEPTH, label = 'body'): void {
  const raw = typeof bytes === 'string' ? Buffer.from(bytes) : bytes;
  if (firstTooDeep(raw, max) >= 0) throw new JsonTooDeepError(label, max);
}

/**
 * body-parser's `verify` hook: it sees the raw body after the size limit and before JSON.parse,
 * so the depth check runs before any parsing. A thrown error with `status` 400 becomes the 400.
 */
export function verifyJsonDepth(_req: IncomingMessage, _res: ServerResponse, buf: Buffer): void {
  assertJsonDepth(buf);
}
