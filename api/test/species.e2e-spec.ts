import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import path from 'node:path';
import sharp from 'sharp';
import { DataSource } from 'typeorm';
import { createTestApp, registerUser, type TestApp } from './support/test-app.js';
import { runSql } from '../src/common/database/dialect.js';

async function tokenWithRole(t: TestApp, email: string, role: 'curator' | 'member'): Promise<string> {
  const u = await registerUser(t, { email });
  if (role !== 'member') await runSql(t.app.get(DataSource), `UPDATE users SET role = ? WHERE id = ?`, [role, u.id]);
  return u.token;
}

describe('species catalogue API (e2e)', () => {
  let t: TestApp;
  let curator: string;
  let member: string;

  beforeAll(async () => {
    t = await createTestApp({ LOGIN_THROTTLE_LIMIT: '100' });
    curator = await tokenWithRole(t, 'ines.calder@example.org', 'curator');
    member = await tokenWithRole(t, 'sol.marchetti@example.org', 'member');
  });
  afterAll(() => t.close());

  it('loads the curated catalogue into SQLite at start', async () => {
    const [{ n }] = await runSql(t.app.get(DataSource), `SELECT COUNT(*) AS n FROM species`);
    const list = await t.http.get('/api/species?pageSize=1').expect(200);
    expect(list.body.total).toBe(n);
    expect(n).toBeGreaterThan(0);
  });

  it('pages through the whole catalogue without repeats', async () => {
    const first = await t.http.get('/api/species?pageSize=50&page=1').expect(200);
    const second = await t.http.get('/api/species?pageSize=50&page=2').expect(200);
    expect(first.body.items).toHaveLength(Math.min(50, first.body.total));
    const slugs = [...first.body.items, ...second.body.items].map((s: { slug: string }) => s.slug);
    expect(new Set(slugs).size).toBe(slugs.length);
  });

  it('filters by state, sun, moisture, bloom month, growth form and monarch host together', async () => {
    const res = await t.http
      .get('/api/species?state=WI&sun=full&moisture=dry&bloomMonth=7&growthForm=forb&pageSize=200')
      .expect(200);
    expect(res.body.total).toBeGreaterThan(0);
    for (const s of res.body.items) {
      expect(s).toMatchObject({ growthForm: 'forb' });
      expect(s.sun).toContain('full');
      expect(s.moisture).toContain('dry');
      expect(s.bloomMonths).toContain(7);
      const detail = await t.http.get(`/api/species/${s.slug}`).expect(200);
      expect(detail.body.nativeStates).toContain('WI');
    }
    const monarch = await t.http.get('/api/species?monarchHost=true&pageSize=200').expect(200);
    expect(monarch.body.items.every((s: { monarchHost: boolean }) => s.monarchHost)).toBe(true);
    expect(monarch.body.items.map((s: { slug: string }) => s.slug)).toContain('asclepias-tuberosa');
  });

  it('sorts by height both ways', async () => {
    const asc = await t.http.get('/api/species?sort=height&order=asc&pageSize=200').expect(200);
    const heights = asc.body.items.map((s: { heightCm: { max: number } }) => s.heightCm.max);
    expect(heights).toEqual([...heights].sort((a, b) => a - b));
    const desc = await t.http.get('/api/species?sort=height&order=desc&pageSize=200').expect(200);
    const tallest = desc.body.items.map((s: { heightCm: { max: number } }) => s.heightCm.max);
    expect(tallest).toEqual([...tallest].sort((a, b) => b - a));
    expect(tallest[0]).toBeGreaterThanOrEqual(Math.max(...heights));
  });

  it.each([
    ['buterfly weed', 'asclepias-tuberosa'],
    ['aesclepias tuberosa', 'asclepias-tuberosa'],
    ['butterfly milkweed', 'asclepias-tuberosa'],
    ['ASTU decumbens', 'asclepias-tuberosa'],
  ])('finds "%s" despite typos (fuzzy search over names and synonyms)', async (q, slug) => {
    const res = await t.http.get(`/api/species?q=${encodeURIComponent(q)}&pageSize=10`).expect(200);
    expect(res.body.items.map((s: { slug: string }) => s.slug)).toContain(slug);
  });

  it('answers bad filters with 400 naming the field', async () => {
    const res = await t.http.get('/api/species?bloomMonth=13&sun=sometimes&colour=red').expect(400);
    const fields = res.body.fields.map((f: { field: string }) => f.field);
    expect(fields).toEqual(expect.arrayContaining(['bloomMonth', 'sun', 'colour']));
    await t.http.get('/api/species/no-such-plant').expect(404);
  });

  it('lets a curator edit a species, refreshes cached lists, and refuses members', async () => {
    const before = await t.http.get('/api/species?q=butterfly%20milkweed&pageSize=5').expect(200);
    expect(before.body.items[0].commonName).toBe('butterfly milkweed');
    const record = (await t.http.get('/api/species/asclepias-tuberosa').expect(200)).body;
    delete record.hasPhoto;
    delete record.photoCredit;
    const edited = { ...record, commonNames: ['orange butterfly milkweed', ...record.commonNames] };
    await t.http
      .put('/api/species/asclepias-tuberosa')
      .set('Authorization', `Bearer ${member}`)
      .send(edited)
      .expect(403);
    await t.http
      .put('/api/species/asclepias-tuberosa')
      .set('Authorization', `Bearer ${curator}`)
      .send(edited)
      .expect(200);
    const after = await t.http.get('/api/species?q=butterfly%20milkweed&pageSize=5').expect(200);
    expect(after.body.items[0].commonName).toBe('orange butterfly milkweed');

    const bad = await t.http
      .put('/api/species/asclepias-tuberosa')
      .set('Authorization', `Bearer ${curator}`)
      .send({ ...record, heightCm: { min: 90, max: 30 }, nativeStates: ['ZZ'] })
      .expect(400);
    expect(bad.body.fields.map((f: { field: string }) => f.field)).toEqual(
      expect.arrayContaining(['heightCm', 'nativeStates.0']),
    );
  });

  it('publishes the sources registry and refuses a record citing a key it does not hold, writing nothing', async () => {
    // The registry is species-data/sources.json; USDA PLANTS is cited by most records (usda-plants).
    const sources = (await t.http.get('/api/species-sources').expect(200)).body as { key: string }[];
    expect(sources.map((s) => s.key)).toEqual(expect.arrayContaining(['from-memory', 'usda-plants']));
    const before = (await t.http.get('/api/species/zizia-aurea').expect(200)).body;
    const { hasPhoto: _p, photoCredit: _c, ...record } = before;
    const bad = await t.http
      .put('/api/species/zizia-aurea')
      .set('Authorization', `Bearer ${curator}`)
      .send({ ...record, heightCm: { min: 1, max: 2 }, sources: { ...record.sources, heightCm: 'a-book-i-read' } })
      .expect(400);
    expect(bad.body.fields).toEqual([expect.objectContaining({ field: 'sources.heightCm' })]);
    expect((await t.http.get('/api/species/zizia-aurea').expect(200)).body.heightCm).toEqual(before.heightCm);
  });

  it('previews an import (dry run): what it would create and change, line by line, writing nothing', async () => {
    const csv = (await t.http.get('/api/species/export.csv').expect(200)).text;
    const lines = csv.split('\r\n');
    const header = lines[0].split(',');
    const heightCol = header.indexOf('heightMaxCm');
    const slugCol = header.indexOf('slug');
    const preview = async (body: string) =>
      (
        await t.http
          .post('/api/species/import?dryRun=true')
          .set('Authorization', `Bearer ${curator}`)
          .attach('file', Buffer.from(body), { filename: 'preview.csv', contentType: 'text/csv' })
          .expect(200)
      ).body;
    // A treatment note holding ";" does not survive the export's list cells, so start from rows that do.
    const asExported = await preview(lines.slice(0, 21).join('\r\n'));
    const clean = asExported.preview
      .filter((p: { action: string }) => p.action === 'unchanged')
      .map((p: { line: number }) => lines[p.line - 1]);
    expect(clean.length).toBeGreaterThanOrEqual(2);
    const changed = clean[0].split(',');
    const slug = changed[slugCol];
    changed[heightCol] = String(Number(changed[heightCol]) + 7);
    const file = [lines[0], changed.join(','), clean[1]].join('\r\n');
    const historyBefore = (await t.http.get(`/api/species/${slug}/history`).set('Authorization', `Bearer ${curator}`))
      .body.length;
    const before = (await t.http.get(`/api/species/${slug}`).expect(200)).body;

    await t.http
      .post('/api/species/import?dryRun=true')
      .set('Authorization', `Bearer ${member}`)
      .attach('file', Buffer.from(file), { filename: 'preview.csv', contentType: 'text/csv' })
      .expect(403);
    const res = await t.http
      .post('/api/species/import?dryRun=true')
      .set('Authorization', `Bearer ${curator}`)
      .attach('file', Buffer.from(file), { filename: 'preview.csv', contentType: 'text/csv' })
      .expect(200);
    expect(res.body).toMatchObject({ created: 0, updated: 2, dryRun: true });
    expect(res.body.preview[0]).toEqual(
      expect.objectContaining({ line: 2, slug, action: 'change', fields: ['heightCm'] }),
    );
    expect(res.body.preview[1]).toEqual(expect.objectContaining({ line: 3, action: 'unchanged', fields: [] }));
    // Nothing written: the record and its history are as they were.
    expect((await t.http.get(`/api/species/${slug}`).expect(200)).body.heightCm).toEqual(before.heightCm);
    const historyAfter = (await t.http.get(`/api/species/${slug}/history`).set('Authorization', `Bearer ${curator}`))
      .body.length;
    expect(historyAfter).toBe(historyBefore);
  });

  it('exports CSV and re-imports it; a file with one bad row writes nothing and names the row and field', async () => {
    const csv = (
      await t.http
        .get('/api/species/export.csv')
        .expect(200)
        .expect('Content-Type', /text\/csv/)
    ).text;
    const lines = csv.split('\r\n');
    const header = lines[0].split(',');
    expect(header).toEqual(expect.arrayContaining(['slug', 'scientificName', 'usdaSymbol', 'treatments']));

    const small = [lines[0], lines[1], lines[2], lines[3]].join('\r\n');
    const ok = await t.http
      .post('/api/species/import')
      .set('Authorization', `Bearer ${curator}`)
      .attach('file', Buffer.from(small), { filename: 'three.csv', contentType: 'text/csv' })
      .expect(200);
    expect(ok.body).toMatchObject({ created: 0, updated: 3, dryRun: false });

    // Line 3 gets a height that is not a number and a made-up state; the new species on line 4 must not appear.
    const heightCol = header.indexOf('heightMaxCm');
    const cells = lines[2].split(',');
    const broken = lines[2].replace(`,${cells[heightCol]},`, ',tall,');
    const fresh = lines[1].replace(/^[^,]+,/, 'zz-imported-test-plant,');
    const badFile = [lines[0], lines[1], broken, fresh].join('\r\n');
    const res = await t.http
      .post('/api/species/import')
      .set('Authorization', `Bearer ${curator}`)
      .attach('file', Buffer.from(badFile), { filename: 'bad.csv', contentType: 'text/csv' })
      .expect(400);
    expect(res.body.rows).toEqual(expect.arrayContaining([expect.objectContaining({ row: 3, field: 'heightMaxCm' })]));
    expect(res.body.message).toMatch(/nothing was imported/);
    await t.http.get('/api/species/zz-imported-test-plant').expect(404);
  });

  it('stores a photo and serves it resized; rejects a non-image and a file over 5 MB', async () => {
    const png = await sharp({ create: { width: 900, height: 600, channels: 3, background: { r: 63, g: 107, b: 58 } } })
      .png()
      .toBuffer();
    const up = await t.http
      .post('/api/species/asclepias-tuberosa/photo')
      .set('Authorization', `Bearer ${curator}`)
      .field('photographer', 'Ines Calder')
      .field('licence', 'CC-BY-4.0')
      .field('sourceUrl', 'https://example.org/photos/asclepias-tuberosa')
      .attach('photo', png, { filename: 'milkweed.png', contentType: 'image/png' })
      .expect(201);
    expect(up.body).toMatchObject({ mime: 'image/png', width: 900, height: 600, photographer: 'Ines Calder' });
    const detail = await t.http.get('/api/species/asclepias-tuberosa').expect(200);
    expect(detail.body.photoCredit).toEqual({
      photographer: 'Ines Calder',
      licence: 'CC-BY-4.0',
      sourceUrl: 'https://example.org/photos/asclepias-tuberosa',
    });
    const small = await t.http
      .get('/api/species/asclepias-tuberosa/photo?w=400')
      .expect(200)
      .expect('Content-Type', /image\/webp/);
    expect((await sharp(small.body).metadata()).width).toBe(400);
    // The list (160), print (400) and page (800) sizes are made at upload, before anyone asks for them.
    for (const w of [160, 400, 800]) {
      const made = await sharp(path.join(t.dataDir, 'photos', `asclepias-tuberosa-w${w}.webp`)).metadata();
      expect(made).toMatchObject({ width: w, format: 'webp' });
    }
    // A few kilobytes that unpack to 48 megapixels: refused by its size in pixels, with the limit in words.
    const vast = await sharp({ create: { width: 8000, height: 6000, channels: 3, background: { r: 1, g: 2, b: 3 } } })
      .png()
      .toBuffer();
    const tooMany = await t.http
      .post('/api/species/zizia-aurea/photo')
      .set('Authorization', `Bearer ${curator}`)
      .field('photographer', 'Ines Calder')
      .field('licence', 'CC-BY-4.0')
      .field('sourceUrl', 'https://example.org/photos/zizia-aurea')
      .attach('photo', vast, { filename: 'vast.png', contentType: 'image/png' })
      .expect(413);
    expect(tooMany.body.message).toMatch(/8000 × 6000 pixels; photos may have at most 40 megapixels/);
    expect((await t.http.get('/api/species/zizia-aurea').expect(200)).body.hasPhoto).toBe(false);

    // A text file that claims to be a JPEG: the type is sniffed from the bytes.
    const fake = await t.http
      .post('/api/species/asclepias-tuberosa/photo')
      .set('Authorization', `Bearer ${curator}`)
      .field('photographer', 'Ines Calder')
      .field('licence', 'CC-BY-4.0')
      .field('sourceUrl', 'https://example.org/photos/asclepias-tuberosa')
      .attach('photo', Buffer.from('this is not an image at all'), { filename: 'x.jpg', contentType: 'image/jpeg' })
      .expect(415);
    expect(fake.body.message).toMatch(/JPEG, PNG or WebP/);

    const huge = Buffer.concat([png, Buffer.alloc(5 * 1024 * 1024 + 1)]);
    const big = await t.http
      .post('/api/species/asclepias-tuberosa/photo')
      .set('Authorization', `Bearer ${curator}`)
      .field('photographer', 'Ines Calder')
      .field('licence', 'CC-BY-4.0')
      .field('sourceUrl', 'https://example.org/photos/asclepias-tuberosa')
      .attach('photo', huge, { filename: 'huge.png', contentType: 'image/png' })
      .expect(413);
    expect(big.body).toMatchObject({ statusCode: 413 });
    const list = await t.http.get('/api/species?q=asclepias%20tuberosa&pageSize=1').expect(200);
    expect(list.body.items[0].hasPhoto).toBe(true);
  });

  it('refuses a photo without its credit (who took it, licence, source), naming each field, and stores nothing', async () => {
    const png = await sharp({ create: { width: 300, height: 200, channels: 3, background: { r: 200, g: 90, b: 40 } } })
      .png()
      .toBuffer();
    const res = await t.http
      .post('/api/species/monarda-fistulosa/photo')
      .set('Authorization', `Bearer ${curator}`)
      .field('licence', 'all rights reserved')
      .field('sourceUrl', 'javascript:alert(1)')
      .attach('photo', png, { filename: 'bergamot.png', contentType: 'image/png' })
      .expect(400);
    expect(res.body.fields.map((f: { field: string }) => f.field).sort()).toEqual([
      'licence',
      'photographer',
      'sourceUrl',
    ]);
    const [{ n }] = await runSql(t.app.get(DataSource), `SELECT COUNT(*) AS n FROM species_photos WHERE slug = ?`, [
      'monarda-fistulosa',
    ]);
    expect(Number(n)).toBe(0);
    const extra = await t.http
      .post('/api/species/monarda-fistulosa/photo')
      .set('Authorization', `Bearer ${curator}`)
      .field('photographer', 'Ines Calder')
      .field('licence', 'CC0-1.0')
      .field('sourceUrl', 'https://example.org/p/1')
      .field('caption', 'one field too many')
      .attach('photo', png, { filename: 'bergamot.png', contentType: 'image/png' });
    expect(extra.status).toBe(400);
  });
});
