import { makeStyles, tokens } from '@fluentui/react-components';
import { useId, type ReactNode } from 'react';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';

const useStyles = makeStyles({
  heading: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  icon: { color: tokens.colorBrandForeground1, display: 'inline-flex' },
});

/** One group of facts on the species page: a white card with its heading and its sources. */
export function FactSection({
  title,
  icon,
  className,
  children,
}: {
  title: string;
  icon?: ReactNode;
  className?: string;
  children: ReactNode;
}) {
  const styles = useStyles();
  const id = useId();
  return (
    <ContentCard aria-labelledby={id} className={className}>
      <Heading level="section" id={id} className={styles.heading}>
        {icon ? (
          <span className={styles.icon} aria-hidden>
            {icon}
          </span>
        ) : null}
        {title}
      </Heading>
      {children}
    </ContentCard>
  );
}
