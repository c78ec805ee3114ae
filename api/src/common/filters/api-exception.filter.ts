import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { ApiError } from '@homeground/shared';
import type { Response } from 'express';
import { JsonTooDeepError } from '../http/json-depth.js';
import { TooLargeWithReason } from '../http/too-large-with-reason.js';

const REASON: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  409: 'Conflict',
  410: 'Gone',
  413: 'Payload Too Large',
  415: 'Unsupported Media Type',
  422: 'Unprocessable Entity',
  429: 'Too Many Requests',
  500: 'Internal Server Error',
  503: 'Service Unavailable',
};

/**
 * Turns every error into the one shape the web app reads: `{statusCode, error, message, fields?}`.
 * Unexpected errors are logged and answered with a plain 500 that leaks nothing.
 */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('ApiExceptionFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const res = host.switchToHttp().getResponse<Response>();
    const body = this.toApiError(exception);
    if (body.statusCode >= 500) this.logger.error(exception instanceof Error ? exception.stack : String(exception));
    if (res.headersSent) return;
    // A route may have set a file's headers (CSV, iCalendar) before it failed: the error is JSON, not a download.
    res.removeHeader('Content-Disposition');
    res.status(body.statusCode).type('application/json').send(JSON.stringify(body));
  }

  private toApiError(exception: unknown): ApiError {
    // Raised by the depth check on an uploaded file, outside body-parser.
    if (exception instanceof JsonTooDeepError) {
      return { statusCode: 400, error: REASON[400], message: exception.message, fields: exception.fields };
    }
    if (exception instanceof HttpException) {
      const statusCode = exception.getStatus();
      const response = exception.getResponse();
      const base: ApiError = { statusCode, error: REASON[statusCode] ?? 'Error', message: exception.message };
      if (typeof response === 'object' && response !== null) {
        const r = response as {
          message?: unknown;
          fields?: ApiError['fields'];
          rows?: ApiError['rows'];
          waitlist?: ApiError['waitlist'];
        };
        if (typeof r.message === 'string') base.message = r.message;
        else if (Array.isArray(r.message)) base.message = r.message.join('; ');
        if (r.fields) base.fields = r.fields;
        if (r.rows) base.rows = r.rows;
        if (r.waitlist) base.waitlist = r.waitlist;
      }
      const cause = exception.cause;
      // The Express adapter maps body-parser's SyntaxError to a 400 with the parser's words; say it plainly.
      if (cause instanceof SyntaxError) {
        base.message = 'The request body is not valid JSON.';
        base.fields = [{ field: 'body', message: 'is not valid JSON' }];
      }
      if (cause instanceof JsonTooDeepError) base.fields = cause.fields;
      // Multer names the form field it refused (an unexpected file, too many fields).
      if (statusCode === 400 && !base.fields && isMulterError(cause)) {
        base.fields = [{ field: cause.field ?? 'form', message: 'is not a field this upload accepts' }];
      }
      // Any other 400 from the HTTP layer (e.g. a form nested past body-parser's depth) still names what was wrong.
      if (statusCode === 400 && !base.fields)
        base.fields = [{ field: 'body', message: 'could not be read as this request' }];
      if (statusCode === 413 && !(exception instanceof TooLargeWithReason))
        base.message = 'The request body is too large.';
      return base;
    }
    return {
      statusCode: HttpStatus.INTERNAL_SERVER_ERROR,
      error: REASON[500],
      message: 'Something went wrong on our side. Please try again.',
    };
  }
}

function isMulterError(e: unknown): e is { code: string; field?: string } {
  return (
    typeof e === 'object' &&
    e !== null &&
    typeof (e as { code?: unknown }).code === 'string' &&
    (e as { code: string }).code.startsWith('LIMIT_')
  );
}
