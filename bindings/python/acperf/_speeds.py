"""Characteristic speeds of an aircraft model (acperf/speeds.h).

vmd minimum drag, vmp minimum power, vmr maximum range of a jet at constant
TSFC, vs1g 1 g stall; glide performance; speed stability. The first argument
is an acperf.Aircraft; mass kg, hp m, dtemp K; speeds in m/s (TAS unless the
function says CAS or Mach). Results are estimates, not approved data.
"""

from . import capi as _c
from ._core import _array_call, bind, model_handle, result_type
from ._enums import SpeedStability

__all__ = ["SpeedSet", "GlideSet", "Stability", "StabilityBoundary", "speeds", "speeds_cas",
           "speeds_mach", "glide", "speed_stability", "speed_stability_boundary"]

SpeedSet = result_type(
    "SpeedSet", ("vmd", "vmp", "vmr", "vs1g", "ld_max"),
    "Characteristic speeds (the fields of acp_speed_set) and the best L/D.")
GlideSet = result_type(
    "GlideSet", ("best_glide_ratio", "best_glide_speed", "best_glide_sink_rate",
                 "min_sink_speed", "min_sink_rate"),
    "Glide performance (the fields of acp_glide_set).")
Stability = result_type(
    "Stability", ("slope", "vmd", "stable"),
    "Speed stability in level flight (the fields of acp_stability); stable is a "
    "SpeedStability.", {"stable": SpeedStability})
StabilityBoundary = result_type(
    "StabilityBoundary", ("vmd_tas", "vmd_cas", "vmd_mach"),
    "The speed-stability boundary (VMD) as TAS, CAS and Mach (acp_speed_stability_boundary_n).")

_AC = ("ac",)
_STD = {"dtemp": 0.0}

speeds = bind("speeds", _c.acp_speeds, _c.acp_speeds_n, ("ac", "mass", "hp", "dtemp"), _STD,
              result=SpeedSet, models=_AC)
speeds_cas = bind("speeds_cas", _c.acp_speeds_cas, _c.acp_speeds_cas_n,
                  ("ac", "mass", "hp", "dtemp"), _STD, result=SpeedSet, models=_AC)
speeds_mach = bind("speeds_mach", _c.acp_speeds_mach, _c.acp_speeds_mach_n,
                   ("ac", "mass", "hp", "dtemp"), _STD, result=SpeedSet, models=_AC)
glide = bind("glide", _c.acp_glide, _c.acp_glide_n, ("ac", "mass", "hp", "dtemp"), _STD,
             result=GlideSet, models=_AC)
speed_stability = bind("speed_stability", _c.acp_speed_stability, _c.acp_speed_stability_n,
                       ("ac", "mass", "hp", "dtemp", "tas"), result=Stability, models=_AC)


def speed_stability_boundary(ac, mass, hp, dtemp=0.0):
    """speed_stability_boundary(ac, mass, hp, dtemp=0.0): VMD as TAS, CAS and Mach.

    libacperf has only the array form (acp_speed_stability_boundary_n); a scalar
    call uses it on one point and raises AcperfError when that point is invalid.

    From the C header:
    """
    handle = model_handle(ac)

    def point(m, h, d):
        import numpy as np

        res = _c.acp_speed_stability_boundary_n(handle, np.array([m]), np.array([h]),
                                                np.array([d]))
        if res[0]:
            _c.acp_speeds(handle, m, h, d)  # raises with the status text of this point
            raise _c.AcperfError(f"speed_stability_boundary({m}, {h}, {d}): no result")
        return [float(o[0]) for o in res[1:]]

    values = (mass, hp, dtemp)
    if all(isinstance(v, (int, float)) for v in values):
        return StabilityBoundary(*point(*map(float, values)))
    return _array_call("speed_stability_boundary", point,
                       lambda *flat: _c.acp_speed_stability_boundary_n(handle, *flat),
                       (), values, ("mass", "hp", "dtemp"), (2,),
                       StabilityBoundary._fields, StabilityBoundary)


speed_stability_boundary.__doc__ += _c.acp_speed_stability_boundary_n.__doc__ or ""
speed_stability_boundary.c_function = "acp_speed_stability_boundary_n"
speed_stability_boundary.c_array_function = "acp_speed_stability_boundary_n"
