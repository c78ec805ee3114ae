import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import * as common from '@zxcvbn-ts/language-common';
import * as english from '@zxcvbn-ts/language-en';
import type { WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { badRequest } from '../common/validation/bad-request.js';

/** zxcvbn with its common-password, keyboard-pattern and English word lists, built once. */
const estimator = new ZxcvbnFactory({
  dictionary: { ...common.dictionary, ...english.dictionary },
  graphs: common.adjacencyGraphs,
});

/**
 * The lowest acceptable zxcvbn score (0–4). 3 is "safely unguessable: moderate protection from an
 * offline slow-hash attack"; with scrypt hashing and the sign-in limits it is the usual bar.
 */
const MIN_SCORE = 3;

/** Words from the context a guesser would try first (NIST SP 800-63B §5.1.1.2: "context-specific words"). */
const SERVICE_WORDS = ['homeground'];

const letters = (s: string) => s.toLowerCase().replace(/[^\p{L}\p{N}]+/gu, '');

/**
 * Throws a 400 naming `field` when the password is a common one or a simple pattern (zxcvbn's lists),
 * or contains the person's e-mail name, their display name or the service's name. NIST SP 800-63B
 * §5.1.1.2 asks verifiers to refuse values from lists of common or compromised passwords and ones built
 * from context such as the user name.
 */
export function assertStrongPassword(
  password: string,
  person: { email: string; displayName?: string },
  field = 'password',
  locale: WordLocale = 'en',
): void {
  const say = apiWords(locale);
  const localPart = person.email.split('@')[0] ?? '';
  const personal = [localPart, ...(person.displayName ? [person.displayName] : []), ...SERVICE_WORDS]
    .flatMap((p) => [letters(p), ...p.split(/[\s._+-]+/).map(letters)])
    .filter((p) => p.length >= 4);
  const plain = letters(password);
  if (personal.some((p) => plain.includes(p))) throw badRequest([{ field, message: say('auth.passwordPersonal') }]);
  if (estimator.check(password, personal).score < MIN_SCORE)
    throw badRequest([{ field, message: say('auth.passwordWeak') }]);
}
