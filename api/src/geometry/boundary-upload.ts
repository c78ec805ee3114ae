import { assertJsonDepth, MAX_JSON_DEPTH } from '../common/http/json-depth.js';
import type { WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { badRequest, type FieldProblem } from '../common/validation/bad-request.js';
import { geometryProblems, vertexCount } from './boundary-geometry.js';
import type { MultiPolygon, Polygon } from 'geojson';

export interface BoundaryFeature {
  code: string;
  name: string;
  geometry: Polygon | MultiPolygon;
  vertices: number;
}

/**
 * Checks an uploaded GeoJSON FeatureCollection of Level III regions (properties US_L3CODE and
 * US_L3NAME, as the EPA publishes them; RFC 7946 lon/lat) and returns its features, or answers 400
 * naming every problem (in `locale`). `knownCodes` are the regions in the catalogue.
 */
export function parseBoundaryUpload(
  text: string,
  knownCodes: Map<string, string>,
  locale: WordLocale = 'en',
): BoundaryFeature[] {
  const say = apiWords(locale);
  // Checked on the raw text first, as JSON bodies are: no upload can make the parser recurse without bound.
  assertJsonDepth(text, MAX_JSON_DEPTH, 'file');
  let doc: { type?: unknown; features?: unknown };
  try {
    doc = JSON.parse(text);
  } catch {
    throw badRequest(
      [{ field: 'file', message: say('validation.geojson.notJson') }],
      say('validation.geojson.notJsonSentence'),
    );
  }
  if (doc?.type !== 'FeatureCollection' || !Array.isArray(doc.features) || doc.features.length === 0) {
    throw badRequest(
      [{ field: 'file', message: say('validation.geojson.notCollection') }],
      say('validation.geojson.notCollectionSentence'),
    );
  }
  const problems: FieldProblem[] = [];
  const out: BoundaryFeature[] = [];
  const seen = new Set<string>();
  (doc.features as unknown[]).forEach((item, i) => {
    const at = `features[${i}]`;
    const f = (item && typeof item === 'object' ? item : {}) as {
      properties?: Record<string, unknown> | null;
      geometry?: unknown;
    };
    if (f.properties !== undefined && (typeof f.properties !== 'object' || Array.isArray(f.properties)))
      f.properties = null;
    const code = propertyText(f.properties?.US_L3CODE);
    const name = propertyText(f.properties?.US_L3NAME);
    if (!knownCodes.has(code))
      problems.push({
        field: `${at}.properties.US_L3CODE`,
        message: say('validation.geojson.notRegionCode', { code: code.slice(0, 20) }),
      });
    if (!name) problems.push({ field: `${at}.properties.US_L3NAME`, message: say('validation.geojson.required') });
    if (seen.has(code))
      problems.push({ field: `${at}.properties.US_L3CODE`, message: say('validation.geojson.twice', { code }) });
    seen.add(code);
    const geometryIssues = geometryProblems(f.geometry, `${at}.geometry`, say);
    problems.push(...geometryIssues);
    if (geometryIssues.length) return;
    const g = f.geometry as Polygon | MultiPolygon;
    out.push({ code, name, geometry: g, vertices: vertexCount(g) });
  });
  if (problems.length) {
    throw badRequest(problems.slice(0, 200), say('validation.geojson.problems', { count: problems.length }));
  }
  return out;
}

/** A property as text; only strings and numbers count (an object could not be turned into text safely). */
function propertyText(v: unknown): string {
  return typeof v === 'string' || typeof v === 'number' ? String(v).trim() : '';
}
