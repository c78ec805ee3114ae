import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow } from '@fluentui/react-components';
import { CheckmarkRegular } from '@fluentui/react-icons';
import type { PickupList as PickupListAnswer } from '@homeground/shared';
import { useTranslation } from 'react-i18next';
import { plantsLine } from '../utils/plants-line.js';
import { useLocale } from '../../../lib/i18n/index.js';
import { slotWords } from '../utils/slot-time.js';
import { useOrganiserStyles } from './organiser.styles.js';
import './pickup-print.css';

/**
 * One slot's households as a table to print: name, plants and an empty box to tick by hand. The
 * boxes are drawn, not inputs, so they print the same in every browser.
 */
export function PickupListTable({ list }: { list: PickupListAnswer }) {
  const { t } = useTranslation('organiser');
  const { locale } = useLocale();
  const styles = useOrganiserStyles();
  const caption = t('pickupCaption', {
    slot: slotWords(list.slot, locale),
    totals: t('totalsLine', {
      households: t('households', { count: list.totals.households }),
      plants: t('plantsCount', { count: list.totals.plants }),
    }),
  });
  return (
    <div
      className={styles.scroller}
      role="region"
      aria-label={t('pickupTableLabel')}
      tabIndex={0}
      data-print-root="pickup"
    >
      <p className="pickup-caption">{caption}</p>
      <Table className={styles.pickupTable}>
        <TableHeader>
          <TableRow>
            <TableHeaderCell>{t('given')}</TableHeaderCell>
            <TableHeaderCell>{t('household')}</TableHeaderCell>
            <TableHeaderCell>{t('plants')}</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {list.households
            .filter((h) => h.status !== 'cancelled')
            .map((h) => (
              <TableRow key={h.reservationId}>
                <TableCell>
                  <span className="pickup-box" aria-label={t(`stateWords.${h.status}`)} role="img">
                    {h.status === 'picked-up' ? <CheckmarkRegular /> : null}
                  </span>
                </TableCell>
                <TableCell>{h.name ?? t('nameGone')}</TableCell>
                <TableCell>{plantsLine(h.lines)}</TableCell>
              </TableRow>
            ))}
        </TableBody>
      </Table>
    </div>
  );
}
