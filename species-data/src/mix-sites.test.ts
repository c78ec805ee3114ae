import { describe, expect, it } from 'vitest';
import {
  balancePalette,
  isNativeMilkweed,
  isStructural,
  plantsPerSpecies,
  siteRequestSchema,
  totalFootprintSqFt,
  type Species,
} from '@homeground/shared';
import { loadCatalogue } from './catalogue.js';
import { MIX_SITES } from '../scripts/mix-sites.js';

/**
 * The yard mix against published plant lists: for each site, species that an agency or
 * conservation list recommends for that kind of ground in that state. The mix must hold at least
 * 3 of them, and must keep to garden practice (no annuals counted, no plant outside its light or
 * moisture range, at most one woody plant in a bed of 500 ft² or less unless asked, a milkweed
 * that suits the site when monarchs are a goal, plants × spacing² within the bed).
 *
 * Lists marked "retrieved" were read this pass from the page named; "from memory" lists are the
 * usual species of the named publication as recalled, to be checked against it.
 */
const PUBLISHED: Record<string, { source: string; status: 'retrieved' | 'from memory'; species: string[] }> = {
  'wi-dry-sun': {
    // Minnesota BWSR native seed mix "Conservation – Dry Northwest" (the BWSR rows of CHECK-VALUES §3),
    // the nearest published dry-prairie list for the Upper Midwest; Wisconsin shares these species.
    source: 'Minnesota BWSR seed mix "Conservation – Dry Northwest"',
    status: 'retrieved',
    species: [
      'Schizachyrium scoparium',
      'Sporobolus heterolepis',
      'Bouteloua curtipendula',
      'Elymus canadensis',
      'Dalea purpurea',
      'Amorpha canescens',
      'Asclepias verticillata',
      'Allium stellatum',
      'Agastache foeniculum',
      'Astragalus canadensis',
      'Dalea candida',
      'Andropogon gerardii',
      'Sorghastrum nutans',
      'Koeleria macrantha',
      'Anemone patens',
      // the same table's forbs further down (from memory: not all were in the excerpt read)
      'Liatris aspera',
      'Solidago nemoralis',
      'Symphyotrichum oolentangiense',
      'Symphyotrichum ericoides',
      'Monarda fistulosa',
      'Echinacea angustifolia',
      'Asclepias tuberosa',
      'Solidago rigida',
      'Penstemon grandiflorus',
      'Ratibida columnifera',
    ],
  },
  'wi-rain': {
    // Wisconsin DNR / UW-Extension "Rain Gardens: A how-to manual for homeowners", sun plant list.
    source: 'Wisconsin DNR and UW-Extension, Rain Gardens: a how-to manual for homeowners',
    status: 'from memory',
    species: [
      'Asclepias incarnata',
      'Iris versicolor',
      'Lobelia cardinalis',
      'Lobelia siphilitica',
      'Eutrochium maculatum',
      'Eupatorium perfoliatum',
      'Verbena hastata',
      'Symphyotrichum novae-angliae',
      'Carex stricta',
      'Carex vulpinoidea',
      'Vernonia fasciculata',
      'Chelone glabra',
      'Liatris spicata',
      'Zizia aurea',
      'Physostegia virginiana',
      'Spartina pectinata',
    ],
  },
  'wi-shade': {
    // Wisconsin DNR woodland-garden species; the usual woodland plugs of Upper Midwest lists.
    source: 'Wisconsin DNR native woodland plants for shade gardens',
    status: 'from memory',
    species: [
      'Geranium maculatum',
      'Carex pensylvanica',
      'Polystichum acrostichoides',
      'Matteuccia struthiopteris',
      'Solidago flexicaulis',
      'Solidago caesia',
      'Polemonium reptans',
      'Asarum canadense',
      'Aquilegia canadensis',
      'Eurybia macrophylla',
      'Adiantum pedatum',
      'Athyrium filix-femina',
      'Osmundastrum cinnamomeum',
      'Packera aurea',
      'Phlox divaricata',
      'Blephilia hirsuta',
      'Thalictrum dioicum',
    ],
  },
  'mn-medium-sun': {
    // Minnesota city rain-garden and upland plant table (mapleplainmn.gov, "Table: Rain Garden Plants"),
    // upland rows, and the NRCS Midwest monarch plant recommendations (MO, IA, MN, WI, IL, MI, IN, OH).
    source:
      'City of Maple Plain, MN, Table: Rain Garden Plants; NRCS plant recommendations for monarch butterflies, Midwest',
    status: 'retrieved',
    species: [
      'Agastache foeniculum',
      'Allium stellatum',
      'Asclepias incarnata',
      'Asclepias tuberosa',
      'Symphyotrichum novae-angliae',
      'Echinacea purpurea',
      'Anemone canadensis',
      'Boltonia asteroides',
      // the rest of the same table and list (from memory: beyond the excerpt read)
      'Monarda fistulosa',
      'Solidago speciosa',
      'Liatris pycnostachya',
      'Eupatorium perfoliatum',
      'Eutrochium maculatum',
      'Penstemon digitalis',
      'Vernonia fasciculata',
      'Allium cernuum',
      'Elymus canadensis',
      'Carex vulpinoidea',
      'Zizia aurea',
    ],
  },
  'il-medium-sun': {
    // NRCS plant recommendations for monarch butterflies, Midwest region (docslib copy): its very-high
    // species begin with Echinacea purpurea and Asclepias tuberosa; the rest from memory.
    source: 'NRCS / Xerces Society, Plant recommendations for monarch butterflies, Midwest',
    status: 'from memory',
    species: [
      'Echinacea purpurea',
      'Asclepias tuberosa',
      'Asclepias syriaca',
      'Asclepias incarnata',
      'Symphyotrichum novae-angliae',
      'Liatris pycnostachya',
      'Monarda fistulosa',
      'Solidago speciosa',
      'Eutrochium maculatum',
      'Vernonia fasciculata',
      'Solidago rigida',
      'Symphyotrichum laeve',
      'Rudbeckia fulgida',
      'Ratibida pinnata',
      'Eupatorium perfoliatum',
      'Penstemon digitalis',
    ],
  },
  'ga-shade': {
    // University of Georgia Extension, native plants for Georgia, shade perennials and ferns.
    source: 'UGA Extension, Native plants for Georgia: shade perennials and ferns',
    status: 'from memory',
    species: [
      'Polystichum acrostichoides',
      'Adiantum pedatum',
      'Athyrium filix-femina',
      'Osmundastrum cinnamomeum',
      'Phlox divaricata',
      'Tiarella cordifolia',
      'Solidago caesia',
      'Aruncus dioicus',
      'Actaea racemosa',
      'Dicentra eximia',
      'Packera aurea',
      'Aquilegia canadensis',
      'Carex pensylvanica',
      'Asarum canadense',
      'Chrysogonum virginianum',
      'Hexastylis arifolia',
    ],
  },
  'ma-shade': {
    // UMass Amherst Extension, native perennials and ferns for shade in Massachusetts.
    source: 'UMass Extension, native plants for shade in Massachusetts',
    status: 'from memory',
    species: [
      'Polystichum acrostichoides',
      'Matteuccia struthiopteris',
      'Osmundastrum cinnamomeum',
      'Dennstaedtia punctilobula',
      'Athyrium filix-femina',
      'Carex pensylvanica',
      'Eurybia divaricata',
      'Solidago caesia',
      'Geranium maculatum',
      'Tiarella cordifolia',
      'Aquilegia canadensis',
      'Aruncus dioicus',
      'Dicentra eximia',
      'Asarum canadense',
      'Chelone lyonii',
      'Adiantum pedatum',
    ],
  },
  'nc-dry-sun': {
    // NC State Extension plant toolbox lists for dry sunny Piedmont gardens, and the NC Wildlife Resources
    // Commission pollinator planting list.
    source: 'NC State Extension, native plants for dry sun in the Piedmont',
    status: 'from memory',
    species: [
      'Asclepias tuberosa',
      'Schizachyrium scoparium',
      'Coreopsis lanceolata',
      'Symphyotrichum oblongifolium',
      'Solidago nemoralis',
      'Eryngium yuccifolium',
      'Echinacea purpurea',
      'Baptisia tinctoria',
      'Pycnanthemum tenuifolium',
      'Liatris spicata',
      'Sorghastrum nutans',
      'Andropogon virginicus',
      'Rudbeckia hirta',
      'Monarda punctata',
      'Silphium compositum',
    ],
  },
  'pa-rain': {
    // Penn State Extension, A homeowner's guide to rain gardens (plant list for wet, part sun).
    source: 'Penn State Extension, rain gardens: plants for wet soil',
    status: 'from memory',
    species: [
      'Asclepias incarnata',
      'Iris versicolor',
      'Lobelia cardinalis',
      'Lobelia siphilitica',
      'Eupatorium perfoliatum',
      'Eutrochium maculatum',
      'Eutrochium fistulosum',
      'Chelone glabra',
      'Packera aurea',
      'Carex stricta',
      'Carex vulpinoidea',
      'Symphyotrichum novae-angliae',
      'Vernonia noveboracensis',
      'Monarda didyma',
      'Juncus effusus',
      'Onoclea sensibilis',
    ],
  },
  'mo-meadow': {
    // Missouri Department of Conservation, Plants for rain gardens and native landscapes (mdc.mo.gov),
    // with the NRCS Midwest monarch list: a sunny medium meadow.
    source: 'Missouri Department of Conservation, native plants for your landscape',
    status: 'retrieved',
    species: [
      'Iris virginica',
      'Zizia aurea',
      'Veronicastrum virginicum',
      'Asclepias incarnata',
      'Carex muskingumensis',
      // beyond the excerpt read (from memory)
      'Echinacea pallida',
      'Asclepias tuberosa',
      'Andropogon gerardii',
      'Sorghastrum nutans',
      'Schizachyrium scoparium',
      'Eryngium yuccifolium',
      'Ratibida pinnata',
      'Baptisia australis',
      'Monarda fistulosa',
      'Rudbeckia subtomentosa',
      'Silphium laciniatum',
    ],
  },
};

const catalogue = loadCatalogue();
const bySlug = new Map(catalogue.species.map((s) => [s.slug, s]));
const regionOf = (code: string | undefined) => catalogue.ecoregions.find((e) => e.code === code);

function mixFor(id: string, extra: { woodyPlants?: boolean } = {}) {
  const s = MIX_SITES.find((x) => x.id === id)!;
  const site = siteRequestSchema.parse({ ...s.site, ...extra });
  const eco = regionOf(s.region.ecoregionCode);
  const region = { ...s.region, ecoregionPlantCommunities: eco?.plantCommunities };
  const result = balancePalette({ species: catalogue.species, site, region });
  const chosen = result.chosen.map((c) => bySlug.get(c.slug) as Species);
  return { site, result, chosen };
}

describe('yard mixes against published plant lists (8+ sites in 6 states)', () => {
  const ids = Object.keys(PUBLISHED);
  it('covers at least 8 sites in 6 states', () => {
    const states = new Set(ids.map((id) => MIX_SITES.find((s) => s.id === id)!.region.state));
    expect(ids.length).toBeGreaterThanOrEqual(8);
    expect(states.size).toBeGreaterThanOrEqual(6);
  });

  it.each(ids)('%s', (id) => {
    const { site, result, chosen } = mixFor(id);
    const listed = new Set(PUBLISHED[id].species);
    const hits = chosen.filter((s) => listed.has(s.scientificName)).map((s) => s.scientificName);
    expect(
      hits.length,
      `${PUBLISHED[id].source} (${PUBLISHED[id].status}): only ${hits.join(', ')}`,
    ).toBeGreaterThanOrEqual(3);
    // Garden practice: no annual or biennial counted; nothing outside its light or moisture range.
    for (const s of chosen) {
      expect(['annual', 'biennial']).not.toContain(s.lifespan);
      expect(s.sun).toContain(site.sun);
      expect(s.moisture).toContain(site.moisture);
    }
    if (site.areaSqFt <= 500) expect(chosen.filter((s) => isStructural(s)).length).toBeLessThanOrEqual(1);
    if (site.goals.includes('monarchs')) expect(chosen.some((s) => isNativeMilkweed(s))).toBe(true);
    if (result.plantingMethod === 'plugs') {
      expect(totalFootprintSqFt(plantsPerSpecies(chosen, site.areaSqFt))).toBeLessThanOrEqual(site.areaSqFt);
    }
  });

  it('a small bed with shrubs asked for holds at most one, and it fits its share', () => {
    const { site, chosen } = mixFor('wi-dry-sun', { woodyPlants: true });
    const woody = chosen.filter((s) => isStructural(s));
    expect(woody.length).toBeLessThanOrEqual(1);
    expect(totalFootprintSqFt(plantsPerSpecies(chosen, site.areaSqFt))).toBeLessThanOrEqual(site.areaSqFt);
  });

  // Picks a local gardener would question, each kept out by a fact or a rule of the record.
  it.each(['mn-medium-sun', 'il-medium-sun'])(
    '%s: milkweeds known to be sold lead, not oval-leaf milkweed (USDA PLANTS gives it no commercial availability)',
    (id) => {
      // Source: USDA PLANTS characteristics, commercial_availability (ASOV has none; ASIN and ASTU are
      // "Routinely Available"), as derived into the records' commercialAvailability.
      const { chosen } = mixFor(id);
      const milkweeds = chosen.filter((s) => isNativeMilkweed(s));
      expect(milkweeds.map((s) => s.scientificName)).not.toContain('Asclepias ovalifolia');
      expect(milkweeds.some((s) => s.commercialAvailability === 'routine')).toBe(true);
    },
  );

  it.each(MIX_SITES.filter((s) => s.site.sun === 'full' && (s.site.areaSqFt ?? 0) < 21_780).map((s) => s.id))(
    "%s: no path rush among a sunny bed's species (a rush of trampled paths and lawns)",
    (id) => {
      // Source: common practice, from memory (path rush is the rush of footpaths, lawns and field tracks).
      const { chosen } = mixFor(id);
      expect(chosen.map((s) => s.scientificName)).not.toContain('Juncus tenuis');
    },
  );

  it('wi-dry-sun: no buffalograss in a Driftless Area bed (a shortgrass-plains turf grass)', () => {
    // Source: range limits from memory (species-data/ecoregions/range-limits.json), reconciled in the record.
    const { chosen } = mixFor('wi-dry-sun');
    expect(chosen.map((s) => s.scientificName)).not.toContain('Bouteloua dactyloides');
    expect(bySlug.get('bouteloua-dactyloides')?.ecoregions).not.toContain('52');
  });

  it('Maximilian sunflower is not offered as native to Wisconsin (introduced east of the plains)', () => {
    // Source: state floras, from memory; USDA PLANTS lists it native in Wisconsin, and the record's
    // nativeStates reconciliation says why it differs (the reference test checks that note exists).
    const s = bySlug.get('helianthus-maximiliani')!;
    expect(s.nativeStates).not.toContain('WI');
    expect(s.nativeStates).toContain('KS');
    expect(s.reconciliations.map((r) => r.field)).toContain('nativeStates');
    for (const id of MIX_SITES.filter((x) => x.region.state === 'WI').map((x) => x.id)) {
      expect(mixFor(id).chosen.map((c) => c.slug)).not.toContain('helianthus-maximiliani');
    }
  });

  // Something in flower from spring to frost (Homeground's rule after NRCS CP42, CHECK-VALUES §3): a
  // part of the season is met when each of its months has 3 species of the mix in flower, counted
  // from the records' bloom months as the bloom chart counts them. The objective weighs month gaps,
  // so more of these small mixes meet it: 9 of the 30 parts here (8 at half the month weight).
  it('the season rule agrees with the bloom chart, and the mixes meet at least 9 of its 30 parts', () => {
    const MONTHS = { early: [4, 5, 6], mid: [6, 7], late: [8, 9, 10] } as const;
    let met = 0;
    for (const id of Object.keys(PUBLISHED)) {
      const { result, chosen } = mixFor(id);
      const flowering = chosen.filter((s) => s.growthForm !== 'graminoid' && s.growthForm !== 'fern');
      for (const [period, months] of Object.entries(MONTHS)) {
        const rule = result.constraints.find((c) => c.id === `cp42-${period}`)!;
        const chart = months.every((m) => flowering.filter((s) => s.bloomMonths.includes(m)).length >= 3);
        if (rule.met) expect(chart, `${id} ${period}: the rule says met, the chart disagrees`).toBe(true);
        if (rule.met) met++;
      }
    }
    expect(met).toBeGreaterThanOrEqual(9);
  });

  it('the Sonoran Desert is not covered: no eastern plants offered, and the answer says so', () => {
    const { result } = mixFor('az-sonoran');
    expect(result.chosen).toEqual([]);
    expect(result.coverage.covered).toBe(false);
    expect(result.notices.join(' ')).toMatch(/does not cover/);
  });
});
