import { Module } from '@nestjs/common';
import { EcoregionsModule } from '../ecoregions/ecoregions.module.js';
import { PlacesController } from './places.controller.js';
import { PlacesService } from './places.service.js';

@Module({
  imports: [EcoregionsModule],
  controllers: [PlacesController],
  providers: [PlacesService],
  exports: [PlacesService],
})
export class PlacesModule {}
