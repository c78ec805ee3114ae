import { Field, makeStyles, Radio, RadioGroup, tokens } from '@fluentui/react-components';
import type { Choice } from '../../utils/yard-form-choices.js';

const useStyles = makeStyles({
  label: { display: 'flex', flexDirection: 'column' },
  name: { fontWeight: tokens.fontWeightSemibold },
  line: {
    color: tokens.colorNeutralForeground2,
    fontSize: tokens.fontSizeBase200,
    lineHeight: tokens.lineHeightBase200,
  },
});

export interface ChoiceFieldProps<T extends string> {
  label: string;
  hint?: string;
  choices: readonly Choice<T>[];
  value: T | '';
  onChange: (value: T) => void;
  error?: string;
  required?: boolean;
  name: string;
}

/** A question answered by one of a few choices, each with its own explanatory line. */
export function ChoiceField<T extends string>({
  label,
  hint,
  choices,
  value,
  onChange,
  error,
  required,
  name,
}: ChoiceFieldProps<T>) {
  const styles = useStyles();
  return (
    <Field
      label={label}
      hint={hint}
      required={required}
      validationMessage={error}
      validationState={error ? 'error' : 'none'}
    >
      <RadioGroup name={name} value={value} onChange={(_, d) => onChange(d.value as T)}>
        {choices.map((c) => (
          <Radio
            key={c.value || 'none'}
            value={c.value}
            label={
              <span className={styles.label}>
                <span className={styles.name}>{c.label}</span>
                <span className={styles.line}>{c.line}</span>
              </span>
            }
          />
        ))}
      </RadioGroup>
    </Field>
  );
}
