import { mergeClasses } from '@fluentui/react-components';
import type { Batch } from '@homeground/shared';
import { useTranslation } from 'react-i18next';
import { useFormatters } from '../../../lib/i18n/format.js';
import { SHORT_DAY } from '../utils/my-batches-words.js';
import { useMyBatchesStyles } from './my-batches.styles.js';

/** The batch's dated steps, past ones greyed and the next one marked. */
export function BatchSteps({ batch, today }: { batch: Batch; today: string }) {
  const styles = useMyBatchesStyles();
  const { t } = useTranslation('batches');
  const fmt = useFormatters();
  return (
    <ol className={styles.steps} aria-label={t('batch.stepsFor', { name: batch.commonName })}>
      {batch.steps.map((s) => {
        const isNext = batch.nextStep?.kind === s.kind && batch.nextStep.date === s.date;
        return (
          <li
            key={`${s.kind}-${s.date}`}
            className={mergeClasses(styles.step, s.date < today && styles.past, isNext && styles.next)}
            aria-current={isNext ? 'step' : undefined}
          >
            <span className={styles.stepDate}>
              <time dateTime={s.date}>{fmt.date(s.date, SHORT_DAY)}</time>
            </span>
            <span>
              <strong>{s.title}</strong>
              {isNext ? ` ${t('batch.next')}` : ''}
              <p className={styles.detail}>{s.detail}</p>
            </span>
          </li>
        );
      })}
    </ol>
  );
}
