import { reservationRequestSchema } from '@homeground/shared';

/** The taker's own details, checked by the same shared rules the API reads the reservation with. */
export const takerDetailsSchema = reservationRequestSchema.pick({ name: true, email: true, zip: true });
