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
    if (msg.id === undefined) return;
    waiting.get(msg.id)?.(msg.result);
    waiting.delete(msg.id);
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

export interface Memory {
  cold: number;
  /** Idle, the settle time after the warm-up load stopped: uncollected, then after a full collection. */
  before: Reading;
  /** The moment the soak load stopped. */
  end: number;
  /** Idle, the settle time after the soak load stopped (same footing as `before`). */
  after: Reading;
  /** Sampled every 10 s while loaded. */
  trend: number[];
}

export interface Reading {
  rss: number;
  rssCollected: number;
  heapCollected: number;
}

/** Print the readings; returns the growth the goal is judged on (RSS after a full GC). */
export function printMemory(m: Memory, pid: number, settleS: number): number {
  const pct = (x: number, base: number): string => `${(((x - base) / base) * 100).toFixed(1)} %`;
  const mib = (x: number): string => `${x.toFixed(1)} MiB`;
  const { before: b, after: a } = m;
  console.log(`server memory (pid ${pid}; RSS from /proc/${pid}/status, heap from its inspector):`);
  console.log(`  cold RSS ${mib(m.cold)}; RSS at the end of the load ${mib(m.end)}`);
  console.log(`  every 10 s under load: ${m.trend.map((x) => x.toFixed(0)).join(' ')} MiB RSS`);
  console.log(`  idle ${settleS} s, before → after the soak:`);
  console.log(`    RSS, uncollected      ${mib(b.rss)} → ${mib(a.rss)} (${pct(a.rss, b.rss)})`);
  console.log(
    `    RSS after a full GC   ${mib(b.rssCollected)} → ${mib(a.rssCollected)} (${pct(a.rssCollected, b.rssCollected)})`,
  );
  console.log(
    `    heap after a full GC  ${mib(b.heapCollected)} → ${mib(a.heapCollected)} (${pct(a.heapCollected, b.heapCollected)})`,
  );
  return (a.rssCollected - b.rssCollected) / b.rssCollected;
}
