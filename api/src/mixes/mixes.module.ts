import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { EcoregionsModule } from '../ecoregions/ecoregions.module.js';
import { SpeciesModule } from '../species/species.module.js';
import { CalendarService } from './calendar.service.js';
import { MixContextService } from './mix-context.service.js';
import { MixesController } from './mixes.controller.js';
import { MixesService } from './mixes.service.js';
import { PlanningController } from './planning.controller.js';
import { SavedMixRow } from './saved-mix.entity.js';
import { SavedMixesService } from './saved-mixes.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([SavedMixRow]), SpeciesModule, EcoregionsModule],
  controllers: [MixesController, PlanningController],
  providers: [MixContextService, MixesService, SavedMixesService, CalendarService],
})
export class MixesModule {}
