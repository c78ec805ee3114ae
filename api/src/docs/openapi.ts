import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import { API_VERSION } from '../config/app-config.js';

/** OpenAPI at /api/docs; the UI's files come from the installed swagger-ui-dist package, never a CDN. */
export function setUpOpenApi(app: INestApplication): void {
  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Homeground API')
      .setDescription('Native species for your ground: catalogue, mixes, seasons and plant shares.')
      .setVersion(API_VERSION)
      .addBearerAuth()
      .build(),
  );
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs/openapi.json' });
}
