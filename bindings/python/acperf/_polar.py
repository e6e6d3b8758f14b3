"""Drag of an aircraft model (acperf/polar.h): component build-up, polar, wave drag.

The first argument of the model functions is an acperf.Aircraft (passed through,
never broadcast); mass kg, hp pressure altitude m, dtemp ISA deviation K, tas
m/s, angles rad; forces N. Results are estimates, not approved data.
"""

import numpy as np

from . import capi as _c
from ._core import _array_call, bind, model_handle, result_type

__all__ = ["DragParts", "PolarPoint", "ComponentDrag", "DragCurve", "drag", "drag_load",
           "drag_bank", "polar", "drag_component", "drag_curve", "oswald_straight",
           "oswald_swept", "oswald_estimate", "winglet_aspect_ratio", "korn_mach",
           "critical_mach", "wave_drag_coefficient"]

DragParts = result_type(
    "DragParts",
    ("friction", "form", "interference", "parasite", "induced", "wave", "total"),
    "Drag split by origin, N (the fields of acp_drag_parts). With a single cd0 the "
    "friction, form and interference fields are NaN and parasite holds it all.")
PolarPoint = result_type(
    "PolarPoint",
    ("mach", "dynamic_pressure", "reynolds_per_metre", "cl", "cd_friction", "cd_form",
     "cd_interference", "cd_leakage", "cd_misc", "cd0", "cd_induced", "cd_wave", "cd",
     "induced_factor", "mach_drag_divergence", "mach_critical"),
    "One point of the drag polar (the fields of acp_polar_point).")
ComponentDrag = result_type(
    "ComponentDrag",
    ("reynolds", "skin_friction", "form_factor", "interference_factor", "friction", "form",
     "interference", "parasite"),
    "Drag of one component of the build-up (the fields of acp_component_drag).")
DragCurve = result_type(
    "DragCurve", ("parasite", "induced", "wave", "total"),
    "Drag against TAS at one mass, altitude and deviation, N (outputs of acp_drag_curve).")

_AC = ("ac",)
_STATE = ("ac", "mass", "hp", "dtemp", "tas")

drag = bind("drag", _c.acp_drag, _c.acp_drag_n, _STATE, result=DragParts, models=_AC,
            array_extra=(None,))  # load_factor NULL: 1 g
drag_load = bind("drag_load", _c.acp_drag_load, _c.acp_drag_n, _STATE + ("load_factor",),
                 result=DragParts, models=_AC)
drag_bank = bind("drag_bank", _c.acp_drag_bank, None, _STATE + ("bank",), result=DragParts,
                 models=_AC)
polar = bind("polar", _c.acp_polar, None, _STATE + ("load_factor",), result=PolarPoint,
             models=_AC)
drag_component = bind("drag_component", _c.acp_drag_component, None,
                      ("ac", "index", "hp", "dtemp", "tas"), result=ComponentDrag,
                      models=("ac", "index"))
oswald_straight = bind("oswald_straight", _c.acp_oswald_straight, None, ("aspect_ratio",))
oswald_swept = bind("oswald_swept", _c.acp_oswald_swept, None, ("aspect_ratio", "sweep_le"))
oswald_estimate = bind("oswald_estimate", _c.acp_oswald_estimate, None,
                       ("aspect_ratio", "sweep_le"))
winglet_aspect_ratio = bind("winglet_aspect_ratio", _c.acp_winglet_aspect_ratio, None,
                            ("aspect_ratio", "winglet_height", "span"))
korn_mach = bind("korn_mach", _c.acp_korn_mach, None,
                 ("kappa", "thickness_ratio", "sweep", "cl"))
critical_mach = bind("critical_mach", _c.acp_critical_mach, None, ("mach_drag_divergence",))
wave_drag_coefficient = bind("wave_drag_coefficient", _c.acp_wave_drag_coefficient, None,
                             ("mach", "mach_critical"))


def drag_curve(ac, mass, hp, dtemp, tas):
    """drag_curve(ac, mass, hp, dtemp, tas): drag against TAS (acp_drag_curve).

    mass, hp and dtemp are scalars; tas a scalar or an array (list, Series).
    Returns a DragCurve of arrays (parasite, induced, wave, total), NaN and an
    AcperfWarning for invalid speeds.

    From the C header:
    """
    handle = model_handle(ac)
    mass, hp, dtemp = float(mass), float(hp), float(dtemp)

    def curve(tas_flat):
        return _c.acp_drag_curve(handle, mass, hp, dtemp, tas_flat)

    def point(t):
        res = _c.acp_drag_curve(handle, mass, hp, dtemp, np.array([t]))
        if res[0]:
            _c.acp_drag(handle, mass, hp, dtemp, t)  # raises with the status text
        return [float(o[0]) for o in res[1:]]

    return _array_call("drag_curve", point, curve, (), (tas,), ("tas",), (),
                       DragCurve._fields, DragCurve)


drag_curve.__doc__ += _c.acp_drag_curve.__doc__ or ""
drag_curve.c_function = "acp_drag_curve"
drag_curve.c_array_function = "acp_drag_curve"
