/**
 * Words for the tools' input choices, shared by the tool pages (their option labels) and the
 * client report (which prints a saved calculation's inputs).
 */
import type { DrainToolState, VesselShape } from './drain-tool';

export const SHAPES: { value: VesselShape; label: string }[] = [
  { value: 'box', label: 'Box: square or oblong, straight sides' },
  { value: 'vertical_cylinder', label: 'Round tank, upright' },
  { value: 'horizontal_cylinder', label: 'Round tank lying down (flat ends)' },
  { value: 'sphere', label: 'Sphere' },
  { value: 'cone_bottom', label: 'Round tank with a cone bottom' },
  { value: 'sloped_pond', label: 'Pond or basin with sloped sides' },
  { value: 'stage_table', label: 'Any shape: depth–area table' },
];

export const OUTLET_TYPES: { value: DrainToolState['outlet']; label: string }[] = [
  { value: 'orifice', label: 'Holes or open valves' },
  { value: 'line', label: 'A gravity line' },
  { value: 'siphon', label: 'A siphon over the rim' },
];
