import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { BatchesModule } from '../batches/batches.module.js';
import { GroupsModule } from '../groups/groups.module.js';
import { SeasonMailController } from './season-mail.controller.js';
import { SeasonMailService } from './season-mail.service.js';
import { WeeklySummarySentRow } from './weekly-summary-sent.entity.js';

/** Frost warnings and weekly summaries to growers (mail goes through the global MailService). */
@Module({
  imports: [TypeOrmModule.forFeature([WeeklySummarySentRow]), BatchesModule, GroupsModule],
  controllers: [SeasonMailController],
  providers: [SeasonMailService],
})
export class SeasonMailModule {}
