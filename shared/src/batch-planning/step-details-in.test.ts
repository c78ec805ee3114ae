import { describe, expect, it } from 'vitest';
import { ALL_FIXTURES, F } from '../scoring/__tests__/species-fixtures.js';
import { batchSchedule } from './batch-schedule.js';
import { stepDetailIn } from './step-details-in.js';

// The Spanish is Homeground's own wording (from memory); what is checked is that the calendar's
// sentences have their twins, with the values (days, dates, depths) carried over unchanged.
const METHODS = ['indoor-lights', 'soil-blocks', 'winter-sowing', 'outdoor-pot-winter'] as const;
const plan = { lastFrost: '2027-05-10', plantShareDate: '2027-06-12' };

describe('batch step details in Spanish', () => {
  it('says the cold-moist start in Spanish, with its days', () => {
    // The first fixture that stratifies in the refrigerator (a cold-moist treatment in its record).
    const species = ALL_FIXTURES.find((f) => f.germination.treatments.some((t) => t.kind === 'cold-moist'))!;
    const input = { ...plan, species, method: 'indoor-lights' as const, today: '2026-12-01' };
    const es = batchSchedule({ ...input, locale: 'es' });
    const en = batchSchedule(input);
    const days = /for (\d+) days\./.exec(en.steps.find((x) => x.kind === 'start-stratifying')!.detail)![1];
    expect(es.steps.find((x) => x.kind === 'start-stratifying')?.detail).toContain(
      `Ciérrala en una bolsa etiquetada y guárdala en el refrigerador a 1–5 °C (33–41 °F) durante ${days} días.`,
    );
    expect(es.steps.find((x) => x.kind === 'sow')?.detail).toMatch(
      /^Siembra en celdas o macetas pequeñas bajo lámparas/,
    );
    expect(es.steps.map((x) => x.date)).toEqual(en.steps.map((x) => x.date));
  });

  it('leaves no calendar sentence in English for the fixtures, save the records’ own notes', () => {
    // "Nick the seed coat." is a fixture record's own note (catalogue text), kept as written.
    const catalogueNotes = new Set(['Nick the seed coat.']);
    for (const species of ALL_FIXTURES)
      for (const method of METHODS)
        for (const today of ['2026-09-01', '2026-12-01']) {
          const s = batchSchedule({ ...plan, species, method, today, locale: 'es' });
          for (const step of s.steps)
            for (const part of step.detail.split(/(?<=\.) /))
              if (!catalogueNotes.has(part)) expect(part).not.toMatch(/\b(the|and|with|seed|Sow|Keep)\b/);
          for (const w of s.warnings) expect(w).not.toMatch(/\b(the|needs|sown|Sow|Keep|is past)\b/);
        }
  });

  it('passes English through unchanged', () => {
    expect(stepDetailIn('Bring them in if frost threatens.', F.wildBergamot, 'en')).toBe(
      'Bring them in if frost threatens.',
    );
  });
});
