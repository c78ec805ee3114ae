/**
 * Builds Homeground's ecoregion table and county → ecoregion crosswalk from the EPA Level III polygons
 * (reference copy) and the us-atlas Census counties, merged with the hand-curated notes.
 *   npx tsx species-data/scripts/build-ecoregions.ts      (from the project root)
 * Writes species-data/ecoregions/ecoregions.json and county-ecoregions.json; both are deterministic.
 */
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { countyEcoregionSchema, ecoregionSchema, type CountyEcoregions, type Ecoregion } from '@homeground/shared';
import { loadCounties, loadEpaRegions } from '../src/ecoregions/geo-sources.js';
import { RegionLocator } from '../src/ecoregions/region-locator.js';
import { pointOnFeature } from '@turf/turf';
import { countyOverlap, type CountyOverlap } from './ecoregions-overlap.js';
import { readNotes } from './ecoregions-notes.js';
import { stateOverlaps, statesOf, toShares } from './ecoregions-shares.js';

const OUT_DIR = path.resolve(import.meta.dirname, '..', 'ecoregions');
const started = Date.now();
const lap = (label: string, since: number) => console.log(`${label}: ${((Date.now() - since) / 1000).toFixed(1)} s`);

let t = Date.now();
const regions = loadEpaRegions();
const counties = loadCounties();
lap(`loaded ${regions.length} EPA Level III regions and ${counties.length} counties`, t);

t = Date.now();
const overlaps: CountyOverlap[] = counties.map((c, i) => {
  if (i > 0 && i % 500 === 0) console.log(`  … ${i} counties`);
  return countyOverlap(c, regions);
});
const fellBack = overlaps.filter((o) => o.method === 'sampling');
lap(`county × region overlaps (${fellBack.length} fell back to point sampling)`, t);
for (const o of fellBack) console.log(`  sampled: ${o.county.fips} ${o.county.name}, ${o.county.state}`);

t = Date.now();
const locator = new RegionLocator(regions);
const placed: string[] = [];
const crosswalk: CountyEcoregions[] = overlaps.map((o) => {
  let ecoregions = toShares(o.byRegion);
  if (ecoregions.length === 0) {
    // No overlap: either the county collapsed to zero area in the 1:10M file, or the generalised EPA
    // coastline missed it. Use the region holding a point of the county, else the nearest region.
    const [lon, lat] = pointOnFeature(o.county.feature).geometry.coordinates;
    const hit = locator.regionAt(lon, lat);
    const near = hit ? { code: hit.code, km: 0 } : locator.nearestRegion(lon, lat);
    if (!near) throw new Error(`${o.county.fips}: no ecoregion within 200 km`);
    ecoregions = [{ code: near.code, share: 1 }];
    const how = hit
      ? `inside ${near.code} (county area ${(o.countyArea / 1e6).toFixed(1)} km²)`
      : `nearest ${near.code}, ${near.km.toFixed(1)} km`;
    placed.push(`${o.county.fips} ${o.county.name}, ${o.county.state}: ${how}`);
  }
  return countyEcoregionSchema.parse({ fips: o.county.fips, name: o.county.name, state: o.county.state, ecoregions });
});
lap(`shares (${placed.length} counties with no polygon overlap placed by point)`, t);
for (const line of placed) console.log(`  placed: ${line}`);

const notes = readNotes(path.join(OUT_DIR, 'ecoregion-notes.json'));
const level1 = new Map(notes.level1.map((l) => [l.code, l]));
const level2 = new Map(notes.level2.map((l) => [l.code, l]));
const noteByCode = new Map(notes.regions.map((r) => [r.code, r]));
const byState = stateOverlaps(overlaps);
const table: Ecoregion[] = regions.map((r) => {
  const note = noteByCode.get(r.code);
  if (!note) throw new Error(`ecoregion-notes.json has no entry for ${r.code} ${r.name}`);
  if (note.name !== r.name)
    throw new Error(`ecoregion-notes.json: ${r.code} is "${r.name}" in the EPA file, not "${note.name}"`);
  const overlapsHere = byState.get(r.code) ?? [];
  for (const o of overlapsHere) {
    if (statesOf([o]).length === 0) {
      console.log(
        `  left out ${r.code} in ${o.state}: ${(o.ofRegion * 100).toFixed(3)} % of region, ${(o.ofState * 100).toFixed(3)} % of state`,
      );
    }
  }
  const l2 = level2.get(note.level2)!;
  return ecoregionSchema.parse({
    code: r.code,
    name: r.name,
    level2: l2,
    level1: level1.get(l2.code.split('.')[0])!,
    states: statesOf(overlapsHere),
    plantCommunities: note.plantCommunities,
    description: note.description,
    sources: {
      code: 'epa-ecoregions-l3',
      name: 'epa-ecoregions-l3',
      states: 'epa-ecoregions-l3',
      parents: notes.source,
      plantCommunities: notes.source,
    },
  });
});
if (noteByCode.size !== regions.length)
  throw new Error('ecoregion-notes.json has entries for codes not in the EPA file');

// The two files should tell one story: a county's region should list the county's state.
const statesByCode = new Map(table.map((e) => [e.code, new Set<string>(e.states)]));
const disagree = crosswalk.flatMap((c) =>
  c.ecoregions
    .filter((e) => !statesByCode.get(e.code)!.has(c.state))
    .map((e) => `${c.fips} ${c.state} ${e.code} ${e.share}`),
);
console.log(
  `county regions missing from the region's state list: ${disagree.length}${disagree.length ? ` (${disagree.join('; ')})` : ''}`,
);

// One record per line keeps the files reviewable in a diff while staying compact.
const lines = (items: unknown[]) => `[\n${items.map((x) => JSON.stringify(x)).join(',\n')}\n]\n`;
writeFileSync(path.join(OUT_DIR, 'ecoregions.json'), lines(table));
writeFileSync(path.join(OUT_DIR, 'county-ecoregions.json'), lines(crosswalk));
const multi = crosswalk.filter((c) => c.ecoregions.length > 1).length;
console.log(`wrote ${table.length} ecoregions and ${crosswalk.length} counties (${multi} in more than one region)`);
lap('total', started);
