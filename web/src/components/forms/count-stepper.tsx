import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { AddRegular, SubtractRegular } from '@fluentui/react-icons';

const useStyles = makeStyles({
  stepper: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  count: {
    minWidth: '2.5rem',
    textAlign: 'center',
    fontSize: tokens.fontSizeBase400,
    fontWeight: tokens.fontWeightSemibold,
    fontVariantNumeric: 'tabular-nums',
  },
  // 44 px: the smallest touch target a thumb hits reliably (WCAG 2.5.5, common practice).
  button: { minWidth: '44px', minHeight: '44px' },
});

export interface CountStepperProps {
  /** Names the plants counted, e.g. "Plants of Wild bergamot". */
  label: string;
  value: number;
  max: number;
  onChange: (value: number) => void;
}

/** A count from 0 to `max` with big − and + buttons: easier than typing on a phone. */
export function CountStepper({ label, value, max, onChange }: CountStepperProps) {
  const styles = useStyles();
  return (
    <div className={styles.stepper} role="group" aria-label={label}>
      <Button
        className={styles.button}
        icon={<SubtractRegular />}
        aria-label={`One fewer: ${label}`}
        disabled={value <= 0}
        onClick={() => onChange(Math.max(0, value - 1))}
      />
      <output className={styles.count} aria-live="polite" aria-label={label}>
        {value}
      </output>
      <Button
        className={styles.button}
        icon={<AddRegular />}
        aria-label={`One more: ${label}`}
        disabled={value >= max}
        onClick={() => onChange(Math.min(max, value + 1))}
      />
    </div>
  );
}
