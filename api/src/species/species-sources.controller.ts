import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { type Source, sourceSchema } from '@homeground/shared';
import { z } from 'zod';
import { Public } from '../common/decorators/public.decorator.js';
import { ZodResponse } from '../common/decorators/zod.decorators.js';
import { SpeciesSourcesService } from './species-sources.service.js';

/** The sources registry every sourced fact names a key of; public, as the citations are on every species page. */
@ApiTags('species')
@Controller('species-sources')
export class SpeciesSourcesController {
  constructor(private readonly sources: SpeciesSourcesService) {}

  @Public()
  @Get()
  @ZodResponse(z.array(sourceSchema))
  list(): Source[] {
    return this.sources.list();
  }
}
