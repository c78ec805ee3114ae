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
import { useTranslation } from 'react-i18next';
import { type Formatters, useFormatters } from '../../lib/i18n/index.js';

const useStyles = makeStyles({
  scroller: { overflowX: 'auto', maxWidth: '100%' },
  table: { fontVariantNumeric: 'tabular-nums' },
  note: { color: tokens.colorNeutralForeground3 },
  cautions: { margin: `${tokens.spacingVerticalM} 0 0`, paddingLeft: tokens.spacingHorizontalXL },
});

/** "12" for pieces, "80 L (73 qt)" for mixes: metric and US side by side (DESIGN.md "Voice"), in the page's number style. */
export function supplyAmount(line: SupplyList['lines'][number], f: Formatters): string {
  if (line.count !== null) return f.number(line.count);
  return `${f.number(line.litres ?? 0)} L (${f.number(line.quarts ?? 0)} qt)`;
}

/** A supply list: what to get, how much, and why, with the cautions for the work. */
export function SupplyTable({ list, label }: { list: SupplyList; label: string }) {
  const styles = useStyles();
  const { t } = useTranslation('common');
  const f = useFormatters();
  if (list.lines.length === 0) return <p>{t('supplies.none')}</p>;
  return (
    <>
      <div className={styles.scroller} role="region" aria-label={label} tabIndex={0}>
        <Table className={styles.table} aria-label={label} size="small">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>{t('supplies.what')}</TableHeaderCell>
              <TableHeaderCell>{t('supplies.howMuch')}</TableHeaderCell>
              <TableHeaderCell>{t('supplies.for')}</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {list.lines.map((l) => (
              <TableRow key={l.item}>
                <TableCell>{l.name}</TableCell>
                <TableCell>{supplyAmount(l, f)}</TableCell>
                <TableCell className={styles.note}>{l.note}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </div>
      <ul className={styles.cautions} aria-label={t('supplies.cautions')}>
        {list.cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </>
  );
}
