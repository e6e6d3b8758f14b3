"""Airspeeds and Mach number (acperf/airspeed.h): NACA Report 1135 relations.

Speeds in m/s, pressure altitude hp in geopotential metres, ISA deviation
dtemp in K, angles in radians. See each function's docstring.
"""

from . import capi as _c
from ._core import bind, result_type

__all__ = [
    "cas_to_mach", "mach_to_cas", "cas_to_tas", "tas_to_cas", "tas_to_mach", "mach_to_tas",
    "eas_to_tas", "tas_to_eas", "cas_to_eas", "eas_to_cas", "mach_to_eas", "eas_to_mach",
    "impact_pressure", "pressure_ratio_to_mach", "cas_to_impact_pressure",
    "impact_pressure_to_cas", "dynamic_pressure", "crossover_altitude", "reynolds_per_metre",
    "WindTriangle", "wind_triangle",
]

_STD = {"dtemp": 0.0}

cas_to_mach = bind("cas_to_mach", _c.acp_cas_to_mach, _c.acp_cas_to_mach_n, ("cas", "hp"))
mach_to_cas = bind("mach_to_cas", _c.acp_mach_to_cas, _c.acp_mach_to_cas_n, ("mach", "hp"))
cas_to_tas = bind("cas_to_tas", _c.acp_cas_to_tas, _c.acp_cas_to_tas_n,
                  ("cas", "hp", "dtemp"), _STD)
tas_to_cas = bind("tas_to_cas", _c.acp_tas_to_cas, _c.acp_tas_to_cas_n,
                  ("tas", "hp", "dtemp"), _STD)
tas_to_mach = bind("tas_to_mach", _c.acp_tas_to_mach, _c.acp_tas_to_mach_n,
                   ("tas", "hp", "dtemp"), _STD)
mach_to_tas = bind("mach_to_tas", _c.acp_mach_to_tas, _c.acp_mach_to_tas_n,
                   ("mach", "hp", "dtemp"), _STD)
eas_to_tas = bind("eas_to_tas", _c.acp_eas_to_tas, _c.acp_eas_to_tas_n,
                  ("eas", "hp", "dtemp"), _STD)
tas_to_eas = bind("tas_to_eas", _c.acp_tas_to_eas, _c.acp_tas_to_eas_n,
                  ("tas", "hp", "dtemp"), _STD)
cas_to_eas = bind("cas_to_eas", _c.acp_cas_to_eas, _c.acp_cas_to_eas_n, ("cas", "hp"))
eas_to_cas = bind("eas_to_cas", _c.acp_eas_to_cas, _c.acp_eas_to_cas_n, ("eas", "hp"))
mach_to_eas = bind("mach_to_eas", _c.acp_mach_to_eas, None, ("mach", "hp"))
eas_to_mach = bind("eas_to_mach", _c.acp_eas_to_mach, None, ("eas", "hp"))
impact_pressure = bind("impact_pressure", _c.acp_impact_pressure, None, ("mach", "hp"))
pressure_ratio_to_mach = bind("pressure_ratio_to_mach", _c.acp_pressure_ratio_to_mach, None,
                              ("ratio",))
cas_to_impact_pressure = bind("cas_to_impact_pressure", _c.acp_cas_to_impact_pressure, None,
                              ("cas",))
impact_pressure_to_cas = bind("impact_pressure_to_cas", _c.acp_impact_pressure_to_cas, None,
                              ("qc",))
dynamic_pressure = bind("dynamic_pressure", _c.acp_dynamic_pressure, None, ("mach", "hp"))
crossover_altitude = bind("crossover_altitude", _c.acp_crossover_altitude, None, ("cas", "mach"))
reynolds_per_metre = bind("reynolds_per_metre", _c.acp_reynolds_per_metre, None,
                          ("tas", "hp", "dtemp"), _STD)

WindTriangle = result_type(
    "WindTriangle", ("ground_speed", "heading", "drift"),
    "Wind triangle (the out-pointers of acp_wind_triangle): ground_speed m/s, "
    "heading rad (true), drift rad.")
wind_triangle = bind("wind_triangle", _c.acp_wind_triangle, None,
                     ("tas", "track", "wind_from", "wind_speed"), result=WindTriangle)
