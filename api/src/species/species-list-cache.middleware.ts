import { Injectable, type NestMiddleware } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';
import { SpeciesStore } from './species-store.service.js';

/**
 * Answers a repeated `GET /api/species?…` straight from the store's byte cache, before routing,
 * validation and serialisation. Only URLs that the controller has already validated and answered
 * are in the cache, and every curator edit clears it, so this never serves a stale or unchecked page.
 * SpeciesModule mounts it for the list route only; it runs after the app-wide security headers, so a
 * cached answer carries the same headers as a fresh one.
 */
@Injectable()
export class SpeciesListCacheMiddleware implements NestMiddleware {
  constructor(private readonly store: SpeciesStore) {}

  use(req: Request, res: Response, next: NextFunction): void {
    const body = req.method === 'GET' ? this.store.cachedForUrl(req.originalUrl) : undefined;
    if (!body) return next();
    res.setHeader('Content-Type', 'application/json; charset=utf-8');
    res.setHeader('Content-Length', body.length);
    res.setHeader('Cache-Control', 'no-cache');
    res.status(200).end(body);
  }
}
