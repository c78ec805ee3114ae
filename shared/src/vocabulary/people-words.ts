import type { GlobalRole, GroupRole } from '../types/auth.js';

/**
 * The first name of a display name ("Priya Vantongeren" → "Priya"): what others see of a person
 * where the full name is not needed, such as a mix opened by link.
 */
export function firstName(displayName: string): string {
  return displayName.trim().split(/\s+/)[0] ?? '';
}

export interface RoleWords {
  /** "Grower" */
  title: string;
  /** What the role does, in one sentence. */
  does: string;
}

/** A person's part in a growing group. */
export const GROUP_ROLE_WORDS = {
  member: { title: 'Member', does: 'Hears when the plant share opens and reserves plants for their yard.' },
  grower: { title: 'Grower', does: 'Raises a batch of plants over winter and logs what comes up.' },
  organiser: { title: 'Organiser', does: 'Plans the season, hands out batches and runs the plant share.' },
} as const satisfies Record<GroupRole, RoleWords>;

/** A person's role across Homeground. */
export const GLOBAL_ROLE_WORDS = {
  member: { title: 'Member', does: 'Finds plants, saves mixes and joins growing groups.' },
  curator: { title: 'Curator', does: 'Looks after the species catalogue.' },
  admin: { title: 'Admin', does: 'Looks after people and roles.' },
} as const satisfies Record<GlobalRole, RoleWords>;
