import {
  Inject,
  type MiddlewareConsumer,
  Module,
  type NestModule,
  type OnModuleInit,
  RequestMethod,
} from '@nestjs/common';
import { CATALOGUE_LOADED, CatalogueModule } from '../catalogue/catalogue.module.js';
import { EcoregionsModule } from '../ecoregions/ecoregions.module.js';
import { TypeOrmModule } from '@nestjs/typeorm';
import { SpeciesChangeRow } from './species-change.entity.js';
import { SpeciesHistoryService } from './species-history.service.js';
import { CatalogueSyncMiddleware } from './catalogue-sync.middleware.js';
import { SpeciesListCacheMiddleware } from './species-list-cache.middleware.js';
import { SpeciesPhotosService } from './species-photos.service.js';
import { SpeciesReferenceController } from './species-reference.controller.js';
import { SpeciesReferenceService } from './species-reference.service.js';
import { SpeciesSourcesController } from './species-sources.controller.js';
import { SpeciesSourcesService } from './species-sources.service.js';
import { SpeciesStore } from './species-store.service.js';
import { SpeciesController } from './species.controller.js';
import { SpeciesService } from './species.service.js';

@Module({
  imports: [CatalogueModule, EcoregionsModule, TypeOrmModule.forFeature([SpeciesChangeRow])],
  controllers: [SpeciesController, SpeciesSourcesController, SpeciesReferenceController],
  providers: [
    SpeciesService,
    SpeciesSourcesService,
    SpeciesReferenceService,
    SpeciesHistoryService,
    SpeciesStore,
    SpeciesPhotosService,
    SpeciesListCacheMiddleware,
    CatalogueSyncMiddleware,
  ],
  exports: [SpeciesStore],
})
export class SpeciesModule implements OnModuleInit, NestModule {
  constructor(
    @Inject(CATALOGUE_LOADED) _loaded: unknown,
    private readonly store: SpeciesStore,
  ) {}

  /** The catalogue is in SQLite by now (CATALOGUE_LOADED); build the read model. */
  onModuleInit(): Promise<void> {
    return this.store.reload();
  }

  /**
   * Every request first catches up with other instances' catalogue writes (PostgreSQL only); then repeated
   * list pages are answered from memory. Module middleware runs after the app-wide headers.
   */
  configure(consumer: MiddlewareConsumer): void {
    consumer.apply(CatalogueSyncMiddleware).forRoutes({ path: '*path', method: RequestMethod.ALL });
    consumer.apply(SpeciesListCacheMiddleware).forRoutes({ path: 'species', method: RequestMethod.GET });
  }
}
