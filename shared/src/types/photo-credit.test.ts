import { describe, expect, it } from 'vitest';
import { PHOTO_LICENCES, PHOTO_LICENCE_WORDS, PHOTO_LICENCE_WORDS_ES, photoCreditLine } from './photo-credit.js';

// SPDX short names (spdx.org/licenses) stay as they are in both languages; the two plain cases are
// Homeground's own words.
describe('photo credit lines', () => {
  it('names every licence in both languages', () => {
    for (const l of PHOTO_LICENCES) {
      expect(PHOTO_LICENCE_WORDS[l]).toBeTruthy();
      expect(PHOTO_LICENCE_WORDS_ES[l]).toBeTruthy();
    }
    expect(PHOTO_LICENCE_WORDS_ES['CC-BY-4.0']).toBe('CC BY 4.0');
  });

  it('says the plain cases in Spanish', () => {
    expect(photoCreditLine({ photographer: 'Ines Calder', licence: 'public-domain' }, 'es')).toBe(
      'Foto: Ines Calder, dominio público',
    );
    expect(photoCreditLine({ photographer: 'Ines Calder', licence: 'with-permission' }, 'es')).toBe(
      'Foto: Ines Calder, usada con permiso de quien la tomó',
    );
    expect(photoCreditLine({ photographer: 'Ines Calder', licence: 'public-domain' })).toBe(
      'Photo: Ines Calder, public domain',
    );
  });
});
