import { emptySpeciesFormValues, type Source, type SpeciesFormValues, speciesToFormValues } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { useNavigate, useParams } from 'react-router-dom';
import { speciesSourcesQueryOptions } from '../api/species/species-editor.queries.js';
import { speciesDetailQueryOptions } from '../api/species/species.queries.js';
import { PageIntro } from '../components/page/page-intro.js';
import { EmptyState, QueryState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { BloomStrip } from '../features/species-browser/index.js';
import { SpeciesEditorForm } from '../features/species-editor/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { SignedInGate } from './signed-in-gate.js';

const curates = (role: string) => role === 'curator' || role === 'admin';

/** The editor with the sources registry loaded; the route draws the bloom strip the catalogue uses. */
function Editor({ slug, initial }: { slug?: string; initial: SpeciesFormValues }) {
  const { t } = useTranslation('editor');
  const navigate = useNavigate();
  const sources = useQuery(speciesSourcesQueryOptions());
  return (
    <QueryState query={sources} loading={t('page.sourcesLoading')} error={t('page.sourcesError')}>
      {(list: Source[]) => (
        <SpeciesEditorForm
          slug={slug}
          initial={initial}
          sources={list}
          renderBloomStrip={(bloomMonths, flowerColours) => (
            <BloomStrip bloomMonths={bloomMonths} flowerColours={flowerColours} size="large" />
          )}
          onSaved={(record) => void navigate(paths.speciesDetail.build(record.slug))}
          onCancel={() => void navigate(slug ? paths.speciesDetail.build(slug) : paths.species.build())}
        />
      )}
    </QueryState>
  );
}

/** Curators add a species from a blank form. */
export function SpeciesNewRoute() {
  const { t } = useTranslation('editor');
  useDocumentTitle(t('page.addTitle'));
  return (
    <SignedInGate loading={t('page.loading')}>
      {(user) =>
        curates(user.role) ? (
          <>
            <PageIntro title={t('page.addTitle')}>{t('page.intro')}</PageIntro>
            <Editor initial={emptySpeciesFormValues()} />
          </>
        ) : (
          <EmptyState title={t('page.notCurator')} />
        )
      }
    </SignedInGate>
  );
}

/** Curators edit one record, starting from what the catalogue holds now. */
export function SpeciesEditRoute() {
  const { t } = useTranslation('editor');
  const { slug = '' } = useParams();
  const record = useQuery(speciesDetailQueryOptions(slug));
  const name = record.data?.commonNames[0] ?? slug;
  useDocumentTitle(t('page.editTitle', { name }));
  return (
    <SignedInGate loading={t('page.loading')}>
      {(user) =>
        curates(user.role) ? (
          <>
            <PageIntro title={t('page.editTitle', { name })}>{t('page.intro')}</PageIntro>
            <QueryState query={record} loading={t('page.loading')} error={t('page.loadError')}>
              {(s) => {
                // The detail answer adds photo facts the record itself does not hold.
                const { hasPhoto: _hasPhoto, photoCredit: _credit, ...species } = s;
                return <Editor key={slug} slug={slug} initial={speciesToFormValues(species)} />;
              }}
            </QueryState>
          </>
        ) : (
          <EmptyState title={t('page.notCurator')} />
        )
      }
    </SignedInGate>
  );
}
