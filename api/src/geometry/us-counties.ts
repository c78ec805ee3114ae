import { createRequire } from 'node:module';
import { feature } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import type { AreaFeature } from './polygon-index.js';

/** County outlines (Census cartographic boundaries, 1:10M) shipped by the us-atlas package. */
export function loadCountyOutlines(): AreaFeature<{ name: string }>[] {
  const topology = createRequire(import.meta.url)('us-atlas/counties-10m.json') as Topology<{
    counties: GeometryCollection<{ name: string }>;
  }>;
  const collection = feature(topology, topology.objects.counties);
  return collection.features.filter(
    (f): f is AreaFeature<{ name: string }> => f.geometry?.type === 'Polygon' || f.geometry?.type === 'MultiPolygon',
  );
}
