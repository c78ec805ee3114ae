import { Inject, Module, type OnModuleInit } from '@nestjs/common';
import { CATALOGUE_LOADED, CatalogueModule } from '../catalogue/catalogue.module.js';
import { EcoregionsController } from './ecoregions.controller.js';
import { EcoregionsService } from './ecoregions.service.js';

@Module({
  imports: [CatalogueModule],
  controllers: [EcoregionsController],
  providers: [EcoregionsService],
  exports: [EcoregionsService],
})
export class EcoregionsModule implements OnModuleInit {
  constructor(
    @Inject(CATALOGUE_LOADED) _loaded: unknown,
    private readonly ecoregions: EcoregionsService,
  ) {}

  onModuleInit(): Promise<void> {
    return this.ecoregions.reload();
  }
}
