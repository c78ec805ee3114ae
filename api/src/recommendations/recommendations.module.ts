import { Module } from '@nestjs/common';
import { MixContextModule } from '../mix-context/mix-context.module.js';
import { MixesService } from './mixes.service.js';
import { RecommendationsController } from './recommendations.controller.js';

/** The engine's answers for a site: ranked species, a balanced mix, and swap suggestions. */
@Module({
  imports: [MixContextModule],
  controllers: [RecommendationsController],
  providers: [MixesService],
})
export class RecommendationsModule {}
