"""The coded values of libacperf as IntEnums, their values taken from the C enums.

Each enum here is one C enum of the public headers, its members named as the C
constants without their prefix, its values read from ``acperf.capi`` (so they are
the library's, never retyped):

=================  ==========================  ======================  =========================
Python             C enum (header)             C prefix                where it comes back
=================  ==========================  ======================  =========================
TripInfeasible     acp_trip_infeasible         ACP_TRIP_               TripResult.infeasible,
                   (mission.h)                                         InfeasibleTrip.reason
Limit              acp_limit (aircraft.h)      ACP_LIMIT_              Profile.limit,
                                                                       ProfilePoint.limit,
                                                                       CruisePoint.limit_exceeded,
                                                                       CruiseResult.limit
AltitudeLimit      acp_altitude_limit          ACP_ALTITUDE_LIMIT_     CeilingSet.optimum_limit,
                   (climb.h)                                           .best_cruise_limit,
                                                                       .max_cruise_limit
CruiseMode         acp_cruise_mode (cruise.h)  ACP_CRUISE_             an input (cruise_speed ...)
CruiseEnd          acp_cruise_end (cruise.h)   ACP_CRUISE_END_         an input (cruise ...)
CruiseLimit        acp_cruise_limit (cruise.h) ACP_CRUISE_LIMIT_       CruisePoint.limit
ScheduleMode       acp_schedule_mode           ACP_MODE_               SchedulePoint.mode,
                   (schedule.h)                                        ProfilePoint.mode
Rating             acp_rating (propulsion.h)   ACP_RATING_             an input (engine_rating)
SpeedStability     acp_stability.stable        (no C enum: +1, 0, -1)  Stability.stable
                   (speeds.h)
=================  ==========================  ======================  =========================

A scalar result gives the member in its coded field (``TripResult.infeasible is
TripInfeasible.FEASIBLE``), or a float NaN where the C field is NaN (no code:
the call failed before it was set). Members are ints, so they compare equal to
the C values (``Limit.NONE == 0``) and go wherever an int or float goes. Array
results keep float arrays (NaN marks an invalid point): ``TripInfeasible(int(x))``
or ``TripInfeasible(x)`` reads one element.
"""

import enum

from . import capi as _c

__all__ = ["TripInfeasible", "Limit", "AltitudeLimit", "CruiseMode", "CruiseEnd", "CruiseLimit",
           "ScheduleMode", "Rating", "SpeedStability"]


def _from_c(name, prefix, members, doc):
    """An IntEnum of the C constants prefix + member, with their values from capi."""
    cls = enum.IntEnum(name, [(m, getattr(_c, prefix + m)) for m in members],
                       module=__name__)
    cls.__doc__ = doc
    cls.__module__ = "acperf"
    cls.c_prefix = prefix
    return cls


TripInfeasible = _from_c(
    "TripInfeasible", "ACP_TRIP_",
    ("FEASIBLE", "OVER_MAX_TAKEOFF", "OVER_MAX_LANDING", "OVER_FUEL_CAPACITY",
     "OVER_MAX_ZERO_FUEL", "TOO_SHORT", "ABOVE_MAX_ALTITUDE", "CANNOT_CLIMB", "CANNOT_CRUISE",
     "CRUISE_TOO_LOW", "NO_FUEL", "BELOW_OPERATING_EMPTY", "BELOW_STALL"),
    "Why a trip is not feasible (enum acp_trip_infeasible, acperf/mission.h), with the\n"
    "unit of the excess (TripResult.excess, InfeasibleTrip.excess): OVER_MAX_TAKEOFF,\n"
    "OVER_MAX_LANDING, OVER_FUEL_CAPACITY, OVER_MAX_ZERO_FUEL, NO_FUEL and\n"
    "BELOW_OPERATING_EMPTY kg; TOO_SHORT, ABOVE_MAX_ALTITUDE and CRUISE_TOO_LOW m;\n"
    "BELOW_STALL a lift coefficient (CL - cl_max); CANNOT_CLIMB and CANNOT_CRUISE none\n"
    "(NaN). FEASIBLE (0) is a trip flown.")
Limit = _from_c(
    "Limit", "ACP_LIMIT_",
    ("NONE", "MASS_MAX_TAKEOFF", "MASS_OPERATING_EMPTY", "MAX_ALTITUDE", "CL_MAX", "VMO", "MMO"),
    "Which aircraft limit a flight function found exceeded (enum acp_limit,\n"
    "acperf/aircraft.h; docs/limits.md), with the unit of limit_excess: masses kg,\n"
    "MAX_ALTITUDE m, CL_MAX a lift coefficient, VMO m/s (CAS), MMO Mach. NONE: inside\n"
    "every limit that is given.")
AltitudeLimit = _from_c(
    "AltitudeLimit", "ACP_ALTITUDE_LIMIT_", ("NONE", "THRUST", "CLIMB", "BUFFET", "MAX_ALTITUDE"),
    "What holds an altitude of CeilingSet (enum acp_altitude_limit, acperf/climb.h):\n"
    "NONE the SAR's own maximum (or no limit given), THRUST the maximum-cruise thrust,\n"
    "CLIMB the residual climb rate, BUFFET the 1.3 g buffet margin, MAX_ALTITUDE the\n"
    "aircraft's max_altitude.")
CruiseMode = _from_c(
    "CruiseMode", "ACP_CRUISE_",
    ("FIXED_MACH", "MAX_RANGE", "LONG_RANGE", "ECONOMY", "MAX_ENDURANCE"),
    "Cruise speed modes (enum acp_cruise_mode, acperf/cruise.h): FIXED_MACH the\n"
    "aircraft's cruise_mach, MAX_RANGE the greatest SAR, LONG_RANGE the faster speed at\n"
    "the long-range fraction of it, ECONOMY least fuel plus cost-index time cost,\n"
    "MAX_ENDURANCE least fuel flow (holding).")
CruiseEnd = _from_c(
    "CruiseEnd", "ACP_CRUISE_END_", ("DISTANCE", "FUEL", "TIME"),
    "What ends a cruise (enum acp_cruise_end, acperf/cruise.h): a ground DISTANCE (m),\n"
    "a FUEL amount (kg) or a TIME (s).")
CruiseLimit = _from_c(
    "CruiseLimit", "ACP_CRUISE_LIMIT_", ("NONE", "LOW_SPEED", "VMO", "MMO", "MACH_MODEL", "THRUST"),
    "Which bound holds a cruise speed (enum acp_cruise_limit, acperf/cruise.h): NONE\n"
    "inside the search, LOW_SPEED 1.2 VS1G, VMO, MMO, MACH_MODEL the drag model's\n"
    "highest Mach, THRUST where drag reaches the maximum-cruise thrust.")
ScheduleMode = _from_c(
    "ScheduleMode", "ACP_MODE_", ("LOW_CAS", "CAS", "MACH", "VMO", "MMO"),
    "Segment of a climb or descent speed schedule (enum acp_schedule_mode,\n"
    "acperf/schedule.h): LOW_CAS below the limit altitude, CAS, MACH above the\n"
    "crossover, VMO and MMO where the schedule is capped.")
Rating = _from_c(
    "Rating", "ACP_RATING_", ("MAXIMUM", "CLIMB", "CRUISE", "IDLE"),
    "Engine thrust ratings (enum acp_rating, acperf/propulsion.h): MAXIMUM (take-off),\n"
    "maximum CLIMB, maximum CRUISE, flight IDLE.")


class SpeedStability(enum.IntEnum):
    """Speed stability in level flight (acp_stability.stable, acperf/speeds.h, which
    codes it as +1, 0, -1 without a C enum): STABLE above VMD (dD/dV > 0), UNSTABLE
    below it, NEUTRAL at it."""

    UNSTABLE = -1
    NEUTRAL = 0
    STABLE = 1


SpeedStability.__module__ = "acperf"
SpeedStability.c_prefix = None


def coded(enum_type, value):
    """`value` (a float from a C struct field) as the member of `enum_type` it codes;
    `value` itself when it codes none (NaN: the call failed before the field was set)."""
    if enum_type is None or not isinstance(value, float):
        return value
    return enum_type._value2member_map_.get(value, value)
