/**
 * The plant share in Debian's Chromium against the real API and its demo share: a taker reserves at a
 * 390 px phone width without an account (the page never scrolls sideways, the confirmation shows the
 * slot and a care sheet, the confirmation e-mail reaches the outbox with the same slot), then the demo
 * organiser checks that household in on a phone; the API's own pickup list must then say so. No
 * request leaves localhost.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { openGuardedPage, screenshot } from './support/browser.js';
import { useAppInBrowser } from './support/app-in-browser.js';

const app = useAppInBrowser();
const GROUP = 'larkfield-commons-growers';
const PHONE = { width: 390, height: 844 };
// A grower of the invented demo group (shared/DESIGN.md beside the project): no demo reservation yet.
const TAKER = { name: 'Theo Lindqvist', email: 'theo.lindqvist@example.org', zip: '54665' };

interface PublicShare {
  limits: { perSpecies: number; total: number };
  slots: { id: string; start: string; end: string; left: number; past: boolean }[];
  species: { slug: string; commonName: string; remaining: number }[];
}
interface PickupList {
  households: { name: string | null; status: string; lines: { speciesSlug: string; count: number }[] }[];
}

async function api<T>(path: string, token?: string): Promise<T> {
  const res = await fetch(`${app.server.baseUrl}${path}`, {
    headers: token ? { Authorization: `Bearer ${token}` } : {},
  });
  assert.equal(res.status, 200, `${path} answers 200`);
  return (await res.json()) as T;
}

/** The demo organiser's token (README "Demo sign-ins"). */
async function organiserToken(): Promise<string> {
  const login = await fetch(`${app.server.baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'mara.ellsworth@example.org', password: 'larkfield-mara' }),
  });
  return ((await login.json()) as { accessToken: string }).accessToken;
}

/** "2027-06-12T09:00:00-05:00" → "9:00 am": the clock the organiser wrote, as the page says it. */
function clock(value: string): string {
  const [h, m] = value.slice(11, 16).split(':').map(Number);
  return `${h % 12 === 0 ? 12 : h % 12}:${String(m).padStart(2, '0')} ${h < 12 ? 'am' : 'pm'}`;
}

test('a taker reserves on a phone, then the organiser checks the household in', async () => {
  const before = await api<PublicShare>(`/api/plant-shares/${GROUP}`);
  const plant = before.species.find((s) => s.remaining >= 2);
  const slot = before.slots.find((s) => s.left > 0 && !s.past);
  assert.ok(plant && slot, 'the demo share has plants left and a slot with room');
  const slotText = `${clock(slot.start)} – ${clock(slot.end)}`;

  // The taker, signed out, on a phone.
  const taker = await openGuardedPage(app.browser, PHONE);
  try {
    const { page } = taker;
    await page.goto(`${app.server.baseUrl}/share/${GROUP}`);
    await page.getByRole('heading', { level: 1, name: /Plant share: Larkfield Commons Growers/ }).waitFor();
    const wide = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    assert.ok(wide <= 0, `the page does not scroll sideways (${wide} px too wide)`);
    await screenshot(page, 'plant-share-available-phone-390');

    const more = page.getByRole('button', { name: `One more: Plants of ${plant.commonName}`, exact: true });
    await more.click();
    await more.click();
    await page.getByRole('radio', { name: new RegExp(slotText) }).check();
    await page.getByRole('textbox', { name: /^Name/ }).fill(TAKER.name);
    await page.getByRole('textbox', { name: /^E-mail/ }).fill(TAKER.email);
    await page.getByRole('textbox', { name: /^ZIP code/ }).fill(TAKER.zip);
    await page.getByRole('button', { name: 'Reserve these plants' }).click();

    await page.getByRole('heading', { level: 1, name: 'Your plants are reserved' }).waitFor();
    await page.getByText(new RegExp(`We sent a confirmation to ${TAKER.email}`)).waitFor();
    await page.getByText(new RegExp(slotText)).first().waitFor();
    await page.getByRole('heading', { name: 'Care sheet' }).waitFor();
    await screenshot(page, 'plant-share-confirmation-phone-390');
    assert.deepEqual(taker.offHostRequests, [], 'no request may leave localhost');
    assert.deepEqual(taker.pageErrors, []);
  } finally {
    await taker.context.close();
  }

  // What is left went down by exactly what was reserved (the API's own count).
  const after = await api<PublicShare>(`/api/plant-shares/${GROUP}`);
  assert.equal(after.species.find((s) => s.slug === plant.slug)?.remaining, plant.remaining - 2);
  const token = await organiserToken();
  const mail = await api<{ subject: string; text: string }[]>(
    `/api/outbox?to=${encodeURIComponent(TAKER.email)}`,
    token,
  );
  assert.equal(mail.length, 1, 'one confirmation e-mail reached the outbox');
  // The e-mail writes the slot on the place's clock, 24-hour ("09:00–09:30").
  assert.ok(
    mail[0].text.includes(`${slot.start.slice(11, 16)}–${slot.end.slice(11, 16)}`),
    'the e-mail names the slot',
  );

  // The organiser at the pickup, on a phone.
  const organiser = await openGuardedPage(app.browser, PHONE);
  try {
    const { page } = organiser;
    await page.goto(`${app.server.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill('mara.ellsworth@example.org');
    await page.getByLabel('Password').fill('larkfield-mara');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('button', { name: /Your account/ }).waitFor();
    await page.goto(`${app.server.baseUrl}/plant-share/pickup`);
    await page.getByRole('heading', { name: 'Check-in' }).waitFor();
    await page.getByRole('combobox', { name: 'Pickup slot' }).selectOption(slot.id);
    const checkIn = page.getByRole('button', { name: `Checked in: ${TAKER.name}` });
    const box = await checkIn.boundingBox();
    // Touch targets of at least 44 × 44 CSS px (WCAG 2.2, 2.5.5 Target Size).
    assert.ok(box && box.height >= 44 && box.width >= 44, 'the check-in button is a big touch target');
    await checkIn.click();
    await page.getByRole('listitem', { name: TAKER.name }).getByText('Checked in').waitFor();
    const wide = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    assert.ok(wide <= 0, `the pickup page does not scroll sideways (${wide} px too wide)`);
    await screenshot(page, 'plant-share-check-in-phone-390');

    // Print: only the pickup list, black on white.
    await page.emulateMedia({ media: 'print' });
    assert.equal(await page.getByRole('heading', { name: 'Check-in' }).isVisible(), false);
    assert.equal(await page.getByRole('region', { name: 'Pickup list table' }).isVisible(), true);
    await page.emulateMedia({ media: 'screen' });
    assert.deepEqual(organiser.offHostRequests, [], 'no request may leave localhost');
    assert.deepEqual(organiser.pageErrors, []);
  } finally {
    await organiser.context.close();
  }

  const list = await api<PickupList>(`/api/groups/${GROUP}/plant-share/slots/${slot.id}/pickup-list`, token);
  const household = list.households.find((h) => h.name === TAKER.name);
  assert.equal(household?.status, 'picked-up', 'the API records the household as picked up');
  assert.deepEqual(
    household?.lines.map((l) => [l.speciesSlug, l.count]),
    [[plant.slug, 2]],
  );
});
