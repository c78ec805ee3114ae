import { Controller, Get, Header, Inject } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  coveredEcoregionCodes,
  type HealthResponse,
  healthResponseSchema,
  type SiteInfoResponse,
  siteInfoResponseSchema,
  type StatsResponse,
  statsResponseSchema,
} from '@homeground/shared';
import { DataSource } from 'typeorm';
import { API_VERSION, APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { ZodResponse } from '../common/decorators/zod.decorators.js';
import { MixContextService } from '../mix-context/mix-context.service.js';
import { Public } from '../common/decorators/public.decorator.js';
import { tableExists } from '../common/database/dialect.js';

const STARTED_AT = Date.now();

@ApiTags('system')
@Public()
@Controller()
export class HealthController {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly ctx: MixContextService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** The site's public address (PUBLIC_URL), for QR codes and links that are printed or shared. */
  @Get('site')
  @Header('Cache-Control', 'public, max-age=3600')
  @ZodResponse(siteInfoResponseSchema)
  site(): SiteInfoResponse {
    return { publicUrl: this.config.publicUrl };
  }

  /** Liveness plus a real database round trip and the count of applied migrations. */
  @Get('health')
  @ZodResponse(healthResponseSchema)
  async health(): Promise<HealthResponse> {
    let database: HealthResponse['database'] = { status: 'down', migrations: 0 };
    try {
      const [row] = await this.db.query('SELECT COUNT(*) AS n FROM "migrations"');
      database = { status: 'up', migrations: Number(row.n) };
    } catch {
      // reported as down below
    }
    return {
      status: database.status === 'up' ? 'ok' : 'degraded',
      version: API_VERSION,
      database,
      uptimeSeconds: Math.round((Date.now() - STARTED_AT) / 1000),
    };
  }

  /** Live counts for the home page. Tables that a later migration adds count as 0 until they exist. */
  @Get('stats')
  @ZodResponse(statsResponseSchema)
  async stats(): Promise<StatsResponse> {
    const [species, groups, users] = await Promise.all(['species', 'groups', 'users'].map((t) => this.countRows(t)));
    return { species, groups, ecoregions: await this.coveredEcoregions(), users };
  }

  /** Only the ecoregions the catalogue really covers (shared coverage.ts), not every row of the EPA table. */
  private async coveredEcoregions(): Promise<number> {
    if (!(await tableExists(this.db, 'ecoregions'))) return 0;
    const rows: { code: string }[] = await this.db.query(`SELECT code FROM ecoregions`);
    return coveredEcoregionCodes(
      this.ctx.species(),
      rows.map((r) => r.code),
    ).length;
  }

  private async countRows(table: string): Promise<number> {
    if (!(await tableExists(this.db, table))) return 0;
    const [row] = await this.db.query(`SELECT COUNT(*) AS n FROM "${table}"`);
    return Number(row.n);
  }
}
