/**
 * A slot's clock time on the share's date as the API wants it: a moment with its UTC offset
 * ("2027-06-12T09:00:00-05:00"). The offset is the organiser's own browser's for that date, which is
 * the share's when they plan it where it happens; the offset keeps the slot the same on every server.
 */
export function slotTime(date: string, clock: string): string | null {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date) || !/^\d{2}:\d{2}$/.test(clock)) return null;
  const local = new Date(`${date}T${clock}:00`);
  if (Number.isNaN(local.getTime())) return null;
  const minutes = -local.getTimezoneOffset();
  const sign = minutes >= 0 ? '+' : '-';
  const pad = (n: number) => String(Math.floor(Math.abs(n))).padStart(2, '0');
  return `${date}T${clock}:00${sign}${pad(minutes / 60)}:${pad(minutes % 60)}`;
}

/** "2027-06-12T09:00:00-05:00" → "9:00 am": the clock the organiser wrote, not the reader's zone. */
export function clockWords(value: string): string {
  const m = /T(\d{2}):(\d{2})/.exec(value) ?? /^(\d{2}):(\d{2})/.exec(value);
  if (!m) return value;
  const hours = Number(m[1]);
  const h12 = hours % 12 === 0 ? 12 : hours % 12;
  return `${h12}:${m[2]} ${hours < 12 ? 'am' : 'pm'}`;
}

export function slotWords(slot: { start: string; end: string }): string {
  return `${clockWords(slot.start)} – ${clockWords(slot.end)}`;
}

/** "2027-06-12" → "Saturday, June 12, 2027"; a calendar day, never shifted by time zone. */
export function shareDateWords(day: string): string {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(day)) return day;
  return new Intl.DateTimeFormat('en-US', {
    weekday: 'long',
    month: 'long',
    day: 'numeric',
    year: 'numeric',
    timeZone: 'UTC',
  }).format(new Date(`${day}T00:00:00Z`));
}
