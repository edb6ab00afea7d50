/**
 * Common hose and pipe sizes with their real inside diameters.
 *
 * Hoses are sold by inside diameter, so their bore is the nominal size (common practice; wear,
 * kinks and couplings make the real bore a little smaller). Rigid pipe is sold by outside
 * diameter and wall; its bore here is OD − 2 × the tabulated wall (the minimum wall for plastic
 * pipe, so the smallest bore the standard allows, which errs toward less flow).
 */

export type SizeFamily =
  | 'garden-hose'
  | 'suction-hose'
  | 'layflat-hose'
  | 'pvc-sch40'
  | 'pvc-sch80'
  | 'hdpe-sdr11'
  | 'hdpe-dr11-ips'
  | 'steel-sch40';

export interface PipeSize {
  /** Our own kebab-case id. */
  id: string;
  family: SizeFamily;
  /** Neutral name (as the API's catalogue lists it). */
  name: string;
  /** What a US crew calls it. */
  name_us: string;
  /** What a metric crew calls it. */
  name_metric: string;
  inner_diameter_m: number;
  outer_diameter_m?: number;
  wall_m?: number;
  /** Catalogue material id that goes with this size, for its roughness. */
  material: string;
  source: string;
}

const IN = 0.0254;
const MM = 0.001;

/** Round to 1 µm so floating residue of inch → metre and OD − 2t does not show. */
const tidy = (m: number): number => Math.round(m * 1e6) / 1e6;

/** [inch label, inch value, metric label in mm] */
type HoseRow = [string, number, number];

function hoses(family: SizeFamily, word: string, material: string, rows: HoseRow[]): PipeSize[] {
  return rows.map(([label, inch, mm]) => ({
    id: `${family}-${String(inch).replace('.', '-')}in`,
    family,
    name: `${label} in ${word}`,
    name_us: `${label} in ${word}`,
    name_metric: `${mm} mm ${word}`,
    inner_diameter_m: tidy(inch * IN),
    material,
    source: 'Hose sold by inside diameter; bore = nominal size (common practice)',
  }));
}

/** [NPS label, id label, DN, OD in, Sch 40 wall in, Sch 80 wall in]: ASTM D1785 / ASME B36.10M */
type NpsRow = [string, string, number, number, number, number];

// OD and minimum wall, inches, as tabulated in ASTM D1785 (PVC) and ASME B36.10M (steel, same
// OD and walls for Sch 40/80 in these sizes). Recalled, and cross-checked in the test suite
// against the tables shipped with the fluids library.
const NPS: NpsRow[] = [
  ['1/2', '0-5', 15, 0.84, 0.109, 0.147],
  ['3/4', '0-75', 20, 1.05, 0.113, 0.154],
  ['1', '1', 25, 1.315, 0.133, 0.179],
  ['1 1/4', '1-25', 32, 1.66, 0.14, 0.191],
  ['1 1/2', '1-5', 40, 1.9, 0.145, 0.2],
  ['2', '2', 50, 2.375, 0.154, 0.218],
  ['2 1/2', '2-5', 65, 2.875, 0.203, 0.276],
  ['3', '3', 80, 3.5, 0.216, 0.3],
  ['3 1/2', '3-5', 90, 4.0, 0.226, 0.318],
  ['4', '4', 100, 4.5, 0.237, 0.337],
  ['5', '5', 125, 5.563, 0.258, 0.375],
  ['6', '6', 150, 6.625, 0.28, 0.432],
  ['8', '8', 200, 8.625, 0.322, 0.5],
];

/** Wall thickness in inches for a row of the NPS table. */
type WallRule = (row: NpsRow) => number;

const sch40: WallRule = (r) => r[4];
const sch80: WallRule = (r) => r[5];
// ASTM D3035 DR 11: minimum wall = OD / 11, tabulated to 0.001 in; no 3 1/2 in size.
const dr11: WallRule = (r) => Math.round((r[3] / 11) * 1000) / 1000;

function nps(
  family: SizeFamily,
  word: string,
  material: string,
  source: string,
  wallOf: WallRule,
): PipeSize[] {
  const rows = family === 'hdpe-dr11-ips' ? NPS.filter((r) => r[0] !== '3 1/2') : NPS;
  return rows.map((row) => {
    const [label, idLabel, dn, od] = row;
    const wall = wallOf(row) * IN;
    return {
      id: `${family}-${idLabel}in`,
      family,
      name: `${label} in ${word}`,
      name_us: `${label} in ${word}`,
      name_metric: `DN ${dn} ${word}`,
      inner_diameter_m: tidy(od * IN - 2 * wall),
      outer_diameter_m: tidy(od * IN),
      wall_m: tidy(wall),
      material,
      source,
    };
  });
}

/** [OD mm, minimum wall mm, approximate inch size] — ISO 4427-2 PE100 SDR 11 */
type PeRow = [number, number, string];

// At 20 mm the standard's 2.0 mm minimum wall governs, so the ratio OD/e is 10 there, not 11.
const PE_SDR11: PeRow[] = [
  [20, 2.0, '1/2'],
  [25, 2.3, '3/4'],
  [32, 2.9, '1'],
  [40, 3.7, '1 1/4'],
  [50, 4.6, '1 1/2'],
  [63, 5.8, '2'],
  [75, 6.8, '2 1/2'],
  [90, 8.2, '3'],
  [110, 10.0, '4'],
  [125, 11.4, '4 1/2'],
  [160, 14.6, '6'],
  [200, 18.2, '8'],
];

function peSdr11(): PipeSize[] {
  return PE_SDR11.map(([od, e, inch]) => ({
    id: `hdpe-sdr11-${od}mm`,
    family: 'hdpe-sdr11' as const,
    name: `${od} mm PE100 SDR 11`,
    name_us: `${od} mm (about ${inch} in) PE100 SDR 11 poly pipe`,
    name_metric: `${od} mm PE100 SDR 11`,
    inner_diameter_m: tidy((od - 2 * e) * MM),
    outer_diameter_m: od * MM,
    wall_m: e * MM,
    material: 'hdpe',
    source: 'ISO 4427-2 PE100 SDR 11, OD and minimum wall, from memory',
  }));
}

const D1785 = 'ASTM D1785, from memory';
const D3035 = 'ASTM D3035 DR 11, IPS OD − 2 × (OD/11) minimum wall, from memory';
const B3610 = 'ASME B36.10M Sch 40: OD − 2 × nominal wall, from memory';

export const sizes: PipeSize[] = [
  ...hoses('garden-hose', 'garden hose', 'garden-hose', [
    ['1/2', 0.5, 13],
    ['5/8', 0.625, 16],
    ['3/4', 0.75, 19],
  ]),
  ...hoses('suction-hose', 'suction hose', 'suction-hose-smooth', [
    ['1', 1, 25],
    ['1 1/2', 1.5, 38],
    ['2', 2, 50],
    ['3', 3, 75],
    ['4', 4, 100],
    ['6', 6, 150],
  ]),
  ...hoses('layflat-hose', 'lay-flat hose', 'layflat-hose', [
    ['1 1/2', 1.5, 38],
    ['2', 2, 50],
    ['2 1/2', 2.5, 65],
    ['3', 3, 75],
    ['4', 4, 100],
    ['6', 6, 150],
  ]),
  ...nps('pvc-sch40', 'PVC Sch 40', 'pvc', `${D1785} Sch 40: OD − 2 × minimum wall`, sch40),
  ...nps('pvc-sch80', 'PVC Sch 80', 'pvc', `${D1785} Sch 80: OD − 2 × minimum wall`, sch80),
  ...peSdr11(),
  ...nps('hdpe-dr11-ips', 'HDPE DR 11 (IPS)', 'hdpe', D3035, dr11),
  ...nps('steel-sch40', 'steel Sch 40', 'steel-commercial', B3610, sch40),
];

/** The size with this id, or undefined when the id is not in the catalogue. */
export function findSize(id: string): PipeSize | undefined {
  return sizes.find((s) => s.id === id);
}
