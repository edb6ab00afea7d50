import fs from 'node:fs';
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
  /** The CPU slowdown used and the host's Lighthouse benchmarkIndex of the last run. */
  cpuMultiplier: number;
  benchmarkIndex: number;
  /** Runs that gave no score (Lighthouse's error code), left out of the median and best. */
  failed: string[];
}

/**
 * Lighthouse's default 4x CPU slowdown is meant to take a high-end desktop (benchmarkIndex
 * 1500–2000) to a mid-tier phone; Lighthouse's throttling guide (docs/throttling.md, "Calibrating
 * the CPU slowdown") says to lower it on a slower host. A busy 2-core VM measures about 450, in the
 * mid-tier phone bracket already, where the guide's table gives 1x. Calibrated: index / 440
 * (1750 / 4, the default's own ratio), kept within 1–4.
 */
export function calibratedMultiplier(benchmarkIndex: number): number {
  return Math.min(4, Math.max(1, Math.round((benchmarkIndex / 440) * 10) / 10));
}

type Run = LighthouseScores & { tbtMs: number; cls: number; failed?: string };

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
export async function openLighthouse(calibrate = false): Promise<LighthouseRunner> {
  const chrome = await chromeLauncher.launch({
    chromePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    chromeFlags: [...CHROME_FLAGS],
  });
  let benchmarkIndex = 0;
  const once = async (url: string, cpuSlowdownMultiplier = 4): Promise<Run> => {
    const result = await lighthouse(
      url,
      {
        port: chrome.port,
        output: 'json',
        logLevel: 'error',
        onlyCategories: ['performance', 'accessibility'],
      },
      { extends: 'lighthouse:default', settings: { throttling: { cpuSlowdownMultiplier } } },
    );
    benchmarkIndex = result?.lhr.environment.benchmarkIndex ?? 0;
    // diagnostic: keep the last report of each page to read its main-thread breakdown
    if (process.env.BENCH_LH_DUMP && result) {
      const file = `${process.env.BENCH_LH_DUMP}/${new URL(url).pathname.replace(/\W+/g, '_') || 'root'}.json`;
      fs.writeFileSync(file, JSON.stringify(result.lhr));
    }
    const categories = result?.lhr.categories;
    // A run that timed out or never painted has null scores: counted as failed, not as a 0.
    if (typeof categories?.performance?.score !== 'number') {
      return {
        failed: result?.lhr.runtimeError?.code ?? 'no score',
        perf: 0,
        a11y: 0,
        tbtMs: 0,
        cls: 0,
      };
    }
    const audits = result?.lhr.audits;
    return {
      perf: Math.round((categories?.performance?.score ?? 0) * 100),
      a11y: Math.round((categories?.accessibility?.score ?? 0) * 100),
      tbtMs: Math.round(audits?.['total-blocking-time']?.numericValue ?? 0),
      cls: audits?.['cumulative-layout-shift']?.numericValue ?? 0,
    };
  };
  const scores = async (url: string, runs: number): Promise<LighthouseSummary> => {
    // A calibrated page first takes one default run, only to read the host's benchmarkIndex now.
    if (calibrate) await once(url);
    const multiplier = calibrate ? calibratedMultiplier(benchmarkIndex) : 4;
    const all: Run[] = [];
    const failed: string[] = [];
    for (let i = 0; i < runs; i++) {
      const run = await once(url, multiplier);
      if (run.failed) failed.push(run.failed);
      else all.push(run);
    }
    if (all.length === 0)
      throw new Error(`every Lighthouse run of ${url} failed: ${failed.join(', ')}`);
    const mid = [...all].sort((a, b) => a.perf - b.perf)[Math.floor(all.length / 2)];
    return {
      perf: median(all.map((s) => s.perf)),
      a11y: median(all.map((s) => s.a11y)),
      perfBest: Math.max(...all.map((s) => s.perf)),
      a11yBest: Math.max(...all.map((s) => s.a11y)),
      runs: all.map(({ perf, a11y }) => ({ perf, a11y })),
      tbtMs: mid.tbtMs,
      cls: mid.cls,
      cpuMultiplier: multiplier,
      benchmarkIndex,
      failed,
    };
  };
  return { scores, close: () => chrome.kill() };
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}
