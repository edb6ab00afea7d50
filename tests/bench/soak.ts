/**
 * Soak (`npm run bench:soak`; not part of the test suite). Builds when stale, starts the real
 * built app on a temp DATA_DIR, warms it up, then loads it with autocannon (50 connections, 60 s)
 * with a mix of public pages, calculation API calls and signed-in job reads and writes. Prints
 * requests/s, p50, p99, errors and the server process's resident memory (from /proc of the
 * server, not of this script) before and after, each read after the same idle pause, plus the
 * reading the moment the load stops. Goals: zero errors, RSS growth under 20 % (readings after a
 * full collection, forced through the server's inspector; see server-memory.ts).
 * SOAK_SECONDS, SOAK_CONNECTIONS and SOAK_WARMUP_SECONDS override the defaults.
 */
import autocannon from 'autocannon';
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { buildIsStale } from '../../src/lib/commands/build-check';
import { drainRequest, lineRequest, siphonRequest } from '../api/samples';
import { startApp } from '../helpers/server';
import { openHeapProbe, printMemory, rssMiB, serverPid } from './server-memory';
import type { Memory, Reading } from './server-memory';

const PORT = 18660;
/** The server's inspector, opened by the bench only to force a collection before a reading. */
const INSPECT_PORT = 18661;
const SECONDS = Number(process.env.SOAK_SECONDS) || 60;
const CONNECTIONS = Number(process.env.SOAK_CONNECTIONS) || 50;
const WARMUP = Number(process.env.SOAK_WARMUP_SECONDS) || 10;
/** Idle seconds before each memory reading, so both are taken on the same (quiet) footing. */
const SETTLE = 15;
const GOAL_GROWTH = 0.2;

/**
 * Limits lifted so the soak measures the app, not its 429s: the calculation API limiter is off
 * (0). Sign-in limits are never met (the bench signs in with a session row, as Auth.js stores it,
 * not through the sign-in form) and no flags are sent, so their limiters stay as configured.
 */
const SOAK_ENV = { CALC_RATE_LIMIT_PER_MINUTE: '0' };

type Req = autocannon.Request;
type OnResponse = Extract<autocannon.Request['onResponse'], (...args: never[]) => void>;
/** Per-connection state autocannon keeps through one round of the mix. */
type Ctx = { jobId?: string };
const tally = new Map<string, { n: number; bad: number }>();

/** Count each answer by kind, so errors can be traced to a part of the mix. */
function counted(kind: string, req: Req): Req {
  const onResponse = req.onResponse as OnResponse | undefined;
  return {
    ...req,
    onResponse: (status, body, context, headers) => {
      const t = tally.get(kind) ?? { n: 0, bad: 0 };
      t.n += 1;
      if (status < 200 || status >= 300) t.bad += 1;
      tally.set(kind, t);
      onResponse?.(status, body, context, headers);
    },
  };
}

/** One connection's round: pages, calculations, then create → read → change → list a job. */
function mix(cookie: string, origin: string): Req[] {
  const json = { 'content-type': 'application/json' };
  const signedIn = { cookie, origin, ...json };
  const calc = (tool: string, body: unknown): Req =>
    counted(`POST /api/v1/${tool}`, {
      method: 'POST',
      path: `/api/v1/${tool}`,
      headers: json,
      body: JSON.stringify(body),
    });
  const page = (p: string): Req => counted(`GET ${p}`, { method: 'GET', path: p });
  const jobId = (context: object): string => (context as Ctx).jobId ?? 'none';
  return [
    page('/'),
    calc('siphon', siphonRequest),
    page('/check'),
    calc('line', lineRequest),
    page('/siphon'),
    calc('drain', drainRequest),
    page('/guides/priming-a-siphon'),
    counted('POST /api/jobs', {
      method: 'POST',
      path: '/api/jobs',
      headers: signedIn,
      body: JSON.stringify({ title: 'Soak job', client: 'Soak', notes: 'x'.repeat(300) }),
      onResponse: (status, body, context) => {
        if (status !== 201) return;
        (context as Ctx).jobId = (JSON.parse(body) as { job: { id: string } }).job.id;
      },
    }),
    counted('GET /api/jobs/:id', {
      method: 'GET',
      headers: signedIn,
      setupRequest: (req, context) => ({ ...req, path: `/api/jobs/${jobId(context)}` }),
    }),
    counted('POST /api/jobs/:id/calculations', {
      method: 'POST',
      headers: signedIn,
      body: JSON.stringify({ tool: 'line', inputs: lineRequest, unitSystem: 'metric' }),
      setupRequest: (req, context) => ({
        ...req,
        path: `/api/jobs/${jobId(context)}/calculations`,
      }),
    }),
    counted('PATCH /api/jobs/:id', {
      method: 'PATCH',
      headers: signedIn,
      body: JSON.stringify({ status: 'quoted' }),
      setupRequest: (req, context) => ({ ...req, path: `/api/jobs/${jobId(context)}` }),
    }),
    counted('GET /api/jobs', { method: 'GET', path: '/api/jobs?sort=updated', headers: signedIn }),
  ];
}

/** Sign the demo owner in the way Auth.js stores it: a session row, sent as its cookie. */
function signIn(dataDir: string): string {
  const db = new Database(path.join(dataDir, 'drainwright.sqlite'));
  const token = `soak-usr_demo_owner-${'x'.repeat(24)}`;
  db.prepare(
    'insert or replace into sessions (session_token, user_id, expires) values (?, ?, ?)',
  ).run(token, 'usr_demo_owner', Date.now() + 86_400_000);
  db.close();
  return `authjs.session-token=${token}`;
}

function run(url: string, cookie: string, seconds: number): Promise<autocannon.Result> {
  const requests = mix(cookie, url);
  return autocannon({ url, connections: CONNECTIONS, duration: seconds, requests, timeout: 30 });
}

function build(): void {
  if (!buildIsStale(process.cwd())) return;
  console.log('Building…');
  const astro = path.join(process.cwd(), 'node_modules', '.bin', 'astro');
  const env = { ...process.env, NODE_ENV: 'production' };
  if (spawnSync(astro, ['build'], { stdio: 'inherit', env }).status !== 0) {
    throw new Error('build failed');
  }
}

function report(r: autocannon.Result, memory: Memory, pid: number): boolean {
  const errors = r.errors + r.timeouts + r.non2xx;
  const limits = Object.entries(SOAK_ENV).map(([k, v]) => `${k}=${v}`);
  console.log(`\nsoak: ${CONNECTIONS} connections, ${SECONDS} s, after a ${WARMUP} s warm-up`);
  console.log(`limits: ${limits.join(' ')} (calculation API limiter off)`);
  console.log(`requests   ${r.requests.total} total, ${r.requests.average.toFixed(0)} req/s`);
  console.log(
    `latency    p50 ${r.latency.p50} ms   p99 ${r.latency.p99} ms   max ${r.latency.max} ms`,
  );
  console.log(
    `errors     ${errors} (non-2xx ${r.non2xx}, socket errors ${r.errors}, timeouts ${r.timeouts})`,
  );
  for (const [kind, t] of tally)
    console.log(`  ${kind.padEnd(34)} ${String(t.n).padStart(7)}  bad ${t.bad}`);
  const growth = printMemory(memory, pid, SETTLE);
  const load = os.loadavg().map((l) => l.toFixed(2));
  console.log(`load avg   ${load.join(' ')} (1, 5, 15 min) on ${os.cpus().length} cores`);
  const ok = errors === 0 && growth < GOAL_GROWTH;
  console.log(
    `goals (0 errors, RSS growth after a full GC < ${GOAL_GROWTH * 100} %): ${ok ? 'met' : 'NOT met'}`,
  );
  return ok;
}

const idle = (seconds: number): Promise<void> => new Promise((r) => setTimeout(r, seconds * 1000));

async function main(): Promise<void> {
  build();
  const app = await startApp(PORT, {
    ...SOAK_ENV,
    NODE_OPTIONS: `--inspect-port=127.0.0.1:${INSPECT_PORT}`,
  });
  try {
    const pid = serverPid(app.child.pid!);
    const probe = await openHeapProbe(pid, INSPECT_PORT);
    const reading = async (): Promise<Reading> => {
      const rss = rssMiB(pid);
      const heapCollected = await probe.collect();
      return { rss, rssCollected: rssMiB(pid), heapCollected };
    };
    const cookie = signIn(app.dataDir);
    const cold = rssMiB(pid);
    await run(app.url, cookie, WARMUP);
    tally.clear();
    await idle(SETTLE);
    const before = await reading();
    // A trend, not just two points: a leak climbs steadily, a busy heap saws up and down.
    const trend: number[] = [];
    const sampler = setInterval(() => trend.push(rssMiB(pid)), 10_000);
    const result = await run(app.url, cookie, SECONDS);
    clearInterval(sampler);
    const end = rssMiB(pid);
    await idle(SETTLE);
    const memory = { cold, before, end, after: await reading(), trend };
    probe.close();
    process.exitCode = report(result, memory, pid) ? 0 : 1;
  } finally {
    await app.stop();
    fs.rmSync(app.dataDir, { recursive: true, force: true });
  }
}

void main();
