/**
 * Curator's helper: prints what USDA PLANTS (read from ../shared/reference) says about one or more
 * names, so a species record can take its symbol, family and native states from the reference.
 *   npx tsx scripts/usda-lookup.ts "Asclepias tuberosa" "Carex pensylvanica"
 */
import {
  loadLepidopteraByGenus,
  loadUsdaCharacteristics,
  loadUsdaDistribution,
  loadUsdaTaxa,
} from '../src/reference/usda-plants.js';

const taxa = loadUsdaTaxa();
const distribution = loadUsdaDistribution();
const characteristics = loadUsdaCharacteristics();
const lepidoptera = loadLepidopteraByGenus();

for (const query of process.argv.slice(2)) {
  const wanted = query.trim().toLowerCase();
  const hits = taxa.filter((t) => t.name.toLowerCase() === wanted || t.symbol.toLowerCase() === wanted);
  if (hits.length === 0) {
    const genus = wanted.split(' ')[0];
    const near = taxa.filter((t) => t.name.toLowerCase().startsWith(genus + ' ') && t.rank === 'Species');
    console.log(
      JSON.stringify({ query, found: false, sameGenus: near.map((t) => `${t.name} (${t.symbol})`).slice(0, 40) }),
    );
    continue;
  }
  for (const t of hits) {
    const d = distribution.get(t.symbol);
    const c = characteristics.get(t.symbol);
    console.log(
      JSON.stringify({
        query,
        symbol: t.symbol,
        name: t.name,
        withAuthor: t.scientificNameWithAuthor,
        rank: t.rank,
        commonName: t.commonName,
        usdaFamily: t.family,
        duration: t.duration,
        growthHabit: t.growthHabit,
        nativeIn: d?.nativeIn ?? [],
        introducedIn: d?.introducedIn ?? [],
        lepidopteraGenusCount: lepidoptera.get(t.genus)?.totalLepidoptera ?? null,
        characteristics: c && {
          seedsPerPound: c.seed_per_pound || null,
          coldStratificationRequired: c.cold_stratification_required || null,
          bloomPeriod: c.bloom_period || null,
          flowerColor: c.flower_color || null,
          heightFeet: c.height_mature_feet || null,
          shadeTolerance: c.shade_tolerance || null,
          droughtTolerance: c.drought_tolerance || null,
          moistureUse: c.moisture_use || null,
          toxicity: c.toxicity || null,
        },
      }),
    );
  }
}
