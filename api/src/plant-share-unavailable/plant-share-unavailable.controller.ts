import { All, Controller, ServiceUnavailableException, SetMetadata } from '@nestjs/common';
import { ApiExcludeController } from '@nestjs/swagger';
import { Public } from '../common/decorators/public.decorator.js';
import { READS_METADATA } from '../common/decorators/zod.decorators.js';

/** What a caller of any plant-share route reads while the API runs on PostgreSQL. */
export const PLANT_SHARE_UNAVAILABLE_MESSAGE =
  'The plant share runs on the embedded SQLite database only for now; this server uses PostgreSQL (DATABASE_URL), ' +
  'so reservations, pickup slots and the season report are not available here.';

/**
 * Answers every plant-share route (the organisers' and the public ones) with 503 and a clear message when
 * the API runs on PostgreSQL: the plant share's writes are synchronous SQLite transactions, not yet ported,
 * and answering 503 is better than a 404 (the route exists) or a 500 (nothing is broken, it is not here).
 */
@ApiExcludeController()
// Public by decision: the same 503 for everyone, before any sign-in is read (nothing here is served).
@Public()
@Controller()
export class PlantShareUnavailableController {
  @All([
    'groups/:slug/plant-share',
    'groups/:slug/plant-share/*rest',
    'plant-shares/*rest',
    'reservations/*rest',
    'waitlist-offers/*rest',
  ])
  // Whatever was sent, the answer is the same 503: the refusal of unread input must not answer first.
  @SetMetadata(READS_METADATA, ['query', 'body'])
  unavailable(): never {
    throw new ServiceUnavailableException(PLANT_SHARE_UNAVAILABLE_MESSAGE);
  }
}
