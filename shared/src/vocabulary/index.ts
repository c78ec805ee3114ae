export * from './join-words.js';
export * from './months.js';
export * from './site-words.js';
export * from './plant-words.js';
export * from './caution-words.js';
export * from './seed-words.js';
export * from './record-words.js';
export * from './sowing-depth.js';
