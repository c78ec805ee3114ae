import type { WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { renderEmail } from '../mail/templates/email-layout.js';

type Rendered = { subject: string; text: string; html: string };

/** The link that finishes a sign-up, in the language of the sign-up page: the account exists only once it is opened. */
export function confirmRegistrationEmail(input: {
  displayName: string;
  link: string;
  hours: number;
  locale?: WordLocale;
}): Rendered {
  const locale = input.locale ?? 'en';
  const say = apiWords(locale);
  const { text, html } = renderEmail({
    locale,
    greeting: say('mail.greeting', { name: input.displayName }),
    paragraphs: [say('auth.confirmMail.thanks'), say('auth.confirmMail.hours', { hours: input.hours })],
    action: { label: say('auth.confirmMail.action'), url: input.link },
    footer: say('auth.mailFooter'),
  });
  return { subject: say('auth.confirmMail.subject'), text, html };
}

/**
 * Sent instead of a confirmation when the address already has an account, so the sign-up page itself
 * never says who has one; the owner learns it here, where only they can read it. In the language of
 * the sign-up request (whoever made it), which is all that is known at send time.
 */
export function alreadyRegisteredEmail(input: { signInLink: string; locale?: WordLocale }): Rendered {
  const locale = input.locale ?? 'en';
  const say = apiWords(locale);
  const { text, html } = renderEmail({
    locale,
    greeting: say('mail.greetingNoName'),
    paragraphs: [say('auth.alreadyMail.someone'), say('auth.alreadyMail.ifYou')],
    action: { label: say('auth.alreadyMail.action'), url: input.signInLink },
    footer: say('auth.mailFooter'),
  });
  return { subject: say('auth.alreadyMail.subject'), text, html };
}
