import { Button, Field, Input, MessageBar, MessageBarBody } from '@fluentui/react-components';
import { type PlantShare, walkUpRequestSchema } from '@homeground/shared';
import { useState } from 'react';
import { useWalkUpMutation } from '../../../api/plant-share/plant-share.mutations.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { asSentence } from '../../../lib/forms/field-errors.js';
import { useTranslation } from 'react-i18next';
import { useOrganiserStyles } from './organiser.styles.js';
import { CountStepper } from '../../../components/forms/count-stepper.js';

/**
 * Walk-up: plants handed to someone without a reservation, counted from what is left. Only the
 * counts and, if they say, a ZIP are kept (for the report's areas reached).
 */
export function WalkUpCard({ share }: { share: PlantShare }) {
  const { t } = useTranslation('organiser');
  const styles = useOrganiserStyles();
  const walkUp = useWalkUpMutation(share.groupSlug);
  const [counts, setCounts] = useState<Record<string, number>>({});
  const [zip, setZip] = useState('');
  const [zipError, setZipError] = useState<string | undefined>();
  const [note, setNote] = useState<{ intent: 'success' | 'error'; text: string } | null>(null);
  const onOffer = share.stock.filter((s) => s.remaining > 0 || (counts[s.speciesSlug] ?? 0) > 0);

  const record = () => {
    setNote(null);
    const lines = Object.entries(counts)
      .filter(([, n]) => n > 0)
      .map(([speciesSlug, count]) => ({ speciesSlug, count }));
    if (lines.length === 0) return setNote({ intent: 'error', text: t('walkUpNothing') });
    const parsed = walkUpRequestSchema.safeParse({ lines, ...(zip.trim() ? { zip: zip.trim() } : {}) });
    if (!parsed.success) {
      const zipIssue = parsed.error.issues.find((i) => i.path[0] === 'zip');
      setZipError(zipIssue ? asSentence(zipIssue.message) : undefined);
      if (!zipIssue) setNote({ intent: 'error', text: parsed.error.issues[0]?.message ?? t('somethingWrong') });
      return;
    }
    walkUp.mutate(parsed.data, {
      onSuccess: () => {
        const given = lines.reduce((n, l) => n + l.count, 0);
        setCounts({});
        setZip('');
        setNote({ intent: 'success', text: t('walkUpRecorded', { count: given }) });
      },
      onError: (e) => setNote({ intent: 'error', text: e.message }),
    });
  };

  return (
    <ContentCard aria-labelledby="walk-up">
      <Heading level="section" id="walk-up">
        {t('walkUpHeading')}
      </Heading>
      <p className={styles.lead}>{t('walkUpLead')}</p>
      <ul className={styles.rows}>
        {onOffer.map((s) => (
          <li key={s.speciesSlug} className={styles.row}>
            <span>
              {s.commonName} <span className={styles.muted}>({t('remainingWords', { count: s.remaining })})</span>
            </span>
            <CountStepper
              label={t('walkUpOf', { name: s.commonName })}
              value={counts[s.speciesSlug] ?? 0}
              max={s.remaining}
              onChange={(n) => setCounts((c) => ({ ...c, [s.speciesSlug]: n }))}
            />
          </li>
        ))}
      </ul>
      <Field label={t('walkUpZip')} validationMessage={zipError} validationState={zipError ? 'error' : 'none'}>
        <Input
          inputMode="numeric"
          value={zip}
          onChange={(_, d) => (setZip(d.value), setZipError(undefined))}
          className={styles.number}
        />
      </Field>
      {note ? (
        <MessageBar intent={note.intent}>
          <MessageBarBody>{note.text}</MessageBarBody>
        </MessageBar>
      ) : null}
      <div className={styles.actions}>
        <Button className={styles.big} onClick={record} disabled={walkUp.isPending}>
          {t('walkUpRecord')}
        </Button>
      </div>
    </ContentCard>
  );
}
