/**
 * The curator's desk in Debian's Chromium: the demo curator edits a species in the editor (a bad
 * range is refused beside its field, then saved), sees the record beside the reference data and its
 * history, and finds the new difference counted on the reference page; the demo admin changes a role
 * on the people page. Screenshots of each. No request leaves localhost.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { openGuardedPage, screenshot } from './support/browser.js';
import { useAppInBrowser } from './support/app-in-browser.js';

const app = useAppInBrowser();

test('a curator edits a species and sees it beside the reference; an admin changes a role', async () => {
  const { page, offHostRequests, pageErrors } = await openGuardedPage(app.browser, { width: 1280, height: 900 });
  try {
    await page.goto(`${app.server.baseUrl}/sign-in?next=/species/asclepias-tuberosa/edit`);
    await page.getByLabel('E-mail').fill('ines.calder@example.org');
    await page.getByLabel('Password').fill('larkfield-ines');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { level: 1, name: 'Edit butterfly milkweed' }).waitFor();
    // 30–75 cm is 12–30 in at 2.54 cm to the inch (the record: species-data/species/asclepias-tuberosa.json).
    await page.getByText('Height: 12–30 in (30–75 cm)').waitFor();

    const min = page.getByRole('textbox', { name: /Height from \(cm\)/ });
    const max = page.getByRole('textbox', { name: /Height to \(cm\)/ });
    await min.fill('300');
    await page.getByRole('button', { name: 'Save the changes' }).click();
    await page.getByText('Min must not exceed max').waitFor();
    await page.getByText('Nothing was saved. Please fix the fields marked below.').waitFor();

    // A height USDA PLANTS does not support (it gives 2 ft for ASTU), so the reference page has work to show.
    await max.fill('400');
    await page.getByText('Height: 10–13 ft (3–4 m)').waitFor();
    await screenshot(page, 'curator-species-editor');
    await page.getByRole('button', { name: 'Save the changes' }).click();

    await page.getByRole('heading', { level: 1, name: 'Butterfly milkweed' }).waitFor();
    const reference = page.getByRole('region', { name: 'Checked against the reference' });
    const height = reference.getByRole('row', { name: /^Height/ });
    await height.getByText('Differs').waitFor();
    assert.match((await height.textContent()) ?? '', /2 ft \(61 cm\) at maturity/, 'USDA PLANTS height for ASTU');
    const history = page.getByRole('region', { name: 'Changes to this record' });
    await history.getByText(/^Edited by Ines Calder on /).waitFor();
    await history.getByText(/\{"min":30,"max":75\} → \{"min":300,"max":400\}/).waitFor();
    await screenshot(page, 'curator-record-reference-and-history');

    await page.goto(`${app.server.baseUrl}/reference-checks`);
    await page.getByRole('heading', { level: 1, name: 'Checked against the reference' }).waitFor();
    await page.getByText(/^1 difference not yet explained, across 1 of \d+ records\.$/).waitFor();
    await page.getByRole('heading', { level: 2, name: /Butterfly milkweed \(Asclepias tuberosa\)/ }).waitFor();
    await screenshot(page, 'curator-reference-page');

    // The admin's people page.
    await page.context().clearCookies();
    await page.evaluate(() => window.localStorage.clear());
    await page.goto(`${app.server.baseUrl}/sign-in?next=/people`);
    await page.getByLabel('E-mail').fill('wes.hollenbeck@example.org');
    await page.getByLabel('Password').fill('larkfield-wes');
    await page.getByRole('button', { name: 'Sign in' }).click();
    const role = page.getByRole('combobox', { name: 'Role of Sol Marchetti' });
    await role.waitFor();
    await role.click();
    await page.getByRole('option', { name: 'Curator' }).click();
    await page.waitForFunction(
      () => document.querySelector('[aria-label="Role of Sol Marchetti"]')?.textContent?.includes('Curator') ?? false,
    );
    await page.reload();
    await page.getByRole('combobox', { name: 'Role of Sol Marchetti' }).getByText('Curator').waitFor();
    await screenshot(page, 'admin-people-role-changed');

    assert.deepEqual(offHostRequests, [], 'no request may leave localhost');
    assert.deepEqual(pageErrors, []);
  } finally {
    await page.context().close();
  }
});
