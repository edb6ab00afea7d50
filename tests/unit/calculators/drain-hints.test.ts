import { describe, expect, test, vi } from 'vitest';
import { drainHints } from '../../../src/lib/calculators/drain-hints';
import { requestDrainHints } from '../../../src/lib/calculators/drain-hints-client';
import type { Hint } from '../../../src/lib/calculators/hints';
import type { DrainRequest } from '../../../src/lib/hydraulics';
import { formatQuantity, solveDrain } from '../../../src/lib/hydraulics';

const G = 9.80665; // standard gravity, m/s² (CGPM 1901)

// A 4 m × 3 m box from 1.8 m to 0.05 m through a sharp 50 mm hole (Cd 0.61) in its floor.
const BOX: DrainRequest = {
  vessel: { shape: 'box', length_m: 4, width_m: 3, depth_m: 2 },
  initial_depth_m: 1.8,
  final_depth_m: 0.05,
  outlet: { type: 'orifice', diameter_m: 0.05, discharge_coefficient: 0.61 },
};

/**
 * Torricelli's law integrated over the falling head of a prismatic tank with n holes:
 * t = A / (n·Cd·a) · √(2/g) · (√h0 − √h1) (any fluid-mechanics text's tank-draining example).
 */
function torricelliTime(holes: number): number {
  const a = (Math.PI * 0.05 ** 2) / 4;
  return ((4 * 3) / (holes * 0.61 * a)) * Math.sqrt(2 / G) * (Math.sqrt(1.8) - Math.sqrt(0.05));
}

const time = (s: number): string => formatQuantity('time', s, 'metric');

describe('drainHints', () => {
  test('does time one more hole by the Torricelli closed form', () => {
    // 2 holes: 2529 s = 42.2 min, far from a minute boundary, so the shown minute is exact
    const hints = drainHints(BOX, solveDrain(BOX), 'none', 0, 'metric');
    expect(hints).toContainEqual({
      id: 'more-lines',
      text: `More outlets: 2 holes like this take ${time(torricelliTime(2))}.`,
    });
  });

  test('does say how much longer than the time allowed the job needs', () => {
    // one hole: 5059 s (84.3 min) against an hour allowed, 1459 s (24.3 min) short
    const hints = drainHints(BOX, solveDrain(BOX), 'none', 3600, 'metric');
    const need = torricelliTime(1);
    expect(hints).toContainEqual({
      id: 'more-time',
      text: `More time: it needs ${time(need)}, ${time(need - 3600)} more than you have.`,
    });
  });
});

describe('requestDrainHints', () => {
  const job = {
    req: BOX,
    r: solveDrain(BOX),
    size: 'none',
    target: 3600,
    system: 'metric' as const,
  };

  test('does work the hints out on the main thread where no worker can start (as in Node)', async () => {
    const hints = await new Promise<Hint[]>((resolve) => requestDrainHints(job, resolve));
    expect(hints.map((h) => h.id)).toEqual(['more-lines', 'more-time']);
  });

  test('does drop the reply to a job cancelled before it is answered', async () => {
    const replies: Hint[][] = [];
    const cancel = requestDrainHints(job, (h) => replies.push(h));
    cancel();
    await new Promise<Hint[]>((resolve) => requestDrainHints(job, resolve));
    expect(replies).toEqual([]);
  });

  test('does keep one job in the worker and never send one cancelled while it waited', async () => {
    // a stand-in for the browser's Worker, so the queue can be watched (the real one is covered
    // by the browser tests)
    const posted: unknown[] = [];
    const made: QueueWorker[] = [];
    class QueueWorker {
      onmessage: ((e: { data: Hint[] }) => void) | null = null;
      onerror: (() => void) | null = null;
      constructor() {
        made.push(this);
      }
      postMessage(job: unknown): void {
        posted.push(job);
      }
      terminate(): void {}
    }
    vi.stubGlobal('Worker', QueueWorker);
    vi.resetModules();
    try {
      const client = await import('../../../src/lib/calculators/drain-hints-client');
      const got: string[] = [];
      const [a, b, c] = [1, 2, 3].map((target) => ({ ...job, target }));
      client.requestDrainHints(a!, () => got.push('a'));
      const cancelB = client.requestDrainHints(b!, () => got.push('b'));
      client.requestDrainHints(c!, () => got.push('c'));
      expect(posted).toEqual([a]); // b and c wait for a's reply
      cancelB();
      made[0]!.onmessage!({ data: [] }); // a answered: b was cancelled, so c goes next
      expect(got).toEqual(['a']);
      expect(posted).toEqual([a, c]);
      made[0]!.onmessage!({ data: [] });
      expect(got).toEqual(['a', 'c']);
      expect(made).toHaveLength(1);
    } finally {
      vi.unstubAllGlobals();
      vi.resetModules();
    }
  });
});
