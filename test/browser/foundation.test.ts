/**
 * The foundation as a person meets it, in Debian's Chromium: the built app served by the API, a demo
 * sign-in, the home page with live figures, Merriweather really loaded from our own files, and no
 * request to any host but localhost.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { openGuardedPage, screenshot } from './support/browser.js';
import { useAppInBrowser } from './support/app-in-browser.js';

const app = useAppInBrowser();

test('a demo organiser signs in and sees the Homeground shell with live figures and its own fonts', async () => {
  const { page, offHostRequests, pageErrors, context } = await openGuardedPage(app.browser);
  try {
    await page.goto(`${app.server.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill('mara.ellsworth@example.org');
    await page.getByLabel('Password').fill('larkfield-mara');
    await page.getByRole('button', { name: 'Sign in' }).click();

    await page.waitForURL(`${app.server.baseUrl}/`);
    await page.getByRole('button', { name: /Your account: Mara Ellsworth/ }).waitFor();
    // Organisers see the Season section in the navigation.
    await page.getByRole('link', { name: 'Season' }).first().waitFor({ state: 'attached' });

    const stats = (await (await fetch(`${app.server.baseUrl}/api/stats`)).json()) as { species: number };
    await page.getByText(String(stats.species), { exact: true }).first().waitFor();

    const fonts = await page.evaluate(async () => {
      await document.fonts.ready;
      const faces: string[] = [];
      document.fonts.forEach((f) => {
        if (f.status === 'loaded') faces.push(`${f.family.replace(/"/g, '')} ${f.weight}`);
      });
      const h1 = document.querySelector('h1');
      return { faces, heading: h1 ? getComputedStyle(h1).fontFamily : '' };
    });
    assert.ok(
      fonts.faces.some((f) => f.startsWith('Merriweather')),
      `Merriweather loaded: ${fonts.faces.join(', ')}`,
    );
    assert.ok(
      fonts.faces.some((f) => f.startsWith('Open Sans')),
      `Open Sans loaded: ${fonts.faces.join(', ')}`,
    );
    assert.match(fonts.heading, /Merriweather/);

    await screenshot(page, 'foundation-home-signed-in');
    assert.deepEqual(offHostRequests, [], 'no request may leave localhost');
    assert.deepEqual(pageErrors, []);
  } finally {
    await context.close();
  }
});

test('the shell works at phone width and deep links fall back to the app', async () => {
  const { page, offHostRequests, context } = await openGuardedPage(app.browser, { width: 360, height: 780 });
  try {
    await page.goto(`${app.server.baseUrl}/species`);
    await page.getByRole('button', { name: 'Main menu' }).click();
    await page
      .getByRole('menuitem', { name: 'Find plants' })
      .or(page.getByRole('link', { name: 'Find plants' }))
      .first()
      .waitFor();
    await page.waitForTimeout(400); // let the menu's fade-in finish before the screenshot
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    assert.ok(overflow <= 1, `no sideways scrolling at 360 px (overflow ${overflow}px)`);
    await screenshot(page, 'foundation-phone-menu');
    const api404 = await fetch(`${app.server.baseUrl}/api/no-such-route`);
    assert.equal(api404.status, 404);
    assert.match(api404.headers.get('content-type') ?? '', /json/);
    assert.deepEqual(offHostRequests, []);
  } finally {
    await context.close();
  }
});
