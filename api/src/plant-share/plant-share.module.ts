import { Module } from '@nestjs/common';
import { getDataSourceToken } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { BatchesModule } from '../batches/batches.module.js';
import { EcoregionsModule } from '../ecoregions/ecoregions.module.js';
import { PlacesModule } from '../places/places.module.js';
import { SavedMixesModule } from '../saved-mixes/saved-mixes.module.js';
import { GroupsModule } from '../groups/groups.module.js';
import { MixContextModule } from '../mix-context/mix-context.module.js';
import { SeasonsModule } from '../seasons/seasons.module.js';
import { Clock } from './clock.js';
import { PlantShareController } from './plant-share.controller.js';
import { PlantShareService } from './plant-share.service.js';
import { PublicShareController } from './public-share.controller.js';
import { ReservationsService } from './reservations.service.js';
import { ShareLedger } from './share-ledger.js';
import { ShareMailQueue } from './share-mail-queue.js';
import { ShareTxRunner } from './share-tx.js';
import { SharePurgeService } from './share-purge.service.js';
import { ShareViews } from './share-views.js';

/** The plant share: what is on offer, reservations with limits and slots, pickup day, the season report. */
@Module({
  imports: [
    GroupsModule,
    SeasonsModule,
    MixContextModule,
    BatchesModule,
    PlacesModule,
    SavedMixesModule,
    EcoregionsModule,
  ],
  controllers: [PlantShareController, PublicShareController],
  providers: [
    Clock,
    // One runner for the app's data source: on SQLite it keeps the prepared statements between requests.
    { provide: ShareTxRunner, useFactory: (db: DataSource) => new ShareTxRunner(db), inject: [getDataSourceToken()] },
    ShareMailQueue,
    ShareLedger,
    ShareViews,
    PlantShareService,
    ReservationsService,
    SharePurgeService,
  ],
  exports: [ShareTxRunner, ShareLedger],
})
export class PlantShareModule {}
