/** The admin's people page. */
export const people = {
  page: {
    title: 'People',
    intro: 'Accounts, roles and sign-in activity across Homeground.',
    notAdmin: 'This page is for Homeground admins.',
    loading: 'Checking your sign-in',
  },
  list: {
    heading: 'Everyone with an account',
    switchHint: 'Switching an account off signs the person out at once; their groups and history stay.',
    roleLine: '{{title}}: {{does}}',
    loading: 'Loading people',
    error: 'The list of people did not load.',
    scrollRegion: 'People, scrolls sideways on a phone',
  },
  columns: {
    name: 'Name',
    email: 'E-mail',
    role: 'Role',
    groups: 'Groups',
    lastSignIn: 'Last signed in',
    account: 'Account',
  },
  row: {
    you: '{{name}} (you)',
    roleOf: 'Role of {{name}}',
    groupRole: '{{group}} ({{role}})',
    noGroups: 'None',
    never: 'Never',
    held: '{{last}} · held back after too many wrong passwords',
    off: 'Switched off',
    switchOn: 'Switch on',
    switchOff: 'Switch off',
    switchOnLabel: 'Switch on the account of {{name}}',
    switchOffLabel: 'Switch off the account of {{name}}',
  },
} as const;
