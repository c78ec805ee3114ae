import {
  makeStyles,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  tokens,
} from '@fluentui/react-components';
import type { SupplyList } from '@homeground/shared';

const useStyles = makeStyles({
  scroller: { overflowX: 'auto', maxWidth: '100%' },
  table: { fontVariantNumeric: 'tabular-nums' },
  note: { color: tokens.colorNeutralForeground3 },
  cautions: { margin: `${tokens.spacingVerticalM} 0 0`, paddingLeft: tokens.spacingHorizontalXL },
});

/** "12" for pieces, "80 L (73 qt)" for mixes: metric and US side by side (DESIGN.md "Voice"). */
export function supplyAmount(line: SupplyList['lines'][number]): string {
  if (line.count !== null) return line.count.toLocaleString('en-US');
  return `${line.litres} L (${line.quarts} qt)`;
}

/** A supply list: what to get, how much, and why, with the cautions for the work. */
export function SupplyTable({ list, label }: { list: SupplyList; label: string }) {
  const styles = useStyles();
  if (list.lines.length === 0) return <p>Nothing to get yet: there are no batches.</p>;
  return (
    <>
      <div className={styles.scroller} role="region" aria-label={label} tabIndex={0}>
        <Table className={styles.table} aria-label={label} size="small">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>What</TableHeaderCell>
              <TableHeaderCell>How much</TableHeaderCell>
              <TableHeaderCell>For</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {list.lines.map((l) => (
              <TableRow key={l.item}>
                <TableCell>{l.name}</TableCell>
                <TableCell>{supplyAmount(l)}</TableCell>
                <TableCell className={styles.note}>{l.note}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </div>
      <ul className={styles.cautions} aria-label="Cautions">
        {list.cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </>
  );
}
