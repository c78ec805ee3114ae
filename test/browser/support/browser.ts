import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { type Browser, type BrowserContext, chromium, type Page } from 'playwright-core';

const ROOT = path.resolve(import.meta.dirname, '..', '..', '..');
export const RESULTS_DIR = path.join(ROOT, 'test-results');

/** Debian's Chromium, never a downloaded browser; flags keep it off the network (Playwright gives it a fresh profile). */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
    ],
  });
}

export interface GuardedPage {
  context: BrowserContext;
  page: Page;
  /** Every request that tried to leave localhost (aborted). */
  offHostRequests: string[];
  /** Uncaught errors thrown in the page. */
  pageErrors: string[];
  /** Console errors other than the browser's own "failed to load resource" lines for 4xx answers. */
  consoleErrors: string[];
}

/** A page that aborts and records any request to a host other than localhost. */
export async function openGuardedPage(
  browser: Browser,
  viewport = { width: 1280, height: 900 },
  /** The browser's language (navigator.languages), e.g. "es-MX"; Playwright's default otherwise. */
  options: { locale?: string } = {},
): Promise<GuardedPage> {
  const context = await browser.newContext({ viewport, ...options });
  const offHostRequests: string[] = [];
  const pageErrors: string[] = [];
  const consoleErrors: string[] = [];
  await context.route('**/*', (route) => {
    const url = new URL(route.request().url());
    const local =
      url.protocol === 'data:' ||
      url.protocol === 'blob:' ||
      ['localhost', '127.0.0.1', '[::1]'].includes(url.hostname);
    if (local) return route.continue();
    offHostRequests.push(url.href);
    return route.abort('blockedbyclient');
  });
  const page = await context.newPage();
  page.on('pageerror', (e) => pageErrors.push(e.message));
  page.on('console', (m) => {
    if (m.type() === 'error' && !m.text().startsWith('Failed to load resource')) consoleErrors.push(m.text());
  });
  return { context, page, offHostRequests, pageErrors, consoleErrors };
}

export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(RESULTS_DIR, { recursive: true });
  const file = path.join(RESULTS_DIR, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
