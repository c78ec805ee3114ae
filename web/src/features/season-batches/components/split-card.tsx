import {
  Button,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
} from '@fluentui/react-components';
import { DeleteRegular, SaveRegular, SparkleRegular } from '@fluentui/react-icons';
import { SOWING_METHOD_WORDS, type BatchSplitProposalAnswer, type SeasonBatches } from '@homeground/shared';
import { type FormEvent, useState } from 'react';
import { useProposeSplitMutation, useSaveSplitMutation } from '../../../api/batches/batches.mutations.js';
import { Heading } from '../../../components/page/page-heading.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { draftFromProposal, rowErrors, useSplitDraft } from '../hooks/use-split-draft.js';
import { SEASON_BATCHES_WORDS as W } from '../utils/season-batches-words.js';
import { useSeasonBatchesStyles } from './season-batches.styles.js';

/** The split: Homeground proposes, the organiser changes plants or removes batches, then saves the whole split. */
export function SplitEditor({ slug, saved }: { slug: string; saved: SeasonBatches }) {
  const styles = useSeasonBatchesStyles();
  const draft = useSplitDraft(saved);
  const propose = useProposeSplitMutation(slug);
  const save = useSaveSplitMutation(slug);
  const [proposal, setProposal] = useState<BatchSplitProposalAnswer | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const [done, setDone] = useState(false);

  const askForSplit = () =>
    propose.mutate(
      {},
      {
        onSuccess: (p) => {
          setProposal(p);
          draft.replace(draftFromProposal(saved, p));
          setDone(false);
        },
      },
    );

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setFailure(null);
    setDone(false);
    const checked = draft.body();
    if ('errors' in checked) return draft.setErrors(checked.errors);
    save.mutate(checked.body, {
      onSuccess: (answer) => {
        draft.reset(answer);
        setDone(true);
      },
      onError: (error) => {
        // Nothing was written: the draft stays as typed, with the API's words beside each row.
        if (!isApiRequestError(error)) return setFailure('Something went wrong. Try again.');
        const errors = rowErrors(error.fields ?? []);
        draft.setErrors(errors);
        setFailure(errors[-1] ?? (Object.keys(errors).length ? null : error.message));
      },
    });
  };

  return (
    <form onSubmit={submit} noValidate aria-label="The season's batches">
      <Heading level="card">{W.split}</Heading>
      <p className={styles.lead}>{W.splitLead}</p>
      {draft.rows.length === 0 ? (
        <p>{W.noBatches}</p>
      ) : (
        <div className={styles.scroller} role="region" aria-label="Batches table" tabIndex={0}>
          <Table className={styles.table} aria-label="Batches table">
            <TableHeader>
              <TableRow>
                <TableHeaderCell>Grower</TableHeaderCell>
                <TableHeaderCell>Species</TableHeaderCell>
                <TableHeaderCell>Method</TableHeaderCell>
                <TableHeaderCell>Plants</TableHeaderCell>
                <TableHeaderCell>Remove</TableHeaderCell>
              </TableRow>
            </TableHeader>
            <TableBody>
              {draft.rows.map((r, i) => (
                <TableRow key={`${r.id ?? 'new'}-${r.growerId}-${r.slug}-${r.method}`}>
                  <TableCell>{r.growerName}</TableCell>
                  <TableCell>{r.commonName}</TableCell>
                  <TableCell>{SOWING_METHOD_WORDS[r.method].phrase}</TableCell>
                  <TableCell>
                    <Field
                      label={{
                        children: `Plants of ${r.commonName} for ${r.growerName}`,
                        className: styles.visuallyHidden,
                      }}
                      validationMessage={draft.errors[i]}
                      validationState={draft.errors[i] ? 'error' : 'none'}
                    >
                      <Input
                        className={styles.number}
                        inputMode="numeric"
                        value={r.plants}
                        onChange={(_, d) => draft.change(i, d.value)}
                      />
                    </Field>
                  </TableCell>
                  <TableCell>
                    <Button
                      appearance="subtle"
                      icon={<DeleteRegular />}
                      disabled={r.logged}
                      aria-label={
                        r.logged ? `${r.commonName} has a log and stays` : `Remove ${r.commonName} for ${r.growerName}`
                      }
                      onClick={() => draft.remove(i)}
                    />
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </div>
      )}
      {proposal && proposal.unassigned.length > 0 ? (
        <MessageBar intent="warning">
          <MessageBarBody>
            <strong>{W.unassigned}: </strong>
            {proposal.unassigned.map((u) => `${u.plants} ${u.commonName}: ${u.reason}`).join(' ')}
          </MessageBarBody>
        </MessageBar>
      ) : null}
      {failure ? (
        <MessageBar intent="error">
          <MessageBarBody>{failure}</MessageBarBody>
        </MessageBar>
      ) : null}
      <div className={styles.actions}>
        <Button icon={<SparkleRegular />} onClick={askForSplit} disabled={propose.isPending}>
          {propose.isPending ? W.proposing : W.propose}
        </Button>
        <Button type="submit" appearance="primary" icon={<SaveRegular />} disabled={save.isPending}>
          {save.isPending ? W.saving : W.save}
        </Button>
        <span role="status">{draft.isDirty ? W.unsaved : done ? W.saved : ''}</span>
      </div>
    </form>
  );
}
