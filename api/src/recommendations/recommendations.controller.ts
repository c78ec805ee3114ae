import { Controller, HttpCode, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  alternativesRequestSchema,
  type AlternativesResponse,
  alternativesResponseSchema,
  type MixResponse,
  mixResponseSchema,
  paletteRequestSchema,
  type RecommendationsResponse,
  recommendationsResponseSchema,
  recommendRequestSchema,
} from '@homeground/shared';
import type { z } from 'zod';
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
  recommend(@ZodBody(recommendRequestSchema) body: Parsed<typeof recommendRequestSchema>): RecommendationsResponse {
    return this.mixes.recommend(body.site, body.region);
  }

  /** A balanced mix for the site, honouring locks and exclusions, with quantities and the design rules met or not. */
  @Post('mixes/balance')
  @ZodResponse(mixResponseSchema)
  @HttpCode(200)
  balance(@ZodBody(paletteRequestSchema) body: Parsed<typeof paletteRequestSchema>): MixResponse {
    return this.mixes.balance(body.site, body.region, body.options);
  }

  /** The best replacements for one species of a mix, with how much each would change the mix's objective. */
  @Post('mixes/alternatives')
  @ZodResponse(alternativesResponseSchema)
  @HttpCode(200)
  alternatives(
    @ZodBody(alternativesRequestSchema) body: Parsed<typeof alternativesRequestSchema>,
  ): AlternativesResponse {
    return this.mixes.alternatives(body.site, body.region, body.options, body.chosen, body.slot, body.acrossForms);
  }
}
