import type { Species, SpeciesSummary } from '@homeground/shared';

export function toSpeciesSummary(s: Species, hasPhoto: boolean): SpeciesSummary {
  return {
    slug: s.slug,
    scientificName: s.scientificName,
    commonName: s.commonNames[0],
    family: s.family,
    growthForm: s.growthForm,
    heightCm: s.heightCm,
    bloomMonths: s.bloomMonths,
    flowerColours: s.flowerColours,
    sun: s.sun,
    moisture: s.moisture,
    monarchHost: s.wildlife.monarchHost,
    lepidopteraGenusCount: s.wildlife.lepidopteraGenusCount,
    cautionKinds: [...new Set(s.cautions.map((c) => c.kind))],
    hasPhoto,
  };
}
