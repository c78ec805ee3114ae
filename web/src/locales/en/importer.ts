/** Importing species from a CSV file on screen (curators). */
export const importer = {
  page: {
    title: 'Import species from a CSV file',
    intro:
      'Use the columns of the catalogue export. Homeground checks the whole file first and shows what it would add and change; nothing is written until you import, and then every row is written or none.',
    notCurator: 'Importing species is for curators.',
    open: 'Import from a CSV file',
    loading: 'Checking your sign-in',
  },
  file: {
    label: 'CSV file',
    hint: 'UTF-8, with a header row; at most 10 MB.',
    check: 'Check the file',
    checking: 'Checking',
    choose: 'Choose a file first.',
  },
  preview: {
    title: 'What this file would do',
    summary: 'Adds {{created}}, changes {{changed}}, leaves {{unchanged}} as they are.',
    line: 'Line',
    species: 'Species',
    action: 'What happens',
    fields: 'Fields that change',
    create: 'Added',
    change: 'Changed',
    unchanged: 'No change',
    import_one: 'Import {{count}} species',
    import_other: 'Import {{count}} species',
    importing: 'Importing',
    nothing: 'Nothing in this file differs from the catalogue.',
  },
  errors: {
    title: 'Nothing was written: please fix these rows',
    summary_one: '{{count}} problem in the file.',
    summary_other: '{{count}} problems in the file.',
    line: 'Line',
    field: 'Column',
    message: 'Problem',
  },
  done: {
    title: 'Imported',
    text: 'Added {{created}} and updated {{updated}} species. Each change is in its record’s history with the file name.',
  },
} as const;
