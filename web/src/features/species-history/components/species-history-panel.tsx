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
import type { FieldChange, SpeciesChange, SpeciesChangeKind } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useTranslation } from 'react-i18next';
import { speciesHistoryQueryOptions, useRevertChangeMutation } from '../../../api/species/species-history.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { useFormatters } from '../../../lib/i18n/index.js';

const useStyles = makeStyles({
  list: { listStyle: 'none', margin: 0, padding: 0, display: 'grid', gap: tokens.spacingVerticalL },
  entry: {
    borderTop: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    paddingTop: tokens.spacingVerticalM,
  },
  who: { margin: 0, fontWeight: tokens.fontWeightSemibold },
  fields: {
    display: 'grid',
    gridTemplateColumns: 'minmax(8rem, max-content) 1fr',
    columnGap: tokens.spacingHorizontalL,
    rowGap: tokens.spacingVerticalXS,
    margin: `${tokens.spacingVerticalS} 0`,
  },
  pair: { display: 'contents' },
  term: { fontFamily: tokens.fontFamilyMonospace, fontSize: tokens.fontSizeBase200 },
  value: { margin: 0, overflowWrap: 'anywhere', fontSize: tokens.fontSizeBase200 },
  source: { color: tokens.colorNeutralForeground3 },
  failure: { color: tokens.colorPaletteRedForeground1 },
});

/** Up to five changed fields are spelled out; the rest are counted, so a new record does not fill the page. */
const SHOWN_FIELDS = 5;

/** "Edited by Ines Calder on Dec 2, 2026, 10:15 PM (from spring-edits.csv)", in the page's language. */
export function useChangeHeadline(): (c: SpeciesChange) => string {
  const { t } = useTranslation('history');
  const format = useFormatters();
  return (c) => {
    const kind = t(`kinds.${c.kind satisfies SpeciesChangeKind}`);
    const when = format.moment(c.changedAt);
    const headline = c.changedBy
      ? t('headline.byPerson', { kind, name: c.changedBy.displayName, when })
      : t('headline.fromFiles', { kind, when });
    return c.fileName ? t('headline.fromFile', { headline, file: c.fileName }) : headline;
  };
}

/** A change that brought the record in has no earlier version to go back to. */
const addedRecord = (c: SpeciesChange) => c.kind === 'create' || c.changes.every((f) => f.before === null);

const shown = (v: string | null) => (v === null ? '—' : v.length > 160 ? `${v.slice(0, 157)}…` : v);

function FieldLines({ changes }: { changes: FieldChange[] }) {
  const styles = useStyles();
  const { t } = useTranslation('history');
  const rest = changes.length - SHOWN_FIELDS;
  return (
    <dl className={styles.fields}>
      {changes.slice(0, SHOWN_FIELDS).map((f) => (
        <div key={f.field} className={styles.pair}>
          <dt className={styles.term}>{f.field}</dt>
          <dd className={styles.value}>
            {shown(f.before)} → {shown(f.after)}
            {f.source ? <span className={styles.source}>{t('panel.source', { source: f.source })}</span> : null}
          </dd>
        </div>
      ))}
      {rest > 0 ? (
        <div className={styles.pair}>
          <dt className={styles.term}>…</dt>
          <dd className={styles.value}>{t('panel.more', { count: rest })}</dd>
        </div>
      ) : null}
    </dl>
  );
}

/**
 * The record's history for curators: each change with who, when and how, the fields before and after
 * with their source, and an Undo that puts back the earlier version (itself a new change).
 */
export function SpeciesHistoryPanel({ slug }: { slug: string }) {
  const styles = useStyles();
  const history = useQuery(speciesHistoryQueryOptions(slug));
  const revert = useRevertChangeMutation(slug);
  const [confirming, setConfirming] = useState<SpeciesChange | null>(null);
  const { t } = useTranslation('history');
  const changeHeadline = useChangeHeadline();

  return (
    <ContentCard aria-labelledby="species-history">
      <Heading level="section" id="species-history">
        {t('panel.heading')}
      </Heading>
      <QueryState
        query={history}
        loading={t('panel.loading')}
        error={t('panel.error')}
        isEmpty={(list: SpeciesChange[]) => list.length === 0}
        empty={t('panel.empty')}
      >
        {(list: SpeciesChange[]) => (
          <ol className={styles.list}>
            {list.map((c) => (
              <li key={c.id} className={styles.entry}>
                <p className={styles.who}>{changeHeadline(c)}</p>
                <FieldLines changes={c.changes} />
                {!addedRecord(c) ? (
                  <Button size="small" onClick={() => setConfirming(c)} disabled={revert.isPending}>
                    {t('panel.undo')}
                  </Button>
                ) : null}
              </li>
            ))}
          </ol>
        )}
      </QueryState>
      {revert.isError ? (
        <p className={styles.failure} role="alert">
          {revert.error.message}
        </p>
      ) : null}
      <Dialog open={confirming !== null} onOpenChange={(_, d) => !d.open && setConfirming(null)}>
        <DialogSurface>
          <DialogBody>
            <DialogTitle>{t('confirm.title')}</DialogTitle>
            <DialogContent>{t('confirm.text', { change: confirming ? changeHeadline(confirming) : '' })}</DialogContent>
            <DialogActions>
              <Button onClick={() => setConfirming(null)}>{t('confirm.keep')}</Button>
              <Button
                appearance="primary"
                onClick={() => {
                  if (confirming) revert.mutate(confirming.id, { onSettled: () => setConfirming(null) });
                }}
              >
                {t('confirm.undo')}
              </Button>
            </DialogActions>
          </DialogBody>
        </DialogSurface>
      </Dialog>
    </ContentCard>
  );
}
