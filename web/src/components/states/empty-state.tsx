import { makeStyles, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';

const useStyles = makeStyles({
  root: {
    padding: tokens.spacingVerticalL,
    borderRadius: tokens.borderRadiusXLarge,
    border: `1px dashed ${tokens.colorNeutralStroke1}`,
    color: tokens.colorNeutralForeground2,
  },
  title: { margin: 0, fontWeight: tokens.fontWeightSemibold, color: tokens.colorNeutralForeground1 },
  body: { margin: `${tokens.spacingVerticalXS} 0 0` },
});

/** Nothing to show yet, said plainly, with what would fill the space. */
export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  const styles = useStyles();
  return (
    <div className={styles.root}>
      <p className={styles.title}>{title}</p>
      {children ? <p className={styles.body}>{children}</p> : null}
    </div>
  );
}
