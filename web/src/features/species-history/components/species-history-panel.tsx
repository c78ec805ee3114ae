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
import { speciesHistoryQueryOptions, useRevertChangeMutation } from '../../../api/species/species-history.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';

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

const KIND_WORDS: Record<SpeciesChangeKind, string> = {
  create: 'Added',
  edit: 'Edited',
  import: 'Imported',
  revert: 'Undone',
};

const dateTime = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeStyle: 'short' });

/** Up to five changed fields are spelled out; the rest are counted, so a new record does not fill the page. */
const SHOWN_FIELDS = 5;

/** "Edited by Ines Calder on Dec 2, 2026, 10:15 PM (from spring-edits.csv)". */
export function changeHeadline(c: SpeciesChange): string {
  const who = c.changedBy ? ` by ${c.changedBy.displayName}` : ' from the catalogue files';
  const file = c.fileName ? ` (from ${c.fileName})` : '';
  return `${KIND_WORDS[c.kind]}${who} on ${dateTime.format(new Date(c.changedAt))}${file}`;
}

/** A change that brought the record in has no earlier version to go back to. */
const addedRecord = (c: SpeciesChange) => c.kind === 'create' || c.changes.every((f) => f.before === null);

const shown = (v: string | null) => (v === null ? '—' : v.length > 160 ? `${v.slice(0, 157)}…` : v);

function FieldLines({ changes }: { changes: FieldChange[] }) {
  const styles = useStyles();
  const rest = changes.length - SHOWN_FIELDS;
  return (
    <dl className={styles.fields}>
      {changes.slice(0, SHOWN_FIELDS).map((f) => (
        <div key={f.field} className={styles.pair}>
          <dt className={styles.term}>{f.field}</dt>
          <dd className={styles.value}>
            {shown(f.before)} → {shown(f.after)}
            {f.source ? <span className={styles.source}> · source: {f.source}</span> : null}
          </dd>
        </div>
      ))}
      {rest > 0 ? (
        <div className={styles.pair}>
          <dt className={styles.term}>…</dt>
          <dd className={styles.value}>and {rest} more fields</dd>
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

  return (
    <ContentCard aria-labelledby="species-history">
      <Heading level="section" id="species-history">
        Changes to this record
      </Heading>
      <QueryState
        query={history}
        loading="Loading the record's history"
        error="The record's history did not load."
        isEmpty={(list: SpeciesChange[]) => list.length === 0}
        empty="No one has changed this record since it came from the catalogue files."
      >
        {(list: SpeciesChange[]) => (
          <ol className={styles.list}>
            {list.map((c) => (
              <li key={c.id} className={styles.entry}>
                <p className={styles.who}>{changeHeadline(c)}</p>
                <FieldLines changes={c.changes} />
                {!addedRecord(c) ? (
                  <Button size="small" onClick={() => setConfirming(c)} disabled={revert.isPending}>
                    Undo this change
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
            <DialogTitle>Undo this change?</DialogTitle>
            <DialogContent>
              The record goes back to how it was before: {confirming ? changeHeadline(confirming) : ''}. The undo is
              kept in the history too, so it can be undone in turn.
            </DialogContent>
            <DialogActions>
              <Button onClick={() => setConfirming(null)}>Keep it</Button>
              <Button
                appearance="primary"
                onClick={() => {
                  if (confirming) revert.mutate(confirming.id, { onSettled: () => setConfirming(null) });
                }}
              >
                Undo
              </Button>
            </DialogActions>
          </DialogBody>
        </DialogSurface>
      </Dialog>
    </ContentCard>
  );
}
