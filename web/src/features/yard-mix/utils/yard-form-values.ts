import {
  type DeerPressure,
  type Goal,
  MAX_AREA_SQ_FT,
  type Moisture,
  SQUARE_METRES_PER_SQUARE_FOOT,
  type SiteRequest,
  type SoilTexture,
  type Sun,
  cmToInches,
  inchesToCm,
  roundTo,
  siteRequestSchema,
  squareFeetToSquareMetres,
} from '@homeground/shared';
import type { TFunction } from 'i18next';
import type { Formatters } from '../../../lib/i18n/index.js';
import type { AreaUnit } from './mix-plan.js';

export type HeightUnit = 'ft' | 'cm';

/** The form as typed: numbers stay text until submit so a half-typed "1." is not lost. */
export interface YardFormValues {
  sun: Sun | '';
  moisture: Moisture | '';
  soilTexture: SoilTexture | '';
  area: string;
  areaUnit: AreaUnit;
  maxHeight: string;
  heightUnit: HeightUnit;
  deerPressure: DeerPressure | '';
  goals: Goal[];
  /** Add shrubs and small trees (a yard mix is herbaceous unless asked). */
  woodyPlants: boolean;
  /** Allow plants that spread hard or seed themselves about, even in a small bed. */
  spreaders: boolean;
}

export type YardField = 'sun' | 'moisture' | 'soilTexture' | 'area' | 'maxHeight' | 'deerPressure' | 'goals';
export type YardErrors = Partial<Record<YardField, string>>;

export const EMPTY_YARD: YardFormValues = {
  sun: '',
  moisture: '',
  soilTexture: '',
  area: '',
  areaUnit: 'ft2',
  maxHeight: '',
  heightUnit: 'ft',
  deerPressure: '',
  goals: [],
  woodyPlants: false,
  spreaders: false,
};

/** 10 acres in m² (the site schema's limit is in ft²). */
const MAX_AREA_SQ_M = Math.floor(MAX_AREA_SQ_FT * SQUARE_METRES_PER_SQUARE_FOOT);
const MIN_HEIGHT_CM = 10;
const MAX_HEIGHT_CM = 3000;

function parseNumber(text: string): number | null {
  const cleaned = text.replace(/,/g, '').trim();
  if (cleaned === '') return null;
  const n = Number(cleaned);
  return Number.isFinite(n) ? n : Number.NaN;
}

/** The typed height in centimetres, or null when empty; NaN when not a number. */
export function heightInCm(values: Pick<YardFormValues, 'maxHeight' | 'heightUnit'>): number | null {
  const n = parseNumber(values.maxHeight);
  if (n === null || Number.isNaN(n)) return n;
  return values.heightUnit === 'cm' ? n : inchesToCm(n * 12);
}

/** "= 18.6 m²" beside an area in ft², and the reverse; empty when nothing sensible is typed. */
export function otherAreaUnit(values: Pick<YardFormValues, 'area' | 'areaUnit'>, say: YardSay): string {
  const n = parseNumber(values.area);
  if (n === null || Number.isNaN(n) || n <= 0) return '';
  return values.areaUnit === 'ft2'
    ? say.t('thatIs', { value: say.f.number(roundTo(squareFeetToSquareMetres(n), 1)), unit: 'm²' })
    : say.t('thatIs', { value: say.f.number(Math.round(n / SQUARE_METRES_PER_SQUARE_FOOT)), unit: 'ft²' });
}

export function otherHeightUnit(values: Pick<YardFormValues, 'maxHeight' | 'heightUnit'>, say: YardSay): string {
  const cm = heightInCm(values);
  if (cm === null || Number.isNaN(cm) || cm <= 0) return '';
  return values.heightUnit === 'ft'
    ? say.t('thatIs', { value: say.f.number(Math.round(cm)), unit: 'cm' })
    : say.t('thatIs', { value: say.f.number(roundTo(cmToInches(cm) / 12, 1)), unit: 'ft' });
}

/** The page's words and number style for the form's messages. */
export interface YardSay {
  t: TFunction<'yard'>;
  f: Formatters;
}

export type YardCheck = { ok: true; site: SiteRequest; areaUnit: AreaUnit } | { ok: false; errors: YardErrors };

/** Checks every answer with a sentence for the field beside it, then the shared site schema as the last word. */
export function checkYard(values: YardFormValues, { t, f }: YardSay): YardCheck {
  const errors: YardErrors = {};
  if (!values.sun) errors.sun = t('errors.sun');
  if (!values.moisture) errors.moisture = t('errors.moisture');
  if (!values.deerPressure) errors.deerPressure = t('errors.deer');

  const area = parseNumber(values.area);
  const unit = values.areaUnit === 'ft2' ? 'ft²' : 'm²';
  const maxArea = values.areaUnit === 'ft2' ? MAX_AREA_SQ_FT : MAX_AREA_SQ_M;
  if (area === null) errors.area = t('errors.areaEmpty');
  else if (Number.isNaN(area)) errors.area = t('errors.areaNumber', { unit });
  else if (area <= 0) errors.area = t('errors.areaZero');
  else if (area > maxArea) {
    errors.area = t('errors.areaMax', { max: f.number(maxArea), unit });
  }

  const heightCm = heightInCm(values);
  if (heightCm !== null) {
    if (Number.isNaN(heightCm)) errors.maxHeight = t('errors.heightNumber', { unit: values.heightUnit });
    else if (heightCm < MIN_HEIGHT_CM) errors.maxHeight = t('errors.heightMin');
    else if (heightCm > MAX_HEIGHT_CM) errors.maxHeight = t('errors.heightMax');
  }

  if (Object.keys(errors).length > 0) return { ok: false, errors };

  const candidate = {
    sun: values.sun,
    moisture: values.moisture,
    ...(values.soilTexture ? { soilTexture: values.soilTexture } : {}),
    ...(values.areaUnit === 'ft2' ? { areaSqFt: area } : { areaSqM: area }),
    ...(heightCm !== null ? { maxHeightCm: Math.round(heightCm) } : {}),
    deerPressure: values.deerPressure,
    goals: values.goals,
    ...(values.woodyPlants ? { woodyPlants: true } : {}),
    ...(values.spreaders ? { spreaders: true } : {}),
  };
  const parsed = siteRequestSchema.safeParse(candidate);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    const field = (first?.path[0] === 'areaSqFt' || first?.path[0] === 'areaSqM' ? 'area' : first?.path[0]) as
      YardField | undefined;
    return {
      ok: false,
      errors: { [field ?? 'area']: t('errors.check', { reason: first?.message ?? t('errors.notValid') }) },
    };
  }
  return { ok: true, site: candidate as SiteRequest, areaUnit: values.areaUnit };
}

/** Back from a plan's site to the form, for "change your yard". */
export function valuesFromSite(site: SiteRequest | undefined, areaUnit: AreaUnit): YardFormValues {
  if (!site) return EMPTY_YARD;
  const area = areaUnit === 'm2' ? site.areaSqM : site.areaSqFt;
  const heightFt = site.maxHeightCm !== undefined ? roundTo(cmToInches(site.maxHeightCm) / 12, 1) : undefined;
  return {
    sun: site.sun,
    moisture: site.moisture,
    soilTexture: site.soilTexture ?? '',
    area: area !== undefined ? String(area) : '',
    areaUnit,
    maxHeight: heightFt !== undefined ? String(heightFt) : '',
    heightUnit: 'ft',
    deerPressure: site.deerPressure,
    goals: [...site.goals],
    woodyPlants: site.woodyPlants === true,
    spreaders: site.spreaders === true,
  };
}
