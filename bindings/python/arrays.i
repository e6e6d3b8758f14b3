/*
 * numpy arrays onto the library's array forms, keyed by parameter names and
 * constness, so a new `_n` function needs no line here:
 *
 *   size_t n            array length: taken from the input arrays, not passed
 *   const double *name  an input array (1-D, float64, contiguous: anything
 *                       else is converted by numpy.i); None gives NULL, which
 *                       the library reads as "standard value" (dtemp) or as
 *                       "no data" (every point invalid)
 *   double *name        in an array form: an output array of n elements,
 *                       allocated here and returned;
 *                       in a scalar function: an out-pointer, returned as a float
 *   <struct> *out       an output struct of a scalar function, returned as the
 *                       SWIG-wrapped struct (fields under their C names)
 *
 * An array form returns [invalid_count, output, output, ...] in parameter order.
 *
 * How "array form" is told apart at compile time: the `size_t n` parameter
 * declares wrapper-local acpy_array_form and acpy_len, shadowing the
 * file-scope constants below, so the same `double *` typemap allocates an
 * array inside an array form and points at a scalar elsewhere.
 */
%include "numpy.i"

%init %{
  import_array();
%}

%fragment("NumPy_Fragments");

%{
static const int acpy_array_form = 0; /* shadowed inside array forms */
static const size_t acpy_len = 0;     /* shadowed inside array forms */

/* A 1-D contiguous float64 view or copy of obj; checks the length against
   *len (set from the first array). New reference in *owner, NULL on error. */
static double *acpy_input(PyObject *obj, const char *name, size_t *len, PyObject **owner) {
  int is_new = 0;
  PyArrayObject *a = obj_to_array_contiguous_allow_conversion(obj, NPY_DOUBLE, &is_new);
  *owner = NULL;
  if (!a) return NULL;
  if (!is_new) Py_INCREF(a);
  *owner = (PyObject *)a;
  if (PyArray_NDIM(a) != 1) {
    PyErr_Format(PyExc_ValueError, "%s: expected a 1-D array, got %d dimensions", name,
                 PyArray_NDIM(a));
    return NULL;
  }
  const size_t size = (size_t)PyArray_DIM(a, 0);
  if (*len == (size_t)-1) {
    *len = size;
  } else if (*len != size) {
    PyErr_Format(PyExc_ValueError, "%s: %zu elements where the other inputs have %zu", name,
                 size, *len);
    return NULL;
  }
  return (double *)PyArray_DATA(a);
}

/* A new float64 array of len elements. */
static double *acpy_output(size_t len, PyObject **owner) {
  npy_intp dims[1] = {(npy_intp)len};
  *owner = PyArray_SimpleNew(1, dims, NPY_DOUBLE);
  return *owner ? (double *)PyArray_DATA((PyArrayObject *)*owner) : NULL;
}
%}

/* ---- array length ------------------------------------------------------- */
%typemap(arginit, noblock=1) size_t n {
  int acpy_array_form = 1;
  size_t acpy_len = (size_t)-1;
  (void)acpy_array_form;
}
%typemap(in, numinputs=0) size_t n ""
%typemap(check) size_t n {
  if (acpy_len == (size_t)-1) {
    PyErr_SetString(PyExc_ValueError, "$symname: no input array given");
    SWIG_fail;
  }
  $1 = acpy_len;
}

/* ---- input arrays ------------------------------------------------------- */
%typemap(in) const double * (PyObject *owner = NULL) {
  if ($input == Py_None) {
    $1 = NULL;
  } else {
    $1 = acpy_input($input, "$symname: $1_name", &acpy_len, &owner);
    if (!$1) SWIG_fail;
  }
}
%typemap(freearg) const double * { Py_XDECREF(owner$argnum); }
/* Inputs have no check or argout step (else the double * ones below would apply). */
%typemap(check) const double * ""
%typemap(argout) const double * ""
%typemap(typecheck, precedence=SWIG_TYPECHECK_DOUBLE_ARRAY) const double * "$1 = 1;"

/* ---- outputs: array (array form) or scalar out-pointer ------------------ */
%typemap(in, numinputs=0) double * (double value = NAN, PyObject *owner = NULL) {
  $1 = &value;
}
%typemap(check) double * {
  if (acpy_array_form) {
    $1 = acpy_output(acpy_len, &owner$argnum);
    if (!$1) SWIG_fail;
  }
}
%typemap(argout) double * {
  if (acpy_array_form) {
    $result = SWIG_Python_AppendOutput($result, owner$argnum);
    owner$argnum = NULL;
  } else {
    $result = SWIG_Python_AppendOutput($result, PyFloat_FromDouble(value$argnum));
  }
}
%typemap(freearg) double * { Py_XDECREF(owner$argnum); }

/* The count of invalid points of an array form: the first element of its result. */
%typemap(out) size_t {
  $result = PyList_New(1);
  if (!$result) SWIG_fail;
  PyList_SET_ITEM($result, 0, PyLong_FromSize_t($1));
}

/* ---- output structs of scalar functions --------------------------------- */
%typemap(in, numinputs=0) SWIGTYPE *out ($*1_ltype value) { $1 = &value; }
%typemap(argout) SWIGTYPE *out {
  $*1_ltype *copy = ($*1_ltype *)malloc(sizeof *copy);
  if (!copy) { PyErr_NoMemory(); SWIG_fail; }
  *copy = value$argnum;
  $result = SWIG_Python_AppendOutput($result,
                                     SWIG_NewPointerObj(copy, $1_descriptor, SWIG_POINTER_OWN));
}

/* ---- traces: (size_t capacity, <struct of doubles> *points, size_t *count) ----
   The Python argument is the capacity; the result is a float64 array of shape
   (count, fields), the points' fields in struct order (the structs are all
   doubles, so their memory is that array). */
%define ACPY_TRACE(TYPE)
%typemap(in) (size_t capacity, TYPE *points, size_t *count)
    (size_t count_value = 0, PyObject *owner = NULL) {
  const long cap = PyLong_AsLong($input);
  if (cap < 0 || cap > 10000000) {
    if (!PyErr_Occurred()) PyErr_SetString(PyExc_ValueError, "capacity must be 0 to 1e7");
    SWIG_fail;
  }
  npy_intp dims[2] = {cap, (npy_intp)(sizeof(TYPE) / sizeof(double))};
  owner = PyArray_SimpleNew(2, dims, NPY_DOUBLE);
  if (!owner) SWIG_fail;
  $1 = (size_t)cap;
  $2 = (TYPE *)PyArray_DATA((PyArrayObject *)owner);
  $3 = &count_value;
}
%typemap(argout) (size_t capacity, TYPE *points, size_t *count) {
  PyObject *used = PySequence_GetSlice(owner$argnum, 0, (Py_ssize_t)count_value$argnum);
  if (!used) SWIG_fail;
  $result = SWIG_Python_AppendOutput($result, used);
}
%typemap(freearg) (size_t capacity, TYPE *points, size_t *count) { Py_XDECREF(owner$argnum); }
%enddef

/* ---- enum-valued int parameters (rating, mode, end): any whole real number ----
   The Python layer passes floats (broadcast arrays are float64); a value that
   is not a whole number becomes -1, which the C function refuses as invalid. */
%typemap(in) int rating, int mode, int end {
  const double v = PyFloat_AsDouble($input);
  if (v == -1.0 && PyErr_Occurred()) SWIG_fail; /* not a real number: TypeError */
  /* NaN, Inf or a fraction is no enum value: -1, which the C function refuses */
  $1 = (isfinite(v) && v == floor(v) && fabs(v) < 1.0e9) ? (int)v : -1;
}
%typemap(typecheck, precedence=SWIG_TYPECHECK_INTEGER) int rating, int mode, int end "$1 = 1;"

/* ---- tables: (size_t n_X, const double *X) inputs of their own lengths, and
   `table_*` outputs of n_mass x n_hp x n_dtemp elements (acp_climb_table) ---- */
%define ACPY_SIZED_INPUT(N, NAME)
%typemap(in) (size_t N, const double *NAME) (PyObject *owner = NULL, size_t len = (size_t)-1) {
  $2 = acpy_input($input, "$symname: NAME", &len, &owner);
  if (!$2) SWIG_fail;
  $1 = len;
}
%typemap(freearg) (size_t N, const double *NAME) { Py_XDECREF(owner$argnum); }
%enddef
ACPY_SIZED_INPUT(n_mass, mass)
ACPY_SIZED_INPUT(n_hp, hp_end)
ACPY_SIZED_INPUT(n_dtemp, dtemp)

%define ACPY_TABLE_OUTPUT(NAME)
%typemap(in, numinputs=0) double *NAME (PyObject *owner = NULL) { $1 = NULL; }
%typemap(check) double *NAME {
  /* the three sized inputs come first: arg5 n_mass, arg7 n_hp, arg9 n_dtemp */
  $1 = acpy_output(arg5 * arg7 * arg9, &owner$argnum);
  if (!$1) SWIG_fail;
}
%typemap(argout) double *NAME {
  $result = SWIG_Python_AppendOutput($result, owner$argnum);
  owner$argnum = NULL;
}
%typemap(freearg) double *NAME { Py_XDECREF(owner$argnum); }
%enddef
ACPY_TABLE_OUTPUT(table_time)
ACPY_TABLE_OUTPUT(table_distance)
ACPY_TABLE_OUTPUT(table_fuel)
