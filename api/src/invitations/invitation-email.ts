import type { GroupRole, WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { renderEmail } from '../mail/templates/email-layout.js';

export function invitationEmail(input: {
  inviterName: string;
  groupName: string;
  town: string;
  state: string;
  role: GroupRole;
  link: string;
  days: number;
  /** The inviter's page language, which the invitation is written in. */
  locale?: WordLocale;
}): { subject: string; text: string; html: string } {
  const locale = input.locale ?? 'en';
  const say = apiWords(locale);
  const group = input.groupName;
  const { text, html } = renderEmail({
    locale,
    greeting: say('mail.greetingNoName'),
    paragraphs: [
      say('mail.invitation.invited', {
        inviter: input.inviterName,
        group,
        town: input.town,
        state: input.state,
        role: say(`mail.invitation.role.${input.role}`),
      }),
      say(`mail.invitation.what.${input.role}`),
      say('mail.invitation.days', { days: input.days }),
    ],
    action: { label: say('mail.invitation.action', { group }), url: input.link },
    footer: say('mail.invitation.footer', { group }),
  });
  return { subject: say('mail.invitation.subject', { inviter: input.inviterName, group }), text, html };
}
