import { Controller, Get, HttpCode, Post } from '@nestjs/common';
import {
  ApiConflictResponse,
  ApiGoneResponse,
  ApiNotFoundResponse,
  ApiTags,
  ApiTooManyRequestsResponse,
} from '@nestjs/swagger';
import {
  type AuthResponse,
  authResponseSchema,
  type ConfirmRegistrationRequest,
  confirmRegistrationRequestSchema,
  confirmRegistrationResponseSchema,
  type RegisterAccepted,
  registerAcceptedSchema,
  type LoginRequest,
  loginRequestSchema,
  type RegisterRequest,
  registerRequestSchema,
  type User,
  userResponseSchema,
  type WordLocale,
} from '@homeground/shared';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodBody, ZodResponse } from '../common/decorators/zod.decorators.js';
import { UsersService } from '../users/users.service.js';
import { AuthService } from './auth.service.js';
import { RegistrationService } from './registration.service.js';
import type { AuthenticatedUser } from './authenticated-user.js';
import { Public } from '../common/decorators/public.decorator.js';

@ApiTags('auth')
@Controller()
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly users: UsersService,
    private readonly registration: RegistrationService,
  ) {}

  /** Always "check your e-mail", whether or not the address has an account; the e-mail says which. */
  @Public()
  @Post('auth/register')
  @ZodResponse(registerAcceptedSchema, 202)
  @HttpCode(202)
  @AnswersInLanguage()
  register(
    @ZodBody(registerRequestSchema) dto: RegisterRequest,
    @RequestLocale() locale: WordLocale,
  ): Promise<RegisterAccepted> {
    return this.registration.register(dto, new Date(), locale);
  }

  /** The link in the confirmation e-mail: makes the account and signs the person in. */
  @Public()
  @Post('auth/register/confirm')
  @ZodResponse(confirmRegistrationResponseSchema, 201)
  @ApiNotFoundResponse({ description: 'The link was already used or is not one we sent' })
  @ApiGoneResponse({ description: 'The link is too old' })
  @ApiConflictResponse({ description: 'The address got an account another way meanwhile' })
  @AnswersInLanguage()
  confirm(
    @ZodBody(confirmRegistrationRequestSchema) dto: ConfirmRegistrationRequest,
    @RequestLocale() locale: WordLocale,
  ): Promise<AuthResponse & { next: string | null }> {
    return this.registration.confirm(dto, new Date(), locale);
  }

  @Public()
  @Post('auth/login')
  @ZodResponse(authResponseSchema)
  @HttpCode(200)
  @ApiTooManyRequestsResponse({ description: 'Too many sign-in attempts from this address' })
  @AnswersInLanguage()
  login(@ZodBody(loginRequestSchema) dto: LoginRequest, @RequestLocale() locale: WordLocale): Promise<AuthResponse> {
    return this.auth.login(dto, locale);
  }

  @Get('me')
  @ZodResponse(userResponseSchema)
  @Auth()
  @AnswersInLanguage()
  me(@CurrentUser() user: AuthenticatedUser, @RequestLocale() locale: WordLocale): Promise<User> {
    return this.users.getDto(user.id, locale);
  }
}
