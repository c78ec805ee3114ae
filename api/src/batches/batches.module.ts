import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { GroupsModule } from '../groups/groups.module.js';
import { MixContextModule } from '../mix-context/mix-context.module.js';
import { SeasonsModule } from '../seasons/seasons.module.js';
import { BatchLogEntryRow } from './batch-log-entry.entity.js';
import { BatchRow } from './batch.entity.js';
import { BatchesController } from './batches.controller.js';
import { BatchesService } from './batches.service.js';
import { SeasonGrowerRow } from './season-grower.entity.js';

/**
 * Growers and batches of a season. Exports BatchesService for the plant share, which takes its
 * starting stock from `readyCountsBySpecies(seasonId)`.
 */
@Module({
  imports: [
    TypeOrmModule.forFeature([SeasonGrowerRow, BatchRow, BatchLogEntryRow]),
    GroupsModule,
    MixContextModule,
    SeasonsModule,
  ],
  controllers: [BatchesController],
  providers: [BatchesService],
  exports: [BatchesService],
})
export class BatchesModule {}
