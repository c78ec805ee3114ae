import { Controller, Get, Patch } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  type SetRoleRequest,
  setRoleRequestSchema,
  type User,
  userResponseSchema,
  uuidParamSchema,
} from '@homeground/shared';
import { z } from 'zod';
import { Auth } from '../common/decorators/auth.decorator.js';
import { ZodBody, ZodParam, ZodResponse } from '../common/decorators/zod.decorators.js';
import { UsersService } from './users.service.js';

/** Admins manage people and their global roles. */
@ApiTags('users')
@Controller('users')
@Auth('admin')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @ZodResponse(z.array(userResponseSchema))
  list(): Promise<User[]> {
    return this.users.list();
  }

  @Patch(':id/role')
  @ZodResponse(userResponseSchema)
  setRole(
    @ZodParam('id', uuidParamSchema) id: string,
    @ZodBody(setRoleRequestSchema) dto: SetRoleRequest,
  ): Promise<User> {
    return this.users.setRole(id, dto.role);
  }
}
