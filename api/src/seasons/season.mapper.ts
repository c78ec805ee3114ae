import { type Season, type Group } from '@homeground/shared';
import type { SeasonTargetRow } from './season-target.entity.js';
import type { SeasonRow } from './season.entity.js';

/** Names to show for a slug; an unknown slug (renamed in the catalogue) shows itself. */
export type SpeciesNames = (slug: string) => { commonName: string; scientificName: string } | undefined;

/** A season with its group's place and its targets in the organiser's order, as the API returns it. */
export function toSeason(
  group: Group,
  season: SeasonRow,
  targets: readonly SeasonTargetRow[],
  names: SpeciesNames,
): Season {
  return {
    groupSlug: group.slug,
    groupName: group.name,
    place: { town: group.town, state: group.state, ecoregionCode: group.ecoregionCode },
    year: season.year,
    lastFrost: season.lastFrost,
    plantShareDate: season.plantShareDate,
    methods: season.methods,
    milkweedShare: season.milkweedShare,
    lossFactor: season.lossFactor,
    seedsPerPacket: season.seedsPerPacket,
    targets: [...targets]
      .sort((a, b) => a.position - b.position)
      .map((t) => ({
        slug: t.slug,
        targetPlants: t.targetPlants,
        ...(t.germinationRatePct === null ? {} : { germinationRatePct: t.germinationRatePct }),
        commonName: names(t.slug)?.commonName ?? t.slug,
        scientificName: names(t.slug)?.scientificName ?? '',
      })),
    updatedAt: season.updatedAt.toISOString(),
  };
}
