import { useQuery } from '@tanstack/react-query';
import { useCallback, useMemo } from 'react';
import { useTranslation } from 'react-i18next';
import { useLocation, useNavigate, useParams } from 'react-router-dom';
import { savedMixQueryOptions } from '../api/mixes/mixes.queries.js';
import { PageIntro } from '../components/page/page-intro.js';
import { ErrorState, QueryState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/index.js';
import { type MixPlan, type PlanChange, planFromSavedMix, YardMixView } from '../features/yard-mix/index.js';
import { isApiRequestError } from '../lib/api-request-error.js';
import { useFormatters } from '../lib/i18n/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

/** A saved yard mix, for anyone with its link. Any change opens it in Find plants as a new, unsaved mix. */
export function SavedMixRoute() {
  const { id = '' } = useParams();
  const navigate = useNavigate();
  const location = useLocation();
  const session = useSession();
  const saved = useQuery(savedMixQueryOptions(id));
  const { t } = useTranslation('mix');
  const f = useFormatters();
  const plan = useMemo(() => (saved.data ? planFromSavedMix(saved.data) : null), [saved.data]);
  useDocumentTitle(saved.data ? saved.data.name : t('savedPage.title'));

  const toFindPlants = useCallback<PlanChange>(
    (next: MixPlan, options) =>
      navigate(paths.findPlants.build({ plan: next }), { replace: options?.replace ?? false }),
    [navigate],
  );

  const failed = (error: Error, retry: () => void) => {
    const isMissing = isApiRequestError(error) && (error.statusCode === 404 || error.statusCode === 400);
    return (
      <>
        <PageIntro title={t('savedPage.title')} />
        <ErrorState
          title={isMissing ? t('savedPage.missingTitle') : t('savedPage.errorTitle')}
          message={isMissing ? t('savedPage.missingText') : error.message}
          onRetry={isMissing ? undefined : retry}
        />
      </>
    );
  };

  return (
    <QueryState query={saved} loading={t('savedPage.loading')} error={failed}>
      {(mix) => (
        <>
          <PageIntro title={mix.name}>
            {t('savedPage.intro', { name: mix.ownerFirstName, date: f.date(mix.createdAt.slice(0, 10)) })}
          </PageIntro>
          {plan ? (
            <YardMixView
              plan={plan}
              title={t('savedPage.heading')}
              onPlanChange={toFindPlants}
              isSignedIn={session.status === 'signed-in'}
              signInHref={paths.signIn.build(location.pathname)}
            />
          ) : null}
        </>
      )}
    </QueryState>
  );
}
