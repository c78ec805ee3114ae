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
import { useTranslation } from 'react-i18next';
import { useSaveTargetsMutation } from '../../../api/seasons/seasons.mutations.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { useFormatters } from '../../../lib/i18n/index.js';
import type { TargetDraft } from '../hooks/use-target-draft.js';
import { rowErrorsFromApi, targetsBody } from '../utils/target-rows.js';
import { useSeasonStyles } from './season.styles.js';

/**
 * The targets: plants wanted of each species, with the organiser's germination rate when they have
 * tested their seed. Organisers edit the draft and save it (the whole list is replaced); everyone
 * else reads the saved list.
 */
export function TargetsCard({ slug, season, draft }: { slug: string; season: Season; draft: TargetDraft | null }) {
  const { t } = useTranslation('season');
  return (
    <ContentCard aria-labelledby="season-targets">
      <Heading level="section" id="season-targets">
        {t('targets.title')}
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
  const { t } = useTranslation('season');
  const { number } = useFormatters();
  const styles = useSeasonStyles();
  if (season.targets.length === 0) return <p>{t('targets.none')}</p>;
  return (
    <div className={styles.scroller} role="region" aria-label={t('targets.tableLabel')} tabIndex={0}>
      <Table className={styles.table} aria-labelledby="season-targets">
        <TableHeader>
          <TableRow>
            <TableHeaderCell>{t('targets.species')}</TableHeaderCell>
            <TableHeaderCell>{t('targets.targetPlants')}</TableHeaderCell>
            <TableHeaderCell>{t('targets.germination')}</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {season.targets.map((target) => (
            <TableRow key={target.slug}>
              <TableCell>
                <SpeciesName common={target.commonName} scientific={target.scientificName} />
              </TableCell>
              <TableCell>{number(target.targetPlants)}</TableCell>
              <TableCell>
                {target.germinationRatePct === undefined
                  ? t('targets.recordRate')
                  : t('targets.tested', { pct: number(target.germinationRatePct) })}
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
  const { t } = useTranslation('season');
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
        if (!isApiRequestError(error)) return setFailure(t('targets.somethingWrong'));
        const { errors, loose } = rowErrorsFromApi(error.fields ?? []);
        draft.setErrors(errors);
        const hasRowErrors = Object.keys(errors).length > 0;
        setFailure(loose.length > 0 ? loose.join('; ') : hasRowErrors ? null : error.message);
      },
    });
  };

  return (
    <form onSubmit={submit} noValidate aria-labelledby="season-targets">
      <p className={styles.lead}>{t('targets.lead')}</p>
      {draft.rows.length === 0 ? (
        <p>{t('targets.empty')}</p>
      ) : (
        <div className={styles.scroller} role="region" aria-label={t('targets.tableLabel')} tabIndex={0}>
          <Table className={styles.table} aria-labelledby="season-targets">
            <TableHeader>
              <TableRow>
                <TableHeaderCell>{t('targets.species')}</TableHeaderCell>
                <TableHeaderCell>{t('targets.targetPlants')}</TableHeaderCell>
                <TableHeaderCell>{t('targets.yourGermination')}</TableHeaderCell>
                <TableHeaderCell>
                  <span className={styles.visuallyHidden}>{t('targets.remove')}</span>
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
                        label={{
                          children: t('targets.targetPlantsOf', { name: row.commonName }),
                          className: styles.visuallyHidden,
                        }}
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
                          children: t('targets.germinationOf', { name: row.commonName }),
                          className: styles.visuallyHidden,
                        }}
                        validationMessage={errors.germinationRatePct}
                        validationState={errors.germinationRatePct ? 'error' : 'none'}
                      >
                        <Input
                          className={styles.number}
                          inputMode="decimal"
                          placeholder={t('targets.recordPlaceholder')}
                          value={row.germinationRatePct}
                          onChange={(_, d) => draft.change(i, 'germinationRatePct', d.value)}
                        />
                      </Field>
                    </TableCell>
                    <TableCell>
                      <Button
                        appearance="subtle"
                        icon={<DeleteRegular />}
                        aria-label={t('targets.removeOf', { name: row.commonName })}
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
          {save.isPending ? t('targets.saving') : t('targets.save')}
        </Button>
        <span role="status">{draft.isDirty ? t('targets.unsaved') : saved ? t('targets.saved') : ''}</span>
      </div>
    </form>
  );
}
