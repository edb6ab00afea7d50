/**
 * Fittings, entrances and exits with their resistance coefficient K (head loss = K·V²/2g, V the
 * mean velocity in the line).
 *
 * Valves, elbows and tees follow the handbook style of Crane TP-410, where K = n·f_T and f_T is
 * the fully turbulent friction factor of clean commercial steel pipe of the size; `k` is given at
 * 2 in (DN 50, f_T ≈ 0.019), and `crane_ft_multiple` keeps n so a caller may scale to another size.
 * The multiples are recalled, not read from the handbook here, hence "from memory". Hose
 * couplings are not in that handbook; their values are marked as common-practice estimates.
 *
 * `kind` matters to the energy equation of API v1: entrance K goes in `line.entrance_k`, the exit
 * velocity head is already the "1 +" term, and only `kind: 'fitting'` belongs in `line.fittings`.
 */

export type FittingKind = 'entrance' | 'fitting' | 'exit';

export interface Fitting {
  /** Our own kebab-case id, used by API v1 `line.fittings[].id`. */
  id: string;
  name: string;
  kind: FittingKind;
  /** Resistance coefficient K, dimensionless, referred to the line's velocity head. */
  k: number;
  /** Crane-style multiple n in K = n·f_T, when the value comes from that method. */
  crane_ft_multiple?: number;
  source: string;
}

/** Fully turbulent friction factor of 2 in (DN 50) clean steel pipe, Crane TP-410 style. */
export const CRANE_FT_2IN = 0.019;

const CRANE = 'Handbook table (Crane TP-410 style), from memory';

/** A Crane-style fitting: K = n·f_T at 2 in. */
function crane(id: string, name: string, n: number): Fitting {
  const k = Math.round(n * CRANE_FT_2IN * 1000) / 1000;
  return { id, name, kind: 'fitting', k, crane_ft_multiple: n, source: `${CRANE}: K = ${n}·f_T` };
}

const entrances: Fitting[] = [
  { id: 'entrance-sharp', name: 'Sharp-edged entrance, flush with the wall', k: 0.5 },
  { id: 'entrance-projecting', name: 'Inward-projecting (re-entrant) pipe entrance', k: 0.78 },
  { id: 'entrance-rounded-r02', name: 'Rounded entrance, r/d = 0.02', k: 0.28 },
  { id: 'entrance-rounded-r04', name: 'Rounded entrance, r/d = 0.04', k: 0.24 },
  { id: 'entrance-rounded-r06', name: 'Rounded entrance, r/d = 0.06', k: 0.15 },
  { id: 'entrance-rounded-r10', name: 'Rounded entrance, r/d = 0.10', k: 0.09 },
  { id: 'entrance-bell-mouth', name: 'Bell-mouth entrance, r/d ≥ 0.15', k: 0.04 },
].map((e) => ({ ...e, kind: 'entrance' as const, source: CRANE }));

const hoseEnd: Fitting = {
  id: 'entrance-hose-end',
  name: 'Open hose end lying in the water (thin wall, projecting)',
  kind: 'entrance',
  k: 1.0,
  source: 'Thin-walled projecting tube, about 1.0 (Idelchik-style handbook value), from memory',
};

const craneFittings: Fitting[] = [
  crane('elbow-90-standard', 'Standard 90° elbow, threaded or glued', 30),
  crane('elbow-90-long-radius', 'Long-radius 90° elbow or bend, r/d = 1.5', 14),
  crane('bend-90-r2', 'Pipe bend 90°, r/d = 2', 12),
  crane('elbow-45-standard', 'Standard 45° elbow', 16),
  crane('return-bend-180', 'Close return bend 180°', 50),
  crane('tee-run', 'Standard tee, flow through the run', 20),
  crane('tee-branch', 'Standard tee, flow through the branch', 60),
  crane('valve-gate', 'Gate valve, fully open', 8),
  crane('valve-ball', 'Ball valve, full port, fully open', 3),
  crane('valve-butterfly', 'Butterfly valve, fully open (2–8 in)', 45),
  crane('valve-globe', 'Globe valve, fully open', 340),
  crane('valve-angle', 'Angle valve, fully open', 150),
  crane('valve-check-swing', 'Swing check valve, fully open', 100),
  crane('valve-check-lift', 'Lift check valve, fully open', 600),
  crane('valve-foot-poppet', 'Foot valve with strainer, poppet disc', 420),
  crane('valve-foot-hinged', 'Foot valve with strainer, hinged disc', 75),
];

const otherFittings: Fitting[] = [
  {
    id: 'elbow-45-long-radius',
    name: 'Long-radius 45° elbow or bend',
    kind: 'fitting',
    k: 0.2,
    source: 'Common practice (about 0.2 in pump-suction tables), from memory',
  },
  {
    id: 'coupling-union',
    name: 'Pipe coupling or union, full bore',
    kind: 'fitting',
    k: 0.08,
    source: 'Common practice (0.04–0.08 quoted for couplings and unions), from memory',
  },
  {
    id: 'coupling-camlock',
    name: 'Camlock (cam-and-groove) coupling with hose shanks',
    kind: 'fitting',
    k: 0.3,
    source: 'Common practice estimate; the bore step at the hose shanks varies by make',
  },
  {
    id: 'coupling-garden-hose',
    name: 'Garden hose threaded coupling (reduced-bore insert)',
    kind: 'fitting',
    k: 0.5,
    source: 'Common practice estimate; insert bores are a few millimetres under the hose bore',
  },
];

const exits: Fitting[] = [
  { id: 'exit-free-jet', name: 'Free discharge into air' },
  { id: 'exit-submerged', name: 'Outlet under water (projecting, sharp or rounded)' },
].map((e) => ({
  ...e,
  kind: 'exit' as const,
  k: 1.0,
  source: `${CRANE}: exit K = 1.0; API v1 already counts it as the "1 +" term`,
}));

export const fittings: Fitting[] = [
  ...entrances,
  hoseEnd,
  ...craneFittings,
  ...otherFittings,
  ...exits,
];

/** The fitting with this id, or undefined when the id is not in the catalogue. */
export function findFitting(id: string): Fitting | undefined {
  return fittings.find((f) => f.id === id);
}
