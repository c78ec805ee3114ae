import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { createTestApp, registerUser, type TestApp } from './support/test-app.js';
import { runSql } from '../src/common/database/dialect.js';

const fieldsOf = (body: { fields?: { field: string }[] }) => (body.fields ?? []).map((f) => f.field);

describe('hardening: passwords, CSV cells and encodings, caps (e2e)', () => {
  let t: TestApp;
  let curator: string;
  let db: DataSource;

  beforeAll(async () => {
    t = await createTestApp({ LOGIN_THROTTLE_LIMIT: '100' });
    db = t.app.get(DataSource);
    const c = await registerUser(t, { email: 'ines.calder@example.org' });
    await runSql(db, `UPDATE users SET role = 'curator' WHERE id = ?`, [c.id]);
    curator = c.token;
  });
  afterAll(() => t.close());

  const userCount = async () => Number((await runSql(db, `SELECT COUNT(*) AS n FROM users`))[0].n);

  // NIST SP 800-63B §5.1.1.2: refuse passwords from lists of common values and ones built from the
  // account's own context (the user name); length alone is not enough.
  it.each([
    ['password12', /too easy to guess/],
    ['1234567890', /too easy to guess/],
    ['qwertyuiop12', /too easy to guess/],
    ['juniper.okafor-2027', /e-mail name/],
    ['my-homeground-login', /Homeground/],
  ])('refuses the password %s with a 400 naming the field and makes no account', async (password, reason) => {
    const before = await userCount();
    const res = await t.http
      .post('/api/auth/register')
      .send({ email: 'juniper.okafor@example.org', password, displayName: 'Juniper Okafor' })
      .expect(400);
    expect(fieldsOf(res.body)).toEqual(['password']);
    expect(res.body.fields[0].message).toMatch(reason);
    expect(await userCount()).toBe(before);
  });

  it('accepts a passphrase of unrelated words', async () => {
    await t.http
      .post('/api/auth/register')
      .send({ email: 'juniper.okafor@example.org', password: 'lantern-gravel-oboe', displayName: 'Juniper Okafor' })
      .expect(202);
  });

  // OWASP "CSV Injection": cells starting with = + - @ are run as formulas by spreadsheet programs.
  it('neutralises formula-like cells in the species export', async () => {
    const slug = 'asclepias-tuberosa';
    const record = (await t.http.get(`/api/species/${slug}`).expect(200)).body;
    const edited = { ...record, commonNames: ['@SUM(1+1)', ...record.commonNames] };
    delete edited.hasPhoto; // answer-only fields
    delete edited.photoCredit;
    await t.http.put(`/api/species/${slug}`).set('Authorization', `Bearer ${curator}`).send(edited).expect(200);
    const csv = (await t.http.get('/api/species/export.csv').expect(200)).text;
    const row = csv.split('\r\n').find((l) => l.startsWith(`${slug},`)) ?? '';
    expect(row).toContain(`'@SUM(1+1)`);
  });

  it('refuses an import with a formula-like cell, naming the line and column, and writes nothing', async () => {
    const csv = (await t.http.get('/api/species/export.csv').expect(200)).text.split('\r\n');
    const header = csv[0].split(',');
    const fresh = csv[1].replace(/^[^,]+,/, 'zz-formula-test-plant,');
    const familyCol = header.indexOf('family');
    const cells = fresh.split(',');
    cells[familyCol] = '=HYPERLINK("http://example.org")';
    const file = [csv[0], csv[2], cells.join(',')].join('\r\n');
    const res = await t.http
      .post('/api/species/import')
      .set('Authorization', `Bearer ${curator}`)
      .attach('file', Buffer.from(file), { filename: 'formula.csv', contentType: 'text/csv' })
      .expect(400);
    expect(res.body.rows).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ row: 3, field: 'family', message: expect.stringMatching(/formula/) }),
      ]),
    );
    await t.http.get('/api/species/zz-formula-test-plant').expect(404);
  });

  it('refuses a file that is not UTF-8 (Windows-1252, UTF-16) instead of storing replacement characters', async () => {
    const csv = (await t.http.get('/api/species/export.csv').expect(200)).text.split('\r\n');
    const latin1 = Buffer.from([csv[0], csv[1].replace(/^([^,]+,[^,]+),/, '$1 é,')].join('\r\n'), 'latin1');
    const utf16 = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(csv.slice(0, 2).join('\r\n'), 'utf16le')]);
    for (const [name, bytes] of [
      ['latin1.csv', latin1],
      ['utf16.csv', utf16],
    ] as const) {
      const res = await t.http
        .post('/api/species/import')
        .set('Authorization', `Bearer ${curator}`)
        .attach('file', bytes, { filename: name, contentType: 'text/csv' })
        .expect(400);
      expect(fieldsOf(res.body)).toEqual(['file']);
      expect(res.body.message).toMatch(/UTF-8/);
    }
  });

  it('caps the saved mixes one person keeps, with a 409 that says what to do', async () => {
    const priya = await registerUser(t, { email: 'priya.vantongeren@example.org' });
    const request = {
      site: { sun: 'full', moisture: 'dry', areaSqFt: 200, deerPressure: 'medium', goals: ['pollinators'] },
      region: { state: 'WI', ecoregionCode: '52' },
      options: { locked: [], excluded: [] },
    };
    const first = await t.http
      .post('/api/mixes')
      .set('Authorization', `Bearer ${priya.token}`)
      .send({ name: 'Front yard', request, chosen: ['asclepias-tuberosa'] });
    expect(first.status).toBe(201);
    const [row] = await runSql(db, `SELECT request, chosen FROM saved_mixes WHERE id = ?`, [first.body.id]);
    for (let i = 1; i < 200; i++)
      await runSql(db, `INSERT INTO saved_mixes (id, owner_id, name, request, chosen) VALUES (?, ?, ?, ?, ?)`, [
        randomUUID(),
        priya.id,
        `Bed ${i}`,
        row.request,
        row.chosen,
      ]);
    const over = await t.http
      .post('/api/mixes')
      .set('Authorization', `Bearer ${priya.token}`)
      .send({ name: 'One too many', request, chosen: ['asclepias-tuberosa'] })
      .expect(409);
    expect(over.body.message).toMatch(/delete one/);
    const [{ n }] = await runSql(db, `SELECT COUNT(*) AS n FROM saved_mixes WHERE owner_id = ?`, [priya.id]);
    expect(Number(n)).toBe(200);
  });
});
