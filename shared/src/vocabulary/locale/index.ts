export * from './vocabulary.js';
export * from './words-for.js';
