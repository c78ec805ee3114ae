export { SeasonPage } from './components/season-page.js';
export { NoSeasonGroup } from './components/no-season-group.js';
