import { useTranslation } from 'react-i18next';
import { useCallback, useEffect, useMemo, useRef } from 'react';
import { useSearchParams } from 'react-router-dom';
import { MAIN_CONTENT_ID } from '../../../components/app-shell/app-shell.js';
import {
  type FindPlantsStep,
  type MixPlan,
  type MixRegion,
  paths,
  stepOf,
  withGround,
  withStep,
} from '../../../config/paths.js';
import { useDocumentTitle } from '../../../lib/use-document-title.js';

const STEP_TITLES = {
  ground: 'page.titleGround',
  yard: 'page.titleYard',
  mix: 'page.titleMix',
} as const satisfies Record<FindPlantsStep, string>;

/**
 * Find plants: your ground → your yard → your yard mix. The step and every answer live in the URL,
 * so the back button walks the steps and the mix's own URL is its share link. The hook reads the
 * step from the URL, names the page after it, moves focus to the top of a new step, and gives the
 * moves between steps; the route only lays the steps out.
 */
export function useFindPlantsSteps() {
  const { t } = useTranslation('ground');
  const [params, setParams] = useSearchParams();
  const search = useMemo(() => paths.findPlants.parse(params), [params]);
  const step = stepOf(search);
  useDocumentTitle(t(STEP_TITLES[step]));
  useFocusOnNewStep(step);

  const goTo = (next: FindPlantsStep) => setParams(withStep(params, next));
  /** Your ground is chosen: on to the yard, keeping any yard answers but not a finished mix. */
  const confirmGround = (ground: MixRegion) => setParams(withGround(params, ground));
  const changePlan = useCallback(
    (plan: MixPlan, options?: { replace?: boolean }) =>
      setParams(paths.findPlants.search({ plan }), { replace: options?.replace ?? false }),
    [setParams],
  );

  return { step, region: search.region, plan: search.plan, goTo, confirmGround, changePlan };
}

/**
 * A new step replaces the screen: move focus (and the view) to the top of the page content, so
 * keyboard and screen-reader users start the step at its beginning. Not on the first visit.
 */
function useFocusOnNewStep(step: FindPlantsStep) {
  const shownStep = useRef(step);
  useEffect(() => {
    if (shownStep.current === step) return;
    shownStep.current = step;
    const main = document.getElementById(MAIN_CONTENT_ID);
    main?.focus({ preventScroll: true });
    main?.scrollIntoView?.({ block: 'start' });
  }, [step]);
}
