import { type CallHandler, type ExecutionContext, Injectable, type NestInterceptor } from '@nestjs/common';
import type { Request } from 'express';
import type { Observable } from 'rxjs';
import { READS_METADATA } from '../decorators/zod.decorators.js';
import { apiWords } from '../i18n/api-i18n.js';
import { negotiateLocale } from '../i18n/negotiate-locale.js';
import { badRequest, pleaseCheck } from './bad-request.js';

/**
 * Refuses a query string or a JSON body on a route that reads none (e.g. `GET /api/me?role=admin`),
 * naming each key, so unknown input is refused everywhere and not only where a schema parses it.
 */
@Injectable()
export class UnexpectedInputInterceptor implements NestInterceptor {
  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    if (context.getType() !== 'http') return next.handle();
    const reads: string[] = Reflect.getMetadata(READS_METADATA, context.getHandler()) ?? [];
    const req = context.switchToHttp().getRequest<Request>();
    const unexpected = [
      ...(reads.includes('query') ? [] : keysOf(req.query)),
      ...(reads.includes('body') ? [] : keysOf(req.body)),
    ];
    if (unexpected.length) {
      const locale = negotiateLocale(req.headers['accept-language']);
      const message = apiWords(locale)('validation.notAField');
      const fields = unexpected.map((field) => ({ field, message }));
      throw badRequest(fields, pleaseCheck(fields, locale));
    }
    return next.handle();
  }
}

function keysOf(value: unknown): string[] {
  return value && typeof value === 'object' ? Object.keys(value) : [];
}
