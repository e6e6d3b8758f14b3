/*
 * SWIG interface of libacperf for Python: the extension module acperf._capi
 * and its generated shim acperf.capi ("the C API as SWIG sees it").
 *
 * What this layer does, and nothing more:
 *  - wraps every declaration of the public headers under its C name;
 *  - turns status codes and NaN results of scalar calls into acperf.AcperfError;
 *  - maps the array forms (suffix _n) onto numpy arrays (arrays.i);
 *  - returns out-pointers and output structs as Python values.
 * The Pythonic names, broadcasting, pandas and warnings live in the pure
 * Python package (bindings/python/acperf). Physics lives only in libacperf.
 *
 * Built with -builtin (fast scalar calls) and -doxygen (docstrings from the
 * header comments, written once).
 */
%module(package="acperf") capi

%{
#define SWIG_FILE_WITH_INIT
#include "acperf.h"
%}

%include "errors.i"
%include "arrays.i"

/* Export macros are for the compiler, not for SWIG. */
#define ACP_API
#define ACP_BEGIN_DECLS
#define ACP_END_DECLS

/* Plain returns: the version, the status text. */
%include "acperf/version.h"
%include "acperf/status.h"

/* From here on an int return is a status: non-zero raises AcperfError. */
%apply int ACPY_STATUS { int };

/* Unit helpers never fail: NaN in gives NaN out, as IEEE arithmetic does. */
%include "acperf/units.h"

/* From here on a double return of NaN is a failed call and raises AcperfError. */
%apply double ACPY_CHECKED { double };

%include "acperf/atmosphere.h"
%include "acperf/airspeed.h"
%include "acperf/friction.h"
%include "acperf/aircraft.h"
%include "acperf/polar.h"
%include "acperf/speeds.h"
%include "acperf/schedule.h"
%include "acperf/propulsion.h"
ACPY_TRACE(acp_profile_point)
%include "acperf/climb.h"
ACPY_TRACE(acp_cruise_point)
%include "acperf/cruise.h"
/* A trip that fails still says why (infeasible, excess: acperf/mission.h): the
   exception carries a copy of the output struct as its `result` attribute. */
%{
static void acpy_attach_result(PyObject *value) {
  PyObject *type, *exc, *tb;
  if (!value) return;
  PyErr_Fetch(&type, &exc, &tb);
  PyErr_NormalizeException(&type, &exc, &tb);
  if (exc && PyObject_SetAttrString(exc, "result", value) < 0) PyErr_Clear();
  Py_DECREF(value);
  PyErr_Restore(type, exc, tb);
}
%}
%typemap(out) int acp_trip, int acp_trip_for_zero_fuel_mass {
  if ($1 != ACP_OK) {
    acp_trip_result *acpy_copy = (acp_trip_result *)malloc(sizeof *acpy_copy);
    acpy_raise_call_detail("$symname", args, $1, acpy_detail);
    if (acpy_copy) {
      *acpy_copy = *arg4;
      acpy_attach_result(SWIG_NewPointerObj(SWIG_as_voidptr(acpy_copy),
                                            SWIGTYPE_p_acp_trip_result, SWIG_POINTER_OWN));
    }
    SWIG_fail;
  }
  $result = SWIG_Py_Void();
}
%include "acperf/mission.h"
