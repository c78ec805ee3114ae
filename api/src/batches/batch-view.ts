import {
  addDays,
  batchForecast,
  batchSchedule,
  batchWordsFor,
  frostWarning,
  logTotals,
  seedsToSow,
  UNIT_OF,
  unitsFor,
  type Batch,
  type BatchLogEntry,
  type BatchSchedule,
  type Species,
  type WordLocale,
  wordsFor,
} from '@homeground/shared';
import type { BatchLogEntryRow } from './batch-log-entry.entity.js';
import type { BatchRow } from './batch.entity.js';

/** What a batch's answer needs besides its row and log. */
export interface BatchViewContext {
  species: Species | undefined;
  growerName: string;
  season: { lastFrost: string; plantShareDate: string; lossFactor: number };
  /** The target's tested germination rate, if the organiser gave one. */
  targetGerminationPct: number | null;
  today: string;
  /** The reader's language for titles, treatments, notes and cautions (English when absent). */
  locale?: WordLocale;
}

/**
 * Far enough before any season that the sowing calendar plans its usual dates rather than a late
 * start from today: comparing the two tells whether a batch is behind.
 */
const USUAL_PLAN_DAYS_BEFORE_FROST = 400;

/** A batch with its dates, treatments, log, totals and forecast, as the API answers it. */
export function toBatch(row: BatchRow, log: readonly BatchLogEntryRow[], c: BatchViewContext): Batch {
  const entries = [...log].sort((a, b) =>
    a.date < b.date ? -1 : a.date > b.date ? 1 : a.createdAt.getTime() - b.createdAt.getTime(),
  );
  const totals = logTotals(entries);
  const germinationRatePct = c.targetGerminationPct ?? c.species?.germination.germinationRatePct ?? 50;
  const seeds = seedsToSow(row.plants, germinationRatePct, c.season.lossFactor);
  const firstSown = entries.find((e) => e.kind === 'sown')?.date;
  const schedule = c.species
    ? batchSchedule({
        species: c.species,
        method: row.method,
        sowDate: row.sowDate ?? firstSown,
        lastFrost: c.season.lastFrost,
        plantShareDate: c.season.plantShareDate,
        today: c.today,
        locale: c.locale,
      })
    : unknownSpeciesSchedule(row, c);
  const potUp = schedule.steps.find((s) => s.kind === 'pot-up')?.date;
  return {
    id: row.id,
    growerId: row.growerId,
    growerName: c.growerName,
    slug: row.slug,
    commonName: c.species?.commonNames[0] ?? row.slug,
    scientificName: c.species?.scientificName ?? '',
    method: row.method,
    unit: UNIT_OF[row.method],
    plants: row.plants,
    units: unitsFor(row.method, row.plants),
    seedsToSow: seeds,
    germinationRatePct,
    sowDate: schedule.sowDate,
    readyDate: schedule.readyDate,
    readyAfterShare: schedule.readyAfterShare,
    treatments: schedule.treatments,
    steps: schedule.steps,
    nextStep: schedule.steps.find((s) => s.date >= c.today) ?? null,
    behind: behindWords(row, c, totals.sown, totals.germinated, schedule),
    warnings: schedule.warnings,
    frostWarning: frostWarning({
      method: row.method,
      lastFrost: c.season.lastFrost,
      today: c.today,
      seedlingsUp: totals.alive > 0,
      locale: c.locale,
    }),
    cautions: (c.species?.cautions ?? []).map((x) => ({
      title: wordsFor(c.locale ?? 'en').caution[x.kind].title,
      text: x.text,
    })),
    log: entries.map(toLogEntry),
    totals,
    forecast: batchForecast({
      seedsToSow: seeds,
      germinationRatePct,
      lossFactor: c.season.lossFactor,
      totals,
      readyAfterShare: schedule.readyAfterShare,
      stillSprouting: potUp === undefined || c.today < potUp,
    }),
  };
}

/** One stored log line as the API answers it. */
export function toLogEntry(e: BatchLogEntryRow): BatchLogEntry {
  return {
    id: e.id,
    kind: e.kind,
    count: e.count,
    date: e.date,
    reason: e.reason,
    note: e.note,
    clientId: e.clientId,
    createdAt: e.createdAt.toISOString(),
  };
}

/** Plain words when the batch is behind its usual dates, else null. */
function behindWords(
  row: BatchRow,
  c: BatchViewContext,
  sown: number,
  germinated: number,
  schedule: BatchSchedule,
): string | null {
  if (!c.species) return null;
  if (sown === 0) {
    const usual = batchSchedule({
      species: c.species,
      method: row.method,
      ...(row.sowDate && { sowDate: row.sowDate }),
      lastFrost: c.season.lastFrost,
      plantShareDate: c.season.plantShareDate,
      today: addDays(c.season.lastFrost, -USUAL_PLAN_DAYS_BEFORE_FROST),
      locale: c.locale,
    });
    const first = usual.steps.find(
      (s) => s.kind === 'start-warm' || s.kind === 'start-stratifying' || s.kind === 'sow',
    );
    return first && first.date < c.today ? batchWordsFor(c.locale).notSownYet(first.title, first.date) : null;
  }
  const sprouts = schedule.steps.find((s) => s.kind === 'pot-up');
  if (germinated === 0 && sprouts && sprouts.date < c.today) return batchWordsFor(c.locale).nothingUpYet(sprouts.date);
  return null;
}

/** A batch whose species was renamed away in the catalogue: no calendar, only its own date. */
function unknownSpeciesSchedule(row: BatchRow, c: BatchViewContext): BatchSchedule {
  return {
    sowDate: row.sowDate ?? c.season.lastFrost,
    readyDate: null,
    readyAfterShare: false,
    steps: [],
    treatments: [],
    warnings: [batchWordsFor(c.locale).noLongerInCatalogue(row.slug)],
  };
}
