import { Body, Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiConflictResponse, ApiOkResponse, ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import type { AuthResponse, User } from '@homeground/shared';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { UsersService } from '../users/users.service.js';
import { AuthService } from './auth.service.js';
import type { AuthenticatedUser } from './authenticated-user.js';
import { LoginDto } from './dto/login.dto.js';
import { RegisterDto } from './dto/register.dto.js';

@ApiTags('auth')
@Controller()
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly users: UsersService,
  ) {}

  @Post('auth/register')
  @ApiConflictResponse({ description: 'E-mail already registered' })
  register(@Body() dto: RegisterDto): Promise<AuthResponse> {
    return this.auth.register(dto);
  }

  @Post('auth/login')
  @HttpCode(200)
  @ApiTooManyRequestsResponse({ description: 'Too many sign-in attempts from this address' })
  login(@Body() dto: LoginDto): Promise<AuthResponse> {
    return this.auth.login(dto);
  }

  @Get('me')
  @Auth()
  @ApiOkResponse({ description: 'The signed-in user with their group roles' })
  me(@CurrentUser() user: AuthenticatedUser): Promise<User> {
    return this.users.getDto(user.id);
  }
}
