import type { Germination } from '../types/species.js';

const EIGHTHS: Record<number, string> = { 1: '⅛', 2: '¼', 3: '⅜', 4: '½', 5: '⅝', 6: '¾', 7: '⅞' };

/** 1 in = 25.4 mm exactly (international inch, 1959), so an eighth of an inch is 3.175 mm. */
const MM_PER_EIGHTH_INCH = 3.175;

/** Millimetres as inches the way a ruler reads them, to the nearest eighth: 6 → "¼ in", 25 → "1 in". */
export function mmToInchWords(mm: number): string {
  const eighths = Math.max(1, Math.round(mm / MM_PER_EIGHTH_INCH));
  const whole = Math.floor(eighths / 8);
  const rest = eighths % 8;
  if (rest === 0) return `${whole} in`;
  return whole === 0 ? `${EIGHTHS[rest]} in` : `${whole} ${EIGHTHS[rest]} in`;
}

/** Where the seed goes: surface sown when it needs light, otherwise its depth in mm and inches. */
export function sowingDepthSentence(g: Pick<Germination, 'needsLight' | 'sowingDepthMm'>): string {
  if (g.needsLight) {
    return g.sowingDepthMm > 0
      ? `Needs light to germinate: surface sow, pressing the seed onto the soil. Cover with no more than ${g.sowingDepthMm} mm (a dusting) of fine grit.`
      : 'Needs light to germinate: surface sow. Press the seed onto the soil and do not cover it.';
  }
  if (g.sowingDepthMm === 0) return 'Surface sow, pressing the seed onto the soil.';
  return `Sow ${g.sowingDepthMm} mm (${mmToInchWords(g.sowingDepthMm)}) deep.`;
}
