/**
 * Page budgets on the built app in Debian's chromium (`npm run bench:pages`). Reported figures,
 * not a timed test. For every public page: first-load JS (gzip), axe-core serious/critical
 * findings, console errors, and Lighthouse mobile performance and accessibility.
 *
 * BENCH_URL=http://127.0.0.1:4321 measures a server already running; otherwise the real start
 * command is run on port 18020 with a temp DATA_DIR. BENCH_SKIP_LIGHTHOUSE=1 skips Lighthouse;
 * BENCH_PAGES (comma-separated paths) limits the pages; BENCH_LH_RUNS (default 3) sets how many
 * Lighthouse runs each page's median and best come from; BENCH_LH_CALIBRATE=1 sets Lighthouse's
 * CPU slowdown from the host's benchmarkIndex instead of the default 4x (a diagnostic for a slow
 * or busy host; the goal is judged on the default).
 * The machine's load average is printed with the figures: under load Lighthouse's simulated
 * throttling multiplies the host's own slowness, so a busy machine reads far lower.
 */
import os from 'node:os';
import { gzipSync } from 'node:zlib';
import type { Browser } from 'playwright-core';
import { seriousViolations } from '../helpers/axe';
import { launchBrowser } from '../helpers/browser';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';
import { openLighthouse } from './lighthouse';
import type { LighthouseSummary } from './lighthouse';

const ALL_PAGES = [
  '/',
  '/check',
  '/siphon',
  '/gravity-line',
  '/drain',
  '/guides',
  '/guides/priming-a-siphon',
  '/pricing',
  '/developers/api',
  '/cautions',
];

/** BENCH_PAGES=/check,/siphon measures just those. */
const PAGES = process.env.BENCH_PAGES ? process.env.BENCH_PAGES.split(',') : ALL_PAGES;

const GOALS = { jsKb: 120, lighthouse: 95 };
/** BENCH_LH_CALIBRATE=1: CPU slowdown from the host's benchmarkIndex (see lighthouse.ts). */
const CALIBRATE = process.env.BENCH_LH_CALIBRATE === '1';
const LH_RUNS = Math.max(1, Number(process.env.BENCH_LH_RUNS) || 3);

interface Row {
  page: string;
  status: number;
  jsKb: number;
  scripts: number;
  axe: string[];
  consoleErrors: string[];
  lh?: LighthouseSummary;
}

/** Load a page in a fresh phone-sized context (no service worker) and measure it. */
async function measure(browser: Browser, base: string, path: string): Promise<Row> {
  const context = await browser.newContext({
    viewport: { width: 360, height: 740 },
    deviceScaleFactor: 2,
    isMobile: true,
    hasTouch: true,
    locale: 'en-GB',
    serviceWorkers: 'block',
  });
  const page = await context.newPage();
  const consoleErrors: string[] = [];
  page.on('console', (m) => m.type() === 'error' && consoleErrors.push(m.text()));
  page.on('pageerror', (e) => consoleErrors.push(e.message));
  const pending: Promise<number>[] = [];
  page.on('response', (res) => {
    if (res.request().resourceType() !== 'script') return;
    pending.push(scriptGzipBytes(res));
  });
  const response = await page.goto(base + path, { waitUntil: 'networkidle' });
  const sizes = await Promise.all(pending);
  const axe = (await seriousViolations(page)).map((v) => `${v.id} (${v.impact})`);
  await context.close();
  return {
    page: path,
    status: response?.status() ?? 0,
    jsKb: sizes.reduce((a, b) => a + b, 0) / 1024,
    scripts: sizes.length,
    axe,
    consoleErrors,
  };
}

/**
 * The script's gzip size (level 6), whatever the server sent: the budget is stated in gzip, and
 * brotli on the wire would read a few KB lower than the goal's measure.
 */
async function scriptGzipBytes(res: import('playwright-core').Response): Promise<number> {
  return gzipSync(await res.body(), { level: 6 }).length;
}

/** The machine's 1-, 5- and 15-minute load averages: Lighthouse figures depend on them. */
function loadNote(): string {
  return `${os
    .loadavg()
    .map((l) => l.toFixed(1))
    .join(' / ')} on ${os.cpus().length} cores`;
}

function mark(ok: boolean): string {
  return ok ? ' ' : '✗';
}

function printTable(rows: Row[]): void {
  const head = [
    'page',
    'status',
    'JS gz KB',
    'axe s/c',
    'console err',
    'LH perf',
    'LH a11y',
    'TBT ms',
    'CLS',
  ];
  const body = rows.map((r) => [
    r.page,
    String(r.status),
    `${r.jsKb.toFixed(1)} (${r.scripts})${mark(r.jsKb <= GOALS.jsKb)}`,
    `${r.axe.length}${mark(r.axe.length === 0)}`,
    `${r.consoleErrors.length}${mark(r.consoleErrors.length === 0)}`,
    r.lh
      ? `${r.lh.perf} (${r.lh.perfBest})${mark(r.lh.perf >= GOALS.lighthouse)}${r.lh.failed.length ? ` ${r.lh.failed.length} failed` : ''}`
      : '–',
    r.lh ? `${r.lh.a11y} (${r.lh.a11yBest})${mark(r.lh.a11y >= GOALS.lighthouse)}` : '–',
    r.lh ? String(r.lh.tbtMs) : '–',
    r.lh ? r.lh.cls.toFixed(3) : '–',
  ]);
  const widths = head.map((h, i) => Math.max(h.length, ...body.map((b) => b[i].length)));
  const line = (cells: string[]): string =>
    `| ${cells.map((c, i) => c.padEnd(widths[i])).join(' | ')} |`;
  console.log(line(head));
  console.log(`|${widths.map((w) => '-'.repeat(w + 2)).join('|')}|`);
  for (const b of body) console.log(line(b));
  console.log(
    `\nGoals: JS ≤ ${GOALS.jsKb} KB gzip, no serious/critical axe findings, no console errors,`,
  );
  console.log(
    `Lighthouse mobile ≥ ${GOALS.lighthouse}: median of ${LH_RUNS} runs (best in brackets); TBT and CLS of`,
  );
  console.log(`the median run. ✗ marks a miss. JS column: KB (script count). Load: ${loadNote()}.`);
  const cpu = rows
    .filter((r) => r.lh)
    .map((r) => `${r.page} ${r.lh!.cpuMultiplier}x (index ${r.lh!.benchmarkIndex})`);
  if (cpu.length) console.log(`CPU slowdown and host benchmarkIndex: ${cpu.join(', ')}.`);
  for (const r of rows) {
    for (const a of r.axe) console.log(`  axe ${r.page}: ${a}`);
    for (const e of r.consoleErrors) console.log(`  console ${r.page}: ${e.slice(0, 200)}`);
  }
}

async function main(): Promise<void> {
  let app: StartedApp | undefined;
  const base = process.env.BENCH_URL ?? (app = await startApp(18020)).url;
  const browser = await launchBrowser();
  const rows: Row[] = [];
  try {
    for (const path of PAGES) {
      rows.push(await measure(browser, base, path));
      console.error(`measured ${path}`);
    }
    if (!process.env.BENCH_SKIP_LIGHTHOUSE) {
      const lh = await openLighthouse(CALIBRATE);
      try {
        for (const row of rows) {
          if (row.status !== 200) continue;
          row.lh = await lh.scores(base + row.page, LH_RUNS);
          const runs = [
            ...row.lh.runs.map((s) => `${s.perf}/${s.a11y}`),
            ...row.lh.failed.map((f) => `failed (${f})`),
          ].join(' ');
          const cpu = `cpu ${row.lh.cpuMultiplier}x, benchmarkIndex ${row.lh.benchmarkIndex}`;
          console.error(`lighthouse ${row.page}: ${runs} (${cpu}, load ${loadNote()})`);
        }
      } finally {
        lh.close();
      }
    }
  } finally {
    await browser.close();
    await app?.stop();
  }
  printTable(rows);
}

main().catch((e: unknown) => {
  console.error(e);
  process.exit(1);
});
