import { useTranslation } from 'react-i18next';
import { Field, Input, makeStyles, Radio, RadioGroup, tokens } from '@fluentui/react-components';
import { cmToInches, inchesToCm, roundTo } from '@homeground/shared';
import { useId, useState } from 'react';
import { useDebouncedDraft } from '../hooks/use-debounced-draft.js';
import { isHeightRangeInverted } from '../utils/browser-state.js';
import { formatCm, formatFeet } from '../utils/height-words.js';

type Unit = 'ft' | 'cm';

const useStyles = makeStyles({
  root: { border: 'none', margin: 0, padding: 0, minWidth: 0 },
  legend: { fontWeight: tokens.fontWeightSemibold, padding: 0, marginBottom: tokens.spacingVerticalXS },
  inputs: { display: 'grid', gridTemplateColumns: '1fr 1fr', gap: tokens.spacingHorizontalS },
  input: { minWidth: 0, width: '100%' },
  echo: {
    color: tokens.colorNeutralForeground2,
    fontSize: tokens.fontSizeBase200,
    margin: `${tokens.spacingVerticalXS} 0 0`,
  },
});

/** A height in the chosen unit as the field shows it; empty when unset. */
function display(cm: number | undefined, unit: Unit): string {
  if (cm === undefined) return '';
  return unit === 'cm' ? String(roundTo(cm, 0)) : String(roundTo(cmToInches(cm) / 12, 1));
}

/** Field text → whole centimetres (the API's unit), or undefined for empty or unreadable input. */
function toCm(text: string, unit: Unit): number | undefined {
  const n = Number(text.trim().replace(',', '.'));
  if (text.trim() === '' || !Number.isFinite(n) || n < 0) return undefined;
  return Math.round(unit === 'cm' ? n : inchesToCm(n * 12));
}

function HeightInput({
  label,
  valueCm,
  unit,
  onCommit,
}: {
  label: 'from' | 'to';
  valueCm?: number;
  unit: Unit;
  onCommit: (cm: number | undefined) => void;
}) {
  const styles = useStyles();
  const { t } = useTranslation('species');
  const { draft, setDraft, flush } = useDebouncedDraft(display(valueCm, unit), (text) => onCommit(toCm(text, unit)), {
    normalize: (text) => display(toCm(text, unit), unit),
    delayMs: 600,
  });
  return (
    <Field label={t(`height.${label}`, { unit })}>
      <Input
        className={styles.input}
        inputMode="decimal"
        value={draft}
        onChange={(_, d) => setDraft(d.value)}
        onBlur={flush}
        onKeyDown={(e) => e.key === 'Enter' && flush()}
      />
    </Field>
  );
}

/** Height range, typed in feet or centimetres, always stored and sent as centimetres. */
export function HeightFilter({
  minCm,
  maxCm,
  onChange,
}: {
  minCm?: number;
  maxCm?: number;
  onChange: (change: { minHeightCm?: number; maxHeightCm?: number }) => void;
}) {
  const styles = useStyles();
  const { t } = useTranslation('species');
  const legendId = useId();
  const [unit, setUnit] = useState<Unit>('ft');
  const inverted = isHeightRangeInverted({ minHeightCm: minCm, maxHeightCm: maxCm });
  const other = (cm: number) => (unit === 'ft' ? formatCm(cm) : formatFeet(cm));
  let echo: string = t('height.any');
  if (minCm !== undefined && maxCm !== undefined) echo = t('height.between', { min: other(minCm), max: other(maxCm) });
  else if (minCm !== undefined) echo = t('height.atLeast', { min: other(minCm) });
  else if (maxCm !== undefined) echo = t('height.upTo', { max: other(maxCm) });

  return (
    <fieldset className={styles.root} aria-labelledby={legendId}>
      <legend id={legendId} className={styles.legend}>
        {t('height.legend')}
      </legend>
      <RadioGroup
        layout="horizontal"
        aria-label={t('height.unit')}
        value={unit}
        onChange={(_, d) => setUnit(d.value as Unit)}
      >
        <Radio value="ft" label={t('height.feet')} />
        <Radio value="cm" label={t('height.centimetres')} />
      </RadioGroup>
      <div className={styles.inputs}>
        <HeightInput label="from" valueCm={minCm} unit={unit} onCommit={(cm) => onChange({ minHeightCm: cm })} />
        <HeightInput label="to" valueCm={maxCm} unit={unit} onCommit={(cm) => onChange({ maxHeightCm: cm })} />
      </div>
      <p className={styles.echo} role={inverted ? 'alert' : undefined} aria-live={inverted ? undefined : 'polite'}>
        {inverted ? t('height.inverted') : echo}
      </p>
    </fieldset>
  );
}
