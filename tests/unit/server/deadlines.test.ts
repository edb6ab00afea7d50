/**
 * The shared deadline sweep behind the API's body deadline: a wait expires once, no earlier than
 * asked and at most one sweep late; a cancelled one never fires. Fake timers, so no real waiting.
 */
import { afterEach, beforeEach, describe, expect, test, vi } from 'vitest';
import { SWEEP_MS, deadline } from '../../../src/lib/server/deadlines';

beforeEach(() => {
  vi.useFakeTimers({ toFake: ['setInterval', 'clearInterval', 'performance'] });
});

afterEach(() => {
  vi.useRealTimers();
});

describe('deadline', () => {
  test('does fire once, not before its time and within one sweep after it', () => {
    const expired = vi.fn();
    deadline(1_000, expired);
    vi.advanceTimersByTime(999);
    expect(expired).not.toHaveBeenCalled();
    vi.advanceTimersByTime(SWEEP_MS + 1);
    expect(expired).toHaveBeenCalledTimes(1);
    vi.advanceTimersByTime(10 * SWEEP_MS);
    expect(expired).toHaveBeenCalledTimes(1);
  });

  test('does not fire when cancelled, and keeps the others', () => {
    const cancelled = vi.fn();
    const kept = vi.fn();
    const cancel = deadline(500, cancelled);
    deadline(500, kept);
    cancel();
    vi.advanceTimersByTime(500 + SWEEP_MS);
    expect(cancelled).not.toHaveBeenCalled();
    expect(kept).toHaveBeenCalledTimes(1);
  });

  test('does stop sweeping when nothing waits, and starts again for a new wait', () => {
    deadline(100, () => {});
    vi.advanceTimersByTime(100 + SWEEP_MS);
    expect(vi.getTimerCount()).toBe(0);
    const later = vi.fn();
    deadline(100, later);
    expect(vi.getTimerCount()).toBe(1);
    vi.advanceTimersByTime(100 + SWEEP_MS);
    expect(later).toHaveBeenCalledTimes(1);
  });
});
