import type { Batch } from '@homeground/shared';
import { renderEmail } from '../mail/templates/email-layout.js';
import { FROST_WARNING_WORDS, mailDate, type MailLanguage, WEEKLY_SUMMARY_WORDS } from './season-mail-words.js';

interface Rendered {
  subject: string;
  text: string;
  html: string;
}

/** The frost warning: what to close, cover or bring in, batch by batch. */
export function frostWarningEmail(
  input: {
    name: string;
    organiser: string;
    groupName: string;
    night: string;
    note?: string;
    batches: Pick<Batch, 'commonName' | 'method'>[];
    link: string;
  },
  lang: MailLanguage,
): Rendered {
  const w = FROST_WARNING_WORDS[lang];
  const night = mailDate(input.night, lang);
  const { text, html } = renderEmail({
    lang,
    greeting: w.greeting(input.name),
    paragraphs: [
      w.lead(input.organiser, night),
      ...input.batches.map((b) => w.batchLine(capitalise(b.commonName), b.method)),
      ...(input.note ? [w.note(input.organiser, input.note)] : []),
      w.after,
      w.caution,
    ],
    action: { label: w.action, url: input.link },
    footer: w.footer(input.groupName),
  });
  return { subject: w.subject(input.groupName, night), text, html };
}

/** The weekly summary: each batch's next step with its date, and any batch behind its dates. */
export function weeklySummaryEmail(
  input: {
    name: string;
    groupName: string;
    batches: Pick<Batch, 'commonName' | 'nextStep' | 'behind'>[];
    link: string;
  },
  lang: MailLanguage,
): Rendered {
  const w = WEEKLY_SUMMARY_WORDS[lang];
  const lines = input.batches.flatMap((b) => {
    const plant = capitalise(b.commonName);
    const next = b.nextStep ? w.step(plant, b.nextStep.kind, mailDate(b.nextStep.date, lang)) : w.allDone(plant);
    return b.behind ? [next, w.behind(plant, b.behind)] : [next];
  });
  const { text, html } = renderEmail({
    lang,
    greeting: w.greeting(input.name),
    paragraphs: [w.lead, ...lines, w.logReminder],
    action: { label: w.action, url: input.link },
    footer: w.footer(input.groupName),
  });
  return { subject: w.subject(input.groupName), text, html };
}

const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
