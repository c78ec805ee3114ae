import { Controller, Delete, Get, HttpCode, Put } from '@nestjs/common';
import { ApiNoContentResponse, ApiTags } from '@nestjs/swagger';
import {
  type Group,
  groupMemberResponseSchema,
  groupResponseSchema,
  type SetMemberRequest,
  setMemberRequestSchema,
  slugParamSchema,
  uuidParamSchema,
  type WordLocale,
} from '@homeground/shared';
import { z } from 'zod';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodBody, ZodParam, ZodResponse } from '../common/decorators/zod.decorators.js';
import { GroupsService, type GroupMemberDto } from './groups.service.js';
import { Public } from '../common/decorators/public.decorator.js';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';

@ApiTags('groups')
@AnswersInLanguage()
@Controller('groups')
export class GroupsController {
  constructor(private readonly groups: GroupsService) {}

  @Public()
  @Get()
  @ZodResponse(z.array(groupResponseSchema))
  list(): Promise<Group[]> {
    return this.groups.list();
  }

  @Public()
  @Get(':slug')
  @ZodResponse(groupResponseSchema)
  get(@ZodParam('slug', slugParamSchema) slug: string, @RequestLocale() locale: WordLocale): Promise<Group> {
    return this.groups.getDto(slug, locale);
  }

  @Get(':slug/members')
  @ZodResponse(z.array(groupMemberResponseSchema))
  @Auth()
  members(
    @ZodParam('slug', slugParamSchema) slug: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<GroupMemberDto[]> {
    return this.groups.members(slug, user, locale);
  }

  @Put(':slug/members')
  @ZodResponse(groupMemberResponseSchema)
  @Auth()
  setMember(
    @ZodParam('slug', slugParamSchema) slug: string,
    @CurrentUser() user: AuthenticatedUser,
    @ZodBody(setMemberRequestSchema) dto: SetMemberRequest,
    @RequestLocale() locale: WordLocale,
  ): Promise<GroupMemberDto> {
    return this.groups.setMember(slug, user, dto.email, dto.role, locale);
  }

  @Delete(':slug/members/:userId')
  @ApiNoContentResponse({ description: 'Removed' })
  @HttpCode(204)
  @Auth()
  removeMember(
    @ZodParam('slug', slugParamSchema) slug: string,
    @ZodParam('userId', uuidParamSchema) userId: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<void> {
    return this.groups.removeMember(slug, user, userId, locale);
  }
}
