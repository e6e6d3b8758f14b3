"""Shared ctypes loader for the reference checks (independent of the SWIG binding)."""
import ctypes
import sys

D = ctypes.c_double


def load(path=None):
    """Load libacperf given on the command line and declare the scalar functions used."""
    lib = ctypes.CDLL(path or sys.argv[1])
    for name, nargs in [
        ("acp_cas_to_tas", 3), ("acp_tas_to_cas", 3), ("acp_cas_to_mach", 2),
        ("acp_mach_to_cas", 2), ("acp_geometric_altitude", 1), ("acp_isa_pressure", 1),
    ]:
        fn = getattr(lib, name)
        fn.restype = D
        fn.argtypes = [D] * nargs
    return lib


class AcpAtmos(ctypes.Structure):
    _fields_ = [(n, D) for n in ("temperature", "pressure", "density", "sound_speed",
                                  "dynamic_viscosity", "kinematic_viscosity")]


def isa(lib, hp, dtemp=0.0):
    out = AcpAtmos()
    status = lib.acp_isa(D(hp), D(dtemp), ctypes.byref(out))
    if status != 0:
        raise ValueError(f"acp_isa({hp}, {dtemp}) returned status {status}")
    return out


class Checker:
    """Counts checks and failures; exits non-zero when any check failed."""

    def __init__(self, title):
        self.title, self.count, self.failures = title, 0, []

    def close(self, got, want, rel, label):
        self.count += 1
        if not abs(got - want) <= rel * abs(want):
            self.failures.append(f"{label}: got {got!r} want {want!r} (rel tol {rel})")

    def finish(self):
        for f in self.failures[:20]:
            print("FAIL", f)
        print(f"{self.title}: {self.count} checks, {len(self.failures)} failures")
        sys.exit(1 if self.failures or self.count == 0 else 0)
