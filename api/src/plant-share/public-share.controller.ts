import { Controller, Delete, Get, HttpCode, Post, Put } from '@nestjs/common';
import { ApiConflictResponse, ApiForbiddenResponse, ApiTags } from '@nestjs/swagger';
import {
  apiErrorSchema,
  type ChangeReservationRequest,
  changeReservationRequestSchema,
  type ClaimOfferRequest,
  claimOfferRequestSchema,
  type ParsedReservationRequest,
  type PlantLine,
  type PublicPlantShare,
  publicPlantShareSchema,
  type ReservationCreated,
  reservationCreatedSchema,
  reservationRequestSchema,
  reservationTokenSchema,
  type ShareFitQuery,
  shareFitQuerySchema,
  slugParamSchema,
  type TakerReservation,
  takerReservationSchema,
  type WaitlistJoined,
  waitlistJoinedSchema,
  waitlistOfferTokenSchema,
  type WaitlistOfferView,
  waitlistOfferViewSchema,
  waitlistRequestSchema,
  type WordLocale,
} from '@homeground/shared';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import { ZodBody, ZodParam, ZodQuery, ZodResponse } from '../common/decorators/zod.decorators.js';
import { openApiSchema } from '../common/validation/openapi-schema.js';
import { ReservationsService } from './reservations.service.js';
import { Public } from '../common/decorators/public.decorator.js';

const conflictDoc = ApiConflictResponse({
  description: 'All taken (with a waitlist offer), slot full, share paused or closed',
  schema: openApiSchema(apiErrorSchema, 'output'),
});
const forgedDoc = ApiForbiddenResponse({
  description: 'A link we did not send',
  schema: openApiSchema(apiErrorSchema, 'output'),
});

/**
 * The taker's side of the plant share, without an account: the public page, reservations and their
 * private links, the waitlist. Names and e-mails given here go back only to their owner and to the
 * group's organisers.
 */
@ApiTags('plant share')
@Public()
@Controller()
export class PublicShareController {
  constructor(private readonly reservations: ReservationsService) {}

  /** What is on offer, with plants left and cautions; `sun` and `moisture` rank it by fit to the taker's yard. */
  @Get('plant-shares/:slug')
  @AnswersInLanguage()
  @ZodResponse(publicPlantShareSchema)
  share(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodQuery(shareFitQuerySchema) yard: ShareFitQuery,
    @RequestLocale() locale: WordLocale,
  ): Promise<PublicPlantShare> {
    return this.reservations.publicShare(slug, yard, locale);
  }

  @Post('plant-shares/:slug/reservations')
  @AnswersInLanguage()
  @conflictDoc
  @ZodResponse(reservationCreatedSchema, 201)
  reserve(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(reservationRequestSchema) body: ParsedReservationRequest,
    @RequestLocale() locale: WordLocale,
  ): Promise<ReservationCreated> {
    return this.reservations.reserve(slug, body, locale);
  }

  @Post('plant-shares/:slug/waitlist')
  @AnswersInLanguage()
  @conflictDoc
  @ZodResponse(waitlistJoinedSchema, 201)
  joinWaitlist(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(waitlistRequestSchema) body: { name: string; email: string; zip: string; lines: PlantLine[] },
    @RequestLocale() locale: WordLocale,
  ): Promise<WaitlistJoined> {
    return this.reservations.joinWaitlist(slug, body, locale);
  }

  @Get('reservations/:token')
  @AnswersInLanguage()
  @forgedDoc
  @ZodResponse(takerReservationSchema)
  get(
    @ZodParam('token', reservationTokenSchema) token: string,
    @RequestLocale() locale: WordLocale,
  ): Promise<TakerReservation> {
    return this.reservations.byToken(token, locale);
  }

  @Put('reservations/:token')
  @AnswersInLanguage()
  @forgedDoc
  @conflictDoc
  @ZodResponse(takerReservationSchema)
  change(
    @ZodParam('token', reservationTokenSchema) token: string,
    @ZodBody(changeReservationRequestSchema) body: ChangeReservationRequest,
    @RequestLocale() locale: WordLocale,
  ): Promise<TakerReservation> {
    return this.reservations.change(token, body, locale);
  }

  @Delete('reservations/:token')
  @forgedDoc
  @ZodResponse(takerReservationSchema)
  cancel(@ZodParam('token', reservationTokenSchema) token: string): Promise<TakerReservation> {
    return this.reservations.cancel(token);
  }

  /** What a waitlist offer's link shows: the plants held and the slots to choose from. */
  @Get('waitlist-offers/:token')
  @forgedDoc
  @ZodResponse(waitlistOfferViewSchema)
  offer(@ZodParam('token', waitlistOfferTokenSchema) token: string): Promise<WaitlistOfferView> {
    return this.reservations.offer(token);
  }

  /** Takes the plants a waitlist offer holds. */
  @Post('waitlist-offers/:token/claim')
  @AnswersInLanguage()
  @HttpCode(201)
  @forgedDoc
  @conflictDoc
  @ZodResponse(reservationCreatedSchema, 201)
  claim(
    @ZodParam('token', waitlistOfferTokenSchema) token: string,
    @ZodBody(claimOfferRequestSchema) body: ClaimOfferRequest,
    @RequestLocale() locale: WordLocale,
  ): Promise<ReservationCreated> {
    return this.reservations.claimOffer(token, body, locale);
  }
}
