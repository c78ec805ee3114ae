import { BadRequestException } from '@nestjs/common';
import type { ApiError } from '@homeground/shared';

/** One bad field of a request and the reason, as the 400 lists it. */
export type FieldProblem = NonNullable<ApiError['fields']>[number];

/**
 * The API's one 400: `{message, fields}` with each bad field and its reason. The message repeats
 * them in a sentence unless a better one is given (e.g. "nothing was imported").
 */
export function badRequest(
  fields: FieldProblem[],
  message?: string,
  extra: Pick<ApiError, 'rows'> = {},
): BadRequestException {
  const text = message ?? `Please check: ${fields.map((f) => `${f.field} ${f.message}`).join('; ')}`;
  return new BadRequestException({ message: text, fields, ...extra });
}
