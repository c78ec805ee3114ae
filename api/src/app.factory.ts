import type { INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication, NestExpressBodyParserOptionsFor } from '@nestjs/platform-express';
import helmet from 'helmet';
import { AppModule } from './app.module.js';
import { ApiExceptionFilter } from './common/filters/api-exception.filter.js';
import { verifyJsonDepth } from './common/http/json-depth.js';
import { UnexpectedInputInterceptor } from './common/validation/unexpected-input.interceptor.js';
import { APP_CONFIG, type AppConfig } from './config/app-config.js';
import { setUpOpenApi } from './docs/openapi.js';

/**
 * Everything main.ts and the e2e tests share: prefix, security headers, body limits, errors, docs.
 * Validation is per parameter (ZodBody, ZodQuery, ZodParam in common/decorators), not a global pipe.
 */
export function configureApp(app: NestExpressApplication): INestApplication {
  app.setGlobalPrefix('api');
  // Forwarding headers are believed only from the proxies the configuration names (none by default), so
  // the sign-in limits cannot be dodged by sending a made-up X-Forwarded-For.
  app.set('trust proxy', app.get<AppConfig>(APP_CONFIG).trustProxy);
  app.disable('x-powered-by');
  // Security headers come first, so every answer carries them, including the species list cache's
  // (a module middleware, which Nest mounts after these).
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          'default-src': ["'self'"],
          'script-src': ["'self'"],
          'script-src-attr': ["'none'"],
          // Fluent UI writes its styles at run time (style elements), which needs 'unsafe-inline' for styles
          // only; scripts stay 'self'. No https: sources: every font, image and style is our own file.
          'style-src': ["'self'", "'unsafe-inline'"],
          // data: for the small font subsets the web build inlines into its CSS.
          'font-src': ["'self'", 'data:'],
          'img-src': ["'self'", 'data:', 'blob:'],
          'connect-src': ["'self'"],
          'object-src': ["'none'"],
          'base-uri': ["'self'"],
          'form-action': ["'self'"],
          // Nobody frames Homeground (clickjacking); X-Frame-Options says the same to older browsers.
          'frame-ancestors': ["'none'"],
          // Served over plain http on localhost; upgrading would break every request.
          'upgrade-insecure-requests': null,
        },
      },
      frameguard: { action: 'deny' },
    }),
  );
  // CORS is closed unless CORS_ORIGINS names other sites: without the header a browser keeps other sites'
  // pages from reading any answer. Bearer tokens, not cookies, so credentials are never allowed.
  const { corsOrigins } = app.get<AppConfig>(APP_CONFIG);
  if (corsOrigins.length) app.enableCors({ origin: corsOrigins, credentials: false, maxAge: 600 });
  // 1 MB at most, and no deeper than MAX_JSON_DEPTH: checked on the raw bytes before JSON.parse.
  // Nest's option type leaves `verify` out because it uses the hook for `rawBody`, which this app never
  // turns on, so ours is the only one and is passed through to body-parser.
  const jsonOptions = { limit: '1mb', verify: verifyJsonDepth };
  app.useBodyParser('json', jsonOptions as NestExpressBodyParserOptionsFor<'json'>);
  app.useGlobalInterceptors(new UnexpectedInputInterceptor());
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
