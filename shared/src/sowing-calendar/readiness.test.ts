import { describe, expect, it } from 'vitest';
import { F, makeSpecies } from '../scoring/__tests__/species-fixtures.js';
import { readinessOf } from './readiness.js';

const sp = (
  scientificName: string,
  extra: Parameters<typeof makeSpecies>[0] extends infer O ? Partial<O> : never = {},
) => makeSpecies({ slug: scientificName.toLowerCase().replace(/ /g, '-'), scientificName, ...extra });

// Rule table: growth form → lifespan → genus → species; each entry names its source key.
describe('readinessOf: weeks from sprouting to a plant fit to give', () => {
  it.each([
    // [species, indoor weeks, outdoor weeks, second season, warm soil, double dormancy, source]
    ['a perennial forb (wild bergamot)', F.wildBergamot, 7, 6, false, false, false, 'from-memory'],
    ['a warm-season grass (little bluestem)', F.littleBluestem, 8, 7, false, true, false, 'from-memory'],
    [
      'a slow grass, "slow to establish" (prairie dropseed, CHECK-VALUES §1 M)',
      F.prairieDropseed,
      12,
      11,
      false,
      true,
      false,
      'from-memory',
    ],
    [
      'a cool-season sedge (Pennsylvania sedge): no warm-soil wait',
      F.pennSedge,
      8,
      7,
      false,
      false,
      false,
      'from-memory',
    ],
    ['lupine: fastest at 24–29 °C (JEH96 R)', F.wildLupine, 7, 6, false, true, false, 'jeh-1996-lupinus'],
    [
      'pale purple coneflower: ~2 years to a finished plug (NPN-ECPA R)',
      sp('Echinacea pallida'),
      9,
      8,
      true,
      false,
      false,
      'npn-echinacea-pallida',
    ],
    ['a compass plant (taproot first year, M)', sp('Silphium laciniatum'), 7, 6, true, false, false, 'from-memory'],
    ['a trillium (double dormancy, M)', sp('Trillium grandiflorum'), 7, 6, true, false, true, 'from-memory'],
    [
      'a shrub from seed (M)',
      sp('Viburnum dentatum', { growthForm: 'shrub' }),
      7,
      6,
      true,
      false,
      false,
      'from-memory',
    ],
    [
      'an annual (partridge pea, M)',
      sp('Chamaecrista fasciculata', { lifespan: 'annual' }),
      5,
      5,
      false,
      false,
      false,
      'from-memory',
    ],
  ] as const)('%s', (_label, species, indoor, outdoor, second, warmSoil, dd, source) => {
    expect(readinessOf(species)).toMatchObject({
      indoorWeeks: indoor,
      outdoorWeeks: outdoor,
      secondSeason: second,
      needsWarmSoil: warmSoil,
      doubleDormancy: dd,
      source,
    });
  });

  it('coneflowers stratify in light (ROM05 R); others do not ask for it', () => {
    expect(readinessOf(F.yellowConeflower).stratifyInLight).toBe(true);
    expect(readinessOf(F.showyGoldenrod).stratifyInLight).toBe(false);
  });

  it('every rule gives a reason in words', () => {
    for (const s of Object.values(F)) expect(readinessOf(s).why.length).toBeGreaterThan(20);
  });
});
