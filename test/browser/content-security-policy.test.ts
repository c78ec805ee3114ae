/**
 * The built app under its own Content-Security-Policy: Chromium enforces the header the API sends, and
 * this walks the main pages as a visitor and as the demo organiser, curator, grower and admin. Any CSP
 * violation (the browser's `securitypolicyviolation` event, and its console line), console error,
 * uncaught error or request leaving localhost fails. Source: CSP Level 3 (W3C), §5.3 "report a violation":
 * every blocked load or inline script raises that event in the page.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { openGuardedPage } from './support/browser.js';
import { useAppInBrowser } from './support/app-in-browser.js';

const app = useAppInBrowser();
const GROUP = 'larkfield-commons-growers';

/** Pages of the main journeys, each with the demo person who reaches it (null: a visitor). */
const PAGES: [path: string, who: [email: string, password: string] | null][] = [
  ['/', null],
  ['/find-plants?state=WI&eco=52&sun=full&moisture=medium&area=200&unit=ft2&deer=medium&goals=pollinators', null],
  ['/species', null],
  ['/species/asclepias-tuberosa', null],
  ['/cards-and-labels', null],
  [`/share/${GROUP}`, null],
  ['/sign-in', null],
  ['/register', null],
  ['/season', ['mara.ellsworth@example.org', 'larkfield-mara']],
  ['/plant-share', ['mara.ellsworth@example.org', 'larkfield-mara']],
  ['/plant-share/pickup', ['mara.ellsworth@example.org', 'larkfield-mara']],
  ['/plant-share/report', ['mara.ellsworth@example.org', 'larkfield-mara']],
  [`/groups/${GROUP}`, ['mara.ellsworth@example.org', 'larkfield-mara']],
  ['/my-batches', ['juniper.okafor@example.org', 'larkfield-juniper']],
  ['/species/asclepias-tuberosa', ['ines.calder@example.org', 'larkfield-ines']],
  ['/people', ['wes.hollenbeck@example.org', 'larkfield-wes']],
  ['/account', ['priya.vantongeren@example.org', 'larkfield-priya']],
];

async function demoToken(email: string, password: string): Promise<string> {
  const res = await fetch(`${app.server.baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  assert.ok(res.ok, `demo sign-in for ${email}: ${res.status}`);
  return ((await res.json()) as { accessToken: string }).accessToken;
}

test('the main pages load under the Content-Security-Policy with no violation and no console error', async () => {
  const policy = (await fetch(app.server.baseUrl)).headers.get('content-security-policy') ?? '';
  assert.match(policy, /script-src 'self'/, `the page must carry the policy, got: ${policy}`);
  const failures: string[] = [];
  const tokens = new Map<string, string>();
  for (const [path, who] of PAGES) {
    const guarded = await openGuardedPage(app.browser);
    const { context, page, offHostRequests, pageErrors, consoleErrors } = guarded;
    const violations: string[] = [];
    await context.exposeFunction('reportCspViolation', (v: string) => violations.push(v));
    await context.addInitScript(() => {
      document.addEventListener('securitypolicyviolation', (e) =>
        (window as unknown as { reportCspViolation: (v: string) => void }).reportCspViolation(
          `${e.effectiveDirective} blocked ${e.blockedURI || 'inline'} (${e.sourceFile}:${e.lineNumber})`,
        ),
      );
    });
    if (who) {
      const token = tokens.get(who[0]) ?? (await demoToken(...who));
      tokens.set(who[0], token);
      await context.addInitScript((t) => window.localStorage.setItem('homeground.accessToken', t), token);
    }
    await page.goto(`${app.server.baseUrl}${path}`);
    await page.waitForLoadState('networkidle');
    await page.locator('h1').first().waitFor({ timeout: 15_000 });
    const problems = [
      ...violations.map((v) => `CSP violation: ${v}`),
      ...consoleErrors.map((e) => `console: ${e}`),
      ...pageErrors.map((e) => `page error: ${e}`),
      ...offHostRequests.map((u) => `left localhost: ${u}`),
    ];
    if (problems.length) failures.push(`${path} (${who?.[0] ?? 'visitor'}):\n  ${problems.join('\n  ')}`);
    await context.close();
  }
  console.log(`CSP walk: ${PAGES.length} pages, ${failures.length} with a problem`);
  assert.deepEqual(failures, []);
});
