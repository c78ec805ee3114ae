import { Field, makeStyles, Radio, RadioGroup, tokens } from '@fluentui/react-components';
import { useLocale } from '../../../lib/i18n/index.js';
import { slotWords } from '../utils/share-facts.js';
import { useTranslation } from 'react-i18next';

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
  const { t } = useTranslation('taker');
  const { locale } = useLocale();
  const styles = useStyles();
  return (
    <Field label={t('slotLegend')} required validationMessage={error} validationState={error ? 'error' : 'none'}>
      <RadioGroup name="pickup-slot" value={value} onChange={(_, d) => onChange(d.value)}>
        {slots.map((s) => (
          <Radio
            key={s.id}
            value={s.id}
            disabled={s.left <= 0 || s.past === true}
            label={
              <span className={styles.label}>
                <span className={styles.time}>{slotWords(s, locale)}</span>
                <span className={styles.line}>
                  {s.past ? t('slotPast') : s.left <= 0 ? t('slotFull') : t('slotLeft', { count: s.left })}
                </span>
              </span>
            }
          />
        ))}
      </RadioGroup>
    </Field>
  );
}
