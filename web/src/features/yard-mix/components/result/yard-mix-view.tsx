import { useTranslation } from 'react-i18next';
import { Button, makeStyles, Spinner, tokens } from '@fluentui/react-components';
import { Location20Regular } from '@fluentui/react-icons';
import { STATE_NAMES, type StateCode } from '@homeground/shared';
import { type ReactNode, useRef, useState } from 'react';
import { usePublicOrigin } from '../../../../api/system/system.queries.js';
import { RouterButton } from '../../../../components/links/router-link.js';
import { ContentCard } from '../../../../components/page/content-card.js';
import { Heading } from '../../../../components/page/page-heading.js';
import { EmptyState, ErrorState, LoadingState } from '../../../../components/states/index.js';
import { paths } from '../../../../config/paths.js';
import { useFormatters, useWords } from '../../../../lib/i18n/index.js';
import { BloomChart } from '../bloom-chart/bloom-chart.js';
import { type PlanChange, useMixPlan } from '../../hooks/use-mix-plan.js';
import { type MixPlan, paletteRequestOf } from '../../utils/mix-plan.js';
import { ConstraintsPanel } from './constraints-panel.js';
import { downloadText, mixCsv } from '../../utils/export-csv.js';
import { MixActions } from './mix-actions.js';
import { MixAdjust } from './mix-adjust.js';
import { MixNotes } from './mix-notes.js';
import { mixRows } from '../../utils/mix-rows.js';
import { MixSpecies } from './mix-species.js';
import { MixSummary } from './mix-summary.js';
import { SaveMix } from './save-mix.js';
import { SwapDialog } from './swap-dialog.js';
import { useMixCautions } from '../../hooks/use-mix-cautions.js';
import './mix-print.css';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXL },
  head: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  updating: { minHeight: 0 },
  notCovered: { display: 'flex', flexDirection: 'column', alignItems: 'flex-start', gap: tokens.spacingVerticalM },
});

export interface YardMixViewProps {
  plan: MixPlan;
  onPlanChange: PlanChange;
  isSignedIn: boolean;
  signInHref: string;
  /** Heading of the mix; "Your yard mix" in the page's language unless a saved mix brings its own name. */
  title?: string;
  intro?: ReactNode;
  onChangeYard?: () => void;
  onChangeGround?: () => void;
}

/** Step 3: the balanced yard mix with its bloom chart, design rules, quantities and the person's changes. */
export function YardMixView({
  plan,
  onPlanChange,
  isSignedIn,
  signInHref,
  title,
  intro,
  onChangeYard,
  onChangeGround,
}: YardMixViewProps) {
  const styles = useStyles();
  const { query, slugs, isUpdating, toggleLock, toggleExclude, rebalance, swap, addSpecies, setSize } = useMixPlan(
    plan,
    onPlanChange,
  );
  const origin = usePublicOrigin();
  const { t } = useTranslation('yard');
  const { t: tm } = useTranslation('mix');
  const f = useFormatters();
  const words = useWords();
  const [swapSlot, setSwapSlot] = useState<string | null>(null);
  // The Swap button that opened the dialog gets focus back when it closes (WCAG 2.4.3 Focus Order).
  const swapOpener = useRef<HTMLElement | null>(null);
  const openSwap = (slug: string) => {
    swapOpener.current = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    setSwapSlot(slug);
  };
  const closeSwap = () => {
    const opener = swapOpener.current;
    swapOpener.current = null;
    setSwapSlot(null);
    requestAnimationFrame(() => {
      if (opener?.isConnected) opener.focus();
    });
  };
  const mix = query.data;
  const speciesList = mix ? mix.palette.chosen.map((c) => mix.species[c.slug]).filter(Boolean) : [];
  const cautions = useMixCautions(speciesList);

  if (query.isPending) return <LoadingState label={t('mix.loading')} />;
  if (mix && mix.palette.coverage && !mix.palette.coverage.covered) {
    // The way on is another place, so the answer offers it: back to the ground step, yard answers kept.
    const changeGround = onChangeGround ? (
      <Button appearance="primary" icon={<Location20Regular />} onClick={onChangeGround}>
        {t('mix.changeGround')}
      </Button>
    ) : (
      <RouterButton
        appearance="primary"
        icon={<Location20Regular />}
        to={paths.findPlants.build({ plan, step: 'ground' })}
      >
        {t('mix.changeGround')}
      </RouterButton>
    );
    return (
      <div className={styles.notCovered}>
        <EmptyState title={t('mix.notCovered')}>{mix.palette.coverage.message}</EmptyState>
        <div data-print="hide">{changeGround}</div>
      </div>
    );
  }
  if (query.isError || !mix) {
    return (
      <ErrorState
        title={t('mix.loadError')}
        message={query.error?.message ?? t('mix.tryLater')}
        onRetry={() => void query.refetch()}
      />
    );
  }

  const rows = mixRows(mix, plan.locked, plan.excluded);
  const stateName = STATE_NAMES[plan.region.state as StateCode] ?? plan.region.state;
  const sharePlan: MixPlan = { ...plan, chosen: slugs };
  const shareUrl = `${origin}${paths.findPlants.build({ plan: sharePlan })}`;
  const cardsHref = `${paths.cardsLabels.build()}?species=${slugs.join(',')}`;
  const pendingOut = rows.filter((r) => r.isExcluded).length;
  const swapRow = rows.find((r) => r.slug === swapSlot);

  const print = () => {
    // Closed <details> would print empty; open every "why it fits" first.
    document
      .querySelectorAll<HTMLDetailsElement>('[data-print-root="yard-mix"] details')
      .forEach((d) => (d.open = true));
    window.print();
  };

  return (
    <div className={styles.root} data-print-root="yard-mix" aria-busy={isUpdating}>
      <ContentCard aria-labelledby="yard-mix-heading" className={styles.head}>
        <Heading level="section" id="yard-mix-heading">
          {title ?? tm('title')}
        </Heading>
        {intro}
        <MixSummary
          site={mix.site}
          state={plan.region.state as StateCode}
          ecoregionCode={plan.region.ecoregionCode}
          count={rows.length}
          sizeReason={mix.palette.sizeReason}
        />
        {mix.palette.plantingMethod === 'seeding' ? (
          <p data-testid="seeding-plan">
            {tm('seeding', {
              seeds: f.number(Math.round((mix.seeding ?? []).reduce((sum, l) => sum + l.seedsPerSqFt, 0))),
            })}
          </p>
        ) : (
          <p data-testid="total-footprint">
            {tm('footprint', { used: f.area(mix.totalFootprintSqFt ?? 0), area: f.area(mix.site.areaSqFt) })}
          </p>
        )}
        <MixAdjust
          size={mix.palette.size}
          state={plan.region.state as StateCode}
          inMix={slugs}
          onSize={setSize}
          onAdd={addSpecies}
          isBusy={isUpdating}
        />
        <MixActions
          save={
            <SaveMix
              isSignedIn={isSignedIn}
              signInHref={signInHref}
              defaultName={
                title ? tm('savedName', { title, state: stateName }) : tm('defaultName', { state: stateName })
              }
              buildRequest={(name) => ({ name, request: paletteRequestOf(plan), chosen: slugs })}
            />
          }
          shareUrl={shareUrl}
          cardsHref={cardsHref}
          onExportCsv={() => downloadText(mixCsv(rows, tm, words), tm('csv.fileName'))}
          onPrint={print}
          onChangeYard={onChangeYard}
          onChangeGround={onChangeGround}
        />
        <div className={styles.updating} aria-live="polite">
          {isUpdating ? <Spinner size="tiny" label={t('mix.updating')} labelPosition="after" /> : null}
        </div>
      </ContentCard>

      {rows.length === 0 ? (
        <EmptyState title={t('mix.noneTitle')}>{t('mix.noneText')}</EmptyState>
      ) : (
        <MixSpecies
          rows={rows}
          cautions={cautions}
          pendingOut={pendingOut}
          lockedCount={plan.locked.length}
          onRebalance={rebalance}
          onToggleLock={toggleLock}
          onToggleExclude={toggleExclude}
          onSwap={openSwap}
          isBusy={isUpdating}
          notices={mix.palette.notices}
        />
      )}

      <ContentCard aria-labelledby="bloom-heading">
        <Heading level="section" id="bloom-heading">
          {t('mix.bloomChart')}
        </Heading>
        <BloomChart species={speciesList} />
      </ContentCard>

      <ContentCard aria-labelledby="rules-heading">
        <Heading level="section" id="rules-heading">
          {t('mix.balanced')}
        </Heading>
        <ConstraintsPanel constraints={mix.palette.constraints} />
      </ContentCard>

      <MixNotes stateName={stateName} lossFactor={mix.lossFactor} />

      {/* Mounted only while open: a mounted dialog, even closed, adds focus sentinels axe-core flags. */}
      {swapRow ? (
        <SwapDialog
          slot={{ slug: swapRow.slug, name: swapRow.species.commonName }}
          request={{ ...paletteRequestOf(plan), chosen: slugs }}
          onPick={(replacement) => {
            if (swapSlot) swap(swapSlot, replacement);
            closeSwap();
          }}
          onClose={closeSwap}
        />
      ) : null}
    </div>
  );
}
