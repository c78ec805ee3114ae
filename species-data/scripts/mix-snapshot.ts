import {
  balancePalette,
  plantingMethodFor,
  plantsPerSpecies,
  seedingPlan,
  siteRequestSchema,
} from '@homeground/shared';
import { loadCatalogue } from '../src/catalogue.js';
import { MIX_SITES } from './mix-sites.js';

/**
 * Prints the yard mix the engine gives each site of mix-sites.ts: species, plants and the total
 * footprint (plants × spacing²). A curator tool for comparing the engine before and after a change.
 * Usage: npx tsx species-data/scripts/mix-snapshot.ts
 */
const catalogue = loadCatalogue();
for (const s of MIX_SITES) {
  const site = siteRequestSchema.parse(s.site);
  // The region as the API fills it: the ecoregion's plant communities from the catalogue.
  const communities = catalogue.ecoregions.find((e) => e.code === s.region.ecoregionCode)?.plantCommunities;
  const result = balancePalette({
    species: catalogue.species,
    site,
    region: { ...s.region, ecoregionPlantCommunities: communities },
  });
  const chosen = result.chosen.map((c) => catalogue.species.find((x) => x.slug === c.slug)!);
  const plantings = plantsPerSpecies(chosen, site.areaSqFt);
  const footprint = plantings.reduce((sum, p) => sum + (p.plants * p.spacingIn ** 2) / 144, 0);
  const plants = plantings.reduce((sum, p) => sum + p.plants, 0);
  const woody = chosen.filter((x) => ['shrub', 'tree', 'vine'].includes(x.growthForm)).length;
  console.log(
    `## ${s.label}: ${chosen.length} species, ${plants} plants, footprint ${Math.round(footprint)} ft² (${Math.round((footprint / site.areaSqFt) * 100)} %), woody ${woody}`,
  );
  if (plantingMethodFor(site.areaSqFt) === 'seeding') {
    console.log(
      `seeding plan: ${seedingPlan(chosen, site.areaSqFt)
        .map((l, i) => `${chosen[i].commonNames[0]} ${l.seedsPerSqFt}/ft²`)
        .join('; ')}`,
    );
  } else {
    console.log(plantings.map((p, i) => `${chosen[i].commonNames[0]} ${p.plants}`).join('; '));
  }
}
