import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { OutboxMessage, WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { In, Repository } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { GroupMembership } from '../groups/group-membership.entity.js';
import type { ReceivedMail } from './local-smtp-server.js';
import { GROUP_HEADER, KIND_HEADER } from './mail-message.js';
import { OutboxMessageRow } from './outbox-message.entity.js';

/** The local outbox keeps the newest messages only: it is a window on what went out, not an archive. */
export const OUTBOX_KEEP = 500;

@Injectable()
export class OutboxService {
  constructor(
    @InjectRepository(OutboxMessageRow) private readonly rows: Repository<OutboxMessageRow>,
    @InjectRepository(GroupMembership) private readonly memberships: Repository<GroupMembership>,
  ) {}

  async keep(mail: ReceivedMail): Promise<void> {
    await this.rows.save(
      this.rows.create({
        messageId: mail.messageId,
        from: mail.from,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        kind: headerText(mail.headers, KIND_HEADER) ?? 'other',
        groupId: headerText(mail.headers, GROUP_HEADER),
      }),
    );
    const stale = await this.rows.find({ select: { id: true }, order: { receivedAt: 'DESC' }, skip: OUTBOX_KEEP });
    if (stale.length) await this.rows.delete({ id: In(stale.map((r) => r.id)) });
  }

  /** Deletes a group's kept messages whose kind starts with `kindPrefix` (personal data past its retention). */
  async forget(groupId: string, kindPrefix: string): Promise<void> {
    await this.rows
      .createQueryBuilder()
      .delete()
      .where('group_id = :groupId AND kind LIKE :kind', { groupId, kind: `${kindPrefix}%` })
      .execute();
  }

  /** Admins read every message; organisers read the messages about the groups they organise. */
  async list(
    caller: AuthenticatedUser,
    filter: { kind?: string; to?: string } = {},
    locale: WordLocale = 'en',
  ): Promise<OutboxMessage[]> {
    const groups = await this.readableGroups(caller);
    if (groups !== 'all' && groups.length === 0) {
      throw new ForbiddenException(apiWords(locale)('refusals.outbox.readersOnly'));
    }
    const where = {
      ...(groups === 'all' ? {} : { groupId: In(groups) }),
      ...(filter.kind ? { kind: filter.kind } : {}),
    };
    const rows = await this.rows.find({ where, order: { receivedAt: 'DESC' }, take: 200 });
    const to = filter.to?.toLowerCase();
    return rows.filter((r) => !to || r.to.includes(to)).map(toOutboxMessage);
  }

  async get(caller: AuthenticatedUser, id: string, locale: WordLocale = 'en'): Promise<OutboxMessage> {
    const say = apiWords(locale);
    const row = await this.rows.findOne({ where: { id } });
    if (!row) throw new NotFoundException(say('refusals.outbox.noMessage'));
    const groups = await this.readableGroups(caller);
    if (groups !== 'all' && !(row.groupId && groups.includes(row.groupId))) {
      throw new ForbiddenException(say('refusals.outbox.messageReaders'));
    }
    return toOutboxMessage(row);
  }

  private async readableGroups(caller: AuthenticatedUser): Promise<'all' | string[]> {
    if (caller.role === 'admin') return 'all';
    const organised = await this.memberships.find({ where: { userId: caller.id, role: 'organiser' } });
    return organised.map((m) => m.groupId);
  }
}

function headerText(headers: Map<string, unknown>, name: string): string | null {
  const v = headers.get(name.toLowerCase());
  return typeof v === 'string' && v.trim() ? v.trim() : null;
}

function toOutboxMessage(r: OutboxMessageRow): OutboxMessage {
  return {
    id: r.id,
    from: r.from,
    to: r.to,
    subject: r.subject,
    text: r.text,
    html: r.html,
    kind: r.kind,
    groupId: r.groupId,
    receivedAt: r.receivedAt.toISOString(),
  };
}
