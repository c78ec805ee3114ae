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
import { DeleteRegular, SaveRegular } from '@fluentui/react-icons';
import type { Season } from '@homeground/shared';
import { type FormEvent, useState } from 'react';
import { useSaveTargetsMutation } from '../../../api/seasons/seasons.mutations.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import type { TargetDraft } from '../hooks/use-target-draft.js';
import { rowErrorsFromApi, targetsBody } from '../utils/target-rows.js';
import { countWords } from '../utils/season-words.js';
import { useSeasonStyles } from './season.styles.js';

/**
 * The targets: plants wanted of each species, with the organiser's germination rate when they have
 * tested their seed. Organisers edit the draft and save it (the whole list is replaced); everyone
 * else reads the saved list.
 */
export function TargetsCard({ slug, season, draft }: { slug: string; season: Season; draft: TargetDraft | null }) {
  return (
    <ContentCard aria-labelledby="season-targets">
      <Heading level="section" id="season-targets">
        Targets
      </Heading>
      {draft ? <TargetsEditor slug={slug} draft={draft} /> : <TargetsReadOnly season={season} />}
    </ContentCard>
  );
}

function SpeciesName({ common, scientific }: { common: string; scientific: string }) {
  const styles = useSeasonStyles();
  return (
    <>
      {common}
      <span className={styles.scientific}>{scientific}</span>
    </>
  );
}

function TargetsReadOnly({ season }: { season: Season }) {
  const styles = useSeasonStyles();
  if (season.targets.length === 0) return <p>The organiser has not set any targets yet.</p>;
  return (
    <div className={styles.scroller} role="region" aria-label="Targets table" tabIndex={0}>
      <Table className={styles.table} aria-labelledby="season-targets">
        <TableHeader>
          <TableRow>
            <TableHeaderCell>Species</TableHeaderCell>
            <TableHeaderCell>Target plants</TableHeaderCell>
            <TableHeaderCell>Germination</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {season.targets.map((t) => (
            <TableRow key={t.slug}>
              <TableCell>
                <SpeciesName common={t.commonName} scientific={t.scientificName} />
              </TableCell>
              <TableCell>{countWords(t.targetPlants)}</TableCell>
              <TableCell>
                {t.germinationRatePct === undefined ? "The species record's rate" : `${t.germinationRatePct}% (tested)`}
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </div>
  );
}

function TargetsEditor({ slug, draft }: { slug: string; draft: TargetDraft }) {
  const styles = useSeasonStyles();
  const save = useSaveTargetsMutation(slug);
  const [failure, setFailure] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setFailure(null);
    setSaved(false);
    const checked = targetsBody(draft.rows);
    if ('errors' in checked) {
      draft.setErrors(checked.errors);
      return;
    }
    save.mutate(checked.body, {
      onSuccess: (season) => {
        draft.reset(season);
        setSaved(true);
      },
      onError: (error) => {
        // Nothing was written: the draft stays as typed, with the API's words beside each row.
        if (!isApiRequestError(error)) return setFailure('Something went wrong. Try again.');
        const { errors, loose } = rowErrorsFromApi(error.fields ?? []);
        draft.setErrors(errors);
        const hasRowErrors = Object.keys(errors).length > 0;
        setFailure(loose.length > 0 ? loose.join('; ') : hasRowErrors ? null : error.message);
      },
    });
  };

  return (
    <form onSubmit={submit} noValidate aria-labelledby="season-targets">
      <p className={styles.lead}>
        Plants you want ready for the plant share. Leave germination empty to use the species record&apos;s rate, or
        enter your own from a germination test of this year&apos;s seed.
      </p>
      {draft.rows.length === 0 ? (
        <p>No targets yet. Propose species below and add the ones you want to grow.</p>
      ) : (
        <div className={styles.scroller} role="region" aria-label="Targets table" tabIndex={0}>
          <Table className={styles.table} aria-labelledby="season-targets">
            <TableHeader>
              <TableRow>
                <TableHeaderCell>Species</TableHeaderCell>
                <TableHeaderCell>Target plants</TableHeaderCell>
                <TableHeaderCell>Your germination (%)</TableHeaderCell>
                <TableHeaderCell>
                  <span className={styles.visuallyHidden}>Remove</span>
                </TableHeaderCell>
              </TableRow>
            </TableHeader>
            <TableBody>
              {draft.rows.map((row, i) => {
                const errors = draft.errors[i] ?? {};
                return (
                  <TableRow key={row.slug}>
                    <TableCell>
                      <SpeciesName common={row.commonName} scientific={row.scientificName} />
                      {errors.slug ? <span role="alert">{errors.slug}</span> : null}
                    </TableCell>
                    <TableCell>
                      <Field
                        label={{ children: `Target plants of ${row.commonName}`, className: styles.visuallyHidden }}
                        validationMessage={errors.targetPlants}
                        validationState={errors.targetPlants ? 'error' : 'none'}
                      >
                        <Input
                          className={styles.number}
                          inputMode="numeric"
                          value={row.targetPlants}
                          onChange={(_, d) => draft.change(i, 'targetPlants', d.value)}
                        />
                      </Field>
                    </TableCell>
                    <TableCell>
                      <Field
                        label={{
                          children: `Your germination rate for ${row.commonName}`,
                          className: styles.visuallyHidden,
                        }}
                        validationMessage={errors.germinationRatePct}
                        validationState={errors.germinationRatePct ? 'error' : 'none'}
                      >
                        <Input
                          className={styles.number}
                          inputMode="decimal"
                          placeholder="record's rate"
                          value={row.germinationRatePct}
                          onChange={(_, d) => draft.change(i, 'germinationRatePct', d.value)}
                        />
                      </Field>
                    </TableCell>
                    <TableCell>
                      <Button
                        appearance="subtle"
                        icon={<DeleteRegular />}
                        aria-label={`Remove ${row.commonName}`}
                        onClick={() => draft.remove(i)}
                      />
                    </TableCell>
                  </TableRow>
                );
              })}
            </TableBody>
          </Table>
        </div>
      )}
      {failure ? (
        <MessageBar intent="error">
          <MessageBarBody>{failure}</MessageBarBody>
        </MessageBar>
      ) : null}
      <div className={styles.actions} data-print="hide">
        <Button type="submit" appearance="primary" icon={<SaveRegular />} disabled={save.isPending}>
          {save.isPending ? 'Saving…' : 'Save targets'}
        </Button>
        <span role="status">
          {draft.isDirty ? 'You have changes that are not saved yet.' : saved ? 'Targets saved.' : ''}
        </span>
      </div>
    </form>
  );
}
