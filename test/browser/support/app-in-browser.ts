import { after, before } from 'node:test';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './browser.js';
import { type RunningServer, startServer } from './server.js';

export interface AppInBrowser {
  readonly server: RunningServer;
  readonly browser: Browser;
}

/**
 * One built app (with demo data, on a free port) and one Chromium for a test file: started before
 * its tests, stopped after them. `env` adds settings for the server (e.g. PUBLIC_URL). Read `server` and `browser` inside tests, once `before` has run.
 */
export function useAppInBrowser(env: Record<string, string> = {}): AppInBrowser {
  const session = {} as { server: RunningServer; browser: Browser };
  before(async () => {
    session.server = await startServer(env);
    session.browser = await launchBrowser();
  });
  after(async () => {
    await session.browser?.close();
    await session.server?.stop();
  });
  return session;
}
