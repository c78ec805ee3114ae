import { SOURCED_FIELDS, type Species } from '@homeground/shared';
import type { Catalogue, DataProblem } from './catalogue.js';

/** The slug Homeground derives from a scientific name: "Asclepias tuberosa" → "asclepias-tuberosa". */
export function slugFromName(scientificName: string): string {
  return scientificName
    .toLowerCase()
    .replace(/\b(var|subsp)\./g, '$1')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
}

function checkSpecies(s: Species, sourceKeys: Set<string>): string[] {
  const out: string[] = [];
  if (s.slug !== slugFromName(s.scientificName)) out.push(`slug should be "${slugFromName(s.scientificName)}"`);
  for (const field of SOURCED_FIELDS) {
    const key = s.sources[field];
    if (!key) out.push(`sources.${field} is missing (name a source key or "from-memory")`);
    else if (!sourceKeys.has(key)) out.push(`sources.${field}: unknown source key "${key}"`);
  }
  for (const c of s.cautions)
    if (!sourceKeys.has(c.source)) out.push(`caution source "${c.source}" is not in sources.json`);
  const kinds = s.cautions.map((c) => c.kind);
  for (const kind of new Set(kinds)) {
    if (kinds.filter((k) => k === kind).length > 1) out.push(`two "${kind}" cautions: merge them into one`);
  }
  const isFlowering = s.growthForm !== 'fern' && s.growthForm !== 'graminoid';
  if (isFlowering && s.bloomMonths.length === 0) out.push('a flowering plant needs bloomMonths');
  if (new Set(s.bloomMonths).size !== s.bloomMonths.length) out.push('bloomMonths repeats a month');
  if (s.germination.treatments.length > 1 && s.germination.treatments.some((t) => t.kind === 'none')) {
    out.push('treatment "none" cannot be combined with other steps');
  }
  if (s.germination.needsLight && s.germination.sowingDepthMm > 2)
    out.push('seed that needs light is surface sown (depth ≤ 2 mm)');
  if (s.scientificName.startsWith('Asclepias ') && !s.cautions.some((c) => c.kind === 'sap-irritant')) {
    out.push('milkweeds carry the milky-sap caution');
  }
  return out;
}

/**
 * What a community growing programme's catalogue must hold: 300+ species, mostly forbs, grasses and
 * sedges at least 15 %, and the milkweeds growers sow (10+ Asclepias), with woody plants too.
 */
export function checkComposition(species: Species[]): string[] {
  if (species.length === 0) return [];
  const count = (pred: (s: Species) => boolean) => species.filter(pred).length;
  const forbs = count((s) => s.growthForm === 'forb');
  const graminoids = count((s) => s.growthForm === 'graminoid');
  const milkweeds = count((s) => s.scientificName.startsWith('Asclepias '));
  const woody = count((s) => s.growthForm === 'shrub' || s.growthForm === 'vine' || s.growthForm === 'tree');
  const out: string[] = [];
  if (species.length < 300) out.push(`${species.length} species; the catalogue needs at least 300`);
  if (forbs * 2 <= species.length) out.push(`forbs are ${forbs} of ${species.length}; they should be most`);
  if (graminoids < 0.15 * species.length) out.push(`grasses and sedges are ${graminoids}; at least 15 % are needed`);
  if (milkweeds < 10) out.push(`${milkweeds} Asclepias species; at least 10 are needed`);
  if (woody === 0) out.push('no shrubs, vines or trees');
  return out;
}

/** Cross-record checks the schema alone cannot make. */
export function checkCatalogue(catalogue: Catalogue): DataProblem[] {
  const problems: DataProblem[] = checkComposition(catalogue.species).map((message) => ({ file: 'species/', message }));
  const sourceKeys = new Set(catalogue.sources.map((s) => s.key));
  const seenSymbols = new Map<string, string>();
  for (const s of catalogue.species) {
    const file = `species/${s.slug}.json`;
    for (const message of checkSpecies(s, sourceKeys)) problems.push({ file, message });
    const other = seenSymbols.get(s.usdaSymbol);
    if (other) problems.push({ file, message: `USDA symbol ${s.usdaSymbol} is also used by ${other}` });
    seenSymbols.set(s.usdaSymbol, s.slug);
  }
  for (const r of catalogue.realignments) {
    if (!sourceKeys.has(r.source))
      problems.push({ file: 'family-realignments.json', message: `unknown source "${r.source}"` });
  }
  const codes = new Set(catalogue.ecoregions.map((e) => e.code));
  for (const e of catalogue.ecoregions) {
    for (const key of Object.values(e.sources)) {
      if (!sourceKeys.has(key))
        problems.push({ file: 'ecoregions/ecoregions.json', message: `${e.code}: unknown source "${key}"` });
    }
  }
  for (const c of catalogue.counties) {
    const total = c.ecoregions.reduce((sum, e) => sum + e.share, 0);
    if (Math.abs(total - 1) > 0.02)
      problems.push({
        file: 'ecoregions/county-ecoregions.json',
        message: `${c.fips}: shares add up to ${total.toFixed(3)}`,
      });
    for (const e of c.ecoregions) {
      if (!codes.has(e.code))
        problems.push({ file: 'ecoregions/county-ecoregions.json', message: `${c.fips}: unknown ecoregion ${e.code}` });
    }
  }
  return problems;
}
