/**
 * Display units. The engine works in SI; these helpers convert at the edges only, to and from the
 * unit a crew reads in its own system ('metric' or 'us').
 *
 * Every factor is exact by definition, as NIST SP 811 (2008) Appendix B lists it: 1 ft = 0.3048 m,
 * 1 in = 0.0254 m, 1 US gal = 231 in³ = 3.785 411 784 L, 1 lb = 0.453 592 37 kg,
 * 1 lbf/in² = 6 894.757 293 168 Pa (with standard gravity), °F = °C·9/5 + 32, 1 cP = 1 mPa·s.
 *
 * The SI value of each kind is the one API v1 uses: metres, m³/s, m³, Pa (absolute), m/s, m²,
 * seconds, kg/m³, Pa·s — and degrees Celsius for temperature, as in `water_temperature_c`.
 */

export type UnitSystem = 'metric' | 'us';

export const unitSystems = ['metric', 'us'] as const satisfies readonly UnitSystem[];

/** Whether a value read from outside (storage, a link, a page attribute) names a unit system. */
export function isUnitSystem(value: unknown): value is UnitSystem {
  return (unitSystems as readonly unknown[]).includes(value);
}

export type QuantityKind =
  | 'length'
  | 'diameter'
  | 'elevation'
  | 'roughness'
  | 'flow'
  | 'volume'
  | 'pressure'
  | 'temperature'
  | 'velocity'
  | 'area'
  | 'time'
  | 'density'
  | 'viscosity';

export const quantityKinds: readonly QuantityKind[] = [
  'length',
  'diameter',
  'elevation',
  'roughness',
  'flow',
  'volume',
  'pressure',
  'temperature',
  'velocity',
  'area',
  'time',
  'density',
  'viscosity',
];

/** A display unit, related to SI by si = (display + offset) · factor. */
export interface DisplayUnit {
  id: string;
  label: string;
  /** SI value of one display unit (after the offset). */
  factor: number;
  /** Added to the display value before scaling; only temperature has one. */
  offset: number;
}

const FT = 0.3048;
const IN = 0.0254;
const US_GAL = 3.785411784e-3;
const LB = 0.45359237;
const PSI = 6894.757293168;

const u = (id: string, label: string, factor: number, offset = 0): DisplayUnit => ({
  id,
  label,
  factor,
  offset,
});

/** Every display unit, keyed by its id. */
export const displayUnits = {
  m: u('m', 'm', 1),
  ft: u('ft', 'ft', FT),
  mm: u('mm', 'mm', 1e-3),
  in: u('in', 'in', IN),
  'l/s': u('l/s', 'L/s', 1e-3),
  'm3/h': u('m3/h', 'm³/h', 1 / 3600),
  gpm: u('gpm', 'US gal/min', US_GAL / 60),
  l: u('l', 'L', 1e-3),
  m3: u('m3', 'm³', 1),
  gal: u('gal', 'US gal', US_GAL),
  ft3: u('ft3', 'ft³', FT ** 3),
  kpa: u('kpa', 'kPa abs', 1e3),
  psia: u('psia', 'psia', PSI),
  // °C is the SI value of this kind, so Celsius is the identity and Fahrenheit is
  // °C = (°F − 32) · 5/9, written as (display + offset) · factor.
  degc: u('degc', '°C', 1),
  degf: u('degf', '°F', 5 / 9, -32),
  'm/s': u('m/s', 'm/s', 1),
  'ft/s': u('ft/s', 'ft/s', FT),
  m2: u('m2', 'm²', 1),
  ft2: u('ft2', 'ft²', FT ** 2),
  h: u('h', 'h', 3600),
  'kg/m3': u('kg/m3', 'kg/m³', 1),
  'lb/ft3': u('lb/ft3', 'lb/ft³', LB / FT ** 3),
  'mpa-s': u('mpa-s', 'mPa·s', 1e-3),
  cp: u('cp', 'cP', 1e-3),
} as const satisfies Record<string, DisplayUnit>;

export type UnitId = keyof typeof displayUnits;

/** Each kind's default unit in each system, and the alternatives a screen may offer. */
export const unitsByKind: Record<QuantityKind, Record<UnitSystem, readonly UnitId[]>> = {
  length: { metric: ['m'], us: ['ft'] },
  diameter: { metric: ['mm'], us: ['in'] },
  elevation: { metric: ['m'], us: ['ft'] },
  roughness: { metric: ['mm'], us: ['in'] },
  flow: { metric: ['l/s', 'm3/h'], us: ['gpm'] },
  volume: { metric: ['l', 'm3'], us: ['gal', 'ft3'] },
  pressure: { metric: ['kpa'], us: ['psia'] },
  temperature: { metric: ['degc'], us: ['degf'] },
  velocity: { metric: ['m/s'], us: ['ft/s'] },
  area: { metric: ['m2'], us: ['ft2'] },
  time: { metric: ['h'], us: ['h'] },
  density: { metric: ['kg/m3'], us: ['lb/ft3'] },
  viscosity: { metric: ['mpa-s'], us: ['cp'] },
};

/** The unit used for a kind: `unit` when given and valid for that kind and system, else the default. */
export function displayUnit(kind: QuantityKind, system: UnitSystem, unit?: UnitId): DisplayUnit {
  const allowed = unitsByKind[kind]?.[system];
  if (!allowed) throw new RangeError(`Unknown quantity kind or unit system: ${kind}, ${system}`);
  if (unit !== undefined && !allowed.includes(unit)) {
    throw new RangeError(`Unit ${unit} is not a ${system} unit of ${kind}`);
  }
  return displayUnits[unit ?? allowed[0]!];
}

/** SI value → display value. Example: toDisplay('flow', 0.001, 'us') ≈ 15.85 (US gal/min). */
export function toDisplay(
  kind: QuantityKind,
  si: number,
  system: UnitSystem,
  unit?: UnitId,
): number {
  const d = displayUnit(kind, system, unit);
  return si / d.factor - d.offset;
}

/** Display value → SI value. Example: fromDisplay('length', 1, 'us') = 0.3048 (m). */
export function fromDisplay(
  kind: QuantityKind,
  value: number,
  system: UnitSystem,
  unit?: UnitId,
): number {
  const d = displayUnit(kind, system, unit);
  return (value + d.offset) * d.factor;
}

/** The label shown beside a number, e.g. unitLabel('pressure', 'us') = 'psia'. */
export function unitLabel(kind: QuantityKind, system: UnitSystem, unit?: UnitId): string {
  return displayUnit(kind, system, unit).label;
}

export { formatNumber, formatQuantity, formatDuration } from './units-format';
