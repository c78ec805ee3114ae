import type { User } from '@homeground/shared';
import { paths } from '../../config/paths.js';

/** Who sees a main-navigation entry; group roles come from GET /api/me `groups`. */
export type NavAudience = 'everyone' | 'organisers' | 'growers';

export interface NavItem {
  label: string;
  to: string;
  audience: NavAudience;
}

/** The main navigation in the order of the work (DESIGN.md "Layout"). */
export const NAV_ITEMS: readonly NavItem[] = [
  { label: 'Find plants', to: paths.findPlants.build(), audience: 'everyone' },
  { label: 'Species', to: paths.species.build(), audience: 'everyone' },
  { label: 'Cards & labels', to: paths.cardsLabels.build(), audience: 'everyone' },
  { label: 'Season', to: paths.season.build(), audience: 'organisers' },
  { label: 'My batches', to: paths.myBatches.build(), audience: 'growers' },
  { label: 'Plant share', to: paths.plantShare.build(), audience: 'everyone' },
];

/** The entries this person sees: Season for organisers of any group, My batches for growers. */
export function visibleNavItems(user: User | null): NavItem[] {
  const roles = new Set(user?.groups.map((g) => g.role) ?? []);
  return NAV_ITEMS.filter(
    (item) =>
      item.audience === 'everyone' ||
      (item.audience === 'organisers' && roles.has('organiser')) ||
      (item.audience === 'growers' && roles.has('grower')),
  );
}
