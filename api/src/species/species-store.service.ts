import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { PhotoCredit, PhotoLicence, Species, SpeciesPage, SpeciesQuery } from '@homeground/shared';
import { EcoregionsService } from '../ecoregions/ecoregions.service.js';
import { DataSource } from 'typeorm';
import { bumpCatalogueMark, readCatalogueMark } from '../common/database/shared-version.js';
import { SpeciesSearchIndex, type NameEntry } from './search/species-search-index.js';
import { matchesFilters, sortSpecies } from './species-filter.js';
import { toSpeciesSummary } from './species-summary.mapper.js';

const MAX_CACHED_PAGES = 1000;

/**
 * The catalogue's read model: every species record in memory with a search index, rebuilt from
 * the database at start and after each curator edit. List answers are cached as ready-to-send JSON; any
 * edit clears the cache, so readers never see stale data. With several API instances on one PostgreSQL
 * database, each write sets the shared catalogue mark (database/shared-version.ts) and every instance
 * checks it per request (CatalogueSyncMiddleware), rebuilding when another instance has written.
 */
@Injectable()
export class SpeciesStore {
  private species: Species[] = [];
  private bySlug = new Map<string, Species>();
  private photos = new Set<string>();
  private credits = new Map<string, PhotoCredit>();
  private index = new SpeciesSearchIndex([]);
  private generation = 0;
  /** The shared catalogue mark these records were read at. */
  private mark: string | null = null;
  /** A rebuild after another instance's write, shared by the requests that noticed it at once. */
  private syncing: Promise<void> | null = null;
  /** List answers keyed by the raw request URL, as bytes, for the fast path in species-list-cache.middleware. */
  private readonly rawPages = new Map<string, Buffer>();

  constructor(
    @InjectDataSource() private readonly db: DataSource,
    // The one ecoregion table in memory; the catalogue filter reads regions from it.
    private readonly ecoregions: EcoregionsService,
  ) {}

  async reload(): Promise<void> {
    // The mark first: a write landing while the rows are read leaves an older mark, so the next check rebuilds again.
    const mark = await readCatalogueMark(this.db);
    const [rows, photoRows] = await Promise.all([
      this.db.query(`SELECT record FROM species ORDER BY slug`),
      this.db.query(`SELECT slug, photographer, licence, source_url FROM species_photos`),
    ]);
    type PhotoRow = {
      slug: string;
      photographer: string | null;
      licence: PhotoLicence | null;
      source_url: string | null;
    };
    this.replace(
      rows.map((r: { record: string }) => JSON.parse(r.record) as Species),
      photoRows.map((r: PhotoRow) => r.slug),
    );
    this.credits = new Map(
      (photoRows as PhotoRow[]).flatMap((r) =>
        r.photographer && r.licence && r.source_url
          ? [[r.slug, { photographer: r.photographer, licence: r.licence, sourceUrl: r.source_url }] as const]
          : [],
      ),
    );
    this.mark = mark;
  }

  /** After a write to the catalogue has committed: tells the other instances, and rebuilds this one. */
  async publish(): Promise<void> {
    await bumpCatalogueMark(this.db);
    await this.reload();
  }

  /** Rebuilds the ecoregions and the records when another instance has written since they were read. */
  async syncWithDatabase(): Promise<void> {
    if ((await readCatalogueMark(this.db)) === this.mark) return;
    this.syncing ??= (async () => {
      try {
        await this.ecoregions.reload();
        await this.reload();
      } finally {
        this.syncing = null;
      }
    })();
    await this.syncing;
  }

  /** Swaps in a new set of records (also used by benchmarks with synthetic species). */
  replace(species: Species[], photoSlugs: string[]): void {
    this.species = species;
    this.bySlug = new Map(species.map((s) => [s.slug, s]));
    this.photos = new Set(photoSlugs);
    const names: NameEntry[] = species.flatMap((s) => [
      { slug: s.slug, name: s.scientificName, kind: 'scientific' as const },
      ...s.commonNames.map((name) => ({ slug: s.slug, name, kind: 'common' as const })),
      ...s.synonyms.map((name) => ({ slug: s.slug, name, kind: 'synonym' as const })),
    ]);
    this.index = new SpeciesSearchIndex(names);
    this.rawPages.clear();
    this.generation++;
  }

  /** Changes on every reload, so caches of answers computed from the catalogue know when to drop them. */
  get version(): number {
    return this.generation;
  }

  get count(): number {
    return this.species.length;
  }

  all(): readonly Species[] {
    return this.species;
  }

  get(slug: string): Species | undefined {
    return this.bySlug.get(slug);
  }

  hasPhoto(slug: string): boolean {
    return this.photos.has(slug);
  }

  /** The photo's credit line facts; null without a photo or for an upload from before credits were asked for. */
  photoCredit(slug: string): PhotoCredit | null {
    return this.credits.get(slug) ?? null;
  }

  cachedForUrl(url: string): Buffer | undefined {
    return this.rawPages.get(url);
  }

  rememberForUrl(url: string, body: string): void {
    if (this.rawPages.size >= MAX_CACHED_PAGES) this.rawPages.delete(this.rawPages.keys().next().value!);
    this.rawPages.set(url, Buffer.from(body));
  }

  list(query: SpeciesQuery): SpeciesPage {
    const ecoregion = query.ecoregion ? this.ecoregions.find(query.ecoregion) : undefined;
    let pool: Species[];
    if (query.q) {
      pool = this.index.search(query.q, 200).map((h) => this.bySlug.get(h.slug)!);
    } else {
      pool = [...this.species];
    }
    const filtered = sortSpecies(
      pool.filter((s) => matchesFilters(s, query, ecoregion)),
      query.sort,
      query.order,
      Boolean(query.q),
    );
    const start = (query.page - 1) * query.pageSize;
    return {
      items: filtered.slice(start, start + query.pageSize).map((s) => toSpeciesSummary(s, this.photos.has(s.slug))),
      total: filtered.length,
      page: query.page,
      pageSize: query.pageSize,
    };
  }
}
