import { useCallback, useState } from 'react';

/** Columns a person may hide; the common name (the link to the detail page) always shows. */
export const OPTIONAL_COLUMNS = [
  'scientificName',
  'family',
  'growthForm',
  'height',
  'bloom',
  'sun',
  'moisture',
  'hostValue',
  'monarchHost',
  'cautions',
] as const;
export type OptionalColumn = (typeof OPTIONAL_COLUMNS)[number];

export const COLUMNS_STORAGE_KEY = 'homeground.species-browser.hidden-columns';
/** Family is one click away on the detail page; hiding it first keeps the table readable on a laptop. */
const WIDE_DEFAULT_HIDDEN: readonly OptionalColumn[] = ['family'];
/**
 * On a phone the name column stays put and the rest scroll: hiding the scientific name and growth
 * form at first puts height, bloom and sun right beside the name, where a grower looks first.
 */
const PHONE_DEFAULT_HIDDEN: readonly OptionalColumn[] = ['family', 'scientificName', 'growthForm'];
const PHONE_QUERY = '(max-width: 600px)';

function defaultHidden(): OptionalColumn[] {
  const isPhone = typeof window.matchMedia === 'function' && window.matchMedia(PHONE_QUERY).matches;
  return [...(isPhone ? PHONE_DEFAULT_HIDDEN : WIDE_DEFAULT_HIDDEN)];
}

/** Stores the hidden columns, not the shown ones, so a column added later appears for everyone. */
function readHidden(): OptionalColumn[] {
  try {
    const raw = window.localStorage.getItem(COLUMNS_STORAGE_KEY);
    if (raw === null) return defaultHidden();
    const parsed: unknown = JSON.parse(raw);
    return Array.isArray(parsed) ? OPTIONAL_COLUMNS.filter((c) => parsed.includes(c)) : defaultHidden();
  } catch {
    // Storage can be unavailable (private windows, quotas): fall back to the defaults.
    return defaultHidden();
  }
}

/** Which optional columns are shown, remembered in localStorage across visits. */
export function useColumnChoice() {
  const [hidden, setHidden] = useState<OptionalColumn[]>(readHidden);

  const setShown = useCallback((shown: readonly OptionalColumn[]) => {
    const nextHidden = OPTIONAL_COLUMNS.filter((c) => !shown.includes(c));
    setHidden(nextHidden);
    try {
      window.localStorage.setItem(COLUMNS_STORAGE_KEY, JSON.stringify(nextHidden));
    } catch {
      // Not remembered this time; the choice still applies to this visit.
    }
  }, []);

  const shown = OPTIONAL_COLUMNS.filter((c) => !hidden.includes(c));
  return { shown, isShown: (c: OptionalColumn) => !hidden.includes(c), setShown };
}
