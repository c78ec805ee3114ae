import {
  Button,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  makeStyles,
  Radio,
  RadioGroup,
  tokens,
} from '@fluentui/react-components';
import { capitalise, MOISTURE_LEVELS, type Moisture, SUN_LEVELS, type Sun, zipSchema } from '@homeground/shared';
import { type FormEvent, useState } from 'react';
import type { Yard } from '../../../api/plant-share/plant-share.api.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';

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

/** The taker's answer: sun and soil of the spot they will plant, with their ZIP; or a saved mix. */
export type YardAnswer = NonNullable<Yard>;

/** A saved mix's id from its link ("…/mixes/<id>") or the id alone. */
const MIX_ID = /([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})\/?$/i;

export interface FitFilterProps {
  onApply: (answer: YardAnswer) => void;
  onClear: () => void;
  isActive: boolean;
  isPending?: boolean;
}

/** "Fits my yard": two quick questions that rank the list by the engine's fit for that spot. */
export function FitFilter({ onApply, onClear, isActive, isPending = false }: FitFilterProps) {
  const { t } = useTranslation('taker');
  const words = useWords();
  const styles = useStyles();
  const [sun, setSun] = useState<Sun | ''>('');
  const [moisture, setMoisture] = useState<Moisture | ''>('');
  const [zip, setZip] = useState('');
  const [zipError, setZipError] = useState<string | undefined>();
  const [mixLink, setMixLink] = useState('');
  const [mixError, setMixError] = useState<string | undefined>();
  const [error, setError] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!sun || !moisture) return setError(t('fitNeedsAnswer'));
    if (zip.trim() === '') return onApply({ sun, moisture });
    // The same ZIP rule the API reads the query with.
    const parsed = zipSchema.safeParse(zip);
    if (!parsed.success) return setZipError(capitalise(parsed.error.issues[0].message));
    onApply({ sun, moisture, zip: parsed.data });
  };

  const useMix = (event: FormEvent) => {
    event.preventDefault();
    const id = MIX_ID.exec(mixLink.trim())?.[1];
    if (!id) return setMixError(t('fitMixBad'));
    onApply({ mix: id.toLowerCase() });
  };

  const clear = () => {
    setSun('');
    setMoisture('');
    setZip('');
    setMixLink('');
    onClear();
  };

  return (
    <ContentCard aria-labelledby="fit-my-yard">
      <Heading level="section" id="fit-my-yard">
        {t('fitTitle')}
      </Heading>
      <p className={styles.lead}>{t('fitLead')}</p>
      <form onSubmit={submit} noValidate aria-labelledby="fit-my-yard">
        <div className={styles.grid}>
          <Field label={t('fitSun')}>
            <RadioGroup name="fit-sun" value={sun} onChange={(_, d) => (setSun(d.value as Sun), setError(null))}>
              {SUN_LEVELS.map((s) => (
                <Radio key={s} value={s} label={capitalise(words.sun[s])} />
              ))}
            </RadioGroup>
          </Field>
          <Field label={t('fitMoisture')}>
            <RadioGroup
              name="fit-moisture"
              value={moisture}
              onChange={(_, d) => (setMoisture(d.value as Moisture), setError(null))}
            >
              {MOISTURE_LEVELS.map((m) => (
                <Radio key={m} value={m} label={capitalise(words.moisture[m])} />
              ))}
            </RadioGroup>
          </Field>
          <Field
            label={t('fitZip')}
            hint={t('fitZipHint')}
            validationMessage={zipError}
            validationState={zipError ? 'error' : 'none'}
          >
            <Input
              inputMode="numeric"
              autoComplete="postal-code"
              value={zip}
              onChange={(_, d) => (setZip(d.value), setZipError(undefined))}
            />
          </Field>
        </div>
        {error ? (
          <MessageBar intent="error">
            <MessageBarBody>{error}</MessageBarBody>
          </MessageBar>
        ) : null}
        <div className={styles.actions}>
          <Button type="submit" disabled={isPending}>
            {isPending ? t('fitting') : t('fitApply')}
          </Button>
          {isActive ? <Button onClick={clear}>{t('fitClear')}</Button> : null}
        </div>
      </form>
      <form onSubmit={useMix} noValidate aria-labelledby="fit-by-mix">
        <Heading level="card" id="fit-by-mix">
          {t('fitOrMix')}
        </Heading>
        <p className={styles.lead}>{t('fitMixLead')}</p>
        <Field label={t('fitMixLink')} validationMessage={mixError} validationState={mixError ? 'error' : 'none'}>
          <Input value={mixLink} onChange={(_, d) => (setMixLink(d.value), setMixError(undefined))} />
        </Field>
        <div className={styles.actions}>
          <Button type="submit" disabled={isPending}>
            {t('fitMixApply')}
          </Button>
        </div>
      </form>
    </ContentCard>
  );
}
