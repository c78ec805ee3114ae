import { makeStyles, tokens } from '@fluentui/react-components';
import { Fragment, type ReactNode } from 'react';
import { hgTokens } from '../../../theme/index.js';

const useStyles = makeStyles({
  list: {
    display: 'grid',
    gridTemplateColumns: 'minmax(110px, max-content) 1fr',
    gap: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalL}`,
    margin: 0,
    '@media (max-width: 480px)': { gridTemplateColumns: '1fr', rowGap: tokens.spacingVerticalXXS },
  },
  term: { color: hgTokens.hgColorLoam, fontWeight: tokens.fontWeightSemibold },
  value: { margin: 0, '@media (max-width: 480px)': { marginBottom: tokens.spacingVerticalS } },
});

/** Label and value pairs as a description list, one pair a row (stacked on a phone). */
export function FactList({ facts }: { facts: [string, ReactNode][] }) {
  const styles = useStyles();
  return (
    <dl className={styles.list}>
      {facts.map(([term, value]) => (
        <Fragment key={term}>
          <dt className={styles.term}>{term}</dt>
          <dd className={styles.value}>{value}</dd>
        </Fragment>
      ))}
    </dl>
  );
}
