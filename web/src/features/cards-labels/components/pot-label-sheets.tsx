import { useTranslation } from 'react-i18next';
import { makeStyles } from '@fluentui/react-components';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { intoSheets } from '../utils/paging.js';
import { labelsPerSheet, type PaperSpec } from '../utils/paper-sizes.js';
import { PotLabel } from './pot-label.js';
import { PrintArea, Sheet } from './print-area.js';

const useStyles = makeStyles({
  grid: { display: 'grid', alignContent: 'start' },
});

/** Pot labels, `copies` of each species side by side, as many to a page as the paper holds. */
export function PotLabelSheets({
  species,
  paper,
  copies,
  sowDate,
}: {
  species: readonly SpeciesDetail[];
  paper: PaperSpec;
  copies: number;
  sowDate: string;
}) {
  const styles = useStyles();
  const { t } = useTranslation('cards');
  const labels = species.flatMap((s) =>
    Array.from({ length: copies }, (_, copy) => ({ species: s, key: `${s.slug}-${copy}` })),
  );
  const sheets = intoSheets(labels, labelsPerSheet(paper));
  const { columns, labelWidth, labelHeight } = paper.labels;
  return (
    <PrintArea geometry={paper.labels} pageCount={sheets.length} label={t('print.labelsPreview')}>
      {sheets.map((sheet, i) => (
        <Sheet key={i} geometry={paper.labels} index={i} total={sheets.length} className={styles.grid}>
          <div
            className={styles.grid}
            style={{ gridTemplateColumns: `repeat(${columns}, ${labelWidth})`, gridAutoRows: labelHeight }}
          >
            {sheet.map((label) => (
              <PotLabel key={label.key} species={label.species} sowDate={sowDate} />
            ))}
          </div>
        </Sheet>
      ))}
    </PrintArea>
  );
}
