import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { GroupsModule } from '../groups/groups.module.js';
import { MixContextModule } from '../mix-context/mix-context.module.js';
import { SeasonTargetRow } from './season-target.entity.js';
import { SeasonRow } from './season.entity.js';
import { SeasonsController } from './seasons.controller.js';
import { SeasonsService } from './seasons.service.js';

/** A group's season plan: dates, share list, targets and seed list. */
@Module({
  imports: [TypeOrmModule.forFeature([SeasonRow, SeasonTargetRow]), GroupsModule, MixContextModule],
  controllers: [SeasonsController],
  providers: [SeasonsService],
  exports: [SeasonsService],
})
export class SeasonsModule {}
