/**
 * Point lookups against the EPA Level III polygons: which region holds a point, and how far the point is
 * from that region's boundary. The boundary test is the expensive part, so every boundary segment is put
 * in a coarse lon/lat grid and only segments whose box comes within the asked distance are measured.
 */
import { booleanPointInPolygon, lineString, point, pointToLineDistance } from '@turf/turf';
import type { Position } from 'geojson';
import type { EpaRegion } from './geo-sources.js';

const CELL_DEG = 0.25;
const KM_PER_DEG_LAT = 111.2;

interface Segment {
  region: string;
  a: Position;
  b: Position;
  box: [number, number, number, number];
}

function rings(region: EpaRegion): Position[][] {
  const g = region.feature.geometry;
  return g.type === 'Polygon' ? g.coordinates : g.coordinates.flat();
}

export class RegionLocator {
  private readonly grid = new Map<string, Segment[]>();

  constructor(readonly regions: EpaRegion[]) {
    for (const r of regions) {
      for (const ring of rings(r)) {
        for (let i = 1; i < ring.length; i++) {
          const a = ring[i - 1];
          const b = ring[i];
          const seg: Segment = {
            region: r.code,
            a,
            b,
            box: [Math.min(a[0], b[0]), Math.min(a[1], b[1]), Math.max(a[0], b[0]), Math.max(a[1], b[1])],
          };
          for (let cx = Math.floor(seg.box[0] / CELL_DEG); cx <= Math.floor(seg.box[2] / CELL_DEG); cx++) {
            for (let cy = Math.floor(seg.box[1] / CELL_DEG); cy <= Math.floor(seg.box[3] / CELL_DEG); cy++) {
              const key = `${cx},${cy}`;
              const list = this.grid.get(key);
              if (list) list.push(seg);
              else this.grid.set(key, [seg]);
            }
          }
        }
      }
    }
  }

  /** The region whose polygon contains the point, if any (the polygons do not overlap). */
  regionAt(lon: number, lat: number): EpaRegion | undefined {
    return this.regions.find(
      (r) =>
        lon >= r.bbox[0] &&
        lon <= r.bbox[2] &&
        lat >= r.bbox[1] &&
        lat <= r.bbox[3] &&
        booleanPointInPolygon([lon, lat], r.feature),
    );
  }

  /**
   * Kilometres from the point to the nearest boundary segment of `code`'s polygon, or Infinity when no
   * segment lies within `limitKm` (the fast path: nothing near in the grid means far enough).
   */
  boundaryDistanceKm(code: string, lon: number, lat: number, limitKm: number): number {
    const dLat = limitKm / KM_PER_DEG_LAT;
    const dLon = limitKm / (KM_PER_DEG_LAT * Math.max(0.1, Math.cos((lat * Math.PI) / 180)));
    const box = [lon - dLon, lat - dLat, lon + dLon, lat + dLat];
    const seen = new Set<Segment>();
    let best = Infinity;
    const p = point([lon, lat]);
    for (let cx = Math.floor(box[0] / CELL_DEG); cx <= Math.floor(box[2] / CELL_DEG); cx++) {
      for (let cy = Math.floor(box[1] / CELL_DEG); cy <= Math.floor(box[3] / CELL_DEG); cy++) {
        for (const seg of this.grid.get(`${cx},${cy}`) ?? []) {
          if (seg.region !== code || seen.has(seg)) continue;
          seen.add(seg);
          if (seg.box[0] > box[2] || seg.box[2] < box[0] || seg.box[1] > box[3] || seg.box[3] < box[1]) continue;
          const km = pointToLineDistance(p, lineString([seg.a, seg.b]), { units: 'kilometers' });
          if (km < best) best = km;
        }
      }
    }
    return best < limitKm ? best : Infinity;
  }

  /** The region nearest to a point outside every polygon, searching outwards to `maxKm`. */
  nearestRegion(lon: number, lat: number, maxKm = 200): { code: string; km: number } | undefined {
    for (let limit = 5; limit <= maxKm; limit *= 2) {
      let best: { code: string; km: number } | undefined;
      for (const r of this.regions) {
        const km = this.boundaryDistanceKm(r.code, lon, lat, limit);
        if (km < (best?.km ?? Infinity)) best = { code: r.code, km };
      }
      if (best) return best;
    }
    return undefined;
  }
}
