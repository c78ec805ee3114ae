import { describe, expect, it } from 'vitest';
import { DEFAULT_LOSS_FACTOR } from '../quantities/seed-count.js';
import { GRAMS_PER_POUND } from '../units/conversions.js';
import { seasonSpecies as sp } from './season-fixtures.js';
import { seedList, SEED_LIST_CAUTIONS } from './seed-list.js';
import { seedListToCsv } from './seed-list-csv.js';

/** Seeds per pound from seeds per kilogram (1 lb = 0.45359237 kg, exact), rounded to a whole seed as records hold it. */
const perPoundFromPerKg = (perKg: number) => Math.round(perKg * (GRAMS_PER_POUND / 1000));

describe('seed arithmetic vs CHECK-VALUES.md', () => {
  // §1, NPN-ECPA (R): Echinacea pallida, 400,000 seeds/kg; seed-lot germination 50–81 %.
  it.each([
    // [lot germination %, plants, seeds to sow, grams]  seeds = ceil(plants ÷ (germ × (1 − 0.2))); grams = seeds ÷ 400 per g
    [50, 100, 250, 0.625],
    [81, 100, 155, 0.3875],
  ])(
    'pale purple coneflower, %d %% germination, %d plants → %d seeds weighing %d g (NPN-ECPA §1, R; loss 0.2 common practice)',
    (germ, plants, seeds, grams) => {
      const echinacea = sp({
        slug: 'echinacea-pallida',
        scientificName: 'Echinacea pallida',
        germination: { seedsPerPound: perPoundFromPerKg(400_000), germinationRatePct: germ },
      });
      const row = seedList([{ species: echinacea, targetPlants: plants }], { state: 'WI' }).rows[0];
      expect(row.lossFactor).toBe(DEFAULT_LOSS_FACTOR);
      expect(row.seedsToSow).toBe(seeds);
      // The row shows grams to 0.01 g.
      expect(Math.abs(row.grams! - grams)).toBeLessThanOrEqual(0.005 + 1e-9);
      expect(row.germinationFrom).toBe('record');
    },
  );

  // §3, BWSR (R): seeds/ft² = lb PLS/acre × seeds/lb ÷ 43,560. The same seeds per pound that turn
  // 2.3 lb/acre into 12.67 seeds/ft² (little bluestem, ≈240,000/lb) must weigh those seeds back.
  it.each([
    ['little bluestem', 240_000, 2.3, 12.67],
    ['whorled milkweed', 174_000, 0.05, 0.2],
  ])("%s: one acre's seed at %d seeds/lb weighs %d lb (BWSR §3, R)", (_name, perPound, lbPerAcre, seedsPerSqFt) => {
    const seedsPerAcre = seedsPerSqFt * 43_560;
    const s = sp({
      slug: 'bwsr-row',
      scientificName: 'Schizachyrium testum',
      germination: { seedsPerPound: perPound, germinationRatePct: 100 },
    });
    // 100 % germination and no loss: seeds to sow = plants, so the row weighs exactly those seeds.
    const row = seedList([{ species: s, targetPlants: Math.round(seedsPerAcre) }], { state: 'WI', lossFactor: 0 })
      .rows[0];
    expect(row.grams! / GRAMS_PER_POUND).toBeCloseTo(lbPerAcre, 2);
    expect(row.ounces).toBeCloseTo(lbPerAcre * 16, 1);
  });

  // §1, KG07 (R): for many mid-continent Carex, ≤ 1 month of chilling gave 80 % germination. An
  // organiser who tested their lot types 80 over the record's figure.
  it("uses the organiser's own germination rate when given (Carex, KG07 §1, R: 80 %)", () => {
    const sedge = sp({
      slug: 'carex-vulpinoidea',
      scientificName: 'Carex vulpinoidea',
      germination: { germinationRatePct: 50, seedsPerPound: 1_000_000 },
    });
    const rows = seedList([{ species: sedge, targetPlants: 40, germinationRatePct: 80 }], {
      state: 'WI',
      lossFactor: 0.25,
    }).rows;
    expect(rows[0]).toMatchObject({
      germinationRatePct: 80,
      germinationFrom: 'yours',
      lossFactor: 0.25,
      seedsToSow: 67,
    }); // 40 ÷ (0.8 × 0.75) = 66.7
  });
});

describe('packets, collecting and cautions', () => {
  it.each([
    // [seeds per pound, plants, seeds per packet, packets, buy by]
    [70_000, 30, 100, 1, 'packets'], // 30 ÷ 0.48 = 62.5 → 63 seeds
    [70_000, 400, 100, 9, 'weight'], // 834 seeds → 9 packets: buy by weight
    [null, 400, 100, 9, 'packets'], // no seeds-per-pound figure: packets only
  ])('%s seeds/lb, %d plants, %d per packet → %d packets, by %s', (perPound, plants, perPacket, packets, buyBy) => {
    const s = sp({
      slug: 'asclepias-tuberosa',
      scientificName: 'Asclepias tuberosa',
      germination: { seedsPerPound: perPound, germinationRatePct: 60 },
    });
    const row = seedList([{ species: s, targetPlants: plants }], { state: 'WI', seedsPerPacket: perPacket }).rows[0];
    expect(row.packets).toBe(packets);
    expect(row.buyBy).toBe(buyBy);
    if (perPound === null) expect(row.grams).toBeNull();
  });

  it.each([
    ['none-known', [], true, /seldom sold/],
    ['contract-only', [], true, /grown to order/],
    ['routine', [], false, null],
    ['none-known', ['WI'], false, /Never collect it from the wild: it is protected in Wisconsin/],
  ] as const)('supply %s, protected in %j → collect locally %s', (supply, protectedIn, collect, note) => {
    const s = sp({
      slug: 'x-species',
      scientificName: 'Zizia testa',
      commercialAvailability: supply,
      protectedIn: [...protectedIn],
    });
    const row = seedList([{ species: s, targetPlants: 10 }], { state: 'WI' }).rows[0];
    expect(row.collectLocally).toBe(collect);
    expect(row.neverCollectWild).toBe(protectedIn.length > 0);
    if (note) expect(row.collectNotes.join(' ')).toMatch(note);
    else expect(row.collectNotes).toEqual([]);
  });

  it("carries the usual wild-collection cautions and the species' own", () => {
    const s = sp({
      slug: 'asclepias-tuberosa',
      scientificName: 'Asclepias tuberosa',
      cautions: [
        {
          kind: 'sap-irritant',
          text: 'Milky sap can injure the eye hours after contact.',
          source: 'uf-milkweed-toxicity-2019',
        },
      ],
    });
    const list = seedList([{ species: s, targetPlants: 10 }], { state: 'WI' });
    expect(list.cautions.join(' ')).toMatch(/landowner's permission/);
    expect(list.cautions.join(' ')).toMatch(/small share of any one population/);
    expect(list.cautions.join(' ')).toMatch(/protected species/);
    expect(list.rows[0].cautions).toEqual([
      { kind: 'sap-irritant', title: 'Irritating sap', text: 'Milky sap can injure the eye hours after contact.' },
    ]);
  });

  // The same cautions in Spanish (Homeground's own wording, from memory): as many, each whole.
  it('says the cautions and the collecting note in Spanish when asked', () => {
    const s = sp({
      slug: 'x-species',
      scientificName: 'Zizia testa',
      commercialAvailability: 'none-known',
      protectedIn: ['WI'],
    });
    const en = seedList([{ species: s, targetPlants: 10 }], { state: 'WI' });
    const es = seedList([{ species: s, targetPlants: 10 }], { state: 'WI', locale: 'es' });
    expect(es.cautions).toHaveLength(SEED_LIST_CAUTIONS.length);
    expect(es.cautions[0]).toBe(
      'Recolecta semilla silvestre solo con permiso de quien es dueño del terreno, y respeta las normas de parques y reservas: muchas lo prohíben.',
    );
    expect(es.rows[0].collectNotes).toEqual([
      'Nunca la recolectes en el campo: está protegida en Wisconsin. Compra la semilla en un vivero que la propague.',
    ]);
    expect(es.rows[0].seedsToSow).toBe(en.rows[0].seedsToSow);
  });
});

describe('seedListToCsv', () => {
  it('writes one row per species, then every caution, RFC 4180 quoted', () => {
    const s = sp({
      slug: 'asclepias-tuberosa',
      scientificName: 'Asclepias tuberosa',
      commonNames: ['butterfly milkweed'],
      germination: { seedsPerPound: 70_000, germinationRatePct: 60 },
      cautions: [{ kind: 'sap-irritant', text: 'Milky sap, "hours later", hurts eyes.', source: 'x' }],
    });
    const lines = seedListToCsv(seedList([{ species: s, targetPlants: 10 }], { state: 'WI' })).split('\r\n');
    expect(lines[0]).toBe(
      'species,scientificName,targetPlants,germinationPct,germinationFrom,lossPct,seedsToSow,seedsPerPound,grams,ounces,packets,buyBy,collectLocally,notes',
    );
    expect(lines[1]).toBe('butterfly milkweed,Asclepias tuberosa,10,60,record,20,21,70000,0.14,0.005,1,packets,no,'); // 21 seeds ÷ 70,000/lb × 453.59 g
    expect(lines).toHaveLength(2 + SEED_LIST_CAUTIONS.length + 1);
    expect(lines.at(-1)).toBe(
      'butterfly milkweed,Asclepias tuberosa,,,,,,,,,,,,"Irritating sap: Milky sap, ""hours later"", hurts eyes."',
    );
  });

  it('words the header, yes/no and caution rows in Spanish for es, with the same rows, numbers and codes', () => {
    const s = sp({
      slug: 'asclepias-tuberosa',
      scientificName: 'Asclepias tuberosa',
      commonNames: ['butterfly milkweed'],
      germination: { seedsPerPound: 70_000, germinationRatePct: 60 },
      cautions: [{ kind: 'sap-irritant', text: 'Milky sap hurts eyes.', source: 'x' }],
    });
    const targets = [{ species: s, targetPlants: 10 }];
    const en = seedListToCsv(seedList(targets, { state: 'WI' })).split('\r\n');
    const es = seedListToCsv(seedList(targets, { state: 'WI', locale: 'es' }), 'es').split('\r\n');
    expect(es[0]).toBe(
      'especie,nombre científico,meta de plantas,germinación %,germinación según,pérdida %,semillas a sembrar,semillas por libra,gramos,onzas,sobres,comprar por,recoger localmente,notas',
    );
    expect(es).toHaveLength(en.length);
    // The numbers and the germination code are the same; only yes/no is worded.
    expect(es[1]).toBe('butterfly milkweed,Asclepias tuberosa,10,60,record,20,21,70000,0.14,0.005,1,packets,no,');
    expect(es.slice(2, 2 + SEED_LIST_CAUTIONS.length).every((l) => l.startsWith('Ten en cuenta,'))).toBe(true);
    expect(es.join('\n')).not.toContain('Please note');
  });
});
