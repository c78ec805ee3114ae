import type { CareSheetEntry, SharePlace, WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { renderEmail } from '../mail/templates/email-layout.js';

/** Intl tags of the e-mail languages: US English and Spanish as spoken in the US. */
const LOCALE_TAGS: Record<WordLocale, string> = { en: 'en-US', es: 'es-US' };

/** Built once per language: a formatter costs far more to make than to use. */
const SLOT_DAY: Record<WordLocale, Intl.DateTimeFormat> = {
  en: slotDayFormat('en'),
  es: slotDayFormat('es'),
};

function slotDayFormat(locale: WordLocale): Intl.DateTimeFormat {
  return new Intl.DateTimeFormat(LOCALE_TAGS[locale], {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone: 'UTC',
  });
}

/**
 * A slot's time as the organiser wrote it (the place's own clock): "Sat, Jun 12, 2027, 09:00–09:30",
 * "sáb, 12 jun 2027, 09:00–09:30".
 */
export function slotWords(start: string, end: string, locale: WordLocale = 'en'): string {
  const day = SLOT_DAY[locale].format(new Date(`${start.slice(0, 10)}T12:00:00Z`));
  return `${day}, ${start.slice(11, 16)}–${end.slice(11, 16)}`;
}

const placeWords = (p: SharePlace) => `${p.name}, ${p.address}`;

/** The confirmation a taker gets: the slot, the place, a care sheet per species and the private link. */
export function reservationEmail(input: {
  name: string;
  groupName: string;
  place: SharePlace;
  whatToBring?: string | null;
  slot: { start: string; end: string };
  lines: { commonName: string; count: number }[];
  careSheet: CareSheetEntry[];
  link: string;
  changed: boolean;
  /** The taker's language, kept with the reservation. */
  locale?: WordLocale;
}): { subject: string; text: string; html: string } {
  const locale = input.locale ?? 'en';
  const say = apiWords(locale);
  const group = input.groupName;
  const when = slotWords(input.slot.start, input.slot.end, locale);
  const plants = input.lines.map((l) => `${l.count} × ${l.commonName}`).join(', ');
  const care = input.careSheet.map((c) =>
    [`${c.commonName} (${c.scientificName}): ${c.sun} ${c.moisture} ${c.spacing}`, ...c.cautions].join(' '),
  );
  const { text, html } = renderEmail({
    locale,
    greeting: say('mail.greeting', { name: input.name }),
    paragraphs: [
      input.changed ? say('mail.reservation.changed', { group }) : say('mail.reservation.reserved', { group }),
      say('mail.reservation.slot', { when }),
      `${say('mail.reservation.place', { place: placeWords(input.place) })}${input.place.directions ? ` ${input.place.directions}` : ''}`,
      ...(input.whatToBring ? [say('mail.reservation.bring', { what: input.whatToBring })] : []),
      say('mail.reservation.plants', { plants }),
      say('mail.reservation.care'),
      ...care,
      say('mail.reservation.dig'),
      say('mail.reservation.link'),
    ],
    action: { label: say('mail.reservation.action'), url: input.link },
    footer: say('mail.reservation.footer', { group }),
  });
  return {
    subject: input.changed
      ? say('mail.reservation.subjectChanged', { group })
      : say('mail.reservation.subjectReserved', { group, when }),
    text,
    html,
  };
}

/** The mail a waitlisted household gets when plants come free and are held for them. */
export function waitlistOfferEmail(input: {
  name: string;
  groupName: string;
  commonName: string;
  count: number;
  heldUntil: string;
  place: SharePlace;
  link: string;
  /** The language the household used when it joined the waitlist. */
  locale?: WordLocale;
}): { subject: string; text: string; html: string } {
  const locale = input.locale ?? 'en';
  const say = apiWords(locale);
  const group = input.groupName;
  const until = new Date(input.heldUntil).toLocaleString(LOCALE_TAGS[locale], {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    hour: 'numeric',
    minute: '2-digit',
    timeZone: 'UTC',
    timeZoneName: 'short',
  });
  const { text, html } = renderEmail({
    locale,
    greeting: input.name ? say('mail.greeting', { name: input.name }) : say('mail.greetingNoName'),
    paragraphs: [
      say('mail.offer.free', { count: input.count, plant: input.commonName, group }),
      say('mail.offer.choose', { place: placeWords(input.place), until }),
    ],
    action: { label: say('mail.offer.action'), url: input.link },
    footer: say('mail.offer.footer', { group }),
  });
  return { subject: say('mail.offer.subject', { plant: input.commonName, group }), text, html };
}

/** What the organiser changed about a taker's pickup, before and after. */
export interface PickupChange {
  day?: { before: string; now: string };
  place?: { before: SharePlace; now: SharePlace };
  slot?: { before: { start: string; end: string }; now: { start: string; end: string } };
}

/**
 * The mail every taker with a live reservation gets when the organiser changes the share's day,
 * place or their slot's times: each change in words (now and before), their plants, and a fresh
 * private link to change or cancel.
 */
export function pickupChangeEmail(input: {
  name: string;
  groupName: string;
  change: PickupChange;
  lines: { commonName: string; count: number }[];
  link: string;
  /** The taker's language, kept with the reservation. */
  locale?: WordLocale;
}): { subject: string; text: string; html: string } {
  const locale = input.locale ?? 'en';
  const say = apiWords(locale);
  const group = input.groupName;
  const { day, place, slot } = input.change;
  const dayWords = (iso: string) =>
    new Intl.DateTimeFormat(LOCALE_TAGS[locale], { dateStyle: 'full', timeZone: 'UTC' }).format(
      new Date(`${iso}T12:00:00Z`),
    );
  const { text, html } = renderEmail({
    locale,
    greeting: say('mail.greeting', { name: input.name }),
    paragraphs: [
      say('mail.shareChanged.intro', { group }),
      ...(day ? [say('mail.shareChanged.day', { now: dayWords(day.now), before: dayWords(day.before) })] : []),
      ...(place
        ? [say('mail.shareChanged.place', { now: placeWords(place.now), before: placeWords(place.before) })]
        : []),
      ...(place?.now.directions ? [place.now.directions] : []),
      ...(slot
        ? [
            say('mail.shareChanged.slot', {
              now: slotWords(slot.now.start, slot.now.end, locale),
              before: slotWords(slot.before.start, slot.before.end, locale),
            }),
          ]
        : []),
      say('mail.shareChanged.still', { plants: input.lines.map((l) => `${l.count} × ${l.commonName}`).join(', ') }),
      say('mail.shareChanged.link'),
    ],
    action: { label: say('mail.shareChanged.action'), url: input.link },
    footer: say('mail.reservation.footer', { group }),
  });
  return { subject: say('mail.shareChanged.subject', { group }), text, html };
}
