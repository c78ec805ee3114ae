import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { createTestApp, registerUser, type TestApp } from './support/test-app.js';
import { runSql } from '../src/common/database/dialect.js';

/** Its own file: the reference folder is a setting, read once when the app's config first loads. */
describe('the reference page without the reference files (e2e)', () => {
  let t: TestApp;
  let curator: string;
  const empty = mkdtempSync(path.join(tmpdir(), 'homeground-no-reference-'));

  beforeAll(async () => {
    t = await createTestApp({ HOMEGROUND_REFERENCE_DIR: empty });
    const c = await registerUser(t, { email: 'ines.calder@example.org' });
    await runSql(t.app.get(DataSource), `UPDATE users SET role = 'curator' WHERE id = ?`, [c.id]);
    curator = c.token;
  });
  afterAll(async () => {
    await t.close();
    rmSync(empty, { recursive: true, force: true });
  });

  it('says the files are missing, by name, instead of failing', async () => {
    const auth = { Authorization: `Bearer ${curator}` };
    const list = (await t.http.get('/api/reference-checks').set(auth).expect(200)).body;
    expect(list).toMatchObject({ available: false, count: 0, records: [] });
    expect(list.missingFiles).toEqual(
      expect.arrayContaining(['usda_plants_taxa.csv', 'usda_plants_characteristics.csv']),
    );
    const one = (await t.http.get('/api/reference-checks/asclepias-tuberosa').set(auth).expect(200)).body;
    expect(one).toMatchObject({ available: false, comparison: null });
  });
});
