import { FORECAST_METHOD, sumForecasts, type Batch, type SeasonProgress } from '@homeground/shared';
import type { SeasonContext } from '../seasons/seasons.service.js';

type Counts = Pick<SeasonProgress['species'][number], 'sown' | 'germinated' | 'pottedUp' | 'lost' | 'ready'>;

const countsOf = (batches: readonly Batch[]): Counts => ({
  sown: batches.reduce((a, b) => a + b.totals.sown, 0),
  germinated: batches.reduce((a, b) => a + b.totals.germinated, 0),
  pottedUp: batches.reduce((a, b) => a + b.totals.pottedUp, 0),
  lost: batches.reduce((a, b) => a + b.totals.lost, 0),
  ready: batches.reduce((a, b) => a + b.totals.ready, 0),
});

/**
 * The organiser's dashboard: per species, the target against what the batches plan, have sown, got
 * up and have ready, with the ready forecast at the plant share (the batches' forecasts summed);
 * per grower, their counts and how many batches are behind.
 */
export function seasonProgress(
  c: SeasonContext,
  batches: readonly Batch[],
  names: (slug: string) => { commonName: string; scientificName: string },
  today: string,
  nudge: (slug: string, row: { shortBy: number; expected: number; targetPlants: number }) => string | null,
): SeasonProgress {
  const slugs = [...new Set([...c.targets.map((t) => t.slug), ...batches.map((b) => b.slug)])];
  const species = slugs.map((slug) => {
    const own = batches.filter((b) => b.slug === slug);
    const targetPlants = c.targets.find((t) => t.slug === slug)?.targetPlants ?? 0;
    const forecast = sumForecasts(own.map((b) => b.forecast));
    const shortBy = Math.max(0, targetPlants - forecast.expected);
    return {
      slug,
      ...names(slug),
      targetPlants,
      plannedPlants: own.reduce((a, b) => a + b.plants, 0),
      ...countsOf(own),
      forecast,
      shortBy,
      nudge: nudge(slug, { shortBy, expected: forecast.expected, targetPlants }),
    };
  });
  const growerIds = [...new Set(batches.map((b) => b.growerId))];
  const growers = growerIds.map((growerId) => {
    const own = batches.filter((b) => b.growerId === growerId);
    return {
      growerId,
      growerName: own[0].growerName,
      batches: own.length,
      behind: own.filter((b) => b.behind !== null).length,
      ...countsOf(own),
    };
  });
  return {
    groupSlug: c.group.slug,
    year: c.season.year,
    plantShareDate: c.season.plantShareDate,
    today,
    species,
    growers,
    method: [...FORECAST_METHOD],
  };
}
