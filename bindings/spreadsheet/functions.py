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

  mission   True: the argument after the aircraft range is the mission range
            (two columns: key, value; keys of MISSION_KEYS in operations units).
  layout    the C arguments in order when they are not (aircraft, mission,
            args...): "@ac", "@mission", an argument name, a text argument
            named in enums (its text becomes the C enum value), or a number
            passed as it is (a step of 0 = the library's default, wind 0).
  enums     {text argument name: {accepted text: C enum value}}.
  search    the C function ends a numerical search (golden section, bisection,
            iteration): the DLL test compares it with its looser tolerance.
  kinds     also: trace (a struct array with totals: a table, one row per
            point) and status (the text of why a trip is infeasible, or OK).

Any numeric argument may also be a single-column or single-row range: the
function then returns one row per element (scalar arguments are repeated);
not for traces, whose arguments are single values.

Composite units "A/B" (e.g. "NM/t", "lb/h/lbf") are converted with the
library's acp_to_si/acp_from_si for A and for one B: no constant is written
here either.
"""

from collections import namedtuple

Arg = namedtuple("Arg", "name unit help")
Out = namedtuple("Out", "field unit label")


class Fn:
    def __init__(self, name, kind, call, desc, args=(), outputs=(), aircraft=False,
                 pick=None, partial=False, text_args=(), mission=False, layout=None,
                 enums=None, search=False, totals=()):
        self.name = name
        self.kind = kind
        self.call = call
        self.desc = desc
        self.args = list(args)
        self.outputs = list(outputs)
        self.aircraft = aircraft
        self.pick = pick
        self.partial = partial
        self.text_args = list(text_args)   # (name, help): text arguments (convert, get, enums)
        self.mission = mission
        self.enums = dict(enums or {})
        self.search = search
        self.totals = list(totals)   # trace: the fields of the totals struct (buffer size)
        self.layout = list(layout) if layout is not None else \
            (["@ac"] if aircraft else []) + (["@mission"] if mission else []) + \
            [a.name for a in self.args]
        parts = name.split("_")[1:]
        self.method = parts[0].lower() + "".join(p.capitalize() for p in parts[1:])

    @property
    def shown(self):
        """The outputs the spreadsheet shows, in order."""
        if self.pick is None:
            return self.outputs
        picks = (self.pick,) if isinstance(self.pick, str) else tuple(self.pick)
        return [o for p in picks for o in self.outputs if o.field == p]

    @property
    def returns_row(self):
        return len(self.shown) > 1 or self.kind == "trace"

    @property
    def range_args(self):
        """The two-column key/value range arguments before the numbers."""
        return (["params"] if self.aircraft else []) + (["mission"] if self.mission else [])


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


SCHEDULE = [Out("mode", None, "mode"), Out("cas", "kt", "CAS kt"), Out("mach", None, "Mach"),
            Out("tas", "kt", "TAS kt"), Out("crossover", "ft", "crossover ft"),
            Out("dtas_dhp", None, "dTAS/dhp 1/s"),
            Out("acceleration_factor", None, "acceleration factor")]
PROFILE_POINT = [Out("time", "min", "time min"), Out("distance", "NM", "distance NM"),
                 Out("hp", "ft", "pressure altitude ft"), Out("mass", "kg", "mass kg"),
                 Out("tas", "kt", "TAS kt"), Out("cas", "kt", "CAS kt"), Out("mach", None, "Mach"),
                 Out("rate", "ft/min", "rate ft/min"), Out("gradient", "deg", "path angle deg"),
                 Out("thrust", "N", "thrust N"), Out("drag", "N", "drag N"),
                 Out("fuel_flow", "kg/h", "fuel flow kg/h"),
                 Out("acceleration_factor", None, "acceleration factor"),
                 Out("mode", None, "mode"), Out("limit", None, "limit"),
                 Out("limit_excess", None, "limit excess (SI)")]
POINT_SHOWN = ("rate", "cas", "mach", "tas", "gradient", "fuel_flow", "mode")
TRACE_SHOWN = ("time", "distance", "hp", "mass", "cas", "mach", "tas", "rate", "fuel_flow")
PROFILE = [Out("time", "min", "time min"), Out("distance", "NM", "distance NM"),
           Out("fuel", "kg", "fuel kg"), Out("mass_end", "kg", "end mass kg"),
           Out("tas_end", "kt", "end TAS kt"), Out("speed_change_time", "min", "speed change min"),
           Out("speed_change_distance", "NM", "speed change NM"),
           Out("speed_change_fuel", "kg", "speed change fuel kg"),
           Out("limit", None, "limit"), Out("limit_excess", None, "limit excess (SI)")]
PROFILE_SHOWN = ("time", "distance", "fuel", "mass_end")
CRUISE_POINT = [Out("time", "min", "time min"), Out("distance", "NM", "distance NM"),
                Out("hp", "ft", "pressure altitude ft"), Out("mass", "kg", "mass kg"),
                Out("tas", "kt", "TAS kt"), Out("cas", "kt", "CAS kt"), Out("mach", None, "Mach"),
                Out("ground_speed", "kt", "ground speed kt"), Out("drag", "N", "drag N"),
                Out("fuel_flow", "kg/h", "fuel flow kg/h"), Out("tsfc", None, "TSFC kg/(N s)"),
                Out("lift_to_drag", None, "L/D"), Out("sar", "NM/t", "SAR NM/1000 kg"),
                Out("limit", None, "limit"), Out("buffet_margin", None, "buffet margin g"),
                Out("limit_exceeded", None, "limit exceeded"),
                Out("limit_excess", None, "limit excess (SI)")]
CRUISE_RESULT = [Out("time", "min", "time min"), Out("distance", "NM", "distance NM"),
                 Out("fuel", "kg", "fuel kg"), Out("mass_end", "kg", "end mass kg"),
                 Out("hp_end", "ft", "end altitude ft"),
                 Out("sar_mean", "NM/t", "mean SAR NM/1000 kg"),
                 Out("tas_start", "kt", "start TAS kt"), Out("tas_end", "kt", "end TAS kt"),
                 Out("mach_start", None, "start Mach"), Out("mach_end", None, "end Mach"),
                 Out("step_climbs", None, "step climbs"),
                 Out("step_climb_time", "min", "step climb min"),
                 Out("step_climb_distance", "NM", "step climb NM"),
                 Out("step_climb_fuel", "kg", "step climb fuel kg"),
                 Out("limit", None, "limit"), Out("limit_excess", None, "limit excess (SI)"),
                 Out("buffet_margin_min", None, "least buffet margin g")]
# The trip's six segments in flight order (acp_trip_result of acperf/mission.h):
# each has a _time, _distance and _fuel field.
TRIP_SEGMENTS = ("climb", "climb_acceleration", "cruise", "descent_deceleration", "descent",
                 "approach_deceleration")
_TRIP_UNITS = {"infeasible": None, "excess": None, "excess_at_least": None, "trip_time": "min",
               "block_time": "min",
               "cruise_altitude_end": "ft", "cruise_sar_mean": "NM/t", "iterations": None}
_TRIP_UNITS.update({f"{s}_{q}": u for s in TRIP_SEGMENTS
                    for q, u in (("time", "min"), ("distance", "NM"), ("fuel", "kg"))})
TRIP = [Out(f, _TRIP_UNITS.get(f, "kg"), f.replace("_", " ")) for f in (
    "infeasible", "excess", "takeoff_mass", "landing_mass", "zero_fuel_mass", "ramp_mass",
    "trip_fuel", "taxi_fuel", "contingency_fuel", "alternate_fuel", "final_reserve_fuel",
    "block_fuel", "takeoff_fuel", "trip_time", "block_time", "climb_time", "climb_distance",
    "climb_fuel", "cruise_time", "cruise_distance", "cruise_fuel", "descent_time",
    "descent_distance", "descent_fuel", "top_of_climb_mass", "top_of_descent_mass",
    "cruise_altitude_end", "cruise_sar_mean", "iterations", "climb_acceleration_time",
    "climb_acceleration_distance", "climb_acceleration_fuel", "descent_deceleration_time",
    "descent_deceleration_distance", "descent_deceleration_fuel", "approach_deceleration_time",
    "approach_deceleration_distance", "approach_deceleration_fuel", "excess_at_least")]

# Cruise speed modes by name (enum acp_cruise_mode of acperf/cruise.h).
CRUISE_MODES = {"fixed_mach": 1, "max_range": 2, "long_range": 3, "economy": 4,
                "max_endurance": 5}
MODE_ARG = ("mode", "Cruise speed mode: \"fixed_mach\" (the aircraft's cruise_mach), "
            "\"max_range\", \"long_range\" (99 % of the maximum SAR, faster), \"economy\" "
            "(with the cost index), \"max_endurance\"")
COST_INDEX = Arg("cost_index", None, "Cost index (kg/min; used by the economy mode only, "
                 "else 0)")
WIND = Arg("wind", "kt", "Along-track wind component (kt), positive tailwind")
FROM_HP = Arg("from_altitude", "ft", "Pressure altitude at the start (ft)")
TO_HP = Arg("to_altitude", "ft", "Pressure altitude at the end (ft)")
ZFM = Arg("zero_fuel_mass", "kg", "Zero-fuel mass (kg)")

MISSION_HELP = ("Mission range: two columns, key and value (keys of acperf/mission.h in "
                "operations units: distance NM, cruise_altitude ft, ... docs/spreadsheet.md)")

# The keys of the mission range (acp_mission_set of acperf/mission.h), each with
# the operations unit it is written in on the sheet (acp_to_si name; None: as in C).
MISSION_KEYS = {
    "distance": "NM", "cruise_altitude": "ft", "origin_altitude": "ft",
    "destination_altitude": "ft", "isa_deviation": "K", "wind": "kt", "cruise_mode": None,
    "cost_index": None, "step_climb": "ft", "climb_step": "ft", "cruise_step": "NM",
    "taxi_time": "min", "taxi_fuel": "kg", "contingency_fraction": None,
    "contingency_minimum": "kg", "alternate_fuel": "kg", "final_reserve_time": "min",
    "holding_height": "ft", "descent_end_height": "ft"}

# Why a trip is infeasible (enum acp_trip_infeasible of acperf/mission.h), for
# ACP_TRIP_STATUS: the text and the unit of the excess.
TRIP_INFEASIBLE = {
    1: ("take-off mass above mass_max_takeoff", "kg"),
    2: ("landing mass above mass_max_landing", "kg"),
    3: ("block fuel above fuel_capacity", "kg"),
    4: ("zero-fuel mass above mass_max_zero_fuel", "kg"),
    5: ("distance shorter than the segments other than the cruise", "NM"),
    6: ("cruise altitude above max_altitude", "ft"),
    7: ("the cruise altitude cannot be reached", None),
    8: ("level flight cannot be held in cruise or holding", None),
    9: ("cruise altitude not above the origin and destination", "ft"),
    10: ("the fuel needed exceeds the mass available", "kg"),
    11: ("a take-off or zero-fuel mass below mass_operating_empty", "kg"),
    # the excess is a lift coefficient, no unit of acp_from_si: not shown
    12: ("the cruise speed is below the 1 g stall (lift coefficient above cl_max)", None)}


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

    # ---- schedules, climb and descent --------------------------------------
    Fn("ACP_SPEED_SCHEDULE", "struct", "acp_speed_schedule",
       "A speed schedule given by its speeds, at a pressure altitude (ft) and ISA deviation "
       "(degC): one row of mode flown (1 low-altitude CAS, 2 CAS, 3 Mach, 4 held at VMO, "
       "5 held at MMO), CAS (kt), Mach, TAS (kt), crossover altitude of CAS and Mach (ft) "
       "and acceleration factor. The aircraft's own climb or descent schedule: "
       "ACP_CLIMB_POINT, ACP_DESCENT_POINT.",
       args=[HP, DEV, Arg("cas_low", "kt", "CAS below the limit altitude (kt), e.g. 250"),
             Arg("limit_altitude", "ft", "Speed-limit pressure altitude (ft), e.g. 10000"),
             Arg("cas", "kt", "Schedule CAS above the limit altitude (kt)"),
             Arg("mach", None, "Schedule Mach above the crossover"),
             Arg("vmo", "kt", "Maximum operating CAS VMO (kt)"),
             Arg("mmo", None, "Maximum operating Mach MMO")],
       outputs=SCHEDULE, pick=("mode", "cas", "mach", "tas", "crossover",
                               "acceleration_factor")),
    Fn("ACP_CLIMB_POINT", "struct", "acp_climb_point",
       "The aircraft's climb schedule at maximum-climb thrust, at a mass (kg), pressure "
       "altitude (ft) and ISA deviation (degC): one row of climb rate (ft/min), CAS (kt), "
       "Mach, TAS (kt), flight-path angle (deg), fuel flow (kg/h) and mode of the schedule "
       "(1 low-altitude CAS, 2 CAS, 3 Mach, 4 VMO, 5 MMO).",
       aircraft=True, args=[MASS, HP, DEV], layout=["@ac", "mass", "pressure_altitude",
                                                    "isa_deviation", 0.0],
       outputs=PROFILE_POINT, pick=POINT_SHOWN),
    Fn("ACP_DESCENT_POINT", "struct", "acp_descent_point",
       "The aircraft's descent schedule at flight idle, at a mass (kg), pressure altitude "
       "(ft) and ISA deviation (degC): one row of rate (ft/min, negative descending), CAS "
       "(kt), Mach, TAS (kt), flight-path angle (deg), fuel flow (kg/h) and mode of the "
       "schedule (1 low-altitude CAS, 2 CAS, 3 Mach, 4 VMO, 5 MMO).",
       aircraft=True, args=[MASS, HP, DEV], layout=["@ac", "mass", "pressure_altitude",
                                                    "isa_deviation", 0.0],
       outputs=PROFILE_POINT, pick=POINT_SHOWN),
    Fn("ACP_CLIMB_RATE", "struct", "acp_climb_point",
       "Climb rate (ft/min) on the aircraft's climb schedule at maximum-climb thrust, at a "
       "mass (kg), pressure altitude (ft) and ISA deviation (degC); negative: no climb there.",
       aircraft=True, args=[MASS, HP, DEV], layout=["@ac", "mass", "pressure_altitude",
                                                    "isa_deviation", 0.0],
       outputs=PROFILE_POINT, pick="rate"),
    Fn("ACP_CLIMB", "struct", "acp_climb",
       "Climb along the aircraft's climb schedule from one pressure altitude (ft) to a higher "
       "one (ft), at a start mass (kg), ISA deviation (degC) and along-track wind (kt, "
       "positive tailwind): one row of time (min), ground distance (NM), fuel (kg) and "
       "end mass (kg).",
       aircraft=True, args=[MASS, FROM_HP, TO_HP, DEV, WIND],
       layout=["@ac", "mass", "from_altitude", "to_altitude", "isa_deviation", "wind", 0.0],
       outputs=PROFILE, pick=PROFILE_SHOWN, search=True),
    Fn("ACP_DESCENT", "struct", "acp_descent",
       "Idle descent along the aircraft's descent schedule from one pressure altitude (ft) "
       "down to a lower one (ft), at a start mass (kg), ISA deviation (degC) and along-track "
       "wind (kt, positive tailwind): one row of time (min), ground distance (NM), fuel (kg) "
       "and end mass (kg).",
       aircraft=True, args=[MASS, FROM_HP, TO_HP, DEV, WIND],
       layout=["@ac", "mass", "from_altitude", "to_altitude", "isa_deviation", "wind", 0.0],
       outputs=PROFILE, pick=PROFILE_SHOWN, search=True),
    Fn("ACP_CLIMB_TRACE", "trace", "acp_climb_trace",
       "Climb trace table, one row per step (2,000 ft steps, cut at every schedule change): "
       "time (min), ground distance (NM), pressure altitude (ft), mass (kg), CAS (kt), Mach, "
       "TAS (kt), climb rate (ft/min), fuel flow (kg/h). Arguments as ACP_CLIMB, single "
       "values; enter over enough rows (rows past the end show #N/A).",
       aircraft=True, args=[MASS, FROM_HP, TO_HP, DEV, WIND],
       layout=["@ac", "mass", "from_altitude", "to_altitude", "isa_deviation", "wind", 0.0],
       outputs=PROFILE_POINT, pick=TRACE_SHOWN, totals=PROFILE, search=True),
    Fn("ACP_DESCENT_TRACE", "trace", "acp_descent_trace",
       "Descent trace table, one row per step: time (min), ground distance (NM), pressure "
       "altitude (ft), mass (kg), CAS (kt), Mach, TAS (kt), rate (ft/min, negative), fuel "
       "flow (kg/h). Arguments as ACP_DESCENT, single values; enter over enough rows.",
       aircraft=True, args=[MASS, FROM_HP, TO_HP, DEV, WIND],
       layout=["@ac", "mass", "from_altitude", "to_altitude", "isa_deviation", "wind", 0.0],
       outputs=PROFILE_POINT, pick=TRACE_SHOWN, totals=PROFILE, search=True),
    Fn("ACP_CEILINGS", "struct", "acp_ceilings",
       "Ceilings at a mass (kg) and ISA deviation (degC), pressure altitudes in ft: one row "
       "of service ceiling (100 ft/min), maximum climb altitude (300 ft/min), 1.3 g buffet "
       "margin altitude at the cruise Mach, maximum cruise altitude and optimum altitude "
       "(greatest specific air range at the cruise Mach; it may lie above the maximum cruise "
       "altitude); #NUM! where none below 82,000 ft.",
       aircraft=True, args=[MASS, DEV],
       outputs=[Out("service_ceiling", "ft", "service ceiling ft"),
                Out("max_climb_altitude", "ft", "max climb altitude ft"),
                Out("buffet_altitude", "ft", "buffet 1.3 g altitude ft"),
                Out("max_cruise_altitude", "ft", "max cruise altitude ft"),
                Out("optimum_altitude", "ft", "optimum altitude ft"),
                Out("optimum_limit", None, "optimum limit"),
                Out("best_cruise_altitude", "ft", "best cruise altitude ft"),
                Out("best_cruise_limit", None, "best cruise limit"),
                Out("max_cruise_limit", None, "max cruise limit")],
       pick=("service_ceiling", "max_climb_altitude", "buffet_altitude", "max_cruise_altitude",
             "optimum_altitude"), search=True),

    # ---- cruise ------------------------------------------------------------
    Fn("ACP_SAR", "out", "acp_specific_air_range",
       "Specific air range over the ground in NM per 1000 kg of fuel, level flight at a "
       "mass (kg), pressure altitude (ft), ISA deviation (degC), true airspeed (kt) and "
       "along-track wind (kt, positive tailwind).",
       aircraft=True, args=[MASS, HP, DEV, TAS, WIND],
       outputs=[Out("sar", "NM/t", "SAR NM/1000 kg")]),
    Fn("ACP_CRUISE_SPEED", "struct", "acp_cruise_speed",
       "Cruise speed of a mode (\"fixed_mach\", \"max_range\", \"long_range\", \"economy\" "
       "with a cost index in kg/min, \"max_endurance\") at a mass (kg), pressure altitude "
       "(ft), ISA deviation (degC) and along-track wind (kt, positive tailwind): one row of "
       "Mach, TAS (kt), CAS (kt), fuel flow (kg/h), specific air range (NM per 1000 kg) and "
       "the limit holding the speed (0 none, 1 low-speed end, 2 VMO, 3 MMO, 4 drag model, "
       "5 thrust).",
       aircraft=True, args=[MASS, HP, DEV, WIND, COST_INDEX], text_args=[MODE_ARG],
       enums={"mode": CRUISE_MODES},
       layout=["@ac", "mode", "cost_index", "mass", "pressure_altitude", "isa_deviation", "wind"],
       outputs=CRUISE_POINT, pick=("mach", "tas", "cas", "fuel_flow", "sar", "limit"),
       search=True),
    Fn("ACP_CRUISE", "struct", "acp_cruise",
       "Cruise at a constant pressure altitude (ft) over a ground distance (NM) in a speed "
       "mode (as ACP_CRUISE_SPEED), from a start mass (kg), at an ISA deviation (degC) and "
       "along-track wind (kt, positive tailwind): one row of time (min), fuel (kg), end "
       "mass (kg) and mean specific air range (NM per 1000 kg). No step climbs; 50 NM steps.",
       aircraft=True, args=[MASS, HP, DEV, WIND, Arg("distance", "NM", "Ground distance (NM)"),
                            COST_INDEX], text_args=[MODE_ARG], enums={"mode": CRUISE_MODES},
       layout=["@ac", "mode", "cost_index", "mass", "pressure_altitude", "isa_deviation", "wind",
               1, "distance", 0.0, 0.0],
       outputs=CRUISE_RESULT, pick=("time", "fuel", "mass_end", "sar_mean"), search=True),
    Fn("ACP_BREGUET_RANGE", "value", "acp_breguet_range",
       "Breguet still-air range (NM) at constant true airspeed (kt), TSFC (lb per lbf per "
       "hour), lift-to-drag ratio, from a start mass (kg) to an end mass (kg).",
       args=[TAS, Arg("tsfc", "lb/h/lbf", "Thrust-specific fuel consumption (lb/(lbf h))"),
             Arg("lift_to_drag", None, "Lift-to-drag ratio L/D"),
             Arg("mass_start", "kg", "Mass at the start (kg)"),
             Arg("mass_end", "kg", "Mass at the end (kg)")],
       outputs=[Out("range", "NM", "range NM")]),

    # ---- trip fuel ---------------------------------------------------------
    Fn("ACP_TRIP_FUEL", "struct", "acp_trip_for_zero_fuel_mass",
       "Trip for a zero-fuel mass (kg) with the mission range (two columns: key, value; "
       "distance NM, cruise_altitude ft, ... docs/spreadsheet.md): one row of trip fuel "
       "(kg), block fuel (kg), trip time (min), block time (min), take-off mass (kg) and "
       "landing mass (kg). An infeasible trip is #NUM! in every cell; ACP_TRIP_STATUS says "
       "why. Fuel-policy defaults are typical: the operator's approved fuel policy and local "
       "rules take precedence.",
       aircraft=True, mission=True, args=[ZFM], outputs=TRIP,
       pick=("trip_fuel", "block_fuel", "trip_time", "block_time", "takeoff_mass",
             "landing_mass"), search=True),
    Fn("ACP_TRIP_SEGMENTS", "struct", "acp_trip_for_zero_fuel_mass",
       "The trip of ACP_TRIP_FUEL segment by segment, in flight order: one row of the fuel "
       "(kg) of the climb, the level acceleration to the cruise speed at the top of climb, "
       "the cruise, the deceleration to the descent speed at the top of descent (0 when the "
       "descent is not slower), the descent to the destination plus descent_end_height, and "
       "the deceleration there to the aircraft's approach_cas (0 without it). The six add "
       "up to the trip fuel. An infeasible trip is #NUM! in every cell; ACP_TRIP_STATUS says "
       "why.",
       aircraft=True, mission=True, args=[ZFM], outputs=TRIP,
       pick=tuple(s + "_fuel" for s in TRIP_SEGMENTS), search=True),
    Fn("ACP_TRIP_STATUS", "status", "acp_trip_for_zero_fuel_mass",
       "\"OK\" when the trip of ACP_TRIP_FUEL is feasible, else why not, as text (e.g. "
       "take-off mass above mass_max_takeoff by 1234 kg; an invalid aircraft or mission "
       "range; the cruise altitude cannot be reached).",
       aircraft=True, mission=True, args=[ZFM], outputs=TRIP, search=True),
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
