import type { ScorePart } from '../types/recommendation.js';

/**
 * Reasons in words, and whole parts of "why it fits", repeat across a catalogue ("Native to
 * Wisconsin.", "Grows in full sun or part shade; your ground has full sun."). Scoring 30,000
 * species built each one afresh, and the copies the results kept alive made garbage collection
 * most of the run. Reusing one string or one part per wording keeps the output equal at a
 * fraction of the memory. Shared parts are frozen, so a caller that changed one in place (which
 * would change every species holding it) fails loudly instead.
 *
 * A cache is module state, but only ever holds a pure function of its key, so it cannot change a
 * result; it is cleared when full so an odd catalogue cannot grow it without bound.
 */
export class Interned<K extends string | number, V> {
  private readonly values = new Map<K, V>();

  constructor(private readonly maxEntries = 2048) {}

  /** The value kept for `key`, if any. Callers build and `keep` it on a miss (no closure per call). */
  get(key: K): V | undefined {
    return this.values.get(key);
  }

  /** Keeps `value` for `key` and returns it. */
  keep(key: K, value: V): V {
    if (this.values.size >= this.maxEntries) this.values.clear();
    this.values.set(key, value);
    return value;
  }
}

export class WordCache<K extends string | number> extends Interned<K, string> {}

/** Parts shared between species: frozen when kept. */
export class PartCache<K extends string | number> extends Interned<K, ScorePart> {
  override keep(key: K, part: ScorePart): ScorePart {
    return super.keep(key, Object.freeze(part));
  }
}

/** A part shared by every species that earns it (no species-specific words). */
export function sharedPart(part: ScorePart): ScorePart {
  return Object.freeze(part);
}

/**
 * A small number naming an ordered list of levels (e.g. sun ['full', 'part'] → 1 + 2·4), with the
 * site's level in front, so a level list can key a cache without building a string.
 */
export function levelListCode<T extends string>(levels: readonly T[], list: readonly T[], site: T): number {
  let code = levels.indexOf(site);
  for (const l of list) code = code * 4 + levels.indexOf(l) + 1;
  return code;
}

/** Like levelListCode for any ordered list of known words (habitats, states); null past 10 words. */
export function wordListCode<T extends string>(known: readonly T[], list: readonly T[]): number | null {
  if (list.length > 10) return null;
  let code = 0;
  for (const w of list) code = code * 32 + known.indexOf(w) + 1;
  return code;
}
