import { Injectable } from '@nestjs/common';
import { badRequest } from '../common/validation/bad-request.js';
import type { Ecoregion, PlaceLookup, PlaceQuery } from '@homeground/shared';
import zipcodes from 'zipcodes';
import { EcoregionsService } from '../ecoregions/ecoregions.service.js';
import { PolygonIndex } from '../geometry/polygon-index.js';
import { loadCountyOutlines } from '../geometry/us-counties.js';

/** How far a point may sit outside every county outline and still take the nearest (coasts, lakes). */
const NEAREST_COUNTY_KM = 8;

const COVERED =
  'Homeground covers the 48 conterminous states and the District of Columbia, where the EPA maps its Level III ecoregions.';

/** States and territories a ZIP can name outside the area covered (zipcodes' two-letter codes). */
const OUTSIDE_BY_STATE: Record<string, string> = {
  AK: 'Alaska',
  HI: 'Hawaii',
  PR: 'Puerto Rico',
  VI: 'The US Virgin Islands',
  GU: 'Guam',
  AS: 'American Samoa',
  MP: 'The Northern Mariana Islands',
};

/** Rough boxes (lon/lat degrees, west, south, east, north) for naming a point outside the covered area. */
const OUTSIDE_BY_BOX: [string, number, number, number, number][] = [
  ['Alaska', -180, 51, -129, 72],
  ['Alaska', 172, 51, 180, 56], // the western Aleutians, across the 180th meridian
  ['Hawaii', -161, 18.5, -154, 22.5],
  ['Puerto Rico', -67.5, 17.8, -65.2, 18.6],
];

/** The whole sentence for a place outside the covered area, naming it when known. */
export function outsideSentence(place: string | undefined): string {
  return place
    ? `${place} is outside the area Homeground covers. ${COVERED}`
    : `That place is outside the area Homeground covers. ${COVERED}`;
}

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
      if (!z)
        throw badRequest(
          [{ field: 'zip', message: `${q.zip} is not a US ZIP code we know` }],
          `${q.zip} is not a US ZIP code we know. Check the five digits, or click the map where your ground is.`,
        );
      const place = OUTSIDE_BY_STATE[z.state];
      if (place)
        throw badRequest(
          [{ field: 'zip', message: 'is outside the 48 conterminous states and DC' }],
          outsideSentence(place),
        );
      ({ latitude: lat, longitude: lon } = z);
      zip = { code: q.zip, city: z.city, state: z.state };
    }
    const outline = this.counties.containing(lon!, lat!) ?? this.counties.nearest(lon!, lat!, NEAREST_COUNTY_KM);
    const county = outline && this.ecoregions.county(String(outline.id));
    if (!county) throw this.notCovered(q.zip !== undefined ? 'zip' : 'lat', lon!, lat!);
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

  /**
   * A point in no county: a place named by its rough box (Alaska, Hawaii, Puerto Rico), else
   * at sea or across a border. The field message says so briefly; the message is a whole sentence.
   */
  private notCovered(field: string, lon: number, lat: number) {
    const place = OUTSIDE_BY_BOX.find(([, w, s, e, n]) => lon >= w && lon <= e && lat >= s && lat <= n)?.[0];
    if (place)
      return badRequest([{ field, message: 'is outside the 48 conterminous states and DC' }], outsideSentence(place));
    return badRequest(
      [{ field, message: 'is not on land in a US county: at sea, on a large lake or outside the United States' }],
      `${field === 'zip' ? "That ZIP code's centre" : 'That point'} (${lat.toFixed(3)}, ${lon.toFixed(3)}) is not on land in any US county: it is at sea, on one of the Great Lakes or outside the United States. ${COVERED}`,
    );
  }
}
