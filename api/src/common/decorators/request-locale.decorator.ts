import { applyDecorators, createParamDecorator, type ExecutionContext } from '@nestjs/common';
import { ApiHeader } from '@nestjs/swagger';
import type { WordLocale } from '@homeground/shared';
import { negotiateLocale } from '../i18n/negotiate-locale.js';

/**
 * The reader's language, negotiated from `Accept-Language` (English by default). A header is not
 * request data to validate: any value yields a language, so it needs no zod schema.
 */
export const RequestLocale = createParamDecorator((_data: unknown, ctx: ExecutionContext): WordLocale => {
  const request = ctx.switchToHttp().getRequest<{ headers: Record<string, string | string[] | undefined> }>();
  return negotiateLocale(request.headers['accept-language']);
});

/** Publishes in OpenAPI that a route answers in the `Accept-Language` it is sent. */
export function AnswersInLanguage(): MethodDecorator & ClassDecorator {
  return applyDecorators(
    ApiHeader({
      name: 'Accept-Language',
      required: false,
      schema: { type: 'string', maxLength: 512, example: 'es-MX,es;q=0.9,en;q=0.5' },
      description: 'en or es (RFC 9110 weights honoured); messages and reasons come back in that language',
    }),
  );
}
