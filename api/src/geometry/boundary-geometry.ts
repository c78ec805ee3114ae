import type { MultiPolygon, Polygon, Position } from 'geojson';
import { apiWords } from '../common/i18n/api-i18n.js';
import type { FieldProblem } from '../common/validation/bad-request.js';

/** The API's words in one language (`apiWords(locale)`). */
type Say = ReturnType<typeof apiWords>;

/**
 * Checks one GeoJSON Polygon or MultiPolygon (RFC 7946: [longitude, latitude] positions, closed
 * rings of at least 4 positions) whatever shape the upload gave it, and names each problem under
 * `at` (e.g. `features[3].geometry`), in the words `say` gives. A geometry with no problems is safe to index.
 */
export function geometryProblems(g: unknown, at: string, say: Say = apiWords('en')): FieldProblem[] {
  const geometry = g as { type?: unknown; coordinates?: unknown } | null;
  if (!geometry || typeof geometry !== 'object' || (geometry.type !== 'Polygon' && geometry.type !== 'MultiPolygon')) {
    return [{ field: at, message: say('validation.geojson.notPolygon') }];
  }
  const coords = geometry.coordinates;
  if (!Array.isArray(coords) || coords.length === 0)
    return [{ field: `${at}.coordinates`, message: say('validation.geojson.emptyCoordinates') }];
  if (geometry.type === 'Polygon') return polygonProblems(coords, at, say);
  return coords.flatMap((rings, p) =>
    Array.isArray(rings) && rings.length > 0
      ? polygonProblems(rings, `${at}[${p}]`, say)
      : [{ field: `${at}.coordinates[${p}]`, message: say('validation.geojson.notRings') }],
  );
}

function polygonProblems(rings: unknown[], at: string, say: Say): FieldProblem[] {
  const out: FieldProblem[] = [];
  rings.forEach((ring, r) => {
    if (!Array.isArray(ring) || ring.length < 4) {
      out.push({ field: `${at}.coordinates[${r}]`, message: say('validation.geojson.shortRing') });
      return;
    }
    const bad = ring.findIndex((p) => !isPosition(p));
    if (bad >= 0)
      out.push({
        field: `${at}.coordinates[${r}][${bad}]`,
        message: say('validation.geojson.notPosition'),
      });
    const [a, z] = [ring[0] as Position, ring[ring.length - 1] as Position];
    if (bad < 0 && (a[0] !== z[0] || a[1] !== z[1]))
      out.push({ field: `${at}.coordinates[${r}]`, message: say('validation.geojson.openRing') });
  });
  return out;
}

function isPosition(p: unknown): p is Position {
  return (
    Array.isArray(p) &&
    p.length >= 2 &&
    p.length <= 3 &&
    p.every((n) => typeof n === 'number' && Number.isFinite(n)) &&
    Math.abs(p[0]) <= 180 &&
    Math.abs(p[1]) <= 90
  );
}

/** Positions in a checked geometry (for the import's vertex count). */
export function vertexCount(g: Polygon | MultiPolygon): number {
  const polygons: Position[][][] = g.type === 'Polygon' ? [g.coordinates] : g.coordinates;
  return polygons.flat(2).length;
}
