/**
 * Fact cards and pot labels in Debian's Chromium: eight catalogue species open from a link, their
 * cards print to a Letter PDF of exactly two pages (four cards a page), nothing is cut off, each QR
 * code decodes to the species page at the configured public address (PUBLIC_URL, not this local
 * server), the pot labels fit their labels, and no request leaves localhost.
 */
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { test } from 'node:test';
import type { Page } from 'playwright-core';
import { openGuardedPage, RESULTS_DIR, screenshot } from './support/browser.js';
import { useAppInBrowser } from './support/app-in-browser.js';

// Eight records of the demo catalogue (species-data/species/*.json), picked for variety: long
// cautions (Asclepias), warm-then-cold treatment (Actaea), a fern grown from spores (Adiantum).
const SLUGS = [
  'asclepias-tuberosa',
  'monarda-fistulosa',
  'zizia-aurea',
  'andropogon-gerardii',
  'aquilegia-canadensis',
  'amorpha-canescens',
  'actaea-racemosa',
  'adiantum-pedatum',
];

// The invented scenario's public address; the server itself runs on a free local port.
const PUBLIC_URL = 'https://plants.larkfield.example';
const app = useAppInBrowser({ PUBLIC_URL });

// jsQR is CommonJS whose module.exports is the decoder itself; its types describe a default export.
type QrReader = (data: Uint8ClampedArray, width: number, height: number) => { data: string } | null;
const jsQR = createRequire(import.meta.url)('jsqr') as QrReader;

/** What a phone reads from a drawn QR code: its picture as printed, decoded by jsQR. */
async function readQr(page: Page, index: number): Promise<string | null> {
  const qr = page.locator('svg[data-url]').nth(index);
  const png = (await qr.screenshot()).toString('base64');
  const { width, height, data } = await page.evaluate(async (b64) => {
    const img = new Image();
    img.src = `data:image/png;base64,${b64}`;
    await img.decode();
    const canvas = document.createElement('canvas');
    canvas.width = img.naturalWidth;
    canvas.height = img.naturalHeight;
    const ctx = canvas.getContext('2d')!;
    ctx.drawImage(img, 0, 0);
    const pixels = ctx.getImageData(0, 0, canvas.width, canvas.height);
    return { width: pixels.width, height: pixels.height, data: Array.from(pixels.data) };
  }, png);
  return jsQR(Uint8ClampedArray.from(data), width, height)?.data ?? null;
}

/** Page objects in a PDF: `/Type /Page` but not the `/Type /Pages` tree node (PDF 32000-1 §7.7.3). */
function pdfPageCount(pdf: Buffer): number {
  return pdf.toString('latin1').match(/\/Type\s*\/Page(?!s)/g)?.length ?? 0;
}

async function waitForCards(page: Page, count: number) {
  const preview = page.getByRole('region', { name: 'Fact cards as they will print' });
  await preview
    .getByRole('article')
    .nth(count - 1)
    .waitFor();
  await preview
    .locator('svg[data-url]')
    .nth(count - 1)
    .waitFor();
  await page.evaluate(() => document.fonts.ready);
  return preview;
}

test('eight species print as two Letter pages of fact cards, with working QR links and pot labels', async () => {
  for (const slug of SLUGS)
    assert.equal(
      (await fetch(`${app.server.baseUrl}/api/species/${slug}`)).status,
      200,
      `${slug} is in the demo catalogue`,
    );

  const { page, offHostRequests, pageErrors, context } = await openGuardedPage(app.browser);
  try {
    await page.goto(`${app.server.baseUrl}/cards-and-labels?species=${SLUGS.join(',')}`);
    const preview = await waitForCards(page, SLUGS.length);
    await page.getByText('8 fact cards on 2 pages').waitFor();
    assert.equal(await preview.getByRole('group', { name: /^Page \d of 2$/ }).count(), 2);

    // Until the site's answer arrives a code may point at this page's own origin; then it moves.
    await preview
      .locator(`svg[data-url^="${PUBLIC_URL}/"]`)
      .nth(SLUGS.length - 1)
      .waitFor();
    const urls = await preview
      .locator('svg[data-url]')
      .evaluateAll((svgs) => svgs.map((s) => s.getAttribute('data-url')));
    assert.deepEqual(
      urls,
      SLUGS.map((s) => `${PUBLIC_URL}/species/${s}`),
    );
    assert.equal(await readQr(page, 0), `${PUBLIC_URL}/species/${SLUGS[0]}`, 'the printed code itself says so');
    await screenshot(page, 'cards-preview');

    // On paper: nothing but the sheets, and no card's words cut off at its edge.
    await page.emulateMedia({ media: 'print' });
    const overflow = await preview
      .getByRole('article')
      .evaluateAll((cards) =>
        cards
          .filter((c) => c.scrollHeight > c.clientHeight + 1)
          .map(
            (c) =>
              `${c.querySelector('h3')?.textContent} (${c.scrollHeight} > ${c.clientHeight} px, shrink step ${c.getAttribute('data-fit')})`,
          ),
      );
    assert.deepEqual(overflow, [], 'every fact card fits its quarter page');
    const shellHidden = await page.evaluate(() => getComputedStyle(document.querySelector('header')!).display);
    assert.equal(shellHidden, 'none', 'the top bar does not print');
    await page
      .locator('.hg-sheet')
      .first()
      .screenshot({ path: path.join(RESULTS_DIR, 'fact-cards-print-page-1.png') });
    // Back to no emulation: page.pdf() prints with print media unless screen is forced.
    await page.emulateMedia({ media: null });

    const pdf = await page.pdf({ format: 'Letter', printBackground: true });
    const pdfFile = path.join(RESULTS_DIR, 'fact-cards.pdf');
    writeFileSync(pdfFile, pdf);
    assert.equal(pdfPageCount(pdf), 2, 'eight cards at four a page make two pages');
    // A picture of the PDF itself, when poppler-utils happens to be installed (the test does not need it).
    spawnSync('pdftoppm', [
      '-png',
      '-r',
      '60',
      '-f',
      '1',
      '-l',
      '1',
      '-singlefile',
      pdfFile,
      path.join(RESULTS_DIR, 'fact-cards-page-1'),
    ]);

    // A4 keeps four cards a page.
    await page.getByRole('radio', { name: /A4/ }).check();
    await waitForCards(page, SLUGS.length);
    assert.equal(pdfPageCount(await page.pdf({ format: 'A4', printBackground: true })), 2, 'A4: two pages too');

    await page.getByRole('button', { name: 'Pot labels' }).click();
    await page.getByRole('radio', { name: /US Letter/ }).check();
    const labels = page.getByRole('region', { name: 'Pot labels as they will print' }).getByTestId('pot-label');
    await labels.nth(SLUGS.length - 1).waitFor();
    assert.match(
      await labels.first().innerText(),
      /Butterfly milkweed[\s\S]*Sown [A-Z][a-z]{2} \d{1,2}, \d{4}[\s\S]*full sun\/part shade · dry\/medium-moist[\s\S]*12–30 in \(30–75 cm\) tall[\s\S]*CMS 30 d/,
    );
    // On paper no label's lines are cut: every line fits the label's height and width.
    await page.emulateMedia({ media: 'print' });
    const cut = await labels.evaluateAll((all) =>
      all.flatMap((label) => [
        ...(label.scrollHeight > label.clientHeight + 1 ? [`${label.textContent} (too tall)`] : []),
        ...[...label.querySelectorAll('p')]
          .filter((p) => p.scrollWidth > p.clientWidth + 1)
          .map((p) => `${p.textContent} (too wide)`),
      ]),
    );
    await page.emulateMedia({ media: null });
    assert.deepEqual(cut, [], 'every pot label line fits');
    await screenshot(page, 'pot-labels');
    const labelPdf = await page.pdf({ format: 'Letter', printBackground: true });
    writeFileSync(path.join(RESULTS_DIR, 'pot-labels.pdf'), labelPdf);
    assert.equal(pdfPageCount(labelPdf), 1, 'eight labels fit one page of thirty');

    // The print stylesheet stays loaded after leaving, but another page still prints as itself.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Species' }).click();
    await page.waitForURL(`${app.server.baseUrl}/species`);
    await page.getByRole('heading', { level: 1 }).waitFor();
    await page.emulateMedia({ media: 'print' });
    assert.notEqual(
      await page.getByRole('heading', { level: 1 }).evaluate((h) => getComputedStyle(h).display),
      'none',
      'other pages still print',
    );
    await page.emulateMedia({ media: null });

    assert.deepEqual(offHostRequests, [], 'no request may leave localhost');
    assert.deepEqual(pageErrors, []);
  } finally {
    await context.close();
  }
});

test('at phone width the preview shrinks to fit without sideways scrolling', async () => {
  const { page, offHostRequests, context } = await openGuardedPage(app.browser, { width: 360, height: 780 });
  try {
    await page.goto(`${app.server.baseUrl}/cards-and-labels?species=${SLUGS.slice(0, 2).join(',')}`);
    await waitForCards(page, 2);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    assert.ok(overflow <= 1, `no sideways scrolling at 360 px (overflow ${overflow}px)`);
    await screenshot(page, 'cards-phone');
    assert.deepEqual(offHostRequests, []);
  } finally {
    await context.close();
  }
});
