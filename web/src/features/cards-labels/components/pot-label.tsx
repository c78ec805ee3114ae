import { useFormatters, useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
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
    // Six short lines in a 1 in (25 mm) label: 10.5 pt name plus five 7.5 pt lines stay under 0.8 in.
    fontSize: '7.5pt',
    lineHeight: 1.15,
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
    padding: '0.04in 0.08in',
    display: 'flex',
    flexDirection: 'column',
    justifyContent: 'center',
  },
  line: { margin: 0, whiteSpace: 'nowrap', overflow: 'hidden', textOverflow: 'ellipsis' },
  common: { fontWeight: 700, fontSize: '10.5pt', lineHeight: 1.2 },
  scientific: { fontStyle: 'italic' },
  treatment: { fontWeight: 700 },
});

/** A pot label: names, sow date, light and soil, height, and the seed treatment in a few letters. */
export function PotLabel({ species, sowDate }: { species: SpeciesDetail; sowDate: string }) {
  const styles = useStyles();
  const { t } = useTranslation('cards');
  const f = useFormatters();
  const words = useWords();
  const swatch = flowerSwatch(species.flowerColours[0]);
  return (
    <div className={styles.label} data-testid="pot-label">
      <span className={styles.band} style={{ backgroundColor: swatch.fill }} aria-hidden />
      <div className={styles.body}>
        <p className={`${styles.line} ${styles.common}`}>
          {species.commonNames[0].charAt(0).toUpperCase() + species.commonNames[0].slice(1)}
        </p>
        <p className={`${styles.line} ${styles.scientific}`}>{species.scientificName}</p>
        <p className={styles.line}>{t('label.sown', { date: sowDate })}</p>
        <p className={styles.line}>{words.siteShortWords(species.sun, species.moisture)}</p>
        <p className={styles.line}>
          {t('label.tall', { height: f.heightRange(species.heightCm.min, species.heightCm.max) })}
        </p>
        <p className={`${styles.line} ${styles.treatment}`}>
          {treatmentShort(species.germination, words, t('label.surface'))}
        </p>
      </div>
    </div>
  );
}
