import type { SpeciesPage, SpeciesSummary } from '@homeground/shared';

// Rows as GET /api/species answers them, copied from the catalogue records
// species-data/species/asclepias-tuberosa.json and baptisia-tinctoria.json (the two species the
// demo API returns for "buterfly weed"). Tests check that the table shows these values.
export const butterflyMilkweed: SpeciesSummary = {
  slug: 'asclepias-tuberosa',
  scientificName: 'Asclepias tuberosa',
  commonName: 'butterfly milkweed',
  family: 'Apocynaceae',
  growthForm: 'forb',
  heightCm: { min: 30, max: 75 },
  bloomMonths: [6, 7, 8],
  flowerColours: ['orange'],
  sun: ['full', 'part'],
  moisture: ['dry', 'medium'],
  monarchHost: true,
  lepidopteraGenusCount: 12,
  cautionKinds: ['sap-irritant', 'toxic-if-eaten', 'look-alike', 'livestock'],
  hasPhoto: false,
};

export const yellowWildIndigo: SpeciesSummary = {
  slug: 'baptisia-tinctoria',
  scientificName: 'Baptisia tinctoria',
  commonName: 'yellow wild indigo',
  family: 'Fabaceae',
  growthForm: 'forb',
  heightCm: { min: 60, max: 90 },
  bloomMonths: [6, 7, 8],
  flowerColours: ['yellow'],
  sun: ['full', 'part'],
  moisture: ['dry'],
  monarchHost: false,
  lepidopteraGenusCount: 17,
  cautionKinds: ['toxic-if-eaten'],
  hasPhoto: false,
};

export function speciesPage(items: SpeciesSummary[], total = items.length, page = 1, pageSize = 50): SpeciesPage {
  return { items, total, page, pageSize };
}
