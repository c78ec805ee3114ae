/**
 * Range limits a practitioner would expect of the species' ecoregions. The expectations are a
 * botanist's knowledge of eastern and central US ranges (from memory), the same source the records
 * name for their `ecoregions` field; the EPA Level III codes are those of ecoregions/ecoregions.json.
 */
import { describe, expect, it } from 'vitest';
import { loadCatalogue } from './catalogue.js';

const { species, ecoregions } = loadCatalogue();
const regionsOf = (slug: string) => {
  const s = species.find((x) => x.slug === slug);
  if (!s) throw new Error(`${slug} is not in the catalogue`);
  return s.ecoregions ?? [];
};

describe('species ecoregions (range limits from memory)', () => {
  it('every record names known EPA Level III codes', () => {
    const codes = new Set(ecoregions.map((e) => e.code));
    const unknown = species.flatMap((s) =>
      (s.ecoregions ?? []).filter((c) => !codes.has(c)).map((c) => `${s.slug}: ${c}`),
    );
    expect(unknown).toEqual([]);
  });

  it.each([
    'schizachyrium-scoparium',
    'amorpha-canescens',
    'andropogon-gerardii',
    'dalea-purpurea',
    'asclepias-tuberosa',
    'quercus-alba',
    'geranium-maculatum',
    'sanguinaria-canadensis',
    'asclepias-incarnata',
    'sporobolus-heterolepis',
  ])('the Driftless Area (52) holds %s', (slug) => {
    expect(regionsOf(slug)).toContain('52');
  });

  it.each(['prunus-virginiana', 'maianthemum-canadense', 'diervilla-lonicera', 'dalea-purpurea', 'echinacea-pallida'])(
    'the Piedmont (45) does not hold the northern or prairie species %s',
    (slug) => {
      expect(regionsOf(slug)).not.toContain('45');
    },
  );

  it.each(['asclepias-lanceolata', 'asclepias-rubra', 'clethra-alnifolia', 'coreopsis-rosea'])(
    'coastal-plain species %s stays off the Driftless Area, the Blue Ridge and the Central Appalachians',
    (slug) => {
      const r = regionsOf(slug);
      expect(r.length).toBeGreaterThan(0);
      for (const code of ['52', '66', '69']) expect(r).not.toContain(code);
    },
  );

  it('no catalogue species is placed in the Sonoran or Mojave deserts (81, 14) or coastal southern California (85)', () => {
    const desert = species.filter((s) => (s.ecoregions ?? []).some((c) => c === '81' || c === '14' || c === '85'));
    expect(desert.map((s) => s.slug)).toEqual([]);
  });
});
