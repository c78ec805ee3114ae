export { GroundStep, type ChosenGround } from './components/ground-step.js';
