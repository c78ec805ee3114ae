import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createTestApp, type TestApp } from './support/test-app.js';

/**
 * A 400 in the reader's language (Accept-Language, RFC 9110 §12.5.4): the same bad sign-up body
 * names the same fields, with zod's own reasons and the schema's own sentences in Spanish for `es`
 * and in English otherwise. The English reasons are zod 4's own default messages (its `en` locale);
 * the Spanish ones are the shared issue words and the API catalogue. Nothing is stored.
 */
describe('request validation answers in the reader language (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ LOGIN_THROTTLE_LIMIT: '100' });
  });
  afterAll(() => t.close());

  // Too-short password (schema's own sentence), e-mail of the wrong type and no name (zod's reasons), one unknown key.
  const bad = { email: 42, password: 'corta', nickname: 'x' };
  const send = (language: string) =>
    t.http.post('/api/auth/register').set('Accept-Language', language).send(bad).expect(400);

  it('says every reason in Spanish for es, naming the same fields', async () => {
    const res = await send('es-MX,es;q=0.9');
    expect(res.body.fields).toEqual(
      expect.arrayContaining([
        { field: 'email', message: 'debe ser texto' },
        { field: 'password', message: 'debe tener al menos 10 caracteres' },
        { field: 'displayName', message: 'es obligatorio' },
        { field: 'nickname', message: 'no es un campo que esta petición acepte' },
      ]),
    );
    expect(res.body.fields).toHaveLength(4);
    expect(res.body.message).toMatch(/^Revisa esto: /);
    expect(res.body.message).toContain('displayName es obligatorio');
  });

  it('says them in English for en, and when no language Homeground speaks is asked for', async () => {
    for (const language of ['en', 'de']) {
      const res = await send(language);
      expect(res.body.fields).toEqual(
        expect.arrayContaining([
          // zod 4's default wording for a wrong and a missing type (from the library's English locale).
          { field: 'email', message: 'Invalid input: expected string, received number' },
          { field: 'password', message: 'must be at least 10 characters' },
          { field: 'displayName', message: 'Invalid input: expected string, received undefined' },
          { field: 'nickname', message: 'is not a field this request accepts' },
        ]),
      );
      expect(res.body.fields).toHaveLength(4);
      expect(res.body.message).toMatch(/^Please check: /);
    }
  });

  it('words a bad query string and an unexpected one in Spanish too', async () => {
    const query = await t.http
      .get('/api/places/lookup')
      .query({ zip: 'abc', lat: 'x', lon: '200' })
      .set('Accept-Language', 'es')
      .expect(400);
    expect(query.body.fields).toEqual([
      { field: 'zip', message: 'debe ser un código postal (ZIP) de EE. UU. de 5 cifras' },
      { field: 'lat', message: 'debe ser un número' },
      { field: 'lon', message: 'debe estar entre −180 y 180' },
    ]);
    const unexpected = await t.http
      .get('/api/health')
      .query({ role: 'admin' })
      .set('Accept-Language', 'es')
      .expect(400);
    expect(unexpected.body.fields).toEqual([{ field: 'role', message: 'no es un campo que esta petición acepte' }]);
    expect(unexpected.body.message).toBe('Revisa esto: role no es un campo que esta petición acepte');
  });

  // A less common sentence of a shared schema (ecoregion.ts's state code) has its Spanish line too.
  it("says a schema's less common sentence in Spanish, and the same English otherwise", async () => {
    const es = await t.http.get('/api/ecoregions').query({ state: 'XX' }).set('Accept-Language', 'es').expect(400);
    expect(es.body.fields).toEqual([
      { field: 'state', message: 'debe ser el código USPS de uno de los 48 estados contiguos o de DC' },
    ]);
    const en = await t.http.get('/api/ecoregions').query({ state: 'XX' }).expect(400);
    expect(en.body.fields).toEqual([{ field: 'state', message: 'must be a USPS code of the 48 states or DC' }]);
  });
});
