import type { INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type { NextFunction, Request, Response } from 'express';
import helmet from 'helmet';
import { AppModule } from './app.module.js';
import { ApiExceptionFilter } from './common/filters/api-exception.filter.js';
import { createValidationPipe } from './common/validation/validation-pipe.js';
import { APP_CONFIG, type AppConfig } from './config/app-config.js';
import { setUpOpenApi } from './docs/openapi.js';
import { SpeciesListCacheMiddleware } from './species/species-list-cache.middleware.js';

/** Everything main.ts and the e2e tests share: prefix, security headers, validation, errors, docs. */
export function configureApp(app: NestExpressApplication): INestApplication {
  app.setGlobalPrefix('api');
  app.set('trust proxy', 'loopback');
  app.disable('x-powered-by');
  // First in the chain: repeated catalogue list pages are answered from memory before any other work.
  const listCache = app.get(SpeciesListCacheMiddleware);
  app.use('/api/species', (req: Request, res: Response, next: NextFunction) => listCache.use(req, res, next));
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          // Fluent UI writes its styles at run time; fonts and images are our own files.
          'style-src': ["'self'", "'unsafe-inline'"],
          'font-src': ["'self'", 'data:'],
          'img-src': ["'self'", 'data:', 'blob:'],
          'connect-src': ["'self'"],
          // Served over plain http on localhost; upgrading would break every request.
          'upgrade-insecure-requests': null,
        },
      },
    }),
  );
  app.useBodyParser('json', { limit: '1mb' });
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(new ApiExceptionFilter());
  app.enableShutdownHooks();
  setUpOpenApi(app);
  return app;
}

export async function createApp(): Promise<{ app: NestExpressApplication; config: AppConfig }> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule, { bufferLogs: true });
  configureApp(app);
  const config = app.get<AppConfig>(APP_CONFIG);
  app.useLogger(levelsFrom(config.logLevel));
  return { app, config };
}

function levelsFrom(level: AppConfig['logLevel']) {
  const order = ['error', 'warn', 'log', 'debug', 'verbose'] as const;
  return order.slice(0, order.indexOf(level) + 1);
}
