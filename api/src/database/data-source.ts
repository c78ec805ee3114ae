import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { DataSource, type DataSourceOptions } from 'typeorm';
import type { AppConfig } from '../config/app-config.js';
import { GroupMembership } from '../groups/group-membership.entity.js';
import { Group } from '../groups/group.entity.js';
import { User } from '../users/user.entity.js';
import { CreateUsersAndGroups1764633600000 } from './migrations/1764633600000-create-users-and-groups.js';
import { CreateCatalogue1764720000000 } from './migrations/1764720000000-create-catalogue.js';
import { CreateEcoregionBoundaries1764806400000 } from './migrations/1764806400000-create-ecoregion-boundaries.js';
import { CreateSavedMixes1764892800000 } from './migrations/1764892800000-create-saved-mixes.js';
import { CreateOutbox1764979200000 } from './migrations/1764979200000-create-outbox.js';
import { AllowGroupMembers1765022400000 } from './migrations/1765022400000-allow-group-members.js';
import { CreateGroupInvitations1765065600000 } from './migrations/1765065600000-create-group-invitations.js';
import { CreateSeasons1765152000000 } from './migrations/1765152000000-create-seasons.js';
import { CreatePlantShares1765238400000 } from './migrations/1765238400000-create-plant-shares.js';
import { AddSignInActivity1765411200000 } from './migrations/1765411200000-add-sign-in-activity.js';
import { AddAccountDisabled1765497600000 } from './migrations/1765497600000-add-account-disabled.js';
import { CreateSpeciesChanges1765584000000 } from './migrations/1765584000000-create-species-changes.js';
import { AddPhotoCredits1765670400000 } from './migrations/1765670400000-add-photo-credits.js';
import { CreatePendingRegistrations1766300000000 } from './migrations/1766300000000-create-pending-registrations.js';
import { AddReservationLinePosition1766400000000 } from './migrations/1766400000000-add-reservation-line-position.js';
import { PendingRegistrationRow } from '../auth/pending-registration.entity.js';
import { AddTakerLocale1765800000000 } from './migrations/1765800000000-add-taker-locale.js';
import { AddShareWhatToBring1766000000000 } from './migrations/1766000000000-add-share-what-to-bring.js';
import { SpeciesChangeRow } from '../species/species-change.entity.js';
import { SignInFailureRow } from '../auth/sign-in-failure.entity.js';
import { CreateBatches1765324800000 } from './migrations/1765324800000-create-batches.js';
import { BatchLogEntryRow } from '../batches/batch-log-entry.entity.js';
import { BatchRow } from '../batches/batch.entity.js';
import { SeasonGrowerRow } from '../batches/season-grower.entity.js';
import { InvitationRow } from '../invitations/invitation.entity.js';
import { OutboxMessageRow } from '../mail/outbox-message.entity.js';
import { SavedMixRow } from '../saved-mixes/saved-mix.entity.js';
import { SeasonTargetRow } from '../seasons/season-target.entity.js';
import { SeasonRow } from '../seasons/season.entity.js';
import { SpeciesPhoto } from '../species/species-photo.entity.js';
import { SpeciesRow } from '../species/species.entity.js';
import { CreateWeeklySummariesSent1765900000000 } from './migrations/1765900000000-create-weekly-summaries-sent.js';
import { WeeklySummarySentRow } from '../season-mail/weekly-summary-sent.entity.js';

export const ENTITIES = [
  User,
  Group,
  GroupMembership,
  SpeciesRow,
  SpeciesPhoto,
  SavedMixRow,
  OutboxMessageRow,
  InvitationRow,
  SeasonRow,
  SeasonTargetRow,
  SignInFailureRow,
  SpeciesChangeRow,
  SeasonGrowerRow,
  BatchRow,
  BatchLogEntryRow,
  PendingRegistrationRow,
  WeeklySummarySentRow,
];
export const MIGRATIONS = [
  CreateUsersAndGroups1764633600000,
  CreateCatalogue1764720000000,
  CreateEcoregionBoundaries1764806400000,
  CreateSavedMixes1764892800000,
  CreateOutbox1764979200000,
  AllowGroupMembers1765022400000,
  CreateGroupInvitations1765065600000,
  CreateSeasons1765152000000,
  CreatePlantShares1765238400000,
  AddSignInActivity1765411200000,
  AddAccountDisabled1765497600000,
  CreateSpeciesChanges1765584000000,
  AddPhotoCredits1765670400000,
  CreateBatches1765324800000,
  CreatePendingRegistrations1766300000000,
  AddTakerLocale1765800000000,
  CreateWeeklySummariesSent1765900000000,
  AddShareWhatToBring1766000000000,
  AddReservationLinePosition1766400000000,
];

/**
 * SQLite through better-sqlite3 in WAL mode with a busy timeout (the embedded default), or PostgreSQL when
 * `DATABASE_URL` is set; the same entities and migrations on both, and the schema comes only from
 * migrations, run at start.
 */
export function databaseOptions(config: Pick<AppConfig, 'databasePath' | 'databaseUrl'>): DataSourceOptions {
  const common = {
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsRun: true,
    migrationsTransactionMode: 'each' as const,
    synchronize: false,
    logging: ['error' as const],
  };
  if (config.databaseUrl) {
    return {
      type: 'postgres',
      url: config.databaseUrl,
      // gen_random_uuid() is built into PostgreSQL 13+: no extension to install (which needs more rights).
      installExtensions: false,
      uuidExtension: 'pgcrypto',
      // COUNT and SUM answer bigint, which pg hands over as text; every count here fits a JS number, as on SQLite.
      parseInt8: true,
      ...common,
    };
  }
  if (config.databasePath !== ':memory:') mkdirSync(path.dirname(config.databasePath), { recursive: true });
  return {
    type: 'better-sqlite3',
    database: config.databasePath,
    enableWAL: true,
    prepareDatabase: (db: { pragma: (s: string) => unknown }) => {
      db.pragma('foreign_keys = ON');
      db.pragma('busy_timeout = 5000');
    },
    ...common,
  };
}

/**
 * Opens (and migrates) a data source. The entities' points in time are typed `datetime`, SQLite's word,
 * which TypeORM's PostgreSQL driver reads and writes as timestamps (its value conversions name it) but
 * leaves off the list its entity check accepts; the list is widened on this one driver instance, so
 * the entities need no per-database types.
 */
export async function openDataSource(options: DataSourceOptions): Promise<DataSource> {
  const db = new DataSource(options);
  if (options.type === 'postgres') db.driver.supportedDataTypes.push('datetime');
  return db.initialize();
}

/** Where the data lives, for the start-up message: the SQLite file, or the server without its password. */
export function databaseLabel(config: Pick<AppConfig, 'databasePath' | 'databaseUrl'>): string {
  if (!config.databaseUrl) return config.databasePath;
  const url = new URL(config.databaseUrl);
  if (url.password) url.password = '***';
  return `PostgreSQL ${url.toString()}`;
}
