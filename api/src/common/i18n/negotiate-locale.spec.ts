import { negotiateLocale } from './negotiate-locale.js';

// Header forms and the q-weight rules are RFC 9110 §12.5.4 (Accept-Language) and §12.4.2 (quality values).
describe('negotiateLocale', () => {
  it.each([
    [undefined, 'en'],
    ['', 'en'],
    ['es', 'es'],
    ['es-MX', 'es'],
    ['ES-us', 'es'],
    ['fr-FR, es;q=0.8, en;q=0.5', 'es'],
    ['en-US,en;q=0.9,es;q=0.8', 'en'],
    ['es;q=0.4, en;q=0.6', 'en'],
    ['es;q=0, en;q=0.1', 'en'],
    ['es;q=0', 'en'],
    ['fr, de', 'en'],
    ['*', 'en'],
    ['es;q=abc', 'en'],
    ['es;q=0.7, en;q=0.7', 'es'],
  ] as const)('%s → %s', (header, expected) => {
    expect(negotiateLocale(header)).toBe(expected);
  });

  it('reads a header given twice as one list', () => {
    expect(negotiateLocale(['fr', 'es-419'])).toBe('es');
  });
});
