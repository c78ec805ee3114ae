/** A species record's change history (curators). */
export const history = {
  panel: {
    heading: 'Changes to this record',
    loading: "Loading the record's history",
    error: "The record's history did not load.",
    empty: 'No one has changed this record since it came from the catalogue files.',
    undo: 'Undo this change',
    more: 'and {{count}} more fields',
    source: ' · source: {{source}}',
  },
  kinds: { create: 'Added', edit: 'Edited', import: 'Imported', revert: 'Undone' },
  headline: {
    byPerson: '{{kind}} by {{name}} on {{when}}',
    fromFiles: '{{kind}} from the catalogue files on {{when}}',
    fromFile: '{{headline}} (from {{file}})',
  },
  confirm: {
    title: 'Undo this change?',
    text: 'The record goes back to how it was before: {{change}}. The undo is kept in the history too, so it can be undone in turn.',
    keep: 'Keep it',
    undo: 'Undo',
  },
} as const;
