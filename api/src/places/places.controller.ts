import { Controller, Get, Query } from '@nestjs/common';
import { ApiQuery, ApiTags } from '@nestjs/swagger';
import type { PlaceLookup } from '@homeground/shared';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { type PlaceQuery, placeQuerySchema } from './dto/place-query.js';
import { PlacesService } from './places.service.js';

@ApiTags('places')
@Controller('places')
export class PlacesController {
  constructor(private readonly places: PlacesService) {}

  /** Your ground: state, county and EPA Level III ecoregion for a ZIP or a point. */
  @Get('lookup')
  @ApiQuery({ name: 'zip', required: false, example: '54665' })
  @ApiQuery({ name: 'lat', required: false })
  @ApiQuery({ name: 'lon', required: false })
  lookup(@Query(new ZodValidationPipe(placeQuerySchema)) q: PlaceQuery): PlaceLookup {
    return this.places.lookup(q);
  }
}
