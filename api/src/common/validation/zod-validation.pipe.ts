import { BadRequestException, type PipeTransform } from '@nestjs/common';
import type { ApiError } from '@homeground/shared';
import type { z } from 'zod';

/** Turns zod issues into the API's 400: each bad field (dotted path) with its reason. */
export function zodFields(error: z.ZodError): NonNullable<ApiError['fields']> {
  return error.issues.map((i) => {
    const field = i.path.map(String).join('.') || (i.code === 'unrecognized_keys' ? i.keys.join(', ') : 'body');
    const message = i.code === 'unrecognized_keys' ? 'is not a field this request accepts' : i.message;
    return { field, message };
  });
}

/** Validates a body or query with a shared zod schema, for shapes too rich for class-validator DTOs. */
export class ZodValidationPipe<S extends z.ZodType> implements PipeTransform<unknown, z.infer<S>> {
  constructor(private readonly schema: S) {}

  transform(value: unknown): z.infer<S> {
    const result = this.schema.safeParse(value ?? {});
    if (result.success) return result.data;
    const fields = zodFields(result.error);
    throw new BadRequestException({ message: `Please check: ${fields.map((f) => `${f.field} ${f.message}`).join('; ')}`, fields });
  }
}
