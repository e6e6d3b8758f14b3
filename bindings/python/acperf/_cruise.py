"""Cruise, specific air range, Breguet, and trips (acperf/cruise.h, acperf/mission.h).

SI units as in C: masses kg, altitudes m, speeds m/s, distances m, times s,
specific air range m/kg, TSFC kg/(N s). Cruise speed modes are the
``CRUISE_*`` constants; a trip takes an :class:`acperf.Mission` (route, cruise
and fuel policy with typical defaults that defer to the operator's approved fuel
policy and local rules). Results are engineering estimates, not approved
flight-manual data.
"""

import functools

import numpy as np

from . import _fast
from . import capi as _c
from ._core import AcperfError, InfeasibleTrip, bind, model_handle, result_type
from ._enums import CruiseEnd, CruiseLimit, CruiseMode, Limit, TripInfeasible

__all__ = ["CruisePoint", "CruiseResult", "TripResult", "Mission",
           "CRUISE_FIXED_MACH", "CRUISE_MAX_RANGE", "CRUISE_LONG_RANGE", "CRUISE_ECONOMY",
           "CRUISE_MAX_ENDURANCE", "END_DISTANCE", "END_FUEL", "END_TIME",
           "CruiseSpeeds", "specific_air_range", "cruise_speed", "cruise_speed_n", "cruise",
           "cruise_trace", "breguet_range",
           "breguet_endurance", "breguet_range_propeller", "trip", "trip_for_zero_fuel_mass"]

# The C constants under their old Python names: the members of acperf.CruiseMode, CruiseEnd.
CRUISE_FIXED_MACH = CruiseMode.FIXED_MACH
CRUISE_MAX_RANGE = CruiseMode.MAX_RANGE
CRUISE_LONG_RANGE = CruiseMode.LONG_RANGE
CRUISE_ECONOMY = CruiseMode.ECONOMY
CRUISE_MAX_ENDURANCE = CruiseMode.MAX_ENDURANCE
END_DISTANCE, END_FUEL, END_TIME = CruiseEnd.DISTANCE, CruiseEnd.FUEL, CruiseEnd.TIME


CruisePoint = result_type(
    "CruisePoint",
    ("time", "distance", "hp", "mass", "tas", "cas", "mach", "ground_speed", "drag",
     "fuel_flow", "tsfc", "lift_to_drag", "sar", "limit", "buffet_margin", "limit_exceeded",
     "limit_excess"),
    "Level flight at a cruise point (the fields of acp_cruise_point); limit is a "
    "CruiseLimit, limit_exceeded a Limit; in a trace each field is an array over the "
    "points (the codes as floats).", {"limit": CruiseLimit, "limit_exceeded": Limit})
CruiseResult = result_type(
    "CruiseResult",
    ("time", "distance", "fuel", "mass_end", "hp_end", "sar_mean", "tas_start", "tas_end",
     "mach_start", "mach_end", "step_climbs", "step_climb_time", "step_climb_distance",
     "step_climb_fuel", "limit", "limit_excess", "buffet_margin_min"),
    "Totals of a cruise (the fields of acp_cruise_result); limit is a Limit.",
    {"limit": Limit})
CruiseSpeeds = result_type(
    "CruiseSpeeds", ("tas", "mach", "sar"),
    "Speed of a cruise mode over arrays of conditions (outputs of acp_cruise_speed_n).")
TripResult = result_type(
    "TripResult",
    ("infeasible", "excess", "takeoff_mass", "landing_mass", "zero_fuel_mass", "ramp_mass",
     "trip_fuel", "taxi_fuel", "contingency_fuel", "alternate_fuel", "final_reserve_fuel",
     "block_fuel", "takeoff_fuel", "trip_time", "block_time", "climb_time", "climb_distance",
     "climb_fuel", "cruise_time", "cruise_distance", "cruise_fuel", "descent_time",
     "descent_distance", "descent_fuel", "top_of_climb_mass", "top_of_descent_mass",
     "cruise_altitude_end", "cruise_sar_mean", "iterations", "climb_acceleration_time",
     "climb_acceleration_distance", "climb_acceleration_fuel", "descent_deceleration_time",
     "descent_deceleration_distance", "descent_deceleration_fuel", "approach_deceleration_time",
     "approach_deceleration_distance", "approach_deceleration_fuel", "excess_at_least"),
    "A trip and its fuel (the fields of acp_trip_result); infeasible is a TripInfeasible "
    "(FEASIBLE for a trip flown).", {"infeasible": TripInfeasible})


class Mission(_fast.model):
    """A mission (route, cruise, fuel policy): an owned acp_mission handle with
    dict-like access by the keys of docs/methods/trip.md; typical defaults for
    what is not set."""

    __slots__ = ("_handle", "__weakref__")

    def __init__(self, **values):
        self._handle = _c.acp_mission_new()
        if self._handle is None:
            raise MemoryError("acp_mission_new")
        self._attach(self._handle, "M")  # its C address, for the fast scalar calls
        for key, value in values.items():
            self[key] = value

    @classmethod
    def from_dict(cls, values):
        """A mission from {key: value} (for example a two-column table)."""
        return cls(**dict(values))

    def __setitem__(self, key, value):
        _c.acp_mission_set(self._handle, key, float(value))

    def __getitem__(self, key):
        return _c.acp_mission_get(self._handle, key)

    def __del__(self):
        handle = getattr(self, "_handle", None)
        if handle is not None:
            self._detach()
            self._handle = None
            _c.acp_mission_free(handle)


_AC = ("ac",)
_SPEED = ("ac", "mode", "cost_index")

specific_air_range = bind("specific_air_range", _c.acp_specific_air_range,
                          _c.acp_specific_air_range_n,
                          ("ac", "mass", "hp", "dtemp", "tas", "wind"), {"wind": 0.0},
                          models=_AC)
cruise_speed = bind("cruise_speed", _c.acp_cruise_speed, None,
                    ("ac", "mode", "cost_index", "mass", "hp", "dtemp", "wind"), {"wind": 0.0},
                    result=CruisePoint, models=_SPEED)
cruise = bind("cruise", _c.acp_cruise, None,
              ("ac", "mode", "cost_index", "mass", "hp", "dtemp", "wind", "end", "end_value",
               "step", "step_climb"), {"step": 0.0, "step_climb": 0.0},
              result=CruiseResult, models=_SPEED)
breguet_range = bind("breguet_range", _c.acp_breguet_range, None,
                     ("tas", "tsfc", "lift_to_drag", "mass_start", "mass_end"))
breguet_endurance = bind("breguet_endurance", _c.acp_breguet_endurance, None,
                         ("tsfc", "lift_to_drag", "mass_start", "mass_end"))
breguet_range_propeller = bind("breguet_range_propeller", _c.acp_breguet_range_propeller, None,
                               ("propeller_efficiency", "psfc", "lift_to_drag", "mass_start",
                                "mass_end"))

# Why a trip is infeasible, in words (enum acp_trip_infeasible of acperf/mission.h): the
# text, the model holding the limit ("A" aircraft, "M" mission) and its key, the unit of
# the excess.
_INFEASIBLE = {
    TripInfeasible.OVER_MAX_TAKEOFF: ("take-off mass above mass_max_takeoff", "A",
                                      "mass_max_takeoff", "kg"),
    TripInfeasible.OVER_MAX_LANDING: ("landing mass above mass_max_landing", "A",
                                      "mass_max_landing", "kg"),
    TripInfeasible.OVER_FUEL_CAPACITY: ("block fuel above fuel_capacity", "A", "fuel_capacity",
                                        "kg"),
    TripInfeasible.OVER_MAX_ZERO_FUEL: ("zero-fuel mass above mass_max_zero_fuel", "A",
                                        "mass_max_zero_fuel", "kg"),
    TripInfeasible.TOO_SHORT: ("distance shorter than the segments other than the cruise", "M",
                               "distance", "m"),
    TripInfeasible.ABOVE_MAX_ALTITUDE: ("cruise_altitude above max_altitude", "A",
                                        "max_altitude", "m"),
    TripInfeasible.CANNOT_CLIMB: ("cruise_altitude cannot be reached: not enough thrust", "M",
                                  "cruise_altitude", "m"),
    TripInfeasible.CANNOT_CRUISE: ("level flight cannot be held in cruise or holding: not "
                                   "enough thrust", "M", "cruise_altitude", "m"),
    TripInfeasible.CRUISE_TOO_LOW: ("cruise_altitude not above the origin and the descent's "
                                    "end", "M", "cruise_altitude", "m"),
    TripInfeasible.NO_FUEL: ("the fuel needed exceeds the mass available", None, None, "kg"),
    TripInfeasible.BELOW_OPERATING_EMPTY: ("a take-off or zero-fuel mass below "
                                           "mass_operating_empty", "A", "mass_operating_empty",
                                           "kg"),
    TripInfeasible.BELOW_STALL: ("cruise or holding speed below the 1 g stall: lift "
                                 "coefficient above cl_max", "A", "cl_max", ""),
}


def _figure(x, unit):
    """A number for a message: 1,234 kg, 0.0312."""
    text = f"{x:,.0f}" if abs(x) >= 100.0 else f"{x:.3g}"
    return f"{text} {unit}" if unit else text


def _infeasible_message(fname, param, mass, reason, excess, at_least, ac, mission):
    """fname(param=mass kg): why, by how much (the limit's key = its value)."""
    text, model, key, unit = _INFEASIBLE[reason]
    message = f"{fname}({param}={_figure(mass, 'kg')}): {text}"
    if np.isfinite(excess):
        message += f" by {'at least ' if at_least == 1.0 else ''}{_figure(excess, unit)}"
    if key is not None:
        try:
            value = (_c.acp_aircraft_get(ac, key) if model == "A"
                     else _c.acp_mission_get(mission, key))
        except _c.AcperfError:
            value = float("nan")  # the key is not given
        if np.isfinite(value):
            message += f" ({key} = {_figure(value, unit)})"
    return message


def _trip_form(cfunc, fname, param):
    """The scalar form of a trip function for bind(): the SWIG call (handles in, the
    acp_trip_result out), raising InfeasibleTrip when the library names a reason, and
    otherwise the SWIG AcperfError with a TripResult as its `result`. No fast path:
    a trip takes milliseconds, and this is the one place that reads the reason."""

    @functools.wraps(cfunc)
    def call(ac, mission, mass):
        try:
            return cfunc(ac, mission, mass)
        except AcperfError as exc:
            raw = getattr(exc, "result", None)
            if raw is None:
                raise
            result = TripResult._from_c([getattr(raw, f) for f in TripResult._fields])
            reason = result.infeasible
            if not isinstance(reason, TripInfeasible) or reason == TripInfeasible.FEASIBLE:
                exc.result = result
                raise
            message = _infeasible_message(fname, param, mass, reason, result.excess,
                                          result.excess_at_least, ac, mission)
            raise InfeasibleTrip(message, reason, result.excess, result, exc.status) from None

    return call


trip = bind("trip", _trip_form(_c.acp_trip, "trip", "takeoff_mass"), None,
            ("ac", "mission", "takeoff_mass"), result=TripResult, models=("ac", "mission"))
trip_for_zero_fuel_mass = bind(
    "trip_for_zero_fuel_mass",
    _trip_form(_c.acp_trip_for_zero_fuel_mass, "trip_for_zero_fuel_mass", "zero_fuel_mass"),
    None, ("ac", "mission", "zero_fuel_mass"), result=TripResult, models=("ac", "mission"))
for _fn in (trip, trip_for_zero_fuel_mass):
    _fn.__doc__ = _fn.__doc__.replace(
        "\n\nResults are engineering estimates", "\nA trip that cannot be flown raises "
        "acperf.InfeasibleTrip: .reason (a TripInfeasible), .excess\n(its unit in "
        "TripInfeasible) and .result (the TripResult, the rest NaN); an array\ncall "
        "gives infeasible and excess per row.\n\nResults are engineering estimates", 1)


def cruise_trace(ac, mode, cost_index, mass, hp, dtemp, wind, end, end_value, step=0.0,
                 step_climb=0.0):
    """cruise_trace(ac, mode, cost_index, mass, hp, dtemp, wind, end, end_value, step=0.0,
    step_climb=0.0)

    A cruise with its per-step trace: returns (trace, totals), the trace a CruisePoint
    of arrays (one element per point), the totals a CruiseResult. Raises AcperfError
    as acp_cruise_trace does. Estimates, not approved data.
    """
    capacity = 256
    while True:
        try:
            points, totals = _c.acp_cruise_trace(
                model_handle(ac), mode, float(cost_index), float(mass), float(hp), float(dtemp),
                float(wind), end, float(end_value), float(step), float(step_climb), capacity)
            break
        except _c.AcperfError as exc:
            # too small a capacity is ACP_ERR_RANGE with nothing integrated: grow and retry
            if exc.status != _c.ACP_ERR_RANGE or capacity >= 1 << 20:
                raise
            capacity *= 4
    points = np.asarray(points)
    trace = CruisePoint(*(points[:, i].copy() for i in range(points.shape[1])))
    return trace, CruiseResult._from_c([getattr(totals, f) for f in CruiseResult._fields])


cruise_trace.c_function = "acp_cruise_trace"
cruise_trace.c_array_function = None


def cruise_speed_n(ac, mode, cost_index, mass, hp, dtemp=0.0, wind=0.0):
    """cruise_speed_n(ac, mode, cost_index, mass, hp, dtemp=0.0, wind=0.0)

    TAS, Mach and SAR of a cruise mode over arrays of conditions, broadcast against
    each other, in one call of acp_cruise_speed_n (NaN and an AcperfWarning where a
    point is invalid). For one point with every field, use cruise_speed().
    """
    import warnings

    from ._core import AcperfWarning

    arrays = np.broadcast_arrays(*(np.asarray(v, dtype=np.float64)
                                   for v in (mass, hp, dtemp, wind)))
    shape = arrays[0].shape
    flat = [np.ascontiguousarray(a).reshape(-1) for a in arrays]
    bad, tas, mach, sar = _c.acp_cruise_speed_n(model_handle(ac), mode, float(cost_index), *flat)
    if bad:
        warnings.warn(f"cruise_speed_n: {bad} of {flat[0].size} points invalid; their results "
                      "are NaN", AcperfWarning, stacklevel=2)
    return CruiseSpeeds(tas.reshape(shape), mach.reshape(shape), sar.reshape(shape))


cruise_speed_n.c_function = "acp_cruise_speed_n"
cruise_speed_n.c_array_function = None
