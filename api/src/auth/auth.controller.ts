import { Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiConflictResponse, ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import {
  type AuthResponse,
  authResponseSchema,
  type LoginRequest,
  loginRequestSchema,
  type RegisterRequest,
  registerRequestSchema,
  type User,
  userResponseSchema,
} from '@homeground/shared';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodBody, ZodResponse } from '../common/decorators/zod.decorators.js';
import { UsersService } from '../users/users.service.js';
import { AuthService } from './auth.service.js';
import type { AuthenticatedUser } from './authenticated-user.js';
import { Public } from '../common/decorators/public.decorator.js';

@ApiTags('auth')
@Controller()
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly users: UsersService,
  ) {}

  @Public()
  @Post('auth/register')
  @ZodResponse(authResponseSchema, 201)
  @ApiConflictResponse({ description: 'E-mail already registered' })
  register(@ZodBody(registerRequestSchema) dto: RegisterRequest): Promise<AuthResponse> {
    return this.auth.register(dto);
  }

  @Public()
  @Post('auth/login')
  @ZodResponse(authResponseSchema)
  @HttpCode(200)
  @ApiTooManyRequestsResponse({ description: 'Too many sign-in attempts from this address' })
  login(@ZodBody(loginRequestSchema) dto: LoginRequest): Promise<AuthResponse> {
    return this.auth.login(dto);
  }

  @Get('me')
  @ZodResponse(userResponseSchema)
  @Auth()
  me(@CurrentUser() user: AuthenticatedUser): Promise<User> {
    return this.users.getDto(user.id);
  }
}
