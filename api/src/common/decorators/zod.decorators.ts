import { createParamDecorator, type ExecutionContext, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { apiErrorSchema } from '@homeground/shared';
import { ApiBadRequestResponse, ApiBody, ApiConsumes, ApiParam, ApiQuery, ApiResponse } from '@nestjs/swagger';
import type { z } from 'zod';
import { badRequest } from '../validation/bad-request.js';
import { openApiProperties, openApiSchema } from '../validation/openapi-schema.js';
import { apiWords } from '../i18n/api-i18n.js';
import { negotiateLocale } from '../i18n/negotiate-locale.js';
import { parseRequestPart } from '../validation/zod-validation.pipe.js';

/**
 * The API's one way to read a request: each decorator parses its part with a shared zod schema
 * (answering 400 naming each bad field) and publishes the same schema in the OpenAPI document, so
 * `/api/docs` cannot drift from what is checked.
 */

/** Which part of the request a zod decorator reads, with its schema (a path parameter by name). */
interface PartToRead {
  part: 'body' | 'query' | 'param';
  schema: z.ZodType;
  name?: string;
}

/**
 * Reads one part of the request and parses it; the request is at hand here (a pipe never sees it),
 * so a 400 comes back in the reader's `Accept-Language`.
 */
const ParsedPart = createParamDecorator(({ part, schema, name }: PartToRead, ctx: ExecutionContext): unknown => {
  const req = ctx.switchToHttp().getRequest<{
    body?: unknown;
    query?: unknown;
    params?: Record<string, string>;
    headers: Record<string, string | string[] | undefined>;
  }>();
  const locale = negotiateLocale(req.headers['accept-language']);
  if (part === 'param') return parseRequestPart(schema, req.params?.[name!], locale, name);
  return parseRequestPart(schema, part === 'body' ? req.body : req.query, locale);
});

type HandlerDecorator = (target: object, key: string | symbol, descriptor: PropertyDescriptor) => unknown;

/** Every validated route may answer 400 with the bad fields. */
const badRequestDoc = ApiBadRequestResponse({
  description: 'Bad input: each bad field with its reason',
  schema: openApiSchema(apiErrorSchema, 'output'),
}) as HandlerDecorator;

/** Metadata on a handler: which parts of the request it reads ('body', 'query'); see UnexpectedInputInterceptor. */
export const READS_METADATA = 'homeground:reads';

/** Records that the handler reads `part`, so input there is expected rather than refused. */
function markReads(target: object, key: string | symbol | undefined, part: 'body' | 'query'): void {
  const handler =
    key === undefined ? undefined : (Object.getOwnPropertyDescriptor(target, key)?.value as object | undefined);
  if (!handler) return;
  const reads = new Set<string>(Reflect.getMetadata(READS_METADATA, handler) ?? []);
  reads.add(part);
  Reflect.defineMetadata(READS_METADATA, [...reads], handler);
}

/** Applies method decorators from a parameter decorator (they share the handler function's metadata). */
function onMethod(target: object, key: string | symbol | undefined, ...decorators: HandlerDecorator[]): void {
  if (key === undefined) throw new Error('Zod parameter decorators belong on a route handler');
  const descriptor = Object.getOwnPropertyDescriptor(target, key);
  if (!descriptor) throw new Error(`No handler ${String(key)} to describe`);
  for (const d of decorators) d(target, key, descriptor);
}

/** The JSON body, parsed with `schema`; unknown fields are refused when the schema is strict. */
export function ZodBody(schema: z.ZodType, description?: string): ParameterDecorator {
  return (target, key, index) => {
    ParsedPart({ part: 'body', schema })(target, key!, index);
    markReads(target, key, 'body');
    onMethod(target, key, ApiBody({ schema: openApiSchema(schema), description, required: true }), badRequestDoc);
  };
}

/** The whole query string, parsed with an object `schema`; each property is published as a parameter. */
export function ZodQuery(schema: z.ZodType): ParameterDecorator {
  return (target, key, index) => {
    ParsedPart({ part: 'query', schema })(target, key!, index);
    markReads(target, key, 'query');
    onMethod(
      target,
      key,
      ...openApiProperties(schema).map((p) => ApiQuery({ name: p.name, required: p.required, schema: p.schema })),
      badRequestDoc,
    );
  };
}

/** One path parameter, parsed with `schema`; a bad value answers 400 naming the parameter. */
export function ZodParam(name: string, schema: z.ZodType): ParameterDecorator {
  return (target, key, index) => {
    ParsedPart({ part: 'param', schema, name })(target, key!, index);
    onMethod(target, key, ApiParam({ name, required: true, schema: openApiSchema(schema) }), badRequestDoc);
  };
}

/** What multer's memory storage hands over (the fields we use). */
export interface UploadedBlob {
  buffer: Buffer;
  size: number;
  /** The file's name on the sender's machine, as the browser gave it (untrusted; for display only). */
  originalname?: string;
}

/**
 * The uploaded file multer kept for the route (it runs as an interceptor, before parameters are read);
 * a request without it is refused naming the form field, in the reader's `Accept-Language`.
 */
const RequiredFile = createParamDecorator((field: string, ctx: ExecutionContext): UploadedBlob => {
  const req = ctx.switchToHttp().getRequest<{
    file?: UploadedBlob;
    headers: Record<string, string | string[] | undefined>;
  }>();
  const file = req.file;
  if (!file || file.size === 0) {
    const say = apiWords(negotiateLocale(req.headers['accept-language']));
    throw badRequest([{ field, message: say('validation.fileRequired') }], say('validation.attachFile', { field }));
  }
  return file;
});

/**
 * One uploaded file in a multipart form field (at most `maxBytes`), required; documents the form
 * in OpenAPI. With `fields`, the form may also carry those text fields (read them with
 * `@ZodFormFields(fields)`); any other field, or another file, is refused by multer with a 400.
 */
export function ZodFile(
  name: string,
  maxBytes: number,
  description?: string,
  fields?: z.ZodObject,
): ParameterDecorator {
  return (target, key, index) => {
    RequiredFile(name)(target, key!, index);
    markReads(target, key, 'body');
    const extra = fields ? openApiProperties(fields) : [];
    onMethod(
      target,
      key,
      UseInterceptors(FileInterceptor(name, { limits: { fileSize: maxBytes, files: 1, fields: extra.length } })),
      ApiConsumes('multipart/form-data'),
      ApiBody({
        required: true,
        description,
        schema: {
          type: 'object',
          required: [name, ...extra.filter((p) => p.required).map((p) => p.name)],
          additionalProperties: false,
          properties: {
            [name]: { type: 'string', format: 'binary' },
            ...Object.fromEntries(extra.map((p) => [p.name, p.schema])),
          },
        },
      }),
      badRequestDoc,
    );
  };
}

/**
 * The text fields of a multipart form (documented by the route's `@ZodFile(…, fields)`), parsed with
 * `schema`: a missing or bad field answers 400 naming it.
 */
export function ZodFormFields(schema: z.ZodType): ParameterDecorator {
  return (target, key, index) => {
    ParsedPart({ part: 'body', schema })(target, key!, index);
    markReads(target, key, 'body');
  };
}

/**
 * The answer's schema in OpenAPI, from the shared zod response schema (`status` as the route
 * answers: 200, or 201 for a POST that creates).
 */
export function ZodResponse(
  schema: z.ZodType,
  status: 200 | 201 | 202 = 200,
  description = 'OK',
): ReturnType<typeof ApiResponse> {
  return ApiResponse({ status, description, schema: openApiSchema(schema, 'output') });
}

/** A file answer (CSV, iCalendar, image) in OpenAPI, with its media type. */
export function FileResponse(mediaType: string, description: string): ReturnType<typeof ApiResponse> {
  return ApiResponse({
    status: 200,
    description,
    content: { [mediaType]: { schema: { type: 'string', format: 'binary' } } },
  });
}
