import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow } from '@fluentui/react-components';
import { CheckmarkRegular } from '@fluentui/react-icons';
import type { PickupList as PickupListAnswer } from '@homeground/shared';
import { ORGANISER_WORDS as W } from '../utils/organiser-words.js';
import { plantsLine } from '../utils/plants-line.js';
import { slotWords } from '../utils/slot-time.js';
import { useOrganiserStyles } from './organiser.styles.js';
import './pickup-print.css';

/**
 * One slot's households as a table to print: name, plants and an empty box to tick by hand. The
 * boxes are drawn, not inputs, so they print the same in every browser.
 */
export function PickupListTable({ list }: { list: PickupListAnswer }) {
  const styles = useOrganiserStyles();
  const caption = `${W.pickupHeading}, ${slotWords(list.slot)}: ${W.totalsLine(list.totals.households, list.totals.plants)}`;
  return (
    <div className={styles.scroller} role="region" aria-label="Pickup list table" tabIndex={0} data-print-root="pickup">
      <p className="pickup-caption">{caption}</p>
      <Table className={styles.pickupTable}>
        <TableHeader>
          <TableRow>
            <TableHeaderCell>{W.given}</TableHeaderCell>
            <TableHeaderCell>{W.household}</TableHeaderCell>
            <TableHeaderCell>{W.plants}</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {list.households
            .filter((h) => h.status !== 'cancelled')
            .map((h) => (
              <TableRow key={h.reservationId}>
                <TableCell>
                  <span className="pickup-box" aria-label={W.stateWords[h.status]} role="img">
                    {h.status === 'picked-up' ? <CheckmarkRegular /> : null}
                  </span>
                </TableCell>
                <TableCell>{h.name ?? W.nameGone}</TableCell>
                <TableCell>{plantsLine(h.lines)}</TableCell>
              </TableRow>
            ))}
        </TableBody>
      </Table>
    </div>
  );
}
