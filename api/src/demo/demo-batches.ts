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
 * says, except her wild bergamot, not sown yet: the demo's batch behind plan.
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
];
