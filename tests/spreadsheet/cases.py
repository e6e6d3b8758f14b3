"""Test cases of the spreadsheet functions: the Calc test workbook is made from
them (tests/spreadsheet/calc_headless.py) and so are the DLL's calls under wine
(dll_wine.py). Expected values come from reference.py, never from here.

A case is (function name, arguments); an argument is a number, a text, or a
Ref to a cell or range of the test workbook (sheet "Aircraft" or "Inputs").
"""

import os
from collections import namedtuple

Ref = namedtuple("Ref", "sheet range")


def _c(col):
    return chr(65 + col) if col < 26 else chr(64 + col // 26) + chr(65 + col % 26)

ROOT = os.path.normpath(os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", ".."))
RJ_FILE = os.path.join(ROOT, "examples", "aircraft", "regional_jet.toml")
TWIN_FILE = os.path.join(ROOT, "examples", "aircraft", "light_twin.toml")

# Aircraft ranges on the sheet "Aircraft" (two columns each; rows 1..AIRCRAFT_ROWS, spare rows
# blank). The whole aircraft file must fit: calc_headless.py stops if a range would cut it.
AIRCRAFT_ROWS = 100
AIRCRAFT_COLUMNS = {"RJ": 0, "TWIN": 3, "BLANK_VALUE": 6, "TEXT_VALUE": 9, "UNKNOWN_KEY": 12,
                    "INCOMPLETE": 15, "OUT_OF_RANGE": 18, "LOW_MACH": 21}
_AIR = {k: Ref("Aircraft", f"{_c(c)}1:{_c(c + 1)}{AIRCRAFT_ROWS}")
        for k, c in AIRCRAFT_COLUMNS.items()}
RJ, TWIN = _AIR["RJ"], _AIR["TWIN"]
BLANK_VALUE, TEXT_VALUE = _AIR["BLANK_VALUE"], _AIR["TEXT_VALUE"]
UNKNOWN_KEY, INCOMPLETE = _AIR["UNKNOWN_KEY"], _AIR["INCOMPLETE"]
OUT_OF_RANGE = _AIR["OUT_OF_RANGE"]
LOW_MACH = _AIR["LOW_MACH"]   # the regional jet with cruise_mach 0.3: below the stall high up
# Sheet "Inputs": A1:A6 altitudes (ft), B1 blank, C1 text, D1:D3 CAS (kt), E1:F2 a 2x2 block.
HP_COLUMN, BLANK, TEXT = Ref("Inputs", "A1:A6"), Ref("Inputs", "B1:B1"), Ref("Inputs", "C1")
CAS_COLUMN, BLOCK = Ref("Inputs", "D1:D3"), Ref("Inputs", "E1:F2")
INPUTS = {(r, 0): v for r, v in enumerate([0.0, 5000.0, 10000.0, 25000.0, 37000.0, 45000.0])}
INPUTS.update({(0, 2): "abc", (0, 3): 150.0, (1, 3): 250.0, (2, 3): 320.0,
               (0, 4): 1.0, (0, 5): 2.0, (1, 4): 3.0, (1, 5): 4.0})

# Mission ranges on the sheet "Mission" (two columns each; operations units, docs/spreadsheet.md).
MISSIONS = {
    "M500": [("distance", 500.0), ("cruise_altitude", 35000.0)],
    "MWIND": [("distance", 500.0), ("cruise_altitude", 33000.0), ("origin_altitude", 1200.0),
              ("destination_altitude", 300.0), ("isa_deviation", 10.0), ("wind", -40.0),
              ("cruise_mode", "long_range"), ("alternate_fuel", 900.0), ("taxi_time", 12.0),
              ("final_reserve_time", 30.0), ("holding_height", 1500.0)],
    "MSHORT": [("distance", 40.0), ("cruise_altitude", 35000.0)],
    "MHIGH": [("distance", 500.0), ("cruise_altitude", 41000.0)],
    "MTEXT": [("distance", "500"), ("cruise_altitude", 35000.0)],
    "MBLANK": [("distance", None), ("cruise_altitude", 35000.0)],
    "MUNKNOWN": [("distance", 500.0), ("cruise_altitude", 35000.0), ("route_name", 3.0)],
    "MNODIST": [("cruise_altitude", 35000.0)],
    "TWIN300": [("distance", 300.0), ("cruise_altitude", 18000.0)],
    "MEND": [("distance", 500.0), ("cruise_altitude", 33000.0), ("origin_altitude", 1200.0),
             ("descent_end_height", 1500.0), ("wind", 25.0)],
    "MEND3000": [("distance", 500.0), ("cruise_altitude", 35000.0), ("cruise_mode", "long_range"),
                 ("descent_end_height", 9800.0)],
    "MENDHIGH": [("distance", 500.0), ("cruise_altitude", 35000.0),
                 ("descent_end_height", 10000.0)],   # above 3,000 m: rejected
    "M25000": [("distance", 500.0), ("cruise_altitude", 25000.0)],
}
MISSION_COLUMNS = {k: 3 * i for i, k in enumerate(MISSIONS)}
MISSION = {k: Ref("Mission", f"{_c(c)}1:{_c(c + 1)}20") for k, c in MISSION_COLUMNS.items()}

CASES = [
    ("ACP_VERSION", []),
    ("ACP_CONVERT", [1.0, "NM", "ft"]), ("ACP_CONVERT", [350.0, "FL", "m"]),
    ("ACP_CONVERT", [15.0, "degC", "K"]), ("ACP_CONVERT", [1.0, "NM", "parsec"]),
    ("ACP_ISA", [0.0, 0.0]), ("ACP_ISA", [37000.0, 15.0]), ("ACP_ISA", [-2000.0, -10.0]),
    ("ACP_ISA", [HP_COLUMN, 10.0]), ("ACP_ISA", [400000.0, 0.0]), ("ACP_ISA", [TEXT, 0.0]),
    ("ACP_ISA_TEMPERATURE", [11000.0, 5.0]), ("ACP_ISA_TEMPERATURE", [HP_COLUMN, 0.0]),
    ("ACP_ISA_PRESSURE", [18000.0]), ("ACP_ISA_PRESSURE", [1e7]),
    ("ACP_ISA_DENSITY", [8000.0, -5.0]), ("ACP_SOUND_SPEED", [35000.0, 0.0]),
    ("ACP_ISA_DEVIATION", [-40.0, 30000.0]), ("ACP_OAT", [12.0, 30000.0]),
    ("ACP_TOTAL_TEMPERATURE", [-45.0, 0.78, 0.98]), ("ACP_TOTAL_TEMPERATURE", [-45.0, 0.78, 1.5]),
    ("ACP_PRESSURE_ALTITUDE", [250.0]), ("ACP_PRESSURE_ALTITUDE", [-5.0]),
    ("ACP_PRESSURE_ALTITUDE_QNH", [3000.0, 998.0]), ("ACP_DENSITY_ALTITUDE", [5000.0, 25.0]),
    ("ACP_CAS_TO_TAS", [250.0, 10000.0, 0.0]), ("ACP_CAS_TO_TAS", [280.0, 31000.0, -8.0]),
    ("ACP_CAS_TO_TAS", [CAS_COLUMN, 20000.0, 0.0]), ("ACP_CAS_TO_TAS", [CAS_COLUMN, HP_COLUMN, 0.0]),
    ("ACP_CAS_TO_TAS", [BLOCK, 1000.0, 0.0]), ("ACP_CAS_TO_TAS", [BLANK, 1000.0, 0.0]),
    ("ACP_CAS_TO_TAS", ["250", 1000.0, 0.0]), ("ACP_CAS_TO_TAS", [-250.0, 1000.0, 0.0]),
    ("ACP_TAS_TO_CAS", [450.0, 35000.0, 10.0]), ("ACP_CAS_TO_MACH", [300.0, 28000.0]),
    ("ACP_MACH_TO_CAS", [0.78, 33000.0]), ("ACP_MACH_TO_TAS", [0.8, 39000.0, -3.0]),
    ("ACP_TAS_TO_MACH", [470.0, 39000.0, 0.0]), ("ACP_CAS_TO_EAS", [320.0, 25000.0]),
    ("ACP_CROSSOVER_ALTITUDE", [300.0, 0.78]), ("ACP_CROSSOVER_ALTITUDE", [280.0, 0.74]),
    ("ACP_CROSSOVER_ALTITUDE", [100.0, 0.9]),
    ("ACP_WIND_TRIANGLE", [420.0, 90.0, 330.0, 60.0]), ("ACP_WIND_TRIANGLE", [100.0, 0.0, 0.0, 150.0]),
    ("ACP_AIRCRAFT_CHECK", [RJ]), ("ACP_AIRCRAFT_CHECK", [TWIN]),
    ("ACP_AIRCRAFT_CHECK", [BLANK_VALUE]), ("ACP_AIRCRAFT_CHECK", [INCOMPLETE]),
    ("ACP_AIRCRAFT_VALUE", [RJ, "aspect_ratio"]), ("ACP_AIRCRAFT_VALUE", [RJ, "induced_factor"]),
    ("ACP_AIRCRAFT_VALUE", [TWIN, "oswald_effective"]), ("ACP_AIRCRAFT_VALUE", [RJ, "no_such_key"]),
    ("ACP_DRAG", [RJ, 30000.0, 10000.0, 0.0, 280.0]), ("ACP_DRAG", [RJ, 28000.0, 35000.0, 5.0, 450.0]),
    ("ACP_DRAG", [TWIN, 3200.0, 8000.0, 0.0, 170.0]), ("ACP_DRAG", [RJ, 30000.0, 10000.0, 0.0, 2000.0]),
    ("ACP_DRAG", [BLANK_VALUE, 30000.0, 10000.0, 0.0, 280.0]),
    ("ACP_DRAG", [TEXT_VALUE, 30000.0, 10000.0, 0.0, 280.0]),
    ("ACP_DRAG", [UNKNOWN_KEY, 30000.0, 10000.0, 0.0, 280.0]),
    ("ACP_DRAG", [INCOMPLETE, 30000.0, 10000.0, 0.0, 280.0]),
    ("ACP_DRAG", [OUT_OF_RANGE, 30000.0, 10000.0, 0.0, 280.0]),
    ("ACP_DRAG_TOTAL", [RJ, 30000.0, 10000.0, 0.0, CAS_COLUMN]),
    ("ACP_SPEEDS_CAS", [RJ, 30000.0, 10000.0, 0.0]), ("ACP_SPEEDS_CAS", [RJ, 34000.0, 37000.0, 10.0]),
    ("ACP_SPEEDS_TAS", [TWIN, 3000.0, 5000.0, 0.0]), ("ACP_SPEEDS_MACH", [RJ, 30000.0, 31000.0, 0.0]),
    ("ACP_SPEEDS_CAS", [RJ, 30000.0, HP_COLUMN, 0.0]), ("ACP_SPEEDS_CAS", [RJ, 0.5, 10000.0, 0.0]),
    ("ACP_LD_MAX", [RJ, 30000.0, 35000.0, 0.0]),
    ("ACP_GLIDE", [RJ, 30000.0, 20000.0, 0.0]), ("ACP_GLIDE", [TWIN, 3000.0, 8000.0, 0.0]),
    # schedules, climb, descent
    ("ACP_SPEED_SCHEDULE", [5000.0, 0.0, 250.0, 10000.0, 290.0, 0.76, 320.0, 0.82]),
    ("ACP_SPEED_SCHEDULE", [20000.0, 10.0, 250.0, 10000.0, 290.0, 0.76, 320.0, 0.82]),
    ("ACP_SPEED_SCHEDULE", [36000.0, -5.0, 250.0, 10000.0, 290.0, 0.76, 320.0, 0.82]),
    ("ACP_SPEED_SCHEDULE", [30000.0, 0.0, 250.0, 10000.0, 340.0, 0.86, 320.0, 0.82]),
    ("ACP_SPEED_SCHEDULE", [HP_COLUMN, 0.0, 250.0, 10000.0, 290.0, 0.76, 320.0, 0.82]),
    ("ACP_SPEED_SCHEDULE", [20000.0, 0.0, -250.0, 10000.0, 290.0, 0.76, 320.0, 0.82]),
    ("ACP_SPEED_SCHEDULE", [400000.0, 0.0, 250.0, 10000.0, 290.0, 0.76, 320.0, 0.82]),
    ("ACP_CLIMB_POINT", [RJ, 36000.0, 20000.0, 0.0]), ("ACP_CLIMB_POINT", [RJ, 33000.0, 5000.0, 15.0]),
    ("ACP_CLIMB_POINT", [TWIN, 5200.0, 10000.0, 0.0]), ("ACP_CLIMB_POINT", [RJ, 36000.0, HP_COLUMN, 0.0]),
    ("ACP_CLIMB_POINT", [RJ, -36000.0, 20000.0, 0.0]), ("ACP_CLIMB_POINT", [RJ, 36000.0, 400000.0, 0.0]),
    ("ACP_DESCENT_POINT", [RJ, 32000.0, 30000.0, 0.0]), ("ACP_DESCENT_POINT", [RJ, 32000.0, 8000.0, -10.0]),
    ("ACP_CLIMB_RATE", [RJ, 36000.0, 31000.0, 5.0]), ("ACP_CLIMB_RATE", [RJ, 38000.0, CAS_COLUMN, 0.0]),
    ("ACP_CLIMB_RATE", [TWIN, 5000.0, 8000.0, 0.0]), ("ACP_CLIMB_RATE", [BLANK_VALUE, 36000.0, 31000.0, 0.0]),
    ("ACP_CLIMB", [RJ, 36000.0, 1500.0, 35000.0, 0.0, 0.0]),
    ("ACP_CLIMB", [RJ, 39000.0, 0.0, 33000.0, 12.0, -30.0]),
    ("ACP_CLIMB", [TWIN, 5400.0, 500.0, 18000.0, 0.0, 20.0]),
    ("ACP_CLIMB", [RJ, 36000.0, 35000.0, 1500.0, 0.0, 0.0]),
    ("ACP_CLIMB", [RJ, 40000.0, 0.0, 60000.0, 0.0, 0.0]),
    ("ACP_CLIMB", [RJ, 36000.0, 1500.0, TEXT, 0.0, 0.0]),
    ("ACP_DESCENT", [RJ, 31000.0, 35000.0, 1500.0, 0.0, 0.0]),
    ("ACP_DESCENT", [RJ, 31000.0, 33000.0, 0.0, -8.0, 40.0]),
    ("ACP_DESCENT", [RJ, 31000.0, 1500.0, 35000.0, 0.0, 0.0]),
    ("ACP_CLIMB_TRACE", [RJ, 36000.0, 1500.0, 35000.0, 0.0, 0.0]),
    ("ACP_CLIMB_TRACE", [RJ, 36000.0, 1500.0, 35000.0, 0.0, CAS_COLUMN]),
    ("ACP_CLIMB_TRACE", [RJ, 36000.0, 35000.0, 1500.0, 0.0, 0.0]),
    ("ACP_DESCENT_TRACE", [RJ, 31000.0, 35000.0, 0.0, 5.0, 20.0]),
    ("ACP_CEILINGS", [RJ, 36000.0, 0.0]), ("ACP_CEILINGS", [RJ, 30000.0, 15.0]),
    ("ACP_CEILINGS", [TWIN, 5400.0, 0.0]), ("ACP_CEILINGS", [RJ, 2e7, 0.0]),
    # cruise
    ("ACP_SAR", [RJ, 34000.0, 35000.0, 0.0, 450.0, 0.0]), ("ACP_SAR", [RJ, 34000.0, 35000.0, 0.0, 450.0, -50.0]),
    ("ACP_SAR", [RJ, 34000.0, 35000.0, 0.0, CAS_COLUMN, 0.0]), ("ACP_SAR", [RJ, 34000.0, 35000.0, 0.0, 900.0, 0.0]),
    ("ACP_SAR", [TWIN, 5000.0, 18000.0, 0.0, 210.0, 10.0]), ("ACP_SAR", [RJ, 34000.0, 35000.0, 0.0, BLANK, 0.0]),
    ("ACP_CRUISE_SPEED", [RJ, 34000.0, 35000.0, 0.0, 0.0, 0.0, "fixed_mach"]),
    ("ACP_CRUISE_SPEED", [RJ, 34000.0, 35000.0, 0.0, 0.0, 0.0, "max_range"]),
    ("ACP_CRUISE_SPEED", [RJ, 34000.0, 35000.0, 5.0, -40.0, 0.0, "Long range"]),
    ("ACP_CRUISE_SPEED", [RJ, 34000.0, 33000.0, 0.0, 0.0, 30.0, "economy"]),
    ("ACP_CRUISE_SPEED", [RJ, 34000.0, 15000.0, 0.0, 0.0, 0.0, "max_endurance"]),
    ("ACP_CRUISE_SPEED", [TWIN, 5000.0, 18000.0, 0.0, 0.0, 0.0, "long_range"]),
    ("ACP_CRUISE_SPEED", [RJ, 34000.0, 35000.0, 0.0, 0.0, 0.0, "fastest"]),
    ("ACP_CRUISE_SPEED", [RJ, 34000.0, 35000.0, 0.0, 0.0, 0.0, 3.0]),
    ("ACP_CRUISE_SPEED", [RJ, 34000.0, 60000.0, 0.0, 0.0, 0.0, "fixed_mach"]),
    ("ACP_CRUISE", [RJ, 34000.0, 35000.0, 0.0, 0.0, 400.0, 0.0, "fixed_mach"]),
    ("ACP_CRUISE", [RJ, 34000.0, 33000.0, 8.0, 30.0, 250.0, 0.0, "long_range"]),
    ("ACP_CRUISE", [RJ, 34000.0, 35000.0, 0.0, 0.0, -400.0, 0.0, "fixed_mach"]),
    ("ACP_CRUISE", [RJ, 34000.0, 35000.0, 0.0, 0.0, 400.0, 0.0, TEXT]),
    ("ACP_BREGUET_RANGE", [450.0, 0.62, 16.0, 40000.0, 34000.0]),
    ("ACP_BREGUET_RANGE", [CAS_COLUMN, 0.6, 15.0, 40000.0, 34000.0]),
    ("ACP_BREGUET_RANGE", [450.0, 0.62, 16.0, 34000.0, 40000.0]),
    # trip fuel
    ("ACP_TRIP_FUEL", [RJ, MISSION["M500"], 30000.0]), ("ACP_TRIP_STATUS", [RJ, MISSION["M500"], 30000.0]),
    ("ACP_TRIP_FUEL", [RJ, MISSION["MWIND"], 31000.0]), ("ACP_TRIP_STATUS", [RJ, MISSION["MWIND"], 31000.0]),
    ("ACP_TRIP_FUEL", [RJ, MISSION["M500"], 36000.0]), ("ACP_TRIP_STATUS", [RJ, MISSION["M500"], 36000.0]),
    ("ACP_TRIP_FUEL", [RJ, MISSION["MSHORT"], 30000.0]), ("ACP_TRIP_STATUS", [RJ, MISSION["MSHORT"], 30000.0]),
    ("ACP_TRIP_FUEL", [RJ, MISSION["MHIGH"], 30000.0]), ("ACP_TRIP_STATUS", [RJ, MISSION["MHIGH"], 30000.0]),
    ("ACP_TRIP_FUEL", [RJ, MISSION["MTEXT"], 30000.0]), ("ACP_TRIP_STATUS", [RJ, MISSION["MTEXT"], 30000.0]),
    ("ACP_TRIP_FUEL", [RJ, MISSION["MBLANK"], 30000.0]), ("ACP_TRIP_STATUS", [RJ, MISSION["MBLANK"], 30000.0]),
    ("ACP_TRIP_FUEL", [RJ, MISSION["MUNKNOWN"], 30000.0]),
    ("ACP_TRIP_FUEL", [RJ, MISSION["MNODIST"], 30000.0]), ("ACP_TRIP_STATUS", [RJ, MISSION["MNODIST"], 30000.0]),
    ("ACP_TRIP_FUEL", [TWIN, MISSION["TWIN300"], 4300.0]),
    ("ACP_TRIP_FUEL", [RJ, MISSION["M500"], TEXT]), ("ACP_TRIP_FUEL", [INCOMPLETE, MISSION["M500"], 30000.0]),
    ("ACP_TRIP_STATUS", [INCOMPLETE, MISSION["M500"], 30000.0]),
    ("ACP_TRIP_FUEL", [RJ, MISSION["MEND"], 31000.0]), ("ACP_TRIP_FUEL", [RJ, MISSION["MEND3000"], 30000.0]),
    ("ACP_TRIP_FUEL", [RJ, MISSION["MENDHIGH"], 30000.0]),
    ("ACP_TRIP_STATUS", [RJ, MISSION["MENDHIGH"], 30000.0]),
    ("ACP_TRIP_STATUS", [RJ, MISSION["M500"], 15000.0]),      # zero-fuel mass below operating empty
    ("ACP_TRIP_FUEL", [LOW_MACH, MISSION["M25000"], 30000.0]),
    ("ACP_TRIP_STATUS", [LOW_MACH, MISSION["M25000"], 30000.0]),   # fixed Mach 0.3 below the stall
    # the six segments: climb, top-of-climb acceleration, cruise, top-of-descent deceleration,
    # descent, deceleration to approach_cas
    ("ACP_TRIP_SEGMENTS", [RJ, MISSION["M500"], 30000.0]),
    ("ACP_TRIP_SEGMENTS", [RJ, MISSION["MWIND"], 31000.0]),
    ("ACP_TRIP_SEGMENTS", [RJ, MISSION["MEND"], 31000.0]),
    ("ACP_TRIP_SEGMENTS", [RJ, MISSION["MEND3000"], 30000.0]),
    ("ACP_TRIP_SEGMENTS", [TWIN, MISSION["TWIN300"], 4300.0]),
    ("ACP_TRIP_SEGMENTS", [RJ, MISSION["M500"], 36000.0]),     # infeasible: #NUM! in every cell
    ("ACP_TRIP_SEGMENTS", [RJ, MISSION["MSHORT"], 30000.0]),
    ("ACP_TRIP_SEGMENTS", [RJ, MISSION["MENDHIGH"], 30000.0]),  # invalid mission: #VALUE!
    ("ACP_TRIP_SEGMENTS", [RJ, MISSION["M500"], BLANK]),
    ("ACP_TRIP_SEGMENTS", [LOW_MACH, MISSION["M25000"], 30000.0]),
]
