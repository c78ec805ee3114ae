export * from './types/species.js';
export * from './types/ecoregion.js';
export * from './types/auth.js';
