import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import type { ElementType, ReactNode } from 'react';

const useStyles = makeStyles({
  card: {
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusXLarge,
    boxShadow: tokens.shadow4,
    padding: `${tokens.spacingVerticalXL} ${tokens.spacingHorizontalXL}`,
    '@media (max-width: 480px)': { padding: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalL}` },
  },
});

/** A white surface with 8 px corners and a soft shadow (DESIGN.md "Look"). */
export function ContentCard({
  as: Tag = 'section',
  className,
  children,
  ...aria
}: {
  as?: ElementType;
  className?: string;
  children: ReactNode;
  'aria-labelledby'?: string;
  'aria-label'?: string;
}) {
  const styles = useStyles();
  return (
    <Tag className={mergeClasses(styles.card, className)} {...aria}>
      {children}
    </Tag>
  );
}
