import { SOWING_METHOD_WORDS, UNIT_WORDS, type Batch, type GrowerMethod } from '@homeground/shared';

/**
 * The My batches screen's own words, kept together so they can move into a catalogue. Trade and
 * shared words come from shared/src/vocabulary.
 */
export const MY_BATCHES_WORDS = {
  title: 'My batches',
  lead: 'The batches your group gave you, with the date of each step and a log of what you sowed, what came up and what is ready.',
  none: 'No batches for you yet. When the organiser splits the season, yours appear here.',
  notGrower: 'My batches is for growers. Ask an organiser of your group to make you a grower.',
  loading: 'Loading your batches',
  failed: 'Your batches did not load.',
  steps: 'Dates',
  treatments: 'Seed treatment',
  howTo: 'How to do it',
  log: 'Batch log',
  logEmpty: 'Nothing logged yet.',
  record: 'Add to the log',
  saving: 'Saving…',
  saved: 'Saved to the log.',
  keptOnDevice: 'Kept on this device, not yet sent. It goes by itself when you have a connection again.',
  notYetSent: 'Not yet sent',
  refused: 'Not accepted',
  removeEntry: 'Remove',
  waiting: 'Waiting on this device',
  sendNow: 'Send now',
  sendingNow: 'Sending…',
  supplies: 'What you need',
  cautions: 'Take care',
  readyAfterShare: 'This species will be ready only after the plant share.',
  calendar: 'Add the dates to my calendar (iCalendar)',
  calendarFailed: 'The calendar file did not download. Try again.',
  howIGrow: 'How I grow',
  howIGrowLead:
    'Fill in the methods you use and how many pots, covered containers or soil blocks you can tend; leave the others empty. The organiser splits the batches by this.',
  saveHowIGrow: 'Save how I grow',
  savedHowIGrow: 'Saved. The organiser sees it when splitting the batches.',
} as const;

/** "2 log entries are kept on this device and not yet sent." */
export function waitingText(count: number): string {
  return count === 1
    ? '1 log entry is kept on this device and not yet sent. It goes by itself when you are back online.'
    : `${count} log entries are kept on this device and not yet sent. They go by themselves when you are back online.`;
}

/** "50 plants in 5 covered containers" */
export function plantsInUnits(batch: Pick<Batch, 'plants' | 'units' | 'unit'>): string {
  const unit = UNIT_WORDS[batch.unit];
  return `${batch.plants} plants in ${batch.units} ${batch.units === 1 ? unit.one : unit.many}`;
}

/** "Winter sowing in covered containers", capitalised, for a batch heading. */
export function methodTitle(method: GrowerMethod): string {
  const phrase = SOWING_METHOD_WORDS[method].phrase;
  return phrase.charAt(0).toUpperCase() + phrase.slice(1);
}

/** "2027-06-12" → "Sat, Jun 12"; a calendar day, never shifted by time zone. */
export function shortDate(isoDate: string): string {
  return new Intl.DateTimeFormat('en-US', { weekday: 'short', month: 'short', day: 'numeric', timeZone: 'UTC' }).format(
    new Date(`${isoDate}T00:00:00Z`),
  );
}

/** Today on the grower's own calendar, as YYYY-MM-DD. */
export function localToday(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}
