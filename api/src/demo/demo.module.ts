import { Module } from '@nestjs/common';
import { DemoDataService } from './demo-data.service.js';

@Module({ providers: [DemoDataService], exports: [DemoDataService] })
export class DemoModule {}
