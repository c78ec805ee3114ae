import { useTranslation } from 'react-i18next';
import { Button, Label, makeStyles, Select, tokens } from '@fluentui/react-components';
import { useId } from 'react';
import { ChevronLeft20Regular, ChevronRight20Regular } from '@fluentui/react-icons';
import { PAGE_SIZES } from '../utils/browser-state.js';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalL,
    marginTop: tokens.spacingVerticalL,
  },
  pages: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  where: { minWidth: '9ch', textAlign: 'center', fontVariantNumeric: 'tabular-nums' },
  size: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
});

export function Pager({
  page,
  pageCount,
  pageSize,
  onPage,
  onPageSize,
}: {
  page: number;
  pageCount: number;
  pageSize: number;
  onPage: (page: number) => void;
  onPageSize: (size: number) => void;
}) {
  const styles = useStyles();
  const { t } = useTranslation('species');
  const id = useId();
  const sizes = (PAGE_SIZES as readonly number[]).includes(pageSize)
    ? PAGE_SIZES
    : [...PAGE_SIZES, pageSize].sort((a, b) => a - b);
  return (
    <nav className={styles.root} aria-label={t('pager.label')}>
      <div className={styles.pages}>
        <Button icon={<ChevronLeft20Regular />} disabled={page <= 1} onClick={() => onPage(page - 1)}>
          {t('pager.previous')}
        </Button>
        <span className={styles.where}>{t('pager.where', { page, count: pageCount })}</span>
        <Button
          icon={<ChevronRight20Regular />}
          iconPosition="after"
          disabled={page >= pageCount}
          onClick={() => onPage(page + 1)}
        >
          {t('pager.next')}
        </Button>
      </div>
      <div className={styles.size}>
        <Label htmlFor={id}>{t('pager.size')}</Label>
        <Select id={id} value={String(pageSize)} onChange={(_, d) => onPageSize(Number(d.value))}>
          {sizes.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </Select>
      </div>
    </nav>
  );
}
