/**
 * Build-time settings, parsed once. Checked by hand rather than with zod so the schema library
 * stays out of the first download (only the forms, loaded later, need it).
 */
export interface AppEnv {
  /** Prefix for every API request, without a trailing slash; '' means same origin. */
  apiBaseUrl: string;
}

const API_BASE_URL_SHAPE = /^(https?:\/\/[^/\s]+)?(\/[^\s]*)?$/;

/** Names every bad variable, so a wrongly configured build fails loudly at start. */
export function parseEnv(raw: Record<string, unknown>): AppEnv {
  const problems: string[] = [];
  const base = raw.VITE_API_BASE_URL ?? '';
  if (typeof base !== 'string' || !API_BASE_URL_SHAPE.test(base.trim())) {
    problems.push('VITE_API_BASE_URL: must be empty, a path starting with "/", or an http(s) URL');
  }
  if (problems.length > 0) throw new Error(`Homeground's web settings are wrong: ${problems.join('; ')}`);
  return { apiBaseUrl: String(base).trim().replace(/\/+$/, '') };
}

export const env: AppEnv = parseEnv(import.meta.env);
