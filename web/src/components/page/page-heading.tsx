import { mergeClasses } from '@fluentui/react-components';
import type { ReactNode } from 'react';
import { useHeadingStyles } from '../../theme/index.js';

type Level = 'page' | 'section' | 'card';
const TAGS = { page: 'h1', section: 'h2', card: 'h3' } as const;

/** Headings in Merriweather: `page` is the one h1 of a screen, `section` h2, `card` h3. */
export function Heading({
  level = 'page',
  id,
  className,
  children,
}: {
  level?: Level;
  id?: string;
  className?: string;
  children: ReactNode;
}) {
  const styles = useHeadingStyles();
  const Tag = TAGS[level];
  return (
    <Tag id={id} className={mergeClasses(styles.base, styles[level], className)}>
      {children}
    </Tag>
  );
}
