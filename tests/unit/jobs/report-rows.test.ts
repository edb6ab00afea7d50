import { describe, expect, test } from 'vitest';
import { drainVerdict, siphonVerdict } from '../../../src/lib/calculators/verdict';
import type { CalculationRow } from '../../../src/lib/data/calculations';
import type { JobRow } from '../../../src/lib/data/jobs';
import type { BrandRow } from '../../../src/lib/data/brands';
import { ENGINE_VERSION, solveDrain, solveSiphon } from '../../../src/lib/hydraulics';
import type { DrainRequest, SiphonRequest } from '../../../src/lib/hydraulics';
import { buildReport } from '../../../src/lib/report/model';
import type { ReportCalculation } from '../../../src/lib/report/model';

// Demo set-ups as in db/seed-calculations.ts (invented), saved in US units.
const SIPHON: SiphonRequest = {
  fluid: { water_temperature_c: 16 },
  line: { inner_diameter_m: 0.01905, length_m: 12, material: 'suction-hose-smooth', entrance_k: 0.5 },
  source_level_m: 1.9,
  outlet_elevation_m: -0.8,
  crest_elevation_m: 2.3,
  length_to_crest_m: 2.5,
};
const DRAIN: DrainRequest = {
  vessel: { shape: 'box', length_m: 2, width_m: 2, depth_m: 1.6 },
  initial_depth_m: 1.52,
  final_depth_m: 0,
  outlet: { type: 'orifice', diameter_m: 0.03, discharge_coefficient: 0.61 },
  curve_points: 101,
};

function calc(tool: 'siphon' | 'drain', inputs: unknown, results: unknown): CalculationRow {
  return { id: `calc_${tool}`, jobId: 'job_t', organisationId: 'org_t', tool, label: '', inputs, results, unitSystem: 'us', engineVersion: ENGINE_VERSION, revisionOf: null, openPath: null, createdBy: null, createdAt: new Date(0) };
}

const brand = { primaryColour: '#12343b', accentColour: '#1b7f86', companyName: 'T' } as BrandRow;
const report = buildReport(brand, { title: 'T' } as JobRow, [
  calc('siphon', SIPHON, solveSiphon(SIPHON)),
  calc('drain', DRAIN, solveDrain(DRAIN)),
]);
const [siphon, drain] = report.calculations as [ReportCalculation, ReportCalculation];
const texts = (c: ReportCalculation): string[] => c.figures.flatMap((f) => f.shapes.flatMap((s) => (s.kind === 'text' ? [s.text] : [])));
const all = (c: ReportCalculation): string => [...c.results, ...c.inputs].map((r) => `${r.label}: ${r.value}`).join('\n');

describe('report of a calculation saved in US units (QA s23 M3)', () => {
  test('does label the sketch and loss chart in feet, not metres', () => {
    // NIST SP 811 App. B: 1 ft = 0.3048 m exactly, so 2.7 m = 8.86 ft and 0.4 m = 1.31 ft.
    const t = texts(siphon);
    expect(t).toContain('outlet 8.86 ft below');
    expect(t).toContain('crest 1.31 ft above');
    expect(t.filter((x) => /\d/.test(x)).every((x) => / ft\b/.test(x))).toBe(true);
  });

  test('does give every drain-down axis value its unit, time as the table shows it', () => {
    // 1.52 m / 0.3048 = 4.99 ft (NIST SP 811 App. B).
    const t = texts(drain).filter((x) => /\d/.test(x));
    expect(t).toContain('4.99 ft');
    expect(t).toContain('0 ft');
    expect(t).not.toContain('0');
    expect(t.every((x) => /\d( |:\d\d )(ft|s|h:min)$/.test(x))).toBe(true);
    expect(all(drain)).toContain(`Time to the stop: ${t.find((x) => x.endsWith('h:min'))}`);
  });
});

describe('report words (QA s23 M4)', () => {
  test("does use the tools' verdict words and labels, not internal codes", () => {
    const text = `${all(siphon)}\n${all(drain)}`;
    expect(text).toContain(`Verdict: ${siphonVerdict(solveSiphon(SIPHON)).word}.`);
    expect(text).toContain(`Verdict: ${drainVerdict(solveDrain(DRAIN)).word}.`);
    expect(text).toContain('Material (roughness): Suction hose, smooth bore');
    expect(text).toContain('Shape: Box: square or oblong, straight sides');
    expect(text).toContain('Drains through: Holes or open valves');
    expect(text).toContain('It stops when: it reaches the target depth');
    expect(text).toMatch(/Reynolds number [\d,]+ \((turbulent|laminar|transitional)\)/);
    for (const code of ['status', 'stop reason', 'final_depth', 'suction-hose-smooth', 'reynolds:', 'curve points', 'entrance k', '_'])
      expect(text.toLowerCase(), code).not.toContain(code);
  });

  test('does name the loss bars as the tools do', () => {
    expect(texts(siphon)).toEqual(expect.arrayContaining(['Entrance', 'Fittings', 'Hose friction', 'Exit']));
  });
});
