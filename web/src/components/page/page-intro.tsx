import { makeStyles, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';
import { Heading } from './page-heading.js';

const useStyles = makeStyles({
  intro: { marginBottom: tokens.spacingVerticalXXL, maxWidth: '68ch' },
  lead: { fontSize: tokens.fontSizeBase400, lineHeight: tokens.lineHeightBase400, margin: 0 },
});

/** A screen's h1 and its one- or two-sentence lead. */
export function PageIntro({ title, children }: { title: string; children?: ReactNode }) {
  const styles = useStyles();
  return (
    <div className={styles.intro}>
      <Heading level="page">{title}</Heading>
      {children ? <p className={styles.lead}>{children}</p> : null}
    </div>
  );
}
