import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { GlobalRole, User as UserDto } from '@homeground/shared';
import { Repository } from 'typeorm';
import { User } from './user.entity.js';
import { toUserDto } from './users.mapper.js';

@Injectable()
export class UsersService {
  constructor(@InjectRepository(User) private readonly users: Repository<User>) {}

  findByEmail(email: string): Promise<User | null> {
    return this.users.findOne({ where: { email: email.toLowerCase() } });
  }

  async findById(id: string): Promise<User | null> {
    return this.users.findOne({ where: { id }, relations: { memberships: { group: true } } });
  }

  async getDto(id: string): Promise<UserDto> {
    const user = await this.findById(id);
    if (!user) throw new NotFoundException('No such user.');
    return toUserDto(user);
  }

  async create(input: { email: string; displayName: string; passwordHash: string; role?: GlobalRole; isDemo?: boolean }): Promise<User> {
    const email = input.email.toLowerCase();
    if (await this.findByEmail(email)) throw new ConflictException('An account with this e-mail already exists: sign in instead.');
    return this.users.save(this.users.create({ ...input, email, role: input.role ?? 'member', isDemo: input.isDemo ?? false }));
  }

  async list(): Promise<UserDto[]> {
    const all = await this.users.find({ relations: { memberships: { group: true } }, order: { createdAt: 'ASC', email: 'ASC' } });
    return all.map(toUserDto);
  }

  async setRole(id: string, role: GlobalRole): Promise<UserDto> {
    const result = await this.users.update({ id }, { role });
    if (!result.affected) throw new NotFoundException('No such user.');
    return this.getDto(id);
  }

  count(): Promise<number> {
    return this.users.count();
  }
}
