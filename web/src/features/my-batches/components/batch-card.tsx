import { MessageBar, MessageBarBody } from '@fluentui/react-components';
import type { Batch } from '@homeground/shared';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { useTranslation } from 'react-i18next';
import { useWords } from '../../../lib/i18n/index.js';
import { capitalise, plantsInUnits } from '../utils/my-batches-words.js';
import { BatchHowTo } from './batch-how-to.js';
import { BatchSteps } from './batch-steps.js';
import { LogForm } from './log-form.js';
import { LogList } from './log-list.js';
import type { LogOutboxState } from '../offline/use-log-outbox.js';
import { PendingEntries } from './pending-entries.js';
import { useMyBatchesStyles } from './my-batches.styles.js';

/** One batch: what and how many, whether it is behind, its dates, treatment, how-to, cautions and log. */
export function BatchCard({
  slug,
  batch,
  today,
  outbox,
}: {
  slug: string;
  batch: Batch;
  today: string;
  outbox: LogOutboxState;
}) {
  const styles = useMyBatchesStyles();
  const { t } = useTranslation('batches');
  const words = useWords();
  const id = `batch-${batch.id}`;
  return (
    <ContentCard aria-labelledby={id}>
      <Heading level="section" id={id}>
        {batch.commonName}
      </Heading>
      <p className={styles.subheading}>
        <i>{batch.scientificName}</i> · {capitalise(words.sowingMethod[batch.method].phrase)}
      </p>
      <div className={styles.facts}>
        <span>
          {t('batch.sowAbout', {
            units: plantsInUnits(t, batch),
            seeds: batch.seedsToSow,
            pct: batch.germinationRatePct,
          })}
        </span>
        <span>{t('batch.expected', batch.forecast)}</span>
      </div>
      {batch.behind ? (
        <MessageBar intent="warning">
          <MessageBarBody>{batch.behind}</MessageBarBody>
        </MessageBar>
      ) : null}
      {batch.frostWarning ? (
        <MessageBar intent="warning">
          <MessageBarBody>{batch.frostWarning}</MessageBarBody>
        </MessageBar>
      ) : null}
      {batch.readyAfterShare ? (
        <MessageBar intent="info">
          <MessageBarBody>{t('batch.readyAfterShare')}</MessageBarBody>
        </MessageBar>
      ) : null}

      <section className={styles.section} aria-label={`${t('batch.steps')}: ${batch.commonName}`}>
        <Heading level="card">{t('batch.steps')}</Heading>
        <BatchSteps batch={batch} today={today} />
      </section>

      <section className={styles.section}>
        <Heading level="card">{t('batch.treatments')}</Heading>
        <ul className={styles.list}>
          {batch.treatments.map((tr) => (
            <li key={tr.kind}>
              <strong>{tr.title}</strong>
              {tr.where === 'refrigerator'
                ? ` ${t('batch.inFridge')}`
                : tr.where === 'outdoors'
                  ? ` ${t('batch.outdoors')}`
                  : ''}
              : {tr.how}
            </li>
          ))}
        </ul>
      </section>

      <section className={styles.section}>
        <Heading level="card">{t('batch.howTo')}</Heading>
        <BatchHowTo batch={batch} />
      </section>

      {batch.cautions.length > 0 ? (
        <section className={styles.section}>
          <Heading level="card">{t('batch.cautions')}</Heading>
          <ul className={styles.list}>
            {batch.cautions.map((c) => (
              <li key={c.title}>
                <strong>{c.title}.</strong> {c.text}
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <section className={styles.section}>
        <Heading level="card">{t('log.title')}</Heading>
        <LogList batch={batch} />
        <PendingEntries
          entries={outbox.entries.filter((e) => e.batchId === batch.id)}
          name={batch.commonName}
          onRemove={(id) => void outbox.remove(id)}
        />
        <LogForm slug={slug} batch={batch} today={today} outbox={outbox} />
      </section>
    </ContentCard>
  );
}
