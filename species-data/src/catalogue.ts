import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import {
  countyEcoregionSchema,
  ecoregionSchema,
  sourceSchema,
  speciesSchema,
  type CountyEcoregions,
  type Ecoregion,
  type Source,
  type Species,
} from '@homeground/shared';
import { z } from 'zod';

/** The folder holding the data files, whether this runs from `src/` or from `dist/`. */
export const DATA_DIR = path.resolve(import.meta.dirname, '..');

const realignmentSchema = z.object({
  usdaFamily: z.string(),
  family: z.string(),
  genera: z.array(z.string()).min(1),
  source: z.string(),
});
export type FamilyRealignment = z.infer<typeof realignmentSchema>;

function readJson(file: string): unknown {
  return JSON.parse(readFileSync(path.join(DATA_DIR, file), 'utf8'));
}

/** A problem found while reading the data files: which file, and what is wrong. */
export interface DataProblem {
  file: string;
  message: string;
}

export interface Catalogue {
  species: Species[];
  sources: Source[];
  realignments: FamilyRealignment[];
  ecoregions: Ecoregion[];
  counties: CountyEcoregions[];
}

function parseEach<T>(schema: z.ZodType<T>, items: unknown, file: string, problems: DataProblem[]): T[] {
  if (!Array.isArray(items)) {
    problems.push({ file, message: 'expected a JSON array' });
    return [];
  }
  return items.flatMap((item, i) => {
    const r = schema.safeParse(item);
    if (r.success) return [r.data];
    problems.push({ file, message: `item ${i}: ${z.prettifyError(r.error)}` });
    return [];
  });
}

/** Reads every data file and checks it against its schema, collecting problems instead of stopping. */
export function readCatalogue(): { catalogue: Catalogue; problems: DataProblem[] } {
  const problems: DataProblem[] = [];
  const speciesDir = path.join(DATA_DIR, 'species');
  const species = readdirSync(speciesDir)
    .filter((f) => f.endsWith('.json'))
    .sort()
    .flatMap((f) => {
      const file = `species/${f}`;
      let raw: unknown;
      try {
        raw = readJson(file);
      } catch (e) {
        problems.push({ file, message: `not valid JSON: ${(e as Error).message}` });
        return [];
      }
      const r = speciesSchema.safeParse(raw);
      if (!r.success) {
        problems.push({ file, message: z.prettifyError(r.error) });
        return [];
      }
      return [r.data];
    });
  const optional = (file: string) => {
    try {
      return readJson(file);
    } catch {
      return [];
    }
  };
  return {
    catalogue: {
      species,
      sources: parseEach(sourceSchema, readJson('sources.json'), 'sources.json', problems),
      realignments: parseEach(
        realignmentSchema,
        readJson('family-realignments.json'),
        'family-realignments.json',
        problems,
      ),
      ecoregions: parseEach(
        ecoregionSchema,
        optional('ecoregions/ecoregions.json'),
        'ecoregions/ecoregions.json',
        problems,
      ),
      counties: parseEach(
        countyEcoregionSchema,
        optional('ecoregions/county-ecoregions.json'),
        'ecoregions/county-ecoregions.json',
        problems,
      ),
    },
    problems,
  };
}

let cached: Catalogue | undefined;
/** The checked catalogue; throws when any data file is invalid. */
export function loadCatalogue(): Catalogue {
  if (cached) return cached;
  const { catalogue, problems } = readCatalogue();
  if (problems.length > 0) {
    throw new Error(
      `species-data has ${problems.length} problem(s):\n${problems.map((p) => `${p.file}: ${p.message}`).join('\n')}`,
    );
  }
  cached = catalogue;
  return catalogue;
}
