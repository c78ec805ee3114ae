import { Module, type OnModuleInit } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { loadCatalogue } from '@homeground/species-data';
import { DataSource } from 'typeorm';
import { loadCatalogueIntoDatabase } from '../catalogue/catalogue-loader.js';
import { SpeciesListCacheMiddleware } from './species-list-cache.middleware.js';
import { SpeciesPhotosService } from './species-photos.service.js';
import { SpeciesStore } from './species-store.service.js';
import { SpeciesController } from './species.controller.js';
import { SpeciesService } from './species.service.js';

@Module({
  controllers: [SpeciesController],
  providers: [SpeciesService, SpeciesStore, SpeciesPhotosService, SpeciesListCacheMiddleware],
  exports: [SpeciesStore, SpeciesListCacheMiddleware],
})
export class SpeciesModule implements OnModuleInit {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly store: SpeciesStore,
  ) {}

  /** Migrations have run by now; load the curated catalogue (idempotent) and build the read model. */
  async onModuleInit(): Promise<void> {
    await loadCatalogueIntoDatabase(this.db, loadCatalogue());
    await this.store.reload();
  }
}
