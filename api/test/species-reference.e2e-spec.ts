import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import Papa from 'papaparse';
import { DataSource } from 'typeorm';
import { createTestApp, registerUser, type TestApp } from './support/test-app.js';
import { runSql } from '../src/common/database/dialect.js';

/**
 * The curator's reference page against the open reference data, read in place (the folder beside the
 * project, or HOMEGROUND_REFERENCE_DIR). Expected values are read here straight from the reference
 * files, not through the app's comparer, and each check names its source.
 */
const REFERENCE_DIR = process.env.HOMEGROUND_REFERENCE_DIR
  ? path.resolve(process.env.HOMEGROUND_REFERENCE_DIR)
  : path.resolve(import.meta.dirname, '..', '..', '..', 'shared', 'reference');
const FILES = [
  'usda_plants_taxa.csv',
  'usda_plants_state_distribution.csv',
  'usda_plants_characteristics.csv',
  'tallamy_shropshire_2009_lepidoptera_by_plant_genus.csv',
  'sylvanseeds_germination_database.csv',
];
const missing = FILES.filter((f) => !existsSync(path.join(REFERENCE_DIR, f)));
if (missing.length > 0) {
  const reason = `reference data missing: ${missing.join(', ')}`;
  if (process.env.CI) throw new Error(`${reason} (CI is set, so reference checks must run)`);
  console.warn(`SKIP reference page checks: ${reason}`);
}

/** The rows of one reference CSV whose `column` equals `value`. */
function referenceRows(file: string, column: string, value: string): Record<string, string>[] {
  const text = readFileSync(path.join(REFERENCE_DIR, file), 'utf8').replace(/^\uFEFF/, '');
  return Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data.filter(
    (r) => r[column]?.trim() === value,
  );
}

interface Check {
  field: string;
  file: string;
  source: string;
  record: string;
  reference: string;
  verdict: string;
  reconciliation: string | null;
}
const checkOf = (body: { comparison: { checks: Check[] } }, field: string) =>
  body.comparison.checks.find((c) => c.field === field)!;

(missing.length > 0 ? describe.skip : describe)('species beside the reference data (e2e)', () => {
  let t: TestApp;
  let curator: string;
  let member: string;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    t = await createTestApp({ LOGIN_THROTTLE_LIMIT: '100' });
    const c = await registerUser(t, { email: 'ines.calder@example.org' });
    await runSql(t.app.get(DataSource), `UPDATE users SET role = 'curator' WHERE id = ?`, [c.id]);
    curator = c.token;
    member = (await registerUser(t, { email: 'priya.vantongeren@example.org' })).token;
  });
  afterAll(() => t.close());

  it('lets only curators and admins read the comparison (role matrix)', async () => {
    await t.http.get('/api/reference-checks').expect(401);
    await t.http.get('/api/reference-checks/echinacea-purpurea').expect(401);
    await t.http.get('/api/reference-checks').set(as(member)).expect(403);
    await t.http.get('/api/reference-checks/echinacea-purpurea').set(as(member)).expect(403);
    await t.http.get('/api/reference-checks/no-such-species').set(as(curator)).expect(404);
  });

  it('purple coneflower: USDA PLANTS characteristics by value, with the record’s note on height', async () => {
    const body = (await t.http.get('/api/reference-checks/echinacea-purpurea').set(as(curator)).expect(200)).body;
    // USDA PLANTS, usda_plants_characteristics.csv, row ECPU (also quoted in the reference's SOURCES.md).
    const [ecpu] = referenceRows('usda_plants_characteristics.csv', 'symbol', 'ECPU');
    expect(ecpu.height_mature_feet).toBe('1.2');
    const height = checkOf(body, 'heightCm');
    expect(height).toMatchObject({ file: 'usda_plants_characteristics.csv', source: 'usda-plants-characteristics' });
    expect(height.reference).toBe('1.2 ft (37 cm) at maturity');
    expect(height.verdict).toBe('differs');
    expect(height.reconciliation).toMatch(/leaf clump/);
    expect(checkOf(body, 'germination.seedsPerPound')).toMatchObject({
      reference: ecpu.seed_per_pound,
      verdict: 'shown',
    });
    expect(checkOf(body, 'sun').reference).toBe(`shade tolerance: ${ecpu.shade_tolerance}`);
    // USDA PLANTS, usda_plants_taxa.csv: ECPU is Echinacea purpurea (L.) Moench, Asteraceae.
    const [taxon] = referenceRows('usda_plants_taxa.csv', 'symbol', 'ECPU');
    expect(checkOf(body, 'scientificName')).toMatchObject({ reference: 'Echinacea purpurea', verdict: 'agrees' });
    expect(checkOf(body, 'family')).toMatchObject({ reference: taxon.family, verdict: 'agrees' });
  });

  it('butterfly milkweed: USDA keeps Asclepiadaceae; the record’s Apocynaceae agrees by the APG IV realignment', async () => {
    const body = (await t.http.get('/api/reference-checks/asclepias-tuberosa').set(as(curator)).expect(200)).body;
    // USDA PLANTS, usda_plants_taxa.csv, row ASTU.
    const [astu] = referenceRows('usda_plants_taxa.csv', 'symbol', 'ASTU');
    expect(astu.family).toBe('Asclepiadaceae');
    expect(checkOf(body, 'family')).toMatchObject({
      record: 'Apocynaceae',
      reference: 'Asclepiadaceae',
      verdict: 'agrees',
    });
    // USDA PLANTS, usda_plants_state_distribution.csv: Wisconsin is among ASTU's native states.
    const [dist] = referenceRows('usda_plants_state_distribution.csv', 'symbol', 'ASTU');
    expect(dist.native_in.split(';')).toContain('Wisconsin');
    expect(checkOf(body, 'nativeStates')).toMatchObject({ source: 'usda-plants', verdict: 'agrees' });
    expect(checkOf(body, 'nativeStates').reference).toContain('WI');
    // Tallamy & Shropshire 2009: Asclepias hosts 12 Lepidoptera species.
    const [asclepias] = referenceRows('tallamy_shropshire_2009_lepidoptera_by_plant_genus.csv', 'Genus', 'Asclepias');
    expect(Number(asclepias['total Lep spp'])).toBe(12);
    expect(checkOf(body, 'wildlife.lepidopteraGenusCount')).toMatchObject({
      source: 'tallamy-shropshire-2009',
      reference: 'Asclepias: 12',
      verdict: 'agrees',
    });
  });

  it('Pennsylvania sedge: the SylvanSeeds trials (Fernández-Pascual 2021) by value', async () => {
    const body = (await t.http.get('/api/reference-checks/carex-pensylvanica').set(as(curator)).expect(200)).body;
    const rates = referenceRows('sylvanseeds_germination_database.csv', 'TPLName', 'Carex pensylvanica')
      .filter((r) => Number(r.Number_seeds) > 0)
      .map((r) => (100 * Number(r.Germinated)) / Number(r.Number_seeds));
    const lo = Math.round(Math.min(...rates));
    const hi = Math.round(Math.max(...rates));
    expect([lo, hi]).toEqual([64, 89]);
    expect(checkOf(body, 'germination.germinationRatePct')).toMatchObject({
      file: 'sylvanseeds_germination_database.csv',
      source: 'sylvanseeds-2021',
      reference: `${lo}–${hi} % in ${rates.length} laboratory trials`,
      verdict: 'agrees',
    });
  });

  it('lists differences no record explains with their count; a note on the record takes it off the list', async () => {
    const start = (await t.http.get('/api/reference-checks').set(as(curator)).expect(200)).body;
    expect(start).toMatchObject({ available: true, missingFiles: [] });
    expect(start.compared).toBeGreaterThan(100);
    // The shipped catalogue explains every difference (species-data's reference tests enforce it).
    expect(start.count).toBe(0);

    const {
      hasPhoto: _p,
      photoCredit: _c,
      ...record
    } = (await t.http.get('/api/species/asclepias-tuberosa').expect(200)).body;
    // USDA gives 2 ft (61 cm); 300–400 cm is far outside the record's range widened by a fifth.
    const tall = { ...record, heightCm: { min: 300, max: 400 } };
    await t.http.put('/api/species/asclepias-tuberosa').set(as(curator)).send(tall).expect(200);
    const after = (await t.http.get('/api/reference-checks').set(as(curator)).expect(200)).body;
    expect(after.count).toBe(1);
    expect(after.records).toEqual([
      expect.objectContaining({
        slug: 'asclepias-tuberosa',
        checks: [expect.objectContaining({ field: 'heightCm', verdict: 'differs', reconciliation: null })],
      }),
    ]);

    const explained = {
      ...tall,
      reconciliations: [
        ...record.reconciliations.filter((r: { field: string }) => r.field !== 'heightCm'),
        { field: 'heightCm', note: 'A deliberate test value to see the note take the difference off the list.' },
      ],
    };
    await t.http.put('/api/species/asclepias-tuberosa').set(as(curator)).send(explained).expect(200);
    expect((await t.http.get('/api/reference-checks').set(as(curator)).expect(200)).body.count).toBe(0);
  });
});
