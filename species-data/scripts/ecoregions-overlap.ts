/**
 * Area of each county inside each EPA Level III polygon. Exact polygon intersection (turf.intersect) on
 * the region clipped to the county's box; when that throws, area-weighted point sampling instead.
 */
import { area, bboxClip, booleanPointInPolygon, intersect, featureCollection } from '@turf/turf';
import type { MultiPolygon, Polygon, Position } from 'geojson';
import { bboxesOverlap, type Area, type BBox, type County, type EpaRegion } from '../src/ecoregions/geo-sources.js';

export interface CountyOverlap {
  county: County;
  /** Square metres of the county, from its own outline. */
  countyArea: number;
  /** Square metres of the county inside each region (regions with no overlap left out). */
  byRegion: Map<string, number>;
  method: 'intersect' | 'sampling';
}

/**
 * The region cut down to a box around the county, so the intersection works on a few hundred vertices
 * instead of tens of thousands. bboxClip leaves empty or degenerate rings behind; those are dropped, and
 * a polygon whose outer ring vanished goes with all its holes.
 */
function clipToBox(region: Area, box: BBox): Area | null {
  const clipped = bboxClip(region, box).geometry as Polygon | MultiPolygon;
  const polygons: Position[][][] = clipped.type === 'Polygon' ? [clipped.coordinates] : clipped.coordinates;
  const kept = polygons
    .filter((rings) => rings.length > 0 && rings[0].length >= 4)
    .map((rings) => rings.filter((ring) => ring.length >= 4));
  if (kept.length === 0) return null;
  const geometry: MultiPolygon = { type: 'MultiPolygon', coordinates: kept };
  return { type: 'Feature', properties: {}, geometry };
}

function padded(box: BBox, pad: number): BBox {
  return [box[0] - pad, box[1] - pad, box[2] + pad, box[3] + pad];
}

function intersectAreas(county: County, candidates: EpaRegion[]): Map<string, number> {
  const out = new Map<string, number>();
  const box = padded(county.bbox, 0.01);
  for (const r of candidates) {
    const clipped = clipToBox(r.feature, box);
    if (!clipped) continue;
    const piece = intersect(featureCollection([county.feature, clipped]));
    if (piece) {
      const a = area(piece);
      if (a > 0) out.set(r.code, a);
    }
  }
  return out;
}

/**
 * Fallback: a lon/lat grid of about `target` points inside the county, each weighted by cos(latitude)
 * because a grid cell's ground area shrinks towards the pole.
 */
export function sampleAreas(
  county: County,
  candidates: EpaRegion[],
  countyArea: number,
  target = 2000,
): Map<string, number> {
  const [w, s, e, n] = county.bbox;
  const step = Math.sqrt(((e - w) * (n - s)) / target) || 0.001;
  const weights = new Map<string, number>();
  let inside = 0;
  for (let y = s + step / 2; y < n; y += step) {
    const weight = Math.cos((y * Math.PI) / 180);
    for (let x = w + step / 2; x < e; x += step) {
      if (!booleanPointInPolygon([x, y], county.feature)) continue;
      inside += weight;
      const hit = candidates.find((r) => booleanPointInPolygon([x, y], r.feature));
      if (hit) weights.set(hit.code, (weights.get(hit.code) ?? 0) + weight);
    }
  }
  const out = new Map<string, number>();
  if (inside > 0) for (const [code, wgt] of weights) out.set(code, (wgt / inside) * countyArea);
  return out;
}

export function countyOverlap(county: County, regions: EpaRegion[]): CountyOverlap {
  const candidates = regions.filter((r) => bboxesOverlap(r.bbox, county.bbox));
  const countyArea = area(county.feature);
  try {
    return { county, countyArea, byRegion: intersectAreas(county, candidates), method: 'intersect' };
  } catch {
    return { county, countyArea, byRegion: sampleAreas(county, candidates, countyArea), method: 'sampling' };
  }
}
