import type { CalendarEvent, CalendarEventKind, SowingCalendar } from '../sowing-calendar/calendar-types.js';
import type { Species } from '../types/species.js';
import { batchWordsFor } from '../vocabulary/locale/batch-words-in.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import { STEP_OF } from './batch-schedule.js';
import { calendarTextIn, stepDetailIn, warningIn } from './step-details-in.js';

/** Titles of the events that concern the whole calendar, and of holding a plant until the share. */
const ES_WHOLE: Partial<Record<CalendarEventKind, string>> = {
  'frost-watch': 'Última helada de primavera (fecha promedio): empieza la vigilancia de heladas',
  'frost-watch-end': 'Termina la vigilancia de heladas: a plantar',
  'winter-sowing-window': 'Empieza la temporada de siembra de invierno (de diciembre a febrero)',
  'winter-sowing-window-ends': 'Termina la temporada de siembra de invierno',
  'vent-containers': 'Abre los recipientes de siembra de invierno los días templados',
  'collect-pots': 'Reúne macetas y bandejas para el reparto de plantas',
  'label-pots': 'Etiqueta las macetas para el reparto de plantas',
  'plant-share': 'Reparto de plantas',
};
const ES_POT_ON = 'guárdalas y pásalas a una maceta más grande hasta el reparto';

/** The species' name from a species event's title ("Wild bergamot: Sow" → "Wild bergamot"). */
function nameIn(title: string): string {
  const colon = title.indexOf(': ');
  return colon < 0 ? title : title.slice(0, colon);
}

function eventIn(
  e: CalendarEvent,
  locale: WordLocale,
  speciesOf: (slug: string) => Species | undefined,
): CalendarEvent {
  const species = e.speciesSlug ? speciesOf(e.speciesSlug) : undefined;
  const detail = species ? stepDetailIn(e.detail, species, locale) : calendarTextIn(e.detail, locale);
  if (!e.speciesSlug) return { ...e, title: ES_WHOLE[e.kind] ?? e.title, detail };
  const step = STEP_OF[e.kind];
  const what = step ? batchWordsFor(locale).step[step] : e.kind === 'pot-on' ? ES_POT_ON : undefined;
  return { ...e, title: what ? `${nameIn(e.title)}: ${what}` : e.title, detail };
}

/**
 * A sowing calendar's words in the reader's language, for the exports (iCalendar): each species
 * step titled as on the batch page, details and warnings sentence by sentence (common plant names
 * stay as the catalogue gives them). Dates, kinds and UIDs are untouched; English passes through.
 */
export function calendarIn(
  calendar: SowingCalendar,
  locale: WordLocale,
  speciesOf: (slug: string) => Species | undefined,
): SowingCalendar {
  if (locale === 'en') return calendar;
  return {
    ...calendar,
    events: calendar.events.map((e) => eventIn(e, locale, speciesOf)),
    warnings: calendar.warnings.map((w) => ({ ...w, message: warningIn(w.message, locale) })),
  };
}
