import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { geoAlbersUsa, geoPath } from 'd3-geo';
import type { OutlineGeometry } from '@homeground/shared';
import type { Feature, FeatureCollection, Geometry } from 'geojson';
import { useMemo, useRef, type MouseEvent } from 'react';
import { feature } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import statesTopology from 'us-atlas/states-10m.json';

const WIDTH = 975;
const HEIGHT = 610;
/** Alaska, Hawaii and the territories: Homeground covers the 48 conterminous states and DC. */
const OUTSIDE_COVERAGE = new Set(['02', '15', '60', '66', '69', '72', '78']);

const useStyles = makeStyles({
  svg: { width: '100%', height: 'auto', display: 'block', cursor: 'crosshair', touchAction: 'manipulation' },
  state: {
    fill: tokens.colorBrandBackground2,
    stroke: tokens.colorNeutralBackground1,
    strokeWidth: '1',
    ':hover': { fill: tokens.colorBrandBackground2Hover },
  },
  chosenState: { fill: tokens.colorBrandBackground, ':hover': { fill: tokens.colorBrandBackgroundHover } },
  outline: {
    fill: tokens.colorPaletteMarigoldBackground2,
    fillOpacity: 0.75,
    stroke: tokens.colorPaletteMarigoldBorderActive,
    strokeWidth: '1.5',
    pointerEvents: 'none',
  },
  marker: { fill: tokens.colorPaletteMarigoldBackground3, stroke: tokens.colorNeutralForeground1, strokeWidth: '2' },
});

type StateFeature = Feature<Geometry, { name: string }>;

/**
 * An offline map of the lower 48 from us-atlas (Census cartographic boundaries), drawn with
 * d3-geo's Albers USA projection. A click is inverted back to latitude and longitude; nothing is
 * fetched from any tile server.
 */
export interface UsMapProps {
  onPick: (point: { lat: number; lon: number }) => void;
  label: string;
  /** The place found or clicked, marked on the map. */
  point?: { lat: number; lon: number } | null;
  /** The chosen state's name, shaded when no ecoregion outline is drawn. */
  state?: string | null;
  /** The chosen ecoregion's EPA outline, drawn over the states when the boundaries are loaded. */
  outline?: { name: string; geometry: OutlineGeometry } | null;
}

export function UsMap({ onPick, label, point, state, outline }: UsMapProps) {
  const styles = useStyles();
  const svgRef = useRef<SVGSVGElement>(null);

  const { projection, path, shapes } = useMemo(() => {
    const topo = statesTopology as unknown as Topology<{ states: GeometryCollection<{ name: string }> }>;
    const all = feature(topo, topo.objects.states) as FeatureCollection<Geometry, { name: string }>;
    const lower48: FeatureCollection<Geometry, { name: string }> = {
      type: 'FeatureCollection',
      features: all.features.filter((f) => !OUTSIDE_COVERAGE.has(String(f.id))),
    };
    const proj = geoAlbersUsa().fitSize([WIDTH, HEIGHT], lower48);
    const path = geoPath(proj);
    return {
      projection: proj,
      path,
      shapes: lower48.features.map((f: StateFeature) => ({
        id: String(f.id),
        name: f.properties.name,
        d: path(f) ?? '',
      })),
    };
  }, []);

  const click = (event: MouseEvent<SVGSVGElement>) => {
    const svg = svgRef.current;
    const ctm = svg?.getScreenCTM();
    if (!svg || !ctm) return;
    const pt = new DOMPoint(event.clientX, event.clientY).matrixTransform(ctm.inverse());
    const lonLat = projection.invert?.([pt.x, pt.y]);
    if (!lonLat) return;
    onPick({ lat: Math.round(lonLat[1] * 10_000) / 10_000, lon: Math.round(lonLat[0] * 10_000) / 10_000 });
  };

  const marker = point ? projection([point.lon, point.lat]) : null;
  const outlinePath = useMemo(
    () => (outline ? path({ type: 'Feature', properties: {}, geometry: outline.geometry }) : null),
    [outline, path],
  );

  return (
    <svg
      ref={svgRef}
      viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
      className={styles.svg}
      role="img"
      aria-label={label}
      onClick={click}
    >
      {shapes.map((s) => (
        <path
          key={s.id}
          d={s.d}
          className={mergeClasses(styles.state, !outlinePath && s.name === state && styles.chosenState)}
          data-state={s.name}
          data-chosen={!outlinePath && s.name === state ? 'true' : undefined}
        >
          <title>{s.name}</title>
        </path>
      ))}
      {outlinePath ? (
        <path d={outlinePath} className={styles.outline} data-ecoregion={outline?.name}>
          <title>{outline?.name}</title>
        </path>
      ) : null}
      {marker ? <circle cx={marker[0]} cy={marker[1]} r={9} className={styles.marker} /> : null}
    </svg>
  );
}
