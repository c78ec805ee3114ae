import {
  bloomWords,
  formatHeightRangeCm,
  type Moisture,
  moisturePhrase,
  type Sun,
  sunPhrase,
} from '@homeground/shared';

/** The fact-card summary of one species on offer, as short lines (sun, soil, height, bloom). */
export interface SummaryFacts {
  sun: readonly Sun[];
  moisture: readonly Moisture[];
  heightMinCm: number;
  heightMaxCm: number;
  bloomMonths: readonly number[];
}

/** "Full sun or part shade · Dry or medium-moist soil · 1–2 ft (30–60 cm) tall · Blooms Jun–Aug". */
export function summaryLines(facts: SummaryFacts): string[] {
  return [
    facts.sun.length > 0 ? sunPhrase(facts.sun) : null,
    facts.moisture.length > 0 ? moisturePhrase(facts.moisture) : null,
    facts.heightMaxCm > 0 ? `${formatHeightRangeCm(facts.heightMinCm, facts.heightMaxCm)} tall` : null,
    bloomWords(facts.bloomMonths),
  ].filter((line): line is string => line !== null);
}

/** "2027-06-12T09:00:00" or "09:00" → "9:00 am"; a slot is read in the share's own local time. */
export function clockWords(value: string): string {
  const m = /(\d{2}):(\d{2})/.exec(value.includes('T') ? value.split('T')[1] : value);
  if (!m) return value;
  const hours = Number(m[1]);
  const suffix = hours < 12 ? 'am' : 'pm';
  const h12 = hours % 12 === 0 ? 12 : hours % 12;
  return `${h12}:${m[2]} ${suffix}`;
}

/** A slot as "9:00 am – 9:30 am". */
export function slotWords(slot: { start: string; end: string }): string {
  return `${clockWords(slot.start)} – ${clockWords(slot.end)}`;
}

/** "2027-06-12" (or a date-time) → "Saturday, June 12, 2027"; a calendar day, never shifted by time zone. */
export function shareDateWords(value: string): string {
  const day = value.slice(0, 10);
  if (!/^\d{4}-\d{2}-\d{2}$/.test(day)) return value;
  return new Intl.DateTimeFormat('en-US', {
    weekday: 'long',
    month: 'long',
    day: 'numeric',
    year: 'numeric',
    timeZone: 'UTC',
  }).format(new Date(`${day}T00:00:00Z`));
}
