import { Body, Controller, Get, Param, ParseUUIDPipe, Patch } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { User } from '@homeground/shared';
import { Auth } from '../common/decorators/auth.decorator.js';
import { SetRoleDto } from './dto/set-role.dto.js';
import { UsersService } from './users.service.js';

/** Admins manage people and their global roles. */
@ApiTags('users')
@Controller('users')
@Auth('admin')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  list(): Promise<User[]> {
    return this.users.list();
  }

  @Patch(':id/role')
  setRole(@Param('id', new ParseUUIDPipe({ version: '4' })) id: string, @Body() dto: SetRoleDto): Promise<User> {
    return this.users.setRole(id, dto.role);
  }
}
