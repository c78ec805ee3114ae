export { useFindPlantsSteps } from './hooks/use-find-plants-steps.js';
