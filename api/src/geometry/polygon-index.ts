import { bbox, booleanPointInPolygon, lineString, pointToLineDistance } from '@turf/turf';
import Flatbush from 'flatbush';
import type { Feature, MultiPolygon, Polygon } from 'geojson';

export type AreaFeature<P extends Record<string, unknown> = Record<string, unknown>> = Feature<
  Polygon | MultiPolygon,
  P
>;

/**
 * Point-in-polygon over many polygons, with a Flatbush R-tree of their bounding boxes so a lookup
 * tests only the few polygons whose box holds the point.
 */
export class PolygonIndex<P extends Record<string, unknown>> {
  private readonly tree: Flatbush | null;

  constructor(private readonly features: AreaFeature<P>[]) {
    if (features.length === 0) {
      this.tree = null;
      return;
    }
    const tree = new Flatbush(features.length);
    for (const f of features) {
      const [minX, minY, maxX, maxY] = bbox(f);
      tree.add(minX, minY, maxX, maxY);
    }
    tree.finish();
    this.tree = tree;
  }

  get size(): number {
    return this.features.length;
  }

  /** The first feature whose properties match. */
  find(match: (properties: P) => boolean): AreaFeature<P> | undefined {
    return this.features.find((f) => match(f.properties));
  }

  /** The first polygon containing the point (polygons of one layer do not overlap). */
  containing(lon: number, lat: number): AreaFeature<P> | undefined {
    if (!this.tree) return undefined;
    for (const i of this.tree.search(lon, lat, lon, lat)) {
      if (booleanPointInPolygon([lon, lat], this.features[i])) return this.features[i];
    }
    return undefined;
  }

  /**
   * The nearest polygon within `maxKm`, for points that generalised outlines leave just outside
   * every polygon (a ZIP centroid on a coast or a lake shore).
   */
  nearest(lon: number, lat: number, maxKm: number): AreaFeature<P> | undefined {
    if (!this.tree) return undefined;
    const deg = maxKm / 80; // generous: a degree of longitude is at least ~80 km south of 44°N
    let best: { f: AreaFeature<P>; km: number } | undefined;
    for (const i of this.tree.search(lon - deg, lat - deg, lon + deg, lat + deg)) {
      const f = this.features[i];
      const rings = f.geometry.type === 'Polygon' ? f.geometry.coordinates : f.geometry.coordinates.flat();
      for (const ring of rings) {
        const km = pointToLineDistance([lon, lat], lineString(ring), { units: 'kilometers' });
        if (km <= maxKm && (!best || km < best.km)) best = { f, km };
      }
    }
    return best?.f;
  }
}
