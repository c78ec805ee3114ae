import { BadRequestException } from '@nestjs/common';
import type { Feature, MultiPolygon, Polygon, Position } from 'geojson';

export interface BoundaryFeature {
  code: string;
  name: string;
  geometry: Polygon | MultiPolygon;
  vertices: number;
}

type Problem = { field: string; message: string };

function ringProblems(rings: Position[][], at: string): Problem[] {
  const out: Problem[] = [];
  rings.forEach((ring, r) => {
    if (!Array.isArray(ring) || ring.length < 4) out.push({ field: `${at}.coordinates[${r}]`, message: 'a ring needs at least 4 positions' });
    else {
      const bad = ring.findIndex((p) => !Array.isArray(p) || !Number.isFinite(p[0]) || !Number.isFinite(p[1]) || Math.abs(p[0]) > 180 || Math.abs(p[1]) > 90);
      if (bad >= 0) out.push({ field: `${at}.coordinates[${r}][${bad}]`, message: 'must be [longitude, latitude] in degrees (WGS84)' });
      const [a, z] = [ring[0], ring[ring.length - 1]];
      if (bad < 0 && (a[0] !== z[0] || a[1] !== z[1])) out.push({ field: `${at}.coordinates[${r}]`, message: 'a ring must end where it starts' });
    }
  });
  return out;
}

/**
 * Checks an uploaded GeoJSON FeatureCollection of Level III regions (properties US_L3CODE and
 * US_L3NAME, as the EPA publishes them; RFC 7946 lon/lat) and returns its features, or answers 400
 * naming every problem. `knownCodes` are the regions in the catalogue.
 */
export function parseBoundaryUpload(text: string, knownCodes: Map<string, string>): BoundaryFeature[] {
  let doc: { type?: unknown; features?: unknown };
  try {
    doc = JSON.parse(text);
  } catch {
    throw new BadRequestException({ message: 'The file is not valid JSON.', fields: [{ field: 'file', message: 'is not valid JSON' }] });
  }
  if (doc?.type !== 'FeatureCollection' || !Array.isArray(doc.features) || doc.features.length === 0) {
    throw new BadRequestException({ message: 'Expected a GeoJSON FeatureCollection with features.', fields: [{ field: 'file', message: 'must be a GeoJSON FeatureCollection' }] });
  }
  const problems: Problem[] = [];
  const out: BoundaryFeature[] = [];
  const seen = new Set<string>();
  (doc.features as Feature[]).forEach((f, i) => {
    const at = `features[${i}]`;
    const code = String(f?.properties?.US_L3CODE ?? '').trim();
    const name = String(f?.properties?.US_L3NAME ?? '').trim();
    if (!knownCodes.has(code)) problems.push({ field: `${at}.properties.US_L3CODE`, message: `"${code}" is not an EPA Level III code (1–85)` });
    if (!name) problems.push({ field: `${at}.properties.US_L3NAME`, message: 'is required' });
    if (seen.has(code)) problems.push({ field: `${at}.properties.US_L3CODE`, message: `${code} appears twice` });
    seen.add(code);
    const g = f?.geometry;
    if (!g || (g.type !== 'Polygon' && g.type !== 'MultiPolygon')) {
      problems.push({ field: `${at}.geometry`, message: 'must be a Polygon or MultiPolygon' });
      return;
    }
    const polygons: Position[][][] = g.type === 'Polygon' ? [g.coordinates] : g.coordinates;
    polygons.forEach((rings, p) => problems.push(...ringProblems(rings, g.type === 'Polygon' ? `${at}.geometry` : `${at}.geometry[${p}]`)));
    out.push({ code, name, geometry: g, vertices: polygons.flat(2).length });
  });
  if (problems.length) {
    throw new BadRequestException({ message: `The file has ${problems.length} problem(s); nothing was imported.`, fields: problems.slice(0, 200) });
  }
  return out;
}
