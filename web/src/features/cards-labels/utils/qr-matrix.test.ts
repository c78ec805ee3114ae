import { describe, expect, it } from 'vitest';
import { loadQrEncoder, QUIET_ZONE, qrPathData } from './qr-matrix.js';

// ISO/IEC 18004: a version-v symbol is 17 + 4v modules wide, and each corner holds a 7 × 7
// finder pattern whose outer ring is dark. A ~50-character URL at level M needs version 3 or 4.
describe('QR matrix', () => {
  it('encodes a species URL into a symbol of a valid size with finder patterns in three corners', async () => {
    const encode = await loadQrEncoder();
    const matrix = encode('http://localhost:3000/species/asclepias-tuberosa');
    expect((matrix.size - 17) % 4).toBe(0);
    expect(matrix.size).toBeGreaterThanOrEqual(29);
    const last = matrix.size - 1;
    for (const [r, c] of [
      [0, 0],
      [0, last],
      [last, 0],
      [6, 6],
      [0, last - 6],
      [last - 6, 0],
    ]) {
      expect(matrix.isDark(r, c)).toBe(true);
    }
    // Just inside the finder's dark ring is its light ring.
    expect(matrix.isDark(1, 1)).toBe(false);
  });

  it('draws one square per dark module, shifted by the quiet zone', () => {
    const matrix = { size: 2, isDark: (r: number, c: number) => r === c };
    expect(qrPathData(matrix)).toBe(`M${QUIET_ZONE} ${QUIET_ZONE}h1v1h-1zM${QUIET_ZONE + 1} ${QUIET_ZONE + 1}h1v1h-1z`);
  });
});
