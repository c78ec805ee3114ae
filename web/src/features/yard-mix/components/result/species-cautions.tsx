import { makeStyles, tokens } from '@fluentui/react-components';
import { Warning16Regular } from '@fluentui/react-icons';
import type { SpeciesCaution } from '../../hooks/use-mix-cautions.js';

const useStyles = makeStyles({
  list: {
    listStyle: 'none',
    margin: `${tokens.spacingVerticalXS} 0 0`,
    padding: 0,
    display: 'grid',
    gap: tokens.spacingVerticalXXS,
  },
  item: {
    display: 'flex',
    gap: tokens.spacingHorizontalXS,
    alignItems: 'flex-start',
    fontSize: tokens.fontSizeBase200,
    color: tokens.colorNeutralForeground1,
  },
  icon: { flexShrink: 0, marginTop: '2px', color: tokens.colorStatusWarningForeground3 },
});

/** Cautions where the species appears: calm and specific, with a word before the icon so colour is not needed. */
export function SpeciesCautions({ name, cautions }: { name: string; cautions: readonly SpeciesCaution[] | undefined }) {
  const styles = useStyles();
  if (!cautions || cautions.length === 0) return null;
  return (
    <ul className={styles.list} aria-label={`Cautions for ${name}`}>
      {cautions.map((c) => (
        <li key={c.kind} className={styles.item}>
          <Warning16Regular className={styles.icon} aria-hidden />
          <span>
            <strong>Caution:</strong> {c.text}
          </span>
        </li>
      ))}
    </ul>
  );
}
