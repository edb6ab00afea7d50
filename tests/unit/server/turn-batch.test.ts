import { describe, expect, test } from 'vitest';
import { inTurnBatch } from '../../../src/lib/server/turn-batch';

const nextTurn = (): Promise<void> => new Promise((resolve) => setImmediate(resolve));

describe('inTurnBatch', () => {
  test('does prepare every job of a turn before writing any of them, in order', async () => {
    const events: string[] = [];
    for (const name of ['a', 'b', 'c']) {
      inTurnBatch(() => {
        events.push(`prepare ${name}`);
        return () => events.push(`write ${name}`);
      });
    }
    expect(events).toEqual([]); // nothing runs before the turn's batch
    await nextTurn();
    expect(events).toEqual([
      'prepare a',
      'prepare b',
      'prepare c',
      'write a',
      'write b',
      'write c',
    ]);
  });

  test('does keep answering the others when one job or one write throws', async () => {
    const written: string[] = [];
    inTurnBatch(() => {
      throw new Error('broken job');
    });
    inTurnBatch(() => () => {
      throw new Error('socket gone');
    });
    inTurnBatch(() => () => written.push('last'));
    await nextTurn();
    expect(written).toEqual(['last']);
  });

  test('does start a new batch for jobs queued while one is running', async () => {
    const order: string[] = [];
    inTurnBatch(() => {
      inTurnBatch(() => () => order.push('later'));
      return () => order.push('first');
    });
    await nextTurn();
    expect(order).toEqual(['first']);
    await nextTurn();
    expect(order).toEqual(['first', 'later']);
  });
});
