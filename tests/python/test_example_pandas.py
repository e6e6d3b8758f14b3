"""The pandas example examples/cruise_points_pandas.py.

It is run as a program (exit status, the caution first, the summary) and imported
as a module: its invented table is reproducible from the seed, and every column
it computes on whole Series must equal the binding's scalar calls on the same row
(relative 1e-12: the array kernels agree with the scalar functions to 1e-14),
whatever the order of the rows. A point the model cannot fly gives NaN and a
warning, never a number, and leaves the other rows as they were.
"""

import importlib.util
import math
import os
import subprocess
import sys
import warnings
from pathlib import Path

import numpy as np
import pandas as pd
import pytest

import acperf
from acperf import units

ROOT = Path(__file__).resolve().parents[2]
SCRIPT = ROOT / "examples" / "cruise_points_pandas.py"
AIRCRAFT = ROOT / "examples" / "aircraft" / "regional_jet.toml"


def load_example():
    spec = importlib.util.spec_from_file_location("cruise_points_pandas", SCRIPT)
    module = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(module)
    return module


ex = load_example()


@pytest.fixture(scope="module")
def ac():
    return acperf.Aircraft.from_file(AIRCRAFT)


@pytest.fixture(scope="module")
def table(ac):
    with warnings.catch_warnings():
        warnings.simplefilter("error", acperf.AcperfWarning)  # the default data all valid
        return ex.evaluate(ex.make_cruise_points(120, seed=11), ac)


def rel_close(got, want, rel=1e-12):
    return math.isfinite(got) and abs(got - want) <= rel * abs(want)


def scalar_row(ac, row):
    """The example's columns for one row, from scalar calls of the binding."""
    hp = units.ft_to_m(float(row["pressure_altitude_ft"]))
    dtemp = acperf.isa_deviation(units.degc_to_k(float(row["oat_degc"])), hp)
    if not math.isnan(row["mach_recorded"]):
        tas = acperf.mach_to_tas(float(row["mach_recorded"]), hp, dtemp)
    else:
        tas = acperf.cas_to_tas(units.kt_to_mps(float(row["cas_recorded_kt"])), hp, dtemp)
    mass = float(row["gross_mass_kg"])
    drag = acperf.drag(ac, mass, hp, dtemp, tas)
    engines = acperf.engine_thrust(ac, drag.total, hp, dtemp, tas)
    sar = acperf.specific_air_range(ac, mass, hp, dtemp, tas, units.kt_to_mps(float(row["wind_kt"])))
    return {"hp_m": hp, "isa_deviation_k": dtemp, "tas_kt": units.mps_to_kt(tas),
            "mach": acperf.tas_to_mach(tas, hp, dtemp),
            "cas_kt": units.mps_to_kt(acperf.tas_to_cas(tas, hp, dtemp)),
            "drag_n": drag.total, "induced_share": drag.induced / drag.total,
            "fuel_flow_kg_h": engines.fuel_flow * 3600.0, "tsfc_g_kn_s": engines.tsfc * 1e6,
            "sar_nm_per_1000kg": units.m_to_nm(sar) * 1000.0}


def test_program_output():
    env = dict(os.environ, PYTHONDONTWRITEBYTECODE="1")
    run = subprocess.run([sys.executable, str(SCRIPT), "--points", "150", "--seed", "5"],
                         capture_output=True, text=True, env=env, timeout=60)
    assert run.returncode == 0, run.stderr
    lines = run.stdout.splitlines()
    assert lines[0].startswith("CAUTION: engineering estimates")
    assert "not approved flight-manual data" in lines[0]
    assert "local aviation authority" in lines[1]
    assert "150 invented recorded cruise points (seed 5)" in run.stdout
    assert "Means by flight level band:" in run.stdout
    for band in ("FL250-280", "FL290-320", "FL330-370"):
        assert band in run.stdout
    assert "points the model could not evaluate: 0" in run.stdout
    assert run.stderr == ""


def test_invented_table_is_reproducible():
    a = ex.make_cruise_points(80, seed=3)
    pd.testing.assert_frame_equal(a, ex.make_cruise_points(80, seed=3))
    assert not a.equals(ex.make_cruise_points(80, seed=4))
    assert list(a.columns) == ex.RECORDED and a.index.is_unique and len(a) == 80
    # Mach recorded at and above FL290, CAS below, never both
    high = a["pressure_altitude_ft"] >= ex.MACH_FROM_FT
    assert a.loc[high, "mach_recorded"].notna().all() and a.loc[high, "cas_recorded_kt"].isna().all()
    assert a.loc[~high, "cas_recorded_kt"].notna().all() and a.loc[~high, "mach_recorded"].isna().all()
    assert a["pressure_altitude_ft"].between(25000, 37000).all()
    assert a["gross_mass_kg"].between(30000, 39000).all()


def test_columns_equal_scalar_calls(ac, table):
    assert list(table.columns) == ex.RECORDED + ex.COMPUTED
    assert table[ex.COMPUTED].notna().all().all()
    by_mach = table[table["mach_recorded"].notna()]
    by_cas = table[table["mach_recorded"].isna()]
    rows = list(by_mach.index[:4]) + list(by_cas.index[:4]) + [table.index[-1]]
    for point in rows:
        want = scalar_row(ac, table.loc[point])
        for col, value in want.items():
            assert rel_close(table.loc[point, col], value), (point, col, table.loc[point, col], value)


def test_recorded_speed_comes_back(table):
    # TAS from the recorded Mach or CAS, then Mach and CAS from that TAS: the inverses agree
    m = table["mach_recorded"].notna()
    assert np.allclose(table.loc[m, "mach"], table.loc[m, "mach_recorded"], rtol=1e-12, atol=0)
    assert np.allclose(table.loc[~m, "cas_kt"], table.loc[~m, "cas_recorded_kt"], rtol=1e-9, atol=0)


def test_row_order_does_not_matter(ac, table):
    shuffled = ex.make_cruise_points(120, seed=11).sample(frac=1.0, random_state=1)
    again = ex.evaluate(shuffled, ac)
    assert list(again.index) == list(shuffled.index)
    pd.testing.assert_frame_equal(again.loc[table.index], table, check_exact=False, rtol=1e-12)


def test_point_the_model_cannot_fly_is_nan(ac):
    points = ex.make_cruise_points(10, seed=2)
    bad = points.index[4]
    points.loc[bad, ["pressure_altitude_ft", "mach_recorded", "cas_recorded_kt",
                     "gross_mass_kg"]] = [37000.0, 0.82, np.nan, 60000.0]
    with pytest.warns(acperf.AcperfWarning):
        out = ex.evaluate(points, ac)
    assert math.isnan(out.loc[bad, "fuel_flow_kg_h"]) and math.isnan(out.loc[bad, "sar_nm_per_1000kg"])
    good = out.drop(index=bad)
    assert good[ex.COMPUTED].notna().all().all()
    for point in good.index[:3]:
        assert rel_close(good.loc[point, "fuel_flow_kg_h"],
                         scalar_row(ac, good.loc[point])["fuel_flow_kg_h"])
