import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { MixContextModule } from '../mix-context/mix-context.module.js';
import { SavedMixRow } from './saved-mix.entity.js';
import { SavedMixesController } from './saved-mixes.controller.js';
import { SavedMixesService } from './saved-mixes.service.js';

/** Mixes people keep: saved under their account, opened by anyone with the link. */
@Module({
  imports: [TypeOrmModule.forFeature([SavedMixRow]), MixContextModule],
  controllers: [SavedMixesController],
  providers: [SavedMixesService],
  // The plant share's "fits my yard" opens a saved mix by its link id for its site and place.
  exports: [SavedMixesService],
})
export class SavedMixesModule {}
