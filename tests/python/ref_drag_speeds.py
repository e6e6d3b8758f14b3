"""Drag build-up and characteristic speeds of the demo aircraft, recomputed outside the library.

An independent path for the same published method: the aircraft files are read
with tomllib, the air comes from Debian's python3-fluids ATMOSPHERE_1976 (with
its gas-constant offset against ISO 2533 removed as in ref_atmosphere_fluids.py),
Raymer's component build-up (Aircraft Design: A Conceptual Approach, 4th ed.,
eqs. 12.24-12.32: mixed laminar/turbulent Cf with the roughness cutoff, form
factors of surfaces, bodies and nacelles, interference factor), the parabolic
polar with CL offset, Raymer's Oswald estimate, the end-plate winglet relation,
Korn's drag-divergence Mach and Lock's wave drag are re-typed here from
docs/methods/drag.md, and scipy's bounded Brent minimiser finds VMD, VMP and VMR
on that full model. The C library must agree: drag parts to 1e-9, speeds to
1e-6 (the flat optimum limits scipy's accuracy). Run by ctest as
`python3 ref_drag_speeds.py path/to/libacperf.so`.
"""
import ctypes
import math
import pathlib
import tomllib

from fluids.atmosphere import ATMOSPHERE_1976
from scipy.optimize import minimize_scalar

from reflib import Checker, load

D = ctypes.c_double
lib = load()
lib.acp_aircraft_new.restype = ctypes.c_void_p
lib.acp_aircraft_free.argtypes = [ctypes.c_void_p]
lib.acp_aircraft_load.argtypes = [ctypes.c_void_p, ctypes.c_char_p, ctypes.c_char_p,
                                  ctypes.c_size_t]


class PolarPoint(ctypes.Structure):
    _fields_ = [(n, D) for n in (
        "mach", "dynamic_pressure", "reynolds_per_metre", "cl", "cd_friction", "cd_form",
        "cd_interference", "cd_leakage", "cd_misc", "cd0", "cd_induced", "cd_wave", "cd",
        "induced_factor", "mach_drag_divergence", "mach_critical")]


class SpeedSet(ctypes.Structure):
    _fields_ = [(n, D) for n in ("vmd", "vmp", "vmr", "vs1g", "ld_max")]


lib.acp_polar.argtypes = [ctypes.c_void_p, D, D, D, D, D, ctypes.POINTER(PolarPoint)]
lib.acp_speeds.argtypes = [ctypes.c_void_p, D, D, D, ctypes.POINTER(SpeedSet)]

G0 = 9.80665
DR = (8314.32 / 28.9644 - 287.05287) / 287.05287  # fluids' R against ISO 2533's
EXAMPLES = pathlib.Path(__file__).resolve().parents[2] / "examples" / "aircraft"
check = Checker("drag build-up and speeds vs an independent Python implementation")


def air(hp, dtemp):
    ref = ATMOSPHERE_1976(lib.acp_geometric_altitude(hp), dT=dtemp)
    shift_p = -DR * math.log(101325.0 / ref.P)
    return ref.rho * (1.0 + shift_p + DR), ref.mu, ref.v_sonic * (1.0 - DR / 2.0)


def skin_friction(re, mach, lam, length, rough):
    re_t = re
    if rough > 0:
        base = (length / rough) ** 1.053
        re_t = min(re, max(38.21 * base, 44.62 * base * mach ** 1.16))
    cf_lam = 1.328 / math.sqrt(re)
    cf_turb = 0.455 / (math.log10(re_t) ** 2.58 * (1 + 0.144 * mach ** 2) ** 0.65)
    return lam * cf_lam + (1 - lam) * cf_turb


def form_factor(c, mach):
    if "form_factor" in c:
        return c["form_factor"]
    t = c["type"]
    if t == "surface":
        tc, xc = c["thickness_ratio"], c.get("max_thickness_position", 0.3)
        return ((1 + 0.6 / xc * tc + 100 * tc ** 4) * max(1.0, 1.34 * mach ** 0.18)
                * math.cos(c.get("sweep_max_thickness", 0.0)) ** 0.28)
    f = c["fineness_ratio"]
    return 1 + 60 / f ** 3 + f / 400 if t == "body" else 1 + 0.35 / f


def oswald(a, sweep):
    straight = 1.78 * (1 - 0.045 * a ** 0.68) - 0.64
    swept = lambda s: 4.61 * (1 - 0.045 * a ** 0.68) * math.cos(s) ** 0.15 - 3.1
    d30 = math.radians(30)
    e = swept(sweep) if sweep >= d30 else straight + (swept(d30) - straight) * sweep / d30
    return min(1.0, max(0.3, e))


def polar(ac, mass, hp, dtemp, tas):
    rho, mu, a = air(hp, dtemp)
    mach, q, s = tas / a, 0.5 * rho * tas * tas, ac["wing_area"]
    cl = mass * G0 / (q * s)
    parts = [0.0, 0.0, 0.0]
    for c in ac.get("component", {}).values():
        re = rho * tas * c["length"] / mu
        cf = skin_friction(re, mach, c.get("laminar_fraction", 0.0), c["length"],
                           c.get("roughness", 0.0))
        ff, qi, swet = form_factor(c, mach), c.get("interference", 1.0), \
            c["wetted_area"] * c.get("count", 1)
        parts[0] += cf * swet / s
        parts[1] += cf * (ff - 1) * swet / s
        parts[2] += cf * ff * (qi - 1) * swet / s
    if "cd0" in ac:
        cd0 = ac["cd0"]
    else:
        cd0 = sum(parts) * (1 + ac.get("leakage_fraction", 0.0)) + ac.get("cd_misc", 0.0)
    ar = ac["span"] ** 2 / s
    a_eff = ar * (1 + 1.9 * ac.get("winglet_height", 0.0) / ac["span"])
    e = ac.get("oswald") or oswald(ar, ac.get("sweep_leading_edge", 0.0))
    k = 1 / (math.pi * a_eff * e)
    cdi = k * (cl - ac.get("cl_min_drag", 0.0)) ** 2
    cdw = 0.0
    if "korn_kappa" in ac:
        cs = math.cos(ac.get("sweep_quarter_chord", 0.0))
        mdd = (ac["korn_kappa"] / cs - ac["wing_thickness_ratio"] / cs ** 2
               - abs(cl) / (10 * cs ** 3))
        mcrit = mdd - (0.1 / 80) ** (1 / 3)
        cdw = 20 * (mach - mcrit) ** 4 if mach > mcrit else 0.0
    return dict(cd_friction=parts[0], cd_form=parts[1], cd_interference=parts[2], cd0=cd0,
                cd_induced=cdi, cd_wave=cdw, cd=cd0 + cdi + cdw, drag=(cd0 + cdi + cdw) * q * s)


CONDITIONS = {
    "regional_jet.toml": [(34000, 11277.6, 0, 230), (38000, 0, 15, 120), (30000, 7620, -10, 200),
                          (36000, 10668, 5, 236)],
    "light_twin.toml": [(5000, 0, 0, 70), (5000, 7620, 0, 130), (4200, 3000, 20, 90)],
}

for path in sorted(EXAMPLES.glob("*.toml")):
    with open(path, "rb") as f:
        ac = tomllib.load(f)
    h = lib.acp_aircraft_new()
    err = ctypes.create_string_buffer(256)
    if lib.acp_aircraft_load(h, str(path).encode(), err, len(err)) != 0:
        check.failures.append(f"{path.name}: {err.value.decode()}")
        continue
    for mass, hp, dtemp, tas in CONDITIONS.get(path.name, []):
        label = f"{path.name} {mass} kg hp {hp} ISA{dtemp:+} {tas} m/s"
        ref = polar(ac, mass, hp, dtemp, tas)
        got = PolarPoint()
        st = lib.acp_polar(h, mass, hp, dtemp, tas, 1.0, ctypes.byref(got))
        check.count += 1
        if st != 0:
            check.failures.append(f"{label}: status {st}")
            continue
        for field in ("cd_friction", "cd_form", "cd_interference", "cd0", "cd_induced", "cd"):
            check.close(getattr(got, field), ref[field], 1e-9, f"{label} {field}")
        check.close(got.cd_wave, ref["cd_wave"], 1e-7, f"{label} cd_wave")

        # the speeds on the full model, by scipy's bounded Brent
        speeds = SpeedSet()
        st = lib.acp_speeds(h, mass, hp, dtemp, ctypes.byref(speeds))
        check.count += 1
        if st != 0:
            check.failures.append(f"{label}: acp_speeds status {st}")
            continue
        for name, power in (("vmd", 0), ("vmp", 1), ("vmr", -1)):
            v0 = getattr(speeds, name)
            res = minimize_scalar(lambda v: polar(ac, mass, hp, dtemp, v)["drag"] * v ** power,
                                  bounds=(0.7 * v0, 1.3 * v0), method="bounded",
                                  options={"xatol": 1e-9 * v0})
            check.close(v0, res.x, 1e-6, f"{path.name} {mass} kg hp {hp} {name}")
        check.close(speeds.ld_max, mass * G0 / polar(ac, mass, hp, dtemp, speeds.vmd)["drag"],
                    1e-9, f"{path.name} {mass} kg hp {hp} L/D max")
    lib.acp_aircraft_free(h)

check.finish()
