import { ziziaAurea } from '../testing/species-fixtures.js';
import { speciesSchema, type Species, type SpeciesInput } from '../types/species.js';

type Overrides = Partial<Omit<SpeciesInput, 'germination' | 'wildlife'>> & {
  slug: string;
  scientificName: string;
  germination?: Partial<SpeciesInput['germination']>;
  wildlife?: Partial<SpeciesInput['wildlife']>;
};

/**
 * A valid record for season-planning tests: golden alexanders' facts (from memory) with the
 * overrides given, native to WI and ecoregion 52 and raised by the three demo methods.
 */
export function seasonSpecies(o: Overrides): Species {
  const base = ziziaAurea as unknown as SpeciesInput;
  return speciesSchema.parse({
    ...base,
    commonNames: [o.slug.replace(/-/g, ' ')],
    ...o,
    germination: {
      ...base.germination,
      methods: ['winter-sowing', 'outdoor-pot-winter', 'indoor-lights'],
      ...o.germination,
    },
    wildlife: { ...base.wildlife, ...o.wildlife },
  });
}
