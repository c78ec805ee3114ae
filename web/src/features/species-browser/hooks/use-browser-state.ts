import { useCallback, useMemo, useRef } from 'react';
import { useSearchParams } from 'react-router-dom';
import {
  applyChange,
  browserStateToSearchParams,
  parseBrowserState,
  type BrowserState,
} from '../utils/browser-state.js';

export interface UpdateOptions {
  /** Replace the current history entry instead of adding one (used while a search is refined). */
  replace?: boolean;
}

/** The browser's state lives in the URL: reading parses it, updating writes a new query string. */
export function useBrowserState() {
  const [params, setParams] = useSearchParams();
  const state = useMemo(() => parseBrowserState(params), [params]);

  // The router's navigation runs the route loader first, so the URL lags a tick behind a change.
  // Two quick changes (a height committed on blur, then a select) must build on each other, so
  // each update starts from the last one we asked for until the URL itself moves on.
  const latest = useRef({ seen: params.toString(), params });
  if (params.toString() !== latest.current.seen) latest.current = { seen: params.toString(), params };

  const update = useCallback(
    (change: Partial<BrowserState>, options: UpdateOptions = {}) => {
      const next = browserStateToSearchParams(applyChange(parseBrowserState(latest.current.params), change));
      latest.current = { ...latest.current, params: next };
      setParams(next, { replace: options.replace, preventScrollReset: true });
    },
    [setParams],
  );

  return { state, update };
}
