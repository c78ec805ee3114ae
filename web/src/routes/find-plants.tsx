import { useTranslation } from 'react-i18next';
import { useLocation } from 'react-router-dom';
import { PageIntro } from '../components/page/page-intro.js';
import { ErrorState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/index.js';
import { useFindPlantsSteps } from '../features/find-plants/index.js';
import { EMPTY_YARD, valuesFromSite, YardMixView, YardStep } from '../features/yard-mix/index.js';
import { GroundStep } from '../features/your-ground/index.js';

/** Find plants: your ground → your yard → your yard mix, one step at a time (see `useFindPlantsSteps`). */
export function FindPlantsRoute() {
  const { t } = useTranslation('ground');
  const location = useLocation();
  const session = useSession();
  const { step, region, plan, goTo, confirmGround, changePlan } = useFindPlantsSteps();

  return (
    <>
      <PageIntro title={t('page.title')}>{t('page.intro')}</PageIntro>
      {step === 'ground' ? <GroundStep onConfirm={confirmGround} /> : null}
      {step === 'yard' && region ? (
        <YardStep
          region={region}
          initial={plan.kind === 'plan' ? valuesFromSite(plan.plan.site, plan.plan.areaUnit) : EMPTY_YARD}
          onChangeGround={() => goTo('ground')}
          onSubmit={(site, areaUnit) => changePlan({ region, site, areaUnit, locked: [], excluded: [] })}
        />
      ) : null}
      {step === 'mix' && plan.kind === 'invalid' ? (
        <ErrorState
          title={t('page.badLinkTitle')}
          message={t('page.badLinkMessage', { problems: plan.problems.join('; ') })}
          onRetry={() => goTo('yard')}
        />
      ) : null}
      {step === 'mix' && plan.kind === 'plan' ? (
        <YardMixView
          plan={plan.plan}
          onPlanChange={changePlan}
          isSignedIn={session.status === 'signed-in'}
          signInHref={paths.signIn.build(`${location.pathname}${location.search}`)}
          onChangeYard={() => goTo('yard')}
          onChangeGround={() => goTo('ground')}
        />
      ) : null}
    </>
  );
}
