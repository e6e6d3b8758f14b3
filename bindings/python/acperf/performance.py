"""Speed schedules, engines, climb and descent (acperf/schedule.h,
acperf/propulsion.h, acperf/climb.h).

SI units as in C: altitudes m (pressure altitude), speeds m/s, masses kg,
forces N, fuel flow kg/s, time s. Profiles and traces are Python objects whose
fields are the C struct's field names; a trace's fields are numpy arrays that go
straight into a pandas DataFrame (``trace.to_frame()``). Results are
engineering estimates, not approved flight-manual data.
"""

import numpy as np

from . import capi as _c
from ._core import bind, model_handle, result_type
from ._enums import AltitudeLimit, Limit, Rating, ScheduleMode

__all__ = ["SchedulePoint", "EnginePoint", "ProfilePoint", "Profile", "CeilingSet",
           "MODE_LOW_CAS", "MODE_CAS", "MODE_MACH", "MODE_VMO", "MODE_MMO",
           "RATING_MAXIMUM", "RATING_CLIMB", "RATING_CRUISE", "RATING_IDLE",
           "speed_schedule", "acceleration_factor", "turbofan_thrust_lapse", "turbofan_tsfc",
           "piston_power_lapse", "engine_rating", "engine_thrust", "climb_point",
           "descent_point", "climb", "descent", "level_speed_change", "climb_trace",
           "descent_trace", "ceilings",
           "ClimbTable", "climb_table"]

# The C constants under their old Python names: the members of acperf.ScheduleMode, Rating.
MODE_LOW_CAS, MODE_CAS, MODE_MACH = ScheduleMode.LOW_CAS, ScheduleMode.CAS, ScheduleMode.MACH
MODE_VMO, MODE_MMO = ScheduleMode.VMO, ScheduleMode.MMO
RATING_MAXIMUM, RATING_CLIMB = Rating.MAXIMUM, Rating.CLIMB
RATING_CRUISE, RATING_IDLE = Rating.CRUISE, Rating.IDLE

SchedulePoint = result_type(
    "SchedulePoint",
    ("mode", "cas", "mach", "tas", "crossover", "dtas_dhp", "acceleration_factor"),
    "A speed schedule at one altitude (the fields of acp_schedule_point); mode is a "
    "ScheduleMode.", {"mode": ScheduleMode})
EnginePoint = result_type(
    "EnginePoint", ("thrust", "fuel_flow", "tsfc", "shaft_power"),
    "Thrust and fuel of all engines (the fields of acp_engine_point).")
ProfilePoint = result_type(
    "ProfilePoint",
    ("time", "distance", "hp", "mass", "tas", "cas", "mach", "rate", "gradient", "thrust",
     "drag", "fuel_flow", "acceleration_factor", "mode", "limit", "limit_excess"),
    "One point of a climb or descent (the fields of acp_profile_point); mode is a "
    "ScheduleMode, limit a Limit; in a trace each field is an array over the points "
    "(the codes as floats).", {"mode": ScheduleMode, "limit": Limit})
Profile = result_type(
    "Profile",
    ("time", "distance", "fuel", "mass_end", "tas_end", "speed_change_time",
     "speed_change_distance", "speed_change_fuel", "limit", "limit_excess"),
    "Totals of a climb or descent (the fields of acp_profile); limit is a Limit.",
    {"limit": Limit})
CeilingSet = result_type(
    "CeilingSet",
    ("service_ceiling", "max_climb_altitude", "buffet_altitude", "max_cruise_altitude",
     "optimum_altitude", "optimum_limit", "best_cruise_altitude", "best_cruise_limit",
     "max_cruise_limit"),
    "Ceilings and optimum altitude at a mass (the fields of acp_ceiling_set); the *_limit "
    "fields are AltitudeLimits.",
    {"optimum_limit": AltitudeLimit, "best_cruise_limit": AltitudeLimit,
     "max_cruise_limit": AltitudeLimit})

_AC = ("ac",)

speed_schedule = bind("speed_schedule", _c.acp_speed_schedule, None,
                      ("hp", "dtemp", "cas_low", "hp_limit", "cas", "mach", "vmo", "mmo"),
                      result=SchedulePoint)
acceleration_factor = bind("acceleration_factor", _c.acp_acceleration_factor, None,
                            ("mode", "mach", "hp", "dtemp"), {"dtemp": 0.0})
turbofan_thrust_lapse = bind("turbofan_thrust_lapse", _c.acp_turbofan_thrust_lapse, None,
                             ("mach", "hp", "dtemp", "throttle_ratio"))
turbofan_tsfc = bind("turbofan_tsfc", _c.acp_turbofan_tsfc, None,
                     ("mach", "hp", "dtemp", "c0", "c1"))
piston_power_lapse = bind("piston_power_lapse", _c.acp_piston_power_lapse, None,
                          ("density_ratio",))
engine_rating = bind("engine_rating", _c.acp_engine_rating, None,
                      ("ac", "rating", "hp", "dtemp", "tas"), result=EnginePoint, models=_AC)
engine_thrust = bind("engine_thrust", _c.acp_engine_thrust, None,
                     ("ac", "thrust", "hp", "dtemp", "tas"), result=EnginePoint, models=_AC)
climb_point = bind("climb_point", _c.acp_climb_point, None,
                   ("ac", "mass", "hp", "dtemp", "wind"), {"dtemp": 0.0, "wind": 0.0},
                   result=ProfilePoint, models=_AC)
descent_point = bind("descent_point", _c.acp_descent_point, None,
                     ("ac", "mass", "hp", "dtemp", "wind"), {"dtemp": 0.0, "wind": 0.0},
                     result=ProfilePoint, models=_AC)
level_speed_change = bind("level_speed_change", _c.acp_level_speed_change, None,
                          ("ac", "mass", "hp", "dtemp", "wind", "tas_start", "tas_end"),
                          result=Profile, models=_AC)
_PROFILE = ("ac", "mass", "hp_start", "hp_end", "dtemp", "wind", "step")
_PROFILE_DEFAULTS = {"dtemp": 0.0, "wind": 0.0, "step": 0.0}
climb = bind("climb", _c.acp_climb, None, _PROFILE, _PROFILE_DEFAULTS, result=Profile,
             models=_AC)
descent = bind("descent", _c.acp_descent, None, _PROFILE, _PROFILE_DEFAULTS, result=Profile,
               models=_AC)
ceilings = bind("ceilings", _c.acp_ceilings, None, ("ac", "mass", "dtemp"), {"dtemp": 0.0},
                result=CeilingSet, models=_AC)


def _trace(cfunc, ac, mass, hp_start, hp_end, dtemp, wind, step):
    step_used = step if step else _c.ACP_CLIMB_STEP_DEFAULT
    # An upper bound of the points: the steps, one more per segment cut, the start
    # and the level speed change (12 points); the C function checks it.
    capacity = int(abs(hp_end - hp_start) / max(step_used, 1.0)) + 32
    points, totals = cfunc(model_handle(ac), float(mass), float(hp_start), float(hp_end),
                           float(dtemp), float(wind), float(step), capacity)
    points = np.asarray(points)
    trace = ProfilePoint(*(points[:, i].copy() for i in range(points.shape[1])))
    return trace, Profile._from_c([getattr(totals, f) for f in Profile._fields])


def climb_trace(ac, mass, hp_start, hp_end, dtemp=0.0, wind=0.0, step=0.0):
    """climb_trace(ac, mass, hp_start, hp_end, dtemp=0.0, wind=0.0, step=0.0)

    A climb with its per-step trace: returns (trace, totals), the trace a
    ProfilePoint of arrays (one element per point), the totals a Profile. Raises
    AcperfError as acp_climb_trace does. Estimates, not approved data.
    """
    return _trace(_c.acp_climb_trace, ac, mass, hp_start, hp_end, dtemp, wind, step)


def descent_trace(ac, mass, hp_start, hp_end, dtemp=0.0, wind=0.0, step=0.0):
    """descent_trace(ac, mass, hp_start, hp_end, dtemp=0.0, wind=0.0, step=0.0)

    An idle descent with its per-step trace: (trace, totals) as climb_trace().
    """
    return _trace(_c.acp_descent_trace, ac, mass, hp_start, hp_end, dtemp, wind, step)


climb_trace.c_function = "acp_climb_trace"
climb_trace.c_array_function = None
descent_trace.c_function = "acp_descent_trace"
descent_trace.c_array_function = None


ClimbTable = result_type(
    "ClimbTable", ("time", "distance", "fuel"),
    "Climb table (outputs of acp_climb_table): arrays of shape (mass, hp_end, dtemp).")


def climb_table(ac, hp_start, wind, step, mass, hp_end, dtemp):
    """climb_table(ac, hp_start, wind, step, mass, hp_end, dtemp)

    Time (s), distance (m) and fuel (kg) to climb from hp_start to each of the
    ascending altitudes hp_end, for each mass and ISA deviation (step 0: the
    default), in one call of acp_climb_table: arrays of shape (len(mass),
    len(hp_end), len(dtemp)); NaN (and
    an AcperfWarning with the count) where an altitude is not reached.
    """
    import warnings

    from ._core import AcperfWarning

    m = np.atleast_1d(np.asarray(mass, dtype=np.float64))
    h = np.atleast_1d(np.asarray(hp_end, dtype=np.float64))
    d = np.atleast_1d(np.asarray(dtemp, dtype=np.float64))
    bad, t, x, f = _c.acp_climb_table(model_handle(ac), float(hp_start), float(wind), float(step),
                                      m, h, d)
    if bad:
        warnings.warn(f"climb_table: {bad} of {t.size} cells without a result (altitude not "
                      "reached or invalid arguments); they are NaN", AcperfWarning, stacklevel=2)
    shape = (m.size, h.size, d.size)
    return ClimbTable(t.reshape(shape), x.reshape(shape), f.reshape(shape))


climb_table.c_function = "acp_climb_table"
climb_table.c_array_function = None
