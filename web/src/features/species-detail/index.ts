export { SpeciesDetail, type SpeciesDetailProps } from './components/species-detail.js';
