/**
 * Loaders for the two boundary sets the ecoregion table is computed from: the EPA Level III polygons
 * (reference copy, read through referenceFile) and the us-atlas Census counties.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { bbox as turfBbox } from '@turf/turf';
import type { Feature, MultiPolygon, Polygon } from 'geojson';
import type { StateCode } from '@homeground/shared';
import { feature } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import { referenceFile } from '../reference/reference-dir.js';
import { STATE_NAME_TO_CODE } from '../reference/us-states.js';

export const EPA_FILE = 'epa_us_eco_l3.geojson';

export type BBox = [number, number, number, number];
export type Area = Feature<Polygon | MultiPolygon>;

export interface EpaRegion {
  code: string;
  name: string;
  feature: Area;
  bbox: BBox;
}

export interface County {
  fips: string;
  name: string;
  state: StateCode;
  feature: Area;
  bbox: BBox;
}

/** The 85 EPA Level III polygons, ordered by numeric code. */
export function loadEpaRegions(): EpaRegion[] {
  const fc = JSON.parse(readFileSync(referenceFile(EPA_FILE), 'utf8')) as {
    features: Feature<Polygon | MultiPolygon, { US_L3CODE: string; US_L3NAME: string }>[];
  };
  return fc.features
    .map((f) => ({
      code: f.properties.US_L3CODE,
      name: f.properties.US_L3NAME,
      feature: f as Area,
      bbox: turfBbox(f) as BBox,
    }))
    .sort((a, b) => Number(a.code) - Number(b.code));
}

const require = createRequire(import.meta.url);

function readTopology(file: string): Topology {
  return JSON.parse(readFileSync(require.resolve(`us-atlas/${file}`), 'utf8')) as Topology;
}

/**
 * USPS codes by 2-digit state FIPS, taken from us-atlas's own state names so no FIPS table is typed by hand.
 * States outside Homeground's list (AK, HI, PR, territories) are left out.
 */
export function stateCodesByFips(): Map<string, StateCode> {
  const topo = readTopology('states-10m.json');
  const states = topo.objects.states as GeometryCollection<{ name: string }>;
  const out = new Map<string, StateCode>();
  for (const g of states.geometries) {
    const name = (g.properties as { name?: string } | undefined)?.name ?? '';
    const code = STATE_NAME_TO_CODE[name];
    if (code) out.set(String(g.id), code);
  }
  return out;
}

/** Counties of the conterminous US and DC from us-atlas (Census cartographic boundaries, 1:10M). */
export function loadCounties(): County[] {
  const byFips = stateCodesByFips();
  const topo = readTopology('counties-10m.json');
  const fc = feature(topo, topo.objects.counties as GeometryCollection<{ name: string }>);
  const out: County[] = [];
  for (const f of fc.features) {
    const fips = String(f.id);
    const state = byFips.get(fips.slice(0, 2));
    if (!state || !f.geometry) continue;
    const area = f as Area;
    out.push({ fips, name: f.properties.name, state, feature: area, bbox: turfBbox(area) as BBox });
  }
  return out.sort((a, b) => a.fips.localeCompare(b.fips));
}

export function bboxesOverlap(a: BBox, b: BBox): boolean {
  return a[0] <= b[2] && b[0] <= a[2] && a[1] <= b[3] && b[1] <= a[3];
}
