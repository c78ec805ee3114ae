import { Body, Controller, Get, HttpCode, Param, Post, Req, UseGuards } from '@nestjs/common';
import { ApiBearerAuth, ApiGoneResponse, ApiTags } from '@nestjs/swagger';
import {
  acceptInvitationRequestSchema, type AuthResponse, type Invitation, type InvitationPreview, invitationTokenSchema,
  inviteRequestSchema, slugSchema,
} from '@homeground/shared';
import type { z } from 'zod';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { OptionalJwtAuthGuard } from '../common/guards/optional-jwt-auth.guard.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { InvitationsService } from './invitations.service.js';

@ApiTags('groups')
@Controller()
export class InvitationsController {
  constructor(private readonly invitations: InvitationsService) {}

  /** Organisers invite someone by e-mail; the message carries a link that makes or joins an account. */
  @Post('groups/:slug/invitations')
  @Auth()
  invite(
    @Param('slug', new ZodValidationPipe(slugSchema)) slug: string,
    @Body(new ZodValidationPipe(inviteRequestSchema)) body: z.infer<typeof inviteRequestSchema>,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<Invitation> {
    return this.invitations.invite(slug, user, body);
  }

  @Get('groups/:slug/invitations')
  @Auth()
  list(@Param('slug', new ZodValidationPipe(slugSchema)) slug: string, @CurrentUser() user: AuthenticatedUser): Promise<Invitation[]> {
    return this.invitations.list(slug, user);
  }

  /** What the link offers, for the page the invited person lands on. */
  @Get('invitations/:token')
  @ApiGoneResponse({ description: 'Used or expired' })
  preview(@Param('token', new ZodValidationPipe(invitationTokenSchema)) token: string): Promise<InvitationPreview> {
    return this.invitations.preview(token);
  }

  /** Joins the group: signed in with the invited address, or with a name and password for a new account. */
  @Post('invitations/:token/accept')
  @HttpCode(200)
  @UseGuards(OptionalJwtAuthGuard)
  @ApiBearerAuth()
  @ApiGoneResponse({ description: 'Used or expired' })
  accept(
    @Param('token', new ZodValidationPipe(invitationTokenSchema)) token: string,
    @Body(new ZodValidationPipe(acceptInvitationRequestSchema)) body: z.infer<typeof acceptInvitationRequestSchema>,
    @Req() req: { user?: AuthenticatedUser },
  ): Promise<AuthResponse> {
    return this.invitations.accept(token, req.user ?? null, body);
  }
}
