"""acperf: aircraft performance from Python (binding of the C library libacperf).

The functions mirror libacperf's C names without the ``acp_`` prefix
(``acperf.isa``, ``acperf.cas_to_mach``, ...), in SI units. They accept
scalars, lists, numpy arrays and pandas Series, broadcast against each other:

    >>> import acperf
    >>> acperf.isa(11000.0).temperature           # 216.65 (K)
    >>> acperf.cas_to_mach([120.0, 150.0], 10000.0)  # array of Mach numbers
    >>> acperf.units.ft_to_m(35000.0)
    >>> ac = acperf.Aircraft.from_file("examples/aircraft/regional_jet.toml")
    >>> acperf.speeds(ac, 30000.0, 10000.0).vmr       # TAS, m/s
    >>> acperf.drag(ac, 30000.0, 10000.0, 0.0, [180.0, 200.0]).total

A scalar call that fails raises :class:`AcperfError` (a ``ValueError``) with
the status text of the library (:class:`InfeasibleTrip`, a subclass, for a trip
that cannot be flown: its ``reason``, ``excess`` and ``result``); an array call
gives NaN for the invalid points and warns with :class:`AcperfWarning`. Coded
result fields are IntEnum members (``TripInfeasible``, ``Limit``, ``CruiseLimit``,
``ScheduleMode``, ...). A str with a NUL character is refused (C strings end
there). ``acperf.capi`` is the raw SWIG module with every C function under its C
name.

Caution: results are engineering estimates, not approved flight-manual data.
Operational use defers to the aircraft's approved data, the operator's approved
procedures and the local aviation authority's rules.
"""

from . import capi
from ._core import AcperfError, AcperfWarning, InfeasibleTrip, Result
from ._enums import *  # noqa: F401,F403
from . import units
from .atmosphere import *  # noqa: F401,F403
from .airspeed import *  # noqa: F401,F403
from .friction import *  # noqa: F401,F403
from .aircraft import Aircraft
from ._polar import *  # noqa: F401,F403
from ._speeds import *  # noqa: F401,F403
from .performance import *  # noqa: F401,F403
from ._cruise import *  # noqa: F401,F403
from . import atmosphere as _atmosphere, airspeed as _airspeed, friction as _friction
from . import _polar, _speeds, performance as _performance, _cruise, _enums

strerror = capi.acp_strerror
version = capi.acp_version
version_string = capi.acp_version_string
__version__ = capi.acp_version_string()

__all__ = ["AcperfError", "InfeasibleTrip", "AcperfWarning", "Result", *_enums.__all__, "capi",
           "units", "strerror", "version", "version_string", "Aircraft", *_atmosphere.__all__, *_airspeed.__all__,
           *_friction.__all__, *_polar.__all__, *_speeds.__all__, *_performance.__all__, *_cruise.__all__]
