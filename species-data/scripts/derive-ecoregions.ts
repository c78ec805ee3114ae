/**
 * Curator tool (never run at start): writes each species' EPA Level III ecoregions.
 *   npx tsx species-data/scripts/derive-ecoregions.ts          # write the files, print counts per region
 *   npx tsx species-data/scripts/derive-ecoregions.ts --check  # print what would change, write nothing
 *
 * First pass, from data: the Level III regions that overlap the species' native states (the regions'
 * state lists come from the county crosswalk in ecoregions/), kept when one of the species' habitats
 * is among the region's plant communities (with the near-equivalents in HABITAT_MATCHES).
 * Western regions (Level I 6, 7, 10, 11, 12, 13) are kept only for species native across the West
 * (8+ western states), never the hot deserts or Mediterranean California, unless a range limit adds them.
 * Then the range limits in ecoregions/range-limits.json, each with its reason and source, narrow
 * (`only`, `exclude`) or widen (`include`) the list for the species they name.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { Ecoregion, Habitat, Species } from '@homeground/shared';
import { DATA_DIR, loadCatalogue } from '../src/catalogue.js';
import { inline, readRecordText, setKey, setSource, SPECIES_DIR, writeRecordText } from './record-text.js';

interface RangeLimit {
  slugs: string[];
  /** This region holds only the species named (where they are native to one of its states). */
  region?: string;
  only?: string[];
  exclude?: string[];
  include?: string[];
  why: string;
  source: string;
}

/** A species habitat also counts where the region holds one of these communities. */
const HABITAT_MATCHES: Partial<Record<Habitat, Habitat[]>> = {
  'wet-prairie': ['wet-prairie', 'marsh', 'wetland'],
  marsh: ['marsh', 'wetland', 'wet-prairie'],
  wetland: ['wetland', 'marsh', 'wet-prairie', 'fen-bog'],
  'fen-bog': ['fen-bog', 'wetland'],
  glade: ['glade', 'rock-outcrop'],
  streambank: ['streambank', 'floodplain-forest'],
  'floodplain-forest': ['floodplain-forest', 'streambank'],
  'open-woodland': ['open-woodland', 'savanna'],
  savanna: ['savanna', 'open-woodland'],
  'sand-prairie': ['sand-prairie', 'dune', 'pine-barrens'],
  'pine-barrens': ['pine-barrens', 'sand-prairie'],
};
/**
 * Old fields follow clearing anywhere in the forested East and the tallgrass plains, so they match every
 * region there, except the peatlands of northern Minnesota (49), which were never farmed much.
 */
const OLD_FIELD_LEVEL1 = new Set(['5', '8']);
const NO_OLD_FIELDS = new Set(['49']);
const TALLGRASS_PLAINS = new Set(['27', '28', '29', '32', '33', '34', '40', '46', '47', '48']);
/** Dry western plains: an eastern plant gets in only through a grassland, sand or wetland habitat, not a streambank or woodland. */
const DRY_PLAINS = new Set(['25', '26', '42', '43', '44']);
const DRY_PLAINS_HABITATS = new Set<Habitat>([
  'shortgrass-prairie',
  'mixed-grass-prairie',
  'sand-prairie',
  'dune',
  'marsh',
  'wetland',
  'wet-prairie',
]);
const WESTERN_LEVEL1 = new Set(['6', '7', '10', '11', '12', '13']);
const NEVER_BY_DEFAULT = new Set(['14', '81', '24', '6', '7', '8', '85']);
const WESTERN_STATES = new Set(['AZ', 'CA', 'CO', 'ID', 'MT', 'NV', 'NM', 'OR', 'UT', 'WA', 'WY']);

export function firstPass(s: Pick<Species, 'nativeStates' | 'habitats'>, regions: Ecoregion[]): string[] {
  const states = new Set<string>(s.nativeStates);
  const westernStates = s.nativeStates.filter((st) => WESTERN_STATES.has(st)).length;
  return regions
    .filter((r) => {
      if (!r.states.some((st) => states.has(st))) return false;
      if (WESTERN_LEVEL1.has(r.level1.code) && (westernStates < 8 || NEVER_BY_DEFAULT.has(r.code))) return false;
      const communities = new Set<string>(r.plantCommunities);
      const habitats = DRY_PLAINS.has(r.code) ? s.habitats.filter((h) => DRY_PLAINS_HABITATS.has(h)) : s.habitats;
      return habitats.some(
        (h) =>
          (h === 'old-field' &&
            !NO_OLD_FIELDS.has(r.code) &&
            (OLD_FIELD_LEVEL1.has(r.level1.code) || TALLGRASS_PLAINS.has(r.code))) ||
          (HABITAT_MATCHES[h] ?? [h]).some((c) => communities.has(c)),
      );
    })
    .map((r) => r.code);
}

export function applyLimits(
  s: Pick<Species, 'slug' | 'nativeStates'>,
  codes: string[],
  limits: RangeLimit[],
  regions: Ecoregion[],
): string[] {
  const slug = s.slug;
  let out = [...codes];
  for (const l of limits.filter((x) => x.region)) {
    const region = regions.find((r) => r.code === l.region);
    const native = region?.states.some((st) => s.nativeStates.includes(st));
    if (l.slugs.includes(slug) && native) out.push(l.region!);
    else out = out.filter((c) => c !== l.region);
  }
  out = [...new Set(out)];
  const applied = limits.filter((l) => !l.region && l.slugs.includes(slug));
  for (const l of applied) {
    if (l.only) out = out.filter((c) => l.only!.includes(c));
    if (l.exclude) out = out.filter((c) => !l.exclude!.includes(c));
  }
  for (const l of applied) for (const c of l.include ?? []) if (!out.includes(c)) out.push(c);
  return out.sort((a, b) => Number(a) - Number(b));
}

function main(): void {
  const check = process.argv.includes('--check');
  const { species, ecoregions } = loadCatalogue();
  const limits: RangeLimit[] = JSON.parse(readFileSync(path.join(DATA_DIR, 'ecoregions', 'range-limits.json'), 'utf8'));
  const known = new Set(species.map((s) => s.slug));
  for (const l of limits)
    for (const slug of l.slugs)
      if (!known.has(slug)) throw new Error(`range-limits.json names ${slug}, not in the catalogue`);
  const perRegion = new Map<string, number>();
  let changed = 0;
  for (const s of species) {
    const codes = applyLimits(s, firstPass(s, ecoregions), limits, ecoregions);
    if (codes.length === 0) throw new Error(`${s.slug}: no ecoregion left; widen its range limit`);
    for (const c of codes) perRegion.set(c, (perRegion.get(c) ?? 0) + 1);
    const same = JSON.stringify(s.ecoregions ?? []) === JSON.stringify(codes);
    if (same) continue;
    changed++;
    if (check) {
      console.log(`${s.slug}: ${(s.ecoregions ?? []).join(',')} → ${codes.join(',')}`);
      continue;
    }
    const file = path.join(SPECIES_DIR, `${s.slug}.json`);
    let text = readRecordText(file);
    text = setKey(text, 'ecoregions', inline(codes), 'nativeStates');
    text = setSource(text, 'ecoregions', 'from-memory', 'nativeStates');
    writeRecordText(file, text);
  }
  const names = new Map(ecoregions.map((e) => [e.code, e.name]));
  for (const e of ecoregions)
    console.log(`${e.code.padStart(2)} ${names.get(e.code)}: ${perRegion.get(e.code) ?? 0} species`);
  console.log(`${changed} record(s) ${check ? 'would change' : 'written'}`);
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(import.meta.filename)) main();
