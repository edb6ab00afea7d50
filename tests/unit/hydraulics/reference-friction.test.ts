import { describe, expect, test } from 'vitest';
import { colebrookWhite, frictionFactor } from '../../../src/lib/hydraulics/friction';
import { loadFixture, logMax, relDev } from './reference-fixture';

// Reference: fluids.friction.Colebrook(Re, eD, tol=0) (Python, Debian python3-fluids), the exact
// Colebrook–White root via Lambert W at 50 digits, via tests/fixtures/colebrook.json.
// Tolerance 0.1 % of the exact root, Re 4e3–1e8, ε/D 0–0.05.
interface Row {
  reynolds: number;
  relative_roughness: number;
  friction_factor: number;
}
const fx = loadFixture<Row>('colebrook.json');

describe(`colebrookWhite against fluids ${fx.libraries.fluids} Colebrook (exact)`, () => {
  test('does the friction factor within 0.1 % over Re 4e3–1e8 and ε/D 0–0.05', () => {
    const devs = fx.cases.map((r) =>
      relDev(colebrookWhite(r.reynolds, r.relative_roughness), r.friction_factor),
    );
    logMax('Colebrook vs fluids', devs);
    for (const d of devs) expect(d).toBeLessThan(1e-3);
  });

  test('does frictionFactor use the same turbulent values and call them turbulent', () => {
    for (const r of fx.cases) {
      const { f, regime } = frictionFactor(r.reynolds, r.relative_roughness);
      expect(regime).toBe('turbulent');
      expect(relDev(f, r.friction_factor)).toBeLessThan(1e-3);
    }
  });
});
