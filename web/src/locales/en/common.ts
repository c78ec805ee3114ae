/** The frame every page shares: top bar, navigation, language switch, states and the footer. */
export const common = {
  nav: {
    main: 'Main',
    menu: 'Main menu',
    findPlants: 'Find plants',
    species: 'Species',
    cardsLabels: 'Cards & labels',
    season: 'Season',
    myBatches: 'My batches',
    plantShare: 'Plant share',
  },
  language: {
    label: 'Language',
  },
  account: {
    signIn: 'Sign in',
    checking: 'Checking your sign-in',
    yourAccount: 'Your account',
    menuLabel: 'Your account: {{name}}',
    signOut: 'Sign out',
  },
  shell: {
    skip: 'Skip to content',
    loadingPage: 'Loading the page',
    footer: 'Homeground: native plants for your ground, grown and shared by neighbours.',
    titleSuffix: '{{title}} · Homeground',
  },
  supplies: {
    none: 'Nothing to get yet: there are no batches.',
    what: 'What',
    howMuch: 'How much',
    for: 'For',
    cautions: 'Cautions',
  },
  states: {
    tryAgain: 'Try again',
  },
  routeError: {
    title: 'This page did not load',
    somethingWrong: 'Something went wrong.',
    updated: 'Homeground was updated since this tab opened. Reload the page to get the new version.',
    unexpected: 'Something unexpected went wrong.',
    reload: 'Reload the page',
  },
  notFound: {
    title: 'Page not found',
    body: 'There is no page at this address. It may have moved, or the link has a typo.',
    home: 'Go to the home page',
  },
  placeholder: {
    notYet: 'It is not available yet.',
    backHome: 'Back to the home page',
    myBatches:
      'Here growers will see the batches they have been given and keep a batch log of what they sowed, what came up and what is ready.',
    plantShare:
      'Here your group will run its plant share: neighbours reserve plants and choose a pickup slot, and organisers see who takes what home.',
  },
  units: {
    tableScrolls: 'On a narrow screen this table scrolls sideways; the first column stays in place.',
  },
} as const;
