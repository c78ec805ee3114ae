import { Controller, Get, Patch } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { type SetRoleRequest, setRoleRequestSchema, type User, uuidParamSchema } from '@homeground/shared';
import { Auth } from '../common/decorators/auth.decorator.js';
import { ZodBody, ZodParam } from '../common/decorators/zod.decorators.js';
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
  setRole(@ZodParam('id', uuidParamSchema) id: string, @ZodBody(setRoleRequestSchema) dto: SetRoleRequest): Promise<User> {
    return this.users.setRole(id, dto.role);
  }
}
