/**
 * The built app's scripts carry V8's explicit compile hint where it helps (see
 * src/lib/build/compile-hints.ts): every script a tool page loads at start-up begins with
 * `//# allFunctionsCalledOnLoad`, while the charts, loaded on demand, do not.
 */
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { COMPILE_HINT } from '../../src/lib/build/compile-hints';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';

let app: StartedApp;

beforeAll(async () => {
  app = await startApp(16310);
}, 300_000);

afterAll(async () => {
  await app?.stop();
});

async function script(path: string): Promise<string> {
  const res = await fetch(`${app.url}${path}`);
  expect(res.status, path).toBe(200);
  return res.text();
}

/** The scripts an island page names: island components and their renderer. */
async function islandScripts(page: string): Promise<string[]> {
  const html = await (await fetch(`${app.url}${page}`)).text();
  const urls = [...html.matchAll(/(?:component|renderer)-url="([^"]+)"/g)].map((m) => m[1]);
  return [...new Set(urls)];
}

/** The files a script imports statically, as absolute paths. */
function staticImports(code: string): string[] {
  return [...code.matchAll(/(?:^|[;}])\s*import\s*(?:[^"'()]*?from\s*)?"(\.\/[^"]+)"/g)].map(
    (m) => `/_astro/${m[1].slice(2)}`,
  );
}

describe('compile hints in the build', () => {
  test('does begin every start-up script of the siphon tool with the hint', async () => {
    const scripts = await islandScripts('/siphon');
    expect(scripts.length).toBeGreaterThanOrEqual(2);
    const seen = new Set<string>();
    const queue = [...scripts];
    while (queue.length > 0) {
      const path = queue.shift()!;
      if (seen.has(path)) continue;
      seen.add(path);
      const code = await script(path);
      expect(code.startsWith(COMPILE_HINT), path).toBe(true);
      queue.push(...staticImports(code));
    }
    // the renderer, React, the engine and the tool at least
    expect(seen.size).toBeGreaterThanOrEqual(5);
  });

  test('does not hint the chart, which loads only when it is shown', async () => {
    const [tool] = (await islandScripts('/siphon')).filter((p) => p.includes('SiphonTool'));
    const chart = (await script(tool)).match(/_astro\/(CrestPressureChart\.[\w-]+\.js)/)?.[1];
    expect(chart).toBeDefined();
    expect((await script(`/_astro/${chart}`)).startsWith(COMPILE_HINT)).toBe(false);
  });
});
