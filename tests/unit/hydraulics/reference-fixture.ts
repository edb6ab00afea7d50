/**
 * Reads a reference fixture written by tests/reference/generate.py (outside libraries: iapws,
 * fluids, scipy). The fixture records which library versions and calls produced it.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export interface Fixture<C> {
  description: string;
  generator: string;
  libraries: Record<string, string>;
  calls: Record<string, unknown>;
  cases: C[];
  [extra: string]: unknown;
}

/** Parse tests/fixtures/<name>. */
export function loadFixture<C>(name: string): Fixture<C> {
  const url = new URL(`../../fixtures/${name}`, import.meta.url);
  return JSON.parse(readFileSync(fileURLToPath(url), 'utf8')) as Fixture<C>;
}

/** |a/b − 1|, the relative deviation used by every tolerance here. */
export function relDev(a: number, b: number): number {
  return Math.abs(a / b - 1);
}

/** A line for the test log: the largest deviation seen, so the report can quote it. */
export function logMax(label: string, devs: number[]): void {
  const max = Math.max(...devs);
  console.info(`${label}: max relative deviation ${max.toExponential(2)} over ${devs.length}`);
}
