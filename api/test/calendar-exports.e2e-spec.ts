import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import ICAL from 'ical.js';
import Papa from 'papaparse';
import { createTestApp, type TestApp } from './support/test-app.js';

/** Events as a widely used RFC 5545 parser (ical.js) reads them, independent of our writer. */
function parseIcs(text: string) {
  const vcal = new ICAL.Component(ICAL.parse(text));
  return vcal.getAllSubcomponents('vevent').map((v) => {
    const e = new ICAL.Event(v);
    return { uid: e.uid, start: e.startDate.toString(), summary: e.summary, description: e.description };
  });
}

// The demo scenario: Larkfield, Wisconsin (Driftless Area), average last frost taken as 2027-05-10
// for the example, plant share on the second Saturday of June (2027-06-12), planned on 2027-01-25.
const body = {
  lastFrost: '2027-05-10',
  today: '2027-01-25',
  targetDate: '2027-06-12',
  planId: 'larkfield-2027',
  plans: [
    { slug: 'monarda-fistulosa', method: 'winter-sowing' },
    { slug: 'asclepias-tuberosa', method: 'outdoor-pot-winter' },
    { slug: 'echinacea-pallida', method: 'indoor-lights' },
  ],
};

describe('sowing calendar exports (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('JSON: plant-out after the 2-week frost watch; pale purple coneflower needs a second season (NPN-ECPA R)', async () => {
    const res = await t.http.post('/api/calendar').send(body).expect(200);
    const plantOut = (slug: string) =>
      res.body.events.find(
        (e: { kind: string; speciesSlug: string }) => e.kind === 'plant-out' && e.speciesSlug === slug,
      ).date;
    // Wild bergamot winter-sown 2027-01-15: sprouts 2027-04-10 (frost − 30 d, M) + 6 weeks = 05-22; watch ends 05-24.
    expect(plantOut('monarda-fistulosa')).toBe('2027-05-24');
    expect(plantOut('echinacea-pallida')).toBe('2028-05-24');
    const kinds = res.body.warnings
      .filter((w: { speciesSlug: string }) => w.speciesSlug === 'echinacea-pallida')
      .map((w: { kind: string }) => w.kind);
    expect(kinds).toEqual(expect.arrayContaining(['second-season', 'target-too-early']));
    expect(res.body.events.map((e: { kind: string }) => e.kind)).toEqual(
      expect.arrayContaining(['frost-watch-end', 'plant-share', 'label-pots', 'collect-pots']),
    );
  });

  it('.ics: ical.js reads it; UIDs survive adding a species; every warning is in a description; lines ≤ 75 octets', async () => {
    const first = await t.http
      .post('/api/calendar.ics')
      .send(body)
      .expect(200)
      .expect('Content-Type', /text\/calendar/);
    const more = { ...body, plans: [{ slug: 'schizachyrium-scoparium', method: 'outdoor-pot-winter' }, ...body.plans] };
    const second = await t.http.post('/api/calendar.ics').send(more).expect(200);
    const a = parseIcs(first.text);
    const b = new Map(parseIcs(second.text).map((e) => [e.uid, e]));
    expect(b.size).toBeGreaterThan(a.length);
    for (const e of a) expect(b.get(e.uid)).toMatchObject({ start: e.start, summary: e.summary });
    const json = await t.http.post('/api/calendar').send(body).expect(200);
    const descriptions = a.map((e) => e.description).join('\n');
    for (const w of json.body.warnings) expect(descriptions).toContain(w.message);
    for (const line of first.text.split('\r\n')) expect(Buffer.byteLength(line, 'utf8')).toBeLessThanOrEqual(75);
  });

  // The file is in the reader's language (Accept-Language, RFC 9110 §12.5.4): same events, dates and UIDs
  // (so a calendar app replaces rather than duplicates them), words in Spanish, as ical.js reads them.
  // The Spanish step names are the batch page's own (shared batch words).
  it('.ics in Spanish for Accept-Language es: same UIDs and dates, Spanish titles, name and notes', async () => {
    const en = await t.http.post('/api/calendar.ics').send(body).expect(200);
    const es = await t.http.post('/api/calendar.ics').set('Accept-Language', 'es').send(body).expect(200);
    const english = parseIcs(en.text);
    const spanish = parseIcs(es.text);
    expect(spanish.map((e) => [e.uid, e.start])).toEqual(english.map((e) => [e.uid, e.start]));
    const summaries = spanish.map((e) => e.summary);
    expect(summaries).toContain('Wild bergamot: Siembra');
    expect(summaries).toContain('Reparto de plantas');
    expect(summaries).not.toContain('Plant share');
    expect(es.text).toContain('X-WR-CALNAME:Calendario de siembra de Homeground');
    const descriptions = spanish.map((e) => e.description).join('\n');
    expect(descriptions).not.toContain('Please note:');
    expect(descriptions).toContain('Esta es la fecha promedio');
    for (const line of es.text.split('\r\n')) expect(Buffer.byteLength(line, 'utf8')).toBeLessThanOrEqual(75);
  });

  it('.csv: the same columns as before, plus one row per warning', async () => {
    const json = await t.http.post('/api/calendar').send(body).expect(200);
    const csv = await t.http.post('/api/calendar.csv').send(body).expect(200);
    const lines = csv.text.split('\r\n');
    expect(lines[0]).toBe('date,species,scientificName,kind,title,detail');
    expect(lines.filter((l) => l.includes(',warning:')).length).toBe(json.body.warnings.length);
    expect(lines.length - 1).toBe(json.body.events.length + json.body.warnings.length);
  });

  // Read back with a widely used RFC 4180 parser (papaparse), independent of our writer: the same
  // rows, dates and kind codes in both languages; header, step titles and warnings in Spanish for es.
  it('.csv in Spanish for Accept-Language es: same rows, dates and kinds, Spanish header and steps', async () => {
    const read = (text: string) => Papa.parse<string[]>(text, { skipEmptyLines: true }).data;
    const en = read((await t.http.post('/api/calendar.csv').send(body).expect(200)).text);
    const es = read((await t.http.post('/api/calendar.csv').set('Accept-Language', 'es').send(body).expect(200)).text);
    expect(en[0]).toEqual(['date', 'species', 'scientificName', 'kind', 'title', 'detail']);
    expect(es[0]).toEqual(['fecha', 'especie', 'nombre científico', 'tipo', 'título', 'detalle']);
    const codes = (rows: string[][]) => rows.slice(1).map((r) => [r[0], r[2], r[3]]);
    expect(codes(es)).toEqual(codes(en));
    const titles = es.slice(1).map((r) => r[4]);
    expect(titles).toContain('Wild bergamot: Siembra');
    expect(titles).toContain('Reparto de plantas');
    expect(titles.filter((x) => x.startsWith('Ten en cuenta')).length).toBe(
      en.slice(1).filter((r) => r[4].startsWith('Please note')).length,
    );
    expect(es.flat().join('\n')).not.toContain('Please note');
  });

  it('a bad plan id is a 400 naming the field', async () => {
    for (const path of ['/api/calendar', '/api/calendar.ics', '/api/calendar.csv']) {
      const bad = await t.http
        .post(path)
        .send({ ...body, planId: 'has spaces/and slashes' })
        .expect(400);
      const error = JSON.parse(bad.text) as { fields: { field: string }[] };
      expect(error.fields.map((f) => f.field)).toContain('planId');
    }
  });
});
