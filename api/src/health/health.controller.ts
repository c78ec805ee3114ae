import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { InjectDataSource } from '@nestjs/typeorm';
import { type HealthResponse, healthResponseSchema, type StatsResponse, statsResponseSchema } from '@homeground/shared';
import { DataSource } from 'typeorm';
import { API_VERSION } from '../config/app-config.js';
import { ZodResponse } from '../common/decorators/zod.decorators.js';

const STARTED_AT = Date.now();

@ApiTags('system')
@Controller()
export class HealthController {
  constructor(@InjectDataSource() private readonly db: DataSource) {}

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
    const [species, groups, ecoregions, users] = await Promise.all(
      ['species', 'groups', 'ecoregions', 'users'].map((t) => this.countRows(t)),
    );
    return { species, groups, ecoregions, users };
  }

  private async countRows(table: string): Promise<number> {
    const exists = await this.db.query(`SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = ?`, [table]);
    if (exists.length === 0) return 0;
    const [row] = await this.db.query(`SELECT COUNT(*) AS n FROM "${table}"`);
    return Number(row.n);
  }
}
