/**
 * WCAG 2.2 AA, checked with axe-core (the wcag2a, wcag2aa, wcag21a, wcag21aa and wcag22aa rules) in
 * Debian's Chromium against the built app with demo data, on every page and state a visitor, a member
 * and the demo organiser reach, in English and in Spanish (chosen by the browser's language, as a
 * first visit would be). Any serious or critical finding fails; every finding is printed per page.
 * Also: `<html lang>` follows the language (SC 3.1.1), focus goes back to the Swap button when its
 * dialog closes (SC 2.4.3), and no request leaves localhost.
 */
import assert from 'node:assert/strict';
import { after, test } from 'node:test';
import type { Page } from 'playwright-core';
import { blocking, describeFindings, runAxe } from './support/axe.js';
import { openGuardedPage, screenshot } from './support/browser.js';
import { useAppInBrowser } from './support/app-in-browser.js';

const app = useAppInBrowser();

/** A sunny medium 200 ft² bed in the Driftless Area (EPA Level III ecoregion 52, Wisconsin). */
const PLAN = '/find-plants?state=WI&eco=52&sun=full&moisture=medium&area=200&unit=ft2&deer=medium&goals=pollinators';
const GROUP = 'larkfield-commons-growers';

/** The few words the journey clicks, in each language (this project's catalogues, web/src/locales). */
const LANGUAGES = [
  {
    name: 'English',
    browser: 'en-US',
    htmlLang: 'en-US',
    zip: 'ZIP code',
    findGround: 'Find my ground',
    next: 'Next: your yard',
    labelsTab: 'Pot labels',
    swap: /^Swap /,
  },
  {
    name: 'Spanish',
    browser: 'es-MX',
    htmlLang: 'es-US',
    zip: 'Código postal (ZIP)',
    findGround: 'Encontrar mi terreno',
    next: 'Siguiente: tu jardín',
    labelsTab: 'Etiquetas para macetas',
    swap: /^Cambiar .+ por otra$/,
  },
] as const;

const summary: string[] = [];
after(() => {
  console.log(`axe-core findings (WCAG 2.2 A/AA rules), per page and state:\n${summary.join('\n')}`);
});

async function demoToken(email: string, password: string): Promise<string> {
  const res = await fetch(`${app.server.baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  assert.ok(res.ok, `demo sign-in for ${email}: ${res.status}`);
  return ((await res.json()) as { accessToken: string }).accessToken;
}

for (const language of LANGUAGES) {
  test(`every page and state meets WCAG 2.2 AA in axe-core, in ${language.name}`, async () => {
    const { page, context, offHostRequests, pageErrors } = await openGuardedPage(
      app.browser,
      { width: 1280, height: 900 },
      { locale: language.browser },
    );
    const failures: string[] = [];
    const check = async (state: string) => {
      const findings = await runAxe(page);
      const serious = blocking(findings);
      summary.push(
        `${language.name.padEnd(8)} ${state.padEnd(34)} ${serious.length} serious/critical, ${findings.length} in all` +
          (findings.length ? `\n${describeFindings(findings).replace(/^/gm, '    ')}` : ''),
      );
      if (serious.length > 0) failures.push(`${state}:\n${describeFindings(serious)}`);
    };
    const open = async (path: string, ready: (p: Page) => Promise<unknown>) => {
      await page.goto(`${app.server.baseUrl}${path}`);
      await ready(page);
      // Fonts and lazy chunks settle before axe measures contrast and names.
      await page.waitForLoadState('networkidle');
    };
    try {
      await open('/', (p) => p.getByRole('heading', { level: 1 }).waitFor());
      assert.equal(await page.evaluate(() => document.documentElement.lang), language.htmlLang);
      await check('home');

      await open('/find-plants', (p) => p.getByRole('textbox', { name: language.zip }).waitFor());
      await check('your ground');
      await page.getByRole('textbox', { name: language.zip }).fill('54665');
      await page.getByRole('button', { name: language.findGround }).click();
      await page.getByRole('button', { name: language.next }).waitFor();
      await check('your ground, found by ZIP');

      await open(PLAN, (p) => p.locator('table tr[data-slug]').first().waitFor());
      await check('yard mix with results');
      const swap = page.getByRole('button', { name: language.swap }).first();
      const swapName = await swap.getAttribute('aria-label');
      await swap.click();
      await page.getByRole('dialog').waitFor();
      await page.getByRole('dialog').getByRole('list').first().waitFor();
      await check('yard mix, swap dialog open');
      await page.keyboard.press('Escape');
      await page.getByRole('dialog').waitFor({ state: 'detached' });
      assert.equal(
        await page.evaluate(
          () => document.activeElement?.getAttribute('aria-label') ?? document.activeElement?.tagName,
        ),
        swapName,
        'focus returns to the Swap button that opened the dialog',
      );

      await open('/species', (p) => p.locator('table tbody tr').first().waitFor());
      await check('species list');
      await open('/species/asclepias-tuberosa', (p) => p.getByRole('heading', { level: 1 }).waitFor());
      await check('species detail');

      await open('/cards-and-labels?species=asclepias-tuberosa', (p) => p.locator('article').first().waitFor());
      await check('cards & labels: fact cards');
      await page.getByRole('button', { name: language.labelsTab }).click();
      await page.getByTestId('pot-label').first().waitFor();
      await check('cards & labels: pot labels');

      await open('/sign-in', (p) => p.locator('input[type="email"]').waitFor());
      await check('sign-in');
      await open('/register', (p) => p.locator('input[type="email"]').waitFor());
      await check('register');

      // The demo organiser (README "Demo sign-ins") for the signed-in pages.
      const token = await demoToken('mara.ellsworth@example.org', 'larkfield-mara');
      await context.addInitScript((t) => window.localStorage.setItem('homeground.accessToken', t), token);
      await open('/account', (p) => p.getByRole('heading', { level: 1 }).waitFor());
      await check('account');
      await open(`/groups/${GROUP}`, (p) => p.getByRole('heading', { level: 1 }).waitFor());
      await check('group');
      await open('/season', (p) => p.locator('table').first().waitFor());
      await check('season');
      await screenshot(page, `accessibility-season-${language.browser}`);

      assert.deepEqual(failures, [], `serious or critical axe findings:\n${failures.join('\n')}`);
      assert.deepEqual(offHostRequests, [], 'no request may leave localhost');
      assert.deepEqual(pageErrors, []);
    } finally {
      await context.close();
    }
  });
}

for (const language of LANGUAGES) {
  test(`at phone width (390 px) the public pages meet WCAG 2.2 AA and the species table keeps its key columns, in ${language.name}`, async () => {
    const { page, context, offHostRequests } = await openGuardedPage(
      app.browser,
      { width: 390, height: 844 },
      { locale: language.browser },
    );
    const failures: string[] = [];
    const check = async (state: string) => {
      await page.waitForLoadState('networkidle');
      const findings = await runAxe(page);
      const serious = blocking(findings);
      summary.push(
        `${language.name.padEnd(8)} ${`${state} (390 px)`.padEnd(34)} ${serious.length} serious/critical, ${findings.length} in all` +
          (findings.length ? `\n${describeFindings(findings).replace(/^/gm, '    ')}` : ''),
      );
      if (serious.length > 0) failures.push(`${state}:\n${describeFindings(serious)}`);
      // WCAG 2.2 SC 1.4.10 Reflow: nothing but a data table may scroll sideways at 320 CSS px; 390 is stricter here.
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      assert.ok(overflow <= 1, `${state}: the page does not scroll sideways at 390 px (overflow ${overflow}px)`);
    };
    try {
      await page.goto(`${app.server.baseUrl}/`);
      await page.getByRole('heading', { level: 1 }).waitFor();
      await check('home');
      await page.goto(`${app.server.baseUrl}/species`);
      await page.locator('table tbody tr').first().waitFor();
      await check('species list');
      // The name stays (sticky) and height, bloom and sun come next, so they are in view without scrolling.
      const columns = await page
        .locator('table thead th')
        .evaluateAll((ths) => ths.slice(0, 4).map((th) => th.getBoundingClientRect().right));
      assert.ok(columns.length === 4 && columns[3] <= 390, `name, height, bloom and sun fit at 390 px: ${columns}`);
      await page.goto(`${app.server.baseUrl}${PLAN}`);
      // On a phone the mix opens as cards; the bloom chart is the table with a count row.
      await page.locator('table:has(tfoot) tbody tr').first().waitFor();
      await check('yard mix');
      // The bloom chart's twelve months fit beside the names at 390 px, without scrolling sideways.
      const chart = await page
        .locator('table:has(tfoot)')
        .first()
        .evaluate((t) => ({ table: t.getBoundingClientRect().width, box: t.parentElement!.clientWidth }));
      assert.ok(chart.table <= chart.box + 1, `bloom chart fits its box at 390 px: ${JSON.stringify(chart)}`);
      await screenshot(page, `accessibility-mix-phone-${language.browser}`);
      await page.goto(`${app.server.baseUrl}/species/asclepias-tuberosa`);
      await page.getByRole('heading', { level: 1 }).waitFor();
      await check('species detail');
      await page.goto(`${app.server.baseUrl}/cards-and-labels?species=asclepias-tuberosa`);
      await page.locator('article').first().waitFor();
      await check('cards & labels');
      await screenshot(page, `accessibility-fact-card-phone-${language.browser}`);
      assert.deepEqual(failures, [], `serious or critical axe findings:\n${failures.join('\n')}`);
      assert.deepEqual(offHostRequests, [], 'no request may leave localhost');
    } finally {
      await context.close();
    }
  });
}

/** The demo people (README "Demo sign-ins") whose pages are checked at phone width, and the pages each reaches. */
const SIGNED_IN_AT_PHONE_WIDTH = [
  {
    who: 'organiser',
    email: 'mara.ellsworth@example.org',
    password: 'larkfield-mara',
    pages: [
      ['season', '/season'],
      ['plant share (organiser)', '/plant-share'],
      ['plant share: pickup day', '/plant-share/pickup'],
      ['plant share: season report', '/plant-share/report'],
    ],
  },
  {
    who: 'grower',
    email: 'juniper.okafor@example.org',
    password: 'larkfield-juniper',
    pages: [['my batches', '/my-batches']],
  },
  { who: 'admin', email: 'wes.hollenbeck@example.org', password: 'larkfield-wes', pages: [['people', '/people']] },
] as const;

for (const language of LANGUAGES) {
  test(`at phone width (390 px) the signed-in pages meet WCAG 2.2 AA, in ${language.name}`, async () => {
    const failures: string[] = [];
    for (const person of SIGNED_IN_AT_PHONE_WIDTH) {
      const { page, context, offHostRequests, pageErrors } = await openGuardedPage(
        app.browser,
        { width: 390, height: 844 },
        { locale: language.browser },
      );
      try {
        const token = await demoToken(person.email, person.password);
        await context.addInitScript((t) => window.localStorage.setItem('homeground.accessToken', t), token);
        for (const [state, path] of person.pages) {
          await page.goto(`${app.server.baseUrl}${path}`);
          await page.getByRole('heading', { level: 1 }).waitFor();
          // The signed-in gate shows the page once the profile has loaded; its lists follow.
          await page.waitForLoadState('networkidle');
          const findings = await runAxe(page);
          const serious = blocking(findings);
          // Reported, not asserted here: wide tables scroll in their own box (SC 1.4.10 allows data tables).
          const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
          summary.push(
            `${language.name.padEnd(8)} ${`${state} (390 px, ${person.who})`.padEnd(34)} ${serious.length} serious/critical, ${findings.length} in all; page overflow ${overflow}px` +
              (findings.length ? `\n${describeFindings(findings).replace(/^/gm, '    ')}` : ''),
          );
          if (serious.length > 0) failures.push(`${state}:\n${describeFindings(serious)}`);
          await screenshot(page, `accessibility-phone-${path.slice(1).replace(/\//g, '-')}-${language.browser}`);
        }
        assert.deepEqual(offHostRequests, [], 'no request may leave localhost');
        assert.deepEqual(pageErrors, []);
      } finally {
        await context.close();
      }
    }
    assert.deepEqual(failures, [], `serious or critical axe findings:\n${failures.join('\n')}`);
  });
}
