export * from './types/species.js';
export * from './types/ecoregion.js';
export * from './types/auth.js';
export * from './types/species-query.js';
export * from './catalogue/region-match.js';
export * from './catalogue/species-csv.js';
export * from './types/place.js';
