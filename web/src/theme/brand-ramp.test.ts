import { describe, expect, it } from 'vitest';
import { homegroundBrand, mixHex } from './brand-ramp.js';

/** Relative luminance per WCAG 2.2, "relative luminance" definition. */
function luminance(hex: string): number {
  const channels = [1, 3, 5].map((i) => Number.parseInt(hex.slice(i, i + 2), 16) / 255);
  const [r, g, b] = channels.map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

describe('homegroundBrand', () => {
  it('runs from the darkest to the lightest colour with sedge green on shade 80 (DESIGN.md "Look")', () => {
    expect(homegroundBrand[10]).toBe('#0F2410');
    expect(homegroundBrand[80]).toBe('#3F6B3A');
    expect(homegroundBrand[160]).toBe('#E7F0E4');
  });

  it('gets lighter at every step, so hover and pressed shades stay in order', () => {
    const shades = Object.values(homegroundBrand).map(luminance);
    for (let i = 1; i < shades.length; i++) expect(shades[i]).toBeGreaterThan(shades[i - 1]);
  });

  it('keeps white text on the primary colour above the WCAG AA 4.5:1 contrast ratio', () => {
    const ratio = 1.05 / (luminance(homegroundBrand[80]) + 0.05);
    expect(ratio).toBeGreaterThan(4.5);
  });

  it('mixes halfway between black and white to mid grey', () => {
    expect(mixHex('#000000', '#FFFFFF', 0.5)).toBe('#808080');
  });
});
