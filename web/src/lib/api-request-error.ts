import type { ApiError } from '@homeground/shared';

/** statusCode used when no HTTP answer arrived at all (offline, server down, CORS). */
export const NETWORK_ERROR_STATUS = 0;

/** An API call that failed, carrying the API's one error shape so screens can show its words. */
export class ApiRequestError extends Error implements ApiError {
  override readonly name = 'ApiRequestError';
  readonly statusCode: number;
  readonly error: string;
  readonly fields?: { field: string; message: string }[];
  /** A plant share's 409 "all taken": the species that ran out and where to join their waitlist. */
  readonly waitlist?: ApiError['waitlist'];
  /** A refused CSV import: each bad row with its line number, field and reason. */
  readonly rows?: ApiError['rows'];

  constructor(body: ApiError) {
    super(body.message);
    this.statusCode = body.statusCode;
    this.error = body.error;
    if (body.fields) this.fields = body.fields;
    if (body.waitlist) this.waitlist = body.waitlist;
    if (body.rows) this.rows = body.rows;
  }

  get isNetworkError(): boolean {
    return this.statusCode === NETWORK_ERROR_STATUS;
  }

  /** The first message per field name, for showing beside the matching input. */
  fieldMessages(): Record<string, string> {
    const out: Record<string, string> = {};
    for (const f of this.fields ?? []) out[f.field] ??= f.message;
    return out;
  }
}

export function isApiRequestError(value: unknown): value is ApiRequestError {
  return value instanceof ApiRequestError;
}

/** Checks that a parsed JSON body really has the ApiError shape before trusting it. */
export function isApiErrorBody(value: unknown): value is ApiError {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as Record<string, unknown>;
  const fieldsOk =
    v.fields === undefined ||
    (Array.isArray(v.fields) && v.fields.every((f) => typeof f?.field === 'string' && typeof f?.message === 'string'));
  return typeof v.statusCode === 'number' && typeof v.message === 'string' && typeof v.error === 'string' && fieldsOk;
}
