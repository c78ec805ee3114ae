import { useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { byStateListName, STATE_NAMES, US_STATE_CODES } from '@homeground/shared';
import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { Map20Regular } from '@fluentui/react-icons';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { SECTION_FIELDS } from '../utils/source-labels.js';
import { GRID_COLUMNS, GRID_ROWS, STATE_TILES } from '../utils/state-grid.js';
import { FactSection } from './fact-section.js';
import { SourceNote } from './source-note.js';

const useStyles = makeStyles({
  grid: {
    display: 'grid',
    gridTemplateColumns: `repeat(${GRID_COLUMNS}, 1fr)`,
    gridTemplateRows: `repeat(${GRID_ROWS}, auto)`,
    gap: '3px',
    maxWidth: '440px',
    marginBottom: tokens.spacingVerticalM,
  },
  tile: {
    aspectRatio: '1',
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'center',
    borderRadius: tokens.borderRadiusSmall,
    fontSize: tokens.fontSizeBase100,
    lineHeight: 1,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    color: tokens.colorNeutralForeground3,
    backgroundColor: tokens.colorNeutralBackground1,
  },
  // Native states are filled and bold; the rest are outlined, so the two read apart without colour.
  native: {
    backgroundColor: tokens.colorBrandBackground,
    color: tokens.colorNeutralForegroundOnBrand,
    border: `1px solid ${tokens.colorBrandBackground}`,
    fontWeight: tokens.fontWeightBold,
  },
  summary: { margin: `0 0 ${tokens.spacingVerticalS}` },
  names: { margin: `${tokens.spacingVerticalS} 0 0`, color: tokens.colorNeutralForeground2 },
  toggle: { cursor: 'pointer', color: tokens.colorBrandForegroundLink },
});

/** The states it is native to (USDA PLANTS), as a small tile grid and as words. */
export function NativeRange({ species }: { species: SpeciesDetail }) {
  const styles = useStyles();
  const { t } = useTranslation('detail');
  const words = useWords();
  const native = new Set(species.nativeStates);
  // Alphabetical by list name, so "the District of Columbia" sorts under D.
  const names = byStateListName(US_STATE_CODES.filter((c) => native.has(c))).map((c) => STATE_NAMES[c]);
  return (
    <FactSection title={t('range.title')} icon={<Map20Regular />}>
      <p className={styles.summary}>
        {names.length <= 6
          ? t('range.summaryNames', { count: names.length, names: words.join(names) })
          : t('range.summary', { count: names.length })}
      </p>
      <div className={styles.grid} aria-hidden>
        {US_STATE_CODES.map((code) => {
          const [col, row] = STATE_TILES[code];
          return (
            <span
              key={code}
              className={mergeClasses(styles.tile, native.has(code) && styles.native)}
              style={{ gridColumn: col + 1, gridRow: row + 1 }}
              title={native.has(code) ? t('range.tileNative', { state: STATE_NAMES[code] }) : STATE_NAMES[code]}
            >
              {code}
            </span>
          );
        })}
      </div>
      {names.length > 6 ? (
        <details>
          <summary className={styles.toggle}>{t('range.list', { count: names.length })}</summary>
          <p className={styles.names}>{words.join(names)}.</p>
        </details>
      ) : null}
      <SourceNote sources={species.sources} fields={SECTION_FIELDS.range} />
    </FactSection>
  );
}
