import { LOCALE_TAGS, useLocale } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { ViewSwitch } from '../../../components/view-switch/view-switch.js';
import { Print20Regular } from '@fluentui/react-icons';
import { useId, useState } from 'react';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { usePublicOrigin } from '../../../api/system/system.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { EmptyState, LoadingState } from '../../../components/states/index.js';
import { useQrEncoder } from '../hooks/use-qr-encoder.js';
import { sowDateWords, todayIso } from '../utils/card-words.js';
import { intoSheets } from '../utils/paging.js';
import { CARDS_PER_SHEET, labelsPerSheet, PAPERS } from '../utils/paper-sizes.js';
import { FactCardSheets } from './fact-card-sheets.js';
import { PotLabelSheets } from './pot-label-sheets.js';
import { PrintOptions, type PrintKind, type PrintOptionsValue } from './print-options.js';
import { PrintReminder } from './print-reminder.js';

const useStyles = makeStyles({
  controls: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalL,
    marginBottom: tokens.spacingVerticalXL,
  },
  actions: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalM },
  legend: { margin: 0, color: tokens.colorNeutralForeground2 },
});

/** Choose cards or labels and paper, preview the pages, print. */
export function PrintWorkspace({ species, isLoading }: { species: readonly SpeciesDetail[]; isLoading: boolean }) {
  const styles = useStyles();
  const { t } = useTranslation('cards');
  const { locale } = useLocale();
  const headingId = useId();
  const qr = useQrEncoder();
  const origin = usePublicOrigin();
  const [kind, setKind] = useState<PrintKind>('cards');
  const [options, setOptions] = useState<PrintOptionsValue>(() => ({
    paper: 'letter',
    sowDate: todayIso(),
    copies: 1,
  }));
  const paper = PAPERS[options.paper];
  const geometry = kind === 'cards' ? paper.cards : paper.labels;
  const pages =
    kind === 'cards'
      ? intoSheets(species, CARDS_PER_SHEET).length
      : intoSheets(
          species.flatMap((s) => Array(options.copies).fill(s)),
          labelsPerSheet(paper),
        ).length;
  const what =
    kind === 'cards'
      ? t('print.cardCount', { count: species.length })
      : t('print.labelCount', { count: species.length * options.copies });
  const canPrint = species.length > 0 && !isLoading;

  return (
    <ContentCard aria-labelledby={headingId}>
      {/* The page's paper size and margin for the browser's print dialog and PDF. */}
      <style>{`@page { size: ${paper.cssSize}; margin: ${geometry.margin}; }`}</style>
      <Heading level="section" id={headingId}>
        {t('print.title')}
      </Heading>
      <div className={styles.controls}>
        <ViewSwitch<PrintKind>
          label={t('print.what')}
          value={kind}
          onChange={setKind}
          options={[
            { value: 'cards', label: t('print.cards') },
            { value: 'labels', label: t('print.labels') },
          ]}
        />
        <PrintOptions kind={kind} value={options} onChange={setOptions} />
        {kind === 'labels' ? <p className={styles.legend}>{t('print.legend')}</p> : null}
        <PrintReminder species={species} />
        <div className={styles.actions}>
          <Button appearance="primary" icon={<Print20Regular />} disabled={!canPrint} onClick={() => window.print()}>
            {kind === 'cards' ? t('print.printCards') : t('print.printLabels')}
          </Button>
          <span aria-live="polite">
            {canPrint
              ? t('print.pages', { what, count: pages })
              : isLoading
                ? t('print.getting')
                : t('print.chooseFirst')}
          </span>
        </div>
      </div>
      <div>
        {isLoading && species.length === 0 ? (
          <LoadingState label={t('print.loading')} />
        ) : species.length === 0 ? (
          <EmptyState title={t('print.nothingTitle')}>
            {kind === 'cards' ? t('print.nothingCards') : t('print.nothingLabels')}
          </EmptyState>
        ) : kind === 'cards' ? (
          <FactCardSheets species={species} paper={paper} qr={qr} origin={origin} />
        ) : (
          <PotLabelSheets
            species={species}
            paper={paper}
            copies={options.copies}
            sowDate={sowDateWords(options.sowDate, LOCALE_TAGS[locale])}
          />
        )}
      </div>
    </ContentCard>
  );
}
