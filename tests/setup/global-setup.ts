import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { buildIsStale } from '../../src/lib/commands/build-check';

/**
 * Once per test run: build the app when dist/ is missing or stale, so that tests which start the
 * real server (start command, browser tests) share one fresh build instead of racing to make it.
 */
export default function setup(): void {
  const root = process.cwd();
  if (!buildIsStale(root)) return;
  const astro = path.join(root, 'node_modules', '.bin', 'astro');
  const result = spawnSync(astro, ['build'], {
    stdio: ['ignore', 'ignore', 'inherit'],
    env: { ...process.env, ASTRO_TELEMETRY_DISABLED: '1' },
  });
  if (result.status !== 0) throw new Error('astro build failed before the tests');
}
