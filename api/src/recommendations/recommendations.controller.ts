import { Controller, HttpCode, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  alternativesIn,
  alternativesRequestSchema,
  type AlternativesResponse,
  alternativesResponseSchema,
  mixIn,
  type MixResponse,
  mixResponseSchema,
  paletteRequestSchema,
  type RecommendationsResponse,
  recommendationsResponseSchema,
  recommendationsIn,
  recommendRequestSchema,
  type WordLocale,
} from '@homeground/shared';
import type { z } from 'zod';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import { ZodBody, ZodResponse } from '../common/decorators/zod.decorators.js';
import { MixesService } from './mixes.service.js';
import { Public } from '../common/decorators/public.decorator.js';

type Parsed<S extends z.ZodType> = z.infer<S>;

@ApiTags('mixes')
@Public()
@Controller()
export class RecommendationsController {
  constructor(private readonly mixes: MixesService) {}

  /** Every species native to the state scored for the site, with "why it fits"; near misses as also-consider. */
  @Post('recommendations')
  @ZodResponse(recommendationsResponseSchema)
  @HttpCode(200)
  @AnswersInLanguage()
  recommend(
    @ZodBody(recommendRequestSchema) body: Parsed<typeof recommendRequestSchema>,
    @RequestLocale() locale: WordLocale,
  ): RecommendationsResponse {
    return recommendationsIn(this.mixes.recommend(body.site, body.region, locale), locale);
  }

  /** A balanced mix for the site, honouring locks and exclusions, with quantities and the design rules met or not. */
  @Post('mixes/balance')
  @ZodResponse(mixResponseSchema)
  @HttpCode(200)
  @AnswersInLanguage()
  balance(
    @ZodBody(paletteRequestSchema) body: Parsed<typeof paletteRequestSchema>,
    @RequestLocale() locale: WordLocale,
  ): MixResponse {
    return mixIn(this.mixes.balance(body.site, body.region, body.options, locale), locale);
  }

  /** The best replacements for one species of a mix, with how much each would change the mix's objective. */
  @Post('mixes/alternatives')
  @ZodResponse(alternativesResponseSchema)
  @HttpCode(200)
  @AnswersInLanguage()
  alternatives(
    @ZodBody(alternativesRequestSchema) body: Parsed<typeof alternativesRequestSchema>,
    @RequestLocale() locale: WordLocale,
  ): AlternativesResponse {
    return alternativesIn(
      this.mixes.alternatives(body.site, body.region, body.options, body.chosen, body.slot, body.acrossForms, locale),
      locale,
    );
  }
}
