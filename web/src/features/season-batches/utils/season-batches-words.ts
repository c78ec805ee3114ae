import type { TFunction } from 'i18next';

/** "about 36 (29–45)": the expected count with its range, never a bare score. */
export function forecastWords(
  t: TFunction<'seasonBatches'>,
  f: { expected: number; low: number; high: number },
): string {
  return f.low === f.high ? t('progress.about', f) : t('progress.aboutRange', f);
}
