import { type Caution, formatMonths, joinWords, MOISTURE_WORDS, type Moisture, SUN_WORDS, type Sun } from '@homeground/shared';

/** Short headings for each caution kind; the record's own sentence follows them. */
export const CAUTION_LABELS: Record<Caution['kind'], string> = {
  'toxic-if-eaten': 'Toxic if eaten',
  'sap-irritant': 'Irritating sap',
  'skin-irritant': 'Irritates skin',
  'eye-irritant': 'Irritates eyes',
  pets: 'Harmful to pets',
  livestock: 'Harmful to livestock',
  'aggressive-spreader': 'Spreads fast',
  'look-alike': 'Has a look-alike',
  protected: 'Protected species',
  thorns: 'Thorns',
  regulated: 'Restricted in some states',
};

const SUN_ORDER: Sun[] = ['full', 'part', 'shade'];
const MOISTURE_ORDER: Moisture[] = ['dry', 'medium', 'wet'];

/** "Full sun or part shade". */
export function sunWords(sun: readonly Sun[]): string {
  const words = SUN_ORDER.filter((s) => sun.includes(s)).map((s) => SUN_WORDS[s]);
  const text = joinWords(words, 'or');
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** "Dry or medium-moist soil". */
export function moistureWords(moisture: readonly Moisture[]): string {
  const text = `${joinWords(MOISTURE_ORDER.filter((m) => moisture.includes(m)).map((m) => MOISTURE_WORDS[m]), 'or')} soil`;
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** "Blooms Jun–Aug", or a plain word when the record gives no months (ferns, some grasses). */
export function bloomWords(bloomMonths: readonly number[]): string {
  return bloomMonths.length === 0 ? 'No showy bloom' : `Blooms ${formatMonths(bloomMonths)}`;
}

/** Caterpillar host value of the genus, always with its source (Tallamy & Shropshire 2009). */
export function hostWords(genus: string, count: number | null): string {
  if (count === null) return `${genus} is not in the caterpillar host counts (Tallamy & Shropshire 2009).`;
  if (count === 0) return `No moth or butterfly caterpillars are recorded on ${genus} (Tallamy & Shropshire 2009).`;
  return `${genus} hosts the caterpillars of ${count} moth and butterfly species (Tallamy & Shropshire 2009).`;
}

/** "Flowers orange", "Flowers lavender and pink": the band's words, so grey copies keep the colour. */
export function flowerColourWords(names: readonly string[]): string {
  return names.length === 0 ? 'Flower colour not recorded' : `Flowers ${joinWords(names)}`;
}

/** Today as YYYY-MM-DD in the person's own time zone (what a date input holds). */
export function todayIso(now: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** "2026-03-02" → "Mar 2, 2026"; an empty or bad date prints a blank line to fill in by hand. */
export function sowDateWords(iso: string): string {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(iso)) return '____________';
  const date = new Date(`${iso}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return '____________';
  return date.toLocaleDateString('en-US', { timeZone: 'UTC', month: 'short', day: 'numeric', year: 'numeric' });
}
