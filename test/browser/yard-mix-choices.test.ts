/**
 * The person's own changes to a yard mix stick, in Debian's Chromium against the built app: keep a
 * species, swap another, add one by name, then rebalance; the kept, swapped-in and added species
 * are still there and the swapped-out one is not. A sunny medium 200 ft² bed in the Driftless Area
 * (EPA Level III ecoregion 52, Wisconsin). No request may leave localhost.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import type { Page } from 'playwright-core';
import { openGuardedPage, screenshot } from './support/browser.js';
import { useAppInBrowser } from './support/app-in-browser.js';

const app = useAppInBrowser();

const PLAN = '/find-plants?state=WI&eco=52&sun=full&moisture=medium&area=200&unit=ft2&deer=medium&goals=pollinators';

async function mixSlugs(page: Page): Promise<string[]> {
  await page.getByRole('table', { name: /one species a row/ }).waitFor();
  return page.locator('table tr[data-slug]').evaluateAll((rows) => rows.map((r) => r.getAttribute('data-slug') ?? ''));
}

/** Waits until the table holds a species (or stops holding one). */
async function waitForRow(page: Page, slug: string, present = true) {
  await page.waitForFunction(
    ([s, want]) => (document.querySelector(`table tr[data-slug="${s}"]`) !== null) === want,
    [slug, present] as const,
    { timeout: 15_000 },
  );
}

const nameOf = (page: Page, slug: string) => page.locator(`table tr[data-slug="${slug}"] th span`).first().innerText();

test('keep, swap and add stay through a rebalance', async () => {
  const { page, offHostRequests, pageErrors, context } = await openGuardedPage(app.browser);
  try {
    await page.goto(`${app.server.baseUrl}${PLAN}`);
    const first = await mixSlugs(page);
    assert.ok(first.length >= 5, 'a mix of several species');

    // Keep the first species.
    const kept = first[0];
    const keptName = (await nameOf(page, kept)).trim();
    await page.getByRole('button', { name: `Keep ${keptName}` }).click();

    // Swap the second for the first alternative offered.
    const out = first[1];
    const outName = (await nameOf(page, out)).trim();
    await page.getByRole('button', { name: `Swap ${outName}` }).click();
    const alternatives = page.getByRole('list', { name: `Alternatives for ${outName}` });
    await alternatives.waitFor();
    const use = alternatives.getByRole('button', { name: /^Use / }).first();
    const inName = (await use.innerText()).replace(/^Use /, '').trim();
    await use.click();
    await waitForRow(page, out, false);
    const afterSwap = await mixSlugs(page);
    const swappedIn = afterSwap.find((s) => !first.includes(s));
    assert.ok(swappedIn, `the swap brought in ${inName}`);

    // Add a species by name (prairie smoke: a Wisconsin wildflower of dry prairies, catalogue record).
    await page.getByRole('textbox', { name: 'Add a species by name' }).fill('prairie smoke');
    await page
      .getByRole('list', { name: 'Species to add' })
      .getByRole('button', { name: /^Add prairie smoke/i })
      .first()
      .click();
    await waitForRow(page, 'geum-triflorum');

    await page.getByRole('button', { name: 'Rebalance' }).click();
    await page.waitForFunction(() => !document.querySelector('[aria-busy="true"]'), undefined, { timeout: 15_000 });
    await waitForRow(page, 'geum-triflorum');
    const final = await mixSlugs(page);
    await screenshot(page, 'yard-mix-choices');
    assert.ok(final.includes(kept), `${keptName} was kept`);
    assert.ok(final.includes(swappedIn as string), `${inName} stayed after the rebalance`);
    assert.ok(final.includes('geum-triflorum'), 'the added species stayed');
    assert.ok(!final.includes(out), `${outName} stayed out`);
    assert.match(await page.getByTestId('total-footprint').innerText(), /The plants take .+ of your 200 ft²/);
    assert.deepEqual(pageErrors, []);
    assert.deepEqual(offHostRequests, []);
  } finally {
    await context.close();
  }
});
