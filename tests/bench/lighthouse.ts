import * as chromeLauncher from 'chrome-launcher';
import lighthouse from 'lighthouse';
import { CHROMIUM_FLAGS as CHROME_FLAGS } from '../helpers/browser';

export interface LighthouseScores {
  perf: number;
  a11y: number;
}

/** Median and best of several runs, and every run's figures in order. */
export interface LighthouseSummary extends LighthouseScores {
  perfBest: number;
  a11yBest: number;
  runs: LighthouseScores[];
  /** Total blocking time (ms) and layout shift of the median-performance run. */
  tbtMs: number;
  cls: number;
}

/** A Lighthouse runner on one Debian chromium; close it when done. */
export interface LighthouseRunner {
  /** Median and best over `runs` of the mobile performance and accessibility scores, 0–100. */
  scores: (url: string, runs: number) => Promise<LighthouseSummary>;
  close: () => void;
}

/**
 * Lighthouse's default run is mobile with simulated slow 4G and CPU throttling; it resets the
 * origin's storage before each run, so one browser serves every page. The median of several
 * runs smooths the noise of a busy machine.
 */
export async function openLighthouse(): Promise<LighthouseRunner> {
  const chrome = await chromeLauncher.launch({
    chromePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    chromeFlags: [...CHROME_FLAGS],
  });
  const once = async (url: string): Promise<LighthouseScores & { tbtMs: number; cls: number }> => {
    const result = await lighthouse(url, {
      port: chrome.port,
      output: 'json',
      logLevel: 'error',
      onlyCategories: ['performance', 'accessibility'],
    });
    const categories = result?.lhr.categories;
    const audits = result?.lhr.audits;
    return {
      perf: Math.round((categories?.performance?.score ?? 0) * 100),
      a11y: Math.round((categories?.accessibility?.score ?? 0) * 100),
      tbtMs: Math.round(audits?.['total-blocking-time']?.numericValue ?? 0),
      cls: audits?.['cumulative-layout-shift']?.numericValue ?? 0,
    };
  };
  const scores = async (url: string, runs: number): Promise<LighthouseSummary> => {
    const all: (LighthouseScores & { tbtMs: number; cls: number })[] = [];
    for (let i = 0; i < runs; i++) all.push(await once(url));
    const mid = [...all].sort((a, b) => a.perf - b.perf)[Math.floor(all.length / 2)];
    return {
      perf: median(all.map((s) => s.perf)),
      a11y: median(all.map((s) => s.a11y)),
      perfBest: Math.max(...all.map((s) => s.perf)),
      a11yBest: Math.max(...all.map((s) => s.a11y)),
      runs: all.map(({ perf, a11y }) => ({ perf, a11y })),
      tbtMs: mid.tbtMs,
      cls: mid.cls,
    };
  };
  return { scores, close: () => chrome.kill() };
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}
