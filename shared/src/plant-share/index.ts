export * from './requests.js';
export * from './answers.js';
export * from './limits.js';
export * from './care-sheet.js';
export * from './fits-my-yard.js';
export * from './season-report.js';
export * from './germination.js';
