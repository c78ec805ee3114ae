import { Controller, Delete, Get, HttpCode, Post } from '@nestjs/common';
import { ApiNoContentResponse, ApiTags } from '@nestjs/swagger';
import {
  type SavedMix,
  savedMixSchema,
  saveMixRequestSchema,
  uuidParamSchema,
  type WordLocale,
} from '@homeground/shared';
import { z } from 'zod';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodBody, ZodParam, ZodResponse } from '../common/decorators/zod.decorators.js';
import { SavedMixesService } from './saved-mixes.service.js';
import { Public } from '../common/decorators/public.decorator.js';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';

type Parsed<S extends z.ZodType> = z.infer<S>;

@ApiTags('mixes')
@AnswersInLanguage()
@Controller()
export class SavedMixesController {
  constructor(private readonly saved: SavedMixesService) {}

  @Post('mixes')
  @ZodResponse(savedMixSchema, 201)
  @Auth()
  save(
    @ZodBody(saveMixRequestSchema) body: Parsed<typeof saveMixRequestSchema>,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<SavedMix> {
    return this.saved.save(user, { ...body, request: body.request as unknown as SavedMix['request'] }, locale);
  }

  @Get('mixes')
  @ZodResponse(z.array(savedMixSchema))
  @Auth()
  mine(@CurrentUser() user: AuthenticatedUser): Promise<SavedMix[]> {
    return this.saved.mine(user);
  }

  /** A saved mix, for anyone who has its link. */
  @Public()
  @Get('mixes/:id')
  @ZodResponse(savedMixSchema)
  get(@ZodParam('id', uuidParamSchema) id: string, @RequestLocale() locale: WordLocale): Promise<SavedMix> {
    return this.saved.get(id, locale);
  }

  @Delete('mixes/:id')
  @ApiNoContentResponse({ description: 'Deleted' })
  @HttpCode(204)
  @Auth()
  remove(
    @ZodParam('id', uuidParamSchema) id: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<void> {
    return this.saved.remove(user, id, locale);
  }
}
