import { describe, expect, it } from 'vitest';
import { mixWordsFor } from './mix-words.js';

// The Spanish is Homeground's own wording (from memory, checked by a Spanish reader of the team's
// voice, not from a published source); these checks hold both tables to the same sentences.
describe('mixWordsFor', () => {
  const en = mixWordsFor('en');
  const es = mixWordsFor('es');

  it('has every sentence in both languages', () => {
    expect(Object.keys(es).sort()).toEqual(Object.keys(en).sort());
    expect(Object.keys(es.tier).sort()).toEqual(Object.keys(en.tier).sort());
  });

  it('says the English sentences the engine always wrote (balance-palette tests check them in place)', () => {
    expect(en.mixHas(0, '')).toBe('The mix has none.');
    expect(en.onlyAvailableInPeriod('late', 1, 'dry shade')).toBe(
      'Only 1 late bloomer native to your region suits dry shade; a species from another part of the season may take its place.',
    );
    expect(en.lostOut('milkweed', 2, 8, 1)).toBe(
      '2 native milkweeds suit your ground but lost out to other needs in a mix of 8 species (1 of them kept by you); keep one in, or choose a larger mix.',
    );
  });

  it('says them in Spanish, whole sentences with their plural chosen by count', () => {
    expect(es.mixHas(2, 'wild bergamot y showy goldenrod')).toBe('La mezcla tiene 2: wild bergamot y showy goldenrod.');
    expect(es.onlyAvailableInPeriod('late', 1, 'sombra y suelo seco')).toBe(
      'Solo 1 especie nativa de tu región que florece tarde va bien con sombra y suelo seco; una especie de otra parte de la temporada puede ocupar su lugar.',
    );
    expect(es.onlyAvailable('grass', 0, 'pleno sol y suelo seco')).toBe(
      'Ningún pasto o junco nativo de tu región va bien con pleno sol y suelo seco.',
    );
    expect(es.lostOut('early', 3, 8, 0)).toBe(
      '3 especies que florecen temprano más van bien con tu terreno, pero quedaron fuera por otras necesidades en una mezcla de 8 especies; guarda una, o elige una mezcla más grande.',
    );
    expect(es.askedFor(1)).toBe('Pediste 1 especie.');
    expect(es.askedFor(6)).toBe('Pediste 6 especies.');
  });

  it('says the protected-species notices in Spanish, one or many', () => {
    expect(es.withheldProtected(1, "Mead's milkweed", 0)).toContain('está protegida en la naturaleza');
    expect(es.withheldProtected(5, 'A, B, C', 2)).toBe(
      'A, B, C y 2 otras especies protegidas van bien con tu terreno, pero están protegidas en la naturaleza, así que Homeground no las elige por ti. Para cultivar una, guárdala en la mezcla y cómprala en un vivero que la propague; nunca la saques del campo.',
    );
  });
});
