import { makeStyles, tokens } from '@fluentui/react-components';
import { capitalise, type UnexplainedDisagreements } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { unexplainedDisagreementsQueryOptions } from '../../../api/species/reference-checks.queries.js';
import { RouterLink } from '../../../components/links/router-link.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { paths } from '../../../config/paths.js';
import { ReferenceChecksTable } from './reference-checks-table.js';
import { ReferenceMissing } from './reference-missing.js';

const useStyles = makeStyles({
  list: { display: 'grid', gap: tokens.spacingVerticalL },
  count: { fontSize: tokens.fontSizeBase400, fontWeight: tokens.fontWeightSemibold, margin: 0 },
  links: { display: 'flex', gap: tokens.spacingHorizontalL, margin: `0 0 ${tokens.spacingVerticalS}` },
});

/** The curator's work list: every difference from the reference no record explains yet, with the count. */
export function UnexplainedList() {
  const styles = useStyles();
  const { t } = useTranslation('reference');
  const answer = useQuery(unexplainedDisagreementsQueryOptions());
  return (
    <QueryState query={answer} loading={t('page.loading')} error={t('page.error')}>
      {(a: UnexplainedDisagreements) =>
        !a.available ? (
          <ReferenceMissing files={a.missingFiles} />
        ) : (
          <div className={styles.list}>
            <p className={styles.count} role="status">
              {a.count === 0
                ? t('count.none', { compared: a.compared })
                : t('count.summary', { count: a.count, records: a.records.length, compared: a.compared })}
            </p>
            {a.records.map((r) => (
              <ContentCard key={r.slug} aria-labelledby={`ref-${r.slug}`}>
                <Heading level="section" id={`ref-${r.slug}`}>
                  {capitalise(r.commonName)} ({r.scientificName})
                </Heading>
                <p className={styles.links}>
                  <RouterLink to={paths.speciesDetail.build(r.slug)}>{r.scientificName}</RouterLink>
                  <RouterLink to={paths.speciesEdit.build(r.slug)}>{t('record.edit')}</RouterLink>
                </p>
                <ReferenceChecksTable checks={r.checks} caption={r.scientificName} />
              </ContentCard>
            ))}
          </div>
        )
      }
    </QueryState>
  );
}
