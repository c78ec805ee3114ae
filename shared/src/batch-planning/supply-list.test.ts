import { describe, expect, it } from 'vitest';
import { SUPPLY_RULES, SUPPLY_WORDS, supplyList } from './supply-list.js';

// Quantities are common practice (from memory, see SUPPLY_RULES); the block volume is geometry:
// a 2 in cube is 8 in³ × 16.387 cm³/in³ (the inch's definition, X) = 131 cm³ ≈ 0.13 L.
describe('supplyList', () => {
  it('counts pots, containers, mixes, labels and vermiculite for one grower of each method', () => {
    const list = supplyList([
      { method: 'winter-sowing', plants: 50, units: 5, fridge: false },
      { method: 'indoor-lights', plants: 72, units: 72, fridge: true },
      { method: 'soil-blocks', plants: 40, units: 40, fridge: false },
    ]);
    const by = Object.fromEntries(list.lines.map((l) => [l.item, l]));
    expect(by.pots.count).toBe(122); // potting up 50 winter-sown + 72 indoor seedlings
    expect(by.containers.count).toBe(5);
    expect(by['cell-trays'].count).toBe(1);
    // (122 × 0.5 + 5 × 1.5 + 72 × 0.05) × 1.1 = 79.31 → 80 L
    expect(by['potting-mix'].litres).toBe(80);
    expect(by['potting-mix'].quarts).toBe(Math.ceil(79.31 / 1.101221)); // US dry quart (definition, X)
    expect(by['soil-block-mix'].litres).toBe(Math.ceil(40 * 0.13 * 1.1));
    expect(SUPPLY_RULES.blockLitres).toBeCloseTo((8 * 16.387064) / 1000, 2);
    expect(by.labels.count).toBe(122 + 5 + 1 + 2);
    expect(by.vermiculite.litres).toBe(1);
    expect(by.bags.count).toBe(1);
    expect(list.cautions.join(' ')).toMatch(/dusty.*dust mask/);
  });

  it('leaves out what nobody needs', () => {
    const list = supplyList([{ method: 'outdoor-pot-winter', plants: 10, units: 10, fridge: false }]);
    expect(list.lines.map((l) => l.item)).toEqual(['pots', 'potting-mix', 'labels']);
  });

  it('says every line in Spanish too, with the same amounts', () => {
    const batches = [
      { method: 'winter-sowing' as const, plants: 50, units: 5, fridge: true },
      { method: 'soil-blocks' as const, plants: 40, units: 40, fridge: false },
    ];
    const en = supplyList(batches, 'en');
    const es = supplyList(batches, 'es');
    expect(es.lines.map((l) => [l.item, l.count, l.litres])).toEqual(en.lines.map((l) => [l.item, l.count, l.litres]));
    expect(es.lines.find((l) => l.item === 'containers')?.note).toBe('Para la siembra de invierno.');
    for (const item of Object.keys(SUPPLY_WORDS.en)) {
      expect(SUPPLY_WORDS.es[item as keyof typeof SUPPLY_WORDS.es].name).not.toBe(
        SUPPLY_WORDS.en[item as keyof typeof SUPPLY_WORDS.en].name,
      );
    }
  });
});
