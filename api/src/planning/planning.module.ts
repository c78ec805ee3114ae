import { Module } from '@nestjs/common';
import { MixContextModule } from '../mix-context/mix-context.module.js';
import { CalendarService } from './calendar.service.js';
import { PlanningController } from './planning.controller.js';

/** Quantities and the sowing calendar for any list of species (a mix, a season plan, a batch). */
@Module({
  imports: [MixContextModule],
  controllers: [PlanningController],
  providers: [CalendarService],
})
export class PlanningModule {}
