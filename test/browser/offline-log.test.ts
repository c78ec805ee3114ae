/**
 * The batch log with no signal, in Debian's Chromium on a 390 px phone: the app installs its service
 * worker and manifest, a demo grower logs seeds sown with the network cut (Playwright's
 * context.setOffline), sees the entry marked "not yet sent", the app shell still opens offline, and
 * when the network returns the entry goes by itself and the API holds it exactly once (read back
 * from the API, outside the page). After a visit, My batches opens with the network cut from the copy
 * kept on the device and says so; signing out deletes that copy. No request leaves localhost.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { openGuardedPage, screenshot } from './support/browser.js';
import { useAppInBrowser } from './support/app-in-browser.js';

const app = useAppInBrowser();
const GROUP = 'larkfield-commons-growers';

interface LogLine {
  kind: string;
  count: number;
  clientId: string | null;
}
interface BatchesAnswer {
  batches: { commonName: string; log: LogLine[] }[];
}

async function bergamotLog(token: string): Promise<LogLine[]> {
  const res = await fetch(`${app.server.baseUrl}/api/groups/${GROUP}/season/batches`, {
    headers: { Authorization: `Bearer ${token}` },
  });
  assert.equal(res.status, 200);
  const body = (await res.json()) as BatchesAnswer;
  const batch = body.batches.find((b) => b.commonName.toLowerCase() === 'wild bergamot');
  assert.ok(batch, 'Amara has a wild bergamot batch (demo-batches.ts)');
  return batch.log;
}

test('a grower logs with the network cut, sees "not yet sent", and the entry reaches the API once', async () => {
  const { page, context, offHostRequests, pageErrors } = await openGuardedPage(app.browser, {
    width: 390,
    height: 844,
  });
  try {
    // The installable app: a manifest in Homeground's own name and colours.
    const manifest = (await (await fetch(`${app.server.baseUrl}/manifest.webmanifest`)).json()) as {
      name: string;
      theme_color: string;
      icons: { sizes: string }[];
    };
    assert.equal(manifest.name, 'Homeground');
    assert.equal(manifest.theme_color.toUpperCase(), '#3F6B3A', 'sedge green, the design guide’s brand colour');
    // Chromium's installability needs a 192 and a 512 px icon (web.dev "install criteria", from memory).
    assert.ok(manifest.icons.some((i) => i.sizes === '192x192') && manifest.icons.some((i) => i.sizes === '512x512'));

    await page.goto(`${app.server.baseUrl}/sign-in?next=/my-batches`);
    await page.getByLabel('E-mail').fill('amara.reyes@example.org');
    await page.getByLabel('Password').fill('larkfield-amara');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { level: 2, name: 'Wild bergamot' }).waitFor();
    // The worker has taken the shell before the signal goes.
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
    });
    const token = await page.evaluate(() => window.localStorage.getItem('homeground.accessToken'));
    assert.ok(token);
    const before = await bergamotLog(token);

    await context.setOffline(true);
    const form = page.getByRole('form', { name: 'Add to the log: Wild bergamot' });
    await form.getByRole('button', { name: 'Sown' }).click();
    await form.getByRole('textbox', { name: /How many/ }).fill('48');
    await form.getByRole('button', { name: 'Add to the log' }).click();
    await form.getByText(/Kept on this device, not yet sent/).waitFor();
    const waiting = page.getByRole('list', { name: 'Waiting on this device: Wild bergamot' });
    await waiting.getByText('Not yet sent').waitFor();
    await page.getByText(/1 log entry is kept on this device/).waitFor();
    assert.equal((await bergamotLog(token)).length, before.length, 'nothing reached the API while offline');
    await screenshot(page, 'offline-log-not-yet-sent');

    // The app shell opens from the service worker with no network at all.
    const second = await context.newPage();
    await second.goto(`${app.server.baseUrl}/species`);
    // Chromium's own "no internet" page has no header; Homeground's shell has its top bar.
    await second.locator('header').first().waitFor();
    assert.match(await second.title(), /Homeground/);
    await second.close();

    await context.setOffline(false);
    await waiting.waitFor({ state: 'detached' });
    await page.getByRole('region', { name: 'Log of Wild bergamot' }).getByText('48').first().waitFor();

    const after = await bergamotLog(token);
    const added = after.filter((e) => !before.some((b) => b.clientId === e.clientId));
    assert.equal(added.length, 1, 'the entry is held exactly once');
    assert.deepEqual({ kind: added[0].kind, count: added[0].count }, { kind: 'sown', count: 48 });
    assert.ok(added[0].clientId, 'sent with the device’s clientId');

    // My batches itself opens with no signal after a visit: a fresh page, the network cut, shows the
    // batches and the log as last seen (the 48 just sent), and says they are the device's saved copy.
    await page.reload();
    await page.getByRole('region', { name: 'Log of Wild bergamot' }).getByText('48').first().waitFor();
    await context.setOffline(true);
    const away = await context.newPage();
    await away.goto(`${app.server.baseUrl}/my-batches`);
    await away.getByRole('heading', { level: 2, name: 'Wild bergamot' }).waitFor();
    await away.getByRole('region', { name: 'Log of Wild bergamot' }).getByText('48').first().waitFor();
    await away.getByText(/No connection: this is your batches as this device saved them on/).waitFor();
    await screenshot(away, 'offline-my-batches-saved-copy');
    await away.close();

    // Signing out forgets the saved copies: the next person on this phone cannot read Amara's batches.
    await context.setOffline(false);
    const savedCount = () =>
      page.evaluate(
        () =>
          new Promise<number>((resolve, reject) => {
            const open = indexedDB.open('homeground-saved-answers');
            open.onerror = () => reject(open.error);
            open.onsuccess = () => {
              const count = open.result.transaction('answers').objectStore('answers').count();
              count.onsuccess = () => resolve(count.result);
              count.onerror = () => reject(count.error);
            };
          }),
      );
    assert.ok((await savedCount()) > 0, 'the visit kept a copy on the device');
    await page.getByRole('button', { name: /Your account/ }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    // The copy is deleted as the sign-out happens; allow the IndexedDB write a moment to land.
    let left = await savedCount();
    for (let i = 0; left > 0 && i < 20; i++) {
      await new Promise((r) => setTimeout(r, 100));
      left = await savedCount();
    }
    assert.equal(left, 0, 'no saved answer is left on the device after signing out');

    assert.deepEqual(offHostRequests, [], 'no request may leave localhost');
    assert.deepEqual(pageErrors, []);
  } finally {
    await context.close();
  }
});
