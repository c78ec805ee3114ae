import type { RegionContext, SiteRequest } from '@homeground/shared';

/**
 * The sites the published-list tests and the before/after snapshot use: real places (state and EPA
 * Level III ecoregion) with the kind of bed a homeowner plants there. No people, no addresses.
 */
export interface MixSite {
  id: string;
  label: string;
  site: SiteRequest;
  region: RegionContext;
}

export const MIX_SITES: MixSite[] = [
  {
    id: 'wi-dry-sun',
    label: 'WI 52 dry sun 200 ft²',
    region: { state: 'WI', ecoregionCode: '52' },
    site: { sun: 'full', moisture: 'dry', areaSqFt: 200, deerPressure: 'medium', goals: ['pollinators', 'monarchs'] },
  },
  {
    id: 'wi-rain',
    label: 'WI 53 wet sun rain garden 150 ft²',
    region: { state: 'WI', ecoregionCode: '53' },
    site: { sun: 'full', moisture: 'wet', areaSqFt: 150, deerPressure: 'low', goals: ['rain-garden', 'monarchs'] },
  },
  {
    id: 'wi-shade',
    label: 'WI 52 shade 200 ft²',
    region: { state: 'WI', ecoregionCode: '52' },
    site: { sun: 'shade', moisture: 'medium', areaSqFt: 200, deerPressure: 'medium', goals: ['shade-garden'] },
  },
  {
    id: 'mn-medium-sun',
    label: 'MN 51 medium sun 300 ft²',
    region: { state: 'MN', ecoregionCode: '51' },
    site: {
      sun: 'full',
      moisture: 'medium',
      areaSqFt: 300,
      deerPressure: 'medium',
      goals: ['pollinators', 'monarchs'],
    },
  },
  {
    id: 'il-medium-sun',
    label: 'IL 54 medium sun 250 ft²',
    region: { state: 'IL', ecoregionCode: '54' },
    site: { sun: 'full', moisture: 'medium', areaSqFt: 250, deerPressure: 'low', goals: ['pollinators', 'monarchs'] },
  },
  {
    id: 'ga-shade',
    label: 'GA 45 shade 200 ft²',
    region: { state: 'GA', ecoregionCode: '45' },
    site: { sun: 'shade', moisture: 'medium', areaSqFt: 200, deerPressure: 'medium', goals: ['shade-garden'] },
  },
  {
    id: 'ma-shade',
    label: 'MA 59 shade 200 ft²',
    region: { state: 'MA', ecoregionCode: '59' },
    site: { sun: 'shade', moisture: 'medium', areaSqFt: 200, deerPressure: 'high', goals: ['shade-garden'] },
  },
  {
    id: 'nc-dry-sun',
    label: 'NC 45 dry sun 250 ft²',
    region: { state: 'NC', ecoregionCode: '45' },
    site: { sun: 'full', moisture: 'dry', areaSqFt: 250, deerPressure: 'medium', goals: ['pollinators', 'monarchs'] },
  },
  {
    id: 'pa-rain',
    label: 'PA 64 wet part-sun rain garden 200 ft²',
    region: { state: 'PA', ecoregionCode: '64' },
    site: { sun: 'part', moisture: 'wet', areaSqFt: 200, deerPressure: 'medium', goals: ['rain-garden'] },
  },
  {
    id: 'mo-meadow',
    label: 'MO 40 medium sun meadow 1 acre',
    region: { state: 'MO', ecoregionCode: '40' },
    site: {
      sun: 'full',
      moisture: 'medium',
      areaSqFt: 43_560,
      deerPressure: 'medium',
      goals: ['pollinators', 'monarchs'],
    },
  },
  {
    id: 'az-sonoran',
    label: 'AZ 81 dry sun 200 ft²',
    region: { state: 'AZ', ecoregionCode: '81' },
    site: { sun: 'full', moisture: 'dry', areaSqFt: 200, deerPressure: 'low', goals: ['pollinators'] },
  },
];
