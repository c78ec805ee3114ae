import type { CareSheetEntry, SharePlace } from '@homeground/shared';
import { renderEmail } from '../mail/templates/email-layout.js';

/** Built once: a formatter costs far more to make than to use. */
const SLOT_DAY = new Intl.DateTimeFormat('en-US', {
  weekday: 'short',
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  timeZone: 'UTC',
});

/** A slot's time as the organiser wrote it (the place's own clock): "Sat 12 Jun 2027, 09:00–09:30". */
export function slotWords(start: string, end: string): string {
  const day = SLOT_DAY.format(new Date(`${start.slice(0, 10)}T12:00:00Z`));
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
}): { subject: string; text: string; html: string } {
  const when = slotWords(input.slot.start, input.slot.end);
  const plants = input.lines.map((l) => `${l.count} × ${l.commonName}`).join(', ');
  const care = input.careSheet.map((c) =>
    [`${c.commonName} (${c.scientificName}): ${c.sun} ${c.moisture} ${c.spacing}`, ...c.cautions].join(' '),
  );
  const { text, html } = renderEmail({
    greeting: `Hello ${input.name},`,
    paragraphs: [
      input.changed
        ? `Your reservation at the ${input.groupName} plant share has been changed.`
        : `Your plants from the ${input.groupName} plant share are reserved.`,
      `Pickup slot: ${when}.`,
      `Place: ${placeWords(input.place)}.${input.place.directions ? ` ${input.place.directions}` : ''}`,
      ...(input.whatToBring ? [`What to bring: ${input.whatToBring}`] : []),
      `Your plants: ${plants}.`,
      'Care sheet:',
      ...care,
      'Before you dig, call 811 so buried lines are marked, and follow your town’s rules for planting by streets and sidewalks.',
      'To change your slot or plants, or to cancel so someone on the waitlist gets them, use your private link below. Keep it to yourself: anyone with it can change your reservation.',
    ],
    action: { label: 'Change or cancel your reservation', url: input.link },
    footer: `You got this e-mail because you reserved plants from ${input.groupName} on Homeground. Your name and e-mail are seen only by the group's organisers and are deleted after the share.`,
  });
  return {
    subject: input.changed
      ? `Your reservation at the ${input.groupName} plant share has changed`
      : `Your plants are reserved: ${input.groupName} plant share, ${when}`,
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
}): { subject: string; text: string; html: string } {
  const until = new Date(input.heldUntil).toLocaleString('en-US', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    hour: 'numeric',
    minute: '2-digit',
    timeZone: 'UTC',
    timeZoneName: 'short',
  });
  const { text, html } = renderEmail({
    greeting: `Hello ${input.name},`,
    paragraphs: [
      `Good news: ${input.count} × ${input.commonName} came free at the ${input.groupName} plant share, and we are holding ${input.count === 1 ? 'it' : 'them'} for you because you were next on the waitlist.`,
      `Open your private link to choose a pickup slot at ${placeWords(input.place)}. We hold them for you until ${until}; after that they go to the next household on the list. If you no longer want them, simply ignore this e-mail.`,
    ],
    action: { label: 'Choose your pickup slot', url: input.link },
    footer: `You got this e-mail because you joined the waitlist of ${input.groupName}'s plant share. Your name and e-mail are deleted after the share.`,
  });
  return { subject: `${input.commonName} is free for you: ${input.groupName} plant share`, text, html };
}
