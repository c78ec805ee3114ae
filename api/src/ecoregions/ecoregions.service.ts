import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { Ecoregion, EcoregionOutline, OutlineGeometry, WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { simplify } from '@turf/turf';
import { DataSource } from 'typeorm';
import { parseBoundaryUpload } from '../geometry/boundary-upload.js';
import { type AreaFeature, PolygonIndex } from '../geometry/polygon-index.js';
import { runSql } from '../common/database/dialect.js';
import { bumpCatalogueMark } from '../common/database/shared-version.js';

export interface CountyRegions {
  fips: string;
  name: string;
  state: string;
  /** Level III regions the county overlaps, largest share first. */
  ecoregions: { code: string; share: number }[];
}

export interface BoundaryImportResult {
  regions: number;
  vertices: number;
}

/**
 * The one in-memory read model of ecoregions, the county crosswalk and any imported boundary
 * polygons; the catalogue, places and the engine all read regions from here.
 */
@Injectable()
export class EcoregionsService {
  private regions = new Map<string, Ecoregion>();
  private counties = new Map<string, CountyRegions>();
  private boundaries = new PolygonIndex<{ code: string }>([]);
  /** Outlines simplified for drawing, made on first ask and dropped when the boundaries change. */
  private outlines = new Map<string, OutlineGeometry>();

  constructor(@InjectDataSource() private readonly db: DataSource) {}

  async reload(): Promise<void> {
    const [regions, counties, shares, boundaries] = await Promise.all([
      this.db.query(`SELECT record FROM ecoregions ORDER BY CAST(code AS integer)`),
      this.db.query(`SELECT fips, name, state FROM counties`),
      this.db.query(`SELECT fips, code, share FROM county_ecoregions ORDER BY fips, share DESC`),
      this.db.query(`SELECT code, geometry FROM ecoregion_boundaries`),
    ]);
    this.regions = new Map(
      regions.map((r: { record: string }) => {
        const e = JSON.parse(r.record) as Ecoregion;
        return [e.code, e];
      }),
    );
    this.counties = new Map(counties.map((c: Omit<CountyRegions, 'ecoregions'>) => [c.fips, { ...c, ecoregions: [] }]));
    for (const s of shares as { fips: string; code: string; share: number }[])
      this.counties.get(s.fips)?.ecoregions.push({ code: s.code, share: s.share });
    this.outlines.clear();
    this.boundaries = new PolygonIndex(
      boundaries.map((b: { code: string; geometry: string }): AreaFeature<{ code: string }> => ({
        type: 'Feature',
        properties: { code: b.code },
        geometry: JSON.parse(b.geometry),
      })),
    );
  }

  list(state?: string): Ecoregion[] {
    const all = [...this.regions.values()];
    return state ? all.filter((e) => (e.states as string[]).includes(state)) : all;
  }

  /** The region with this code, or undefined (for callers that answer a missing region their own way). */
  find(code: string): Ecoregion | undefined {
    return this.regions.get(code);
  }

  get(code: string, locale: WordLocale = 'en'): Ecoregion {
    const e = this.regions.get(code);
    if (!e) throw new NotFoundException(apiWords(locale)('refusals.ecoregions.noRegion', { code }));
    return e;
  }

  county(fips: string): CountyRegions | undefined {
    return this.counties.get(fips);
  }

  get hasBoundaries(): boolean {
    return this.boundaries.size > 0;
  }

  /** The imported polygon holding the point, when boundaries have been imported. */
  boundaryAt(lon: number, lat: number): string | undefined {
    return this.boundaries.containing(lon, lat)?.properties.code;
  }

  /**
   * The region's imported outline, simplified to about 1 km (0.01°) for a map a few hundred pixels
   * wide, or null when no boundaries are loaded. An unknown code answers 404.
   */
  outline(code: string, locale: WordLocale = 'en'): EcoregionOutline {
    this.get(code, locale);
    const cached = this.outlines.get(code);
    if (cached) return { code, outline: cached };
    const f = this.boundaries.find((p) => p.code === code);
    if (!f) return { code, outline: null };
    const g = simplify(f, { tolerance: 0.01, highQuality: false, mutate: false }).geometry as OutlineGeometry;
    this.outlines.set(code, g);
    return { code, outline: g };
  }

  /** Replaces all boundary polygons in one transaction; a bad file changes nothing. */
  async importBoundaries(text: string, userId: string, locale: WordLocale = 'en'): Promise<BoundaryImportResult> {
    const features = parseBoundaryUpload(text, new Map([...this.regions].map(([code, e]) => [code, e.name])), locale);
    await this.db.transaction(async (tx) => {
      await runSql(tx, `DELETE FROM ecoregion_boundaries`);
      for (const f of features) {
        await runSql(
          tx,
          `INSERT INTO ecoregion_boundaries (code, name, geometry, vertices, imported_by) VALUES (?, ?, ?, ?, ?)`,
          [f.code, f.name, JSON.stringify(f.geometry), f.vertices, userId],
        );
      }
    });
    await bumpCatalogueMark(this.db);
    await this.reload();
    return { regions: features.length, vertices: features.reduce((n, f) => n + f.vertices, 0) };
  }

  async clearBoundaries(): Promise<void> {
    await this.db.query(`DELETE FROM ecoregion_boundaries`);
    await bumpCatalogueMark(this.db);
    await this.reload();
  }
}
