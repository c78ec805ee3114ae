import { useTranslation } from 'react-i18next';
import { Field, Input, makeStyles, Radio, RadioGroup, SpinButton, tokens } from '@fluentui/react-components';
import { PAPERS, type PaperSize } from '../utils/paper-sizes.js';

export type PrintKind = 'cards' | 'labels';

const useStyles = makeStyles({
  row: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalXXL}`,
    alignItems: 'flex-start',
  },
  narrow: { width: '12rem', maxWidth: '100%' },
});

export interface PrintOptionsValue {
  paper: PaperSize;
  sowDate: string;
  copies: number;
}

/** Paper for both layouts; sow date and labels per species for pot labels only. */
export function PrintOptions({
  kind,
  value,
  onChange,
}: {
  kind: PrintKind;
  value: PrintOptionsValue;
  onChange: (next: PrintOptionsValue) => void;
}) {
  const styles = useStyles();
  const { t } = useTranslation('cards');
  const paper = PAPERS[value.paper];
  return (
    <div className={styles.row}>
      <Field
        label={t('print.paper')}
        hint={kind === 'labels' ? t('print.labelsHint', { size: paper.labels.sizeWords }) : t('print.cardsHint')}
      >
        <RadioGroup
          layout="horizontal"
          value={value.paper}
          onChange={(_, d) => onChange({ ...value, paper: d.value as PaperSize })}
        >
          {Object.values(PAPERS).map((p) => (
            <Radio key={p.id} value={p.id} label={p.label} />
          ))}
        </RadioGroup>
      </Field>
      {kind === 'labels' ? (
        <>
          <Field label={t('print.sowDate')} hint={t('print.sowDateHint')}>
            <Input
              className={styles.narrow}
              type="date"
              value={value.sowDate}
              onChange={(_, d) => onChange({ ...value, sowDate: d.value })}
            />
          </Field>
          <Field label={t('print.perSpecies')} hint={t('print.perSpeciesHint')}>
            <SpinButton
              className={styles.narrow}
              min={1}
              max={30}
              value={value.copies}
              onChange={(_, d) => {
                const next = d.value ?? Number.parseInt(d.displayValue ?? '', 10);
                if (Number.isFinite(next))
                  onChange({ ...value, copies: Math.min(30, Math.max(1, Math.round(next as number))) });
              }}
            />
          </Field>
        </>
      ) : null}
    </div>
  );
}
