import { BadRequestException, ValidationPipe, type ValidationError } from '@nestjs/common';
import type { ApiError } from '@homeground/shared';

function flatten(errors: ValidationError[], parent = ''): NonNullable<ApiError['fields']> {
  return errors.flatMap((e) => {
    const field = parent ? `${parent}.${e.property}` : e.property;
    const own = Object.entries(e.constraints ?? {}).map(([rule, message]) => ({
      field,
      message: rule === 'whitelistValidation' ? 'is not a field this request accepts' : message,
    }));
    return [...own, ...flatten(e.children ?? [], field)];
  });
}

/** Whitelists DTO fields, rejects unknown ones, and answers 400 naming each bad field with its reason. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => {
      const fields = flatten(errors);
      const message = `Please check: ${fields.map((f) => `${f.field} ${f.message}`).join('; ')}`;
      return new BadRequestException({ message, fields });
    },
  });
}
