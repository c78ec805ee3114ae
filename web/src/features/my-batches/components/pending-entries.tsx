import { Button } from '@fluentui/react-components';
import { LOG_KIND_WORDS, LOSS_REASON_WORDS } from '@homeground/shared';
import type { OutboxEntry } from '../offline/log-outbox-db.js';
import { MY_BATCHES_WORDS, shortDate } from '../utils/my-batches-words.js';
import { useMyBatchesStyles } from './my-batches.styles.js';

/**
 * A batch's entries still on the device, each marked "not yet sent" (or "not accepted" with the
 * server's reason and a way to remove it), so the grower never wonders whether a count went.
 */
export function PendingEntries({
  entries,
  label,
  onRemove,
}: {
  entries: readonly OutboxEntry[];
  label: string;
  onRemove: (clientId: string) => void;
}) {
  const styles = useMyBatchesStyles();
  if (entries.length === 0) return null;
  return (
    <ul className={styles.pending} aria-label={label}>
      {entries.map(({ clientId, entry, refused }) => (
        <li key={clientId} className={styles.pendingItem}>
          <span>
            {shortDate(entry.date)} · {LOG_KIND_WORDS[entry.kind].label}
            {entry.reason ? `: ${LOSS_REASON_WORDS[entry.reason]}` : ''} · {entry.count}
          </span>
          {refused === undefined ? (
            <strong className={styles.pendingState}>{MY_BATCHES_WORDS.notYetSent}</strong>
          ) : (
            <>
              <strong className={styles.refusedState}>
                {MY_BATCHES_WORDS.refused}: {refused}
              </strong>
              <Button size="small" onClick={() => onRemove(clientId)}>
                {MY_BATCHES_WORDS.removeEntry}
              </Button>
            </>
          )}
        </li>
      ))}
    </ul>
  );
}
