import ICAL from 'ical.js';
import { describe, expect, it } from 'vitest';
import { F } from '../scoring/__tests__/species-fixtures.js';
import { csvField } from '../csv/csv-cell.js';
import { calendarToCsv } from './calendar-csv.js';
import { calendarToIcs, escapeText, foldLine } from './calendar-ics.js';
import type { SowingPlan } from './calendar-types.js';
import { buildSowingCalendar } from './sowing-calendar.js';

const build = (plans: SowingPlan[]) =>
  buildSowingCalendar({ lastFrost: '2027-05-10', today: '2027-01-25', targetDate: '2027-06-12', plans });
const base: SowingPlan[] = [
  { species: F.goldenAlexanders, method: 'indoor-lights' }, // late: CMS today, ready after the share
  { species: F.wildBergamot, method: 'winter-sowing' },
  { species: F.butterflyMilkweed, method: 'outdoor-pot-winter' },
];
const names = (slug: string) => ({ commonName: slug.replace(/-/g, ' '), scientificName: slug });
const octets = (s: string) => new TextEncoder().encode(s).length;

/** Parse with ical.js (a widely used RFC 5545 parser, independent of our writer). */
function parse(ics: string) {
  const vcal = new ICAL.Component(ICAL.parse(ics));
  return vcal.getAllSubcomponents('vevent').map((v) => {
    const e = new ICAL.Event(v);
    return {
      uid: e.uid,
      start: e.startDate.toString(),
      end: e.endDate.toString(),
      summary: e.summary,
      description: e.description,
    };
  });
}

describe('iCalendar export (RFC 5545)', () => {
  it('round-trips through ical.js: every event with its date, title and text, all-day (DTEND the next day)', () => {
    const c = build(base);
    const parsed = parse(calendarToIcs(c, { today: '2027-01-25', planId: 'larkfield-2027' }));
    expect(parsed).toHaveLength(c.events.length);
    c.events.forEach((e, i) => {
      expect(parsed[i].start).toBe(e.date);
      expect(parsed[i].summary).toBe(e.title);
      expect(parsed[i].description.startsWith(e.detail)).toBe(true);
    });
    expect(parsed.find((p) => p.start === '2027-06-12')!.end).toBe('2027-06-13');
  });

  it('UIDs stay the same when a species is added, so a re-import replaces instead of duplicating', () => {
    const before = parse(calendarToIcs(build(base), { today: '2027-01-25', planId: 'larkfield-2027' }));
    const after = parse(
      calendarToIcs(build([{ species: F.showyGoldenrod, method: 'indoor-lights' }, ...base]), {
        today: '2027-01-25',
        planId: 'larkfield-2027',
      }),
    );
    const afterByUid = new Map(after.map((p) => [p.uid, p]));
    for (const p of before) expect(afterByUid.get(p.uid)).toMatchObject({ start: p.start, summary: p.summary });
    expect(new Set(after.map((p) => p.uid)).size).toBe(after.length); // unique
    expect(after.length).toBeGreaterThan(before.length);
    expect(before.find((p) => p.summary.startsWith('Wild bergamot') && p.summary.includes('winter-sow'))!.uid).toBe(
      'sow.monarda-fistulosa.winter-sowing.larkfield-2027@homeground',
    );
  });

  it('every warning reaches the DESCRIPTION of its species’ events', () => {
    const c = build(base);
    expect(c.warnings.map((w) => w.kind)).toEqual(expect.arrayContaining(['late-start', 'target-too-early']));
    const text = parse(calendarToIcs(c, { today: '2027-01-25' }))
      .map((p) => p.description)
      .join('\n');
    for (const w of c.warnings) expect(text).toContain(w.message);
  });

  it('folds at 75 octets, not 75 characters, never inside a UTF-8 sequence (RFC 5545 §3.1)', () => {
    const ics = calendarToIcs(build(base), { today: '2027-01-25' });
    for (const line of ics.split('\r\n')) expect(octets(line)).toBeLessThanOrEqual(75);
    // "°" and "–" are 2 and 3 octets: 40 of them are 80+ characters' worth of octets.
    const folded = foldLine(`DESCRIPTION:${'°C–'.repeat(20)}`);
    for (const line of folded.split('\r\n')) expect(octets(line)).toBeLessThanOrEqual(75);
    expect(
      folded
        .split('\r\n')
        .map((l, i) => (i === 0 ? l : l.slice(1)))
        .join(''),
    ).toBe(`DESCRIPTION:${'°C–'.repeat(20)}`);
  });

  it('escapes TEXT values (RFC 5545 §3.3.11)', () => {
    expect(escapeText('a,b;c\\d\ne')).toBe('a\\,b\\;c\\\\d\\ne');
  });
});

describe('CSV export (RFC 4180)', () => {
  it('one row per event, then one per warning, quoted where needed, CRLF', () => {
    const c = build(base);
    const csv = calendarToCsv(c, names);
    const lines = csv.split('\r\n');
    expect(lines[0]).toBe('date,species,scientificName,kind,title,detail');
    const warningRows = lines.filter((l) => l.includes(',warning:'));
    expect(warningRows).toHaveLength(c.warnings.length);
    for (const w of c.warnings) expect(csv).toContain(csvField(w.message));
  });

  it('words the header and warning titles in Spanish for es, the same rows and kind codes otherwise', () => {
    const c = build(base);
    const en = calendarToCsv(c, names).split('\r\n');
    const es = calendarToCsv(c, names, 'es').split('\r\n');
    expect(es[0]).toBe('fecha,especie,nombre científico,tipo,título,detalle');
    expect(es).toHaveLength(en.length);
    expect(es.filter((l) => l.includes(',warning:'))).toHaveLength(c.warnings.length);
    expect(es.join('\n')).not.toContain('Please note');
    expect(es.filter((l) => l.includes('Ten en cuenta'))).toHaveLength(c.warnings.length);
  });

  it('quotes commas, quotes and line breaks', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a, "b"')).toBe('"a, ""b"""');
  });
});
