import type { AuthResponse, Group, HealthResponse, StatsResponse, User } from '@homeground/shared';

// Demo data from the invented scenario in the product design guide (shared/DESIGN.md beside the project) ("Demo scenario"): the
// Larkfield Commons Growers of Larkfield, Wisconsin (EPA Level III ecoregion 52). Counts are
// made up for the tests; the screens must show whatever the API answers.

const LARKFIELD = {
  groupId: 'g-larkfield',
  groupSlug: 'larkfield-commons-growers',
  groupName: 'Larkfield Commons Growers',
};

export const maraOrganiser: User = {
  id: 'u-mara',
  email: 'mara.ellsworth@example.org',
  displayName: 'Mara Ellsworth',
  role: 'member',
  groups: [{ ...LARKFIELD, role: 'organiser' }],
  createdAt: '2025-10-04T15:00:00.000Z',
};

export const juniperGrower: User = {
  id: 'u-juniper',
  email: 'juniper.okafor@example.org',
  displayName: 'Juniper Okafor',
  role: 'member',
  groups: [{ ...LARKFIELD, role: 'grower' }],
  createdAt: '2025-10-11T15:00:00.000Z',
};

export const priyaMember: User = {
  id: 'u-priya',
  email: 'priya.vantongeren@example.org',
  displayName: 'Priya Vantongeren',
  role: 'member',
  groups: [],
  createdAt: '2026-03-02T15:00:00.000Z',
};

export function authFor(user: User, accessToken = `token-for-${user.id}`): AuthResponse {
  return { accessToken, expiresIn: 3600, user };
}

export const stats: StatsResponse = { species: 412, groups: 3, ecoregions: 7, users: 58 };

export const health: HealthResponse = {
  status: 'ok',
  version: '0.1.0-test',
  database: { status: 'up', migrations: 1 },
  uptimeSeconds: 120,
};

export const groups: Group[] = [
  {
    id: LARKFIELD.groupId,
    slug: LARKFIELD.groupSlug,
    name: LARKFIELD.groupName,
    town: 'Larkfield',
    state: 'WI',
    ecoregionCode: '52',
    members: 7,
  },
];
