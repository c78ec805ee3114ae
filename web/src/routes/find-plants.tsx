import { useCallback, useEffect, useMemo, useRef } from 'react';
import { useLocation, useSearchParams } from 'react-router-dom';
import { MAIN_CONTENT_ID } from '../components/app-shell/app-shell.js';
import { PageIntro } from '../components/page/page-intro.js';
import { ErrorState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/index.js';
import { type ChosenGround, GroundStep } from '../features/your-ground/index.js';
import {
  EMPTY_YARD, type MixPlan, type PlanChange, planFromSearchParams, planToSearchParams, regionFromSearchParams, valuesFromSite,
  YardMixView, YardStep,
} from '../features/yard-mix/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

type Step = 'ground' | 'yard' | 'mix';

const STEP_TITLES: Record<Step, string> = { ground: 'Find plants: your ground', yard: 'Find plants: your yard', mix: 'Your yard mix' };

/** Keys that belong to a finished mix; a new ground or new yard answers make them stale. */
const MIX_KEYS = ['chosen', 'locked', 'excluded', 'size'];

/**
 * Find plants: your ground → your yard → your yard mix. The step and every answer live in the URL,
 * so the back button walks the steps and the mix's own URL is its share link.
 */
export function FindPlantsRoute() {
  const [params, setParams] = useSearchParams();
  const location = useLocation();
  const session = useSession();
  const parsed = useMemo(() => planFromSearchParams(params), [params]);
  const region = regionFromSearchParams(params);
  const requested = params.get('step');
  const step: Step = requested === 'ground' || !region ? 'ground' : requested === 'yard' || parsed.kind === 'none' ? 'yard' : 'mix';
  useDocumentTitle(STEP_TITLES[step]);

  // A new step replaces the screen: move focus (and the view) to the top of the page content, so
  // keyboard and screen-reader users start the step at its beginning. Not on the first visit.
  const shownStep = useRef(step);
  useEffect(() => {
    if (shownStep.current === step) return;
    shownStep.current = step;
    const main = document.getElementById(MAIN_CONTENT_ID);
    main?.focus({ preventScroll: true });
    main?.scrollIntoView?.({ block: 'start' });
  }, [step]);

  const goTo = (next: Step, change: (p: URLSearchParams) => void = () => {}) => {
    const p = new URLSearchParams(params);
    change(p);
    if (next === 'mix') p.delete('step');
    else p.set('step', next);
    setParams(p);
  };

  const confirmGround = (ground: ChosenGround) =>
    goTo('yard', (p) => {
      p.set('state', ground.state);
      if (ground.ecoregionCode) p.set('eco', ground.ecoregionCode);
      else p.delete('eco');
      MIX_KEYS.forEach((k) => p.delete(k));
    });

  const onPlanChange = useCallback<PlanChange>(
    (plan: MixPlan, options) => setParams(planToSearchParams(plan), { replace: options?.replace ?? false }),
    [setParams],
  );

  return (
    <>
      <PageIntro title="Find plants">
        Tell Homeground where your ground is and what your yard is like, and get a yard mix of native plants that belong
        there, with why each one fits and how many to grow.
      </PageIntro>
      {step === 'ground' ? <GroundStep onConfirm={confirmGround} /> : null}
      {step === 'yard' && region ? (
        <YardStep
          region={region}
          initial={parsed.kind === 'plan' ? valuesFromSite(parsed.plan.site, parsed.plan.areaUnit) : EMPTY_YARD}
          onChangeGround={() => goTo('ground')}
          onSubmit={(site, areaUnit) => onPlanChange({ region, site, areaUnit, locked: [], excluded: [] })}
        />
      ) : null}
      {step === 'mix' && parsed.kind === 'invalid' ? (
        <ErrorState
          title="This link's yard answers are incomplete"
          message={`Answer the yard questions again to see a mix. (${parsed.problems.join('; ')})`}
          onRetry={() => goTo('yard')}
        />
      ) : null}
      {step === 'mix' && parsed.kind === 'plan' ? (
        <YardMixView
          plan={parsed.plan}
          onPlanChange={onPlanChange}
          isSignedIn={session.status === 'signed-in'}
          signInHref={paths.signIn.build(`${location.pathname}${location.search}`)}
          onChangeYard={() => goTo('yard')}
          onChangeGround={() => goTo('ground')}
        />
      ) : null}
    </>
  );
}
