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


def nm(x): return u.from_si(x, "NM")
def per_t(sar): return u.from_si(sar, "NM") * 1000.0   # m/kg -> NM per 1000 kg
def mins(x): return x / u.MINUTE
def kg_h(x): return x * u.HOUR
def fpm(x): return u.mps_to_fpm(x)


def _quiet(f, *a):
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        return f(*a)


def schedule(hp, dt, cas_low, hp_limit, cas, mach, vmo, mmo):
    s = acperf.speed_schedule(ft(hp), dt, kt(cas_low), ft(hp_limit), kt(cas), mach, kt(vmo), mmo)
    return [s.mode, to_kt(s.cas), s.mach, to_kt(s.tas), to_ft(s.crossover), s.acceleration_factor]


def profile_point(f, ac, m, hp, dt):
    p = f(ac, m, ft(hp), dt, 0.0)
    return [fpm(p.rate), to_kt(p.cas), p.mach, to_kt(p.tas), u.rad_to_deg(p.gradient),
            kg_h(p.fuel_flow), p.mode]


def profile(f, ac, m, h0, h1, dt, w):
    p = f(ac, m, ft(h0), ft(h1), dt, kt(w), 0.0)
    return [mins(p.time), nm(p.distance), p.fuel, p.mass_end]


def trace(f, ac, m, h0, h1, dt, w):
    t, _ = f(ac, m, ft(h0), ft(h1), dt, kt(w), 0.0)
    return [[mins(t.time[i]), nm(t.distance[i]), to_ft(t.hp[i]), t.mass[i], to_kt(t.cas[i]),
             t.mach[i], to_kt(t.tas[i]), fpm(t.rate[i]), kg_h(t.fuel_flow[i])]
            for i in range(len(t.time))]


def ceilings(ac, m, dt):
    c = acperf.ceilings(ac, m, dt)
    return [to_ft(c.service_ceiling), to_ft(c.max_climb_altitude), to_ft(c.buffet_altitude),
            to_ft(c.max_cruise_altitude), to_ft(c.optimum_altitude)]


MODES = {"fixed_mach": acperf.CRUISE_FIXED_MACH, "max_range": acperf.CRUISE_MAX_RANGE,
         "long_range": acperf.CRUISE_LONG_RANGE, "economy": acperf.CRUISE_ECONOMY,
         "max_endurance": acperf.CRUISE_MAX_ENDURANCE}


def mode_of(text):
    key = text.strip().lower().replace(" ", "_").replace("-", "_")
    if key not in MODES:
        raise Invalid(text)
    return MODES[key]


def cruise_speed(ac, m, hp, dt, w, ci, mode):
    p = acperf.cruise_speed(ac, mode_of(mode), ci, m, ft(hp), dt, kt(w))
    return [p.mach, to_kt(p.tas), to_kt(p.cas), kg_h(p.fuel_flow), per_t(p.sar), p.limit]


def cruise(ac, m, hp, dt, w, dist, ci, mode):
    r = acperf.cruise(ac, mode_of(mode), ci, m, ft(hp), dt, kt(w), acperf.END_DISTANCE,
                      u.nm_to_m(dist))
    return [mins(r.time), r.fuel, r.mass_end, per_t(r.sar_mean)]


def breguet(v, tsfc, ld, m0, m1):
    c = tsfc * u.LB / u.HOUR / u.to_si(1.0, "lbf")      # lb/(lbf h) -> kg/(N s)
    return nm(acperf.breguet_range(kt(v), c, ld, m0, m1))


# Mission range keys in operations units -> SI (docs/spreadsheet.md).
MISSION_UNITS = {"distance": u.nm_to_m, "cruise_altitude": ft, "origin_altitude": ft,
                 "destination_altitude": ft, "isa_deviation": float, "wind": kt,
                 "cruise_mode": float, "cost_index": float, "step_climb": ft, "climb_step": ft,
                 "cruise_step": u.nm_to_m, "taxi_time": lambda x: x * u.MINUTE,
                 "taxi_fuel": float, "contingency_fraction": float, "contingency_minimum": float,
                 "alternate_fuel": float, "final_reserve_time": lambda x: x * u.MINUTE,
                 "holding_height": ft, "descent_end_height": ft}


def mission(rows):
    """acperf.Mission from the two-column rows (operations units); Invalid as the add-in."""
    mi = acperf.Mission()
    keys = [r for r in rows if not (r[0] is None and r[1] is None)]
    if not keys:
        raise Invalid("empty")
    for k, v in keys:
        if k not in MISSION_UNITS:
            raise Invalid(k)
        if k == "cruise_mode" and isinstance(v, str):
            v = mode_of(v)
        elif isinstance(v, bool) or not isinstance(v, (int, float)):
            raise Invalid(k)
        try:
            mi[k] = MISSION_UNITS[k](v)
        except acperf.AcperfError as e:
            raise Invalid(str(e))
    return mi


def trip(ac, mi, zfm):
    r = acperf.trip_for_zero_fuel_mass(ac, mi, zfm)
    return [r.trip_fuel, r.block_fuel, mins(r.trip_time), mins(r.block_time), r.takeoff_mass,
            r.landing_mass]


def trip_segments(ac, mi, zfm):
    """Fuel (kg) of the six segments in flight order (acperf/mission.h, acp_trip_result)."""
    r = acperf.trip_for_zero_fuel_mass(ac, mi, zfm)
    return [r.climb_fuel, r.climb_acceleration_fuel, r.cruise_fuel, r.descent_deceleration_fuel,
            r.descent_fuel, r.approach_deceleration_fuel]


# Why a trip is infeasible, in the words of docs/spreadsheet.md (code: text, unit of excess).
REASONS = {1: ("take-off mass above mass_max_takeoff", "kg"),
           2: ("landing mass above mass_max_landing", "kg"),
           3: ("block fuel above fuel_capacity", "kg"),
           4: ("zero-fuel mass above mass_max_zero_fuel", "kg"),
           5: ("distance shorter than the segments other than the cruise", "NM"),
           6: ("cruise altitude above max_altitude", "ft"),
           7: ("the cruise altitude cannot be reached", None),
           8: ("level flight cannot be held in cruise or holding", None),
           9: ("cruise altitude not above the origin and destination", "ft"),
           10: ("the fuel needed exceeds the mass available", "kg"),
           11: ("a take-off or zero-fuel mass below mass_operating_empty", "kg"),
           12: ("the cruise speed is below the 1 g stall (lift coefficient above cl_max)", None)}


def trip_status(ac, mi, zfm):
    # The Python binding names the reason and the excess (acperf.InfeasibleTrip,
    # docs/python.md); any other failure is NOT_OK.
    try:
        acperf.trip_for_zero_fuel_mass(ac, mi, zfm)
        return "OK"
    except acperf.InfeasibleTrip as e:
        if int(e.reason) not in REASONS:
            return NOT_OK
        what, unit = REASONS[int(e.reason)]
        if unit is None or not math.isfinite(e.excess):
            return what
        by = "by at least" if e.result.excess_at_least == 1.0 else "by"
        return f"{what} {by} {u.from_si(e.excess, unit):.0f} {unit}"
    except acperf.AcperfError:
        return NOT_OK


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
    "ACP_SPEED_SCHEDULE": (False, schedule),
    "ACP_CLIMB_POINT": (True, lambda ac, m, hp, dt: profile_point(acperf.climb_point, ac, m, hp, dt)),
    "ACP_DESCENT_POINT": (True, lambda ac, m, hp, dt: profile_point(acperf.descent_point, ac, m, hp, dt)),
    "ACP_CLIMB_RATE": (True, lambda ac, m, hp, dt: profile_point(acperf.climb_point, ac, m, hp, dt)[0]),
    "ACP_CLIMB": (True, lambda ac, *a: profile(acperf.climb, ac, *a)),
    "ACP_DESCENT": (True, lambda ac, *a: profile(acperf.descent, ac, *a)),
    "ACP_CLIMB_TRACE": (True, lambda ac, *a: trace(acperf.climb_trace, ac, *a)),
    "ACP_DESCENT_TRACE": (True, lambda ac, *a: trace(acperf.descent_trace, ac, *a)),
    "ACP_CEILINGS": (True, ceilings),
    "ACP_SAR": (True, lambda ac, m, hp, dt, v, w: per_t(acperf.specific_air_range(ac, m, ft(hp), dt, kt(v), kt(w)))),
    "ACP_CRUISE_SPEED": (True, cruise_speed),
    "ACP_CRUISE": (True, cruise),
    "ACP_BREGUET_RANGE": (False, breguet),
    "ACP_TRIP_FUEL": (2, trip),
    "ACP_TRIP_SEGMENTS": (2, trip_segments),
    "ACP_TRIP_STATUS": (2, trip_status),
}
TEXT_ARGS = {"ACP_CONVERT": 2, "ACP_AIRCRAFT_VALUE": 1, "ACP_CRUISE_SPEED": 1, "ACP_CRUISE": 1}
TABLES = {"ACP_CLIMB_TRACE", "ACP_DESCENT_TRACE"}     # one row per point, single arguments
WIDTH = {"ACP_ISA": 6, "ACP_DRAG": 7, "ACP_WIND_TRIANGLE": 3, "ACP_SPEED_SCHEDULE": 6,
         "ACP_CLIMB_POINT": 7, "ACP_DESCENT_POINT": 7, "ACP_CLIMB": 4, "ACP_DESCENT": 4,
         "ACP_CEILINGS": 5, "ACP_CRUISE_SPEED": 6, "ACP_CRUISE": 4, "ACP_TRIP_FUEL": 6,
         "ACP_TRIP_SEGMENTS": 6}


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
    texty = name in ("ACP_AIRCRAFT_CHECK", "ACP_TRIP_STATUS")
    try:
        ac = aircraft(args.pop(0)) if needs_ac else None
        mi = [mission(args.pop(0))] if needs_ac == 2 else []
    except Invalid as e:
        return [[NOT_OK if texty else VALUE]]
    ntext = TEXT_ARGS.get(name, 0)
    texts = args[len(args) - ntext:] if ntext else []
    nums = args[:len(args) - ntext] if ntext else args
    if any(not isinstance(t, str) for t in texts):
        return [[VALUE]]
    lists = [a for a in nums if isinstance(a, list)]
    if len({len(a) for a in lists}) > 1:
        return [[VALUE]]      # range arguments of different lengths
    n = len(lists[0]) if lists else None
    if n is not None and (name in TABLES or name == "ACP_TRIP_STATUS"):
        return [[VALUE]]      # single values only
    rows = []
    for k in range(n or 1):
        try:
            point = [_num(a[k] if isinstance(a, list) else a) for a in nums]
        except Invalid:
            return [[VALUE]]
        try:
            r = f(*([ac] if needs_ac else []), *mi, *point, *texts)
        except Invalid:
            return [[VALUE]]
        except acperf.AcperfError as e:
            if name in ("ACP_CONVERT", "ACP_AIRCRAFT_VALUE") and e.status in INVALID:
                return [[VALUE]]
            r = VALUE if e.status in INVALID else NUM
            if name in TABLES:
                return [[r]]
            if name in WIDTH:
                if r == VALUE:
                    return [[VALUE]]
                r = [NUM] * WIDTH[name]
        except KeyError:
            return [[VALUE]]
        if name in TABLES:
            return [[_cell(x) for x in row] for row in r]
        if r is NOT_OK:
            rows.append([NOT_OK])
            continue
        rows.append([_cell(x) for x in r] if isinstance(r, list) else [_cell(r)])
    return rows
