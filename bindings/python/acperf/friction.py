"""Flat-plate skin friction (acperf/friction.h), Raymer's component build-up."""

from . import capi as _c
from ._core import bind

__all__ = ["skin_friction_laminar", "skin_friction_turbulent", "skin_friction_mixed",
           "roughness_cutoff_reynolds", "skin_friction"]

skin_friction_laminar = bind("skin_friction_laminar", _c.acp_skin_friction_laminar, None,
                             ("reynolds",))
skin_friction_turbulent = bind("skin_friction_turbulent", _c.acp_skin_friction_turbulent, None,
                               ("reynolds", "mach"))
skin_friction_mixed = bind("skin_friction_mixed", _c.acp_skin_friction_mixed, None,
                           ("reynolds", "mach", "laminar_fraction"))
roughness_cutoff_reynolds = bind("roughness_cutoff_reynolds", _c.acp_roughness_cutoff_reynolds,
                                 None, ("length", "roughness", "mach"))
skin_friction = bind("skin_friction", _c.acp_skin_friction, None,
                     ("reynolds", "mach", "laminar_fraction", "length", "roughness"))
form_factor_surface = bind("form_factor_surface", _c.acp_form_factor_surface, None,
                           ("thickness_ratio", "max_thickness_position",
                            "sweep_max_thickness", "mach"))
form_factor_body = bind("form_factor_body", _c.acp_form_factor_body, None, ("fineness_ratio",))
form_factor_nacelle = bind("form_factor_nacelle", _c.acp_form_factor_nacelle, None,
                           ("fineness_ratio",))
__all__ += ["form_factor_surface", "form_factor_body", "form_factor_nacelle"]
