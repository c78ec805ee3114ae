/**
 * `npm run validate`: checks every data file against the shared schema and the cross-record rules.
 * Exits 1 with one line per problem (file and reason) when anything is wrong.
 */
import { readCatalogue } from './catalogue.js';
import { checkCatalogue } from './checks.js';

const { catalogue, problems } = readCatalogue();
problems.push(...checkCatalogue(catalogue));
if (problems.length > 0) {
  for (const p of problems) console.error(`${p.file}: ${p.message}`);
  console.error(`species-data: ${problems.length} problem(s)`);
  process.exit(1);
}
const byForm = new Map<string, number>();
for (const s of catalogue.species) byForm.set(s.growthForm, (byForm.get(s.growthForm) ?? 0) + 1);
console.log(
  `species-data: ${catalogue.species.length} species valid (` +
    [...byForm].map(([form, n]) => `${form} ${n}`).join(', ') +
    `), ${catalogue.ecoregions.length} ecoregions, ${catalogue.counties.length} counties`,
);
