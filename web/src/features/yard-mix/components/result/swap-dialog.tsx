import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import type { AlternativesRequest, ScorePart, ScorePartName } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { alternativesQueryOptions } from '../../../../api/mixes/mixes.queries.js';
import { EmptyState, ErrorState, LoadingState } from '../../../../components/states/index.js';
import { whyItFits } from '../../utils/mix-rows.js';

/** Every alternative suits the sun, soil and state already; the other reasons tell them apart. */
const SHARED_BASICS: ReadonlySet<ScorePartName> = new Set(['native', 'sun', 'moisture']);

function distinctReasons(parts: readonly ScorePart[]): string[] {
  const { fits, mindful } = whyItFits(parts.filter((p) => !SHARED_BASICS.has(p.name)));
  return [...fits.slice(0, 3), ...mindful.slice(0, 1)];
}

const SHOWN = 5;

const useStyles = makeStyles({
  list: { listStyle: 'none', margin: 0, padding: 0, display: 'grid', gap: tokens.spacingVerticalM },
  option: {
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusLarge,
    padding: tokens.spacingVerticalM,
    display: 'grid',
    gap: tokens.spacingVerticalXS,
  },
  name: { margin: 0, fontWeight: tokens.fontWeightSemibold },
  sci: { fontStyle: 'italic', fontWeight: tokens.fontWeightRegular, color: tokens.colorNeutralForeground2 },
  change: { margin: 0 },
  reasons: {
    margin: 0,
    paddingLeft: tokens.spacingHorizontalL,
    color: tokens.colorNeutralForeground2,
    fontSize: tokens.fontSizeBase200,
  },
});

/** What a swap does to the mix as a whole, in words only (no raw scores on screen). */
export function changeKey(objectiveChange: number): 'swap.better' | 'swap.same' | 'swap.worse' {
  if (objectiveChange >= 0.01) return 'swap.better';
  if (objectiveChange > -0.01) return 'swap.same';
  return 'swap.worse';
}

export interface SwapDialogProps {
  /** The species being replaced; null when the dialog is closed. */
  slot: { slug: string; name: string } | null;
  request: Omit<AlternativesRequest, 'slot'>;
  onPick: (slug: string) => void;
  onClose: () => void;
}

/** "Show me alternatives for this slot": the best few replacements with the change each makes and why it fits. */
export function SwapDialog({ slot, request, onPick, onClose }: SwapDialogProps) {
  const styles = useStyles();
  const { t } = useTranslation('mix');
  const name = slot?.name ?? '';
  const query = useQuery({
    ...alternativesQueryOptions({ ...request, slot: slot?.slug ?? '' }),
    enabled: slot !== null,
  });
  const options = query.data?.alternatives.slice(0, SHOWN) ?? [];

  return (
    <Dialog open={slot !== null} onOpenChange={(_, d) => (d.open ? undefined : onClose())}>
      <DialogSurface aria-describedby={undefined}>
        <DialogBody>
          <DialogTitle>{t('swap.title', { name })}</DialogTitle>
          <DialogContent>
            {query.isPending ? <LoadingState label={t('swap.loading')} /> : null}
            {query.isError ? (
              <ErrorState title={t('swap.error')} message={query.error.message} onRetry={() => void query.refetch()} />
            ) : null}
            {query.isSuccess && options.length === 0 ? (
              <EmptyState title={t('swap.noneTitle')}>{t('swap.noneText')}</EmptyState>
            ) : null}
            {options.length > 0 ? (
              <ul className={styles.list} aria-label={t('swap.list', { name })}>
                {options.map((a) => (
                  <li key={a.slug} className={styles.option}>
                    <p className={styles.name}>
                      {a.species.commonName} <span className={styles.sci}>{a.species.scientificName}</span>
                    </p>
                    <p className={styles.change}>{t(changeKey(a.objectiveChange))}</p>
                    <ul className={styles.reasons}>
                      {distinctReasons(a.parts).map((r) => (
                        <li key={r}>{r}</li>
                      ))}
                    </ul>
                    <div>
                      <Button onClick={() => onPick(a.slug)}>{t('swap.use', { name: a.species.commonName })}</Button>
                    </div>
                  </li>
                ))}
              </ul>
            ) : null}
          </DialogContent>
          <DialogActions>
            <Button onClick={onClose}>{t('swap.keep', { name })}</Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
