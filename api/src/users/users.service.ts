import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { GlobalRole, User as UserDto, WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { Repository } from 'typeorm';
import { User } from './user.entity.js';
import { toUserCredentials, toUserDto, type UserCredentials } from './users.mapper.js';

@Injectable()
export class UsersService {
  constructor(@InjectRepository(User) private readonly users: Repository<User>) {}

  /** The account with this e-mail (any case), as sign-in and group invitations need it. */
  async findByEmail(email: string): Promise<UserCredentials | null> {
    const user = await this.users.findOne({ where: { email: email.toLowerCase() } });
    return user && toUserCredentials(user);
  }

  /** Notes a successful sign-in (shown on the admin's people page). */
  async recordSignIn(id: string, at = new Date()): Promise<void> {
    await this.users.update({ id }, { lastSignInAt: at });
  }

  /** The account with this id, for checking a token; null when it was deleted. */
  async findById(id: string): Promise<UserCredentials | null> {
    const user = await this.users.findOne({ where: { id } });
    return user && toUserCredentials(user);
  }

  async getDto(id: string, locale: WordLocale = 'en'): Promise<UserDto> {
    const user = await this.users.findOne({ where: { id }, relations: { memberships: { group: true } } });
    if (!user) throw new NotFoundException(apiWords(locale)('refusals.people.noUser'));
    return toUserDto(user);
  }

  async create(
    input: {
      email: string;
      displayName: string;
      passwordHash: string;
      role?: GlobalRole;
      isDemo?: boolean;
    },
    locale: WordLocale = 'en',
  ): Promise<UserDto> {
    const email = input.email.toLowerCase();
    if (await this.findByEmail(email)) throw new ConflictException(apiWords(locale)('refusals.people.emailTaken'));
    const saved = await this.users.save(
      this.users.create({ ...input, email, role: input.role ?? 'member', isDemo: input.isDemo ?? false }),
    );
    return this.getDto(saved.id);
  }

  count(): Promise<number> {
    return this.users.count();
  }
}
