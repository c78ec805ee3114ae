import { Button } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { useFormatters } from '../../../lib/i18n/format.js';
import type { OutboxEntry } from '../offline/log-outbox-db.js';
import { SHORT_DAY } from '../utils/my-batches-words.js';
import { useMyBatchesStyles } from './my-batches.styles.js';

/**
 * A batch's entries still on the device, each marked "not yet sent" (or "not accepted" with the
 * server's reason and a way to remove it), so the grower never wonders whether a count went.
 */
export function PendingEntries({
  entries,
  name,
  onRemove,
}: {
  entries: readonly OutboxEntry[];
  /** The batch's plant, for the list's label. */
  name: string;
  onRemove: (clientId: string) => void;
}) {
  const styles = useMyBatchesStyles();
  const { t } = useTranslation('batches');
  const fmt = useFormatters();
  if (entries.length === 0) return null;
  return (
    <ul className={styles.pending} aria-label={t('offline.waitingFor', { name })}>
      {entries.map(({ clientId, entry, refused }) => (
        <li key={clientId} className={styles.pendingItem}>
          <span>
            {fmt.date(entry.date, SHORT_DAY)} · {t(`kinds.${entry.kind}`)}
            {entry.reason ? `: ${t(`reasons.${entry.reason}`)}` : ''} · {fmt.number(entry.count)}
          </span>
          {refused === undefined ? (
            <strong className={styles.pendingState}>{t('offline.notYetSent')}</strong>
          ) : (
            <>
              <strong className={styles.refusedState}>{t('offline.refused', { reason: refused })}</strong>
              <Button size="small" onClick={() => onRemove(clientId)}>
                {t('offline.remove')}
              </Button>
            </>
          )}
        </li>
      ))}
    </ul>
  );
}
