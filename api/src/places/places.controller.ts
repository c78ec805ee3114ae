import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  type PlaceLookup,
  placeLookupSchema,
  type PlaceQuery,
  placeQuerySchema,
  type WordLocale,
} from '@homeground/shared';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import { ZodQuery, ZodResponse } from '../common/decorators/zod.decorators.js';
import { PlacesService } from './places.service.js';
import { Public } from '../common/decorators/public.decorator.js';

@ApiTags('places')
@Public()
@Controller('places')
export class PlacesController {
  constructor(private readonly places: PlacesService) {}

  /** Your ground: state, county and EPA Level III ecoregion for a ZIP or a point. */
  @Get('lookup')
  @ZodResponse(placeLookupSchema)
  @AnswersInLanguage()
  lookup(@ZodQuery(placeQuerySchema) q: PlaceQuery, @RequestLocale() locale: WordLocale): PlaceLookup {
    return this.places.lookup(q, locale);
  }
}
