import { z } from 'zod';
import { ecoregionCodeSchema } from './ecoregion.js';
import { slugSchema } from './species.js';

/**
 * Path parameters. Each route's parameters are parsed with one of these, so a bad id answers 400
 * naming the parameter, the same way a bad body field does.
 */

/** A species or group slug in a path, e.g. `/api/species/zizia-aurea`. */
export const slugParamSchema = slugSchema;

/** A UUID (version 4) in a path, e.g. a user id or a saved mix's link. */
export const uuidParamSchema = z.uuidv4({ message: 'must be a UUID' });

/** An EPA Level III ecoregion code in a path, e.g. `/api/ecoregions/52`. */
export const ecoregionCodeParamSchema = ecoregionCodeSchema;
