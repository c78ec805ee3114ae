import type { User } from '@homeground/shared';
import { paths } from '../../config/paths.js';
import type { common } from '../../locales/en/common.js';

/** Who sees a main-navigation entry; group roles come from GET /api/me `groups`. */
export type NavAudience = 'everyone' | 'organisers' | 'growers';

export interface NavItem {
  /** Its words under `nav.` in the common catalogue. */
  labelKey: keyof typeof common.nav;
  to: string;
  audience: NavAudience;
}

/** The main navigation in the order of the work (DESIGN.md "Layout"). */
export const NAV_ITEMS: readonly NavItem[] = [
  { labelKey: 'findPlants', to: paths.findPlants.build(), audience: 'everyone' },
  { labelKey: 'species', to: paths.species.build(), audience: 'everyone' },
  { labelKey: 'cardsLabels', to: paths.cardsLabels.build(), audience: 'everyone' },
  { labelKey: 'season', to: paths.season.build(), audience: 'organisers' },
  { labelKey: 'myBatches', to: paths.myBatches.build(), audience: 'growers' },
  { labelKey: 'plantShare', to: paths.plantShare.build(), audience: 'everyone' },
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
