import { createHash, randomBytes } from 'node:crypto';
import {
  ConflictException,
  ForbiddenException,
  GoneException,
  Inject,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import {
  type AcceptInvitationRequest,
  type AuthResponse,
  type Invitation,
  INVITATION_DAYS,
  type InvitationPreview,
  type InviteRequest,
  type WordLocale,
} from '@homeground/shared';
import { DataSource, IsNull, Repository } from 'typeorm';
import { AuthService } from '../auth/auth.service.js';
import { badRequest } from '../common/validation/bad-request.js';
import { apiWords } from '../common/i18n/api-i18n.js';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { hashPassword } from '../auth/password.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { GroupMembership } from '../groups/group-membership.entity.js';
import { Group } from '../groups/group.entity.js';
import { GroupsService } from '../groups/groups.service.js';
import { MailService } from '../mail/mail.service.js';
import { User } from '../users/user.entity.js';
import { invitationEmail } from './invitation-email.js';
import { InvitationRow } from './invitation.entity.js';
import { assertStrongPassword } from '../auth/password-strength.js';

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

@Injectable()
export class InvitationsService {
  constructor(
    @InjectRepository(InvitationRow) private readonly invitations: Repository<InvitationRow>,
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectDataSource() private readonly db: DataSource,
    private readonly groups: GroupsService,
    private readonly mail: MailService,
    private readonly auth: AuthService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** An organiser invites someone by e-mail; a newer invitation to the same address replaces the older one. */
  async invite(
    slug: string,
    caller: AuthenticatedUser,
    req: InviteRequest,
    now = new Date(),
    locale: WordLocale = 'en',
  ): Promise<Invitation> {
    const say = apiWords(locale);
    const group = await this.groups.getDto(slug, locale);
    if ((await this.groups.roleOf(caller, group.id)) !== 'organiser') {
      throw new ForbiddenException(say('refusals.invitations.organiserInvites'));
    }
    const existingUser = await this.users.findOne({ where: { email: req.email } });
    if (
      existingUser &&
      (await this.db.getRepository(GroupMembership).exists({ where: { groupId: group.id, userId: existingUser.id } }))
    ) {
      throw new ConflictException(say('refusals.invitations.alreadyIn', { email: req.email, group: group.name }));
    }
    const inviter = await this.users.findOneOrFail({ where: { id: caller.id } });
    const token = randomBytes(32).toString('base64url');
    const expiresAt = new Date(now.getTime() + INVITATION_DAYS * 86_400_000);
    const row = await this.db.transaction(async (tx) => {
      await tx.delete(InvitationRow, { groupId: group.id, email: req.email, acceptedAt: IsNull() });
      return tx.save(
        InvitationRow,
        tx.create(InvitationRow, {
          groupId: group.id,
          email: req.email,
          role: req.role,
          tokenHash: hashToken(token),
          invitedBy: caller.id,
          expiresAt,
        }),
      );
    });
    const message = invitationEmail({
      inviterName: inviter.displayName,
      groupName: group.name,
      town: group.town,
      state: group.state,
      role: req.role,
      link: `${this.config.publicUrl}/invitations/${token}`,
      days: INVITATION_DAYS,
      locale,
    });
    await this.mail.send({ to: req.email, ...message, kind: 'invitation', groupId: group.id });
    return toInvitation(row);
  }

  /** Pending and accepted invitations of a group, newest first, for its organisers. */
  async list(slug: string, caller: AuthenticatedUser, locale: WordLocale = 'en'): Promise<Invitation[]> {
    const group = await this.groups.getDto(slug, locale);
    if ((await this.groups.roleOf(caller, group.id)) !== 'organiser') {
      throw new ForbiddenException(apiWords(locale)('refusals.invitations.organiserSees'));
    }
    const rows = await this.invitations.find({ where: { groupId: group.id }, order: { createdAt: 'DESC' } });
    return rows.map(toInvitation);
  }

  async preview(token: string, locale: WordLocale = 'en', now = new Date()): Promise<InvitationPreview> {
    const { row, group } = await this.open(token, now, locale);
    const accountExists = await this.users.exists({ where: { email: row.email } });
    return {
      groupSlug: group.slug,
      groupName: group.name,
      town: group.town,
      state: group.state,
      role: row.role,
      email: row.email,
      accountExists,
      expiresAt: row.expiresAt.toISOString(),
    };
  }

  /**
   * Joins the group: a signed-in person whose address the invitation names, or a new account made from
   * the invitation's address with the name and password given. One transaction: no account without its
   * membership, no membership from a used link.
   */
  async accept(
    token: string,
    caller: AuthenticatedUser | null,
    req: AcceptInvitationRequest,
    locale: WordLocale = 'en',
    now = new Date(),
  ): Promise<AuthResponse> {
    const say = apiWords(locale);
    const { row } = await this.open(token, now, locale);
    let userId: string;
    if (caller) {
      if (caller.email.toLowerCase() !== row.email) {
        throw new ForbiddenException(say('invitations.otherAddress', { email: row.email }));
      }
      userId = caller.id;
    } else {
      if (await this.users.exists({ where: { email: row.email } })) {
        throw new ConflictException(say('invitations.accountExists', { email: row.email }));
      }
      const missing = (['displayName', 'password'] as const).filter((f) => !req[f]);
      if (missing.length) {
        throw badRequest(
          missing.map((field) => ({ field, message: say('invitations.requiredForAccount') })),
          say('invitations.needNameAndPassword'),
        );
      }
      assertStrongPassword(req.password!, { email: row.email, displayName: req.displayName }, 'password', locale);
      userId = '';
    }
    const passwordHash = caller ? null : await hashPassword(req.password!);
    const joinedId = await this.db.transaction(async (tx) => {
      // Claim the link first: a second accept racing this one finds it used and writes nothing.
      const claimed = await tx.update(InvitationRow, { id: row.id, acceptedAt: IsNull() }, { acceptedAt: now });
      if (!claimed.affected) throw new GoneException(say('invitations.used'));
      let id = userId;
      if (!caller) {
        const user = await tx.save(
          User,
          tx.create(User, {
            email: row.email,
            displayName: req.displayName!,
            passwordHash: passwordHash!,
            role: 'member',
            isDemo: false,
          }),
        );
        id = user.id;
      }
      const existing = await tx.findOne(GroupMembership, { where: { groupId: row.groupId, userId: id } });
      await tx.save(
        GroupMembership,
        existing
          ? { ...existing, role: row.role }
          : tx.create(GroupMembership, { groupId: row.groupId, userId: id, role: row.role }),
      );
      return id;
    });
    return this.auth.tokenFor(joinedId);
  }

  private async open(
    token: string,
    now: Date,
    locale: WordLocale = 'en',
  ): Promise<{ row: InvitationRow; group: Group }> {
    const say = apiWords(locale);
    const row = await this.invitations.findOne({ where: { tokenHash: hashToken(token) } });
    if (!row) throw new NotFoundException(say('invitations.notOurs'));
    if (row.acceptedAt) throw new GoneException(say('invitations.used'));
    if (row.expiresAt.getTime() < now.getTime()) throw new GoneException(say('invitations.expired'));
    const group = await this.db.getRepository(Group).findOneByOrFail({ id: row.groupId });
    return { row, group };
  }
}

function toInvitation(r: InvitationRow): Invitation {
  return {
    id: r.id,
    email: r.email,
    role: r.role,
    expiresAt: r.expiresAt.toISOString(),
    acceptedAt: r.acceptedAt ? r.acceptedAt.toISOString() : null,
  };
}
