import { describe, expect, test } from 'vitest';
import { CAUTIONS, cautionIdsFor, cautionsFor } from '../../src/lib/cautions';

// What must show beside which result comes from the product brief's list of cautions: mouth
// priming for siphons; contaminated water, edges and confined spaces, discharge and "estimates,
// defer to local codes" for every job; entrapment wherever a hose or pipe draws water in.
describe('cautionIdsFor', () => {
  test('does give a siphon the priming, contamination, intake and edge cautions', () => {
    expect(cautionIdsFor({ tool: 'siphon' })).toEqual([
      'no-mouth-priming',
      'contaminated-water',
      'intake-entrapment',
      'edges-and-confined-spaces',
      'discharge',
      'estimates',
    ]);
  });

  test('does give a gravity line every caution but priming', () => {
    const ids = cautionIdsFor({ tool: 'line' });
    expect(ids).not.toContain('no-mouth-priming');
    for (const id of ['contaminated-water', 'intake-entrapment', 'edges-and-confined-spaces']) {
      expect(ids).toContain(id);
    }
  });

  test('does leave the intake caution off a drain through holes, and assume the worst when unknown', () => {
    const holes = cautionIdsFor({ tool: 'drain', outlet: 'orifice' });
    expect(holes).not.toContain('intake-entrapment');
    expect(holes).not.toContain('no-mouth-priming');
    expect(holes).toContain('contaminated-water');
    expect(cautionIdsFor({ tool: 'drain', outlet: 'siphon' })).toContain('no-mouth-priming');
    expect(cautionIdsFor({ tool: 'drain' })).toEqual(cautionIdsFor({ tool: 'siphon' }));
  });

  test('does name only cautions that exist, each ending with the defer-to-local-codes note', () => {
    for (const setup of [{ tool: 'siphon' }, { tool: 'line' }, { tool: 'drain' }] as const) {
      const ids = cautionIdsFor(setup);
      expect(cautionsFor(ids).map((c) => c.id)).toEqual(ids);
      expect(ids.at(-1)).toBe('estimates');
    }
    expect(CAUTIONS.find((c) => c.id === 'estimates')?.text).toMatch(
      /local codes and licensed practice/,
    );
  });
});
