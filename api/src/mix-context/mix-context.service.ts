import { Injectable } from '@nestjs/common';
import { badRequest } from '../common/validation/bad-request.js';
import type { RegionContext, Species, SpeciesSummary, WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { EcoregionsService } from '../ecoregions/ecoregions.service.js';
import { SpeciesStore } from '../species/species-store.service.js';
import { toSpeciesSummary } from '../species/species-summary.mapper.js';

/** What every mix computation needs from the catalogue: the species, and the region's plant communities. */
@Injectable()
export class MixContextService {
  constructor(
    private readonly store: SpeciesStore,
    private readonly ecoregions: EcoregionsService,
  ) {}

  /** The catalogue version, for caches of computed answers. */
  get version(): number {
    return this.store.version;
  }

  species(): readonly Species[] {
    return this.store.all();
  }

  get(slug: string): Species | undefined {
    return this.store.get(slug);
  }

  summary(slug: string): SpeciesSummary {
    return toSpeciesSummary(this.store.get(slug)!, this.store.hasPhoto(slug));
  }

  summaries(slugs: Iterable<string>): Record<string, SpeciesSummary> {
    return Object.fromEntries([...new Set(slugs)].map((slug) => [slug, this.summary(slug)]));
  }

  /** Fills the ecoregion's plant communities (clients send only the code) and checks the code exists. */
  region(region: RegionContext, locale: WordLocale = 'en'): RegionContext {
    if (!region.ecoregionCode || region.ecoregionPlantCommunities) return region;
    const e = this.ecoregions.list().find((x) => x.code === region.ecoregionCode);
    if (!e) {
      const say = apiWords(locale);
      throw badRequest(
        [{ field: 'region.ecoregionCode', message: say('refusals.catalogue.ecoregionField') }],
        say('refusals.catalogue.ecoregion'),
      );
    }
    return { ...region, ecoregionPlantCommunities: e.plantCommunities };
  }

  /** Slugs that are not in the catalogue, as 400 fields. */
  assertKnown(slugs: { field: string; slug: string }[], locale: WordLocale = 'en'): void {
    const unknown = slugs.filter((s) => !this.store.get(s.slug));
    if (unknown.length) {
      const say = apiWords(locale);
      throw badRequest(
        unknown.map((u) => ({ field: u.field, message: say('refusals.catalogue.slugField', { slug: u.slug }) })),
        say('refusals.catalogue.slugs', { slugs: unknown.map((u) => u.slug).join(', ') }),
      );
    }
  }
}
