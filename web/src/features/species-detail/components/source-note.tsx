import { useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import type { Species } from '@homeground/shared';
import { makeStyles, tokens } from '@fluentui/react-components';
import { hgTokens } from '../../../theme/index.js';
import { sectionSources } from '../utils/source-labels.js';

const useStyles = makeStyles({
  note: { margin: `${tokens.spacingVerticalM} 0 0`, fontSize: tokens.fontSizeBase200, color: hgTokens.hgColorLoam },
});

/** "Sources: USDA PLANTS Database (growth form, lifespan); …" for one section's facts. */
export function SourceNote({
  sources,
  fields,
}: {
  sources: Species['sources'];
  fields: readonly (keyof Species['sources'])[];
}) {
  const styles = useStyles();
  const { t } = useTranslation('detail');
  const words = useWords();
  const lines = sectionSources(sources, fields, words.sourcedField, t('sources.unrecorded'));
  const text = lines.map((l) => t('sources.line', { citation: l.citation, fields: words.join(l.fields) })).join('; ');
  return (
    <p className={styles.note}>
      {lines.length === 1 ? t('sources.one', { lines: text }) : t('sources.many', { lines: text })}
    </p>
  );
}
