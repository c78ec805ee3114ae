/**
 * The organiser's season page in Debian's Chromium: the demo organiser opens Season from the
 * navigation and sees the demo season's targets and seed list as the API answers them, at desktop
 * width and at a 390 px phone width (tables scroll sideways inside their card, never the page), and
 * no request leaves localhost.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import type { Page } from 'playwright-core';
import { openGuardedPage, screenshot } from './support/browser.js';
import { useAppInBrowser } from './support/app-in-browser.js';

const app = useAppInBrowser();
const GROUP = 'larkfield-commons-growers';

interface SeasonAnswer {
  year: number;
  targets: { slug: string; commonName: string }[];
}

/** The demo season as the API answers the organiser (README "Demo sign-ins"). */
async function demoSeason(): Promise<SeasonAnswer> {
  const login = await fetch(`${app.server.baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'mara.ellsworth@example.org', password: 'larkfield-mara' }),
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  const res = await fetch(`${app.server.baseUrl}/api/groups/${GROUP}/season`, {
    headers: { Authorization: `Bearer ${accessToken}` },
  });
  assert.equal(res.status, 200);
  return (await res.json()) as SeasonAnswer;
}

/** Rows of a table inside the named scrolling region, header and totals left out. */
async function bodyRowTexts(page: Page, region: string): Promise<string[]> {
  return page
    .getByRole('region', { name: region })
    .locator('tbody tr')
    .evaluateAll((rows) => rows.map((r) => r.textContent ?? ''));
}

test('the demo organiser sees the season targets and seed list at desktop and phone width', async () => {
  const season = await demoSeason();
  assert.ok(season.targets.length >= 10, 'the demo season has about a dozen targets');

  const { page, offHostRequests, pageErrors } = await openGuardedPage(app.browser);
  try {
    await page.goto(`${app.server.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill('mara.ellsworth@example.org');
    await page.getByLabel('Password').fill('larkfield-mara');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('button', { name: /Your account: Mara Ellsworth/ }).waitFor();
    await page.getByRole('link', { name: 'Season' }).first().click();

    await page.getByRole('heading', { level: 1, name: `Season plan ${season.year}` }).waitFor();
    await page.getByRole('region', { name: 'Seed list table' }).waitFor();
    const targets = await bodyRowTexts(page, 'Targets table');
    assert.equal(targets.length, season.targets.length);
    season.targets.forEach((t, i) => assert.ok(targets[i].includes(t.commonName), `${t.commonName} is row ${i + 1}`));
    for (const t of season.targets) {
      assert.equal(
        await page.getByRole('textbox', { name: `Target plants of ${t.commonName}` }).count(),
        1,
        `${t.commonName} has its own target input`,
      );
    }
    // One seed-list row per target plus the totals row.
    const seeds = await bodyRowTexts(page, 'Seed list table');
    assert.equal(seeds.length, season.targets.length + 1);
    await page.getByText(/landowner's permission/).waitFor();
    await page.getByText(/Dry potting mix is dusty/).waitFor();
    await screenshot(page, 'season-desktop');

    await page.setViewportSize({ width: 390, height: 844 });
    await page.getByRole('heading', { level: 1, name: `Season plan ${season.year}` }).waitFor();
    const widths = await page.evaluate(() => {
      const seedTable = document.querySelector('[aria-label="Seed list table"]') as HTMLElement;
      return {
        page: document.documentElement.scrollWidth,
        viewport: window.innerWidth,
        tableScroll: seedTable.scrollWidth,
        tableBox: seedTable.clientWidth,
      };
    });
    assert.ok(widths.page <= widths.viewport, `the page does not scroll sideways (${widths.page} px)`);
    assert.ok(widths.tableScroll > widths.tableBox, 'the seed list scrolls sideways inside its card');
    await screenshot(page, 'season-phone-390');

    // Print: only the seed list, black on white.
    await page.emulateMedia({ media: 'print' });
    assert.equal(await page.getByRole('region', { name: 'Targets table' }).isVisible(), false);
    assert.equal(await page.getByRole('region', { name: 'Seed list table' }).isVisible(), true);
    const colour = await page
      .getByRole('region', { name: 'Seed list table' })
      .locator('td')
      .first()
      .evaluate((td) => getComputedStyle(td).color);
    assert.equal(colour, 'rgb(0, 0, 0)');

    assert.deepEqual(offHostRequests, [], 'no request may leave localhost');
    assert.deepEqual(pageErrors, []);
  } finally {
    await page.context().close();
  }
});
