"""Catalogue cross-checks from the tables and Crane-method functions shipped with fluids.

Pipe dimensions: fluids.piping.nearest_pipe(NPS=..., schedule=...), which tabulates ASTM D1785
(PVC Sch 40/80, schedules '40D1785', '80D1785'), ASME B36.10M (steel, schedule '40') and
ASTM F2619 DR 11 IPS (polyethylene, 'DR11F2619IPS'; same OD and DR-11 minimum wall as D3035).
Fittings: fluids.fittings Crane-method functions evaluated at 2 in Sch 40 (D = 52.50 mm).
"""

from fluids import fittings as F
from fluids.piping import nearest_pipe

NPS = [0.5, 0.75, 1, 1.25, 1.5, 2, 2.5, 3, 3.5, 4, 5, 6, 8]
SCHEDULES = {'pvc-sch40': '40D1785', 'pvc-sch80': '80D1785', 'steel-sch40': '40',
             'hdpe-dr11-ips': 'DR11F2619IPS'}


def sizes():
    rows = []
    for family, schedule in SCHEDULES.items():
        for nps in NPS:
            if family == 'hdpe-dr11-ips' and nps == 3.5:
                continue  # not a DR 11 IPS size
            _n, di, do, t = nearest_pipe(NPS=nps, schedule=schedule)
            rows.append({'family': family, 'nps': nps, 'schedule': schedule,
                         'inner_diameter_m': di, 'outer_diameter_m': do, 'wall_m': t})
    return rows


def fittings_2in():
    d = nearest_pipe(NPS=2, schedule='40')[1]
    ks = {
        'entrance-sharp': ('fluids.fittings.entrance_sharp(method="Crane")',
                           F.entrance_sharp(method='Crane')),
        'entrance-projecting': ('fluids.fittings.entrance_distance(D, t=0.001*D, method="Crane")',
                                F.entrance_distance(d, t=0.001 * d, method='Crane')),
        'exit-free-jet': ('fluids.fittings.exit_normal()', F.exit_normal()),
        'valve-gate': ('K_gate_valve_Crane(D, D, 0)', F.K_gate_valve_Crane(d, d, 0)),
        'valve-ball': ('K_ball_valve_Crane(D, D, 0)', F.K_ball_valve_Crane(d, d, 0)),
        'valve-globe': ('K_globe_valve_Crane(D, D)', F.K_globe_valve_Crane(d, d)),
        'valve-angle': ('K_angle_valve_Crane(D, D, style=1)', F.K_angle_valve_Crane(d, d, style=1)),
        'valve-butterfly': ('K_butterfly_valve_Crane(D, style=0)', F.K_butterfly_valve_Crane(d)),
        'valve-check-swing': ('K_swing_check_valve_Crane(D, angled=True)',
                              F.K_swing_check_valve_Crane(d, angled=True)),
        'valve-check-lift': ('K_lift_check_valve_Crane(D, D, angled=False)',
                             F.K_lift_check_valve_Crane(d, d, angled=False)),
        'valve-foot-poppet': ('K_foot_valve_Crane(D, style=0)', F.K_foot_valve_Crane(d, style=0)),
        'valve-foot-hinged': ('K_foot_valve_Crane(D, style=1)', F.K_foot_valve_Crane(d, style=1)),
        'elbow-90-long-radius': ('bend_rounded(D, 90, rc=1.5*D, method="Crane")',
                                 F.bend_rounded(d, 90, rc=1.5 * d, method='Crane')),
        'bend-90-r2': ('bend_rounded(D, 90, rc=2*D, method="Crane")',
                       F.bend_rounded(d, 90, rc=2 * d, method='Crane')),
        'elbow-45-long-radius': ('bend_rounded(D, 45, rc=1.5*D, method="Crane")',
                                 F.bend_rounded(d, 45, rc=1.5 * d, method='Crane')),
    }
    for ratio, fid in [(0.02, 'entrance-rounded-r02'), (0.04, 'entrance-rounded-r04'),
                       (0.06, 'entrance-rounded-r06'), (0.10, 'entrance-rounded-r10'),
                       (0.15, 'entrance-bell-mouth')]:
        ks[fid] = (f'entrance_rounded(D, {ratio}*D, method="Crane")',
                   F.entrance_rounded(d, ratio * d, method='Crane'))
    return d, F.ft_Crane(d), [{'id': k, 'call': c, 'k': v} for k, (c, v) in ks.items()]


def write_catalog(write):
    write('pipe-sizes.json', 'Pipe dimensions from the schedule tables shipped with fluids.',
          {'dimensions': 'fluids.piping.nearest_pipe(NPS=nps, schedule=schedule) -> '
                         '(NPS, Di, Do, t) in m'},
          {'cases': sizes()})
    d, ft, rows = fittings_2in()
    write('fittings-crane.json', 'Crane-method K values from fluids, at 2 in Sch 40 steel.',
          {'diameter_m': 'fluids.piping.nearest_pipe(NPS=2, schedule="40")[1]',
           'ft': 'fluids.fittings.ft_Crane(D)', 'k': 'fluids.fittings.<call> as listed'},
          {'diameter_m': d, 'ft': ft, 'cases': rows})
