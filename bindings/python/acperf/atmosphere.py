"""Standard atmosphere (acperf/atmosphere.h): ISO 2533:1975 / ICAO Doc 7488.

Pressure altitude hp in geopotential metres, ISA deviation dtemp in K,
results in SI. See each function's docstring for the C header's notes.
"""

from . import capi as _c
from ._core import bind, result_type

__all__ = [
    "Atmos", "isa", "isa_temperature", "isa_pressure", "isa_density", "isa_sound_speed",
    "isa_pressure_altitude", "geopotential_altitude", "geometric_altitude",
    "isa_density_altitude", "density_altitude", "isa_deviation", "outside_air_temperature",
    "total_temperature", "static_temperature", "pressure_altitude_from_qnh",
    "indicated_altitude_from_qnh", "cold_temperature_correction",
]

Atmos = result_type(
    "Atmos",
    ("temperature", "pressure", "density", "sound_speed", "dynamic_viscosity",
     "kinematic_viscosity"),
    "State of the atmosphere (the fields of the C struct acp_atmos): temperature K, "
    "pressure Pa, density kg/m3, sound_speed m/s, dynamic_viscosity Pa s, "
    "kinematic_viscosity m2/s. Floats for scalar input, arrays for array input.")

_STD = {"dtemp": 0.0}  # a standard day unless told otherwise

isa = bind("isa", _c.acp_isa, _c.acp_isa_n, ("hp", "dtemp"), _STD, result=Atmos)
isa_temperature = bind("isa_temperature", _c.acp_isa_temperature, None, ("hp", "dtemp"), _STD)
isa_pressure = bind("isa_pressure", _c.acp_isa_pressure, None, ("hp",))
isa_density = bind("isa_density", _c.acp_isa_density, None, ("hp", "dtemp"), _STD)
isa_sound_speed = bind("isa_sound_speed", _c.acp_isa_sound_speed, None, ("hp", "dtemp"), _STD)
isa_pressure_altitude = bind("isa_pressure_altitude", _c.acp_isa_pressure_altitude,
                             _c.acp_isa_pressure_altitude_n, ("pressure",))
geopotential_altitude = bind("geopotential_altitude", _c.acp_geopotential_altitude,
                             _c.acp_geopotential_altitude_n, ("geometric",))
geometric_altitude = bind("geometric_altitude", _c.acp_geometric_altitude,
                          _c.acp_geometric_altitude_n, ("geopotential",))
isa_density_altitude = bind("isa_density_altitude", _c.acp_isa_density_altitude, None,
                            ("density",))
density_altitude = bind("density_altitude", _c.acp_density_altitude, None, ("hp", "dtemp"), _STD)
isa_deviation = bind("isa_deviation", _c.acp_isa_deviation, None, ("oat", "hp"))
outside_air_temperature = bind("outside_air_temperature", _c.acp_outside_air_temperature, None,
                               ("dtemp", "hp"))
total_temperature = bind("total_temperature", _c.acp_total_temperature, None,
                         ("sat", "mach", "recovery"))
static_temperature = bind("static_temperature", _c.acp_static_temperature, None,
                          ("tat", "mach", "recovery"))
pressure_altitude_from_qnh = bind("pressure_altitude_from_qnh", _c.acp_pressure_altitude_from_qnh,
                                  None, ("indicated", "qnh"))
indicated_altitude_from_qnh = bind("indicated_altitude_from_qnh",
                                   _c.acp_indicated_altitude_from_qnh, None, ("hp", "qnh"))
cold_temperature_correction = bind("cold_temperature_correction",
                                   _c.acp_cold_temperature_correction, None,
                                   ("height", "elevation", "temperature"))
