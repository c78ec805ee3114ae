/** "2027-06-12" → "Saturday, June 12, 2027"; read as a calendar day, never shifted by time zone. */
export function longDate(isoDate: string): string {
  return new Intl.DateTimeFormat('en-US', {
    weekday: 'long',
    month: 'long',
    day: 'numeric',
    year: 'numeric',
    timeZone: 'UTC',
  }).format(new Date(`${isoDate}T00:00:00Z`));
}

/** 0.25 → "25%". */
export function percentWords(share: number): string {
  return `${Math.round(share * 100)}%`;
}

/** 1234 → "1,234"; tables show counts with separators. */
export function countWords(n: number): string {
  return n.toLocaleString('en-US');
}
