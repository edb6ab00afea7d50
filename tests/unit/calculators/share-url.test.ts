import { describe, expect, test } from 'vitest';
import { decodeShare, encodeShare } from '../../../src/lib/share-url';
import { SIPHON_TOOL_DEFAULTS } from '../../../src/lib/calculators/line-tool';
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
});
