import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { createTestApp, registerUser, type TestApp } from './support/test-app.js';
import { runSql } from '../src/common/database/dialect.js';

interface Change {
  id: string;
  kind: string;
  fileName: string | null;
  revertOf: string | null;
  changedBy: { displayName: string } | null;
  changes: { field: string; before: string | null; after: string | null; source: string | null }[];
}

describe('species history: every change kept, read and undone (e2e)', () => {
  let t: TestApp;
  let curator: string;
  let member: string;
  const slug = 'asclepias-tuberosa';

  beforeAll(async () => {
    t = await createTestApp({ LOGIN_THROTTLE_LIMIT: '100' });
    const c = await registerUser(t, { email: 'ines.calder@example.org', displayName: 'Ines Calder' });
    await runSql(t.app.get(DataSource), `UPDATE users SET role = 'curator' WHERE id = ?`, [c.id]);
    curator = c.token;
    member = (await registerUser(t, { email: 'juniper.okafor@example.org' })).token;
  });
  afterAll(() => t.close());

  const as = (token: string) => ({ Authorization: `Bearer ${token}` });
  const record = async (s = slug) => {
    const body = (await t.http.get(`/api/species/${s}`).expect(200)).body;
    delete body.hasPhoto; // answer-only fields
    delete body.photoCredit;
    return body;
  };
  const history = async (s = slug): Promise<Change[]> =>
    (await t.http.get(`/api/species/${s}/history`).set(as(curator)).expect(200)).body;

  it('keeps who changed what, field by field, with the source the record gives', async () => {
    const before = await record();
    const edited = {
      ...before,
      heightCm: { min: before.heightCm.min, max: before.heightCm.max + 10 },
      germination: { ...before.germination, germinationRatePct: 70 },
    };
    await t.http.put(`/api/species/${slug}`).set(as(curator)).send(edited).expect(200);
    const [latest] = await history();
    expect(latest).toMatchObject({ kind: 'edit', changedBy: { displayName: 'Ines Calder' }, fileName: null });
    expect(latest.changes.map((c) => c.field)).toEqual(['germination.germinationRatePct', 'heightCm']);
    const height = latest.changes.find((c) => c.field === 'heightCm')!;
    expect(JSON.parse(height.before!)).toEqual(before.heightCm);
    expect(JSON.parse(height.after!)).toEqual(edited.heightCm);
    expect(height.source).toBe(before.sources.heightCm ?? null);
  });

  it('reverts a change, restoring the earlier values, and the revert is itself in the history', async () => {
    const [edit] = await history();
    const reverted = await t.http
      .post(`/api/species/${slug}/history/${edit.id}/revert`)
      .set(as(curator))
      .send({})
      .expect(200);
    const after = await record();
    expect(after.heightCm.max).toBe(JSON.parse(edit.changes.find((c) => c.field === 'heightCm')!.before!).max);
    expect(reverted.body.heightCm).toEqual(after.heightCm);
    const [latest, previous] = await history();
    expect(latest).toMatchObject({ kind: 'revert', revertOf: edit.id });
    expect(previous.id).toBe(edit.id);
  });

  it('refuses to revert the creation of a species (409) and an unknown change (404)', async () => {
    const base = await record('asclepias-incarnata');
    const fresh = { ...base, slug: 'zz-history-test-plant', scientificName: 'Testia historica', usdaSymbol: 'ZZHIS' };
    await t.http.post('/api/species').set(as(curator)).send(fresh).expect(201);
    const [created] = await history('zz-history-test-plant');
    expect(created.kind).toBe('create');
    expect(created.changes.length).toBeGreaterThan(10);
    await t.http
      .post(`/api/species/zz-history-test-plant/history/${created.id}/revert`)
      .set(as(curator))
      .send({})
      .expect(409);
    await t.http
      .post(`/api/species/${slug}/history/00000000-0000-4000-8000-000000000000/revert`)
      .set(as(curator))
      .send({})
      .expect(404);
  });

  it('lets only curators and admins read the history or revert (role matrix)', async () => {
    const [any] = await history();
    await t.http.get(`/api/species/${slug}/history`).expect(401);
    await t.http.get(`/api/species/${slug}/history`).set(as(member)).expect(403);
    await t.http.post(`/api/species/${slug}/history/${any.id}/revert`).set(as(member)).expect(403);
    await t.http.post(`/api/species/${slug}/history/${any.id}/revert`).expect(401);
  });

  // The all-or-nothing import with rows that would be accepted on their own: a new species and an edit
  // to an existing one beside one bad row; neither may land. Then the file without the bad row lands,
  // each record as one "import" change naming the file.
  it('imports all or nothing: a good new row and a good edit do not land beside a bad row', async () => {
    const lines = (await t.http.get('/api/species/export.csv').expect(200)).text.split('\r\n');
    const header = lines[0].split(',');
    const milkweedLine = lines.find((l) => l.startsWith(`${slug},`))!;
    const heightCol = header.indexOf('heightMaxCm');
    const cells = milkweedLine.split(',');
    const oldHeight = Number(cells[heightCol]);
    cells[heightCol] = String(oldHeight + 5);
    const edit = cells.join(',');
    const other = lines.find((l) => l.startsWith('asclepias-incarnata,'))!;
    const fresh = other.replace(
      /^asclepias-incarnata,Asclepias incarnata,ASIN,/,
      'zz-import-new-plant,Importia nova,ZZIMP,',
    );
    expect(fresh.startsWith('zz-import-new-plant,Importia nova,ZZIMP,')).toBe(true);
    const badCells = lines[3].split(',');
    badCells[heightCol] = 'tall';
    const bad = badCells.join(',');

    const refused = await t.http
      .post('/api/species/import')
      .set(as(curator))
      .attach('file', Buffer.from([lines[0], edit, fresh, bad].join('\r\n')), 'spring-edits.csv')
      .expect(400);
    expect(refused.body.rows).toEqual([expect.objectContaining({ row: 4, field: 'heightMaxCm' })]);
    await t.http.get('/api/species/zz-import-new-plant').expect(404);
    expect((await record()).heightCm.max).toBe(oldHeight);

    const ok = await t.http
      .post('/api/species/import')
      .set(as(curator))
      .attach('file', Buffer.from([lines[0], edit, fresh].join('\r\n')), 'spring-edits.csv')
      .expect(200);
    expect(ok.body).toMatchObject({ created: 1, updated: 1 });
    expect((await record()).heightCm.max).toBe(oldHeight + 5);
    expect((await record('zz-import-new-plant')).scientificName).toBe('Importia nova');
    const [latest] = await history();
    expect(latest).toMatchObject({ kind: 'import', fileName: 'spring-edits.csv' });
    expect(latest.changes.map((c) => c.field)).toEqual(['heightCm']);
    expect((await history('zz-import-new-plant'))[0]).toMatchObject({ kind: 'import', fileName: 'spring-edits.csv' });
  });
});
