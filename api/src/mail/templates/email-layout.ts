import type { WordLocale } from '@homeground/shared';
import { apiWords } from '../../common/i18n/api-i18n.js';

/** One e-mail in Homeground's voice: a greeting, a few short paragraphs, at most one link to act on. */
export interface EmailContent {
  /** The reader's language: the HTML's `lang` and the layout's own words. English when not given. */
  locale?: WordLocale;
  greeting: string;
  paragraphs: string[];
  action?: { label: string; url: string };
  /** Small print under the sign-off: why the reader got this, how to stop it. */
  footer: string;
  /** The language of the words (BCP 47), for the HTML's `lang`; English when not given. */
  lang?: string;
}

const escapeHtml = (s: string) =>
  s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');

/**
 * Plain text first (many growers read mail on a phone or in a text-only client), and a simple HTML
 * version with the same words: one column, system fonts, no images or remote resources to load.
 */
export function renderEmail(content: EmailContent): { text: string; html: string } {
  const locale = content.locale ?? 'en';
  const say = apiWords(locale);
  const text = [
    content.greeting,
    '',
    ...content.paragraphs.flatMap((p) => [p, '']),
    ...(content.action ? [`${content.action.label}: ${content.action.url}`, ''] : []),
    '— Homeground',
    '',
    content.footer,
  ].join('\n');
  const paragraphs = content.paragraphs.map((p) => `<p style="margin:0 0 14px">${escapeHtml(p)}</p>`).join('\n');
  const action = content.action
    ? `<p style="margin:20px 0"><a href="${escapeHtml(content.action.url)}" style="background:#3F6B3A;color:#ffffff;padding:10px 18px;border-radius:6px;text-decoration:none;display:inline-block">${escapeHtml(content.action.label)}</a></p>
<p style="margin:0 0 14px;font-size:13px;color:#5B4636">${escapeHtml(say('mail.openAddress', { url: content.action.url }))}</p>`
    : '';
  const html = `<!doctype html>
<html lang="${escapeHtml(content.lang ?? locale)}"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"></head>
<body style="margin:0;padding:24px;background:#FAF7F0;font-family:Georgia,'Times New Roman',serif;color:#1b1b1b">
<div style="max-width:560px;margin:0 auto;background:#ffffff;border-radius:8px;padding:24px;font-family:Arial,Helvetica,sans-serif;font-size:16px;line-height:1.5">
<p style="margin:0 0 14px">${escapeHtml(content.greeting)}</p>
${paragraphs}
${action}
<p style="margin:20px 0 0">— Homeground</p>
<p style="margin:16px 0 0;font-size:13px;color:#5B4636">${escapeHtml(content.footer)}</p>
</div></body></html>`;
  return { text, html };
}
