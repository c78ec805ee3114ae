/**
 * Reference checks of the ecoregion table and the county crosswalk against the EPA Level III polygons
 * (reference copy, simplified boundaries), us-atlas counties and zipcodes ZIP centroids.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { booleanPointInPolygon } from '@turf/turf';
import type { CountyEcoregions, Ecoregion } from '@homeground/shared';
import { beforeAll, describe, expect, it } from 'vitest';
import { DATA_DIR } from './catalogue.js';
import { EPA_FILE, loadCounties, loadEpaRegions, type County, type EpaRegion } from './ecoregions/geo-sources.js';
import { RegionLocator } from './ecoregions/region-locator.js';
import { sampleZips } from './ecoregions/zip-sample.js';
import { referenceAvailable } from './reference/reference-dir.js';

const available = referenceAvailable([EPA_FILE]);
const readData = <T>(file: string): T => JSON.parse(readFileSync(path.join(DATA_DIR, 'ecoregions', file), 'utf8')) as T;

/** Kilometres a point must keep from any EPA boundary to count as robust despite the simplified outlines. */
const ROBUST_KM = 10;

/**
 * Places whose Level III region is well known (expected codes from-memory); the test confirms with the
 * polygons that each lies inside that region and at least ROBUST_KM from its edge.
 */
const ROBUST_POINTS: { place: string; lon: number; lat: number; code: string }[] = [
  { place: 'Viroqua, Vernon County, WI', lon: -90.89, lat: 43.55, code: '52' },
  { place: 'Des Moines, IA', lon: -93.62, lat: 41.59, code: '47' },
  { place: 'Champaign, IL', lon: -88.24, lat: 40.11, code: '54' },
  { place: 'Cottonwood Falls, KS', lon: -96.54, lat: 38.37, code: '28' },
  { place: 'Thedford, NE', lon: -100.58, lat: 41.98, code: '44' },
  { place: 'Junction, TX', lon: -99.77, lat: 30.49, code: '30' },
  { place: 'Crossville, TN', lon: -85.03, lat: 35.95, code: '68' },
  { place: 'Salem, OR', lon: -123.03, lat: 44.94, code: '3' },
  { place: 'central Everglades, FL', lon: -80.75, lat: 25.85, code: '76' },
  { place: 'Black Hills, SD', lon: -103.6, lat: 43.9, code: '17' },
];

describe.skipIf(!available)('ecoregions against the EPA Level III reference', () => {
  let regions: EpaRegion[];
  let locator: RegionLocator;
  let table: Ecoregion[];
  let crosswalk: Map<string, CountyEcoregions>;
  let counties: County[];

  beforeAll(() => {
    regions = loadEpaRegions();
    locator = new RegionLocator(regions);
    table = readData<Ecoregion[]>('ecoregions.json');
    crosswalk = new Map(readData<CountyEcoregions[]>('county-ecoregions.json').map((c) => [c.fips, c]));
    counties = loadCounties();
  });

  it('has the 85 Level III codes and names exactly as in the EPA file (source: epa-ecoregions-l3, reference copy)', () => {
    expect(regions).toHaveLength(85);
    expect(table.map((e) => [e.code, e.name])).toEqual(regions.map((r) => [r.code, r.name]));
  });

  it('lists every conterminous county and DC once (source: us-atlas-counties)', () => {
    expect(crosswalk.size).toBe(counties.length);
    for (const c of counties) expect(crosswalk.get(c.fips)?.name, c.fips).toBe(c.name);
  });

  it('puts Vernon County, WI (FIPS 55123, us-atlas) mainly in 52 Driftless Area (source: epa-ecoregions-l3)', () => {
    expect(crosswalk.get('55123')?.ecoregions[0].code).toBe('52');
  });

  it('resolves hand-picked points well inside a region to that region (source: epa-ecoregions-l3 polygons)', () => {
    for (const p of ROBUST_POINTS) {
      const hit = locator.regionAt(p.lon, p.lat);
      const km = hit ? locator.boundaryDistanceKm(hit.code, p.lon, p.lat, 50) : NaN;
      console.log(
        `${p.place}: ${hit?.code} ${hit?.name}, ${Number.isFinite(km) ? km.toFixed(1) : '≥ 50'} km from its boundary`,
      );
      expect(hit?.code, p.place).toBe(p.code);
      expect(km, `${p.place} is too near a boundary to be robust`).toBeGreaterThanOrEqual(ROBUST_KM);
    }
  });

  it('sends ZIP centroids (zipcodes) far from a boundary to their EPA region through their us-atlas county, ≥ 90 %', () => {
    const started = Date.now();
    const zips = sampleZips(20);
    let robust = 0;
    let agree = 0;
    const misses: string[] = [];
    for (const z of zips) {
      const region = locator.regionAt(z.lon, z.lat);
      if (!region || locator.boundaryDistanceKm(region.code, z.lon, z.lat, ROBUST_KM) < ROBUST_KM) continue;
      const county = counties.find(
        (c) =>
          z.lon >= c.bbox[0] &&
          z.lon <= c.bbox[2] &&
          z.lat >= c.bbox[1] &&
          z.lat <= c.bbox[3] &&
          booleanPointInPolygon([z.lon, z.lat], c.feature),
      );
      if (!county) continue;
      robust++;
      const dominant = crosswalk.get(county.fips)?.ecoregions[0].code;
      if (dominant === region.code) agree++;
      else
        misses.push(
          `${z.zip} ${county.fips} ${county.name} ${county.state}: polygon ${region.code}, county ${dominant}`,
        );
    }
    const share = agree / robust;
    console.log(
      `ZIP check: ${zips.length} sampled, ${robust} ≥ ${ROBUST_KM} km from a boundary and inside a county, ` +
        `${agree} agree (${(share * 100).toFixed(1)} %), ${((Date.now() - started) / 1000).toFixed(1)} s`,
    );
    if (misses.length) console.log(`first misses: ${misses.slice(0, 8).join('; ')}`);
    expect(robust).toBeGreaterThan(1000);
    expect(share).toBeGreaterThanOrEqual(0.9);
  });
});
