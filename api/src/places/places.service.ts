import { Injectable } from '@nestjs/common';
import { badRequest } from '../common/validation/bad-request.js';
import type { Ecoregion, PlaceLookup, PlaceQuery } from '@homeground/shared';
import zipcodes from 'zipcodes';
import { EcoregionsService } from '../ecoregions/ecoregions.service.js';
import { PolygonIndex } from '../geometry/polygon-index.js';
import { loadCountyOutlines } from '../geometry/us-counties.js';

/** How far a point may sit outside every county outline and still take the nearest (coasts, lakes). */
const NEAREST_COUNTY_KM = 8;

const bad = (field: string, message: string) => badRequest([{ field, message }], `${field} ${message}`);

/**
 * Place → your ground: state, county and EPA Level III ecoregion. ZIPs resolve offline to their
 * centroid (zipcodes package); the county comes from point-in-polygon over us-atlas outlines; the
 * ecoregion from imported boundary polygons when an admin has loaded them (exact), else from the
 * county crosswalk (dominant region, with the others offered when the county is split).
 */
@Injectable()
export class PlacesService {
  private readonly counties = new PolygonIndex(loadCountyOutlines());

  constructor(private readonly ecoregions: EcoregionsService) {}

  lookup(q: PlaceQuery): PlaceLookup {
    let lat = q.lat;
    let lon = q.lon;
    let zip: PlaceLookup['zip'] = null;
    if (q.zip !== undefined) {
      const z = zipcodes.lookup(q.zip);
      if (!z) throw bad('zip', `${q.zip} is not a US ZIP code we know`);
      ({ latitude: lat, longitude: lon } = z);
      zip = { code: q.zip, city: z.city, state: z.state };
    }
    const outline = this.counties.containing(lon!, lat!) ?? this.counties.nearest(lon!, lat!, NEAREST_COUNTY_KM);
    const county = outline && this.ecoregions.county(String(outline.id));
    if (!county) {
      const field = q.zip !== undefined ? 'zip' : 'lat';
      throw bad(field, 'is outside the conterminous United States (Homeground covers the 48 states and DC)');
    }
    const exact = this.ecoregions.hasBoundaries ? this.ecoregions.boundaryAt(lon!, lat!) : undefined;
    const dominant = exact ?? county.ecoregions[0].code;
    const describe = (code: string, share: number | null) => {
      const e: Ecoregion = this.ecoregions.get(code);
      return { code, name: e.name, share, description: e.description, level1: e.level1.name, level2: e.level2.name };
    };
    const shareOf = (code: string) => county.ecoregions.find((e) => e.code === code)?.share ?? null;
    return {
      point: { lat: lat!, lon: lon! },
      zip,
      state: county.state as PlaceLookup['state'],
      county: { fips: county.fips, name: county.name },
      ecoregion: { ...describe(dominant, shareOf(dominant)), method: exact ? 'boundary' : 'county-crosswalk' },
      otherEcoregions: county.ecoregions.filter((e) => e.code !== dominant).map((e) => describe(e.code, e.share)),
    };
  }
}
