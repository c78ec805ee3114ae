import { Button, Field, Input, MessageBar, MessageBarBody } from '@fluentui/react-components';
import { SparkleRegular } from '@fluentui/react-icons';
import { type Season, shareListRequestSchema } from '@homeground/shared';
import { type FormEvent, useState } from 'react';
import { useProposeShareListMutation } from '../../../api/seasons/seasons.mutations.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { useTranslation } from 'react-i18next';
import type { TargetDraft } from '../hooks/use-target-draft.js';
import { ProposalList } from './proposal-list.js';
import { useSeasonStyles } from './season.styles.js';

/**
 * The share list: species Homeground proposes for the season (native to the group's ecoregion, raised
 * by the group's methods), with why. Nothing is saved until the organiser adds a proposal to the
 * targets and saves them.
 */
export function ShareListCard({ slug, season, draft }: { slug: string; season: Season; draft: TargetDraft }) {
  const styles = useSeasonStyles();
  const { t } = useTranslation('season');
  const propose = useProposeShareListMutation(slug);
  const [milkweedPct, setMilkweedPct] = useState(String(Math.round(season.milkweedShare * 100)));
  const [fieldError, setFieldError] = useState<string | undefined>();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const text = milkweedPct.trim();
    const share = /^\d+(\.\d+)?$/.test(text) ? Number(text) / 100 : Number.NaN;
    const parsed = shareListRequestSchema.safeParse({ milkweedShare: share });
    if (!parsed.success) {
      // The schema speaks in shares of 1; the field asks for a percentage.
      setFieldError(Number.isNaN(share) ? t('shareList.notAPercentage') : t('shareList.outOfRange'));
      return;
    }
    setFieldError(undefined);
    propose.mutate(parsed.data);
  };

  return (
    <ContentCard aria-labelledby="season-share-list">
      <Heading level="section" id="season-share-list">
        {t('shareList.title')}
      </Heading>
      <p className={styles.lead}>{t('shareList.lead')}</p>
      <form onSubmit={submit} noValidate className={styles.actions} data-print="hide">
        <Field
          label={t('shareList.milkweeds')}
          validationMessage={fieldError}
          validationState={fieldError ? 'error' : 'none'}
        >
          <Input
            className={styles.number}
            inputMode="decimal"
            value={milkweedPct}
            onChange={(_, d) => {
              setMilkweedPct(d.value);
              setFieldError(undefined);
            }}
          />
        </Field>
        <Button type="submit" appearance="primary" icon={<SparkleRegular />} disabled={propose.isPending}>
          {propose.isPending ? t('shareList.proposing') : t('shareList.propose')}
        </Button>
      </form>
      {propose.isError ? (
        <MessageBar intent="error">
          <MessageBarBody>{t('shareList.failed', { reason: propose.error.message })}</MessageBarBody>
        </MessageBar>
      ) : null}
      {propose.data ? <ProposalList list={propose.data} draft={draft} /> : null}
    </ContentCard>
  );
}
