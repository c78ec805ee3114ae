/**
 * A yard mix on paper, in Debian's Chromium against the built app with demo data: a seven-species mix
 * for a sunny dry yard at ZIP 54665 (Vernon County, Wisconsin, ecoregion 52) prints to a Letter PDF
 * of at most two pages, and in print media no table cell is cut (seed weight included) and the table
 * fits the page's width. No request may leave localhost.
 */
import assert from 'node:assert/strict';
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { test } from 'node:test';
import { openGuardedPage, RESULTS_DIR } from './support/browser.js';
import { useAppInBrowser } from './support/app-in-browser.js';

const app = useAppInBrowser();

const SPECIES = 7;

/** Page objects in a PDF: `/Type /Page` but not the `/Type /Pages` tree node (PDF 32000-1 §7.7.3). */
function pdfPageCount(pdf: Buffer): number {
  return pdf.toString('latin1').match(/\/Type\s*\/Page(?!s)/g)?.length ?? 0;
}

test('a seven-species mix prints on at most two Letter pages with every column whole', async () => {
  const { page, offHostRequests, pageErrors, context } = await openGuardedPage(app.browser);
  try {
    await page.goto(`${app.server.baseUrl}/find-plants`);
    await page.getByRole('textbox', { name: 'ZIP code' }).fill('54665');
    await page.getByRole('button', { name: 'Find my ground' }).click();
    await page.getByText(/Vernon County, Wisconsin/).waitFor();
    const split = page.getByRole('radiogroup', { name: /more than one ecoregion/ });
    if (await split.isVisible()) await page.getByRole('radio', { name: /Driftless Area/ }).check();
    await page.getByRole('button', { name: 'Next: your yard' }).click();
    await page.getByRole('heading', { name: 'Step 2 of 3: your yard' }).waitFor();
    await page.getByRole('radio', { name: /^Full sun/ }).check();
    await page.getByRole('radio', { name: /^Dry/ }).check();
    await page.getByRole('textbox', { name: /Area to plant/ }).fill('200');
    await page.getByRole('radio', { name: /^Sometimes/ }).check();
    await page.getByRole('button', { name: 'Show my yard mix' }).click();
    await page.getByRole('table', { name: /one species a row/ }).waitFor();

    // Ask for seven species unless the mix already has seven (the button is then disabled).
    await page.locator('table tr[data-slug]').first().waitFor();
    if ((await page.locator('table tr[data-slug]').count()) !== SPECIES) {
      const size = page.getByRole('spinbutton', { name: 'Number of species' });
      await size.fill(String(SPECIES));
      await size.press('Enter');
      await page.getByRole('button', { name: `Use ${SPECIES} species` }).click();
    }
    await page.waitForFunction((n) => document.querySelectorAll('table tr[data-slug]').length === n, SPECIES);
    await page.locator('[aria-busy="false"][data-print-root="yard-mix"]').waitFor();
    // What the Print button does before printing: open every "why it fits" so it prints.
    await page.evaluate(() =>
      document
        .querySelectorAll<HTMLDetailsElement>('[data-print-root="yard-mix"] details')
        .forEach((d) => (d.open = true)),
    );

    await page.emulateMedia({ media: 'print' });
    await page.setViewportSize({ width: 816, height: 1056 }); // Letter at 96 px to the inch
    const table = page.getByRole('table', { name: /one species a row/ });
    const headers = await table
      .locator('thead th')
      .evaluateAll((ths) =>
        ths.filter((th) => getComputedStyle(th).display !== 'none').map((th) => th.textContent?.trim()),
      );
    assert.deepEqual(
      headers,
      ['Species', 'Role in the mix', 'Plants', 'Spacing', 'Seeds to sow', 'Seed weight'],
      'every column prints, the controls do not',
    );
    const cut = await table.locator('th, td').evaluateAll((cells) =>
      cells
        .filter((c) => getComputedStyle(c).display !== 'none')
        .filter((c) => c.scrollWidth > c.clientWidth + 1 || c.scrollHeight > c.clientHeight + 1)
        .map((c) => `${c.textContent?.slice(0, 40)} (${c.scrollWidth} > ${c.clientWidth} px)`),
    );
    assert.deepEqual(cut, [], 'no table cell is cut');
    const fit = await table.evaluate((t) => ({
      table: Math.ceil(t.getBoundingClientRect().right),
      page: document.documentElement.clientWidth,
      scroller: t.parentElement ? t.parentElement.scrollWidth - t.parentElement.clientWidth : 0,
    }));
    assert.ok(fit.table <= fit.page, `the table fits the page width (${fit.table} ≤ ${fit.page} px)`);
    assert.ok(fit.scroller <= 1, `the table does not scroll sideways on paper (${fit.scroller} px over)`);
    await page.screenshot({ path: path.join(RESULTS_DIR, 'yard-mix-print-media.png'), fullPage: true });
    await page.emulateMedia({ media: null });

    const pdf = await page.pdf({ format: 'Letter' });
    writeFileSync(path.join(RESULTS_DIR, 'yard-mix.pdf'), pdf);
    const pages = pdfPageCount(pdf);
    console.log(`a ${SPECIES}-species mix prints on ${pages} Letter page(s)`);
    assert.ok(pages >= 1 && pages <= 2, `a ${SPECIES}-species mix prints on one or two pages, not ${pages}`);

    assert.deepEqual(offHostRequests, [], 'no request may leave localhost');
    assert.deepEqual(pageErrors, []);
  } finally {
    await context.close();
  }
});

// The same yard opened by its link in each language (the es catalogues' words run longer than the
// English ones): still one or two Letter pages with every column whole.
const BY_LINK = [
  { name: 'English', locale: 'en-US', caption: /one species a row/, size: 'Number of species', use: 'Use' },
  { name: 'Spanish', locale: 'es-MX', caption: /una especie por fila/, size: 'Número de especies', use: 'Usar' },
] as const;

for (const language of BY_LINK) {
  test(`a seven-species mix opened by its link in ${language.name} prints on at most two Letter pages with every column whole`, async () => {
    const { page, offHostRequests, pageErrors, context } = await openGuardedPage(app.browser, undefined, {
      locale: language.locale,
    });
    try {
      await page.goto(
        `${app.server.baseUrl}/find-plants?state=WI&eco=52&sun=full&moisture=dry&area=200&unit=ft2&deer=medium`,
      );
      const table = page.getByRole('table', { name: language.caption });
      await table.waitFor();
      await page.locator('table tr[data-slug]').first().waitFor();
      if ((await page.locator('table tr[data-slug]').count()) !== SPECIES) {
        const size = page.getByRole('spinbutton', { name: language.size });
        await size.fill(String(SPECIES));
        await size.press('Enter');
        await page
          .getByRole('button', {
            name: `${language.use} ${SPECIES} ${language.locale === 'en-US' ? 'species' : 'especies'}`,
          })
          .click();
      }
      await page.waitForFunction((n) => document.querySelectorAll('table tr[data-slug]').length === n, SPECIES);
      await page.locator('[aria-busy="false"][data-print-root="yard-mix"]').waitFor();
      await page.evaluate(() =>
        document
          .querySelectorAll<HTMLDetailsElement>('[data-print-root="yard-mix"] details')
          .forEach((d) => (d.open = true)),
      );
      await page.emulateMedia({ media: 'print' });
      await page.setViewportSize({ width: 816, height: 1056 }); // Letter at 96 px to the inch
      const cut = await table.locator('th, td').evaluateAll((cells) =>
        cells
          .filter((c) => getComputedStyle(c).display !== 'none')
          .filter((c) => c.scrollWidth > c.clientWidth + 1 || c.scrollHeight > c.clientHeight + 1)
          .map((c) => `${c.textContent?.slice(0, 40)} (${c.scrollWidth} > ${c.clientWidth} px)`),
      );
      assert.deepEqual(cut, [], 'no table cell is cut');
      const height = await page.evaluate(() => document.documentElement.scrollHeight);
      console.log(`${language.name}: ${height} px tall in print media at Letter width`);
      await page.emulateMedia({ media: null });
      const pdf = await page.pdf({ format: 'Letter' });
      writeFileSync(path.join(RESULTS_DIR, `yard-mix-${language.locale}.pdf`), pdf);
      const pages = pdfPageCount(pdf);
      console.log(`a ${SPECIES}-species mix opened by its link in ${language.name} prints on ${pages} Letter page(s)`);
      assert.ok(
        pages >= 1 && pages <= 2,
        `a ${SPECIES}-species mix in ${language.name} prints on one or two pages, not ${pages}`,
      );
      assert.deepEqual(offHostRequests, [], 'no request may leave localhost');
      assert.deepEqual(pageErrors, []);
    } finally {
      await context.close();
    }
  });
}
