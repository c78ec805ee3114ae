import { Module } from '@nestjs/common';
import { getDataSourceToken } from '@nestjs/typeorm';
import { loadCatalogue } from '@homeground/species-data';
import type { DataSource } from 'typeorm';
import { loadCatalogueIntoDatabase } from './catalogue-loader.js';

/** Resolves once the curated catalogue is in SQLite; providers that read it inject this token first. */
export const CATALOGUE_LOADED = Symbol('CATALOGUE_LOADED');

@Module({
  providers: [
    {
      provide: CATALOGUE_LOADED,
      inject: [getDataSourceToken()],
      // Migrations have run when the data source resolves; loading is idempotent.
      useFactory: (db: DataSource) => loadCatalogueIntoDatabase(db, loadCatalogue()),
    },
  ],
  exports: [CATALOGUE_LOADED],
})
export class CatalogueModule {}
