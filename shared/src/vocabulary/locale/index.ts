export * from './vocabulary.js';
export * from './words-for.js';
export * from './batch-words-in.js';
