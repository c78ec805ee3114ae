import type { GrowerCapacity, LogEntryRequest } from '@homeground/shared';

/**
 * The Larkfield growers' methods and capacity and a few batch-log entries, part of the invented
 * demo scenario (shared/DESIGN.md beside the project). The batches themselves are the split
 * Homeground proposes for the demo targets over these capacities, so they always fit.
 */
export const DEMO_GROWER_CAPACITY: Record<string, GrowerCapacity[]> = {
  'juniper.okafor@example.org': [{ method: 'winter-sowing', capacity: 24 }],
  'theo.lindqvist@example.org': [
    { method: 'indoor-lights', capacity: 150 },
    { method: 'soil-blocks', capacity: 100 },
  ],
  'amara.reyes@example.org': [{ method: 'outdoor-pot-winter', capacity: 120 }],
};

/**
 * Log entries by grower and species. Amara sowed her outdoor pots in late November, as the calendar
 * says, except her wild bergamot, not sown yet: the demo's batch behind plan. Theo's black-eyed Susans
 * and Virginia wildrye under lights need no cold step, so they came up within weeks of an autumn sowing
 * (common practice, from memory: both germinate at room temperature in one to three weeks) and the
 * black-eyed Susans are ready to give, so the season's progress and the share report have counts.
 */
export const DEMO_LOG: { email: string; slug: string; entries: Omit<LogEntryRequest, 'clientId'>[] }[] = [
  {
    email: 'amara.reyes@example.org',
    slug: 'asclepias-tuberosa',
    entries: [{ kind: 'sown', count: 150, date: '2026-11-21', note: 'Three seeds a pot, pots under wire mesh.' }],
  },
  {
    email: 'amara.reyes@example.org',
    slug: 'symphyotrichum-lateriflorum',
    entries: [{ kind: 'sown', count: 150, date: '2026-11-22' }],
  },
  {
    email: 'theo.lindqvist@example.org',
    slug: 'rudbeckia-hirta',
    entries: [
      { kind: 'sown', count: 90, date: '2026-09-28', note: 'Surface-sown in cell trays under the shop lights.' },
      { kind: 'germinated', count: 64, date: '2026-10-12' },
      { kind: 'lost', count: 4, date: '2026-10-20', reason: 'damping-off' },
      { kind: 'potted-up', count: 58, date: '2026-10-26' },
      { kind: 'ready', count: 52, date: '2026-11-30', note: 'Hardened off on the porch, roots fill the pots.' },
    ],
  },
  {
    email: 'theo.lindqvist@example.org',
    slug: 'elymus-virginicus',
    entries: [
      { kind: 'sown', count: 70, date: '2026-11-09' },
      { kind: 'germinated', count: 41, date: '2026-11-24' },
    ],
  },
];
