#!/usr/bin/python3
"""Recorded cruise points of the invented operator Kestrel Coastal Airways, evaluated
column-wise with pandas and acperf.

The "recorded" points are invented by this script from a seeded random generator
(nothing here is real flight data): pressure altitude in ft, the speed as flown
(Mach at and above FL290, CAS in kt below), outside air temperature in degC, gross
mass in kg and the along-track wind in kt, for the invented RJ-90 of
examples/aircraft/regional_jet.toml. For each point the library gives the true
airspeed, Mach, CAS, the level-flight drag, the fuel flow of the engines delivering
thrust = drag, and the specific air range over the ground. Every acperf call takes
whole pandas Series (no per-row loop here); the results keep the table's index.

    PYTHONPATH=<build>/bindings/python /usr/bin/python3 examples/cruise_points_pandas.py
        [--points N] [--seed S] [--aircraft FILE] [--csv OUT.csv]

Caution: engineering estimates for an invented aircraft, not approved
flight-manual data; operational use defers to the aircraft's approved data, the
operator's approved procedures and the local aviation authority's rules.
"""

import argparse
import sys
import warnings
from pathlib import Path

import numpy as np
import pandas as pd

import acperf
from acperf import units

CAUTION = ("CAUTION: engineering estimates for an invented aircraft and invented data, "
           "not approved flight-manual data.\nOperational use defers to the aircraft's "
           "approved data, the operator's approved procedures and the local aviation "
           "authority's rules.")

AIRCRAFT_FILE = Path(__file__).resolve().parent / "aircraft" / "regional_jet.toml"
MACH_FROM_FT = 29000.0   # the invented recorder logs Mach at and above FL290, CAS below

# Columns of the recorded table (input) and of the evaluated table (output).
RECORDED = ["flight", "pressure_altitude_ft", "mach_recorded", "cas_recorded_kt", "oat_degc",
            "gross_mass_kg", "wind_kt"]
COMPUTED = ["hp_m", "isa_deviation_k", "tas_kt", "mach", "cas_kt", "drag_n", "induced_share",
            "fuel_flow_kg_h", "tsfc_g_kn_s", "sar_nm_per_1000kg"]


def make_cruise_points(n=200, seed=2024):
    """An invented table of n recorded cruise points (seeded, reproducible).

    Index "point" (KCA-00001, ...). Altitudes FL250 to FL370 in 1,000 ft steps,
    Mach 0.70 to 0.79 (at and above FL290) or CAS 250 to 300 kt (below), an ISA
    deviation of -12 to +18 K turned into the OAT a probe would show (rounded to
    1 degC), gross mass 30,000 to 39,000 kg (rounded to 10 kg; at most 36,000 kg
    above FL350 so that the invented jet can hold level flight), wind -60 to +60 kt.
    """
    rng = np.random.default_rng(seed)
    fl = rng.integers(25, 38, n) * 10
    hp_ft = fl * 100.0
    high = hp_ft >= MACH_FROM_FT
    mach = np.where(high, np.round(rng.uniform(0.70, 0.79, n), 3), np.nan)
    cas_kt = np.where(high, np.nan, np.round(rng.uniform(250.0, 300.0, n)))
    dtemp = rng.uniform(-12.0, 18.0, n)
    # The OAT a crew would read: the library's ISA temperature plus the deviation.
    oat_degc = np.round(units.k_to_degc(acperf.outside_air_temperature(dtemp, units.ft_to_m(hp_ft))))
    mass_top = np.where(hp_ft > 35000.0, 36000.0, 39000.0)
    mass = np.round(rng.uniform(30000.0, mass_top) / 10.0) * 10.0
    wind = np.round(rng.uniform(-60.0, 60.0, n))
    flight = np.array([f"KCA {f}" for f in rng.choice([211, 212, 345, 346, 507, 508], n)])
    index = pd.Index([f"KCA-{i:05d}" for i in range(1, n + 1)], name="point")
    return pd.DataFrame({"flight": flight, "pressure_altitude_ft": hp_ft, "mach_recorded": mach,
                         "cas_recorded_kt": cas_kt, "oat_degc": oat_degc,
                         "gross_mass_kg": mass, "wind_kt": wind}, index=index)


def evaluate(points, ac):
    """The recorded table with the COMPUTED columns added, every column computed by
    one acperf call on whole Series. Points the model cannot evaluate (for example
    drag above the maximum-cruise thrust) get NaN and an acperf.AcperfWarning."""
    out = points.copy()
    hp = units.ft_to_m(points["pressure_altitude_ft"])
    dtemp = acperf.isa_deviation(units.degc_to_k(points["oat_degc"]), hp)
    by_mach = points["mach_recorded"].notna()
    by_cas = ~by_mach

    tas = pd.Series(np.nan, index=points.index)
    tas[by_mach] = acperf.mach_to_tas(points.loc[by_mach, "mach_recorded"], hp[by_mach],
                                      dtemp[by_mach])
    tas[by_cas] = acperf.cas_to_tas(units.kt_to_mps(points.loc[by_cas, "cas_recorded_kt"]),
                                    hp[by_cas], dtemp[by_cas])
    mass = points["gross_mass_kg"]
    wind = units.kt_to_mps(points["wind_kt"])

    drag = acperf.drag(ac, mass, hp, dtemp, tas)
    engines = acperf.engine_thrust(ac, drag.total, hp, dtemp, tas)
    sar = acperf.specific_air_range(ac, mass, hp, dtemp, tas, wind)

    out["hp_m"] = hp
    out["isa_deviation_k"] = dtemp
    out["tas_kt"] = units.mps_to_kt(tas)
    out["mach"] = acperf.tas_to_mach(tas, hp, dtemp)
    out["cas_kt"] = units.mps_to_kt(acperf.tas_to_cas(tas, hp, dtemp))
    out["drag_n"] = drag.total
    out["induced_share"] = drag.induced / drag.total
    out["fuel_flow_kg_h"] = engines.fuel_flow * 3600.0
    out["tsfc_g_kn_s"] = engines.tsfc * 1.0e6           # kg/(N s) -> g/(kN s)
    out["sar_nm_per_1000kg"] = units.m_to_nm(sar) * 1000.0
    return out


def summarise(table):
    """Per flight level band: number of points and the means of the main results."""
    band = pd.cut(table["pressure_altitude_ft"], [25000.0, 29000.0, 33000.0, 37000.5],
                  right=False, labels=["FL250-280", "FL290-320", "FL330-370"])
    cols = ["tas_kt", "mach", "drag_n", "fuel_flow_kg_h", "sar_nm_per_1000kg"]
    summary = table.groupby(band, observed=False)[cols].mean()
    summary.insert(0, "points", table.groupby(band, observed=False).size())
    summary.index.name = "band"
    return summary


def main(argv=None):
    parser = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    parser.add_argument("--points", type=int, default=200, help="number of points (200)")
    parser.add_argument("--seed", type=int, default=2024, help="random seed (2024)")
    parser.add_argument("--aircraft", default=str(AIRCRAFT_FILE), help="aircraft file")
    parser.add_argument("--csv", help="write the evaluated table to this CSV file")
    args = parser.parse_args(argv)

    print(CAUTION)
    print()
    ac = acperf.Aircraft.from_file(args.aircraft)
    points = make_cruise_points(args.points, args.seed)
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always", acperf.AcperfWarning)
        table = evaluate(points, ac)
    invalid = int(table["fuel_flow_kg_h"].isna().sum())

    print(f"{ac['name']}: {len(table)} invented recorded cruise points (seed {args.seed}) "
          "of Kestrel Coastal Airways")
    with pd.option_context("display.width", 120, "display.max_columns", 20,
                           "display.precision", 3):
        print()
        print(table[["pressure_altitude_ft", "mach_recorded", "cas_recorded_kt", "oat_degc",
                     "gross_mass_kg", "wind_kt", "tas_kt", "mach", "drag_n",
                     "fuel_flow_kg_h", "sar_nm_per_1000kg"]].head(8).round(
            {"tas_kt": 1, "mach": 3, "drag_n": 0, "fuel_flow_kg_h": 0,
             "sar_nm_per_1000kg": 1}).to_string())
        print()
        print("Means by flight level band:")
        print(summarise(table).round({"tas_kt": 1, "mach": 3, "drag_n": 0,
                                      "fuel_flow_kg_h": 0,
                                      "sar_nm_per_1000kg": 1}).to_string())
    print()
    print(f"points the model could not evaluate: {invalid}"
          + "".join(f"\n  {w.message}" for w in caught))
    print(f"mean fuel flow {table['fuel_flow_kg_h'].mean():.0f} kg/h, "
          f"mean ground SAR {table['sar_nm_per_1000kg'].mean():.1f} NM per 1,000 kg")
    if args.csv:
        table.to_csv(args.csv)
        print(f"table written to {args.csv}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
