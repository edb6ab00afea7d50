import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, test } from 'vitest';
import { answers } from '../helpers/server';

/** True while a process with this pid exists. */
function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

async function until(check: () => Promise<boolean> | boolean, ms: number): Promise<boolean> {
  const deadline = Date.now() + ms;
  while (Date.now() < deadline) {
    if (await check()) return true;
    await new Promise((r) => setTimeout(r, 100));
  }
  return false;
}

describe('a fake whose starter is killed outright', () => {
  test.each([
    ['resend', 17821],
    ['stripe', 17822],
  ])(
    'does exit and free its port (%s)',
    async (name, port) => {
      const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dw-orphan-'));
      const entry = path.resolve(`fakes/${name}/server.ts`);
      // A shell stands in for the start command: it starts the fake, prints its pid, and waits.
      const starter = spawn(
        'sh',
        ['-c', `"${process.execPath}" --import tsx "${entry}" & echo $!; wait`],
        {
          env: {
            ...process.env,
            PORT: String(port),
            FAKE_RESEND_DIR: dir,
            FAKE_STRIPE_DATA_DIR: dir,
          },
          stdio: ['ignore', 'pipe', 'ignore'],
        },
      );
      const pid = await new Promise<number>((resolve) =>
        starter.stdout.once('data', (d) => resolve(Number(String(d).trim()))),
      );
      try {
        expect(await until(() => answers(`http://127.0.0.1:${port}/health`, 500), 20_000)).toBe(
          true,
        );
        starter.kill('SIGKILL');
        expect(await until(() => !alive(pid), 5000)).toBe(true);
        expect(await answers(`http://127.0.0.1:${port}/health`, 500)).toBe(false);
      } finally {
        if (alive(pid)) process.kill(pid, 'SIGKILL');
      }
    },
    40_000,
  );
});
