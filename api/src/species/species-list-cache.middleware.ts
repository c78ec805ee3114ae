import { Injectable, type NestMiddleware } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';
import { SpeciesStore } from './species-store.service.js';

/**
 * Answers a repeated `GET /api/species?…` straight from the store's byte cache, before routing,
 * validation and serialisation. Only URLs that the controller has already validated and answered
 * are in the cache, and every curator edit clears it, so this never serves a stale or unchecked page.
 */
@Injectable()
export class SpeciesListCacheMiddleware implements NestMiddleware {
  constructor(private readonly store: SpeciesStore) {}

  use(req: Request, res: Response, next: NextFunction): void {
    const body = req.method === 'GET' ? this.store.cachedForUrl(req.originalUrl) : undefined;
    if (!body) return next();
    res.writeHead(200, {
      'Content-Type': 'application/json; charset=utf-8',
      'Content-Length': body.length,
      'X-Content-Type-Options': 'nosniff',
      'Cache-Control': 'no-cache',
    });
    res.end(body);
  }
}
