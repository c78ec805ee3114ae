import { Injectable } from '@nestjs/common';
import { badRequest } from '../common/validation/bad-request.js';
import type { Ecoregion, PlaceLookup, PlaceQuery, WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import zipcodes from 'zipcodes';
import { EcoregionsService } from '../ecoregions/ecoregions.service.js';
import { PolygonIndex } from '../geometry/polygon-index.js';
import { loadCountyOutlines } from '../geometry/us-counties.js';

/** How far a point may sit outside every county outline and still take the nearest (coasts, lakes). */
const NEAREST_COUNTY_KM = 8;

/** States and territories a ZIP can name outside the area covered (zipcodes' two-letter codes); names in the catalogues. */
const OUTSIDE_CODES = ['AK', 'HI', 'PR', 'VI', 'GU', 'AS', 'MP'] as const;
type OutsideCode = (typeof OUTSIDE_CODES)[number];

function isOutsideCode(state: string): state is OutsideCode {
  return (OUTSIDE_CODES as readonly string[]).includes(state);
}

/** Rough boxes (lon/lat degrees, west, south, east, north) for naming a point outside the covered area. */
const OUTSIDE_BY_BOX: [OutsideCode, number, number, number, number][] = [
  ['AK', -180, 51, -129, 72],
  ['AK', 172, 51, 180, 56], // the western Aleutians, across the 180th meridian
  ['HI', -161, 18.5, -154, 22.5],
  ['PR', -67.5, 17.8, -65.2, 18.6],
];

/** The whole sentence for a place outside the covered area, naming it when known, in the reader's language. */
export function outsideSentence(place: OutsideCode | undefined, locale: WordLocale = 'en'): string {
  const say = apiWords(locale);
  return place ? say('places.outsideNamed', { place: say(`places.outside.${place}`) }) : say('places.outsideUnnamed');
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

  lookup(q: PlaceQuery, locale: WordLocale = 'en'): PlaceLookup {
    const say = apiWords(locale);
    let lat = q.lat;
    let lon = q.lon;
    let zip: PlaceLookup['zip'] = null;
    if (q.zip !== undefined) {
      const z = zipcodes.lookup(q.zip);
      if (!z)
        throw badRequest(
          [{ field: 'zip', message: say('places.unknownZipField', { zip: q.zip }) }],
          say('places.unknownZip', { zip: q.zip }),
        );
      if (isOutsideCode(z.state))
        throw badRequest([{ field: 'zip', message: say('places.outsideField') }], outsideSentence(z.state, locale));
      ({ latitude: lat, longitude: lon } = z);
      zip = { code: q.zip, city: z.city, state: z.state };
    }
    const outline = this.counties.containing(lon!, lat!) ?? this.counties.nearest(lon!, lat!, NEAREST_COUNTY_KM);
    const county = outline && this.ecoregions.county(String(outline.id));
    if (!county) throw this.notCovered(q.zip !== undefined ? 'zip' : 'lat', lon!, lat!, locale);
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
  private notCovered(field: string, lon: number, lat: number, locale: WordLocale) {
    const say = apiWords(locale);
    const place = OUTSIDE_BY_BOX.find(([, w, s, e, n]) => lon >= w && lon <= e && lat >= s && lat <= n)?.[0];
    if (place) return badRequest([{ field, message: say('places.outsideField') }], outsideSentence(place, locale));
    // Coordinates stay in the plain dotted form in both languages: they are read back into a map.
    const at = { lat: lat.toFixed(3), lon: lon.toFixed(3) };
    return badRequest(
      [{ field, message: say('places.notOnLandField') }],
      say(field === 'zip' ? 'places.notOnLandZip' : 'places.notOnLandPoint', at),
    );
  }
}
