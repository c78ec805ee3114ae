export { YardForm } from './yard-form/yard-form.js';
export { YardStep } from './yard-form/yard-step.js';
export { EMPTY_YARD, valuesFromSite } from './yard-form/yard-form-values.js';
export { YardMixView } from './result/yard-mix-view.js';
export type { PlanChange } from './hooks/use-mix-plan.js';
export {
  type AreaUnit, type MixPlan, type MixRegion, hasPlanParams, planFromSavedMix, planFromSearchParams, planToSearchParams, regionFromSearchParams,
} from './plan/mix-plan.js';
export { SavedMixesList } from './result/saved-mixes-list.js';
