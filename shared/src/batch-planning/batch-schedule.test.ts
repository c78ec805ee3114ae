import { describe, expect, it } from 'vitest';
import { daysBetween } from '../sowing-calendar/calendar-date.js';
import { seasonSpecies as sp } from '../season-planning/season-fixtures.js';
import { batchSchedule } from './batch-schedule.js';
import { frostWarning } from './frost-watch.js';
import { sowMoreNudge } from './sow-more.js';
import { batchesToIcs } from './batches-ics.js';

// Season: last frost 2027-05-10, plant share 2027-06-12 (the invented demo season); planned well
// ahead (today 2026-09-01) so no step is a late start.
const season = { lastFrost: '2027-05-10', plantShareDate: '2027-06-12', today: '2026-09-01' };
const milkweed = sp({
  slug: 'asclepias-incarnata',
  scientificName: 'Asclepias incarnata',
  germination: { treatments: [{ kind: 'cold-moist', days: 30 }] },
});
const indigo = sp({
  slug: 'baptisia-australis',
  scientificName: 'Baptisia australis',
  germination: { treatments: [{ kind: 'scarification' }], methods: ['indoor-lights'] },
});

describe('batchSchedule', () => {
  it('indoors: start stratifying in the refrigerator = sowing date − CMS days (IPN, CHECK-VALUES §4, D)', () => {
    const s = batchSchedule({ ...season, species: milkweed, method: 'indoor-lights' });
    const start = s.steps.find((x) => x.kind === 'start-stratifying')!;
    expect(daysBetween(start.date, s.sowDate)).toBe(30);
    // Sown 8 weeks before the last frost (M, from memory): 2027-05-10 − 56 d.
    expect(s.sowDate).toBe('2027-03-15');
    expect(s.treatments[0]).toMatchObject({ kind: 'cold-moist', days: 30, where: 'refrigerator' });
    expect(s.steps.map((x) => x.kind)).toEqual(
      expect.arrayContaining(['start-stratifying', 'sow', 'pot-up', 'harden-off', 'frost-watch', 'ready']),
    );
    // Hardening off takes about 10 days (7–14 d, M) before plants are ready.
    const harden = s.steps.find((x) => x.kind === 'harden-off')!;
    expect(daysBetween(harden.date, s.readyDate!)).toBe(10);
    expect(s.readyAfterShare).toBe(false);
  });

  it('winter sowing: winter does the cold, containers are vented in spring, no hardening off', () => {
    const s = batchSchedule({ ...season, species: milkweed, method: 'winter-sowing' });
    expect(s.treatments[0]).toMatchObject({ where: 'outdoors' });
    expect(s.steps.map((x) => x.kind)).toContain('vent-containers');
    expect(s.steps.map((x) => x.kind)).not.toContain('harden-off');
    // Winter sowing runs December to February (M, from memory).
    expect(s.sowDate >= '2026-12-01' && s.sowDate <= '2027-02-28').toBe(true);
  });

  it('scarification is a treatment with no days and no refrigerator', () => {
    const s = batchSchedule({ ...season, species: indigo, method: 'indoor-lights' });
    expect(s.treatments).toEqual([expect.objectContaining({ kind: 'scarification', days: null, where: null })]);
    expect(s.steps.map((x) => x.kind)).not.toContain('start-stratifying');
  });
});

describe('frostWarning', () => {
  // The calendar's frost watch: the average last frost is a 50 % date, frost stays possible for about
  // two weeks after it (M, from memory); Homeground starts warning a week before.
  it.each([
    ['2027-05-02', null],
    ['2027-05-03', 'close the container tops'],
    ['2027-05-24', 'close the container tops'],
    ['2027-05-25', null],
  ])('on %s for winter-sown seedlings → %s', (today, words) => {
    const w = frostWarning({ method: 'winter-sowing', lastFrost: '2027-05-10', today, seedlingsUp: true });
    if (words === null) expect(w).toBeNull();
    else expect(w).toContain(words);
  });
  it('says nothing before anything is up', () => {
    expect(
      frostWarning({ method: 'outdoor-pot-winter', lastFrost: '2027-05-10', today: '2027-05-10', seedlingsUp: false }),
    ).toBeNull();
  });
});

describe('sowMoreNudge', () => {
  const base = {
    species: milkweed,
    germinationRatePct: 70,
    lossFactor: 0.2,
    ...season,
  };
  it('says how many more seeds and containers, and by when, while there is time', () => {
    // 30 short at 70 % germination and 20 % losses (common practice): 30 ÷ (0.7 × 0.8) = 53.6 → 54 seeds;
    // 30 plants ÷ 10 per container (common practice) = 3 containers.
    const words = sowMoreNudge({ ...base, method: 'winter-sowing', shortBy: 30, expected: 20, targetPlants: 50 });
    expect(words).toMatch(
      /^At this rate about 20 of 50 will be ready: sow about 54 more seeds \(3 more covered containers\), starting by 2027-\d\d-\d\d\.$/,
    );
  });
  it('says the same nudge in Spanish, with the same numbers and date', () => {
    const input = { ...base, method: 'winter-sowing' as const, shortBy: 30, expected: 20, targetPlants: 50 };
    const english = sowMoreNudge(input);
    const spanish = sowMoreNudge({ ...input, locale: 'es' });
    expect(spanish).toMatch(
      /^A este ritmo estarán listas unas 20 de 50: siembra unas 54 semillas más \(3 recipientes cubiertos más\) y empieza a más tardar el 2027-\d\d-\d\d\.$/,
    );
    expect(spanish?.slice(-11)).toBe(english?.slice(-11));
  });
  it('stays quiet when nothing is short or a new batch would miss the share', () => {
    expect(sowMoreNudge({ ...base, method: 'indoor-lights', shortBy: 0, expected: 50, targetPlants: 50 })).toBeNull();
    const late = { ...base, today: '2027-05-20' };
    expect(sowMoreNudge({ ...late, method: 'indoor-lights', shortBy: 10, expected: 40, targetPlants: 50 })).toBeNull();
  });
});

describe('batchesToIcs', () => {
  it('writes each step as an all-day event with a stable UID (RFC 5545 §3.6.1, §3.8.4.7)', () => {
    const s = batchSchedule({ ...season, species: milkweed, method: 'indoor-lights' });
    const ics = batchesToIcs(
      [{ slug: milkweed.slug, commonName: 'Swamp milkweed', method: 'indoor-lights', steps: s.steps, warnings: [] }],
      { today: '2026-09-01', planId: 'my-batches' },
    );
    expect(ics.startsWith('BEGIN:VCALENDAR\r\nVERSION:2.0\r\n')).toBe(true);
    expect(ics.match(/BEGIN:VEVENT/g)).toHaveLength(s.steps.length);
    expect(ics).toContain('UID:sow.asclepias-incarnata.indoor-lights.my-batches@homeground');
    expect(ics).toContain(`DTSTART;VALUE=DATE:${s.sowDate.replace(/-/g, '')}`);
    expect(ics).toContain('SUMMARY:Swamp milkweed: Sow');
  });
});
