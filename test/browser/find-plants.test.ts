/**
 * Find plants as a new visitor meets it, in Debian's Chromium against the built app with demo data:
 * ZIP 54665 (Viroqua, Wisconsin: Vernon County, EPA Level III ecoregion 52, the Driftless Area, as
 * the place lookup's county crosswalk answers it), then a shady wet yard and a sunny dry yard, each
 * with its mix and the CP42 bloom-period rules (CP42-IN: at least 3 species in flower in each of the
 * early, mid and late periods) met or, where the catalogue cannot, reported as unmet in words.
 * Also prints the home page's first contentful paint. No request may leave localhost.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import type { Page } from 'playwright-core';
import { openGuardedPage, screenshot } from './support/browser.js';
import { useAppInBrowser } from './support/app-in-browser.js';

const app = useAppInBrowser();

const CP42_PERIODS = ['cp42-early', 'cp42-mid', 'cp42-late'];

async function answerYard(page: Page, sun: RegExp, moisture: RegExp) {
  await page.getByRole('heading', { name: 'Step 2 of 3: your yard' }).waitFor();
  await page.getByRole('radio', { name: sun }).check();
  await page.getByRole('radio', { name: moisture }).check();
  await page.getByRole('textbox', { name: /Area to plant/ }).fill('200');
  await page.getByRole('radio', { name: /^Sometimes/ }).check();
  await page.getByRole('button', { name: 'Show my yard mix' }).click();
}

/** The mix's species (from the table rows) and the three CP42 period rules as the page shows them. */
async function readMix(page: Page) {
  await page.getByRole('table', { name: /one species a row/ }).waitFor();
  await page.getByRole('list', { name: 'How this mix is balanced' }).waitFor();
  const slugs = await page
    .locator('table tr[data-slug]')
    .evaluateAll((rows) => rows.map((r) => r.getAttribute('data-slug') ?? ''));
  const rules = await page.locator('[data-constraint]').evaluateAll((items) =>
    items.map((li) => ({
      id: li.getAttribute('data-constraint') ?? '',
      status: li.getAttribute('data-status') ?? '',
      text: li.textContent ?? '',
    })),
  );
  return { slugs, cp42: rules.filter((r) => CP42_PERIODS.includes(r.id)) };
}

/** Each CP42 period rule is met, or, when the catalogue cannot meet it, says so in words. */
function assertBloomRules(cp42: { id: string; status: string; text: string }[], label: string) {
  assert.equal(cp42.length, 3, `${label}: the three CP42 period rules are listed`);
  for (const rule of cp42) {
    if (rule.status === 'met') {
      assert.match(
        rule.text,
        /^Met: (Spring|Early summer|Late summer and fall) \(.+\): at least 3 species in flower every month/,
        `${label} ${rule.id}`,
      );
    } else {
      assert.equal(rule.status, 'unmet', `${label} ${rule.id} applies`);
      assert.match(
        rule.text,
        /^Not met: (Spring|Early summer|Late summer and fall) \(.+\): at least 3 species in flower.+\S{10,}/,
        `${label} ${rule.id} unmet, with why in words`,
      );
      console.log(`${label}: ${rule.id} not met: ${rule.text}`);
    }
  }
}

test('home page first contentful paint', async () => {
  const { page, offHostRequests, context } = await openGuardedPage(app.browser);
  try {
    await page.goto(`${app.server.baseUrl}/`);
    await page.getByRole('heading', { level: 1 }).waitFor();
    const fcp = await page.evaluate(
      () => performance.getEntriesByType('paint').find((e) => e.name === 'first-contentful-paint')?.startTime ?? -1,
    );
    console.log(`home page first-contentful-paint: ${fcp.toFixed(0)} ms`);
    assert.ok(fcp > 0, 'the browser reports a first contentful paint');
    assert.deepEqual(offHostRequests, []);
  } finally {
    await context.close();
  }
});

test('a new visitor finds their ground by ZIP and gets a different mix for a shady wet yard and a sunny dry one', async () => {
  const { page, offHostRequests, pageErrors, context } = await openGuardedPage(app.browser);
  try {
    await page.goto(`${app.server.baseUrl}/find-plants`);
    await page.getByRole('textbox', { name: 'ZIP code' }).fill('54665');
    await page.getByRole('button', { name: 'Find my ground' }).click();
    await page.getByText(/Vernon County, Wisconsin/).waitFor();
    const split = page.getByRole('radiogroup', { name: /more than one ecoregion/ });
    if (await split.isVisible()) await page.getByRole('radio', { name: /Driftless Area/ }).check();
    await page.getByText('Ecoregion: Driftless Area (52)').waitFor();
    await page.locator('svg[role="img"] path').first().waitFor();
    await screenshot(page, 'find-plants-ground');
    await page.getByRole('button', { name: 'Next: your yard' }).click();

    await answerYard(page, /^Shade/, /^Wet/);
    const shade = await readMix(page);
    assert.ok(shade.slugs.length >= 3, `a shady wet mix has species: ${shade.slugs.join(', ')}`);
    assertBloomRules(shade.cp42, 'shade, wet');
    await page.getByRole('table', { name: /bloom chart/i }).waitFor();
    assert.match(await page.getByTestId('bloom-gap-summary').innerText(), /gap/);
    await screenshot(page, 'yard-mix-shade-wet');

    await page.getByRole('button', { name: 'Change your yard' }).click();
    await answerYard(page, /^Full sun/, /^Dry/);
    await page.waitForURL(/sun=full/);
    await page.waitForFunction((before) => {
      const rows = [...document.querySelectorAll('table tr[data-slug]')].map((r) => r.getAttribute('data-slug'));
      return rows.length > 0 && rows.join(',') !== before;
    }, shade.slugs.join(','));
    const sun = await readMix(page);
    assert.notDeepEqual([...sun.slugs].sort(), [...shade.slugs].sort(), 'a sunny dry yard gets a different mix');
    assertBloomRules(sun.cp42, 'sun, dry');
    await screenshot(page, 'yard-mix-sun-dry');

    // Swap one species through the live alternatives endpoint; the mix changes and keeps its size.
    await page
      .getByRole('button', { name: /^Swap / })
      .first()
      .click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('button', { name: /^Use / }).first().click();
    await page.waitForFunction((before) => {
      const rows = [...document.querySelectorAll('table tr[data-slug]')].map((r) => r.getAttribute('data-slug'));
      return rows.length > 0 && rows.join(',') !== before;
    }, sun.slugs.join(','));
    const swapped = await readMix(page);
    assert.equal(swapped.slugs.length, sun.slugs.length);
    assert.ok(!swapped.slugs.includes(sun.slugs[0]), 'the swapped-out species is gone');

    assert.deepEqual(offHostRequests, [], 'no request may leave localhost');
    assert.deepEqual(pageErrors, []);

    // The page's own URL is its share link: at phone width it reopens the same mix.
    const shareUrl = page.url();
    const phone = await openGuardedPage(app.browser, { width: 360, height: 780 });
    try {
      await phone.page.goto(shareUrl);
      await phone.page.getByRole('list', { name: /one card a species/ }).waitFor();
      const phoneSlugs = await phone.page
        .locator('li[data-slug]')
        .evaluateAll((items) => items.map((i) => i.getAttribute('data-slug') ?? ''));
      assert.deepEqual(phoneSlugs, swapped.slugs, 'the shared link shows the same mix');
      await screenshot(phone.page, 'yard-mix-phone');
      const overflow = await phone.page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      if (overflow > 1) {
        const wide = await phone.page.evaluate(() =>
          [...document.querySelectorAll('body *')]
            .filter(
              (el) =>
                el.getBoundingClientRect().right > window.innerWidth + 1 &&
                !el.closest('[tabindex="0"], [data-scroll]'),
            )
            .slice(0, 8)
            .map((el) => `${el.tagName}.${el.className} ${Math.round(el.getBoundingClientRect().right)}`),
        );
        console.log(wide.join('\n'));
      }
      assert.ok(overflow <= 1, `no sideways scrolling at 360 px (overflow ${overflow}px)`);
      assert.deepEqual(phone.offHostRequests, []);
      assert.deepEqual(phone.pageErrors, []);
    } finally {
      await phone.context.close();
    }
  } finally {
    await context.close();
  }
});
