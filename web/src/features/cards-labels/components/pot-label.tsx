import { makeStyles, tokens } from '@fluentui/react-components';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { flowerSwatch } from '../../../theme/flower-colours.js';
import { treatmentShort } from '../utils/treatment-words.js';

const useStyles = makeStyles({
  label: {
    boxSizing: 'border-box',
    display: 'flex',
    overflow: 'hidden',
    backgroundColor: tokens.colorNeutralBackground1,
    color: tokens.colorNeutralForeground1,
    // Dashed cut lines between labels printed on plain paper.
    outline: `1px dashed ${tokens.colorNeutralStroke1}`,
    outlineOffset: '-0.5px',
    fontFamily: tokens.fontFamilyBase,
    fontSize: '8pt',
    lineHeight: 1.25,
    breakInside: 'avoid',
  },
  band: {
    flexShrink: 0,
    width: '0.08in',
    margin: '1px 0 1px 1px',
    borderRight: `1px solid ${tokens.colorNeutralForeground1}`,
  },
  body: {
    minWidth: 0,
    flexGrow: 1,
    padding: '0.05in 0.08in',
    display: 'flex',
    flexDirection: 'column',
    justifyContent: 'center',
  },
  line: { margin: 0, whiteSpace: 'nowrap', overflow: 'hidden', textOverflow: 'ellipsis' },
  common: { fontWeight: 700, fontSize: '10.5pt', lineHeight: 1.2 },
  scientific: { fontStyle: 'italic' },
  treatment: { fontWeight: 700 },
});

/** A pot label: names, sow date and the seed treatment in a few letters. */
export function PotLabel({ species, sowDate }: { species: SpeciesDetail; sowDate: string }) {
  const styles = useStyles();
  const swatch = flowerSwatch(species.flowerColours[0]);
  return (
    <div className={styles.label} data-testid="pot-label">
      <span className={styles.band} style={{ backgroundColor: swatch.fill }} aria-hidden />
      <div className={styles.body}>
        <p className={`${styles.line} ${styles.common}`}>
          {species.commonNames[0].charAt(0).toUpperCase() + species.commonNames[0].slice(1)}
        </p>
        <p className={`${styles.line} ${styles.scientific}`}>{species.scientificName}</p>
        <p className={styles.line}>Sown {sowDate}</p>
        <p className={`${styles.line} ${styles.treatment}`}>{treatmentShort(species.germination)}</p>
      </div>
    </div>
  );
}
