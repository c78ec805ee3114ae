import { Module } from '@nestjs/common';
import { MixContextModule } from '../mix-context/mix-context.module.js';
import { DemoDataService } from './demo-data.service.js';

@Module({ imports: [MixContextModule], providers: [DemoDataService], exports: [DemoDataService] })
export class DemoModule {}
