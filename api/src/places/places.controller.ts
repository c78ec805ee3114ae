import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { type PlaceLookup, placeLookupSchema, type PlaceQuery, placeQuerySchema } from '@homeground/shared';
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
  lookup(@ZodQuery(placeQuerySchema) q: PlaceQuery): PlaceLookup {
    return this.places.lookup(q);
  }
}
