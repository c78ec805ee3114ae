import type { GroupRole } from '@homeground/shared';
import { renderEmail } from '../mail/templates/email-layout.js';

const ROLE_WORDS: Record<GroupRole, { noun: string; what: string }> = {
  member: {
    noun: 'a member',
    what: 'Members hear when the plant share opens and can reserve plants for their yard.',
  },
  grower: {
    noun: 'a grower',
    what: 'Growers raise a batch of native plants over the winter for the plant share. Homeground gives you the dates for each step and a place to log what comes up; no experience needed.',
  },
  organiser: {
    noun: 'an organiser',
    what: 'Organisers choose the species for the season, hand out batches to growers and run the plant share.',
  },
};

export function invitationEmail(input: {
  inviterName: string;
  groupName: string;
  town: string;
  state: string;
  role: GroupRole;
  link: string;
  days: number;
}): { subject: string; text: string; html: string } {
  const role = ROLE_WORDS[input.role];
  const { text, html } = renderEmail({
    greeting: 'Hello,',
    paragraphs: [
      `${input.inviterName} has invited you to join ${input.groupName} in ${input.town}, ${input.state} on Homeground, as ${role.noun}.`,
      role.what,
      `The link below works for ${input.days} days. If you did not expect this message, you can simply ignore it.`,
    ],
    action: { label: `Join ${input.groupName}`, url: input.link },
    footer: `You got this e-mail because an organiser of ${input.groupName} entered your address. Homeground sends you nothing more unless you join.`,
  });
  return { subject: `${input.inviterName} invites you to ${input.groupName}`, text, html };
}
