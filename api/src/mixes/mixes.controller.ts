import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  alternativesRequestSchema, type AlternativesResponse, type MixResponse, paletteRequestSchema,
  type RecommendationsResponse, recommendRequestSchema, type SavedMix, saveMixRequestSchema,
} from '@homeground/shared';
import type { z } from 'zod';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { MixesService } from './mixes.service.js';
import { SavedMixesService } from './saved-mixes.service.js';

type Parsed<S extends z.ZodType> = z.infer<S>;

@ApiTags('mixes')
@Controller()
export class MixesController {
  constructor(
    private readonly mixes: MixesService,
    private readonly saved: SavedMixesService,
  ) {}

  /** Every species native to the state scored for the site, with "why it fits"; near misses as also-consider. */
  @Post('recommendations')
  @HttpCode(200)
  recommend(@Body(new ZodValidationPipe(recommendRequestSchema)) body: Parsed<typeof recommendRequestSchema>): RecommendationsResponse {
    return this.mixes.recommend(body.site, body.region);
  }

  /** A balanced mix for the site, honouring locks and exclusions, with quantities and the design rules met or not. */
  @Post('mixes/balance')
  @HttpCode(200)
  balance(@Body(new ZodValidationPipe(paletteRequestSchema)) body: Parsed<typeof paletteRequestSchema>): MixResponse {
    return this.mixes.balance(body.site, body.region, body.options);
  }

  /** The best replacements for one species of a mix, with how much each would change the mix's objective. */
  @Post('mixes/alternatives')
  @HttpCode(200)
  alternatives(@Body(new ZodValidationPipe(alternativesRequestSchema)) body: Parsed<typeof alternativesRequestSchema>): AlternativesResponse {
    return this.mixes.alternatives(body.site, body.region, body.options, body.chosen, body.slot);
  }

  @Post('mixes')
  @Auth()
  save(@Body(new ZodValidationPipe(saveMixRequestSchema)) body: Parsed<typeof saveMixRequestSchema>, @CurrentUser() user: AuthenticatedUser): Promise<SavedMix> {
    return this.saved.save(user, { ...body, request: body.request as unknown as SavedMix['request'] });
  }

  @Get('mixes')
  @Auth()
  mine(@CurrentUser() user: AuthenticatedUser): Promise<SavedMix[]> {
    return this.saved.mine(user);
  }

  /** A saved mix, for anyone who has its link. */
  @Get('mixes/:id')
  get(@Param('id', new ParseUUIDPipe({ version: '4' })) id: string): Promise<SavedMix> {
    return this.saved.get(id);
  }

  @Delete('mixes/:id')
  @HttpCode(204)
  @Auth()
  remove(@Param('id', new ParseUUIDPipe({ version: '4' })) id: string, @CurrentUser() user: AuthenticatedUser): Promise<void> {
    return this.saved.remove(user, id);
  }
}

