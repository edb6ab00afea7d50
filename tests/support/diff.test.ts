import { describe, expect, test } from 'vitest';
import { diffResults, flatten } from '../../src/lib/flags/diff';
import { rerunSnapshot } from '../../src/lib/flags/rerun';

// Expected values here are worked by hand from the inputs written in each test.
describe('diffResults', () => {
  test('does mark a moved number with its relative change', () => {
    const d = diffResults(
      { flow_m3_s: 0.002, status: 'runs' },
      { flow_m3_s: 0.0025, status: 'runs' },
    );
    expect(d).toEqual([
      {
        path: 'flow_m3_s',
        before: 0.002,
        after: 0.0025,
        change: 'changed',
        relative: expect.closeTo(0.25, 12),
      },
      { path: 'status', before: 'runs', after: 'runs', change: 'same', relative: null },
    ]);
  });

  test('does treat float noise below 1e-9 relative as the same', () => {
    const [row] = diffResults({ h: 1.8 }, { h: 1.7999999999999998 });
    expect(row.change).toBe('same');
  });

  test('does report fields only one side has', () => {
    const d = diffResults(
      { a: 1, losses_m: { exit: 0.1 } },
      { losses_m: { exit: 0.1, entrance: 0.05 } },
    );
    expect(d.map((r) => [r.path, r.change])).toEqual([
      ['a', 'removed'],
      ['losses_m.exit', 'same'],
      ['losses_m.entrance', 'added'],
    ]);
  });

  test('does compare warnings by their codes, whatever their order or wording', () => {
    const before = {
      warnings: [
        { code: 'b', message: 'x' },
        { code: 'a', message: 'y' },
      ],
    };
    const after = {
      warnings: [
        { code: 'a', message: 'reworded' },
        { code: 'b', message: 'x' },
      ],
    };
    expect(diffResults(before, after)).toEqual([
      { path: 'warnings', before: 'a, b', after: 'a, b', change: 'same', relative: null },
    ]);
  });

  test('does summarise a long curve by its length and last point', () => {
    const curve = Array.from({ length: 20 }, (_, i) => ({
      time_s: i * 10,
      depth_m: (20 - i) / 20,
    }));
    const flat = flatten({ curve });
    expect([...flat]).toEqual([
      ['curve.length', 20],
      ['curve[last].time_s', 190],
      ['curve[last].depth_m', 0.05],
    ]);
  });
});

describe('rerunSnapshot', () => {
  const inputs = {
    line: { inner_diameter_m: 0.025, length_m: 10, material: 'garden-hose' },
    source_level_m: 1,
    outlet_elevation_m: 0,
  };

  test('does show a changed field where the frozen result differs from today', () => {
    const today = rerunSnapshot('line', inputs, {});
    expect(today.ok).toBe(true);
    if (!today.ok) return;
    const frozen = { ...(today.results as Record<string, unknown>) };
    frozen.flow_m3_s = (frozen.flow_m3_s as number) * 2;
    const again = rerunSnapshot('line', inputs, frozen);
    if (!again.ok) throw new Error('re-run refused');
    expect(again.changed).toBe(1);
    const row = again.diffs.find((d) => d.path === 'flow_m3_s');
    // frozen = 2 × today, so (today − frozen)/frozen = −0.5 exactly.
    expect(row?.relative).toBeCloseTo(-0.5, 12);
  });

  test('does report refused inputs with the path the engine names', () => {
    const bad = rerunSnapshot(
      'line',
      { ...inputs, line: { ...inputs.line, material: 'no-such-material' } },
      {},
    );
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.error.path).toBe('line.material');
  });

  test('does not throw on inputs that are not an engine request at all', () => {
    const bad = rerunSnapshot('siphon', { nonsense: true }, {});
    expect(bad.ok).toBe(false);
  });
});
