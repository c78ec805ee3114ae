import { useTranslation } from 'react-i18next';
import { makeStyles } from '@fluentui/react-components';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import type { QrEncoderState } from '../hooks/use-qr-encoder.js';
import { intoSheets } from '../utils/paging.js';
import { CARDS_PER_SHEET, type PaperSpec } from '../utils/paper-sizes.js';
import { FactCard } from './fact-card.js';
import { PrintArea, Sheet } from './print-area.js';

const useStyles = makeStyles({
  // Two by two, each card a quarter of the page; a short last page keeps quarter-size cards.
  grid: { display: 'grid', gridTemplateColumns: '1fr 1fr', gridTemplateRows: '1fr 1fr', gap: '0.2in' },
});

/** Fact cards, four to a printed page. */
export function FactCardSheets({
  species,
  paper,
  qr,
  origin,
}: {
  species: readonly SpeciesDetail[];
  paper: PaperSpec;
  qr: QrEncoderState;
  origin: string;
}) {
  const styles = useStyles();
  const { t } = useTranslation('cards');
  const sheets = intoSheets(species, CARDS_PER_SHEET);
  return (
    <PrintArea geometry={paper.cards} pageCount={sheets.length} label={t('print.cardsPreview')}>
      {sheets.map((sheet, i) => (
        <Sheet key={i} geometry={paper.cards} index={i} total={sheets.length} className={styles.grid}>
          {sheet.map((s) => (
            <FactCard key={s.slug} species={s} qr={qr} layoutKey={paper.id} origin={origin} />
          ))}
        </Sheet>
      ))}
    </PrintArea>
  );
}
