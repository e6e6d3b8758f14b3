"""Shapes, dtypes, pandas and errors of the Pythonic layer.

Reference for the values: the binding's own scalar path (one C call per point,
itself checked against ctypes in test_binding_api.py), so these tests check
only the conversion of shapes, dtypes and errors, which is all a binding does.
"""

import warnings

import numpy as np
import pandas as pd
import pytest

import acperf
from acperf import units


def assert_matches(got, want):
    """Array path against scalar results: equal to the vectorised kernels' rounding
    (1e-14 relative, docs/performance.md), NaN where NaN."""
    np.testing.assert_allclose(got, want, rtol=1e-14, atol=0.0, equal_nan=True)


def scalar_map(fn, *cols):
    """fn applied point by point through the scalar path (NaN where it raises)."""
    cols = np.broadcast_arrays(*[np.asarray(c, dtype=float) for c in cols])
    out = np.empty(cols[0].shape)
    for idx in np.ndindex(out.shape):
        try:
            out[idx] = fn(*(float(c[idx]) for c in cols))
        except acperf.AcperfError:
            out[idx] = np.nan
    return out


def test_scalar_in_float_out():
    m = acperf.cas_to_mach(150.0, 3000.0)
    assert type(m) is float
    assert type(acperf.cas_to_mach(150, 3000)) is float  # Python ints
    atm = acperf.isa(11000.0)
    assert all(type(v) is float for v in atm)
    assert atm.temperature == atm[0]


def test_lists_and_broadcasting():
    cas = [100.0, 150.0, 200.0]
    hp = np.array([[0.0], [5000.0]])  # (2, 1) against (3,) -> (2, 3)
    got = acperf.cas_to_tas(cas, hp, 10.0)
    assert got.shape == (2, 3)
    assert_matches(got, scalar_map(lambda c, h: acperf.cas_to_tas(c, h, 10.0),
                                                  cas, hp))
    # dtemp broadcast as an array too
    dtemp = np.array([-10.0, 0.0, 10.0])
    got = acperf.cas_to_tas(150.0, 5000.0, dtemp)
    assert_matches(got, [acperf.cas_to_tas(150.0, 5000.0, d) for d in dtemp])


def test_mismatched_shapes_raise():
    with pytest.raises(ValueError):
        acperf.cas_to_mach([1.0, 2.0, 3.0], [0.0, 1000.0])


@pytest.mark.parametrize("dtype", [np.float32, np.int32, np.int64, np.float64, np.float16])
def test_dtypes(dtype):
    cas = np.array([60, 120, 180, 240], dtype=dtype)
    got = acperf.cas_to_mach(cas, 2000)
    assert got.dtype == np.float64
    want = [acperf.cas_to_mach(float(c), 2000.0) for c in cas]
    assert_matches(got, want)


def test_numpy_scalars_take_the_scalar_path():
    assert type(acperf.cas_to_mach(np.float32(120.0), np.int64(1000))) is float
    assert acperf.cas_to_mach(np.float32(120.0), 1000.0) == acperf.cas_to_mach(120.0, 1000.0)
    with pytest.raises(acperf.AcperfError):
        acperf.cas_to_mach(np.float32(120.0), np.float64(1e6))  # 0-d input: an exception
    assert type(acperf.isa(np.array(1000.0)).density) is float


def test_non_contiguous_slices():
    base = np.linspace(0.0, 40000.0, 101)
    hp = base[::3]                 # strided view
    hp2d = np.linspace(0, 12000, 24).reshape(4, 6).T  # Fortran-ordered view
    for h in (hp, hp2d, base[::-1]):
        atm = acperf.isa(h)
        assert atm.pressure.shape == h.shape
        assert_matches(atm.pressure, scalar_map(acperf.isa_pressure, h))
    assert hp[0] == 0.0 and base[3] == hp[1]  # inputs untouched


def test_pandas_series_in_series_out():
    idx = pd.Index(["p1", "p2", "p3"], name="point")
    cas = pd.Series([120.0, 140.0, 160.0], index=idx, name="cas")
    hp = pd.Series([3000.0, 6000.0, 9000.0], index=idx)
    mach = acperf.cas_to_mach(cas, hp)
    assert isinstance(mach, pd.Series) and mach.index.equals(idx)
    assert_matches(mach.to_numpy(), scalar_map(acperf.cas_to_mach, cas, hp))
    atm = acperf.isa(hp, 5.0)
    assert isinstance(atm.density, pd.Series) and atm.density.name == "density"
    frame = atm.to_frame()
    assert list(frame.columns) == list(acperf.Atmos._fields) and frame.index.equals(idx)
    df = pd.DataFrame({"hp": [0.0, 1000.0]})
    df = df.assign(**acperf.isa(df["hp"]).to_dict())
    assert df["temperature"].tolist() == [288.15, 281.65]


def test_scalar_errors_raise_with_status_text():
    with pytest.raises(acperf.AcperfError) as err:
        acperf.isa(90000.0)
    assert isinstance(err.value, ValueError)
    assert err.value.status == acperf.capi.ACP_ERR_RANGE
    assert acperf.strerror(acperf.capi.ACP_ERR_RANGE) in str(err.value)
    with pytest.raises(acperf.AcperfError) as err:
        acperf.isa(float("nan"))
    assert err.value.status == acperf.capi.ACP_ERR_INVALID
    with pytest.raises(acperf.AcperfError) as err:
        units.to_si(1.0, "furlong")
    assert err.value.status == acperf.capi.ACP_ERR_UNKNOWN_KEY
    with pytest.raises(acperf.AcperfError, match="acp_cas_to_mach"):
        acperf.cas_to_mach(-5.0, 0.0)


def test_array_errors_give_nan_and_warn():
    hp = np.array([0.0, 90000.0, np.nan, 1000.0])
    with pytest.warns(acperf.AcperfWarning, match="isa: 2 of 4 points invalid"):
        atm = acperf.isa(hp)
    assert np.isnan(atm.temperature[[1, 2]]).all()
    assert np.isfinite(atm.temperature[[0, 3]]).all()
    # functions without a C array form behave the same
    with pytest.warns(acperf.AcperfWarning, match="crossover_altitude: 1 of 2"):
        hx = acperf.crossover_altitude([150.0, -1.0], 0.8)
    assert np.isfinite(hx[0]) and np.isnan(hx[1])
    # and valid arrays raise no warning at all
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        acperf.isa([0.0, 1000.0])


def test_bad_argument_types():
    with pytest.raises(TypeError):
        acperf.cas_to_mach("fast", 1000.0)
    with pytest.raises(TypeError):
        acperf.cas_to_mach(None, 1000.0)
    with pytest.raises(TypeError):
        acperf.cas_to_mach(100.0)  # missing argument


def test_keywords_and_defaults():
    assert acperf.cas_to_tas(cas=150.0, hp=3000.0) == acperf.cas_to_tas(150.0, 3000.0, 0.0)
    assert acperf.isa(hp=2000.0, dtemp=5.0) == acperf.isa(2000.0, 5.0)


def test_units_arrays_match_c_bit_for_bit():
    x = np.array([-1234.5, 0.0, 1.0, 35000.0, 1e-7, 3.3e5])
    for name in units.__all__:
        fn = getattr(units, name)
        if not hasattr(fn, "c_function"):
            continue
        cfn = getattr(acperf.capi, fn.c_function)
        np.testing.assert_array_equal(fn(x), [cfn(float(v)) for v in x], err_msg=name)
        assert type(fn(1.0)) is float
    s = pd.Series([1.0, 2.0], name="alt_ft")
    assert units.ft_to_m(s).name == "alt_ft"
    np.testing.assert_array_equal(units.to_si(x, "kt"), [units.to_si(float(v), "kt") for v in x])


def test_unit_constants_are_exact():
    # International foot and nautical mile (1959 agreement; 1929 conference), knot = NM/h.
    assert units.FT == 0.3048 and units.NM == 1852.0 and units.KT == 1852.0 / 3600.0
    assert units.ft_to_m(1000.0) == 304.8
