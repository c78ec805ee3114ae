import { formatSpacingInches, type MixQuantity } from '@homeground/shared';

/** Two significant figures, as seed weights are estimates: 0.043 g, 1.2 g, 15 g. */
function sig(n: number): string {
  if (n === 0) return '0';
  return String(Number(n.toPrecision(2)));
}

export function plantsWords(q: MixQuantity | undefined): string {
  return q ? `${q.plants.toLocaleString('en-US')} plants` : 'not worked out';
}

export function spacingWords(q: MixQuantity | undefined): string {
  return q ? formatSpacingInches(q.spacingIn) : '—';
}

export function seedsWords(q: MixQuantity | undefined): string {
  return q ? `${q.seedsToSow.toLocaleString('en-US')} seeds` : '—';
}

export function weightWords(q: MixQuantity | undefined): string {
  if (!q) return '—';
  if (!q.seedWeight) return 'weight not known';
  return `${sig(q.seedWeight.grams)} g (${sig(q.seedWeight.ounces)} oz)`;
}

/** "Seed counts allow for 20% of seedlings lost before planting out." */
export function lossFactorWords(lossFactor: number): string {
  return `Seeds to sow allow for ${Math.round(lossFactor * 100)}% of seedlings lost before planting out, and for each species' germination rate.`;
}
