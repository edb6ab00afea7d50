import { describe, expect, test } from 'vitest';
import { headlineOf } from '../../../src/lib/jobs/headline';

// NIST SP 811 (2008) App. B, exact: 1 US gal = 3.785411784 L, 1 ft = 0.3048 m, so
// 0.001 m³/s = 60 / 3.785411784 = 15.85 US gal/min and 1 m/s = 3.281 ft/s.
describe('headlineOf', () => {
  test('does give the verdict and the line figures in the units the calculation was saved in', () => {
    const h = headlineOf(
      'line',
      { status: 'runs', regime: 'turbulent', flow_m3_s: 0.001, velocity_m_s: 1 },
      'us',
    );
    expect(h.verdict?.word).toBe('Will flow');
    expect(h.figures).toEqual([
      { label: 'Flow', value: '15.9 US gal/min' },
      { label: 'Speed in the line', value: '3.28 ft/s' },
    ]);
    expect(
      headlineOf('line', { status: 'runs', regime: 'turbulent', flow_m3_s: 0.001 }, 'metric')
        .figures[0]?.value,
    ).toBe('1.00 L/s');
  });

  test('does give a drain-down its time as h:min and say when it stops short', () => {
    const h = headlineOf(
      'drain',
      {
        status: 'stops_early',
        stop_reason: 'siphon_breaks',
        time_s: 5400,
        initial_flow_m3_s: 0.002,
      },
      'metric',
    );
    expect(h.verdict?.word).toBe('Stops short');
    expect(h.figures.map((f) => f.value)).toEqual(['1:30 h:min', '2.00 L/s']);
  });

  test('does leave out what stored results lack instead of failing', () => {
    expect(headlineOf('siphon', {}, 'us')).toEqual({ verdict: null, figures: [] });
    expect(headlineOf('drain', { status: 'drains', time_s: 'soon' }, 'us').figures).toEqual([]);
  });
});
