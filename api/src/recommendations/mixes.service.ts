import { Injectable } from '@nestjs/common';
import {
  type AlternativesResponse,
  alternativesFor,
  balancePalette,
  DEFAULT_LOSS_FACTOR,
  type MixResponse,
  mixPlanting,
  type PaletteOptions,
  recommend,
  RECOMMENDATION_LIST_LIMITS,
  type RecommendationsResponse,
  type RegionContext,
  type Site,
  type WordLocale,
} from '@homeground/shared';
import { AnswerCache } from './answer-cache.js';
import { MixContextService } from '../mix-context/mix-context.service.js';

/** Recommendations, balanced mixes and swap suggestions: the shared engine over the live catalogue. */
@Injectable()
export class MixesService {
  private readonly mixes = new AnswerCache<MixResponse>();

  constructor(private readonly ctx: MixContextService) {}

  recommend(site: Site, regionIn: RegionContext, locale: WordLocale = 'en'): RecommendationsResponse {
    const region = this.ctx.region(regionIn, locale);
    const r = recommend(this.ctx.species(), site, region, {}, RECOMMENDATION_LIST_LIMITS);
    const withSpecies = <T extends { slug: string }>(list: T[]) =>
      list.map((x) => ({ ...x, species: this.ctx.summary(x.slug) }));
    return {
      site,
      ranked: withSpecies(r.ranked),
      alsoConsider: withSpecies(r.alsoConsider),
      coverage: r.coverage,
    };
  }

  /** The rules' details and notices come back in `locale`; the reasons are translated by the controller. */
  balance(site: Site, regionIn: RegionContext, options: PaletteOptions, locale: WordLocale = 'en'): MixResponse {
    const key = JSON.stringify([this.ctx.version, site, regionIn, options, locale]);
    return this.mixes.getOrCompute(key, () => this.computeBalance(site, regionIn, options, locale));
  }

  private computeBalance(
    site: Site,
    regionIn: RegionContext,
    options: PaletteOptions,
    locale: WordLocale,
  ): MixResponse {
    const region = this.ctx.region(regionIn, locale);
    const palette = balancePalette({ species: this.ctx.species(), site, region, options, locale });
    const chosen = palette.chosen.map((c) => this.ctx.get(c.slug)!);
    return {
      site,
      palette,
      species: this.ctx.summaries(palette.chosen.map((c) => c.slug)),
      ...mixPlanting(chosen, site.areaSqFt),
      lossFactor: DEFAULT_LOSS_FACTOR,
    };
  }

  alternatives(
    site: Site,
    regionIn: RegionContext,
    options: PaletteOptions,
    chosen: string[],
    slot: string,
    acrossForms = false,
    locale: WordLocale = 'en',
  ): AlternativesResponse {
    this.ctx.assertKnown(
      [...chosen.map((slug, i) => ({ field: `chosen.${i}`, slug })), { field: 'slot', slug: slot }],
      locale,
    );
    const region = this.ctx.region(regionIn, locale);
    const list = alternativesFor({ species: this.ctx.species(), site, region, options }, chosen, slot, 5, {
      acrossForms,
    });
    return { alternatives: list.map((a) => ({ ...a, species: this.ctx.summary(a.slug) })) };
  }
}
