import { Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiConflictResponse, ApiOkResponse, ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import { type AuthResponse, type LoginRequest, loginRequestSchema, type RegisterRequest, registerRequestSchema, type User } from '@homeground/shared';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodBody } from '../common/decorators/zod.decorators.js';
import { UsersService } from '../users/users.service.js';
import { AuthService } from './auth.service.js';
import type { AuthenticatedUser } from './authenticated-user.js';

@ApiTags('auth')
@Controller()
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly users: UsersService,
  ) {}

  @Post('auth/register')
  @ApiConflictResponse({ description: 'E-mail already registered' })
  register(@ZodBody(registerRequestSchema) dto: RegisterRequest): Promise<AuthResponse> {
    return this.auth.register(dto);
  }

  @Post('auth/login')
  @HttpCode(200)
  @ApiTooManyRequestsResponse({ description: 'Too many sign-in attempts from this address' })
  login(@ZodBody(loginRequestSchema) dto: LoginRequest): Promise<AuthResponse> {
    return this.auth.login(dto);
  }

  @Get('me')
  @Auth()
  @ApiOkResponse({ description: 'The signed-in user with their group roles' })
  me(@CurrentUser() user: AuthenticatedUser): Promise<User> {
    return this.users.getDto(user.id);
  }
}
