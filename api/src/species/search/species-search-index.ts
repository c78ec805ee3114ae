import Fuse from 'fuse.js';
import { normaliseName, trigrams } from './normalise.js';

export interface NameEntry {
  slug: string;
  name: string;
  kind: 'scientific' | 'common' | 'synonym';
}

interface IndexedName extends NameEntry {
  normalised: string;
}

export interface SearchHit {
  slug: string;
  /** 0 = perfect; fuse.js score of the best-matching name. */
  score: number;
  matchedName: string;
}

/**
 * Typo-tolerant species search over scientific names, common names and synonyms.
 * A trigram inverted index picks a few dozen candidate names cheaply (so 30,000 species stay fast),
 * then fuse.js ranks just those candidates by edit-distance-like closeness.
 */
export class SpeciesSearchIndex {
  private readonly names: IndexedName[];
  private readonly postings = new Map<string, number[]>();

  constructor(
    entries: NameEntry[],
    private readonly candidateLimit = 48,
  ) {
    this.names = entries.map((e) => ({ ...e, normalised: normaliseName(e.name) }));
    this.names.forEach((n, i) => {
      for (const t of trigrams(n.normalised)) {
        const list = this.postings.get(t);
        if (list) list.push(i);
        else this.postings.set(t, [i]);
      }
    });
  }

  get size(): number {
    return this.names.length;
  }

  search(query: string, limit = 20): SearchHit[] {
    const q = normaliseName(query);
    if (!q) return [];
    const candidates = this.candidates(q);
    if (candidates.length === 0) return [];
    const fuse = new Fuse(candidates, {
      keys: ['normalised'],
      includeScore: true,
      ignoreLocation: true,
      threshold: 0.45,
    });
    const best = new Map<string, SearchHit>();
    for (const r of fuse.search(q)) {
      const hit = { slug: r.item.slug, score: r.score ?? 1, matchedName: r.item.name };
      const prev = best.get(hit.slug);
      if (!prev || hit.score < prev.score) best.set(hit.slug, hit);
    }
    return [...best.values()].sort((a, b) => a.score - b.score || a.slug.localeCompare(b.slug)).slice(0, limit);
  }

  /** Names sharing the most trigrams with the query, best first (ties by position for determinism). */
  private candidates(q: string): IndexedName[] {
    const grams = trigrams(q);
    const counts = new Map<number, number>();
    for (const g of grams) {
      const list = this.postings.get(g);
      if (!list) continue;
      for (const i of list) counts.set(i, (counts.get(i) ?? 0) + 1);
    }
    const minShared = Math.max(1, Math.floor(grams.length * 0.25));
    const ranked: [number, number][] = [];
    for (const [i, c] of counts) {
      if (c < minShared) continue;
      // Dice coefficient on trigram sets: rewards overlap, penalises long unrelated names.
      const nameGrams = this.names[i].normalised.replace(/ /g, '').length + 2;
      ranked.push([i, (2 * c) / (grams.length + nameGrams)]);
    }
    ranked.sort((a, b) => b[1] - a[1] || a[0] - b[0]);
    return ranked.slice(0, this.candidateLimit).map(([i]) => this.names[i]);
  }
}
