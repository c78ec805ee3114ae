/**
 * Graded site fit: where a species thrives (sunOptimum, moistureOptimum) within what it tolerates.
 * The named expectations are a botanist's knowledge of these plants' habitats (from memory), the
 * source the records name for these fields.
 */
import { describe, expect, it } from 'vitest';
import { loadCatalogue } from './catalogue.js';

const { species } = loadCatalogue();
const bySlug = (slug: string) => {
  const s = species.find((x) => x.slug === slug);
  if (!s) throw new Error(`${slug} is not in the catalogue`);
  return s;
};

describe('site-fit optimum within tolerance', () => {
  it('every optimum is a non-empty subset of what the species tolerates', () => {
    const bad = species.flatMap((s) => {
      const out: string[] = [];
      if (!s.sunOptimum?.length || s.sunOptimum.some((v) => !s.sun.includes(v)))
        out.push(`${s.slug}: sun optimum ${s.sunOptimum} vs ${s.sun}`);
      if (!s.moistureOptimum?.length || s.moistureOptimum.some((v) => !s.moisture.includes(v)))
        out.push(`${s.slug}: moisture optimum ${s.moistureOptimum} vs ${s.moisture}`);
      return out;
    });
    expect(bad).toEqual([]);
  });

  it('obligate and facultative wetland plants (OBL, FACW) tolerate wet soil', () => {
    const bad = species.filter(
      (s) => (s.wetlandIndicator === 'OBL' || s.wetlandIndicator === 'FACW') && !s.moisture.includes('wet'),
    );
    expect(bad.map((s) => `${s.slug} (${s.wetlandIndicator})`)).toEqual([]);
  });

  it.each([
    'asclepias-incarnata',
    'iris-versicolor',
    'iris-virginica',
    'lobelia-cardinalis',
    'lobelia-siphilitica',
    'eutrochium-maculatum',
    'eutrochium-fistulosum',
    'eutrochium-purpureum',
    'eupatorium-perfoliatum',
    'verbena-hastata',
  ])('wetland plant %s thrives in wet soil', (slug) => {
    expect(bySlug(slug).moistureOptimum).toContain('wet');
  });

  it.each([
    'schizachyrium-scoparium',
    'sporobolus-heterolepis',
    'dalea-purpurea',
    'amorpha-canescens',
    'liatris-aspera',
    'asclepias-tuberosa',
  ])('dry-prairie plant %s thrives in dry soil', (slug) => {
    expect(bySlug(slug).moistureOptimum).toContain('dry');
    expect(bySlug(slug).moistureOptimum).not.toContain('wet');
  });

  it.each(['trillium-grandiflorum', 'asarum-canadense', 'polystichum-acrostichoides'])(
    'woodland plant %s does not want full sun',
    (slug) => {
      expect(bySlug(slug).sunOptimum).not.toContain('full');
    },
  );

  it('acid-soil plants are the ericads and acid-sand plants, not prairie generalists', () => {
    expect(bySlug('vaccinium-corymbosum').needsAcidSoil).toBe(true);
    expect(bySlug('vaccinium-angustifolium').needsAcidSoil).toBe(true);
    expect(bySlug('schizachyrium-scoparium').needsAcidSoil).toBe(false);
  });

  it('protection is per state and only in states where the species is native', () => {
    const bad = species.flatMap((s) =>
      (s.protectedIn ?? []).filter((st) => !s.nativeStates.includes(st)).map((st) => `${s.slug}: ${st}`),
    );
    expect(bad).toEqual([]);
    const lupine = bySlug('lupinus-perennis');
    expect(lupine.protectedIn?.length).toBeGreaterThan(0);
    expect(lupine.protectedIn?.length).toBeLessThan(lupine.nativeStates.length);
  });
});
