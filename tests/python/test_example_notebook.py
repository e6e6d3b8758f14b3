"""The example notebook examples/notebooks/kestrel_drag_and_range.ipynb, run headless.

The committed notebook must carry no outputs. It is executed with nbclient in a
python3 (ipykernel) kernel that inherits this process's environment (ctest sets
PYTHONPATH to the binding's build tree), matplotlib on the Agg backend; any cell
that raises fails the test. A check cell appended to the executed copy (never to
the committed file) reports the notebook's own variables as JSON: its key figures
must equal direct calls of the binding with the same inputs (relative 1e-12, the
same library on the same inputs), its what-if variants must differ from the
aircraft as flown in the expected direction, and it must have drawn its figures.
"""

import json
import math
import os
from pathlib import Path

import pytest

try:
    import nbformat
    from nbclient import NotebookClient
except ImportError as exc:  # a missing package is a failure with its name, not a skip
    raise ImportError("the notebook test needs Debian's python3-nbclient, python3-nbformat, "
                      "python3-ipykernel and python3-matplotlib") from exc

import acperf
from acperf import units

ROOT = Path(__file__).resolve().parents[2]
NOTEBOOK = ROOT / "examples" / "notebooks" / "kestrel_drag_and_range.ipynb"
AIRCRAFT = ROOT / "examples" / "aircraft" / "regional_jet.toml"
MARK = "ACPERF_NOTEBOOK_CHECK "
FIGURES = 6  # drag by origin, components, variants, climb, SAR, trip by level

CHECK_CELL = """
import json, matplotlib, matplotlib.pyplot as plt
print(%r + json.dumps({
    "backend": matplotlib.get_backend(),
    "figures": len(plt.get_fignums()),
    "axes_with_data": sum(1 for n in plt.get_fignums() for a in plt.figure(n).axes
                          if a.lines or a.collections or a.patches),
    "MASS": MASS, "HP": HP, "DTEMP": DTEMP, "CLIMB_MASS": CLIMB_MASS,
    "ZERO_FUEL_MASS": ZERO_FUEL_MASS, "SAR_MASSES": list(SAR_MASSES),
    "winglet_height_as_flown": ac["winglet_height"],
    "key_figures": key_figures,
    "what_if": what_if.to_dict(orient="index"),
    "phases": [[i] + [float(x) for x in row] for i, row in zip(phases.index, phases.values)],
    "phases_columns": list(phases.columns),
}))
""" % MARK


def close(got, want, rel=1e-12):
    return math.isfinite(got) and abs(got - want) <= rel * abs(want)


@pytest.fixture(scope="module")
def executed():
    nb = nbformat.read(NOTEBOOK, as_version=4)
    nb.cells.append(nbformat.v4.new_code_cell(CHECK_CELL))
    os.environ["MPLBACKEND"] = "Agg"                     # headless, read by the kernel
    os.environ["PYDEVD_DISABLE_FILE_VALIDATION"] = "1"   # quiet ipykernel's debugger
    client = NotebookClient(nb, timeout=60, kernel_name="python3",
                            resources={"metadata": {"path": str(NOTEBOOK.parent)}})
    client.execute()   # raises CellExecutionError naming the cell when any cell fails
    return nb


@pytest.fixture(scope="module")
def report(executed):
    text = "".join(o.get("text", "") for o in executed.cells[-1].outputs
                   if o.output_type == "stream")
    lines = [ln for ln in text.splitlines() if ln.startswith(MARK)]
    assert len(lines) == 1, text
    return json.loads(lines[0][len(MARK):])


def test_committed_notebook_is_clean():
    nb = nbformat.read(NOTEBOOK, as_version=4)
    nbformat.validate(nb)
    assert nb.metadata.kernelspec.name == "python3"
    code = [c for c in nb.cells if c.cell_type == "code"]
    assert len(code) >= 10
    for c in code:
        assert c.outputs == [] and c.execution_count is None, c.source[:60]
    first = nb.cells[0]
    assert first.cell_type == "markdown"
    text = " ".join(first.source.replace(">", " ").split())
    for words in ("Caution", "engineering estimate", "not approved flight-manual",
                  "approved procedures", "local aviation authority", "invented"):
        assert words in text, words


def test_every_cell_ran_without_error(executed):
    for c in executed.cells:
        if c.cell_type != "code":
            continue
        assert c.execution_count is not None
        for o in c.outputs:
            assert o.output_type != "error", o
            assert not (o.output_type == "stream" and o.name == "stderr"
                        and "Traceback" in o.text), o.text


def test_figures_drawn_headless(report):
    assert report["backend"].lower() == "agg"
    assert report["figures"] == FIGURES
    assert report["axes_with_data"] >= FIGURES


def test_key_figures_match_the_binding(report):
    ac = acperf.Aircraft.from_file(AIRCRAFT)
    k = report["key_figures"]
    mass, hp, dtemp = report["MASS"], report["HP"], report["DTEMP"]
    assert hp == units.ft_to_m(35000.0) and dtemp == 0.0

    spd = acperf.speeds(ac, mass, hp, dtemp)
    assert close(k["VMD (kt TAS)"], units.mps_to_kt(spd.vmd))
    assert close(k["VMR (kt TAS)"], units.mps_to_kt(spd.vmr))
    assert close(k["L/D max"], spd.ld_max)

    climb = acperf.climb(ac, report["CLIMB_MASS"], units.ft_to_m(1500.0), hp)
    assert close(k["climb time to FL350 (min)"], climb.time / 60.0)
    assert close(k["climb fuel to FL350 (kg)"], climb.fuel)

    best = acperf.cruise_speed(ac, acperf.CRUISE_MAX_RANGE, 0.0, mass, hp, dtemp)
    assert mass in report["SAR_MASSES"]
    assert close(k["max-range Mach at 36,000 kg"], best.mach)

    mission = acperf.Mission(distance=units.nm_to_m(500.0), cruise_altitude=hp)
    trip = acperf.trip_for_zero_fuel_mass(ac, mission, report["ZERO_FUEL_MASS"])
    assert close(k["500 NM trip fuel (kg)"], trip.trip_fuel)
    assert close(k["500 NM block fuel (kg)"], trip.block_fuel)


# The trip's segments in flight order, as acperf/mission.h lists them in acp_trip_result.
SEGMENTS = ("climb", "climb_acceleration", "cruise", "descent_deceleration", "descent",
            "approach_deceleration")


def test_trip_table_is_the_six_segments_and_sums_to_the_trip(report):
    """Each row of the notebook's trip table is one segment of a direct binding call
    (1e-12); the sum row is the trip by bookkeeping (mission.h: trip fuel = the sum of
    the six segments' fuel = take-off mass - landing mass), to 1e-9 for the rounding of
    six sums; the segments' distances make up the 500 NM to 1 m."""
    assert report["phases_columns"] == ["time (min)", "distance (NM)", "fuel (kg)"]
    rows = report["phases"]
    assert len(rows) == len(SEGMENTS) + 1 and rows[-1][0] == "trip"
    ac = acperf.Aircraft.from_file(AIRCRAFT)
    mission = acperf.Mission(distance=units.nm_to_m(500.0), cruise_altitude=report["HP"])
    trip = acperf.trip_for_zero_fuel_mass(ac, mission, report["ZERO_FUEL_MASS"])
    for (label, t, d, f), seg in zip(rows, SEGMENTS):   # close() takes 0 == 0 as well
        assert close(t, getattr(trip, seg + "_time") / 60.0), label
        assert close(d, units.m_to_nm(getattr(trip, seg + "_distance"))), label
        assert close(f, getattr(trip, seg + "_fuel")), label
    # the speed changes are flown on this sector (approach_cas is set on the demo jet)
    assert rows[1][3] > 0.0 and rows[5][3] > 0.0
    _, time, distance, fuel = rows[-1]
    assert close(fuel, trip.trip_fuel, 1e-9)
    assert close(fuel, trip.takeoff_mass - trip.landing_mass, 1e-9)
    assert close(time, trip.trip_time / 60.0, 1e-9)
    # the top of descent settles when the segments cover the distance to 1 m
    # (docs/methods/trip.md, "Bookkeeping")
    assert abs(units.nm_to_m(distance) - units.nm_to_m(500.0)) <= 1.0


def test_what_if_variants_changed_the_copies_only(report):
    w = report["what_if"]
    base = w["as flown"]
    assert report["winglet_height_as_flown"] == 0.9   # the original model untouched
    assert w["bigger winglets"]["L/D max"] > base["L/D max"] > w["no winglets"]["L/D max"]
    assert w["weathered skin"]["L/D max"] < base["L/D max"]
    assert w["weathered skin"]["drag at M 0.78 (N)"] > base["drag at M 0.78 (N)"]
    assert w["nacelle fairing"]["drag at M 0.78 (N)"] < base["drag at M 0.78 (N)"]
    assert base["drag change (%)"] == 0.0
    # the table's L/D max of the winglet variant is the binding's, on a model with 1.8 m
    ac = acperf.Aircraft.from_file(AIRCRAFT)
    ac["winglet_height"] = 1.8
    s = acperf.speeds(ac, report["MASS"], report["HP"], report["DTEMP"])
    assert close(report["key_figures"]["L/D max, bigger winglets"], s.ld_max)
