import type { GlobalRole, GroupRole } from '@homeground/shared';

/**
 * The invented demo scenario: the Larkfield Commons Growers of Larkfield, Wisconsin, in the
 * Driftless Area (EPA Level III ecoregion 52). Every person is invented; e-mail at example.org
 * (RFC 2606). These passwords are printed at start and in the README, and never work in production.
 */
export const DEMO_GROUP = {
  slug: 'larkfield-commons-growers',
  name: 'Larkfield Commons Growers',
  town: 'Larkfield',
  state: 'WI',
  ecoregionCode: '52',
};

export interface DemoPerson {
  displayName: string;
  email: string;
  password: string;
  role: GlobalRole;
  groupRole?: GroupRole;
  note: string;
}

export const DEMO_PEOPLE: DemoPerson[] = [
  {
    displayName: 'Mara Ellsworth',
    email: 'mara.ellsworth@example.org',
    password: 'larkfield-mara',
    role: 'member',
    groupRole: 'organiser',
    note: 'organiser',
  },
  {
    displayName: 'Ines Calder',
    email: 'ines.calder@example.org',
    password: 'larkfield-ines',
    role: 'curator',
    note: 'curator (edits the catalogue)',
  },
  {
    displayName: 'Wes Hollenbeck',
    email: 'wes.hollenbeck@example.org',
    password: 'larkfield-wes',
    role: 'admin',
    note: 'admin (people and roles)',
  },
  {
    displayName: 'Juniper Okafor',
    email: 'juniper.okafor@example.org',
    password: 'larkfield-juniper',
    role: 'member',
    groupRole: 'grower',
    note: 'grower: winter sowing in covered containers',
  },
  {
    displayName: 'Theo Lindqvist',
    email: 'theo.lindqvist@example.org',
    password: 'larkfield-theo',
    role: 'member',
    groupRole: 'grower',
    note: 'grower: indoor under lights, soil blocks',
  },
  {
    displayName: 'Amara Reyes',
    email: 'amara.reyes@example.org',
    password: 'larkfield-amara',
    role: 'member',
    groupRole: 'grower',
    note: 'grower: outdoor pots over winter',
  },
  {
    displayName: 'Priya Vantongeren',
    email: 'priya.vantongeren@example.org',
    password: 'larkfield-priya',
    role: 'member',
    groupRole: 'member',
    note: 'member of the group (reserves plants)',
  },
  {
    displayName: 'Sol Marchetti',
    email: 'sol.marchetti@example.org',
    password: 'larkfield-sol',
    role: 'member',
    note: 'neighbour, not in the group (reserves plants)',
  },
];
