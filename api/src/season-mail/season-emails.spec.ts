import { describe, expect, it } from '@jest/globals';
import type { Batch } from '@homeground/shared';
import { frostWarningEmail, weeklySummaryEmail } from './season-emails.js';
import { MAIL_LANGUAGES, mailDate } from './season-mail-words.js';

/**
 * The season e-mails in each language: the same facts in both, the reader's language on the HTML,
 * and dates written as a reader of that language writes them (Intl, CLDR data).
 */
const pots = { commonName: 'butterfly milkweed', method: 'outdoor-pot-winter' } as const;
const step = (kind: 'sow' | 'pot-up', date: string) => ({ kind, date, title: '', detail: '' });
const link = 'https://plants.larkfield.example/my-batches';

describe('season e-mails', () => {
  it('writes the frost night as each language does (CLDR via Intl)', () => {
    expect(mailDate('2027-04-27', 'en')).toBe('Tuesday, April 27');
    expect(mailDate('2027-04-27', 'es')).toBe('martes, 27 de abril');
  });

  it.each(MAIL_LANGUAGES)('a frost warning in %s names each batch, what to do and the link', (lang) => {
    const mail = frostWarningEmail(
      {
        name: 'Amara Reyes',
        organiser: 'Mara Ellsworth',
        groupName: 'Larkfield Commons Growers',
        night: '2027-04-27',
        batches: [pots],
        link,
      },
      lang,
    );
    expect(mail.subject).toContain('Larkfield Commons Growers');
    expect(mail.text).toContain('Butterfly milkweed: ');
    expect(mail.text).toContain(lang === 'es' ? 'cubre las macetas' : 'cover the pots');
    expect(mail.text).toContain(mailDate('2027-04-27', lang));
    expect(mail.text).toContain(link);
    expect(mail.html).toContain(`<html lang="${lang}">`);
  });

  it.each(MAIL_LANGUAGES)(
    'a weekly summary in %s gives each next step with its date, and says when a batch is behind',
    (lang) => {
      const batches: Pick<Batch, 'commonName' | 'nextStep' | 'behind'>[] = [
        // The batch's own words come in the mail's language (the service asks for them so).
        {
          commonName: 'wild bergamot',
          nextStep: step('sow', '2027-01-05'),
          behind: lang === 'es' ? 'Todavía sin sembrar.' : 'Not sown yet.',
        },
        { commonName: 'calico aster', nextStep: null, behind: null },
      ];
      const mail = weeklySummaryEmail(
        { name: 'Amara Reyes', groupName: 'Larkfield Commons Growers', batches, link },
        lang,
      );
      expect(mail.text).toContain(
        lang === 'es'
          ? `Wild bergamot: Sembrar, ${mailDate('2027-01-05', 'es')}.`
          : `Wild bergamot: Sow, ${mailDate('2027-01-05', 'en')}.`,
      );
      expect(mail.text).toContain(
        lang === 'es' ? 'Wild bergamot: Todavía sin sembrar.' : 'Wild bergamot: Not sown yet.',
      );
      expect(mail.text).toContain(lang === 'es' ? 'Calico aster: todos los pasos' : 'Calico aster: every step is done');
      expect(mail.html).not.toMatch(/<script|https?:\/\/(?!plants\.larkfield\.example)/); // nothing remote to load
    },
  );
});
