#!/usr/bin/python3
"""Write the reference fixtures under tests/fixtures/ from outside reference libraries.

Run with Debian's interpreter and packages (python3-fluids, python3-iapws, python3-scipy):

    /usr/bin/python3 tests/reference/generate.py

Nothing here imports or copies the Drainwright engine: the numbers come from iapws (IAPWS-IF97,
IAPWS-95, IAPWS 2008 viscosity), fluids (US Standard Atmosphere 1976, Colebrook, pipe schedules,
Crane-method fittings) and scipy (root finding, ODE integration). Output is deterministic (no
timestamps) so a regeneration can be diffed against the committed files.
"""

import json
import os
import platform
import sys

import fluids
import iapws
import numpy
import scipy
from fluids.atmosphere import ATMOSPHERE_1976
from fluids.friction import Colebrook
from iapws import IAPWS95, IAPWS97

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import reference_catalog  # noqa: E402
import reference_drains  # noqa: E402
import reference_flows  # noqa: E402

HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.normpath(os.path.join(HERE, '..', 'fixtures'))

LIBRARIES = {
    'python': platform.python_version(),
    'fluids': fluids.__version__,
    'iapws': iapws.__version__,
    'scipy': scipy.__version__,
    'numpy': numpy.__version__,
}


def write(name, description, calls, data):
    """One fixture file: what made it, how, and the cases."""
    doc = {
        'description': description,
        'generator': 'tests/reference/generate.py',
        'libraries': LIBRARIES,
        'calls': calls,
        **data,
    }
    os.makedirs(OUT, exist_ok=True)
    path = os.path.join(OUT, name)
    with open(path, 'w', encoding='utf-8') as fh:
        json.dump(doc, fh, indent=1, ensure_ascii=False)
        fh.write('\n')
    print('wrote', os.path.relpath(path, os.getcwd()))


WATER_T_C = [0.01, 0.5, 1, 2, 4, 5, 7.5, 10, 12.5, 15, 17.5, 20, 25, 30, 35, 40, 45, 50, 55,
             60, 65, 70, 75, 80, 85, 90, 92.5, 95, 97, 98, 99]


def water():
    rows = []
    for t in WATER_T_C:
        tk = t + 273.15
        sat = IAPWS97(T=tk, x=0)
        w97 = IAPWS97(T=tk, P=0.101325)
        w95 = IAPWS95(T=tk, P=0.101325)
        assert w97.region == 1, (t, w97.region)
        rows.append({
            'temperature_c': t,
            'saturation_pressure_pa': sat.P * 1e6,
            'density_if97_kg_m3': w97.rho,
            'viscosity_if97_pa_s': w97.mu,
            'density_iapws95_kg_m3': w95.rho,
            'viscosity_iapws95_pa_s': w95.mu,
        })
    # IAPWS R7-97(2012) Table 35, the release's own program-verification values for Eq. 30
    # (saturation pressure, MPa); the library is checked against them here and in the test.
    published = [[300.0, 0.353658941e-2], [500.0, 0.263889776e1], [600.0, 0.123443146e2]]
    for tk, p_mpa in published:
        got = IAPWS97(T=tk, x=0).P
        assert abs(got / p_mpa - 1) < 1e-8, (tk, got, p_mpa)
    write(
        'water-iapws.json',
        'Liquid water at 101.325 kPa and its saturation pressure, 0.01-99 °C.',
        {
            'saturation_pressure_pa': 'iapws.IAPWS97(T=T_K, x=0).P * 1e6 (IF97 region 4, Eq. 30)',
            'density_if97_kg_m3': 'iapws.IAPWS97(T=T_K, P=0.101325).rho (IF97 region 1)',
            'viscosity_if97_pa_s': 'iapws.IAPWS97(T=T_K, P=0.101325).mu (IAPWS 2008 viscosity)',
            'density_iapws95_kg_m3': 'iapws.IAPWS95(T=T_K, P=0.101325).rho',
            'viscosity_iapws95_pa_s': 'iapws.IAPWS95(T=T_K, P=0.101325).mu (IAPWS 2008 viscosity)',
            'T_K': 'temperature_c + 273.15',
        },
        {
            'if97_table35_saturation': [
                {'temperature_k': tk, 'saturation_pressure_pa': p * 1e6} for tk, p in published
            ],
            'cases': rows,
        },
    )


def atmosphere():
    zs = [-500, -250, 0, 100, 250, 500, 750, 1000, 1500, 2000, 2500, 3000, 3500, 4000, 4500,
          5000, 5500, 6000]
    rows = [{'altitude_m': z, 'pressure_pa': ATMOSPHERE_1976(Z=float(z)).P} for z in zs]
    write(
        'atmosphere-1976.json',
        'US Standard Atmosphere 1976 pressure at GEOMETRIC altitudes -500 to 6000 m.',
        {'pressure_pa': 'fluids.atmosphere.ATMOSPHERE_1976(Z=altitude_m).P '
                        '(Z geometric; the class converts to geopotential H = r0*Z/(r0+Z))'},
        {'cases': rows},
    )


def friction():
    res = [float(r) for r in numpy.geomspace(4e3, 1e8, 25)]
    eds = [0.0, 1e-6, 1e-5, 1e-4, 5e-4, 1e-3, 5e-3, 1e-2, 2e-2, 5e-2]
    rows = []
    for ed in eds:
        for re in res:
            f = Colebrook(re, ed, tol=0)  # tol=0: mpmath Lambert-W solution at 50 digits
            x = 1 / f ** 0.5
            resid = x + 2 * numpy.log10(ed / 3.7 + 2.51 * x / re)
            # The Lambert-W form loses ~1e-11 to cancellation at the largest eps/D·Re; far below 0.1 %.
            assert abs(resid) < 1e-9 * x, (re, ed, resid)
            rows.append({'reynolds': re, 'relative_roughness': ed, 'friction_factor': f})
    write(
        'colebrook.json',
        'Darcy friction factor, exact root of Colebrook-White, Re 4e3-1e8, eps/D 0-0.05.',
        {'friction_factor': 'fluids.friction.Colebrook(Re, eD, tol=0) '
                            '(closed form with Lambert W evaluated by mpmath at 50 digits)'},
        {'cases': rows},
    )


def main():
    water()
    atmosphere()
    friction()
    reference_flows.write_lines(write)
    reference_drains.write_drains(write)
    reference_catalog.write_catalog(write)


if __name__ == '__main__':
    main()
