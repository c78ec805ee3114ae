/**
 * The species browser and a species page as a person meets them in Debian's Chromium: a
 * typo-tolerant search, the result in the table, its page with cautions and germination guidance,
 * the back button keeping the search, the phone layout, and no request to any host but localhost.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { openGuardedPage, screenshot } from './support/browser.js';
import { useAppInBrowser } from './support/app-in-browser.js';

const app = useAppInBrowser();

// "buterfly weed" (one t) must find butterfly milkweed, Asclepias tuberosa: its record lists
// "butterfly weed" among its common names (species-data/species/asclepias-tuberosa.json).
test('a misspelt search finds butterfly milkweed, and its page shows cautions and germination', async () => {
  const { page, offHostRequests, pageErrors, context } = await openGuardedPage(app.browser);
  try {
    await page.goto(`${app.server.baseUrl}/species`);
    await page.getByRole('table').waitFor();
    await page.getByRole('searchbox', { name: 'Search by name' }).fill('buterfly weed');
    await page.waitForURL(/\?q=buterfly\+weed$/);
    const row = page.getByRole('row', { name: /butterfly milkweed/ });
    await row.waitFor();
    await row.getByText('Asclepias tuberosa').waitFor();
    await page.getByRole('heading', { level: 2, name: /species match “buterfly weed”/ }).waitFor();
    await screenshot(page, 'species-browser-search');

    await row.getByRole('link', { name: 'butterfly milkweed' }).click();
    await page.waitForURL(`${app.server.baseUrl}/species/asclepias-tuberosa`);
    await page.getByRole('heading', { level: 1, name: 'Butterfly milkweed' }).waitFor();
    const cautions = page.getByRole('region', { name: 'Cautions' });
    await cautions.getByText(/Milky sap/).waitFor();
    assert.ok(await cautions.isVisible(), 'the cautions section is visible');
    const seed = page.getByRole('region', { name: 'Growing from seed' });
    await seed.getByText(/Cold-moist stratification, \d+ days/).waitFor();
    assert.ok(await seed.isVisible(), 'the germination section is visible');
    await page.getByRole('link', { name: 'Make fact card' }).waitFor();
    await screenshot(page, 'species-detail');

    // Back returns to the same search, so a filtered view survives a visit to a species.
    await page.goBack();
    await page.waitForURL(/\?q=buterfly\+weed$/);
    assert.equal(await page.getByRole('searchbox', { name: 'Search by name' }).inputValue(), 'buterfly weed');
    await page.getByRole('row', { name: /butterfly milkweed/ }).waitFor();

    assert.deepEqual(offHostRequests, [], 'no request may leave localhost');
    assert.deepEqual(pageErrors, []);
  } finally {
    await context.close();
  }
});

test('a shared filtered link applies its filters, and an unknown species says so', async () => {
  const { page, offHostRequests, context } = await openGuardedPage(app.browser);
  try {
    await page.goto(`${app.server.baseUrl}/species?state=WI&ecoregion=52&monarchHost=true`);
    await page.getByRole('table').waitFor();
    assert.equal(await page.getByRole('combobox', { name: 'Native to' }).inputValue(), 'WI');
    assert.equal(await page.getByRole('checkbox', { name: 'Monarch caterpillar host plants only' }).isChecked(), true);
    // Every row listed is a monarch host: the Monarch host column reads "Yes" throughout.
    const monarch = await page.getByRole('table').evaluate((table) => {
      const headers = [...table.querySelectorAll('thead th')].map((th) => th.textContent?.trim());
      const column = headers.indexOf('Monarch host');
      return [...table.querySelectorAll('tbody tr')].map((tr) => tr.children[column]?.textContent?.trim());
    });
    assert.ok(monarch.length > 0, 'some Wisconsin monarch hosts are listed');
    assert.ok(
      monarch.every((cell) => cell === 'Yes'),
      `every row is a monarch host: ${monarch.join(', ')}`,
    );

    await page.goto(`${app.server.baseUrl}/species/no-such-plant`);
    await page.getByRole('heading', { level: 1, name: 'Species not found' }).waitFor();
    assert.deepEqual(offHostRequests, []);
  } finally {
    await context.close();
  }
});

test('the browser fits a 360 px phone: filters fold away and only the table scrolls sideways', async () => {
  const { page, offHostRequests, pageErrors, context } = await openGuardedPage(app.browser, {
    width: 360,
    height: 780,
  });
  try {
    await page.goto(`${app.server.baseUrl}/species`);
    await page.getByRole('table').waitFor();
    const filters = page.getByRole('button', { name: /^Filters/ });
    await filters.waitFor();
    assert.equal(
      await page.getByRole('combobox', { name: 'Native to' }).isVisible(),
      false,
      'filters start folded on a phone',
    );
    await filters.click();
    await page.getByRole('combobox', { name: 'Native to' }).waitFor();
    await page.getByRole('button', { name: 'Hide filters' }).click();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    assert.ok(overflow <= 1, `no sideways page scrolling at 360 px (overflow ${overflow}px)`);
    await screenshot(page, 'species-browser-phone');

    await page.goto(`${app.server.baseUrl}/species/asclepias-tuberosa`);
    await page.getByRole('heading', { level: 1, name: 'Butterfly milkweed' }).waitFor();
    const detailOverflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    assert.ok(detailOverflow <= 1, `species page fits 360 px (overflow ${detailOverflow}px)`);
    await screenshot(page, 'species-detail-phone');
    assert.deepEqual(offHostRequests, []);
    assert.deepEqual(pageErrors, []);
  } finally {
    await context.close();
  }
});
