import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Put } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Group } from '@homeground/shared';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { SetMemberDto } from './dto/set-member.dto.js';
import { GroupsService, type GroupMemberDto } from './groups.service.js';

@ApiTags('groups')
@Controller('groups')
export class GroupsController {
  constructor(private readonly groups: GroupsService) {}

  @Get()
  list(): Promise<Group[]> {
    return this.groups.list();
  }

  @Get(':slug')
  get(@Param('slug') slug: string): Promise<Group> {
    return this.groups.getDto(slug);
  }

  @Get(':slug/members')
  @Auth()
  members(@Param('slug') slug: string, @CurrentUser() user: AuthenticatedUser): Promise<GroupMemberDto[]> {
    return this.groups.members(slug, user);
  }

  @Put(':slug/members')
  @Auth()
  setMember(@Param('slug') slug: string, @CurrentUser() user: AuthenticatedUser, @Body() dto: SetMemberDto): Promise<GroupMemberDto> {
    return this.groups.setMember(slug, user, dto.email, dto.role);
  }

  @Delete(':slug/members/:userId')
  @HttpCode(204)
  @Auth()
  removeMember(
    @Param('slug') slug: string,
    @Param('userId', new ParseUUIDPipe({ version: '4' })) userId: string,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<void> {
    return this.groups.removeMember(slug, user, userId);
  }
}
