import { createHash, randomBytes, randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { DEMO_SEASON, DEMO_TARGETS } from './demo-season.js';
import { runSql } from '../common/database/dialect.js';

/**
 * The Larkfield Commons Growers' plant share, part of the invented demo scenario: the second Saturday
 * of June 2027 at the invented Larkfield Commons Hall, half-hour drive-through slots, and two demo
 * reservations by the members who reserve plants (Priya Vantongeren and Sol Marchetti).
 */
export const DEMO_SHARE = {
  date: DEMO_SEASON.plantShareDate,
  place: {
    name: 'Larkfield Commons Hall',
    address: '12 Commons Lane, Larkfield, WI',
    directions: 'Drive in from Commons Lane and stay in your car: volunteers bring your plants to the window.',
  },
  limits: { perSpecies: 4, total: 12 },
  retentionDays: 30,
  whatToBring: 'A box or tray to carry your pots home. We gladly take back clean nursery pots for next season.',
  // 09:00 to 12:00 Central Daylight Time (UTC−05:00 in June), 12 households a slot.
  slots: ['09:00', '09:30', '10:00', '10:30', '11:00', '11:30'].map((start) => {
    const [h, m] = start.split(':').map(Number);
    const endMin = h * 60 + m + 30;
    const end = `${String(Math.floor(endMin / 60)).padStart(2, '0')}:${String(endMin % 60).padStart(2, '0')}`;
    return { start: `2027-06-12T${start}:00-05:00`, end: `2027-06-12T${end}:00-05:00`, capacity: 12 };
  }),
};

export const DEMO_RESERVATIONS = [
  {
    name: 'Priya Vantongeren',
    email: 'priya.vantongeren@example.org',
    // Invented ZIP for the invented town, in the range of south-west Wisconsin.
    zip: '54665',
    slot: 0,
    lines: [
      { slug: 'asclepias-tuberosa', count: 3 },
      { slug: 'monarda-fistulosa', count: 2 },
    ],
  },
  {
    name: 'Sol Marchetti',
    email: 'sol.marchetti@example.org',
    zip: '54667',
    slot: 2,
    lines: [
      { slug: 'asclepias-incarnata', count: 2 },
      { slug: 'symphyotrichum-lateriflorum', count: 4 },
      { slug: 'carex-vulpinoidea', count: 2 },
    ],
  },
];

/** Loads the demo share into the season when it has none (an organiser's own share is kept). */
export async function loadDemoShare(tx: EntityManager, groupId: string, seasonId: string): Promise<void> {
  const existing = (await runSql(tx, 'SELECT id FROM plant_shares WHERE season_id = ?', [seasonId])) as unknown[];
  if (existing.length) return;
  const shareId = randomUUID();
  await runSql(
    tx,
    `INSERT INTO plant_shares (id, group_id, season_id, share_date, place_name, place_address, place_directions, status,
       per_species_limit, total_limit, retention_days, what_to_bring) VALUES (?, ?, ?, ?, ?, ?, ?, 'open', ?, ?, ?, ?)`,
    [
      shareId,
      groupId,
      seasonId,
      DEMO_SHARE.date,
      DEMO_SHARE.place.name,
      DEMO_SHARE.place.address,
      DEMO_SHARE.place.directions,
      DEMO_SHARE.limits.perSpecies,
      DEMO_SHARE.limits.total,
      DEMO_SHARE.retentionDays,
      DEMO_SHARE.whatToBring,
    ],
  );
  const slotIds = DEMO_SHARE.slots.map(() => randomUUID());
  const booked = DEMO_SHARE.slots.map((_s, i) => DEMO_RESERVATIONS.filter((r) => r.slot === i).length);
  for (const [i, s] of DEMO_SHARE.slots.entries())
    await runSql(
      tx,
      `INSERT INTO share_slots (id, share_id, starts_at, ends_at, starts_at_ms, ends_at_ms, capacity, booked)
       VALUES (?, ?, ?, ?, ?, ?, ?, ?)`,
      [slotIds[i], shareId, s.start, s.end, Date.parse(s.start), Date.parse(s.end), s.capacity, booked[i]],
    );
  const reserved = new Map<string, number>();
  for (const r of DEMO_RESERVATIONS)
    for (const l of r.lines) reserved.set(l.slug, (reserved.get(l.slug) ?? 0) + l.count);
  // The stock starts from the season's targets, as a new share does until batches log ready counts.
  for (const [position, t] of DEMO_TARGETS.entries())
    await runSql(
      tx,
      'INSERT INTO share_stock (id, share_id, slug, offered, remaining, position) VALUES (?, ?, ?, ?, ?, ?)',
      [randomUUID(), shareId, t.slug, t.targetPlants, t.targetPlants - (reserved.get(t.slug) ?? 0), position],
    );
  const stamp = new Date().toISOString();
  for (const r of DEMO_RESERVATIONS) {
    const id = randomUUID();
    // Demo reservations were never e-mailed, so their links are random and unknown: organisers see them on the pickup list.
    const hash = createHash('sha256').update(randomBytes(32).toString('base64url')).digest('hex');
    await runSql(
      tx,
      `INSERT INTO share_reservations (id, share_id, slot_id, token_hash, status, name, email, zip, created_at, updated_at)
       VALUES (?, ?, ?, ?, 'confirmed', ?, ?, ?, ?, ?)`,
      [id, shareId, slotIds[r.slot], hash, r.name, r.email, r.zip, stamp, stamp],
    );
    for (const [position, l] of r.lines.entries())
      await runSql(
        tx,
        'INSERT INTO share_reservation_lines (id, reservation_id, slug, count, position) VALUES (?, ?, ?, ?, ?)',
        [randomUUID(), id, l.slug, l.count, position],
      );
  }
}
