import { Controller, Delete, Get, Header, HttpCode, Patch, Post, Put } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  type AddStockRequest,
  addStockRequestSchema,
  type CheckInRequest,
  checkInRequestSchema,
  type CheckInResult,
  checkInResultSchema,
  type EditShareRequest,
  editShareRequestSchema,
  type OpenShareRequest,
  openShareRequestSchema,
  type PickupList,
  pickupListSchema,
  type PickupSlotRequest,
  pickupSlotRequestSchema,
  type PlantShare,
  plantShareSchema,
  type SetStockRequest,
  setStockRequestSchema,
  type ShareReport,
  shareReportSchema,
  type ShareStatusRequest,
  shareStatusRequestSchema,
  type ShareWaitlist,
  shareWaitlistSchema,
  slugParamSchema,
  uuidParamSchema,
  type WalkUpGift,
  walkUpGiftSchema,
  walkUpRequestSchema,
  type PlantLine,
} from '@homeground/shared';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { FileResponse, ZodBody, ZodParam, ZodResponse } from '../common/decorators/zod.decorators.js';
import { PlantShareService } from './plant-share.service.js';

/** The organiser's plant share: one per group season. Every route is for the group's organisers (and admins). */
@ApiTags('plant share')
@Controller('groups/:slug/plant-share')
@Auth()
export class PlantShareController {
  constructor(private readonly shares: PlantShareService) {}

  @Post()
  @ZodResponse(plantShareSchema, 201)
  open(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(openShareRequestSchema) body: OpenShareRequest,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<PlantShare> {
    return this.shares.open(slug, user, body);
  }

  @Get()
  @ZodResponse(plantShareSchema)
  get(@ZodParam('slug', slugParamSchema) slug: string, @CurrentUser() user: AuthenticatedUser): Promise<PlantShare> {
    return this.shares.get(slug, user);
  }

  @Patch()
  @ZodResponse(plantShareSchema)
  edit(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(editShareRequestSchema) body: EditShareRequest,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<PlantShare> {
    return this.shares.edit(slug, user, body);
  }

  @Post('slots')
  @ZodResponse(plantShareSchema, 201)
  addSlot(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(pickupSlotRequestSchema) body: PickupSlotRequest,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<PlantShare> {
    return this.shares.addSlot(slug, user, body);
  }

  @Put('slots/:slotId')
  @ZodResponse(plantShareSchema)
  editSlot(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodParam('slotId', uuidParamSchema) slotId: string,
    @ZodBody(pickupSlotRequestSchema) body: PickupSlotRequest,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<PlantShare> {
    return this.shares.editSlot(slug, user, slotId, body);
  }

  /** Deletes a pickup slot nobody has reserved in (409 saying how many reservations it has otherwise). */
  @Delete('slots/:slotId')
  @ZodResponse(plantShareSchema)
  deleteSlot(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodParam('slotId', uuidParamSchema) slotId: string,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<PlantShare> {
    return this.shares.deleteSlot(slug, user, slotId);
  }

  /** The printable pickup list of one slot: households, their plants, check boxes. */
  @Get('slots/:slotId/pickup-list')
  @ZodResponse(pickupListSchema)
  pickupList(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodParam('slotId', uuidParamSchema) slotId: string,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<PickupList> {
    return this.shares.pickupList(slug, user, slotId);
  }

  /** Sets the plants still on offer per species; an increase goes to the waitlist first. */
  @Put('stock')
  @ZodResponse(plantShareSchema)
  setStock(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(setStockRequestSchema) body: SetStockRequest,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<PlantShare> {
    return this.shares.setStock(slug, user, body);
  }

  /** Adds plants that became ready. */
  @Post('stock/add')
  @HttpCode(200)
  @ZodResponse(plantShareSchema)
  addStock(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(addStockRequestSchema) body: AddStockRequest,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<PlantShare> {
    return this.shares.addStock(slug, user, body);
  }

  @Put('status')
  @ZodResponse(plantShareSchema)
  setStatus(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(shareStatusRequestSchema) body: ShareStatusRequest,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<PlantShare> {
    return this.shares.setStatus(slug, user, body);
  }

  /** The waitlist per species, in the order plants are offered (names and e-mails: organisers only). */
  @Get('waitlist')
  @ZodResponse(shareWaitlistSchema)
  waitlist(
    @ZodParam('slug', slugParamSchema) slug: string,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<ShareWaitlist> {
    return this.shares.waitlist(slug, user);
  }

  /** Pickup day: picked up, or a no-show whose plants go to the waitlist, else back on offer. */
  @Post('reservations/:id/check-in')
  @HttpCode(200)
  @ZodResponse(checkInResultSchema)
  checkIn(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodParam('id', uuidParamSchema) id: string,
    @ZodBody(checkInRequestSchema) body: CheckInRequest,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<CheckInResult> {
    return this.shares.checkIn(slug, user, id, body);
  }

  /** Plants given without a reservation. */
  @Post('walk-ups')
  @ZodResponse(walkUpGiftSchema, 201)
  walkUp(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(walkUpRequestSchema) body: { lines: PlantLine[]; zip?: string },
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<WalkUpGift> {
    return this.shares.walkUp(slug, user, body);
  }

  /** The season report: counts only. */
  @Get('report')
  @ZodResponse(shareReportSchema)
  report(
    @ZodParam('slug', slugParamSchema) slug: string,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<ShareReport> {
    return this.shares.report(slug, user);
  }

  @Get('report.csv')
  @FileResponse('text/csv', 'The season report as CSV (counts only)')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="homeground-season-report.csv"')
  reportCsv(@ZodParam('slug', slugParamSchema) slug: string, @CurrentUser() user: AuthenticatedUser): Promise<string> {
    return this.shares.reportCsv(slug, user);
  }
}
