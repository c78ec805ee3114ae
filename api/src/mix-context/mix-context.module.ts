import { Module } from '@nestjs/common';
import { EcoregionsModule } from '../ecoregions/ecoregions.module.js';
import { SpeciesModule } from '../species/species.module.js';
import { MixContextService } from './mix-context.service.js';

/** The catalogue and region read model every engine endpoint (recommendations, saved mixes, planning) uses. */
@Module({
  imports: [SpeciesModule, EcoregionsModule],
  providers: [MixContextService],
  exports: [MixContextService],
})
export class MixContextModule {}
