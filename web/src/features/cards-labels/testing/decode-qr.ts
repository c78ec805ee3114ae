import jsQR from 'jsqr';

const SCALE = 4;

/**
 * Reads back the text of a drawn QR code: the SVG's 1 × 1 squares are painted black on white into an
 * RGBA image (SCALE pixels per module) and decoded by jsQR, an independent decoder, so the test checks
 * what a phone would read rather than the words the code is labelled with.
 */
export function decodeQrSvg(svg: Element): string | null {
  const side = Number(svg.getAttribute('viewBox')?.split(' ')[2]);
  const d = svg.querySelector('path')?.getAttribute('d') ?? '';
  const width = side * SCALE;
  const pixels = new Uint8ClampedArray(width * width * 4).fill(255);
  for (const [, x, y] of d.matchAll(/M(\d+) (\d+)h1v1h-1z/g)) {
    for (let py = Number(y) * SCALE; py < (Number(y) + 1) * SCALE; py++) {
      for (let px = Number(x) * SCALE; px < (Number(x) + 1) * SCALE; px++) {
        const at = (py * width + px) * 4;
        pixels[at] = pixels[at + 1] = pixels[at + 2] = 0;
      }
    }
  }
  return jsQR(pixels, width, width)?.data ?? null;
}
