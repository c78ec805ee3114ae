import { readFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { booleanPointInPolygon, lineString, pointToLineDistance } from '@turf/turf';
import type { Feature, MultiPolygon, Polygon } from 'geojson';
import { REFERENCE_DIR, referenceAvailable } from './support/reference.js';
import { createTestApp, type TestApp } from './support/test-app.js';

type Region = Feature<Polygon | MultiPolygon, { US_L3CODE: string; US_L3NAME: string }>;
const EPA_FILE = 'epa_us_eco_l3.geojson';

/** Kilometres from a point to the nearest edge of an EPA region. */
function distanceKm(region: Region, lon: number, lat: number): number {
  const rings = region.geometry.type === 'Polygon' ? region.geometry.coordinates : region.geometry.coordinates.flat();
  return Math.min(...rings.map((r) => pointToLineDistance([lon, lat], lineString(r), { units: 'kilometers' })));
}

/**
 * Lookups by latitude and longitude: a point on land, a point just off a coast that takes the nearest
 * county, and points at sea refused. Counties are the US Census Bureau's FIPS codes (Vernon County, WI
 * 55123; Horry County, SC 45051); ecoregions are checked against the EPA Level III polygons in the
 * reference folder (EPA, Level III Ecoregions of the Conterminous United States).
 */
describe('place lookup by a point (e2e)', () => {
  let t: TestApp;
  let regions: Region[] | null = null;

  beforeAll(async () => {
    t = await createTestApp();
    if (referenceAvailable([EPA_FILE]))
      regions = (JSON.parse(readFileSync(path.join(REFERENCE_DIR, EPA_FILE), 'utf8')) as { features: Region[] })
        .features;
  });
  afterAll(() => t.close());

  it('resolves a point near Viroqua, Wisconsin to Vernon County and the ecoregion EPA maps there', async () => {
    const [lat, lon] = [43.556, -90.888];
    const res = await t.http.get(`/api/places/lookup?lat=${lat}&lon=${lon}`).expect(200);
    expect(res.body).toMatchObject({
      point: { lat, lon },
      zip: null,
      state: 'WI',
      county: { fips: '55123', name: 'Vernon' },
      ecoregion: { code: '52', name: 'Driftless Area' },
    });
    if (!regions) return;
    // EPA Level III: the polygon holding the point is the Driftless Area, the region the lookup answered.
    const holding = regions.filter((r) => booleanPointInPolygon([lon, lat], r));
    expect(holding.map((r) => r.properties.US_L3CODE)).toEqual([res.body.ecoregion.code]);
  });

  it('takes the nearest county for a point just off the coast (Myrtle Beach, South Carolina, about 4 km out)', async () => {
    const [lat, lon] = [33.69, -78.8];
    const res = await t.http.get(`/api/places/lookup?lat=${lat}&lon=${lon}`).expect(200);
    expect(res.body).toMatchObject({ state: 'SC', county: { fips: '45051', name: 'Horry' } });
    if (!regions) return;
    // At sea on the EPA map (no region holds it), and the region the answer names is the nearest one.
    expect(regions.filter((r) => booleanPointInPolygon([lon, lat], r))).toEqual([]);
    const nearest = regions
      .map((r) => ({ code: r.properties.US_L3CODE, km: distanceKm(r, lon, lat) }))
      .sort((a, b) => a.km - b.km)[0];
    expect(nearest.km).toBeLessThan(8);
    expect(res.body.ecoregion.code).toBe(nearest.code);
  });

  it.each([
    ['30 km off the same coast', 33.55, -78.55],
    ['in the Gulf of Mexico', 26.0, -90.0],
    ['in Lake Michigan, mid-lake', 43.5, -87.2],
  ])('refuses a point %s with a 400 naming lat', async (_where, lat, lon) => {
    const res = await t.http.get(`/api/places/lookup?lat=${lat}&lon=${lon}`).expect(400);
    expect(res.body.fields).toEqual([
      expect.objectContaining({ field: 'lat', message: expect.stringMatching(/not on land/) }),
    ]);
    if (!regions) return;
    expect(regions.filter((r) => booleanPointInPolygon([lon, lat], r))).toEqual([]);
  });
});
