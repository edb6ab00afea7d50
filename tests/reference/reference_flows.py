"""Gravity-line flows, solved independently with scipy and fluids.

Gravity line (API v1 energy equation, source surface to outlet):
    H = (1 + Ke + sum K + f L/D) V^2 / (2 g)
solved for V with scipy.optimize.brentq; f = 64/Re (laminar) or fluids' Colebrook (turbulent).
Cases are chosen so the solution is clearly laminar (Re <= 2000) or turbulent (Re >= 4000); the
transition is the engine's own rule and has no outside reference.
"""

import math

import numpy
from fluids.friction import Colebrook
from iapws import IAPWS95, IAPWS97
from scipy.optimize import brentq

G = 9.80665  # m/s², standard gravity (API v1)
EPS = 4 * numpy.finfo(float).eps


def water_props(t_c):
    """Water at 101.325 kPa from IAPWS-95 (density, viscosity) and IF97 (vapour pressure)."""
    w = IAPWS95(T=t_c + 273.15, P=0.101325)
    pv = IAPWS97(T=t_c + 273.15, x=0).P * 1e6
    return {'density_kg_m3': w.rho, 'viscosity_pa_s': w.mu, 'vapor_pressure_pa': pv}


def friction_factor(re, ed):
    if re <= 2000:
        return 64.0 / re
    assert re >= 4000, ('transitional Reynolds number in a reference case', re)
    return Colebrook(re, ed)


def line_flow(line, head, rho, mu):
    """Steady flow of one API v1 line at head H (m). Returns the response fields."""
    d, length, eps = line['inner_diameter_m'], line['length_m'], line['roughness_m']
    ke, k = line.get('entrance_k', 0.5), line.get('minor_loss_k', 0.0)
    n = line.get('parallel_lines', 1)

    def f_of(v):
        re = rho * v * d / mu
        return 64.0 / re if re <= 2000 else Colebrook(re, eps / d)

    def resid(v):
        return (1 + ke + k + f_of(v) * length / d) * v * v / (2 * G) - head

    v = brentq(resid, 1e-12, math.sqrt(2 * G * head), xtol=1e-15, rtol=EPS, maxiter=500)
    re = rho * v * d / mu
    f = friction_factor(re, eps / d)
    vh = v * v / (2 * G)
    return {
        'head_m': head,
        'flow_m3_s': n * v * math.pi * d * d / 4,
        'velocity_m_s': v,
        'reynolds': re,
        'friction_factor': f,
        'regime': 'laminar' if re <= 2000 else 'turbulent',
        'losses_m': {'entrance': ke * vh, 'fittings': k * vh,
                     'friction': f * length / d * vh, 'exit': vh},
    }


W15 = water_props(15.0)
OIL = {'density_kg_m3': 880.0, 'viscosity_pa_s': 0.2, 'vapor_pressure_pa': 100.0}

LINE_CASES = [
    ('garden hose 3/4 in, 30 m, 3 m head', W15,
     {'inner_diameter_m': 0.01905, 'length_m': 30, 'roughness_m': 1e-5}, 3.0, 0.0, None),
    ('PVC 2 in, 100 m, fittings K 2.0', W15,
     {'inner_diameter_m': 0.0525, 'length_m': 100, 'roughness_m': 1.5e-6, 'minor_loss_k': 2.0},
     105.0, 100.0, None),
    ('steel 4 in x3 in parallel, 500 m', W15,
     {'inner_diameter_m': 0.10226, 'length_m': 500, 'roughness_m': 4.572e-5,
      'minor_loss_k': 3.5, 'entrance_k': 0.78, 'parallel_lines': 3}, 12.0, 0.0, None),
    ('lay-flat 6 in into tailwater', W15,
     {'inner_diameter_m': 0.1524, 'length_m': 50, 'roughness_m': 2e-5}, 10.0, 8.0, 9.2),
    ('concrete culvert 0.6 m, 40 m', W15,
     {'inner_diameter_m': 0.6, 'length_m': 40, 'roughness_m': 3.048e-4}, 0.5, 0.0, None),
    ('rough corrugated suction hose, eps/D 0.026', W15,
     {'inner_diameter_m': 0.0381, 'length_m': 12, 'roughness_m': 1e-3, 'minor_loss_k': 1.4},
     4.0, 0.0, None),
    ('laminar: oil in a 25 mm tube', OIL,
     {'inner_diameter_m': 0.025, 'length_m': 15, 'roughness_m': 0.0}, 1.0, 0.0, None),
    ('laminar: water in a 2 mm tube', W15,
     {'inner_diameter_m': 0.002, 'length_m': 5, 'roughness_m': 0.0, 'entrance_k': 1.0},
     0.3, 0.0, None),
    ('suction hose 1.5 in, water at 60 °C, foot valve', {'water_temperature_c': 60.0},
     {'inner_diameter_m': 0.0381, 'length_m': 20, 'roughness_m': 5e-5, 'minor_loss_k': 8.0,
      'entrance_k': 1.0}, 2.5, 0.0, None),
]


def write_lines(write):
    rows = []
    for name, fluid, line, source, outlet, tail in LINE_CASES:
        props = water_props(fluid['water_temperature_c']) if 'water_temperature_c' in fluid else fluid
        req = {'fluid': fluid, 'line': line, 'source_level_m': source, 'outlet_elevation_m': outlet}
        if tail is not None:
            req['tailwater_level_m'] = tail
        head = source - (tail if tail is not None else outlet)
        rows.append({'name': name, 'request': req, 'fluid_props_used': props,
                     'expected': line_flow(line, head, props['density_kg_m3'],
                                           props['viscosity_pa_s'])})
    write(
        'gravity-lines.json',
        'Gravity-line flows from the API v1 energy equation, solved independently.',
        {'velocity': 'scipy.optimize.brentq on (1 + Ke + K + f L/D) V^2/(2 g) - H, '
                     'xtol 1e-15, rtol 4 eps',
         'friction_factor': 'laminar 64/Re; turbulent fluids.friction.Colebrook(Re, eD)',
         'water': 'iapws.IAPWS95(T, P=0.101325) rho, mu; iapws.IAPWS97(T, x=0).P for p_v',
         'g': G},
        {'cases': rows},
    )
