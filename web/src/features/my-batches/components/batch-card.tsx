import { MessageBar, MessageBarBody } from '@fluentui/react-components';
import type { Batch } from '@homeground/shared';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { methodTitle, MY_BATCHES_WORDS, plantsInUnits } from '../utils/my-batches-words.js';
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
  const id = `batch-${batch.id}`;
  return (
    <ContentCard aria-labelledby={id}>
      <Heading level="section" id={id}>
        {batch.commonName}
      </Heading>
      <p className={styles.subheading}>
        <i>{batch.scientificName}</i> · {methodTitle(batch.method)}
      </p>
      <div className={styles.facts}>
        <span>
          {plantsInUnits(batch)}; sow about {batch.seedsToSow} seeds (germination {batch.germinationRatePct}%).
        </span>
        <span>
          Expected ready for the share: about {batch.forecast.expected} plants ({batch.forecast.low}–
          {batch.forecast.high}).
        </span>
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
          <MessageBarBody>{MY_BATCHES_WORDS.readyAfterShare}</MessageBarBody>
        </MessageBar>
      ) : null}

      <section className={styles.section} aria-label={`${MY_BATCHES_WORDS.steps}: ${batch.commonName}`}>
        <Heading level="card">{MY_BATCHES_WORDS.steps}</Heading>
        <BatchSteps batch={batch} today={today} />
      </section>

      <section className={styles.section}>
        <Heading level="card">{MY_BATCHES_WORDS.treatments}</Heading>
        <ul className={styles.list}>
          {batch.treatments.map((t) => (
            <li key={t.kind}>
              <strong>{t.title}</strong>
              {t.where === 'refrigerator'
                ? ' (in the refrigerator)'
                : t.where === 'outdoors'
                  ? ' (outdoors, by winter)'
                  : ''}
              : {t.how}
            </li>
          ))}
        </ul>
      </section>

      <section className={styles.section}>
        <Heading level="card">{MY_BATCHES_WORDS.howTo}</Heading>
        <BatchHowTo batch={batch} />
      </section>

      {batch.cautions.length > 0 ? (
        <section className={styles.section}>
          <Heading level="card">{MY_BATCHES_WORDS.cautions}</Heading>
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
        <Heading level="card">{MY_BATCHES_WORDS.log}</Heading>
        <LogList batch={batch} />
        <PendingEntries
          entries={outbox.entries.filter((e) => e.batchId === batch.id)}
          label={`${MY_BATCHES_WORDS.waiting}: ${batch.commonName}`}
          onRemove={(id) => void outbox.remove(id)}
        />
        <LogForm slug={slug} batch={batch} today={today} outbox={outbox} />
      </section>
    </ContentCard>
  );
}
