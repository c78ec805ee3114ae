import { Global, Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { GroupMembership } from '../groups/group-membership.entity.js';
import { MailService } from './mail.service.js';
import { OutboxMessageRow } from './outbox-message.entity.js';
import { OutboxController } from './outbox.controller.js';
import { OutboxService } from './outbox.service.js';

/** Outgoing e-mail for every feature (invitations, frost warnings, reservation confirmations). */
@Global()
@Module({
  imports: [TypeOrmModule.forFeature([OutboxMessageRow, GroupMembership])],
  controllers: [OutboxController],
  providers: [MailService, OutboxService],
  exports: [MailService],
})
export class MailModule {}
