import { Injectable, type NestMiddleware } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { NextFunction, Request, Response } from 'express';
import { DataSource } from 'typeorm';
import { dialectOf } from '../common/database/dialect.js';
import { SpeciesStore } from './species-store.service.js';

/**
 * On PostgreSQL, where several API instances may share the database, checks the shared catalogue mark
 * before every request (one indexed single-row read) and rebuilds this instance's read models when another
 * instance has written: a curator's edit is seen everywhere at once. The embedded SQLite database belongs
 * to one process, whose own writes already rebuild it, so there the check is skipped.
 */
@Injectable()
export class CatalogueSyncMiddleware implements NestMiddleware {
  private readonly shared: boolean;

  constructor(
    private readonly store: SpeciesStore,
    @InjectDataSource() db: DataSource,
  ) {
    this.shared = dialectOf(db) === 'postgres';
  }

  use(_req: Request, _res: Response, next: NextFunction): void {
    if (!this.shared) return next();
    this.store.syncWithDatabase().then(() => next(), next);
  }
}
