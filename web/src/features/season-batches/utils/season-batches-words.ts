import { SOWING_METHOD_WORDS, UNIT_OF, UNIT_WORDS, type GrowerMethod } from '@homeground/shared';

/**
 * The organiser's growers, split and progress words, kept together so they can move into a catalogue.
 */
export const SEASON_BATCHES_WORDS = {
  growers: 'Growers',
  growersLead: 'What each grower raises plants by, and how many pots, containers or blocks they can tend.',
  noGrowers: 'No grower has said how they grow yet.',
  notStated: 'Has not said yet',
  split: 'Batches',
  splitLead:
    'Homeground proposes a split of the targets by each species’ seed treatment and each grower’s room. Change the plants or remove a batch, then save.',
  propose: 'Propose a split',
  proposing: 'Proposing…',
  save: 'Save the batches',
  saving: 'Saving…',
  saved: 'Batches saved.',
  unsaved: 'You have changes that are not saved yet.',
  noBatches: 'No batches yet. Propose a split to start.',
  unassigned: 'Not placed',
  groupSupplies: 'What the group needs',
  progress: 'Progress and ready forecast',
  progressLead: 'Each species’ target against what the growers have sown, what came up and what is ready.',
  byGrower: 'By grower',
  howWorkedOut: 'How the forecast is worked out',
  loading: 'Loading the batches',
  failed: 'The batches did not load.',
  progressFailed: 'The progress did not load.',
  mail: 'E-mail to growers',
  frostLead:
    'When frost is forecast, warn the growers who have plants outdoors. Each gets an e-mail saying what to close, cover or bring in for their own batches, and their batch page says it too.',
  frostForm: 'Send a frost warning',
  frostNight: 'Night of the frost',
  frostNote: 'A line from you (optional)',
  frostNoteHint: 'For example the forecast low.',
  sendFrost: 'Send the frost warning',
  sending: 'Sending…',
  weekly: 'Weekly summary',
  weeklyLead:
    'Each grower gets an e-mail once a week with the next step of each batch. Send this week’s now if it has not gone yet; nobody gets it twice in one week.',
  sendWeekly: 'Send this week’s summary now',
  weeklyFailed: 'The summary was not sent. Try again.',
} as const;

/** "Sent to Amara Reyes (2 batches)." or why nobody got it. */
export function frostSentWords(answer: { growers: { displayName: string; batches: number }[] }): string {
  if (answer.growers.length === 0) return 'No grower has plants outdoors yet, so no warning went out.';
  const names = answer.growers.map((g) => `${g.displayName} (${g.batches} ${g.batches === 1 ? 'batch' : 'batches'})`);
  return `Sent to ${names.join(', ')}.`;
}

/** "Sent to 3 growers; 0 had this week's already." */
export function weeklySentWords(answer: { sent: number; alreadySent: number }): string {
  const sent = answer.sent === 1 ? 'Sent to 1 grower' : `Sent to ${answer.sent} growers`;
  return answer.alreadySent === 0 ? `${sent}.` : `${sent}; ${answer.alreadySent} had this week’s already.`;
}

/** "12 of 24 covered containers" */
export function roomWords(method: GrowerMethod, used: number, capacity: number): string {
  return `${SOWING_METHOD_WORDS[method].phrase}: ${used} of ${capacity} ${UNIT_WORDS[UNIT_OF[method]].many} used`;
}

/** "about 36 (29–40)": the expected count with its range, never a bare score. */
export function forecastWords(f: { expected: number; low: number; high: number }): string {
  return f.low === f.high ? `about ${f.expected}` : `about ${f.expected} (${f.low}–${f.high})`;
}
