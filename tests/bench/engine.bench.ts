/**
 * Engine speed goals (run with `npm run bench`; not part of the test suite).
 * Each case is warmed up, then timed in batches with performance.now(); the table shows the
 * median time per call over the batches against its goal.
 */
import { solveDrain } from '../../src/lib/hydraulics/drain';
import { solveSiphon } from '../../src/lib/hydraulics/siphon';
import type { DrainRequest, SiphonRequest } from '../../src/lib/hydraulics/types';

interface Case {
  name: string;
  goalUs: number;
  run: () => unknown;
  batch: number;
}

const siphonReq: SiphonRequest = {
  fluid: { water_temperature_c: 15 },
  site: { altitude_m: 300 },
  line: {
    inner_diameter_m: 0.0381,
    length_m: 30,
    material: 'pvc',
    minor_loss_k: 1.2,
    entrance_k: 0.5,
  },
  source_level_m: 2,
  outlet_elevation_m: -3,
  crest_elevation_m: 4.5,
  length_to_crest_m: 8,
  minor_loss_k_to_crest: 0.6,
};

/** A 1000-row stage table of an irregular pond basin (invented shape, bench input only). */
const pondTable = Array.from({ length: 1000 }, (_, i) => {
  const d = (i * 2.5) / 999;
  return { depth_m: d, area_m2: 120 + 85 * d + 14 * d * d + 6 * Math.sin(i / 9) };
});

const drainReq: DrainRequest = {
  vessel: { shape: 'stage_table', points: pondTable },
  initial_depth_m: 2.4,
  final_depth_m: 0.2,
  outlet: {
    type: 'siphon',
    line: { inner_diameter_m: 0.0508, length_m: 40, roughness_m: 1.5e-6, minor_loss_k: 0.9 },
    intake_elevation_m: 0.1,
    crest_elevation_m: 3.4,
    length_to_crest_m: 6,
    outlet_elevation_m: -2.5,
  },
  curve_points: 100,
};

const orificeReq: DrainRequest = {
  vessel: { shape: 'horizontal_cylinder', diameter_m: 2, length_m: 6 },
  initial_depth_m: 2,
  outlet: { type: 'orifice', diameter_m: 0.05 },
};

const cases: Case[] = [
  { name: 'siphon solve', goalUs: 20, run: () => solveSiphon(siphonReq), batch: 2000 },
  {
    name: '100-point drain, siphon, 1000-row table',
    goalUs: 2000,
    run: () => solveDrain(drainReq),
    batch: 20,
  },
  {
    name: '100-point drain, orifice, horizontal cylinder',
    goalUs: 2000,
    run: () => solveDrain(orificeReq),
    batch: 20,
  },
];

function medianUs(c: Case, batches: number): number {
  for (let i = 0; i < c.batch * 5; i++) c.run(); // warm-up: let the JIT settle
  const perCall: number[] = [];
  for (let b = 0; b < batches; b++) {
    const t0 = performance.now();
    for (let i = 0; i < c.batch; i++) c.run();
    perCall.push(((performance.now() - t0) * 1000) / c.batch);
  }
  perCall.sort((x, y) => x - y);
  return perCall[Math.floor(batches / 2)];
}

const rows = cases.map((c) => {
  const us = medianUs(c, 25);
  return {
    case: c.name,
    'median µs': Number(us.toFixed(2)),
    'goal µs': c.goalUs,
    ok: us <= c.goalUs ? 'yes' : 'NO',
  };
});
console.table(rows);
