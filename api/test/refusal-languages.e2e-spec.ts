import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import Papa from 'papaparse';
import { createTestApp, type TestApp } from './support/test-app.js';

/**
 * Refusals (403, 404, 409 and the catalogue's 400) in the reader's language, chosen by
 * Accept-Language (RFC 9110 §12.5.4): the same status for `es` and `en`, one whole Spanish sentence
 * for `es`, and for `en` (or a language Homeground does not speak) the English sentence exactly as
 * it was before the catalogue, since the web shows some of them as they come. Demo data only.
 */
const GROUP = '/api/groups/larkfield-commons-growers';
const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
/** A well-formed id no saved mix has (RFC 9562 version-4 layout). */
const UNKNOWN_ID = '4f1c2a3b-5d6e-4f70-8a9b-0c1d2e3f4a5b';

async function signIn(t: TestApp, email: string, password: string): Promise<string> {
  return (await t.http.post('/api/auth/login').send({ email, password }).expect(200)).body.accessToken;
}

describe('refusals answer in the reader language (e2e, demo data)', () => {
  let t: TestApp;
  const tokens: Record<string, string> = {};
  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '100' });
    tokens.grower = await signIn(t, 'juniper.okafor@example.org', 'larkfield-juniper');
    tokens.admin = await signIn(t, 'wes.hollenbeck@example.org', 'larkfield-wes');
    tokens.organiser = await signIn(t, 'mara.ellsworth@example.org', 'larkfield-mara');
    tokens.curator = await signIn(t, 'ines.calder@example.org', 'larkfield-ines');
    tokens.member = await signIn(t, 'priya.vantongeren@example.org', 'larkfield-priya');
    tokens.outsider = await signIn(t, 'sol.marchetti@example.org', 'larkfield-sol');
  });
  afterAll(() => t.close());

  it('a saved-mix link that leads nowhere: 404 in Spanish for es, the same English sentence otherwise', async () => {
    const es = await t.http.get(`/api/mixes/${UNKNOWN_ID}`).set('Accept-Language', 'es-MX,es;q=0.9').expect(404);
    expect(es.body.message).toBe('No hay ninguna mezcla guardada con ese enlace: quizá se borró.');
    for (const language of ['en', 'de']) {
      const other = await t.http.get(`/api/mixes/${UNKNOWN_ID}`).set('Accept-Language', language).expect(404);
      expect(other.body.message).toBe('No saved mix with that link: it may have been deleted.');
    }
  });

  it('an unknown group: 404 naming the slug in both languages', async () => {
    const es = await t.http.get('/api/groups/no-such-group').set('Accept-Language', 'es').expect(404);
    expect(es.body.message).toBe('No hay ningún grupo llamado "no-such-group".');
    const en = await t.http.get('/api/groups/no-such-group').expect(404);
    expect(en.body.message).toBe('No group called "no-such-group".');
  });

  it('the member list for someone outside the group: 403 in Spanish', async () => {
    const es = await t.http
      .get(`${GROUP}/members`)
      .set(bearer(tokens.outsider))
      .set('Accept-Language', 'es')
      .expect(403);
    expect(es.body.message).toBe('Solo quienes están en este grupo pueden ver quién lo forma.');
    const en = await t.http.get(`${GROUP}/members`).set(bearer(tokens.outsider)).expect(403);
    expect(en.body.message).toBe('Only members of this group can see who is in it.');
  });

  it('a season plan for someone outside the group, and batches for a member who does not grow: 403 in Spanish', async () => {
    const season = await t.http
      .get(`${GROUP}/season`)
      .set(bearer(tokens.outsider))
      .set('Accept-Language', 'es')
      .expect(403);
    expect(season.body.message).toBe('Solo quienes están en este grupo pueden ver su plan de temporada.');
    const batches = await t.http
      .get(`${GROUP}/season/batches`)
      .set(bearer(tokens.member))
      .set('Accept-Language', 'es')
      .expect(403);
    expect(batches.body.message).toBe('Los lotes son para quienes cultivan y organizan en este grupo.');
    const english = await t.http.get(`${GROUP}/season/batches`).set(bearer(tokens.member)).expect(403);
    expect(english.body.message).toBe('Batches are for the growers and organisers of this group.');
  });

  it("a group's invitations for a grower: 403 in Spanish", async () => {
    const es = await t.http
      .get(`${GROUP}/invitations`)
      .set(bearer(tokens.grower))
      .set('Accept-Language', 'es')
      .expect(403);
    expect(es.body.message).toBe('Solo quien organiza este grupo puede ver sus invitaciones.');
  });

  it('a fact card for a species the catalogue does not hold: 404 in Spanish, the same English otherwise', async () => {
    const es = await t.http.get('/api/species/no-such-plant').set('Accept-Language', 'es').expect(404);
    expect(es.body.message).toBe('No hay ninguna especie "no-such-plant" en el catálogo.');
    const en = await t.http.get('/api/species/no-such-plant').expect(404);
    expect(en.body.message).toBe('No species "no-such-plant" in the catalogue.');
  });

  it('the outbox for a member who organises nothing, and an admin switching off their own account: Spanish', async () => {
    const outbox = await t.http.get('/api/outbox').set(bearer(tokens.member)).set('Accept-Language', 'es').expect(403);
    expect(outbox.body.message).toBe('Solo quienes organizan y administran pueden leer el buzón de salida.');
    const me = (await t.http.get('/api/me').set(bearer(tokens.admin)).expect(200)).body as { id: string };
    const own = await t.http
      .patch(`/api/users/${me.id}/access`)
      .set(bearer(tokens.admin))
      .set('Accept-Language', 'es')
      .send({ disabled: true })
      .expect(409);
    expect(own.body.message).toBe('No puedes desactivar tu propia cuenta.');
    const english = await t.http
      .patch(`/api/users/${me.id}/access`)
      .set(bearer(tokens.admin))
      .send({ disabled: true })
      .expect(409);
    expect(english.body.message).toBe('You cannot switch off your own account.');
  });

  // Reasons of shared checks run after parsing (a past plant share, a frost night out of range):
  // Spanish through the shared sentence table, the date kept as ISO 8601; nothing is written.
  it("an organiser's past plant share and out-of-range frost night: 400 naming the field, in Spanish", async () => {
    const today = new Date().toISOString().slice(0, 10);
    const season = await t.http
      .put(`${GROUP}/season`)
      .set(bearer(tokens.organiser))
      .set('Accept-Language', 'es')
      .send({ year: 2020, lastFrost: '2020-05-10', plantShareDate: '2020-06-13' })
      .expect(400);
    expect(season.body.fields).toEqual([
      { field: 'plantShareDate', message: `no puede estar en el pasado (hoy es ${today})` },
    ]);
    expect(season.body.message).toBe(`Revisa esto: plantShareDate no puede estar en el pasado (hoy es ${today})`);
    const english = await t.http
      .put(`${GROUP}/season`)
      .set(bearer(tokens.organiser))
      .send({ year: 2020, lastFrost: '2020-05-10', plantShareDate: '2020-06-13' })
      .expect(400);
    expect(english.body.fields).toEqual([
      { field: 'plantShareDate', message: `must not be in the past (today is ${today})` },
    ]);
    const frost = await t.http
      .post(`${GROUP}/season/frost-warning`)
      .set(bearer(tokens.organiser))
      .set('Accept-Language', 'es')
      .send({ night: '2020-01-01' })
      .expect(400);
    expect(frost.body.fields[0].field).toBe('night');
    expect(frost.body.fields[0].message).toMatch(/^debe estar entre el \d{4}-\d{2}-\d{2} y el \d{4}-\d{2}-\d{2}$/);
  });

  it("a curator's page for a grower: 403 with the role's Spanish title, the role code in English", async () => {
    const path = '/api/species/monarda-fistulosa/history';
    const es = await t.http.get(path).set(bearer(tokens.grower)).set('Accept-Language', 'es').expect(403);
    expect(es.body.message).toBe('Esto necesita el rol Curador/a.');
    const en = await t.http.get(path).set(bearer(tokens.grower)).expect(403);
    expect(en.body.message).toBe('This needs the curator role.');
  });

  it('a curator adding a species the catalogue holds, and citing a source it does not: Spanish, nothing written', async () => {
    const detail = (await t.http.get('/api/species/monarda-fistulosa').expect(200)).body as Record<string, unknown>;
    const { hasPhoto: _hasPhoto, photoCredit: _photoCredit, ...record } = detail;
    const again = await t.http
      .post('/api/species')
      .set(bearer(tokens.curator))
      .set('Accept-Language', 'es')
      .send(record)
      .expect(409);
    expect(again.body.message).toBe('La especie "monarda-fistulosa" ya existe: edítala en lugar de crearla.');
    const sources = { ...(record.sources as Record<string, string>), heightCm: 'no-such-source' };
    const unknown = await t.http
      .put('/api/species/monarda-fistulosa')
      .set(bearer(tokens.curator))
      .set('Accept-Language', 'es')
      .send({ ...record, sources })
      .expect(400);
    expect(unknown.body.fields).toEqual([
      { field: 'sources.heightCm', message: '"no-such-source" no está en el registro de fuentes' },
    ]);
    const unchanged = (await t.http.get('/api/species/monarda-fistulosa').expect(200)).body as Record<string, unknown>;
    expect(unchanged).toEqual(detail);
  });

  // A UTF-16 file starts with the byte-order mark FF FE (Unicode Standard §23.8); the import refuses it.
  it('a species CSV saved as UTF-16: 400 naming the file, in Spanish', async () => {
    const utf16 = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from('slug\r\n', 'utf16le')]);
    const es = await t.http
      .post('/api/species/import')
      .set(bearer(tokens.curator))
      .set('Accept-Language', 'es')
      .attach('file', utf16, 'species.csv')
      .expect(400);
    expect(es.body.fields).toEqual([
      { field: 'file', message: 'es texto UTF-16: guárdalo como "CSV UTF-8" y súbelo otra vez' },
    ]);
  });

  // CSV injection (OWASP "CSV Injection"): a cell starting with "=" is refused on import, with its row.
  it("a species CSV's row reasons in Spanish: a formula cell and a repeated slug, nothing written", async () => {
    const csv = (await t.http.get('/api/species/export.csv').expect(200)).text;
    const [header, first, second] = Papa.parse<string[]>(csv, { skipEmptyLines: true }).data;
    const formula = [...first];
    formula[header.indexOf('commonNames')] = '=HYPERLINK(x)';
    const file = Papa.unparse([header, formula, second, second], { newline: '\r\n' });
    const send = (language: string) =>
      t.http
        .post('/api/species/import')
        .set(bearer(tokens.curator))
        .set('Accept-Language', language)
        .attach('file', Buffer.from(file), { filename: 'species.csv', contentType: 'text/csv' })
        .expect(400);
    const es = (await send('es')).body;
    expect(es.message).toBe('El archivo tiene 2 problema(s); no se importó nada.');
    expect(es.rows).toEqual([
      {
        row: 2,
        field: 'commonNames',
        message: 'empieza con "=", y las hojas de cálculo lo ejecutan como fórmula; quítalo',
      },
      { row: 4, field: 'slug', message: 'repite la línea 3' },
    ]);
    const en = (await send('en')).body;
    expect(en.rows).toEqual([
      {
        row: 2,
        field: 'commonNames',
        message: 'starts with "=", which spreadsheet programs run as a formula; remove it',
      },
      { row: 4, field: 'slug', message: 'repeats line 3' },
    ]);
    const kept = (await t.http.get(`/api/species/${first[header.indexOf('slug')]}`).expect(200)).body;
    expect(kept.commonNames).not.toContain('=HYPERLINK(x)');
  });

  it('an import without its file: 400 naming the form field, in Spanish for es and the same English otherwise', async () => {
    const send = (language: string) =>
      t.http
        .post('/api/species/import')
        .set(bearer(tokens.curator))
        .set('Accept-Language', language)
        .send({})
        .expect(400);
    const es = (await send('es')).body;
    expect(es.fields).toEqual([{ field: 'file', message: 'es obligatorio' }]);
    expect(es.message).toBe('Adjunta el archivo en el campo "file".');
    const en = (await send('en')).body;
    expect(en.fields).toEqual([{ field: 'file', message: 'is required' }]);
    expect(en.message).toBe('Attach the file in the "file" field.');
  });

  // RFC 7946 §3.1.6: a linear ring is closed (its first and last positions are the same).
  it("an admin's boundary file: each GeoJSON problem in Spanish for es, the same English otherwise", async () => {
    const open = [
      [-90, 44],
      [-89, 44],
      [-89, 45],
      [-90, 45],
    ];
    const file = JSON.stringify({
      type: 'FeatureCollection',
      features: [
        { type: 'Feature', properties: { US_L3CODE: '51' }, geometry: { type: 'Polygon', coordinates: [open] } },
      ],
    });
    const send = (language: string) =>
      t.http
        .post('/api/ecoregions/boundaries')
        .set(bearer(tokens.admin))
        .set('Accept-Language', language)
        .attach('file', Buffer.from(file), { filename: 'regions.geojson', contentType: 'application/geo+json' })
        .expect(400);
    const es = (await send('es')).body;
    expect(es.message).toBe('El archivo tiene 2 problema(s); no se importó nada.');
    expect(es.fields).toEqual([
      { field: 'features[0].properties.US_L3NAME', message: 'es obligatorio' },
      { field: 'features[0].geometry.coordinates[0]', message: 'un anillo debe terminar donde empieza' },
    ]);
    const en = (await send('en')).body;
    expect(en.fields).toEqual([
      { field: 'features[0].properties.US_L3NAME', message: 'is required' },
      { field: 'features[0].geometry.coordinates[0]', message: 'a ring must end where it starts' },
    ]);
  });

  // The type is sniffed from the bytes (file-type), not the name: a text file named .jpg is refused.
  it('a photo that is not an image: 415 in Spanish, the same English otherwise', async () => {
    const send = (language: string) =>
      t.http
        .post('/api/species/asclepias-tuberosa/photo')
        .set(bearer(tokens.curator))
        .set('Accept-Language', language)
        .field('photographer', 'Ines Calder')
        .field('licence', 'CC-BY-4.0')
        .field('sourceUrl', 'https://example.org/photos/asclepias-tuberosa')
        .attach('photo', Buffer.from('this is not an image at all'), { filename: 'x.jpg', contentType: 'image/jpeg' })
        .expect(415);
    expect((await send('es')).body.message).toBe(
      'Las fotos deben ser JPEG, PNG o WebP; este archivo no es una imagen que reconozcamos.',
    );
    expect((await send('en')).body.message).toBe(
      'Photos must be JPEG, PNG or WebP; this file is not an image we recognise.',
    );
  });

  it('a sowing calendar with a species not in the catalogue: 400 naming the field, in Spanish', async () => {
    const body = {
      lastFrost: '2027-05-10',
      today: '2027-01-25',
      plans: [{ slug: 'no-such-plant', method: 'winter-sowing' }],
    };
    const es = await t.http.post('/api/calendar').set('Accept-Language', 'es').send(body).expect(400);
    expect(es.body.fields).toEqual([{ field: 'plans.0.slug', message: '"no-such-plant" no está en el catálogo' }]);
    expect(es.body.message).toBe('No están en el catálogo: no-such-plant');
    const en = await t.http.post('/api/calendar').send(body).expect(400);
    expect(en.body.fields).toEqual([{ field: 'plans.0.slug', message: '"no-such-plant" is not in the catalogue' }]);
    expect(en.body.message).toBe('Not in the catalogue: no-such-plant');
  });
});
