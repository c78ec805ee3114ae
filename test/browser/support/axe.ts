import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const require = createRequire(import.meta.url);
/** axe-core's engine as one script, from node_modules (no network). */
const AXE_SOURCE: string = (require('axe-core') as { source: string }).source;

/** The WCAG 2.2 level A and AA rules axe-core tags (axe-core 4.14 rule descriptions). */
export const WCAG_22_AA_TAGS = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'];

export interface AxeFinding {
  id: string;
  impact: string | null;
  help: string;
  targets: string[];
}

/**
 * Runs axe-core on the page as it is now and returns every finding. The engine goes in through
 * page.evaluate, which the app's Content-Security-Policy does not block (a script tag would be).
 */
export async function runAxe(page: Page): Promise<AxeFinding[]> {
  await page.evaluate(AXE_SOURCE);
  return page.evaluate(async (tags) => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<AxeResults> } }).axe;
    interface AxeResults {
      violations: { id: string; impact: string | null; help: string; nodes: { target: unknown[] }[] }[];
    }
    const results = await axe.run(document, { runOnly: { type: 'tag', values: tags }, resultTypes: ['violations'] });
    return results.violations.map((v) => ({
      id: v.id,
      impact: v.impact,
      help: v.help,
      targets: v.nodes.slice(0, 5).map((n) => n.target.map(String).join(' ')),
    }));
  }, WCAG_22_AA_TAGS);
}

/** Serious and critical findings: the ones the browser tests fail on. */
export function blocking(findings: readonly AxeFinding[]): AxeFinding[] {
  return findings.filter((f) => f.impact === 'serious' || f.impact === 'critical');
}

/** One line per finding, for a failure message or the printed summary. */
export function describeFindings(findings: readonly AxeFinding[]): string {
  return findings.map((f) => `${f.impact} ${f.id}: ${f.help} [${f.targets.join(' | ')}]`).join('\n');
}
