import type { CsvImportResult } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

/**
 * Sends a species CSV to the import (curators). `dryRun` checks it and answers what it would create
 * and change, writing nothing; otherwise every row is written, or none.
 */
export function importSpeciesCsv(file: File, dryRun: boolean): Promise<CsvImportResult> {
  const form = new FormData();
  form.append('file', file, file.name);
  return httpClient.post<CsvImportResult>(`/api/species/import${dryRun ? '?dryRun=true' : ''}`, form);
}
