"""The spreadsheet functions of acperf: the one table every layer is made from.

From this table come the Calc add-in's UNO IDL interface, its CalcAddIns.xcu
(names, descriptions, parameter help, category), the Calc component's behaviour
(it reads the table at run time), the Excel VBA module's wrapper functions and
the end-to-end tests' expectations of coverage. Adding a C function to the
spreadsheets is one entry here (and one reference line in
tests/spreadsheet/reference.py, which checks it independently).

Every function converts its arguments from the units operations staff use to SI
with the library's own acp_to_si(), calls one C function, and converts the
results back with acp_from_si(). No physics here: only shapes, units, errors.

An entry (see Fn and Arg below):
  name      the function name in both spreadsheets (Calc display name, VBA
            function name). NEVER renamed once released: it is in workbooks.
  method    the UNO method name (lowerCamel of name), stored in every ODF
            formula after the implementation name: never changes either.
  kind      how the C function returns its result:
              value   double f(args)                 NaN on failure
              out     int f(args, double *o1, ...)   status, outputs by pointer
              struct  int f(args, struct *out)       status, a struct of doubles
            and four kinds that are not a computation: version, convert,
            check (the aircraft's completeness), get (an aircraft key).
  aircraft  True: the first argument is the aircraft parameter range
            (two columns: key, value), and the C function's first argument is
            the model built from it.
  args      the numeric arguments, in the C order, with their operations unit
            (a unit name of acp_to_si(); None: dimensionless).
  outputs   the C outputs in order (for a struct: every field of the struct, in
            its declaration order, so the VBA buffer has its size), each with
            the unit it is shown in (acp_from_si() name, or None: as in C).
  pick      for a struct or several outputs, the one output returned (a
            scalar function); None: the whole row.
  partial   the C function gives the outputs it found with ACP_ERR_RANGE for
            the others (speeds.h): show those, #NUM! for the rest.

Any numeric argument may also be a single-column or single-row range: the
function then returns one row per element (scalar arguments are repeated).
"""

from collections import namedtuple

Arg = namedtuple("Arg", "name unit help")
Out = namedtuple("Out", "field unit label")


class Fn:
    def __init__(self, name, kind, call, desc, args=(), outputs=(), aircraft=False,
                 pick=None, partial=False, text_args=()):
        self.name = name
        self.kind = kind
        self.call = call
        self.desc = desc
        self.args = list(args)
        self.outputs = list(outputs)
        self.aircraft = aircraft
        self.pick = pick
        self.partial = partial
        self.text_args = list(text_args)   # (name, help): text arguments (convert, get)
        parts = name.split("_")[1:]
        self.method = parts[0].lower() + "".join(p.capitalize() for p in parts[1:])

    @property
    def shown(self):
        """The outputs the spreadsheet shows, in order."""
        if self.pick is None:
            return self.outputs
        return [o for o in self.outputs if o.field == self.pick]

    @property
    def returns_row(self):
        return len(self.shown) > 1


PARAMS_HELP = ("Aircraft parameter range: two columns, key and value (keys and SI units "
               "of docs/aircraft-format.md; text only for name and component.NAME.type)")

# Argument helpers: one place for each recurring argument.
HP = Arg("pressure_altitude", "ft", "Pressure altitude (ft)")
DEV = Arg("isa_deviation", "K", "ISA deviation (degrees C above standard; 0 for a standard day)")
CAS = Arg("cas", "kt", "Calibrated airspeed (kt)")
TAS = Arg("tas", "kt", "True airspeed (kt)")
MACH = Arg("mach", None, "Mach number")
MASS = Arg("mass", "kg", "Aircraft mass (kg)")

ATMOS = [Out("temperature", "degC", "OAT degC"), Out("pressure", "hPa", "pressure hPa"),
         Out("density", None, "density kg/m3"), Out("sound_speed", "kt", "speed of sound kt"),
         Out("dynamic_viscosity", None, "dynamic viscosity Pa s"),
         Out("kinematic_viscosity", None, "kinematic viscosity m2/s")]
DRAG = [Out(f, "N", f + " N") for f in
        ("friction", "form", "interference", "parasite", "induced", "wave", "total")]


def _speed_set(unit, label):
    return [Out("vmd", unit, "VMD " + label), Out("vmp", unit, "VMP " + label),
            Out("vmr", unit, "VMR " + label), Out("vs1g", unit, "VS1G " + label),
            Out("ld_max", None, "L/D max")]


FUNCTIONS = [
    # ---- library and units -------------------------------------------------
    Fn("ACP_VERSION", "version", "acp_version_string",
       "Version of the acperf library in use (text)."),
    Fn("ACP_CONVERT", "convert", "acp_to_si",
       "Converts a value between two units of the library (ft, FL, m, NM, kt, km/h, "
       "ft/min, kg, lb, t, hPa, inHg, degC, K, min, h, deg, N, lbf, kg/h, lb/h ...).",
       args=[Arg("value", None, "Value to convert")],
       text_args=[("from_unit", "Unit of the value, e.g. \"ft\""),
                  ("to_unit", "Unit wanted, e.g. \"m\"")],
       outputs=[Out("value", None, "value")]),

    # ---- atmosphere --------------------------------------------------------
    Fn("ACP_ISA", "struct", "acp_isa",
       "Atmosphere at a pressure altitude (ft) and ISA deviation (degC): one row of OAT "
       "(degC), pressure (hPa), density (kg/m3), speed of sound (kt), dynamic viscosity "
       "(Pa s), kinematic viscosity (m2/s). A column of altitudes gives one row each.",
       args=[HP, DEV], outputs=ATMOS),
    Fn("ACP_ISA_TEMPERATURE", "value", "acp_isa_temperature",
       "Outside air temperature (degC) at a pressure altitude (ft) and ISA deviation (degC).",
       args=[HP, DEV], outputs=[Out("temperature", "degC", "OAT degC")]),
    Fn("ACP_ISA_PRESSURE", "value", "acp_isa_pressure",
       "Standard static pressure (hPa) at a pressure altitude (ft).",
       args=[HP], outputs=[Out("pressure", "hPa", "pressure hPa")]),
    Fn("ACP_ISA_DENSITY", "value", "acp_isa_density",
       "Air density (kg/m3) at a pressure altitude (ft) and ISA deviation (degC).",
       args=[HP, DEV], outputs=[Out("density", None, "density kg/m3")]),
    Fn("ACP_SOUND_SPEED", "value", "acp_isa_sound_speed",
       "Speed of sound (kt) at a pressure altitude (ft) and ISA deviation (degC).",
       args=[HP, DEV], outputs=[Out("sound_speed", "kt", "speed of sound kt")]),
    Fn("ACP_ISA_DEVIATION", "value", "acp_isa_deviation",
       "ISA deviation (degC) of an outside air temperature (degC) at a pressure altitude (ft).",
       args=[Arg("oat", "degC", "Outside air temperature (degC)"), HP],
       outputs=[Out("isa_deviation", "K", "ISA deviation degC")]),
    Fn("ACP_OAT", "value", "acp_outside_air_temperature",
       "Outside air temperature (degC) for an ISA deviation (degC) at a pressure altitude (ft).",
       args=[DEV, HP], outputs=[Out("temperature", "degC", "OAT degC")]),
    Fn("ACP_TOTAL_TEMPERATURE", "value", "acp_total_temperature",
       "Total (ram) air temperature (degC) from static air temperature (degC), Mach number "
       "and probe recovery factor (0 to 1; 1 for the full stagnation rise).",
       args=[Arg("sat", "degC", "Static air temperature (degC)"), MACH,
             Arg("recovery", None, "Probe recovery factor, 0 to 1")],
       outputs=[Out("tat", "degC", "TAT degC")]),
    Fn("ACP_PRESSURE_ALTITUDE", "out", "acp_isa_pressure_altitude",
       "Pressure altitude (ft) of a static pressure (hPa) in the standard atmosphere.",
       args=[Arg("pressure", "hPa", "Static pressure (hPa)")],
       outputs=[Out("pressure_altitude", "ft", "pressure altitude ft")]),
    Fn("ACP_PRESSURE_ALTITUDE_QNH", "out", "acp_pressure_altitude_from_qnh",
       "Pressure altitude (ft) from an altimeter reading (ft) with the QNH setting (hPa).",
       args=[Arg("indicated_altitude", "ft", "Altimeter reading with QNH set (ft)"),
             Arg("qnh", "hPa", "Altimeter setting QNH (hPa)")],
       outputs=[Out("pressure_altitude", "ft", "pressure altitude ft")]),
    Fn("ACP_DENSITY_ALTITUDE", "value", "acp_density_altitude",
       "Density altitude (ft) at a pressure altitude (ft) and ISA deviation (degC).",
       args=[HP, DEV], outputs=[Out("density_altitude", "ft", "density altitude ft")]),

    # ---- airspeeds ---------------------------------------------------------
    Fn("ACP_CAS_TO_TAS", "value", "acp_cas_to_tas",
       "True airspeed (kt) from calibrated airspeed (kt) at a pressure altitude (ft) and "
       "ISA deviation (degC).",
       args=[CAS, HP, DEV], outputs=[Out("tas", "kt", "TAS kt")]),
    Fn("ACP_TAS_TO_CAS", "value", "acp_tas_to_cas",
       "Calibrated airspeed (kt) from true airspeed (kt) at a pressure altitude (ft) and "
       "ISA deviation (degC).",
       args=[TAS, HP, DEV], outputs=[Out("cas", "kt", "CAS kt")]),
    Fn("ACP_CAS_TO_MACH", "value", "acp_cas_to_mach",
       "Mach number from calibrated airspeed (kt) at a pressure altitude (ft).",
       args=[CAS, HP], outputs=[Out("mach", None, "Mach")]),
    Fn("ACP_MACH_TO_CAS", "value", "acp_mach_to_cas",
       "Calibrated airspeed (kt) from Mach number at a pressure altitude (ft).",
       args=[MACH, HP], outputs=[Out("cas", "kt", "CAS kt")]),
    Fn("ACP_MACH_TO_TAS", "value", "acp_mach_to_tas",
       "True airspeed (kt) from Mach number at a pressure altitude (ft) and ISA deviation (degC).",
       args=[MACH, HP, DEV], outputs=[Out("tas", "kt", "TAS kt")]),
    Fn("ACP_TAS_TO_MACH", "value", "acp_tas_to_mach",
       "Mach number from true airspeed (kt) at a pressure altitude (ft) and ISA deviation (degC).",
       args=[TAS, HP, DEV], outputs=[Out("mach", None, "Mach")]),
    Fn("ACP_CAS_TO_EAS", "value", "acp_cas_to_eas",
       "Equivalent airspeed (kt) from calibrated airspeed (kt) at a pressure altitude (ft).",
       args=[CAS, HP], outputs=[Out("eas", "kt", "EAS kt")]),
    Fn("ACP_CROSSOVER_ALTITUDE", "out", "acp_crossover_altitude",
       "Crossover altitude (ft, pressure altitude) where a calibrated airspeed (kt) and a "
       "Mach number give the same true airspeed.",
       args=[CAS, MACH], outputs=[Out("pressure_altitude", "ft", "crossover ft")]),
    Fn("ACP_WIND_TRIANGLE", "out", "acp_wind_triangle",
       "Wind triangle: one row of ground speed (kt), heading (deg true) and drift (deg, "
       "positive right) from true airspeed (kt), track (deg), wind direction from (deg) "
       "and wind speed (kt).",
       args=[TAS, Arg("track", "deg", "Track over the ground (deg true)"),
             Arg("wind_from", "deg", "Direction the wind blows from (deg true)"),
             Arg("wind_speed", "kt", "Wind speed (kt)")],
       outputs=[Out("ground_speed", "kt", "ground speed kt"),
                Out("heading", "deg", "heading deg"), Out("drift", "deg", "drift deg")]),

    # ---- aircraft, drag, characteristic speeds -----------------------------
    Fn("ACP_AIRCRAFT_CHECK", "check", "acp_aircraft_check",
       "Checks an aircraft parameter range: \"OK\", or the text of what is wrong "
       "(unknown key, value out of range, blank or text value, missing key).",
       aircraft=True, outputs=[Out("message", None, "check")]),
    Fn("ACP_AIRCRAFT_VALUE", "get", "acp_aircraft_get",
       "Value of one aircraft key (SI unit of docs/aircraft-format.md), given or derived: "
       "e.g. aspect_ratio, aspect_ratio_effective, oswald_effective, induced_factor.",
       aircraft=True, text_args=[("key", "Key name, e.g. \"aspect_ratio\"")],
       outputs=[Out("value", None, "value")]),
    Fn("ACP_DRAG", "struct", "acp_drag",
       "Drag in level 1 g flight (N): one row of friction, form, interference, parasite, "
       "induced, wave and total drag, at a mass (kg), pressure altitude (ft), ISA "
       "deviation (degC) and true airspeed (kt).",
       aircraft=True, args=[MASS, HP, DEV, TAS], outputs=DRAG),
    Fn("ACP_DRAG_TOTAL", "struct", "acp_drag",
       "Total drag in level 1 g flight (N) at a mass (kg), pressure altitude (ft), ISA "
       "deviation (degC) and true airspeed (kt).",
       aircraft=True, args=[MASS, HP, DEV, TAS], outputs=DRAG, pick="total"),
    Fn("ACP_SPEEDS_CAS", "struct", "acp_speeds_cas",
       "Characteristic speeds as calibrated airspeed (kt): one row of VMD (minimum drag), "
       "VMP (minimum power), VMR (jet maximum range), VS1G (1 g stall) and L/D max, at a "
       "mass (kg), pressure altitude (ft) and ISA deviation (degC).",
       aircraft=True, args=[MASS, HP, DEV], outputs=_speed_set("kt", "CAS kt"), partial=True),
    Fn("ACP_SPEEDS_TAS", "struct", "acp_speeds",
       "Characteristic speeds as true airspeed (kt): one row of VMD, VMP, VMR, VS1G and "
       "L/D max, at a mass (kg), pressure altitude (ft) and ISA deviation (degC).",
       aircraft=True, args=[MASS, HP, DEV], outputs=_speed_set("kt", "TAS kt"), partial=True),
    Fn("ACP_SPEEDS_MACH", "struct", "acp_speeds_mach",
       "Characteristic speeds as Mach numbers: one row of VMD, VMP, VMR, VS1G and L/D max, "
       "at a mass (kg), pressure altitude (ft) and ISA deviation (degC).",
       aircraft=True, args=[MASS, HP, DEV], outputs=_speed_set(None, "Mach"), partial=True),
    Fn("ACP_LD_MAX", "struct", "acp_speeds",
       "Maximum lift-to-drag ratio at a mass (kg), pressure altitude (ft) and ISA "
       "deviation (degC).",
       aircraft=True, args=[MASS, HP, DEV], outputs=_speed_set("kt", "TAS kt"),
       pick="ld_max", partial=True),
    Fn("ACP_GLIDE", "struct", "acp_glide",
       "Gliding without thrust: one row of best glide ratio, best glide speed (kt TAS), "
       "its sink rate (ft/min), minimum sink speed (kt TAS) and minimum sink rate (ft/min), "
       "at a mass (kg), pressure altitude (ft) and ISA deviation (degC).",
       aircraft=True, args=[MASS, HP, DEV],
       outputs=[Out("best_glide_ratio", None, "best glide ratio"),
                Out("best_glide_speed", "kt", "best glide TAS kt"),
                Out("best_glide_sink_rate", "ft/min", "sink ft/min"),
                Out("min_sink_speed", "kt", "min sink TAS kt"),
                Out("min_sink_rate", "ft/min", "min sink ft/min")], partial=True),

    # ---- to come with the C functions (one entry each), e.g.:
    # Fn("ACP_CLIMB", "struct", "acp_climb", "...", aircraft=True,
    #    args=[MASS, Arg("from_altitude", "ft", ...), Arg("to_altitude", "ft", ...), DEV],
    #    outputs=[Out("time", "min", ...), Out("distance", "NM", ...),
    #             Out("fuel", "kg", ...)]),
]

# The implementation name of the Calc add-in. It is written into every formula
# of every saved workbook that uses the functions: it NEVER changes.
IMPLEMENTATION_NAME = "org.acperf.calc.Functions"
INTERFACE_NAME = "org.acperf.calc.XFunctions"
EXTENSION_ID = "org.acperf.calc"
CATEGORY = "Add-In"
DLL_NAME = "acperf.dll"

BY_NAME = {f.name: f for f in FUNCTIONS}
assert len(BY_NAME) == len(FUNCTIONS), "duplicate function name"
assert len({f.method for f in FUNCTIONS}) == len(FUNCTIONS), "duplicate method name"
