import { describe, expect, test } from 'vitest';
import type { DrainToolState } from '../../../src/lib/calculators/drain-tool';
import {
  DRAIN_TOOL_DEFAULTS,
  DRAIN_TOOL_US_START,
  drainToolRequest,
  startDepthProblem,
} from '../../../src/lib/calculators/drain-tool';
import { solveDrain } from '../../../src/lib/hydraulics';

const metric: DrainToolState = { ...DRAIN_TOOL_DEFAULTS, shape: 'stage_table' };
const us: DrainToolState = { ...DRAIN_TOOL_DEFAULTS, ...DRAIN_TOOL_US_START, shape: 'stage_table' };

describe('drain tool starting values for a depth–area table', () => {
  test('does start the water inside the table, so the tool gives a result at once', () => {
    for (const s of [metric, us]) {
      expect(startDepthProblem(s, 'metric')).toBeNull();
      expect(() => solveDrain(drainToolRequest(s))).not.toThrow();
    }
  });

  // Source: NIST SP 811, 1 ft = 0.3048 m exactly (4 ft = 1.2192 m).
  test('does name the table’s top depth, in the crew’s units, when the water starts above it', () => {
    const stage = [
      { depth_m: 0, area_m2: 10 },
      { depth_m: 4 * 0.3048, area_m2: 20 },
    ];
    const s = { ...us, stage };
    expect(startDepthProblem(s, 'us')).toBe(
      'Water depth now must be more than 0 and no more than the table’s top depth, 4.00 ft.',
    );
    expect(startDepthProblem(s, 'metric')).toMatch(/the table’s top depth, 1\.22 m\.$/);
    expect(startDepthProblem({ ...s, initial_depth_m: 2 * 0.3048 }, 'us')).toBeNull();
  });

  test('does name the vessel’s full depth for a box', () => {
    const s = { ...DRAIN_TOOL_DEFAULTS, initial_depth_m: 2 };
    expect(startDepthProblem(s, 'metric')).toMatch(
      /no more than the vessel’s full depth, 1\.50 m\.$/,
    );
  });
});
