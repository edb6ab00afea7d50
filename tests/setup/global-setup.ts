import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { fakeSpecs } from '../../fakes/registry';
import { startFakes } from '../../fakes/runner';
import { buildIsStale } from '../../src/lib/commands/build-check';
import { serviceEnv } from '../../src/lib/commands/service-env';

/**
 * Once per test run: build the app when dist/ is missing or stale, so that tests which start the
 * real server (start command, browser tests) share one fresh build instead of racing to make it.
 * Then start every registered fake on free ports with a temp data dir, and hand their URLs to
 * the tests: env FAKE_<NAME>_URL plus the service env that points each SDK at its fake (also
 * available as inject('fakeEnv')). Apps started by tests run their own fakes.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  build();
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'dw-fakes-'));
  const specs = fakeSpecs(dataDir);
  for (const spec of specs) spec.port = await freePort();
  const running = await startFakes(specs, true);
  const env: Record<string, string> = {};
  for (const fake of running.fakes) env[`FAKE_${fake.name.toUpperCase()}_URL`] = fake.url;
  Object.assign(env, serviceEnv(running.fakes));
  Object.assign(process.env, env);
  project.provide('fakeEnv', env);
  return async () => {
    await running.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
}

function build(): void {
  const root = process.cwd();
  if (!buildIsStale(root)) return;
  const astro = path.join(root, 'node_modules', '.bin', 'astro');
  const result = spawnSync(astro, ['build'], {
    stdio: ['ignore', 'ignore', 'inherit'],
    // vitest sets NODE_ENV=test, which would make Vite bundle React's development build.
    env: { ...process.env, ASTRO_TELEMETRY_DISABLED: '1', NODE_ENV: 'production' },
  });
  if (result.status !== 0) throw new Error('astro build failed before the tests');
}

/** A port nothing listens on right now (the OS picks it). */
function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

declare module 'vitest' {
  export interface ProvidedContext {
    fakeEnv: Record<string, string>;
  }
}
