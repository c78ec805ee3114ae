export * from './batch-units.js';
export * from './method-fit.js';
export * from './propose-split.js';
export * from './batch-schedule.js';
export * from './batch-log.js';
export * from './ready-forecast.js';
export * from './supply-list.js';
export * from './frost-watch.js';
