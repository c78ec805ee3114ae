import type { RecordReferenceAnswer } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { recordReferenceQueryOptions } from '../../../api/species/reference-checks.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { ReferenceChecksTable } from './reference-checks-table.js';
import { ReferenceMissing } from './reference-missing.js';

/** One record beside the open reference data, for curators on the species page. */
export function RecordReferencePanel({ slug }: { slug: string }) {
  const { t } = useTranslation('reference');
  const answer = useQuery(recordReferenceQueryOptions(slug));
  return (
    <ContentCard aria-labelledby="record-reference">
      <Heading level="section" id="record-reference">
        {t('record.title')}
      </Heading>
      <QueryState query={answer} loading={t('record.loading')} error={t('record.error')}>
        {(a: RecordReferenceAnswer) =>
          a.comparison ? (
            <ReferenceChecksTable checks={a.comparison.checks} caption={a.comparison.scientificName} />
          ) : (
            <ReferenceMissing files={a.missingFiles} />
          )
        }
      </QueryState>
    </ContentCard>
  );
}
