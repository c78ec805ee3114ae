import { makeStyles, tokens } from '@fluentui/react-components';
import type { RangeTuple } from 'fuse.js';
import type { ReactNode } from 'react';

const useStyles = makeStyles({
  mark: {
    backgroundColor: tokens.colorPaletteYellowBackground2,
    color: 'inherit',
    borderRadius: tokens.borderRadiusSmall,
    // An underline as well as the tint, so the highlight survives high-contrast modes and greyscale.
    textDecorationLine: 'underline',
    textDecorationThickness: '1px',
  },
});

/** Text with the inclusive [start, end] ranges wrapped in <mark>. */
export function HighlightedText({ text, ranges }: { text: string; ranges?: readonly RangeTuple[] }) {
  const styles = useStyles();
  if (!ranges || ranges.length === 0) return <>{text}</>;
  const parts: ReactNode[] = [];
  let at = 0;
  for (const [start, end] of ranges) {
    if (start > at) parts.push(text.slice(at, start));
    parts.push(
      <mark key={start} className={styles.mark}>
        {text.slice(start, end + 1)}
      </mark>,
    );
    at = end + 1;
  }
  if (at < text.length) parts.push(text.slice(at));
  return <>{parts}</>;
}
