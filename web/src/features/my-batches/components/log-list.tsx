import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow } from '@fluentui/react-components';
import type { Batch } from '@homeground/shared';
import { useTranslation } from 'react-i18next';
import { useFormatters } from '../../../lib/i18n/format.js';
import { SHORT_DAY } from '../utils/my-batches-words.js';
import { useMyBatchesStyles } from './my-batches.styles.js';

/** The batch log so far and its running totals. */
export function LogList({ batch }: { batch: Batch }) {
  const styles = useMyBatchesStyles();
  const { t } = useTranslation('batches');
  const fmt = useFormatters();
  const label = t('log.logOf', { name: batch.commonName });
  return (
    <>
      <p>{t('log.totals', batch.totals)}</p>
      {batch.log.length === 0 ? (
        <p>{t('log.empty')}</p>
      ) : (
        <div className={styles.scroller} role="region" aria-label={label} tabIndex={0}>
          <Table className={styles.logTable} size="small" aria-label={label}>
            <TableHeader>
              <TableRow>
                <TableHeaderCell>{t('log.date')}</TableHeaderCell>
                <TableHeaderCell>{t('log.what')}</TableHeaderCell>
                <TableHeaderCell>{t('log.howMany')}</TableHeaderCell>
                <TableHeaderCell>{t('log.note')}</TableHeaderCell>
              </TableRow>
            </TableHeader>
            <TableBody>
              {batch.log.map((e) => (
                <TableRow key={e.id}>
                  <TableCell>{fmt.date(e.date, SHORT_DAY)}</TableCell>
                  <TableCell>
                    {t(`kinds.${e.kind}`)}
                    {e.reason ? `: ${t(`reasons.${e.reason}`)}` : ''}
                  </TableCell>
                  <TableCell>{fmt.number(e.count)}</TableCell>
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
