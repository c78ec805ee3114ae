import { existsSync } from 'node:fs';
import { type DynamicModule, Module } from '@nestjs/common';
import { ServeStaticModule } from '@nestjs/serve-static';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuthModule } from './auth/auth.module.js';
import { APP_CONFIG, type AppConfig } from './config/app-config.js';
import { AppConfigModule } from './config/config.module.js';
import { databaseOptions, openDataSource } from './database/data-source.js';
import { DemoModule } from './demo/demo.module.js';
import { GroupsModule } from './groups/groups.module.js';
import { HealthModule } from './health/health.module.js';
import { SpeciesModule } from './species/species.module.js';
import { EcoregionsModule } from './ecoregions/ecoregions.module.js';
import { PlacesModule } from './places/places.module.js';
import { PlanningModule } from './planning/planning.module.js';
import { RecommendationsModule } from './recommendations/recommendations.module.js';
import { SavedMixesModule } from './saved-mixes/saved-mixes.module.js';
import { UsersModule } from './users/users.module.js';
import { PeopleModule } from './people/people.module.js';
import { MailModule } from './mail/mail.module.js';
import { InvitationsModule } from './invitations/invitations.module.js';
import { SeasonsModule } from './seasons/seasons.module.js';
import { PlantShareModule } from './plant-share/plant-share.module.js';
import { BatchesModule } from './batches/batches.module.js';
import { SeasonMailModule } from './season-mail/season-mail.module.js';

/** The built web app with SPA fallback; unknown /api routes still answer JSON 404s. */
function webApp(): DynamicModule[] {
  return [
    ServeStaticModule.forRootAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) =>
        existsSync(config.webDist) ? [{ rootPath: config.webDist, exclude: ['/api/{*path}'] }] : [],
    }),
  ];
}

@Module({
  imports: [
    AppConfigModule,
    TypeOrmModule.forRootAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => databaseOptions(config),
      dataSourceFactory: (options) => openDataSource(options!),
    }),
    ...webApp(),
    MailModule,
    AuthModule,
    UsersModule,
    PeopleModule,
    GroupsModule,
    InvitationsModule,
    HealthModule,
    SpeciesModule,
    EcoregionsModule,
    PlacesModule,
    RecommendationsModule,
    SavedMixesModule,
    PlanningModule,
    SeasonsModule,
    PlantShareModule,
    BatchesModule,
    SeasonMailModule,
    DemoModule,
  ],
})
export class AppModule {}
