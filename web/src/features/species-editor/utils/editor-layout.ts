import type { SourcedField, SpeciesFormTextColumn } from '@homeground/shared';

/** One input of the editor, and the sourced fact whose source is chosen beside it. */
export interface EditorField {
  field: SpeciesFormTextColumn;
  source?: SourcedField;
}

export type EditorSectionId = 'names' | 'size' | 'bloom' | 'site' | 'range' | 'wildlife' | 'seed' | 'notes';

/**
 * The editor's sections in the order a curator fills a record from a reference: names first, then
 * the plant, where it grows, what it feeds and how to raise it. Each sourced fact appears once, so
 * every entry of the record's `sources` has exactly one picker.
 */
export const SECTIONS: { id: EditorSectionId; fields: EditorField[] }[] = [
  {
    id: 'names',
    fields: [
      { field: 'scientificName' },
      { field: 'slug' },
      { field: 'usdaSymbol', source: 'usdaSymbol' },
      { field: 'family', source: 'family' },
      { field: 'commonNames' },
      { field: 'synonyms' },
    ],
  },
  {
    id: 'size',
    fields: [
      { field: 'growthForm', source: 'growthForm' },
      { field: 'lifespan', source: 'lifespan' },
      { field: 'heightMinCm' },
      { field: 'heightMaxCm', source: 'heightCm' },
      { field: 'spreadMinCm' },
      { field: 'spreadMaxCm' },
    ],
  },
  {
    id: 'bloom',
    fields: [
      { field: 'bloomMonths', source: 'bloomMonths' },
      { field: 'flowerColours', source: 'flowerColours' },
    ],
  },
  {
    id: 'site',
    fields: [
      { field: 'sun', source: 'sun' },
      { field: 'sunOptimum', source: 'sunOptimum' },
      { field: 'moisture', source: 'moisture' },
      { field: 'moistureOptimum', source: 'moistureOptimum' },
      { field: 'wetlandIndicator', source: 'wetlandIndicator' },
      { field: 'needsAcidSoil' },
      { field: 'soilTextures', source: 'soilTextures' },
      { field: 'habitats', source: 'habitats' },
    ],
  },
  {
    id: 'range',
    fields: [
      { field: 'nativeStates', source: 'nativeStates' },
      { field: 'ecoregions', source: 'ecoregions' },
      { field: 'protectedIn', source: 'protectedIn' },
      { field: 'commercialAvailability', source: 'commercialAvailability' },
    ],
  },
  {
    id: 'wildlife',
    fields: [
      { field: 'lepidopteraGenusCount', source: 'wildlife.lepidopteraGenusCount' },
      { field: 'monarchHost', source: 'wildlife.monarchHost' },
      { field: 'specialistBees' },
      { field: 'pollinators' },
      { field: 'birds' },
      { field: 'spreadHabit', source: 'spreadHabit' },
      { field: 'selfSows' },
      { field: 'deerResistance', source: 'deerResistance' },
    ],
  },
  {
    id: 'seed',
    fields: [
      { field: 'treatments', source: 'germination.treatments' },
      { field: 'needsLight' },
      { field: 'sowingDepthMm' },
      { field: 'seedsPerPound', source: 'germination.seedsPerPound' },
      { field: 'germinationRatePct', source: 'germination.germinationRatePct' },
      { field: 'methods' },
    ],
  },
  { id: 'notes', fields: [{ field: 'tags' }, { field: 'cautions' }, { field: 'reconciliations' }] },
];
