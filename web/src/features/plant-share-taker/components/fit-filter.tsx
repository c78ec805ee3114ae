import {
  Button,
  Field,
  MessageBar,
  MessageBarBody,
  makeStyles,
  Radio,
  RadioGroup,
  tokens,
} from '@fluentui/react-components';
import {
  capitalise,
  MOISTURE_LEVELS,
  MOISTURE_WORDS,
  type Moisture,
  SUN_LEVELS,
  SUN_WORDS,
  type Sun,
} from '@homeground/shared';
import { type FormEvent, useState } from 'react';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { TAKER_WORDS as W } from '../utils/taker-words.js';

const useStyles = makeStyles({
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(12rem, 1fr))',
    gap: tokens.spacingHorizontalXL,
    alignItems: 'start',
  },
  lead: { marginTop: 0 },
  actions: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalM, marginTop: tokens.spacingVerticalL },
});

/** The taker's answer: sun and soil of the spot they will plant. */
export type YardAnswer = { sun: Sun; moisture: Moisture };

export interface FitFilterProps {
  onApply: (answer: YardAnswer) => void;
  onClear: () => void;
  isActive: boolean;
  isPending?: boolean;
}

/** "Fits my yard": two quick questions that rank the list by the engine's fit for that spot. */
export function FitFilter({ onApply, onClear, isActive, isPending = false }: FitFilterProps) {
  const styles = useStyles();
  const [sun, setSun] = useState<Sun | ''>('');
  const [moisture, setMoisture] = useState<Moisture | ''>('');
  const [error, setError] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (sun && moisture) return onApply({ sun, moisture });
    setError(W.fitNeedsAnswer);
  };

  const clear = () => {
    setSun('');
    setMoisture('');
    onClear();
  };

  return (
    <ContentCard aria-labelledby="fit-my-yard">
      <Heading level="section" id="fit-my-yard">
        {W.fitTitle}
      </Heading>
      <p className={styles.lead}>{W.fitLead}</p>
      <form onSubmit={submit} noValidate aria-labelledby="fit-my-yard">
        <div className={styles.grid}>
          <Field label={W.fitSun}>
            <RadioGroup name="fit-sun" value={sun} onChange={(_, d) => (setSun(d.value as Sun), setError(null))}>
              {SUN_LEVELS.map((s) => (
                <Radio key={s} value={s} label={capitalise(SUN_WORDS[s])} />
              ))}
            </RadioGroup>
          </Field>
          <Field label={W.fitMoisture}>
            <RadioGroup
              name="fit-moisture"
              value={moisture}
              onChange={(_, d) => (setMoisture(d.value as Moisture), setError(null))}
            >
              {MOISTURE_LEVELS.map((m) => (
                <Radio key={m} value={m} label={capitalise(MOISTURE_WORDS[m])} />
              ))}
            </RadioGroup>
          </Field>
        </div>
        {error ? (
          <MessageBar intent="error">
            <MessageBarBody>{error}</MessageBarBody>
          </MessageBar>
        ) : null}
        <div className={styles.actions}>
          <Button type="submit" disabled={isPending}>
            {isPending ? W.fitting : W.fitApply}
          </Button>
          {isActive ? <Button onClick={clear}>{W.fitClear}</Button> : null}
        </div>
      </form>
    </ContentCard>
  );
}
