import type { FlowerColour } from '@homeground/shared';
import { makeStyles, tokens } from '@fluentui/react-components';
import { flowerSwatch } from '../../../theme/flower-colours.js';
import { hgTokens } from '../../../theme/index.js';

const useStyles = makeStyles({
  svg: { display: 'block', width: '100%', height: '100%' },
  ground: { stroke: hgTokens.hgColorLoam, strokeWidth: 3, fill: 'none', strokeLinecap: 'round' },
  stem: { stroke: tokens.colorBrandForeground2, strokeWidth: 3, fill: 'none', strokeLinecap: 'round' },
  leaf: { fill: tokens.colorBrandBackground, opacity: 0.85 },
  petalEdge: { stroke: tokens.colorNeutralStrokeAccessible, strokeWidth: 0.75 },
});

/** Flower heads along the stems: [cx, cy, r]. */
const HEADS: [number, number, number][] = [
  [100, 46, 15],
  [66, 70, 11],
  [136, 66, 12],
];

/**
 * Our own stylised plant for a species without a photo: three stems over a curved ground line, leaves in
 * sedge green, flower heads in the species' flower colour (a second colour, if any, at their centres).
 */
export function PlantDrawing({ flowerColours, label }: { flowerColours: readonly FlowerColour[]; label: string }) {
  const styles = useStyles();
  const petal = flowerSwatch(flowerColours[0]).fill;
  const centre = flowerColours[1] ? flowerSwatch(flowerColours[1]).fill : undefined;
  return (
    <svg className={styles.svg} viewBox="0 0 200 200" role="img" aria-label={label} preserveAspectRatio="xMidYMid meet">
      <path className={styles.ground} d="M24 180 Q 100 166 176 180" />
      <path className={styles.stem} d="M100 176 C 98 140, 102 90, 100 52" />
      <path className={styles.stem} d="M96 150 C 84 120, 70 96, 66 76" />
      <path className={styles.stem} d="M104 140 C 118 112, 132 90, 136 72" />
      <path className={styles.leaf} d="M99 160 C 80 156, 62 144, 54 128 C 74 130, 90 142, 99 160 Z" />
      <path className={styles.leaf} d="M101 124 C 120 122, 140 110, 148 94 C 128 96, 110 108, 101 124 Z" />
      <path className={styles.leaf} d="M99 104 C 86 100, 76 90, 72 80 C 86 82, 96 92, 99 104 Z" />
      {HEADS.map(([cx, cy, r]) => (
        <g key={`${cx}-${cy}`}>
          {Array.from({ length: 8 }, (_, i) => {
            const a = (i * Math.PI) / 4;
            return (
              <ellipse
                key={i}
                className={styles.petalEdge}
                cx={cx + Math.cos(a) * r * 0.7}
                cy={cy + Math.sin(a) * r * 0.7}
                rx={r * 0.5}
                ry={r * 0.32}
                transform={`rotate(${(a * 180) / Math.PI} ${cx + Math.cos(a) * r * 0.7} ${cy + Math.sin(a) * r * 0.7})`}
                fill={petal}
              />
            );
          })}
          <circle cx={cx} cy={cy} r={r * 0.32} fill={centre ?? petal} className={styles.petalEdge} />
        </g>
      ))}
    </svg>
  );
}
