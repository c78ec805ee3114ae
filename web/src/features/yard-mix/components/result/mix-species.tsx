import { useTranslation } from 'react-i18next';
import { Button, makeStyles, MessageBar, MessageBarBody, tokens } from '@fluentui/react-components';
import { ViewSwitch } from '../../../../components/view-switch/view-switch.js';
import { ArrowSync20Regular } from '@fluentui/react-icons';
import { useState } from 'react';
import { ContentCard } from '../../../../components/page/content-card.js';
import { Heading } from '../../../../components/page/page-heading.js';
import { MixCards } from './mix-cards.js';
import type { MixRow } from '../../utils/mix-rows.js';
import { MixTable } from './mix-table.js';
import type { SpeciesCaution } from '../../hooks/use-mix-cautions.js';

const useStyles = makeStyles({
  head: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalL,
    alignItems: 'center',
    justifyContent: 'space-between',
    marginBottom: tokens.spacingVerticalM,
  },
  title: { marginBottom: 0 },
  rebalance: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalM,
    alignItems: 'center',
    marginBottom: tokens.spacingVerticalM,
  },
  hint: { margin: 0, color: tokens.colorNeutralForeground2, fontSize: tokens.fontSizeBase200, maxWidth: '60ch' },
  notices: { display: 'grid', gap: tokens.spacingVerticalS, marginBottom: tokens.spacingVerticalM },
});

type View = 'table' | 'cards';

/** Cards read better on a phone; a table compares species better on a wide screen. */
function initialView(): View {
  return typeof window !== 'undefined' && window.matchMedia?.('(max-width: 700px)').matches ? 'cards' : 'table';
}

export interface MixSpeciesProps {
  rows: readonly MixRow[];
  cautions: Record<string, SpeciesCaution[]>;
  notices: readonly string[];
  pendingOut: number;
  lockedCount: number;
  onRebalance: () => void;
  onToggleLock: (slug: string) => void;
  onToggleExclude: (slug: string) => void;
  onSwap: (slug: string) => void;
  isBusy: boolean;
}

/** The species of the mix, as a table or as cards, with the marks that wait for Rebalance. */
export function MixSpecies({
  rows,
  cautions,
  notices,
  pendingOut,
  lockedCount,
  onRebalance,
  isBusy,
  ...actions
}: MixSpeciesProps) {
  const styles = useStyles();
  const { t } = useTranslation('yard');
  const { t: tm } = useTranslation('mix');
  const [view, setView] = useState<View>(initialView);
  const viewProps = { rows, cautions, isBusy, ...actions };

  const hint =
    pendingOut > 0
      ? tm('hint.leaveOut', { count: pendingOut })
      : lockedCount > 0
        ? tm('hint.kept', { count: lockedCount })
        : tm('hint.start');

  return (
    <ContentCard aria-labelledby="mix-species-heading">
      <div className={styles.head}>
        <Heading level="section" id="mix-species-heading" className={styles.title}>
          {t('mix.species')}
        </Heading>
        {/* Not a TabList: its focus sentinels are aria-hidden yet focusable (axe-core aria-hidden-focus). */}
        <div data-print="hide">
          <ViewSwitch<View>
            label={t('mix.showAs')}
            value={view}
            onChange={setView}
            options={[
              { value: 'table', label: t('mix.table') },
              { value: 'cards', label: t('mix.cards') },
            ]}
          />
        </div>
      </div>
      {notices.length > 0 ? (
        <div className={styles.notices}>
          {notices.map((n) => (
            <MessageBar key={n} intent="warning" layout="multiline">
              <MessageBarBody>{n}</MessageBarBody>
            </MessageBar>
          ))}
        </div>
      ) : null}
      <div className={styles.rebalance} data-print="hide">
        <Button icon={<ArrowSync20Regular />} onClick={onRebalance} disabled={isBusy}>
          {t('mix.rebalance')}
        </Button>
        <p className={styles.hint} aria-live="polite">
          {hint}
        </p>
      </div>
      {view === 'table' ? <MixTable {...viewProps} /> : <MixCards {...viewProps} />}
    </ContentCard>
  );
}
