import { Module } from '@nestjs/common';
import { HealthController } from './health.controller.js';
import { MixContextModule } from '../mix-context/mix-context.module.js';

@Module({ imports: [MixContextModule], controllers: [HealthController] })
export class HealthModule {}
