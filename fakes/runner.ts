import { spawn } from 'node:child_process';
import type { ChildProcess } from 'node:child_process';

/** One local stand-in of a hosted service: a TypeScript entry that listens on PORT. */
export interface FakeSpec {
  name: string;
  /** Absolute path of the fake's server entry. */
  entry: string;
  port: number;
  /** Path answered with 2xx once the fake is ready. */
  healthPath?: string;
  env?: Record<string, string>;
}

export interface RunningFake {
  name: string;
  port: number;
  url: string;
}

export interface RunningFakes {
  fakes: RunningFake[];
  stop(): Promise<void>;
}

const READY_TIMEOUT_MS = 20_000;

/** Start every fake as its own process, wait until each answers, and return a handle to stop them. */
export async function startFakes(specs: FakeSpec[], quiet = false): Promise<RunningFakes> {
  const children: ChildProcess[] = [];
  const handle: RunningFakes = { fakes: [], stop: () => stopAll(children) };
  try {
    for (const spec of specs) {
      const child = spawn(process.execPath, ['--import', 'tsx', spec.entry], {
        env: { ...process.env, ...spec.env, PORT: String(spec.port), HOST: '127.0.0.1' },
        stdio: quiet ? 'ignore' : ['ignore', 'inherit', 'inherit'],
      });
      children.push(child);
      const url = `http://127.0.0.1:${spec.port}`;
      await waitUntilReady(child, `${url}${spec.healthPath ?? '/health'}`, spec.name);
      handle.fakes.push({ name: spec.name, port: spec.port, url });
    }
  } catch (error) {
    await handle.stop();
    throw error;
  }
  return handle;
}

async function waitUntilReady(child: ChildProcess, url: string, name: string): Promise<void> {
  const deadline = Date.now() + READY_TIMEOUT_MS;
  while (Date.now() < deadline) {
    if (child.exitCode !== null || child.signalCode !== null) {
      throw new Error(`fake ${name} exited before it was ready`);
    }
    try {
      const res = await fetch(url, { signal: AbortSignal.timeout(1000) });
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`fake ${name} did not answer ${url} within ${READY_TIMEOUT_MS} ms`);
}

/** SIGTERM each fake, then SIGKILL any that have not exited within a few seconds. */
async function stopAll(children: ChildProcess[]): Promise<void> {
  await Promise.all(children.map((child) => stopOne(child)));
}

function stopOne(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const timer = setTimeout(() => child.kill('SIGKILL'), 5000);
    child.once('exit', () => {
      clearTimeout(timer);
      resolve();
    });
    child.kill('SIGTERM');
  });
}
