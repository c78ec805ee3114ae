import { renderEmail } from '../mail/templates/email-layout.js';

type Rendered = { subject: string; text: string; html: string };

/** The link that finishes a sign-up: the account exists only once it is opened. */
export function confirmRegistrationEmail(input: { displayName: string; link: string; hours: number }): Rendered {
  const { text, html } = renderEmail({
    greeting: `Hello ${input.displayName},`,
    paragraphs: [
      'Thank you for joining Homeground. Open the link below to confirm this is your address, and your account is ready.',
      `The link works for ${input.hours} hours. If you did not sign up, you can simply ignore this message: no account is made.`,
    ],
    action: { label: 'Confirm my address', url: input.link },
    footer: 'You got this e-mail because someone entered your address on the Homeground sign-up page.',
  });
  return { subject: 'Confirm your address for Homeground', text, html };
}

/**
 * Sent instead of a confirmation when the address already has an account, so the sign-up page itself
 * never says who has one; the owner learns it here, where only they can read it.
 */
export function alreadyRegisteredEmail(input: { signInLink: string }): Rendered {
  const { text, html } = renderEmail({
    greeting: 'Hello,',
    paragraphs: [
      'Someone asked to make a Homeground account with this address, but you already have one, so nothing has changed.',
      'If it was you, sign in with your password. If it was not, you can ignore this message: your account is as it was.',
    ],
    action: { label: 'Sign in', url: input.signInLink },
    footer: 'You got this e-mail because someone entered your address on the Homeground sign-up page.',
  });
  return { subject: 'You already have a Homeground account', text, html };
}
