export { YardForm } from './components/yard-form/yard-form.js';
export { YardStep } from './components/yard-form/yard-step.js';
export { EMPTY_YARD, valuesFromSite } from './utils/yard-form-values.js';
export { YardMixView } from './components/result/yard-mix-view.js';
export type { PlanChange } from './hooks/use-mix-plan.js';
export { type AreaUnit, type MixPlan, type MixRegion, planFromSavedMix } from './utils/mix-plan.js';
export { SavedMixesList } from './components/result/saved-mixes-list.js';
