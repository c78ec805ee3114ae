import { Controller, Get, Patch } from '@nestjs/common';
import { ApiConflictResponse, ApiTags } from '@nestjs/swagger';
import {
  type PersonAccount,
  personAccountResponseSchema,
  type SetAccessRequest,
  setAccessRequestSchema,
  type SetRoleRequest,
  setRoleRequestSchema,
  uuidParamSchema,
  type WordLocale,
} from '@homeground/shared';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import { z } from 'zod';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodBody, ZodParam, ZodResponse } from '../common/decorators/zod.decorators.js';
import { PeopleService } from './people.service.js';

/** Admins manage people: global roles, switching accounts off and on, sign-in activity. */
@ApiTags('people')
@AnswersInLanguage()
@Controller('users')
@Auth('admin')
export class PeopleController {
  constructor(private readonly people: PeopleService) {}

  @Get()
  @ZodResponse(z.array(personAccountResponseSchema))
  list(): Promise<PersonAccount[]> {
    return this.people.list();
  }

  @Patch(':id/role')
  @ZodResponse(personAccountResponseSchema)
  @ApiConflictResponse({ description: 'An admin cannot change their own role' })
  setRole(
    @ZodParam('id', uuidParamSchema) id: string,
    @ZodBody(setRoleRequestSchema) dto: SetRoleRequest,
    @CurrentUser() admin: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<PersonAccount> {
    return this.people.setRole(admin, id, dto.role, locale);
  }

  @Patch(':id/access')
  @ZodResponse(personAccountResponseSchema)
  @ApiConflictResponse({ description: 'An admin cannot switch off their own account' })
  setAccess(
    @ZodParam('id', uuidParamSchema) id: string,
    @ZodBody(setAccessRequestSchema) dto: SetAccessRequest,
    @CurrentUser() admin: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<PersonAccount> {
    return this.people.setAccess(admin, id, dto.disabled, undefined, locale);
  }
}
