import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { GlobalRole, PersonAccount, WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { Repository } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { SignInBackoffService } from '../auth/sign-in-backoff.service.js';
import { User } from '../users/user.entity.js';
import { toPersonAccount } from '../users/users.mapper.js';

/**
 * The admin's people page. An admin never changes their own role or switches off their own account, so
 * there is always an admin left who can undo a mistake.
 */
@Injectable()
export class PeopleService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly backoff: SignInBackoffService,
  ) {}

  async list(now = new Date()): Promise<PersonAccount[]> {
    const all = await this.users.find({
      relations: { memberships: { group: true } },
      order: { createdAt: 'ASC', email: 'ASC' },
    });
    const held = await this.backoff.heldEmails(
      all.map((u) => u.email),
      now,
    );
    return all.map((u) => toPersonAccount(u, held.has(u.email)));
  }

  async get(id: string, locale: WordLocale = 'en'): Promise<PersonAccount> {
    const user = await this.users.findOne({ where: { id }, relations: { memberships: { group: true } } });
    if (!user) throw new NotFoundException(apiWords(locale)('refusals.people.noPerson'));
    return toPersonAccount(user, await this.backoff.isLocked(user.email));
  }

  async setRole(
    admin: AuthenticatedUser,
    id: string,
    role: GlobalRole,
    locale: WordLocale = 'en',
  ): Promise<PersonAccount> {
    const say = apiWords(locale);
    if (admin.id === id && role !== admin.role) throw new ConflictException(say('refusals.people.ownRole'));
    const result = await this.users.update({ id }, { role });
    if (!result.affected) throw new NotFoundException(say('refusals.people.noPerson'));
    return this.get(id, locale);
  }

  async setAccess(
    admin: AuthenticatedUser,
    id: string,
    disabled: boolean,
    now = new Date(),
    locale: WordLocale = 'en',
  ): Promise<PersonAccount> {
    const say = apiWords(locale);
    if (admin.id === id && disabled) throw new ConflictException(say('refusals.people.ownAccess'));
    const user = await this.users.findOneBy({ id });
    if (!user) throw new NotFoundException(say('refusals.people.noPerson'));
    // Keep the first switch-off time when asked twice.
    if (disabled !== (user.disabledAt !== null)) await this.users.update({ id }, { disabledAt: disabled ? now : null });
    return this.get(id, locale);
  }
}
