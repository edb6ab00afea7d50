import { spawn } from 'node:child_process';
import type { ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, test } from 'vitest';
import { lineRequest } from '../api/samples';

/**
 * SIGKILL the built server (the whole `npm start` process group: start command, server, fakes)
 * while many job saves are in flight, restart it on the same DATA_DIR, and check that every save
 * it acknowledged with a 2xx is still there and the database file is intact. The kill is
 * triggered by a count of acknowledgements, not a clock, so a slow machine only makes it slower.
 * What is required is SQLite's own promise (from its documentation on WAL mode): a committed
 * transaction survives the process dying, with synchronous=NORMAL included.
 */

const PORT = 18700;
const RESTART_PORT = 18702;
const WORKERS = 16;
/** Kill once this many saves were acknowledged (jobs and calculations together). */
const KILL_AFTER = 120;
/** Safety stop per worker, so a server that refuses everything cannot loop forever. */
const MAX_PER_WORKER = 400;
const OWNER = 'usr_demo_owner';
const ORG = 'org_demo_heronsgate';
const DB_FILE = 'drainwright.sqlite';

interface Running {
  url: string;
  child: ChildProcess;
  log: () => string;
}

let dataDir = '';
const started: ChildProcess[] = [];

/** `npm start` on a given DATA_DIR in its own process group (as tests/helpers/server.ts does). */
async function launch(port: number): Promise<Running> {
  const child = spawn('npm', ['start', '--silent'], {
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', DATA_DIR: dataDir },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true,
  });
  started.push(child);
  let out = '';
  child.stdout?.on('data', (d) => (out += d));
  child.stderr?.on('data', (d) => (out += d));
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 120_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`app exited early:\n${out}`);
    const up = await fetch(`${url}/api/health`, { signal: AbortSignal.timeout(2000) }).then(
      (r) => r.ok,
      () => false,
    );
    if (up) return { url, child, log: () => out };
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`app did not answer ${url}:\n${out}`);
}

/** Signal the whole group and wait until no process of it is left. */
async function killGroup(child: ChildProcess, signal: NodeJS.Signals): Promise<void> {
  try {
    process.kill(-child.pid!, signal);
  } catch {
    return; // already gone
  }
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    try {
      process.kill(-child.pid!, 0);
    } catch {
      return;
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('process group still alive after the signal');
}

/** Sign the owner in the way Auth.js does it: a database session row and its cookie. */
function signIn(url: string): Record<string, string> {
  const db = new Database(path.join(dataDir, DB_FILE));
  const token = `crash-${OWNER}-${'x'.repeat(24)}`;
  db.prepare(
    'insert or replace into sessions (session_token, user_id, expires) values (?, ?, ?)',
  ).run(token, OWNER, Date.now() + 86_400_000);
  db.close();
  return {
    cookie: `authjs.session-token=${token}`,
    origin: url,
    'content-type': 'application/json',
  };
}

interface Stream {
  jobs: string[];
  calculations: { jobId: string; id: string }[];
  /** Failures seen before the kill was sent: any is a defect (5xx, refused, reset). */
  failuresBeforeKill: string[];
  lostInFlight: number;
}

/** Run the workers until the kill has happened; each alternates a new job and a calculation. */
async function saveStream(
  url: string,
  headers: Record<string, string>,
  kill: () => Promise<void>,
): Promise<Stream> {
  const s: Stream = { jobs: [], calculations: [], failuresBeforeKill: [], lostInFlight: 0 };
  let killing: Promise<void> | null = null;
  const acked = (): number => s.jobs.length + s.calculations.length;
  const post = async (p: string, body: unknown): Promise<Record<string, { id: string }> | null> => {
    try {
      const r = await fetch(url + p, { method: 'POST', headers, body: JSON.stringify(body) });
      const text = await r.text();
      if (r.status >= 200 && r.status < 300) return JSON.parse(text);
      if (!killing) s.failuresBeforeKill.push(`${p} ${r.status} ${text.slice(0, 200)}`);
    } catch (e) {
      if (!killing) s.failuresBeforeKill.push(`${p} ${String(e)}`);
      else s.lostInFlight += 1;
    }
    return null;
  };
  const worker = async (w: number): Promise<void> => {
    let mine: string | null = null;
    for (let i = 0; i < MAX_PER_WORKER && !killing; i += 1) {
      if (mine && i % 2 === 1) {
        const body = {
          tool: 'line',
          label: `crash ${w}.${i}`,
          inputs: lineRequest,
          unitSystem: 'metric',
        };
        const res = await post(`/api/jobs/${mine}/calculations`, body);
        if (res) s.calculations.push({ jobId: mine, id: res.calculation.id });
      } else {
        const res = await post('/api/jobs', {
          title: `Crash test ${w}.${i}`,
          notes: 'x'.repeat(500),
        });
        if (res) {
          mine = res.job.id;
          s.jobs.push(mine);
        }
      }
      if (acked() >= KILL_AFTER && !killing) killing = kill();
    }
  };
  await Promise.all(Array.from({ length: WORKERS }, (_, w) => worker(w)));
  await killing;
  return s;
}

/** Acknowledged saves absent from the database file as it is now, read without changing it. */
function missingInFile(s: Stream): string[] {
  const db = new Database(path.join(dataDir, DB_FILE), { readonly: true, fileMustExist: true });
  expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
  const ids = (sql: string): Set<string> =>
    new Set((db.prepare(sql).all() as { id: string }[]).map((r) => r.id));
  const jobs = ids(`select id from jobs where organisation_id = '${ORG}'`);
  const calcs = ids('select id from calculations');
  db.close();
  return [
    ...s.jobs.filter((id) => !jobs.has(id)),
    ...s.calculations.filter((c) => !calcs.has(c.id)).map((c) => c.id),
  ];
}

/** Acknowledged saves the running app does not serve. */
async function missingInApi(url: string, s: Stream): Promise<string[]> {
  const headers = signIn(url);
  const missing: string[] = [];
  for (const id of s.jobs) {
    const r = await fetch(`${url}/api/jobs/${id}`, { headers });
    if (r.status !== 200) missing.push(`${id} ${r.status}`);
  }
  for (const jobId of new Set(s.calculations.map((c) => c.jobId))) {
    const r = await fetch(`${url}/api/jobs/${jobId}/calculations`, { headers });
    const ids = new Set(((await r.json()).calculations as { id: string }[]).map((c) => c.id));
    for (const c of s.calculations) if (c.jobId === jobId && !ids.has(c.id)) missing.push(c.id);
  }
  return missing;
}

afterAll(async () => {
  for (const child of started) await killGroup(child, 'SIGKILL').catch(() => undefined);
  if (dataDir) fs.rmSync(dataDir, { recursive: true, force: true });
});

describe('crash safety of job saves', () => {
  test('does keep every acknowledged save and an intact database across a SIGKILL', async () => {
    dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'dw-crash-'));
    const first = await launch(PORT);
    const kill = (): Promise<void> => killGroup(first.child, 'SIGKILL');
    const s = await saveStream(first.url, signIn(first.url), kill);
    expect(s.failuresBeforeKill).toEqual([]);
    expect(s.jobs.length + s.calculations.length).toBeGreaterThanOrEqual(KILL_AFTER);
    const wal = fs.statSync(path.join(dataDir, `${DB_FILE}-wal`), { throwIfNoEntry: false });
    console.log(
      `crash test: ${s.jobs.length} jobs and ${s.calculations.length} calculations acknowledged, ` +
        `${s.lostInFlight} requests cut off by the kill, WAL left behind ${wal?.size ?? 0} bytes`,
    );
    // First the file as the kill left it (WAL not checkpointed), then the restarted app.
    expect(missingInFile(s)).toEqual([]);
    const second = await launch(RESTART_PORT);
    expect(await missingInApi(second.url, s)).toEqual([]);
    await killGroup(second.child, 'SIGINT');
    expect(missingInFile(s)).toEqual([]);
    const after = new Database(path.join(dataDir, DB_FILE), { fileMustExist: true });
    expect(after.pragma('foreign_key_check')).toEqual([]);
    after.close();
  }, 600_000);
});
