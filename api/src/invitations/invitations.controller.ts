import { Controller, Get, HttpCode, Post, Req, UseGuards } from '@nestjs/common';
import { ApiBearerAuth, ApiGoneResponse, ApiTags } from '@nestjs/swagger';
import {
  type AcceptInvitationRequest,
  acceptInvitationRequestSchema,
  type AuthResponse,
  authResponseSchema,
  type Invitation,
  type InvitationPreview,
  invitationPreviewSchema,
  invitationSchema,
  invitationTokenSchema,
  type InviteRequest,
  inviteRequestSchema,
  slugParamSchema,
  type WordLocale,
} from '@homeground/shared';
import { z } from 'zod';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import { OptionalJwtAuthGuard } from '../common/guards/optional-jwt-auth.guard.js';
import { ZodBody, ZodParam, ZodResponse } from '../common/decorators/zod.decorators.js';
import { InvitationsService } from './invitations.service.js';
import { Public } from '../common/decorators/public.decorator.js';

@ApiTags('groups')
@Controller()
export class InvitationsController {
  constructor(private readonly invitations: InvitationsService) {}

  /** Organisers invite someone by e-mail; the message carries a link that makes or joins an account. */
  @Post('groups/:slug/invitations')
  @Auth()
  @ZodResponse(invitationSchema, 201)
  @AnswersInLanguage()
  invite(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodBody(inviteRequestSchema) body: InviteRequest,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<Invitation> {
    // The invitation e-mail is written in the inviter's page language.
    return this.invitations.invite(slug, user, body, undefined, locale);
  }

  @Get('groups/:slug/invitations')
  @Auth()
  @ZodResponse(z.array(invitationSchema))
  @AnswersInLanguage()
  list(
    @ZodParam('slug', slugParamSchema) slug: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<Invitation[]> {
    return this.invitations.list(slug, user, locale);
  }

  /** What the link offers, for the page the invited person lands on. */
  @Public()
  @Get('invitations/:token')
  @ApiGoneResponse({ description: 'Used or expired' })
  @ZodResponse(invitationPreviewSchema)
  @AnswersInLanguage()
  preview(
    @ZodParam('token', invitationTokenSchema) token: string,
    @RequestLocale() locale: WordLocale,
  ): Promise<InvitationPreview> {
    return this.invitations.preview(token, locale);
  }

  /** Joins the group: signed in with the invited address, or with a name and password for a new account. */
  @Post('invitations/:token/accept')
  @HttpCode(200)
  @UseGuards(OptionalJwtAuthGuard)
  @ApiBearerAuth()
  @ApiGoneResponse({ description: 'Used or expired' })
  @ZodResponse(authResponseSchema)
  accept(
    @ZodParam('token', invitationTokenSchema) token: string,
    @ZodBody(acceptInvitationRequestSchema) body: AcceptInvitationRequest,
    @Req() req: { user?: AuthenticatedUser },
    @RequestLocale() locale: WordLocale,
  ): Promise<AuthResponse> {
    return this.invitations.accept(token, req.user ?? null, body, locale);
  }
}
