import { Field, makeStyles, Radio, RadioGroup, tokens } from '@fluentui/react-components';
import { slotWords } from '../utils/share-facts.js';
import { TAKER_WORDS as W } from '../utils/taker-words.js';

const useStyles = makeStyles({
  label: { display: 'flex', flexDirection: 'column', paddingBlock: tokens.spacingVerticalXS },
  time: { fontWeight: tokens.fontWeightSemibold, fontVariantNumeric: 'tabular-nums' },
  line: { color: tokens.colorNeutralForeground2, fontSize: tokens.fontSizeBase200 },
});

export interface SlotChoice {
  id: string;
  start: string;
  end: string;
  /** Households the slot can still take. */
  left: number;
  /** Started already: it can no longer be chosen. */
  past?: boolean;
}

/** The pickup slots as radio choices; a full slot is shown but cannot be chosen. */
export function SlotPicker({
  slots,
  value,
  onChange,
  error,
}: {
  slots: readonly SlotChoice[];
  value: string;
  onChange: (id: string) => void;
  error?: string;
}) {
  const styles = useStyles();
  return (
    <Field label={W.slotLegend} required validationMessage={error} validationState={error ? 'error' : 'none'}>
      <RadioGroup name="pickup-slot" value={value} onChange={(_, d) => onChange(d.value)}>
        {slots.map((s) => (
          <Radio
            key={s.id}
            value={s.id}
            disabled={s.left <= 0 || s.past === true}
            label={
              <span className={styles.label}>
                <span className={styles.time}>{slotWords(s)}</span>
                <span className={styles.line}>
                  {s.past ? W.slotPast : s.left <= 0 ? W.slotFull : W.slotLeft(s.left)}
                </span>
              </span>
            }
          />
        ))}
      </RadioGroup>
    </Field>
  );
}
