import type { BloomPeriod } from '../types/recommendation.js';
import type { PaletteItem } from './palette-item.js';

const PERIOD_NOUN: Record<BloomPeriod, string> = {
  early: 'early bloomers',
  mid: 'midsummer bloomers',
  late: 'late bloomers',
};
const TIER_ROLE = { front: 'front of the bed', middle: 'middle of the bed', back: 'back of the bed' } as const;

/** What one chosen species does for the mix as a whole, in short phrases. */
export function rolesOf(item: PaletteItem, mix: readonly PaletteItem[], monarchsGoal: boolean): string[] {
  const roles: string[] = [];
  if (item.milkweed && monarchsGoal) roles.push('a native milkweed, for monarchs');
  for (const p of item.periods) {
    const n = mix.filter((i) => i.periods.includes(p)).length;
    roles.push(n === 1 ? `the only one of the ${PERIOD_NOUN[p]}` : `one of ${n} ${PERIOD_NOUN[p]}`);
  }
  if (item.graminoid) roles.push('a grass or sedge to fill between the flowers');
  roles.push(TIER_ROLE[item.tier]);
  return roles;
}
