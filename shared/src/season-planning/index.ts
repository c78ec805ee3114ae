export * from './seed-ease.js';
export * from './share-list-candidates.js';
export * from './share-list.js';
export * from './seed-list.js';
export * from './seed-list-csv.js';
export * from './season-dates.js';
