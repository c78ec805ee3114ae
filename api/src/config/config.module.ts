import { Global, Module } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { APP_CONFIG, buildAppConfig } from './app-config.js';
import { validateEnv } from './env.validation.js';

/** Validates the environment once and provides the typed AppConfig everywhere. */
@Global()
@Module({
  imports: [ConfigModule.forRoot({ validate: validateEnv, ignoreEnvFile: true, cache: true })],
  providers: [{ provide: APP_CONFIG, inject: [ConfigService], useFactory: buildAppConfig }],
  exports: [APP_CONFIG],
})
export class AppConfigModule {}
