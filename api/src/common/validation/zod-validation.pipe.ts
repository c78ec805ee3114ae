import type { PipeTransform } from '@nestjs/common';
import type { z } from 'zod';
import { badRequest, type FieldProblem } from './bad-request.js';

/** Turns zod issues into the API's 400 fields: each bad field (dotted path) with its reason. */
export function zodFields(error: z.ZodError, prefix?: string): FieldProblem[] {
  return error.issues.flatMap((i) => {
    const at = [prefix, ...i.path.map(String)].filter(Boolean).join('.');
    // An unknown key is named itself, so the client learns which field to drop.
    if (i.code === 'unrecognized_keys') {
      return i.keys.map((k) => ({ field: at ? `${at}.${k}` : k, message: 'is not a field this request accepts' }));
    }
    return [{ field: at || 'body', message: i.message }];
  });
}

/**
 * Parses a body, query string or path parameter with a shared zod schema and answers 400 naming
 * each bad field. `prefix` names a path parameter (its value has no field name of its own).
 */
export class ZodValidationPipe<S extends z.ZodType> implements PipeTransform<unknown, z.infer<S>> {
  constructor(
    private readonly schema: S,
    private readonly prefix?: string,
  ) {}

  transform(value: unknown): z.infer<S> {
    const result = this.schema.safeParse(this.prefix === undefined ? (value ?? {}) : value);
    if (result.success) return result.data;
    throw badRequest(zodFields(result.error, this.prefix));
  }
}
