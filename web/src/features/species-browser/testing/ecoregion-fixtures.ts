import type { Ecoregion } from '@homeground/shared';

// Two EPA Level III ecoregions of Wisconsin (codes and names: epa-ecoregions-l3), trimmed to what
// the browser reads; the demo scenario's Larkfield lies in 52, the Driftless Area.
function region(code: string, name: string, states: Ecoregion['states']): Ecoregion {
  return {
    code,
    name,
    level2: { code: '8.1', name: 'Mixed Wood Plains' },
    level1: { code: '8', name: 'Eastern Temperate Forests' },
    states,
    plantCommunities: ['savanna', 'prairie'],
    description: 'A test description of at least twenty characters.',
    sources: {
      code: 'epa-ecoregions-l3',
      name: 'epa-ecoregions-l3',
      parents: 'from-memory',
      states: 'epa-ecoregions-l3',
      plantCommunities: 'from-memory',
    },
  };
}

export const wisconsinEcoregions: Ecoregion[] = [
  region('52', 'Driftless Area', ['IA', 'IL', 'MN', 'WI']),
  region('51', 'North Central Hardwood Forests', ['MI', 'MN', 'WI']),
];
