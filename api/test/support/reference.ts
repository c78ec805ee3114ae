import { existsSync } from 'node:fs';
import path from 'node:path';

/** ../shared/reference beside the project (never copied in); HOMEGROUND_REFERENCE_DIR overrides it. */
export const REFERENCE_DIR =
  process.env.HOMEGROUND_REFERENCE_DIR ??
  path.resolve(import.meta.dirname, '..', '..', '..', '..', 'shared', 'reference');

/**
 * Whether reference checks can run: missing files skip the checks with a printed reason, except in
 * CI (`CI` set), where a missing reference fails the run.
 */
export function referenceAvailable(files: string[]): boolean {
  const missing = files.filter((f) => !existsSync(path.join(REFERENCE_DIR, f)));
  if (missing.length === 0) return true;
  const reason = `reference data missing in ${REFERENCE_DIR}: ${missing.join(', ')}`;
  if (process.env.CI) throw new Error(`${reason} (CI is set, so reference checks must run)`);
  console.warn(`SKIP reference checks: ${reason}`);
  return false;
}
