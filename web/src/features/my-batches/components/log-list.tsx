import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow } from '@fluentui/react-components';
import { LOG_KIND_WORDS, LOSS_REASON_WORDS, type Batch } from '@homeground/shared';
import { MY_BATCHES_WORDS, shortDate } from '../utils/my-batches-words.js';
import { useMyBatchesStyles } from './my-batches.styles.js';

/** The batch log so far and its running totals. */
export function LogList({ batch }: { batch: Batch }) {
  const styles = useMyBatchesStyles();
  const t = batch.totals;
  return (
    <>
      <p>
        Sown {t.sown} · came up {t.germinated} · potted up {t.pottedUp} · lost {t.lost} · ready {t.ready}
      </p>
      {batch.log.length === 0 ? (
        <p>{MY_BATCHES_WORDS.logEmpty}</p>
      ) : (
        <div className={styles.scroller} role="region" aria-label={`Log of ${batch.commonName}`} tabIndex={0}>
          <Table className={styles.logTable} size="small" aria-label={`Log of ${batch.commonName}`}>
            <TableHeader>
              <TableRow>
                <TableHeaderCell>Date</TableHeaderCell>
                <TableHeaderCell>What</TableHeaderCell>
                <TableHeaderCell>How many</TableHeaderCell>
                <TableHeaderCell>Note</TableHeaderCell>
              </TableRow>
            </TableHeader>
            <TableBody>
              {batch.log.map((e) => (
                <TableRow key={e.id}>
                  <TableCell>{shortDate(e.date)}</TableCell>
                  <TableCell>
                    {LOG_KIND_WORDS[e.kind].label}
                    {e.reason ? `: ${LOSS_REASON_WORDS[e.reason]}` : ''}
                  </TableCell>
                  <TableCell>{e.count}</TableCell>
                  <TableCell>{e.note ?? ''}</TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </div>
      )}
    </>
  );
}
