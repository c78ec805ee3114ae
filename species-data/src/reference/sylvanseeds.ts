import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { referenceFile } from './reference-dir.js';

export const SYLVANSEEDS_FILE = 'sylvanseeds_germination_database.csv';

/**
 * Germination percentages of the SylvanSeeds laboratory trials (Fernández-Pascual 2021), by accepted name
 * (`TPLName`). Rows without a seed count are left out.
 */
export function loadSylvanSeedsPercentages(dir?: string): Map<string, number[]> {
  const text = readFileSync(referenceFile(SYLVANSEEDS_FILE, dir), 'utf8').replace(/^\uFEFF/, '');
  const rows = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data;
  const out = new Map<string, number[]>();
  for (const r of rows) {
    const germinated = Number(r.Germinated);
    const seeds = Number(r.Number_seeds);
    if (!r.TPLName || !Number.isFinite(germinated) || !Number.isFinite(seeds) || seeds <= 0) continue;
    const list = out.get(r.TPLName) ?? [];
    list.push((100 * germinated) / seeds);
    out.set(r.TPLName, list);
  }
  return out;
}
