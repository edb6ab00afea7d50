import { describe, expect, test } from 'vitest';
import { decodeShare, encodeShare, shareQuery, startOf } from '../../../src/lib/share-url';
import { SIPHON_TOOL_DEFAULTS, SIPHON_TOOL_US_START } from '../../../src/lib/calculators/line-tool';
import { FITTING_ROW } from '../../../src/lib/calculators/tool-state';

describe('share-url', () => {
  test('does round-trip numbers, choices, flags and fitting rows exactly', () => {
    const state = {
      ...SIPHON_TOOL_DEFAULTS,
      crest_m: 0.1 + 0.2, // a double with a long expansion must come back bit for bit
      length_m: 1 / 3,
      limit_mode: 'custom' as const,
      has_tail: true,
      fittings: [
        { id: 'elbow-90-standard', count: 3 },
        { id: 'valve-ball', count: 1 },
      ],
    };
    const q = encodeShare(state, SIPHON_TOOL_DEFAULTS, { fittings: ['id', 'count'] });
    expect(decodeShare(q, SIPHON_TOOL_DEFAULTS, { fittings: FITTING_ROW })).toEqual(state);
  });

  test('does leave defaults out and ignore unknown or unreadable values', () => {
    expect(encodeShare(SIPHON_TOOL_DEFAULTS, SIPHON_TOOL_DEFAULTS)).toBe('');
    const back = decodeShare('crest_m=abc&nope=1&length_m=', SIPHON_TOOL_DEFAULTS, { fittings: FITTING_ROW });
    expect(back).toEqual(SIPHON_TOOL_DEFAULTS);
  });

  test('does start a bare address on the visitor\'s own units and any other link on what it names', () => {
    expect(startOf('', 'us')).toBe('us');
    expect(startOf('?', 'metric')).toBe('metric');
    expect(startOf('?start=us&crest_m=2', 'metric')).toBe('us');
    expect(startOf('?start=metric', 'us')).toBe('metric');
    // links made before the US start existed list changes from the metric defaults
    expect(startOf('?crest_m=2.4', 'us')).toBe('metric');
    expect(startOf('?start=imperial&crest_m=2.4', 'us')).toBe('metric');
  });

  test('does name the start in every link that would otherwise be empty or build on US values', () => {
    const us = { ...SIPHON_TOOL_DEFAULTS, ...SIPHON_TOOL_US_START } as typeof SIPHON_TOOL_DEFAULTS;
    expect(shareQuery(SIPHON_TOOL_DEFAULTS, 'metric', SIPHON_TOOL_DEFAULTS)).toBe('start=metric');
    expect(shareQuery({ ...SIPHON_TOOL_DEFAULTS, crest_m: 2 }, 'metric', SIPHON_TOOL_DEFAULTS)).toBe('crest_m=2');
    expect(shareQuery(us, 'us', us)).toBe('start=us');
    const q = shareQuery({ ...us, crest_m: 2 }, 'us', us);
    expect(q).toBe('start=us&crest_m=2');
    // opened anywhere, the link gives back the same SI inputs
    expect(decodeShare(q, startOf(q, 'metric') === 'us' ? us : SIPHON_TOOL_DEFAULTS)).toEqual({ ...us, crest_m: 2 });
  });
});
