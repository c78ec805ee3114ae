export { HomeHero } from './components/home-hero.js';
export { HowItWorks } from './components/how-it-works.js';
export { CatalogueFigures } from './components/catalogue-figures.js';
export { GrowingGroups } from './components/growing-groups.js';
