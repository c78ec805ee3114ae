import { type Species, joinWords } from '@homeground/shared';
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
  const lines = sectionSources(sources, fields);
  return (
    <p className={styles.note}>
      {lines.length === 1 ? 'Source: ' : 'Sources: '}
      {lines.map((l, i) => (
        <span key={l.key}>
          {i > 0 ? '; ' : ''}
          {l.citation} ({joinWords(l.fields)})
        </span>
      ))}
      .
    </p>
  );
}
