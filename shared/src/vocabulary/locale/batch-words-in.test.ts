import { describe, expect, it } from 'vitest';
import { F } from '../../scoring/__tests__/species-fixtures.js';
import { batchSchedule } from '../../batch-planning/batch-schedule.js';
import { frostWarning } from '../../batch-planning/frost-watch.js';
import { batchWordsFor } from './batch-words-in.js';

// The Spanish is Homeground's own wording (from memory); these checks hold both tables to the same keys.
describe('batchWordsFor', () => {
  const en = batchWordsFor('en');
  const es = batchWordsFor('es');

  it('has every step, method and caution in both languages', () => {
    expect(Object.keys(es.step).sort()).toEqual(Object.keys(en.step).sort());
    expect(Object.keys(es.frostNight).sort()).toEqual(Object.keys(en.frostNight).sort());
    expect(es.cautions).toHaveLength(en.cautions.length);
  });

  it('says the frost watch in Spanish, as one sentence per thought', () => {
    // The last spring frost of the demo season; the watch runs two weeks past it (durations.ts).
    const w = frostWarning({
      method: 'winter-sowing',
      lastFrost: '2027-05-10',
      today: '2027-05-12',
      seedlingsUp: true,
      locale: 'es',
    });
    expect(w).toBe(
      'Vigilancia de heladas hasta el 2027-05-24: todavía puede caer una helada tardía. Las noches despejadas y sin viento en que se anuncie helada, cierra las tapas de los recipientes antes de que anochezca. Revisa el pronóstico de tu zona.',
    );
  });

  it('gives a batch its step titles and treatments in Spanish, on the same dates', () => {
    const input = {
      species: F.wildBergamot,
      method: 'indoor-lights' as const,
      lastFrost: '2027-05-10',
      plantShareDate: '2027-06-12',
      today: '2026-12-01',
    };
    const english = batchSchedule(input);
    const spanish = batchSchedule({ ...input, locale: 'es' });
    expect(spanish.steps.map((s) => s.date)).toEqual(english.steps.map((s) => s.date));
    expect(spanish.steps.find((s) => s.kind === 'sow')?.title).toBe('Siembra');
    expect(english.steps.find((s) => s.kind === 'sow')?.title).toBe('Sow');
    for (const t of spanish.treatments) expect(t.how).not.toBe(english.treatments.find((e) => e.kind === t.kind)?.how);
  });
});
