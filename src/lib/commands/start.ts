/**
 * `npm start` and `npm run dev`: build when stale, migrate, seed on first run, keep a local
 * AUTH_SECRET, start the fakes and the server, and stop everything on Ctrl-C or SIGTERM.
 */
import { spawn } from 'node:child_process';
import type { ChildProcess } from 'node:child_process';
import path from 'node:path';
import { fakeSpecs } from '../../../fakes/registry';
import { startFakes } from '../../../fakes/runner';
import { DEMO_USERS } from '../../../db/seed';
import { getConfig } from '../config';
import { openDatabase } from '../db/client';
import { prepareDatabase } from '../db/setup';
import { buildIsStale } from './build-check';
import { whenParentExits } from './parent-watch';
import { ensureAuthSecret } from './secret';
import { bundleServer } from './server-bundle';
import { serviceEnv } from './service-env';

const root = process.cwd();
const dev = process.argv.includes('--dev');
const astroBin = path.join(root, 'node_modules', '.bin', 'astro');

/** Every child started so far, stopped in reverse order on shutdown. */
const running: { stop: () => Promise<void> }[] = [];
let stopping = false;

async function shutdown(code: number): Promise<never> {
  if (!stopping) {
    stopping = true;
    for (const part of running.reverse()) await part.stop();
  }
  process.exit(code);
}

async function main(): Promise<void> {
  process.on('SIGINT', () => void shutdown(0));
  process.on('SIGTERM', () => void shutdown(0));
  whenParentExits(() => void shutdown(0));
  const config = getConfig();
  process.env.ASTRO_TELEMETRY_DISABLED = '1';
  process.env.AUTH_SECRET = ensureAuthSecret(config.dataDir);

  if (!dev && buildIsStale(root)) {
    console.log('Building Drainwright (sources changed since the last build)…');
    const code = await supervise(
      spawn(astroBin, ['build'], {
        stdio: 'inherit',
        env: { ...process.env, NODE_ENV: 'production' },
      }),
    );
    if (code !== 0) throw new Error('astro build failed');
  }

  const db = openDatabase(config.databaseFile);
  const { seeded } = prepareDatabase(db);
  db.$client.close();

  const fakes = await startFakes(fakeSpecs(config.dataDir));
  running.push(fakes);
  Object.assign(process.env, serviceEnv(fakes.fakes));

  const server = startServer(config.host, config.port, dev ? undefined : await bundleServer(root));
  void supervise(server).then((code) => shutdown(code ?? 0));
  printBanner(config.publicUrl, seeded, fakes.fakes);
}

/**
 * npm does not always pass SIGTERM on to the script it runs; when whoever started us goes away
 * (we are re-parented), stop too rather than leave the server and fakes orphaned.
 */
/** Track a child so shutdown stops it; resolves with its exit code. */
function supervise(child: ChildProcess): Promise<number | null> {
  const exited = new Promise<number | null>((resolve) =>
    child.once('exit', (code) => resolve(code)),
  );
  running.push({
    stop: async () => {
      if (child.exitCode !== null || child.signalCode !== null) return;
      child.kill('SIGTERM');
      await exited;
    },
  });
  return exited;
}

/** The dev server, or the production wrapper from its bundle (see server-bundle.ts). */
function startServer(host: string, port: number, bundle?: string): ChildProcess {
  const env = { ...process.env, HOST: host, PORT: String(port) };
  if (!bundle) {
    return spawn(astroBin, ['dev', '--host', host, '--port', String(port)], {
      stdio: 'inherit',
      env,
    });
  }
  return spawn(process.execPath, [bundle], { stdio: 'inherit', env });
}

function printBanner(url: string, seeded: boolean, fakes: { name: string; url: string }[]): void {
  const lines = [
    '',
    `Drainwright is running at ${url}${seeded ? '  (demo data seeded)' : ''}`,
    ...fakes.map((f) => `  fake ${f.name}: ${f.url}`),
    '',
    'Demo sign-ins (open the link from the fake inbox):',
    ...DEMO_USERS.map((u) => `  ${u.role.padEnd(8)} ${u.email}`),
    '',
    'Press Ctrl-C to stop.',
  ];
  console.log(lines.join('\n'));
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  void shutdown(1);
});
