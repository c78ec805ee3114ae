import { useCallback, useEffect, useRef, useState } from 'react';

export interface DebouncedDraftOptions {
  /** What `value` will read after committing this draft (e.g. trimmed), so the echo does not overwrite typing. */
  normalize?: (draft: string) => string;
  delayMs?: number;
}

/**
 * A text field's draft that commits after the person pauses typing. When `value` changes from
 * elsewhere (back button, "Clear filters") the draft follows it; the echo of our own commit does not
 * reset the field, so a trailing space typed between words survives.
 */
export function useDebouncedDraft(value: string, commit: (draft: string) => void, options: DebouncedDraftOptions = {}) {
  const { normalize = (d: string) => d, delayMs = 300 } = options;
  const [draft, setDraft] = useState(value);
  const committed = useRef(value);
  const latest = useRef({ commit, normalize });
  latest.current = { commit, normalize };

  useEffect(() => {
    if (value !== committed.current) {
      committed.current = value;
      setDraft(value);
    }
  }, [value]);

  const flush = useCallback((text: string) => {
    const normalized = latest.current.normalize(text);
    if (normalized === committed.current) return;
    committed.current = normalized;
    latest.current.commit(text);
  }, []);

  useEffect(() => {
    const timer = setTimeout(() => flush(draft), delayMs);
    return () => clearTimeout(timer);
  }, [draft, delayMs, flush]);

  return { draft, setDraft, flush: () => flush(draft) };
}
