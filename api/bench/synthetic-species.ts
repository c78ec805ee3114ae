import { seededRandom } from '@homeground/shared';
import type { NameEntry } from '../dist/species/search/species-search-index.js';

const SYLLABLES = [
  'ra',
  'mo',
  'lin',
  've',
  'cor',
  'ta',
  'su',
  'bel',
  'ni',
  'dor',
  'pha',
  'ul',
  'mer',
  'go',
  'sil',
  'ka',
  'tre',
  'mi',
  'on',
  'zu',
];
const ADJECTIVES = [
  'marsh',
  'prairie',
  'hill',
  'river',
  'sand',
  'shade',
  'early',
  'late',
  'tall',
  'dwarf',
  'woolly',
  'smooth',
  'hairy',
  'northern',
  'southern',
  'bluff',
  'glade',
  'meadow',
];

/**
 * Synthetic names for scale tests: real genera with invented epithets and common names built from
 * real head words ("sand aster"), so the index sees realistic overlaps. Deterministic for a seed.
 */
export function syntheticNames(real: NameEntry[], count: number, seed = 42): NameEntry[] {
  const rnd = seededRandom(seed);
  const pick = <T>(list: T[]) => list[Math.floor(rnd() * list.length)];
  const genera = [...new Set(real.filter((n) => n.kind === 'scientific').map((n) => n.name.split(' ')[0]))];
  const heads = [...new Set(real.filter((n) => n.kind === 'common').map((n) => n.name.split(' ').at(-1)!))];
  const out: NameEntry[] = [];
  for (let i = 0; i < count; i++) {
    const epithet =
      Array.from({ length: 2 + Math.floor(rnd() * 2) }, () => pick(SYLLABLES)).join('') +
      pick(['a', 'is', 'um', 'ensis']);
    const slug = `synthetic-${i}`;
    out.push({ slug, name: `${pick(genera)} ${epithet}`, kind: 'scientific' });
    out.push({ slug, name: `${pick(ADJECTIVES)} ${pick(ADJECTIVES)} ${pick(heads)}`, kind: 'common' });
    if (rnd() < 0.3) out.push({ slug, name: `${pick(genera)} ${pick(SYLLABLES)}${epithet}`, kind: 'synonym' });
  }
  return out;
}

/** One or two typing slips in words of five letters or more: a dropped, doubled, swapped or wrong letter. */
export function withTypos(text: string, rnd: () => number): string {
  const words = text.split(' ');
  const slips = 1 + Math.floor(rnd() * 2);
  for (let k = 0; k < slips; k++) {
    const candidates = words.map((w, i) => (w.length >= 5 ? i : -1)).filter((i) => i >= 0);
    if (candidates.length === 0) break;
    const wi = candidates[Math.floor(rnd() * candidates.length)];
    const w = words[wi];
    const at = 1 + Math.floor(rnd() * (w.length - 2));
    const kind = Math.floor(rnd() * 4);
    words[wi] =
      kind === 0
        ? w.slice(0, at) + w.slice(at + 1)
        : kind === 1
          ? w.slice(0, at) + w[at] + w.slice(at)
          : kind === 2
            ? w.slice(0, at - 1) + w[at] + w[at - 1] + w.slice(at + 1)
            : w.slice(0, at) + 'aeiou'[Math.floor(rnd() * 5)] + w.slice(at + 1);
  }
  return words.join(' ');
}
