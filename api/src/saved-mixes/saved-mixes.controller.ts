import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { type SavedMix, saveMixRequestSchema } from '@homeground/shared';
import type { z } from 'zod';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { SavedMixesService } from './saved-mixes.service.js';

type Parsed<S extends z.ZodType> = z.infer<S>;

@ApiTags('mixes')
@Controller()
export class SavedMixesController {
  constructor(private readonly saved: SavedMixesService) {}

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
