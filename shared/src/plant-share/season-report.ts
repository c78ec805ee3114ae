import type { Species } from '../types/species.js';
import { isNativeMilkweed } from '../scoring/genus.js';
import { layerOf, type PlantLayer } from '../scoring/layers.js';
import { hostLevelOf, type HostLevel } from '../scoring/wildlife-value.js';
import { formatMonths, MONTH_NUMBERS, monthShort } from '../vocabulary/months.js';
import { SOWING_METHOD_WORDS } from '../vocabulary/seed-words.js';
import type { GerminationReport, ShareReport } from './answers.js';

/** "sown 120; up 90; ready 70": a germination row's counts for the CSV's words column. */
const germinationWords = (c: { sown: number; germinated: number; ready: number }) =>
  `sown ${c.sown}; up ${c.germinated}; ready ${c.ready}`;

/** What the report is worked out from: counts only, gathered by the API after the share. */
export interface ShareReportInput {
  groupSlug: string;
  groupName: string;
  seasonYear: number;
  shareDate: string;
  /** Plants handed over (picked-up reservations and walk-ups), one entry per line. */
  given: readonly { speciesSlug: string; count: number }[];
  /** Households whose reservation was picked up. */
  reservedHouseholds: number;
  walkUps: number;
  /** The ZIP of each household served that gave one (only the first three digits are used). */
  zips: readonly string[];
  targets: readonly { speciesSlug: string; targetPlants: number }[];
  species: ReadonlyMap<string, Species>;
  /** Germination by method and grower, once batches are logged; null until then. */
  germination?: GerminationReport | null;
}

const LAYER_WORDS: Record<PlantLayer, string> = {
  herbaceous: 'wildflowers, grasses and ferns',
  woody: 'shrubs and trees',
};

const plantsWord = (n: number) => `${n.toLocaleString('en-US')} plant${n === 1 ? '' : 's'}`;

/**
 * The season report: what the share gave, by species, month of flower and caterpillar host value in
 * words per layer, the households and ZIP areas reached (3-digit areas, counts only) and the season's
 * targets beside it. Pure arithmetic; names and e-mails never reach it.
 */
export function seasonReport(input: ShareReportInput): ShareReport {
  const bySlug = new Map<string, number>();
  for (const g of input.given) bySlug.set(g.speciesSlug, (bySlug.get(g.speciesSlug) ?? 0) + g.count);
  const targetOf = new Map(input.targets.map((t) => [t.speciesSlug, t.targetPlants]));
  const slugs = [...new Set([...input.targets.map((t) => t.speciesSlug), ...bySlug.keys()])];

  const bySpecies = slugs.flatMap((slug) => {
    const s = input.species.get(slug);
    // A species renamed away in the catalogue has no record to describe: its plants still count below.
    if (!s) return [];
    return [
      {
        speciesSlug: slug,
        commonName: s.commonNames[0],
        scientificName: s.scientificName,
        layer: layerOf(s),
        isMilkweed: isNativeMilkweed(s),
        plantsGiven: bySlug.get(slug) ?? 0,
        targetPlants: targetOf.get(slug) ?? null,
      },
    ];
  });
  bySpecies.sort((a, b) => b.plantsGiven - a.plantsGiven || a.commonName.localeCompare(b.commonName));

  const plantsGiven = [...bySlug.values()].reduce((n, c) => n + c, 0);
  const milkweedPlants = bySpecies.filter((r) => r.isMilkweed).reduce((n, r) => n + r.plantsGiven, 0);
  const targetPlants = input.targets.reduce((n, t) => n + t.targetPlants, 0);
  const households = input.reservedHouseholds + input.walkUps;
  const given = bySpecies.filter((r) => r.plantsGiven > 0);

  const floweringByMonth = MONTH_NUMBERS.map((month) => {
    const blooming = given.filter((r) => input.species.get(r.speciesSlug)!.bloomMonths.includes(month));
    return {
      month,
      monthName: monthShort(month),
      species: blooming.length,
      plants: blooming.reduce((n, r) => n + r.plantsGiven, 0),
    };
  });

  const caterpillarHosts = (['herbaceous', 'woody'] as const).flatMap((layer) => {
    const rows = given.filter((r) => r.layer === layer);
    if (rows.length === 0) return [];
    return [
      { layer, plants: rows.reduce((n, r) => n + r.plantsGiven, 0), words: hostWords(rows, layer, input.species) },
    ];
  });

  const areas = new Map<string, number>();
  for (const zip of input.zips) {
    const area = zip.slice(0, 3);
    if (/^\d{3}$/.test(area)) areas.set(area, (areas.get(area) ?? 0) + 1);
  }
  const zipAreas = [...areas.entries()]
    .map(([area, n]) => ({ area, households: n }))
    .sort((a, b) => b.households - a.households || a.area.localeCompare(b.area));

  const shareOfTargets = targetPlants > 0 ? Math.round((plantsGiven / targetPlants) * 1000) / 1000 : null;
  const floweringMonths = floweringByMonth.filter((m) => m.plants > 0).map((m) => m.month);
  const summary = [
    `${input.groupName} gave ${plantsWord(plantsGiven)} of ${given.length} native species to ${households.toLocaleString('en-US')} household${households === 1 ? '' : 's'}.`,
    ...(milkweedPlants > 0
      ? [`${plantsWord(milkweedPlants)} were milkweeds, the only food of monarch caterpillars.`]
      : []),
    ...(floweringMonths.length > 0 ? [`Something they gave is in flower in ${formatMonths(floweringMonths)}.`] : []),
    ...(zipAreas.length > 0
      ? [`The plants went to ${zipAreas.length} ZIP area${zipAreas.length === 1 ? '' : 's'} (first three digits).`]
      : []),
    ...(shareOfTargets !== null
      ? [`That is ${Math.round(shareOfTargets * 100)}% of the ${plantsWord(targetPlants)} the season set out to raise.`]
      : []),
  ];

  return {
    groupSlug: input.groupSlug,
    groupName: input.groupName,
    seasonYear: input.seasonYear,
    shareDate: input.shareDate,
    totals: {
      plantsGiven,
      households,
      walkUps: input.walkUps,
      milkweedPlants,
      species: given.length,
      targetPlants,
      shareOfTargets,
    },
    bySpecies,
    floweringByMonth,
    caterpillarHosts,
    zipAreas,
    germination: input.germination ?? null,
    summary,
  };
}

/** Caterpillar host value of a layer's plants in words, by the level each species reaches in its layer. */
function hostWords(
  rows: readonly { speciesSlug: string; commonName: string; plantsGiven: number }[],
  layer: PlantLayer,
  species: ReadonlyMap<string, Species>,
): string[] {
  const byLevel = new Map<HostLevel, { plants: number; names: string[] }>();
  for (const r of rows) {
    const level = hostLevelOf(species.get(r.speciesSlug)!);
    const entry = byLevel.get(level) ?? { plants: 0, names: [] };
    entry.plants += r.plantsGiven;
    entry.names.push(r.commonName);
    byLevel.set(level, entry);
  }
  const among = LAYER_WORDS[layer];
  const phrase: Record<HostLevel, string> = {
    top: `among the best caterpillar host plants of the ${among}`,
    good: `good caterpillar host plants among ${among}`,
    some: 'hosts of the caterpillars of a few moths and butterflies',
    none: 'not known as caterpillar hosts; they feed bees and other insects in other ways',
  };
  return (['top', 'good', 'some', 'none'] as const).flatMap((level) => {
    const e = byLevel.get(level);
    if (!e) return [];
    return [`${plantsWord(e.plants)} ${phrase[level]} (${e.names.join(', ')}).`];
  });
}

/** The report as CSV: one row per species, then the month, host and ZIP-area tables; counts only. */
export function shareReportToCsv(report: ShareReport): string {
  const cell = (v: string | number | null) => {
    const s = v === null ? '' : String(v);
    // Quote and neutralise a leading formula character (CSV injection, OWASP): names come from the catalogue.
    const safe = /^[=+\-@\t\r]/.test(s) ? `'${s}` : s;
    return /[",\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
  };
  const row = (...cells: (string | number | null)[]) => cells.map(cell).join(',');
  return (
    [
      row('section', 'item', 'plants', 'target plants', 'households', 'words'),
      ...report.bySpecies.map((s) =>
        row(
          'species',
          `${s.commonName} (${s.scientificName})`,
          s.plantsGiven,
          s.targetPlants,
          null,
          s.isMilkweed ? 'milkweed' : null,
        ),
      ),
      row(
        'total',
        'all species',
        report.totals.plantsGiven,
        report.totals.targetPlants,
        report.totals.households,
        null,
      ),
      row('total', 'milkweeds', report.totals.milkweedPlants, null, null, null),
      row('total', 'walk-up households', null, null, report.totals.walkUps, null),
      ...report.floweringByMonth.map((m) =>
        row('in flower', m.monthName, m.plants, null, null, `${m.species} species`),
      ),
      ...report.caterpillarHosts.flatMap((h) =>
        h.words.map((w) => row('caterpillar hosts', h.layer, h.plants, null, null, w)),
      ),
      ...report.zipAreas.map((z) => row('ZIP area', `${z.area}xx`, null, null, z.households, null)),
      // Germination: plants = ready; the words column carries sown and up, as counts.
      ...(report.germination?.byMethod ?? []).map((m) =>
        row('germination by method', SOWING_METHOD_WORDS[m.method].phrase, m.ready, null, null, germinationWords(m)),
      ),
      ...(report.germination?.byGrower ?? []).map((g) =>
        row('germination by grower', g.grower, g.ready, null, null, germinationWords(g)),
      ),
    ].join('\r\n') + '\r\n'
  );
}
