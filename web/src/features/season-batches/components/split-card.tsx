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
import type { BatchSplitProposalAnswer, SeasonBatches } from '@homeground/shared';
import { type FormEvent, useState } from 'react';
import { useProposeSplitMutation, useSaveSplitMutation } from '../../../api/batches/batches.mutations.js';
import { Heading } from '../../../components/page/page-heading.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { draftFromProposal, rowErrors, useSplitDraft } from '../hooks/use-split-draft.js';
import { useTranslation } from 'react-i18next';
import { useWords } from '../../../lib/i18n/index.js';
import { useSeasonBatchesStyles } from './season-batches.styles.js';

/** The split: Homeground proposes, the organiser changes plants or removes batches, then saves the whole split. */
export function SplitEditor({ slug, saved }: { slug: string; saved: SeasonBatches }) {
  const styles = useSeasonBatchesStyles();
  const { t } = useTranslation('seasonBatches');
  const words = useWords();
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
        if (!isApiRequestError(error)) return setFailure(t('split.failed'));
        const errors = rowErrors(error.fields ?? []);
        draft.setErrors(errors);
        setFailure(errors[-1] ?? (Object.keys(errors).length ? null : error.message));
      },
    });
  };

  return (
    <form onSubmit={submit} noValidate aria-label={t('split.form')}>
      <Heading level="card">{t('split.title')}</Heading>
      <p className={styles.lead}>{t('split.lead')}</p>
      {draft.rows.length === 0 ? (
        <p>{t('split.none')}</p>
      ) : (
        <div className={styles.scroller} role="region" aria-label={t('split.table')} tabIndex={0}>
          <Table className={styles.table} aria-label={t('split.table')}>
            <TableHeader>
              <TableRow>
                <TableHeaderCell>{t('split.grower')}</TableHeaderCell>
                <TableHeaderCell>{t('split.species')}</TableHeaderCell>
                <TableHeaderCell>{t('split.method')}</TableHeaderCell>
                <TableHeaderCell>{t('split.plants')}</TableHeaderCell>
                <TableHeaderCell>{t('split.remove')}</TableHeaderCell>
              </TableRow>
            </TableHeader>
            <TableBody>
              {draft.rows.map((r, i) => (
                <TableRow key={`${r.id ?? 'new'}-${r.growerId}-${r.slug}-${r.method}`}>
                  <TableCell>{r.growerName}</TableCell>
                  <TableCell>{r.commonName}</TableCell>
                  <TableCell>{words.sowingMethod[r.method].phrase}</TableCell>
                  <TableCell>
                    <Field
                      label={{
                        children: t('split.plantsFor', { name: r.commonName, grower: r.growerName }),
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
                        r.logged
                          ? t('split.stays', { name: r.commonName })
                          : t('split.removeFor', { name: r.commonName, grower: r.growerName })
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
            <strong>{t('split.unassigned')}: </strong>
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
          {propose.isPending ? t('split.proposing') : t('split.propose')}
        </Button>
        <Button type="submit" appearance="primary" icon={<SaveRegular />} disabled={save.isPending}>
          {save.isPending ? t('split.saving') : t('split.save')}
        </Button>
        <span role="status">{draft.isDirty ? t('split.unsaved') : done ? t('split.saved') : ''}</span>
      </div>
    </form>
  );
}
