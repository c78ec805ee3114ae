import { existsSync } from 'node:fs';
import path from 'node:path';

/**
 * The product owner's open reference data lives beside the project in `../shared/reference`
 * (never copied in). Tests read it from there; `HOMEGROUND_REFERENCE_DIR` overrides the place.
 */
export function referenceDir(): string {
  const fromEnv = process.env.HOMEGROUND_REFERENCE_DIR;
  if (fromEnv) return path.resolve(fromEnv);
  // species-data/src/reference (or dist/reference) → project root → its parent
  const projectRoot = path.resolve(import.meta.dirname, '..', '..', '..');
  return path.resolve(projectRoot, '..', 'shared', 'reference');
}

/** A reference file's path, in `dir` when given (the API passes its configured folder), else the default. */
export function referenceFile(name: string, dir: string = referenceDir()): string {
  return path.join(dir, name);
}

/**
 * Whether reference checks can run. When the files are missing, checks skip with a printed reason,
 * except in CI (`CI` set), where a missing reference is an error.
 */
export function referenceAvailable(files: string[]): boolean {
  const missing = files.filter((f) => !existsSync(referenceFile(f)));
  if (missing.length === 0) return true;
  const reason = `reference data missing in ${referenceDir()}: ${missing.join(', ')}`;
  if (process.env.CI) throw new Error(`${reason} (CI is set, so reference checks must run)`);
  console.warn(`SKIP reference checks: ${reason}`);
  return false;
}
