import { useQuery } from '@tanstack/react-query';
import { useCallback, useMemo } from 'react';
import { useLocation, useNavigate, useParams } from 'react-router-dom';
import { savedMixQueryOptions } from '../api/mixes/mixes.queries.js';
import { PageIntro } from '../components/page/page-intro.js';
import { ErrorState, QueryState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/index.js';
import { type MixPlan, type PlanChange, planFromSavedMix, YardMixView } from '../features/yard-mix/index.js';
import { isApiRequestError } from '../lib/api-request-error.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

/** A saved yard mix, for anyone with its link. Any change opens it in Find plants as a new, unsaved mix. */
export function SavedMixRoute() {
  const { id = '' } = useParams();
  const navigate = useNavigate();
  const location = useLocation();
  const session = useSession();
  const saved = useQuery(savedMixQueryOptions(id));
  const plan = useMemo(() => (saved.data ? planFromSavedMix(saved.data) : null), [saved.data]);
  useDocumentTitle(saved.data ? saved.data.name : 'Saved mix');

  const toFindPlants = useCallback<PlanChange>(
    (next: MixPlan, options) =>
      navigate(paths.findPlants.build({ plan: next }), { replace: options?.replace ?? false }),
    [navigate],
  );

  const failed = (error: Error, retry: () => void) => {
    const isMissing = isApiRequestError(error) && (error.statusCode === 404 || error.statusCode === 400);
    return (
      <>
        <PageIntro title="Saved mix" />
        <ErrorState
          title={isMissing ? 'There is no saved mix at this link' : 'Homeground could not open this mix'}
          message={
            isMissing
              ? 'The link may be incomplete, or the mix was deleted. Ask the person who shared it for the link again.'
              : error.message
          }
          onRetry={isMissing ? undefined : retry}
        />
      </>
    );
  };

  return (
    <QueryState query={saved} loading="Opening the saved mix" error={failed}>
      {(mix) => (
        <>
          <PageIntro title={mix.name}>
            A yard mix saved by {mix.ownerFirstName} on {formatSavedOn(mix.createdAt)}. Changing it opens a copy in Find
            plants; this saved mix stays as it is.
          </PageIntro>
          {plan ? (
            <YardMixView
              plan={plan}
              title="The saved mix"
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

function formatSavedOn(createdAt: string): string {
  return new Date(createdAt).toLocaleDateString('en-US', { year: 'numeric', month: 'long', day: 'numeric' });
}
