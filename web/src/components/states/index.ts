export { LoadingState } from './loading-state.js';
export { ErrorState } from './error-state.js';
export { EmptyState } from './empty-state.js';
export { QueryState, type QueryLike, type QueryStateProps } from './query-state.js';
