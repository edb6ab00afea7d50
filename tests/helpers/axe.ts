import fs from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

/** One axe-core rule broken on a page, with the elements it found (trimmed). */
export interface AxeFinding {
  id: string;
  impact: string;
  help: string;
  targets: string[];
}

const require = createRequire(import.meta.url);
let source: string | undefined;

/** axe-core's browser build, read once from the installed package. */
function axeSource(): string {
  source ??= fs.readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');
  return source;
}

/**
 * Run axe-core on the page as loaded and return its serious and critical violations
 * (WCAG 2.x A/AA rules plus axe's best practices). Minor and moderate findings are left out.
 */
export async function seriousViolations(page: Page): Promise<AxeFinding[]> {
  // Evaluated over the DevTools protocol, not as an inline <script>: the pages' hash-based CSP
  // (rightly) blocks injected inline scripts, and axe must see the page under its real policy.
  await page.evaluate(axeSource());
  const found = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (o: object) => Promise<AxeResults> } }).axe;
    interface AxeResults {
      violations: {
        id: string;
        impact: string | null;
        help: string;
        nodes: { target: unknown[] }[];
      }[];
    }
    const r = await axe.run({ resultTypes: ['violations'] });
    return r.violations.map((v) => ({
      id: v.id,
      impact: v.impact ?? 'unknown',
      help: v.help,
      targets: v.nodes.slice(0, 5).map((n) => n.target.join(' ')),
    }));
  });
  return found.filter((f) => f.impact === 'serious' || f.impact === 'critical');
}
