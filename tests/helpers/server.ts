import { spawn } from 'node:child_process';
import type { ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

export interface StartedApp {
  url: string;
  dataDir: string;
  child: ChildProcess;
  output: () => string;
  /** Send a signal to the whole process group (default Ctrl-C's SIGINT); resolves on exit. */
  stop: (signal?: NodeJS.Signals) => Promise<number | null>;
}

/**
 * Run `npm start` (the real start command on the built app) on a given port and a temp DATA_DIR.
 * With `logFile` its output goes straight to that file instead of through this process (a
 * benchmark must not spend its load generator's time reading the access log); output() is then
 * read from the file.
 */
export async function startApp(
  port: number,
  env: Record<string, string> = {},
  logFile?: string,
): Promise<StartedApp> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'dw-app-'));
  const out = logFile === undefined ? 'pipe' : fs.openSync(logFile, 'w');
  const child = spawn('npm', ['start', '--silent'], {
    env: { ...process.env, ...env, PORT: String(port), HOST: '127.0.0.1', DATA_DIR: dataDir },
    stdio: ['ignore', out, out],
    // Its own process group, so stop() can send Ctrl-C to the whole tree as a terminal would.
    detached: true,
  });
  if (typeof out === 'number') fs.closeSync(out);
  let log = '';
  child.stdout?.on('data', (d) => (log += d));
  child.stderr?.on('data', (d) => (log += d));
  const output = (): string => (logFile === undefined ? log : fs.readFileSync(logFile, 'utf8'));
  const url = `http://127.0.0.1:${port}`;
  await waitFor(`${url}/api/health`, child, output);
  const stop = (signal: NodeJS.Signals = 'SIGINT'): Promise<number | null> =>
    new Promise((resolve) => {
      if (child.exitCode !== null || child.signalCode !== null) return resolve(child.exitCode);
      child.once('exit', (code) => resolve(code));
      process.kill(-child.pid!, signal);
    });
  return { url, dataDir, child, output, stop };
}

async function waitFor(url: string, child: ChildProcess, log: () => string): Promise<void> {
  const deadline = Date.now() + 90_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`app exited early:\n${log()}`);
    try {
      if ((await fetch(url, { signal: AbortSignal.timeout(1000) })).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`app did not answer ${url}:\n${log()}`);
}

/** True when `url` answers 2xx within `timeoutMs`; false on any error or refusal. */
export async function answers(url: string, timeoutMs = 1000): Promise<boolean> {
  try {
    return (await fetch(url, { signal: AbortSignal.timeout(timeoutMs) })).ok;
  } catch {
    return false;
  }
}
