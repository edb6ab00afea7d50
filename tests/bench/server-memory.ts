/**
 * The soak's memory readings of the server process: resident memory from /proc, and, through
 * the V8 inspector, a full garbage collection and the heap left after it. A leak survives a
 * collection; garbage V8 has not yet bothered to collect does not, so the goal is judged on
 * readings taken after one, and the uncollected ones are printed beside them.
 */
import fs from 'node:fs';
import WebSocket from 'ws';

/** The `node dist/serve.mjs` process in the app's process group (the one answering requests). */
export function serverPid(group: number): number {
  for (const entry of fs.readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const cmd = fs.readFileSync(`/proc/${entry}/cmdline`, 'utf8');
      const stat = fs.readFileSync(`/proc/${entry}/stat`, 'utf8');
      const pgrp = Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[2]);
      if (pgrp === group && (cmd.includes('dist/serve.mjs') || cmd.includes('commands/serve.ts')))
        return Number(entry);
    } catch {
      // the process ended while we looked
    }
  }
  throw new Error('server process not found');
}

/** Resident memory of a process in MiB, from /proc/PID/status. */
export function rssMiB(pid: number): number {
  const status = fs.readFileSync(`/proc/${pid}/status`, 'utf8');
  return Number(/VmRSS:\s+(\d+) kB/.exec(status)?.[1] ?? NaN) / 1024;
}

export interface HeapProbe {
  /** Run a full collection, wait for the pages to go back, return the heap in use (MiB). */
  collect: () => Promise<number>;
  close: () => void;
}

/**
 * Open the server's inspector: SIGUSR1 starts it on the --inspect-port the server was given
 * (only the signalled process listens, though its fakes inherit the option).
 */
export async function openHeapProbe(pid: number, port: number): Promise<HeapProbe> {
  process.kill(pid, 'SIGUSR1');
  let url = '';
  for (let i = 0; i < 50 && !url; i++) {
    url = await fetch(`http://127.0.0.1:${port}/json/list`)
      .then(
        async (r) =>
          ((await r.json()) as { webSocketDebuggerUrl: string }[])[0].webSocketDebuggerUrl,
      )
      .catch(() => new Promise<string>((r) => setTimeout(() => r(''), 200)));
  }
  if (!url) throw new Error(`the server's inspector did not open on port ${port}`);
  const ws = new WebSocket(url);
  await new Promise((resolve, reject) => ws.once('open', resolve).once('error', reject));
  let id = 0;
  const waiting = new Map<number, (result: unknown) => void>();
  ws.on('message', (m) => {
    const msg = JSON.parse(String(m)) as { id?: number; result?: unknown };
    if (msg.id !== undefined) waiting.get(msg.id)?.(msg.result);
  });
  const call = <T>(method: string): Promise<T> =>
    new Promise((resolve) => {
      waiting.set(++id, resolve as (r: unknown) => void);
      ws.send(JSON.stringify({ id, method }));
    });
  return {
    collect: async () => {
      await call('HeapProfiler.collectGarbage');
      await new Promise((r) => setTimeout(r, 2000));
      return (await call<{ usedSize: number }>('Runtime.getHeapUsage')).usedSize / 2 ** 20;
    },
    close: () => ws.close(),
  };
}
