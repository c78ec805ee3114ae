import { ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import type { Group as GroupDto, GroupMemberResponse, GroupRole, WordLocale } from '@homeground/shared';
import { DataSource, Repository } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { apiWords } from '../common/i18n/api-i18n.js';
import { UsersService } from '../users/users.service.js';
import { GroupMembership } from './group-membership.entity.js';
import { Group } from './group.entity.js';

/** A member as the group's members see them (the shared answer shape). */
export type GroupMemberDto = GroupMemberResponse;

@Injectable()
export class GroupsService {
  constructor(
    @InjectRepository(Group) private readonly groups: Repository<Group>,
    @InjectRepository(GroupMembership) private readonly memberships: Repository<GroupMembership>,
    @InjectDataSource() private readonly db: DataSource,
    private readonly users: UsersService,
  ) {}

  async list(): Promise<GroupDto[]> {
    const [rows, counts] = await Promise.all([
      this.groups.find({ order: { name: 'ASC' } }),
      this.memberships
        .createQueryBuilder('m')
        .select('m.group_id', 'groupId')
        .addSelect('COUNT(*)', 'n')
        .groupBy('m.group_id')
        .getRawMany<{ groupId: string; n: number }>(),
    ]);
    const byGroup = new Map(counts.map((c) => [c.groupId, Number(c.n)]));
    return rows.map((g) => this.toDto(g, byGroup.get(g.id) ?? 0));
  }

  /** The group entity; stays inside this module (other modules get the shared `Group` from getDto). */
  private async get(slug: string, locale: WordLocale = 'en'): Promise<Group> {
    const group = await this.groups.findOne({ where: { slug } });
    if (!group) throw new NotFoundException(apiWords(locale)('refusals.groups.noSlug', { slug }));
    return group;
  }

  async getDto(slug: string, locale: WordLocale = 'en'): Promise<GroupDto> {
    const group = await this.get(slug, locale);
    return this.toDto(group, await this.memberships.count({ where: { groupId: group.id } }));
  }

  /** The shared `Group` by its id (for records that name their group by id, e.g. a plant share). */
  async getDtoById(id: string, locale: WordLocale = 'en'): Promise<GroupDto> {
    const group = await this.groups.findOne({ where: { id } });
    if (!group) throw new NotFoundException(apiWords(locale)('refusals.groups.noId'));
    return this.toDto(group, await this.memberships.count({ where: { groupId: group.id } }));
  }

  /** The caller's role in a group, or null. Admins act as organisers everywhere. */
  async roleOf(user: AuthenticatedUser, groupId: string): Promise<GroupRole | null> {
    if (user.role === 'admin') return 'organiser';
    const m = await this.memberships.findOne({ where: { groupId, userId: user.id } });
    return m?.role ?? null;
  }

  async members(slug: string, caller: AuthenticatedUser, locale: WordLocale = 'en'): Promise<GroupMemberDto[]> {
    const group = await this.get(slug, locale);
    const role = await this.roleOf(caller, group.id);
    if (!role) throw new ForbiddenException(apiWords(locale)('refusals.groups.membersOnly'));
    const rows = await this.memberships.find({
      where: { groupId: group.id },
      relations: { user: true },
      order: { createdAt: 'ASC' },
    });
    // E-mail addresses are personal data: the organisers who invite and contact people see them, no one else.
    const showEmail = role === 'organiser';
    return rows.map((m) => ({
      userId: m.userId,
      displayName: m.user.displayName,
      email: showEmail ? m.user.email : null,
      role: m.role,
    }));
  }

  /** Adds or changes a person's role in the group; organisers of that group (or admins) only. */
  async setMember(
    slug: string,
    caller: AuthenticatedUser,
    email: string,
    role: GroupRole,
    locale: WordLocale = 'en',
  ): Promise<GroupMemberDto> {
    const say = apiWords(locale);
    const group = await this.get(slug, locale);
    if ((await this.roleOf(caller, group.id)) !== 'organiser') {
      throw new ForbiddenException(say('refusals.groups.organiserAdds'));
    }
    const account = await this.users.findByEmail(email);
    if (!account) throw new NotFoundException(say('refusals.groups.noAccount', { email }));
    const user = await this.users.getDto(account.id);
    return this.db.transaction(async (tx) => {
      const existing = await tx.findOne(GroupMembership, { where: { groupId: group.id, userId: user.id } });
      await tx.save(
        GroupMembership,
        existing ? { ...existing, role } : tx.create(GroupMembership, { groupId: group.id, userId: user.id, role }),
      );
      return { userId: user.id, displayName: user.displayName, email: user.email, role };
    });
  }

  /** Takes a person out of the group; organisers only, and never the group's last organiser. */
  async removeMember(
    slug: string,
    caller: AuthenticatedUser,
    userId: string,
    locale: WordLocale = 'en',
  ): Promise<void> {
    const say = apiWords(locale);
    const group = await this.get(slug, locale);
    if ((await this.roleOf(caller, group.id)) !== 'organiser') {
      throw new ForbiddenException(say('refusals.groups.organiserRemoves'));
    }
    await this.db.transaction(async (tx) => {
      const m = await tx.findOne(GroupMembership, { where: { groupId: group.id, userId } });
      if (!m) throw new NotFoundException(say('refusals.groups.notInGroup'));
      if (
        m.role === 'organiser' &&
        (await tx.count(GroupMembership, { where: { groupId: group.id, role: 'organiser' } })) === 1
      ) {
        throw new ConflictException(say('refusals.groups.lastOrganiser'));
      }
      await tx.delete(GroupMembership, { id: m.id });
    });
  }

  count(): Promise<number> {
    return this.groups.count();
  }

  private toDto(g: Group, members: number): GroupDto {
    return {
      id: g.id,
      slug: g.slug,
      name: g.name,
      town: g.town,
      state: g.state,
      ecoregionCode: g.ecoregionCode,
      members,
    };
  }
}
