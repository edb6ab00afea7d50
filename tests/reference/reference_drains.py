"""Drain-down references, integrated independently with scipy.

Quasi-steady (API v1): dV/dt = -Q(h), A(h) dh/dt = -Q(h), integrated with
scipy.integrate.solve_ivp (DOP853, rtol 1e-10, atol 1e-13) with a terminal event at the stop.

For orifices, Q = n Cd a sqrt(2 g (h - h_o)); the state is u = sqrt(h - h_o), which makes the
right-hand side smooth right down to the orifice:  du/dt = -n Cd a sqrt(2 g) / (2 A(h_o + u^2)).
For a line outlet, Q(h) is the steady gravity-line flow at head H = z_bottom + h - z_outlet,
found with brentq at every step (reference_flows.line_flow).

Vessel areas A(h) are written from each shape's geometry; volumes are scipy.integrate.quad of A.
"""

import math

import numpy
from scipy.integrate import quad, solve_ivp

from reference_flows import G, W15, line_flow

RTOL, ATOL = 1e-10, 1e-13


def area_fn(v):
    s = v['shape']
    if s == 'box':
        return lambda h: v['length_m'] * v['width_m']
    if s == 'vertical_cylinder':
        return lambda h: math.pi * v['diameter_m'] ** 2 / 4
    if s == 'horizontal_cylinder':
        d, length = v['diameter_m'], v['length_m']
        return lambda h: 2 * length * math.sqrt(max(h * (d - h), 0.0))
    if s == 'sphere':
        return lambda h: math.pi * h * (v['diameter_m'] - h)
    if s == 'cone_bottom':
        r, hc = v['diameter_m'] / 2, v['cone_height_m']
        return lambda h: math.pi * (r * min(h, hc) / hc) ** 2
    if s == 'sloped_pond':
        bl, bw, z = v['bottom_length_m'], v['bottom_width_m'], v['side_slope_h_per_v']
        return lambda h: (bl + 2 * z * h) * (bw + 2 * z * h)
    if s == 'stage_table':
        ds = [p['depth_m'] for p in v['points']]
        As = [p['area_m2'] for p in v['points']]
        return lambda h: float(numpy.interp(h, ds, As))
    raise ValueError(s)


def volume(v, area, h):
    kinks = [p['depth_m'] for p in v['points'] if 0 < p['depth_m'] < h] if 'points' in v else None
    if v['shape'] == 'cone_bottom' and v['cone_height_m'] < h:
        kinks = [v['cone_height_m']]
    val, _ = quad(area, 0.0, h, points=kinks, epsabs=0.0, epsrel=1e-13, limit=500)
    return val


def drain_orifice(req, area):
    o = req['outlet']
    z_b = req.get('bottom_elevation_m', 0.0)
    h_o = o.get('elevation_m', z_b) - z_b
    h0, hf = req['initial_depth_m'], req.get('final_depth_m', 0.0)
    c = o.get('count', 1) * o.get('discharge_coefficient', 0.61) * math.pi * o['diameter_m'] ** 2 / 4
    u_stop = math.sqrt(hf - h_o) if hf > h_o else 0.0
    reason = 'final_depth' if hf > h_o else 'intake_uncovered'

    def rhs(_t, y):
        return [-c * math.sqrt(2 * G) / (2 * area(h_o + y[0] ** 2))]

    def stop(_t, y):
        return y[0] - u_stop
    stop.terminal, stop.direction = True, -1
    sol = solve_ivp(rhs, (0, 1e9), [math.sqrt(h0 - h_o)], method='DOP853', rtol=RTOL, atol=ATOL,
                    events=stop, dense_output=True)
    t_end = float(sol.t_events[0][0])
    depth = lambda t: h_o + float(sol.sol(t)[0]) ** 2  # noqa: E731
    flow = lambda h: c * math.sqrt(2 * G * max(h - h_o, 0.0))  # noqa: E731
    return t_end, (hf if hf > h_o else h_o), reason, depth, flow


def drain_line(req, area):
    o, props = req['outlet'], req['fluid']
    z_b = req.get('bottom_elevation_m', 0.0)
    h0, hf = req['initial_depth_m'], req.get('final_depth_m', 0.0)

    def flow(h):
        head = z_b + h - o['outlet_elevation_m']
        return line_flow(o['line'], head, props['density_kg_m3'], props['viscosity_pa_s'])['flow_m3_s']

    def stop(_t, y):
        return y[0] - hf
    stop.terminal, stop.direction = True, -1
    sol = solve_ivp(lambda _t, y: [-flow(y[0]) / area(y[0])], (0, 1e9), [h0], method='DOP853',
                    rtol=RTOL, atol=ATOL, events=stop, dense_output=True)
    return float(sol.t_events[0][0]), hf, 'final_depth', lambda t: float(sol.sol(t)[0]), flow


def orifice(d, cd=0.61, **kw):
    return {'type': 'orifice', 'diameter_m': d, 'discharge_coefficient': cd, **kw}


DRAIN_CASES = [
    ('box through one orifice (Torricelli)',
     {'vessel': {'shape': 'box', 'length_m': 4, 'width_m': 3, 'depth_m': 2},
      'initial_depth_m': 1.8, 'final_depth_m': 0.05, 'outlet': orifice(0.05)}),
    ('vertical cylinder, two orifices',
     {'vessel': {'shape': 'vertical_cylinder', 'diameter_m': 3, 'depth_m': 3},
      'initial_depth_m': 2.5, 'final_depth_m': 0.1, 'outlet': orifice(0.04, 0.62, count=2)}),
    ('horizontal cylinder',
     {'vessel': {'shape': 'horizontal_cylinder', 'diameter_m': 2, 'length_m': 6},
      'initial_depth_m': 1.9, 'final_depth_m': 0.05, 'outlet': orifice(0.05)}),
    ('sphere',
     {'vessel': {'shape': 'sphere', 'diameter_m': 3},
      'initial_depth_m': 2.8, 'final_depth_m': 0.1, 'outlet': orifice(0.06)}),
    ('cone-bottom tank',
     {'vessel': {'shape': 'cone_bottom', 'diameter_m': 2.4, 'cone_height_m': 1.0, 'depth_m': 3},
      'initial_depth_m': 2.8, 'final_depth_m': 0.15, 'outlet': orifice(0.05)}),
    ('sloped-sided pond',
     {'vessel': {'shape': 'sloped_pond', 'bottom_length_m': 12, 'bottom_width_m': 8,
                 'side_slope_h_per_v': 2.5, 'depth_m': 1.6},
      'initial_depth_m': 1.5, 'final_depth_m': 0.1, 'outlet': orifice(0.15)}),
    ('stage table (linear area between points)',
     {'vessel': {'shape': 'stage_table', 'points': [
         {'depth_m': 0, 'area_m2': 20}, {'depth_m': 0.4, 'area_m2': 45},
         {'depth_m': 1.0, 'area_m2': 80}, {'depth_m': 1.8, 'area_m2': 120}]},
      'initial_depth_m': 1.7, 'final_depth_m': 0.05, 'outlet': orifice(0.1)}),
    ('box, orifice 0.5 m up the wall, datum at 100 m: stops when uncovered',
     {'vessel': {'shape': 'box', 'length_m': 2, 'width_m': 2, 'depth_m': 2.5},
      'bottom_elevation_m': 100, 'initial_depth_m': 2.0, 'final_depth_m': 0,
      'outlet': orifice(0.03, elevation_m=100.5)}),
    ('box through a 2 in gravity line',
     {'fluid': W15, 'vessel': {'shape': 'box', 'length_m': 5, 'width_m': 5, 'depth_m': 2},
      'bottom_elevation_m': 10, 'initial_depth_m': 1.5, 'final_depth_m': 0.1,
      'outlet': {'type': 'line', 'outlet_elevation_m': 7.0,
                 'line': {'inner_diameter_m': 0.0508, 'length_m': 25, 'roughness_m': 1.5e-6,
                          'minor_loss_k': 1.0, 'entrance_k': 0.5}}}),
]


def drain_case(name, req):
    area = area_fn(req['vessel'])
    run = drain_line if req['outlet']['type'] == 'line' else drain_orifice
    t, h_stop, reason, depth, flow = run(req, area)
    v0 = volume(req['vessel'], area, req['initial_depth_m'])
    v_stop = volume(req['vessel'], area, h_stop)
    samples = [{'time_s': float(tt), 'depth_m': depth(tt)} for tt in numpy.linspace(0, t, 6)]
    if req['vessel']['shape'] == 'box' and req['outlet']['type'] == 'orifice':
        o, h_o = req['outlet'], h_stop if reason == 'intake_uncovered' else 0.0
        a = o.get('count', 1) * o['discharge_coefficient'] * math.pi * o['diameter_m'] ** 2 / 4
        closed = (area(0) / a) * math.sqrt(2 / G) * (
            math.sqrt(req['initial_depth_m'] - h_o) - math.sqrt(h_stop - h_o))
        assert abs(t / closed - 1) < 1e-8, (name, t, closed)  # Torricelli closed form
    return {'name': name, 'request': req, 'expected': {
        'stop_reason': reason, 'time_s': t, 'stop_depth_m': h_stop,
        'volume_initial_m3': v0, 'volume_drained_m3': v0 - v_stop, 'volume_left_m3': v_stop,
        'initial_flow_m3_s': flow(req['initial_depth_m']), 'mean_flow_m3_s': (v0 - v_stop) / t,
    }, 'samples': samples}


def write_drains(write):
    write(
        'drains.json',
        'Drain-down of vessels of each API v1 shape through orifices and one gravity line.',
        {'time': 'scipy.integrate.solve_ivp(method="DOP853", rtol=1e-10, atol=1e-13) with a '
                 'terminal event at the stop; orifices integrated in u = sqrt(h - h_orifice)',
         'orifice': 'Q = n Cd (pi d^2/4) sqrt(2 g (h - h_orifice))',
         'line': 'Q from reference_flows.line_flow (scipy brentq + fluids Colebrook) per step',
         'volume': 'scipy.integrate.quad of the shape area A(h), epsrel 1e-13',
         'box_check': 'box cases asserted against Torricelli closed form to 1e-8',
         'g': G},
        {'cases': [drain_case(n, r) for n, r in DRAIN_CASES]},
    )
