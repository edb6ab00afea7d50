/**
 * API speed goals (`npm run bench:api`; not part of the test suite). Builds when stale, starts the
 * real built app (rate limit lifted with CALC_RATE_LIMIT_PER_MINUTE=0) and a bare node:http server
 * answering fixed JSON, then loads each with autocannon: 20 connections, 2 s to warm up, then 10 s. Goals: the app's
 * POST /api/v1/siphon at least 50 % of the bare server's requests per second, p99 ≤ 50 ms, no errors.
 */
import autocannon from 'autocannon';
import { spawn, spawnSync } from 'node:child_process';
import type { ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildIsStale } from '../../src/lib/commands/build-check';
import { startApp } from '../helpers/server';

const APP_PORT = 16190;
const BARE_PORT = 16191;
const SECONDS = Number(process.env.BENCH_SECONDS) || 10;

const siphonBody = JSON.stringify({
  fluid: { water_temperature_c: 15 },
  site: { altitude_m: 300 },
  line: { inner_diameter_m: 0.0381, length_m: 30, material: 'pvc', minor_loss_k: 1.2 },
  source_level_m: 2,
  outlet_elevation_m: -3,
  crest_elevation_m: 4.5,
  length_to_crest_m: 8,
  minor_loss_k_to_crest: 0.6,
});

interface Figures {
  rps: number;
  p99: number;
  errors: number;
}

async function load(url: string, seconds = SECONDS): Promise<Figures> {
  const r = await autocannon({
    url,
    connections: 20,
    duration: seconds,
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: siphonBody,
  });
  const bad = r.non2xx + r.errors + r.timeouts;
  return { rps: r.requests.average, p99: r.latency.p99, errors: bad };
}

/** The floor: a bare node:http server in its own process (as the app is), fixed JSON. */
function bareServer(): Promise<ChildProcess> {
  const code = `
    const fixed = JSON.stringify({ status: 'runs', flow_m3_s: 0.0041 });
    require('node:http').createServer((req, res) => {
      req.resume();
      req.on('end', () => { res.writeHead(200, { 'content-type': 'application/json' }); res.end(fixed); });
    }).listen(${BARE_PORT}, '127.0.0.1', () => console.log('up'));`;
  const child = spawn(process.execPath, ['-e', code], { stdio: ['ignore', 'pipe', 'inherit'] });
  return new Promise((resolve) => child.stdout!.once('data', () => resolve(child)));
}

async function main(): Promise<void> {
  const root = process.cwd();
  if (buildIsStale(root)) {
    console.log('Building…');
    const astro = path.join(root, 'node_modules', '.bin', 'astro');
    if (spawnSync(astro, ['build'], { stdio: 'inherit' }).status !== 0)
      throw new Error('build failed');
  }
  // Production's info level: one access-log line per request, written to a file, not to us.
  const logFile = path.join(os.tmpdir(), `dw-bench-api-${process.pid}.log`);
  const app = await startApp(
    APP_PORT,
    { CALC_RATE_LIMIT_PER_MINUTE: '0', LOG_LEVEL: 'info' },
    logFile,
  );
  const bare = await bareServer();
  try {
    // Each server is warmed up first (2 s, not counted), so its JIT-compiled code is measured.
    const floor = await load(`http://127.0.0.1:${BARE_PORT}/`, 2).then(() =>
      load(`http://127.0.0.1:${BARE_PORT}/`),
    );
    const siphon = await load(`${app.url}/api/v1/siphon`, 2).then(() =>
      load(`${app.url}/api/v1/siphon`),
    );
    const ratio = siphon.rps / floor.rps;
    const row = (name: string, f: Figures): string =>
      `${name.padEnd(26)} ${f.rps.toFixed(0).padStart(8)} req/s   p99 ${String(f.p99).padStart(4)} ms   errors ${f.errors}`;
    console.log(`\n20 connections, ${SECONDS} s each`);
    console.log(row('bare node:http (floor)', floor));
    console.log(row('POST /api/v1/siphon', siphon));
    console.log(`ratio ${(ratio * 100).toFixed(1)} % of the floor`);
    const ok = ratio >= 0.5 && siphon.p99 <= 50 && siphon.errors === 0;
    console.log(`goals (≥ 50 %, p99 ≤ 50 ms, 0 errors): ${ok ? 'met' : 'NOT met'}`);
    process.exitCode = ok ? 0 : 1;
  } finally {
    bare.kill();
    await app.stop();
    fs.rmSync(logFile, { force: true });
  }
}

void main();
