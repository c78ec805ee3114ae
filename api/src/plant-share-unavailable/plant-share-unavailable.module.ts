import { Module } from '@nestjs/common';
import { PlantShareUnavailableController } from './plant-share-unavailable.controller.js';

/** Stands in for the plant share on PostgreSQL (see the controller for why). */
@Module({ controllers: [PlantShareUnavailableController] })
export class PlantShareUnavailableModule {}
