/**
 * Pipe and hose materials with their absolute (equivalent sand-grain) roughness for
 * Colebrook–White.
 *
 * Most values are the classic Moody (1944) table, which gives roughness in feet; they are stored
 * here converted exactly (1 ft = 0.3048 m) and rounded as Moody's own figures are. Those figures
 * are recalled, not read from the paper here, so each says "from memory". Plastic and rubber
 * bores are not in Moody's table; for them we use the values commonly quoted by manufacturers and
 * handbooks for "hydraulically smooth" bores, marked "common practice".
 */

export interface Material {
  /** Our own kebab-case id, used by API v1 `line.material`. */
  id: string;
  name: string;
  /** Absolute roughness ε, metres. */
  roughness_m: number;
  source: string;
}

const FT = 0.3048;
const MM = 0.001;
const MOODY = 'Moody (1944) roughness table, from memory';

export const materials: Material[] = [
  {
    id: 'pvc',
    name: 'PVC pipe',
    roughness_m: 0.0015 * MM,
    source:
      'Drawn-tubing value (Moody 1944: 0.000005 ft ≈ 0.0015 mm), common practice for PVC, from memory',
  },
  {
    id: 'hdpe',
    name: 'HDPE / polyethylene pipe',
    roughness_m: 0.007 * MM,
    source: 'Common practice for new polyethylene pipe (0.0015–0.007 mm quoted), from memory',
  },
  {
    id: 'garden-hose',
    name: 'Garden hose (vinyl or rubber, smooth bore)',
    roughness_m: 0.01 * MM,
    source:
      'Common practice estimate for smooth-bore hose, from memory; kinks and couplings not included',
  },
  {
    id: 'suction-hose-smooth',
    name: 'Suction hose, smooth bore (PVC helix inside a smooth liner)',
    roughness_m: 0.05 * MM,
    source: 'Common practice estimate for reinforced smooth-bore suction hose, from memory',
  },
  {
    id: 'suction-hose-corrugated',
    name: 'Suction hose, corrugated bore',
    roughness_m: 1.0 * MM,
    source:
      'Common practice estimate; corrugated bores vary widely (0.5–3 mm equivalent), from memory',
  },
  {
    id: 'layflat-hose',
    name: 'Lay-flat discharge hose (rubber or PVC lined, full)',
    roughness_m: 0.02 * MM,
    source: 'Common practice estimate for lined lay-flat hose running full, from memory',
  },
  {
    id: 'copper',
    name: 'Copper or brass tube (drawn)',
    roughness_m: 0.000005 * FT,
    source: `${MOODY}: drawn tubing 0.000005 ft`,
  },
  {
    id: 'steel-commercial',
    name: 'Commercial steel or wrought iron, new',
    roughness_m: 0.00015 * FT,
    source: `${MOODY}: commercial steel or wrought iron 0.00015 ft`,
  },
  {
    id: 'steel-galvanized',
    name: 'Galvanized steel or iron',
    roughness_m: 0.0005 * FT,
    source: `${MOODY}: galvanized iron 0.0005 ft`,
  },
  {
    id: 'cast-iron-asphalted',
    name: 'Cast iron, asphalt dipped',
    roughness_m: 0.0004 * FT,
    source: `${MOODY}: asphalted cast iron 0.0004 ft`,
  },
  {
    id: 'cast-iron',
    name: 'Cast iron, uncoated',
    roughness_m: 0.00085 * FT,
    source: `${MOODY}: cast iron 0.00085 ft`,
  },
  {
    id: 'concrete-smooth',
    name: 'Concrete, smooth (steel forms, good joints)',
    roughness_m: 0.001 * FT,
    source: `${MOODY}: concrete 0.001–0.01 ft, low end`,
  },
  {
    id: 'concrete-rough',
    name: 'Concrete, rough (wood forms, poor joints)',
    roughness_m: 0.01 * FT,
    source: `${MOODY}: concrete 0.001–0.01 ft, high end`,
  },
];

/** The material with this id, or undefined when the id is not in the catalogue. */
export function findMaterial(id: string): Material | undefined {
  return materials.find((m) => m.id === id);
}
