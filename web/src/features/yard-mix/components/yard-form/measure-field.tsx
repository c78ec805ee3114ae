import { Input, Label, makeStyles, Radio, RadioGroup, tokens } from '@fluentui/react-components';
import { ErrorCircle12Filled } from '@fluentui/react-icons';
import { useId } from 'react';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS },
  row: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalM}`,
  },
  input: { width: '10rem' },
  hint: {
    margin: 0,
    color: tokens.colorNeutralForeground3,
    fontSize: tokens.fontSizeBase200,
    lineHeight: tokens.lineHeightBase200,
  },
  error: {
    margin: 0,
    display: 'flex',
    gap: tokens.spacingHorizontalXS,
    alignItems: 'center',
    color: tokens.colorPaletteRedForeground1,
    fontSize: tokens.fontSizeBase200,
  },
});

export interface MeasureFieldProps<U extends string> {
  label: string;
  hint: string;
  value: string;
  onChange: (value: string) => void;
  unit: U;
  units: readonly { value: U; label: string; spoken: string }[];
  onUnitChange: (unit: U) => void;
  /** The same amount in the other unit system, e.g. "That is 18.6 m²." */
  other: string;
  error?: string;
  required?: boolean;
  name: string;
}

/**
 * A number with its unit switch beside it, and the amount in the other unit system below as it is
 * typed. Laid out by hand because a Fluent Field wraps exactly one control.
 */
export function MeasureField<U extends string>(props: MeasureFieldProps<U>) {
  const styles = useStyles();
  const inputId = useId();
  const hintId = useId();
  const errorId = useId();
  const current = props.units.find((u) => u.value === props.unit);
  return (
    <div className={styles.root}>
      <Label htmlFor={inputId} required={props.required}>
        {props.label}
      </Label>
      <div className={styles.row}>
        <Input
          id={inputId}
          className={styles.input}
          name={props.name}
          inputMode="decimal"
          value={props.value}
          onChange={(_, d) => props.onChange(d.value)}
          contentAfter={<span>{current?.label}</span>}
          aria-invalid={props.error ? true : undefined}
          aria-describedby={props.error ? `${errorId} ${hintId}` : hintId}
        />
        <RadioGroup
          layout="horizontal"
          aria-label={`Unit for ${props.label.replace(/ \(optional\)$/, '').toLowerCase()}`}
          value={props.unit}
          onChange={(_, d) => props.onUnitChange(d.value as U)}
        >
          {props.units.map((u) => (
            <Radio key={u.value} value={u.value} label={u.label} aria-label={u.spoken} />
          ))}
        </RadioGroup>
      </div>
      {props.error ? (
        <p id={errorId} className={styles.error}>
          <ErrorCircle12Filled aria-hidden />
          {props.error}
        </p>
      ) : null}
      <p id={hintId} className={styles.hint}>
        {props.other || props.hint}
      </p>
    </div>
  );
}
