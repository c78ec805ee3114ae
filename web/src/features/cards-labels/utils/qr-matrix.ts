/**
 * QR codes drawn as our own SVG from the `qrcode` package's module matrix. The package is loaded
 * with a dynamic import, so it travels in its own chunk and only when someone opens this page.
 */

/** The dark/light modules of one QR symbol, `size` × `size`. */
export interface QrMatrix {
  size: number;
  isDark: (row: number, col: number) => boolean;
}

export type QrEncoder = (text: string) => QrMatrix;

/** ISO/IEC 18004 asks for a light border of 4 modules around the symbol so scanners find it. */
export const QUIET_ZONE = 4;

let encoderPromise: Promise<QrEncoder> | undefined;

export function loadQrEncoder(): Promise<QrEncoder> {
  encoderPromise ??= import('qrcode').then((mod) => {
    // The package is CommonJS: bundlers expose it as the default export, Node as named ones.
    const qrcode = (mod.default as typeof mod.default | undefined) ?? mod;
    return (text: string) => {
      // Level M recovers from about 15% damage: enough for a card handled with soily fingers.
      const { modules } = qrcode.create(text, { errorCorrectionLevel: 'M' });
      return { size: modules.size, isDark: (row: number, col: number) => Boolean(modules.get(row, col)) };
    };
  });
  encoderPromise.catch(() => (encoderPromise = undefined));
  return encoderPromise;
}

/** One SVG path with a 1 × 1 square per dark module, offset by the quiet zone. */
export function qrPathData(matrix: QrMatrix): string {
  const parts: string[] = [];
  for (let row = 0; row < matrix.size; row++) {
    for (let col = 0; col < matrix.size; col++) {
      if (matrix.isDark(row, col)) parts.push(`M${col + QUIET_ZONE} ${row + QUIET_ZONE}h1v1h-1z`);
    }
  }
  return parts.join('');
}
