"""Expected spreadsheet results, computed independently of the add-ins.

Each function of bindings/spreadsheet/functions.py has one line here written by
hand with the Python binding (package acperf, which calls libacperf) and its
unit helpers: the "C/Python result" the Calc cells and the DLL's results are
compared with. The table of the add-ins is not read here, so a wrong unit or a
wrong C function in it shows up as a difference.

expected(name, args) -> list of rows of cell values: a float, a str, or one of
the error texts "#VALUE!" (invalid input) and "#NUM!" (no result).
"""

import math
import tomllib
import warnings

import numpy as np

import acperf
from acperf import units as u

VALUE, NUM = "#VALUE!", "#NUM!"
NOT_OK = object()   # ACP_AIRCRAFT_CHECK of a bad range: any text but "OK"
INVALID = {1, 5, 8}      # ACP_ERR_INVALID, ACP_ERR_PARSE, ACP_ERR_UNKNOWN_KEY


class Invalid(Exception):
    pass


def ft(x): return u.ft_to_m(x)
def kt(x): return u.kt_to_mps(x)
def to_kt(x): return u.mps_to_kt(x)
def to_ft(x): return u.m_to_ft(x)
def c_to_k(x): return u.degc_to_k(x)
def k_to_c(x): return u.k_to_degc(x)


def aircraft_rows(path):
    """The two-column key/value rows of an aircraft file (for the workbooks)."""
    with open(path, "rb") as f:
        data = tomllib.load(f)
    rows = [(k, v) for k, v in data.items() if k != "component"]
    for name, comp in data.get("component", {}).items():
        rows += [(f"component.{name}.{k}", v) for k, v in comp.items()]
    return rows


def aircraft(rows):
    """acperf.Aircraft from key/value rows; Invalid for what the add-in rejects."""
    ac = acperf.Aircraft()
    keys = [r for r in rows if not (r[0] is None and r[1] is None)]
    if not keys:
        raise Invalid("empty")
    for k, v in keys:
        textual = k in ("name", "engine_type") or (k.startswith("component.") and k.endswith(".type"))
        if textual != isinstance(v, str) or v is None:
            raise Invalid(k)
        try:
            ac[k] = v
        except (acperf.AcperfError, KeyError, TypeError, ValueError) as e:
            raise Invalid(str(e))
    try:
        ac.check()
    except acperf.AcperfError as e:
        raise Invalid(str(e))
    return ac


def _one(x):
    """A length-1 array result (the array forms keep the outputs they found)."""
    return float(np.asarray(x).reshape(-1)[0])


def _arr(*xs):
    return [np.array([float(x)]) for x in xs]


def speeds(kind, ac, m, hp, dt, unit):
    f = {"tas": acperf.speeds, "cas": acperf.speeds_cas, "mach": acperf.speeds_mach}[kind]
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        s = f(ac, *_arr(m, ft(hp), dt))
    conv = to_kt if unit == "kt" else (lambda v: v)
    return [conv(_one(s.vmd)), conv(_one(s.vmp)), conv(_one(s.vmr)), conv(_one(s.vs1g)),
            _one(s.ld_max)]


def glide(ac, m, hp, dt):
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        g = acperf.glide(ac, *_arr(m, ft(hp), dt))
    return [_one(g.best_glide_ratio), to_kt(_one(g.best_glide_speed)),
            u.mps_to_fpm(_one(g.best_glide_sink_rate)), to_kt(_one(g.min_sink_speed)),
            u.mps_to_fpm(_one(g.min_sink_rate))]


def drag(ac, m, hp, dt, v):
    d = acperf.drag(ac, m, ft(hp), dt, kt(v))
    return [d.friction, d.form, d.interference, d.parasite, d.induced, d.wave, d.total]


def atmos(hp, dt):
    a = acperf.isa(ft(hp), dt)
    return [k_to_c(a.temperature), u.pa_to_hpa(a.pressure), a.density, to_kt(a.sound_speed),
            a.dynamic_viscosity, a.kinematic_viscosity]


# name: (aircraft?, function of the numeric/text arguments -> value or row)
REFERENCE = {
    "ACP_VERSION": (False, lambda: acperf.version_string()),
    "ACP_CONVERT": (False, lambda x, a, b: u.from_si(u.to_si(x, a), b)),
    "ACP_ISA": (False, atmos),
    "ACP_ISA_TEMPERATURE": (False, lambda hp, dt: k_to_c(acperf.isa_temperature(ft(hp), dt))),
    "ACP_ISA_PRESSURE": (False, lambda hp: u.pa_to_hpa(acperf.isa_pressure(ft(hp)))),
    "ACP_ISA_DENSITY": (False, lambda hp, dt: acperf.isa_density(ft(hp), dt)),
    "ACP_SOUND_SPEED": (False, lambda hp, dt: to_kt(acperf.isa_sound_speed(ft(hp), dt))),
    "ACP_ISA_DEVIATION": (False, lambda oat, hp: acperf.isa_deviation(c_to_k(oat), ft(hp))),
    "ACP_OAT": (False, lambda dt, hp: k_to_c(acperf.outside_air_temperature(dt, ft(hp)))),
    "ACP_TOTAL_TEMPERATURE": (False, lambda t, m, r: k_to_c(acperf.total_temperature(c_to_k(t), m, r))),
    "ACP_PRESSURE_ALTITUDE": (False, lambda p: to_ft(acperf.isa_pressure_altitude(u.hpa_to_pa(p)))),
    "ACP_PRESSURE_ALTITUDE_QNH": (False, lambda h, q: to_ft(acperf.pressure_altitude_from_qnh(ft(h), u.hpa_to_pa(q)))),
    "ACP_DENSITY_ALTITUDE": (False, lambda hp, dt: to_ft(acperf.density_altitude(ft(hp), dt))),
    "ACP_CAS_TO_TAS": (False, lambda v, hp, dt: to_kt(acperf.cas_to_tas(kt(v), ft(hp), dt))),
    "ACP_TAS_TO_CAS": (False, lambda v, hp, dt: to_kt(acperf.tas_to_cas(kt(v), ft(hp), dt))),
    "ACP_CAS_TO_MACH": (False, lambda v, hp: acperf.cas_to_mach(kt(v), ft(hp))),
    "ACP_MACH_TO_CAS": (False, lambda m, hp: to_kt(acperf.mach_to_cas(m, ft(hp)))),
    "ACP_MACH_TO_TAS": (False, lambda m, hp, dt: to_kt(acperf.mach_to_tas(m, ft(hp), dt))),
    "ACP_TAS_TO_MACH": (False, lambda v, hp, dt: acperf.tas_to_mach(kt(v), ft(hp), dt)),
    "ACP_CAS_TO_EAS": (False, lambda v, hp: to_kt(acperf.cas_to_eas(kt(v), ft(hp)))),
    "ACP_CROSSOVER_ALTITUDE": (False, lambda v, m: to_ft(acperf.crossover_altitude(kt(v), m))),
    "ACP_WIND_TRIANGLE": (False, lambda v, trk, wd, ws: (lambda w: [to_kt(w.ground_speed), u.rad_to_deg(w.heading), u.rad_to_deg(w.drift)])(
        acperf.wind_triangle(kt(v), u.deg_to_rad(trk), u.deg_to_rad(wd), kt(ws)))),
    "ACP_AIRCRAFT_CHECK": (True, lambda ac: "OK"),
    "ACP_AIRCRAFT_VALUE": (True, lambda ac, key: ac[key]),
    "ACP_DRAG": (True, drag),
    "ACP_DRAG_TOTAL": (True, lambda ac, m, hp, dt, v: drag(ac, m, hp, dt, v)[6]),
    "ACP_SPEEDS_CAS": (True, lambda ac, m, hp, dt: speeds("cas", ac, m, hp, dt, "kt")),
    "ACP_SPEEDS_TAS": (True, lambda ac, m, hp, dt: speeds("tas", ac, m, hp, dt, "kt")),
    "ACP_SPEEDS_MACH": (True, lambda ac, m, hp, dt: speeds("mach", ac, m, hp, dt, None)),
    "ACP_LD_MAX": (True, lambda ac, m, hp, dt: speeds("tas", ac, m, hp, dt, "kt")[4]),
    "ACP_GLIDE": (True, glide),
}
TEXT_ARGS = {"ACP_CONVERT": 2, "ACP_AIRCRAFT_VALUE": 1}


def _num(x):
    if isinstance(x, bool) or not isinstance(x, (int, float)) or not math.isfinite(x):
        raise Invalid("not a number")
    return float(x)


def _cell(v):
    if isinstance(v, str):
        return v
    v = float(v)
    return v if math.isfinite(v) else NUM


def expected(name, args):
    """Rows of expected cells for a call with already-resolved arguments.
    A numeric argument may be a list (a one-column range): one row each."""
    needs_ac, f = REFERENCE[name]
    args = list(args)
    try:
        ac = aircraft(args.pop(0)) if needs_ac else None
    except Invalid as e:
        return [[NOT_OK if name == "ACP_AIRCRAFT_CHECK" else VALUE]]
    ntext = TEXT_ARGS.get(name, 0)
    texts = args[len(args) - ntext:] if ntext else []
    nums = args[:len(args) - ntext] if ntext else args
    if any(not isinstance(t, str) for t in texts):
        return [[VALUE]]
    lists = [a for a in nums if isinstance(a, list)]
    if len({len(a) for a in lists}) > 1:
        return [[VALUE]]      # range arguments of different lengths
    n = len(lists[0]) if lists else None
    rows = []
    for k in range(n or 1):
        try:
            point = [_num(a[k] if isinstance(a, list) else a) for a in nums]
        except Invalid:
            return [[VALUE]]
        try:
            r = f(*([ac] if needs_ac else []), *point, *texts)
        except acperf.AcperfError as e:
            if name in ("ACP_CONVERT", "ACP_AIRCRAFT_VALUE") and e.status in INVALID:
                return [[VALUE]]
            r = VALUE if e.status in INVALID else NUM
            if name in ("ACP_ISA", "ACP_DRAG", "ACP_WIND_TRIANGLE"):
                if r == VALUE:
                    return [[VALUE]]
                r = [NUM] * {"ACP_ISA": 6, "ACP_DRAG": 7, "ACP_WIND_TRIANGLE": 3}[name]
        except KeyError:
            return [[VALUE]]
        rows.append([_cell(x) for x in r] if isinstance(r, list) else [_cell(r)])
    return rows
