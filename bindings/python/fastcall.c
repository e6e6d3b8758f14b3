/*
 * acperf._fast: the scalar fast path of the Pythonic functions.
 *
 * A `acperf._fast.function` is a callable C object that stands for one public
 * function of the package (acperf.cas_to_mach, acperf.drag, ...). Called with
 * scalars only, by position or by keyword: Python floats or ints for the
 * numbers (what SWIG's double typemap accepts: float, int and their subclasses
 * such as numpy.float64 and bool; enum parameters such as `rating` as arrays.i
 * takes them) and acperf.Aircraft / acperf.Mission objects for the models, it
 * converts them, calls the C function through a one-line trampoline (generated
 * from the headers by gen_fastcall.py into fastcall_table.h) and returns a
 * float or the named result of the Python layer, its coded fields (the `codes`
 * given by _core.py from the result type) as the IntEnum members the Python
 * path gives. Any other call (arrays, lists,
 * Series, numpy integer scalars, raw SWIG handles, unknown or repeated
 * keywords, wrong argument counts, ints too large for a double) goes, unchanged,
 * to the Python function it was made from (`__wrapped__`), which has the array
 * path and the argument errors. No Python frame runs on the fast path.
 *
 * Models: acperf.Aircraft and acperf.Mission derive from `acperf._fast.model`,
 * which holds the C address of their SWIG handle (set by `_attach`, cleared by
 * `_detach` before the handle is freed) and its kind ('A' or 'M'), so a model
 * argument costs a type check and a load.
 *
 * A failed call raises acperf.AcperfError with the message and `status` the
 * SWIG layer gives (errors.i: "<C name><arguments>: <status text>"; the
 * arguments as SWIG saw them, so the defaults filled in by the Python layer are
 * shown too). Nothing here computes: physics lives in libacperf.
 */
#define PY_SSIZE_T_CLEAN
#include <Python.h>
#include <structmember.h>
#include <math.h>
#include <stddef.h>
#include <time.h>

#include "acperf.h"

enum { ACPF_PLAIN, ACPF_NAN, ACPF_STATUS };
#define ACPF_MAX_IN 16
#define ACPF_MAX_OUT 48
/* Named results kept for refilling: two, so that a loop that stores each result
   in the same variable (r = isa(h)) refills the one before last. */
#define ACPF_SPARES 2

/* One input of a trampoline, by type code: 'd' number, 'e' enumeration,
   'A' / 'M' model (aircraft, mission). */
typedef union {
  double number;
  int enumeration;
  const void *model;
} acpf_value;

typedef struct {
  const char *name;                         /* C name, as SWIG shows it in errors */
  const char *types;                        /* type code of each input */
  int nin, nout, kind;                      /* kind: ACPF_PLAIN, ACPF_NAN, ACPF_STATUS */
  int (*call)(const acpf_value *in, double *out); /* status (0 for double functions) */
  const char *const *outputs;               /* output names (out-pointers, struct fields) */
} acpf_entry;

#include "fastcall_table.h"

static PyObject *acpf_error = NULL; /* acperf.AcperfError, given by _core.py */

/* ---- models: the base type of acperf.Aircraft and acperf.Mission ---- */

typedef struct {
  PyObject_HEAD
  const void *address; /* the C object of the SWIG handle; NULL when detached */
  char kind;           /* 'A' aircraft, 'M' mission, 0 when detached */
} acpf_model;

/* _attach(handle, kind): remember the C address of a SWIG handle (its int()). */
static PyObject *acpf_model_attach(PyObject *self, PyObject *args) {
  PyObject *handle;
  int kind;
  if (!PyArg_ParseTuple(args, "OC:_attach", &handle, &kind)) return NULL;
  if (kind != 'A' && kind != 'M') return PyErr_Format(PyExc_ValueError, "_attach: kind 'A' or 'M'");
  PyObject *number = PyNumber_Long(handle); /* SwigPyObject: int() is its address */
  if (!number) return NULL;
  void *address = PyLong_AsVoidPtr(number);
  Py_DECREF(number);
  if (!address)
    return PyErr_Occurred() ? NULL : PyErr_Format(PyExc_ValueError, "_attach: NULL handle");
  acpf_model *m = (acpf_model *)self;
  m->address = address;
  m->kind = (char)kind;
  Py_RETURN_NONE;
}

/* _detach(): forget the address, before the handle is freed. */
static PyObject *acpf_model_detach(PyObject *self, PyObject *unused) {
  (void)unused;
  acpf_model *m = (acpf_model *)self;
  m->address = NULL;
  m->kind = 0;
  Py_RETURN_NONE;
}

static PyMethodDef acpf_model_methods[] = {
    {"_attach", acpf_model_attach, METH_VARARGS,
     "_attach(handle, kind): the C address of the SWIG handle, kind 'A' or 'M'."},
    {"_detach", acpf_model_detach, METH_NOARGS, "_detach(): before the handle is freed."},
    {NULL, NULL, 0, NULL},
};

static PyTypeObject acpf_model_type = {
    PyVarObject_HEAD_INIT(NULL, 0)
    .tp_name = "acperf._fast.model",
    .tp_doc = "Base of the model objects (Aircraft, Mission): their C address for the fast path.",
    .tp_basicsize = sizeof(acpf_model),
    .tp_flags = Py_TPFLAGS_DEFAULT | Py_TPFLAGS_BASETYPE,
    .tp_new = PyType_GenericNew,
    .tp_methods = acpf_model_methods,
};

/* ---- functions ---- */

typedef struct {
  PyObject_HEAD
  const acpf_entry *entry;
  PyObject *fallback;  /* the Python function: anything not all-scalar goes there */
  PyObject *names;     /* tuple of the parameter names (interned), for keywords */
  PyObject *defaults;  /* tuple of the default objects of the trailing parameters */
  PyObject *result;    /* named result type (a tuple subtype) or NULL: one float */
  PyObject *codes;     /* NULL, or a tuple, per output, of None or {value: IntEnum member}
                          for the fields that hold a C enum value (a float key finds the
                          member of that whole value; NaN and other values stay floats) */
  PyObject *spare[ACPF_SPARES]; /* the last named results, refilled when no one else holds them */
  int next_spare;      /* the slot the next new result takes */
  int nmin;            /* arguments without a default */
  PyObject *dict;
  vectorcallfunc vectorcall;
} acpf_function;

/* How errors.i shows an argument in an error: a model by what it is (never its
   address), anything else by its repr. */
static PyObject *acpf_shown(const acpf_entry *e, int i, PyObject *v) {
  if (e->types[i] == 'A') return PyUnicode_FromString("<aircraft>");
  if (e->types[i] == 'M') return PyUnicode_FromString("<mission>");
  return PyObject_Repr(v);
}

/* errors.i's acpy_raise_call: "<function>(<a>, <b>, ...): <status text>". argv
   holds every parameter in order, defaults included. */
static void acpf_raise(const acpf_function *f, PyObject *const *argv, int status) {
  const acpf_entry *e = f->entry;
  char text[96];
  if (status < 0)
    PyOS_snprintf(text, sizeof text, "%s, or %s (no result)", acp_strerror(ACP_ERR_INVALID),
                  acp_strerror(ACP_ERR_RANGE));
  else
    PyOS_snprintf(text, sizeof text, "%s", acp_strerror(status));
  PyObject *all = PyList_New(e->nin);
  if (!all) return;
  for (int i = 0; i < e->nin; i++) {
    PyObject *v = acpf_shown(e, i, argv[i]);
    if (!v) {
      Py_DECREF(all);
      return;
    }
    PyList_SET_ITEM(all, i, v);
  }
  PyObject *sep = PyUnicode_FromString(", ");
  PyObject *shown = sep ? PyUnicode_Join(sep, all) : NULL;
  Py_XDECREF(sep);
  Py_DECREF(all);
  if (!shown) return;
  PyObject *message = PyUnicode_FromFormat("%s(%U): %s", e->name, shown, text);
  Py_DECREF(shown);
  if (!message) return;
  PyObject *exc = PyObject_CallOneArg(acpf_error, message);
  Py_DECREF(message);
  if (!exc) return;
  PyObject *code = status < 0 ? Py_NewRef(Py_None) : PyLong_FromLong(status);
  if (code && PyObject_SetAttrString(exc, "status", code) == 0)
    PyErr_SetObject(acpf_error, exc);
  Py_XDECREF(code);
  Py_DECREF(exc);
}

/* A Python float or int (or subclass) as a double, as SWIG_AsVal_double takes it;
   0 when the value is something else (the caller falls back). */
static inline int acpf_double(PyObject *o, double *v) {
  if (PyFloat_Check(o)) {
    *v = PyFloat_AS_DOUBLE(o);
    return 1;
  }
  if (PyLong_Check(o)) {
    *v = PyLong_AsDouble(o);
    if (*v == -1.0 && PyErr_Occurred()) {
      PyErr_Clear();
      return 0;
    }
    return 1;
  }
  return 0;
}

/* One argument by its type code; 0 when the fast path cannot take it. */
static inline int acpf_convert(char type, PyObject *o, acpf_value *v) {
  switch (type) {
    case 'd':
      return acpf_double(o, &v->number);
    case 'e': { /* arrays.i: a whole real number, else -1 (refused by the C function) */
      double x;
      if (!acpf_double(o, &x)) return 0;
      v->enumeration = (isfinite(x) && x == floor(x) && fabs(x) < 1.0e9) ? (int)x : -1;
      return 1;
    }
    default: { /* 'A', 'M': an attached model of that kind */
      if (!PyObject_TypeCheck(o, &acpf_model_type)) return 0;
      const acpf_model *m = (const acpf_model *)o;
      v->model = m->address;
      return m->kind == type && m->address != NULL;
    }
  }
}

/* The arguments in parameter order (argv, borrowed): positional, then keywords,
   then defaults; 0 when a keyword is unknown or repeated or a parameter is
   missing (the Python function reports it). */
static int acpf_gather(const acpf_function *f, PyObject *const *args, Py_ssize_t nargs,
                       PyObject *kwnames, PyObject **argv) {
  const acpf_entry *e = f->entry;
  if (nargs > e->nin) return 0;
  for (Py_ssize_t i = 0; i < nargs; i++) argv[i] = args[i];
  for (Py_ssize_t i = nargs; i < e->nin; i++) argv[i] = NULL;
  const Py_ssize_t nkw = kwnames ? PyTuple_GET_SIZE(kwnames) : 0;
  for (Py_ssize_t k = 0; k < nkw; k++) {
    PyObject *key = PyTuple_GET_ITEM(kwnames, k);
    Py_ssize_t i = nargs;
    while (i < e->nin && PyTuple_GET_ITEM(f->names, i) != key) i++;
    if (i == e->nin) /* not interned alike: compare the text */
      for (i = nargs; i < e->nin && PyUnicode_Compare(PyTuple_GET_ITEM(f->names, i), key) != 0;)
        i++;
    if (i == e->nin || argv[i]) return 0;
    argv[i] = args[nargs + k];
  }
  for (Py_ssize_t i = nargs; i < e->nin; i++) {
    if (argv[i]) continue;
    if (i < f->nmin) return 0;
    argv[i] = PyTuple_GET_ITEM(f->defaults, i - f->nmin);
  }
  return 1;
}

/* The dict of enum members of output i, or NULL when it is a plain number. */
static inline PyObject *acpf_code_map(const acpf_function *f, int i) {
  if (!f->codes) return NULL;
  PyObject *map = PyTuple_GET_ITEM(f->codes, i);
  return map == Py_None ? NULL : map;
}

/* Output i as an object (new reference): a float, or the enum member it codes. */
static PyObject *acpf_output(const acpf_function *f, int i, double x) {
  PyObject *v = PyFloat_FromDouble(x);
  PyObject *map = acpf_code_map(f, i);
  if (!v || !map || isnan(x)) return v;
  PyObject *member = PyDict_GetItemWithError(map, v); /* borrowed */
  if (!member && !PyErr_Occurred()) return v;          /* no member of that value */
  Py_DECREF(v);
  return member ? Py_NewRef(member) : NULL;
}

/* The named result: a tuple subtype without extra slots, of floats (and enum
   members in the coded fields). When one of the last results given is held by
   nothing but this function (the caller let it go, took a field and dropped
   it, or stored the next one in its place), it is refilled in place instead of
   a new one being made, as zip() and enumerate() recycle their result tuples;
   so is each float in it that nothing else holds. No one can tell the
   difference: the object is unreachable but from here, and holds the values a
   new one would. */
static PyObject *acpf_named(acpf_function *f, const double *out) {
  const int n = f->entry->nout;
  PyObject *r = NULL;
  for (int k = 0; k < ACPF_SPARES && !r; k++)
    if (f->spare[k] && Py_REFCNT(f->spare[k]) == 1) r = f->spare[k];
  if (r) {
    for (int i = 0; i < n; i++) {
      PyObject *v = PyTuple_GET_ITEM(r, i);
      if (Py_REFCNT(v) == 1 && PyFloat_CheckExact(v) && !acpf_code_map(f, i)) {
        ((PyFloatObject *)v)->ob_fval = out[i];
        continue;
      }
      PyObject *w = acpf_output(f, i, out[i]);
      if (!w) return NULL;
      PyTuple_SET_ITEM(r, i, w);
      Py_DECREF(v);
    }
    return Py_NewRef(r);
  }
  PyTypeObject *type = (PyTypeObject *)f->result;
  r = type->tp_alloc(type, n);
  if (!r) return NULL;
  for (int i = 0; i < n; i++) {
    PyObject *v = acpf_output(f, i, out[i]);
    if (!v) {
      Py_DECREF(r);
      return NULL;
    }
    PyTuple_SET_ITEM(r, i, v);
  }
  /* Floats only: it can be in no reference cycle, so the cycle collector need not
     scan it (CPython untracks such tuples itself, but only when it meets them in
     a collection; a notebook keeping 1e5 results would pay for those scans). With
     enum members it stays tracked, as CPython would keep it. */
  if (!f->codes) PyObject_GC_UnTrack(r);
  Py_XSETREF(f->spare[f->next_spare], Py_NewRef(r));
  f->next_spare = (f->next_spare + 1) % ACPF_SPARES;
  return r;
}

static PyObject *acpf_call(PyObject *self, PyObject *const *args, size_t nargsf,
                           PyObject *kwnames) {
  acpf_function *f = (acpf_function *)self;
  const acpf_entry *e = f->entry;
  const Py_ssize_t nargs = PyVectorcall_NARGS(nargsf);
  PyObject *argv[ACPF_MAX_IN];
  acpf_value in[ACPF_MAX_IN];
  double out[ACPF_MAX_OUT];
  if (!acpf_gather(f, args, nargs, kwnames, argv)) goto fallback;
  for (int i = 0; i < e->nin; i++)
    if (!acpf_convert(e->types[i], argv[i], &in[i])) goto fallback;

  const int status = e->call(in, out);
  if (status != 0 || (e->kind == ACPF_NAN && isnan(out[0]))) {
    acpf_raise(f, argv, e->kind == ACPF_NAN ? -1 : status);
    return NULL;
  }
  if (!f->result) return PyFloat_FromDouble(out[0]);
  return acpf_named(f, out);

fallback:
  return PyObject_Vectorcall(f->fallback, args, nargsf, kwnames);
}

static const acpf_entry *acpf_find(const char *name) {
  const acpf_entry *e = acpf_table;
  while (e->name && strcmp(e->name, name) != 0) e++;
  if (!e->name) PyErr_Format(PyExc_LookupError, "%s has no fast path", name);
  return e->name ? e : NULL;
}

/* function(c_name, names, fallback, defaults, result, codes=None): see _core.py. */
static PyObject *acpf_new(PyTypeObject *type, PyObject *args, PyObject *kwds) {
  const char *name;
  PyObject *names, *fallback, *defaults, *result, *codes = Py_None;
  if (kwds && PyDict_GET_SIZE(kwds)) {
    PyErr_SetString(PyExc_TypeError, "function() takes positional arguments only");
    return NULL;
  }
  if (!PyArg_ParseTuple(args, "sO!OO!O|O:function", &name, &PyTuple_Type, &names, &fallback,
                        &PyTuple_Type, &defaults, &result, &codes))
    return NULL;
  const acpf_entry *e = acpf_find(name);
  if (!e) return NULL;
  if (PyTuple_GET_SIZE(names) != e->nin)
    return PyErr_Format(PyExc_ValueError, "%s: %zd parameters where the C function has %d inputs",
                        name, PyTuple_GET_SIZE(names), e->nin);
  if (!acpf_error) return PyErr_Format(PyExc_RuntimeError, "call set_error() first");
  if (!PyCallable_Check(fallback)) return PyErr_Format(PyExc_TypeError, "fallback not callable");
  const Py_ssize_t ndef = PyTuple_GET_SIZE(defaults);
  if (ndef > e->nin) return PyErr_Format(PyExc_ValueError, "%s: too many defaults", name);
  for (Py_ssize_t i = 0; i < ndef; i++)
    if (!PyFloat_CheckExact(PyTuple_GET_ITEM(defaults, i)) || e->types[e->nin - ndef + i] != 'd')
      return PyErr_Format(PyExc_TypeError, "%s: defaults must be floats for numbers", name);
  if (result == Py_None) {
    if (e->nout != 1)
      return PyErr_Format(PyExc_ValueError, "%s: several outputs need a result type", name);
    result = NULL;
  } else {
    PyTypeObject *t = (PyTypeObject *)result;
    if (!PyType_Check(result) || !PyType_IsSubtype(t, &PyTuple_Type) ||
        t->tp_basicsize != PyTuple_Type.tp_basicsize || t->tp_dictoffset != 0 ||
        t->tp_itemsize != PyTuple_Type.tp_itemsize)
      return PyErr_Format(PyExc_TypeError, "%s: the result type must be a tuple subtype "
                          "without slots (a namedtuple)", name);
  }
  if (codes == Py_None) {
    codes = NULL;
  } else {
    if (!result || !PyTuple_Check(codes) || PyTuple_GET_SIZE(codes) != e->nout)
      return PyErr_Format(PyExc_TypeError, "%s: codes must be a tuple of %d entries for a "
                          "named result", name, e->nout);
    for (int i = 0; i < e->nout; i++) {
      PyObject *map = PyTuple_GET_ITEM(codes, i);
      if (map != Py_None && !PyDict_CheckExact(map))
        return PyErr_Format(PyExc_TypeError, "%s: each code is None or a dict", name);
    }
  }
  if (e->nin > ACPF_MAX_IN || e->nout > ACPF_MAX_OUT)
    return PyErr_Format(PyExc_ValueError, "%s: too many arguments for the fast path", name);
  PyObject *interned = PyTuple_New(e->nin);
  if (!interned) return NULL;
  for (int i = 0; i < e->nin; i++) {
    PyObject *s = PyTuple_GET_ITEM(names, i);
    if (!PyUnicode_CheckExact(s)) {
      Py_DECREF(interned);
      return PyErr_Format(PyExc_TypeError, "%s: parameter names must be str", name);
    }
    Py_INCREF(s);
    PyUnicode_InternInPlace(&s); /* keyword names are interned: found by identity */
    PyTuple_SET_ITEM(interned, i, s);
  }
  acpf_function *f = (acpf_function *)type->tp_alloc(type, 0);
  if (!f) {
    Py_DECREF(interned);
    return NULL;
  }
  f->entry = e;
  f->fallback = Py_NewRef(fallback);
  f->names = interned;
  f->defaults = Py_NewRef(defaults);
  f->result = Py_XNewRef(result);
  f->codes = Py_XNewRef(codes);
  f->nmin = e->nin - (int)ndef;
  f->vectorcall = acpf_call;
  return (PyObject *)f;
}

static int acpf_traverse(acpf_function *f, visitproc visit, void *arg) {
  Py_VISIT(f->fallback);
  Py_VISIT(f->names);
  Py_VISIT(f->defaults);
  Py_VISIT(f->result);
  Py_VISIT(f->codes);
  for (int k = 0; k < ACPF_SPARES; k++) Py_VISIT(f->spare[k]);
  Py_VISIT(f->dict);
  return 0;
}

static int acpf_clear(acpf_function *f) {
  Py_CLEAR(f->fallback);
  Py_CLEAR(f->names);
  Py_CLEAR(f->defaults);
  Py_CLEAR(f->result);
  Py_CLEAR(f->codes);
  for (int k = 0; k < ACPF_SPARES; k++) Py_CLEAR(f->spare[k]);
  Py_CLEAR(f->dict);
  return 0;
}

static void acpf_dealloc(acpf_function *f) {
  PyObject_GC_UnTrack(f);
  acpf_clear(f);
  Py_TYPE(f)->tp_free((PyObject *)f);
}

/* Like a Python function: bound to an instance when it is a class attribute. */
static PyObject *acpf_get(PyObject *self, PyObject *obj, PyObject *type) {
  (void)type;
  if (obj == NULL || obj == Py_None) return Py_NewRef(self);
  return PyMethod_New(self, obj);
}

static PyObject *acpf_repr(acpf_function *f) {
  return PyUnicode_FromFormat("<function %s (libacperf %s, fast scalar path)>",
                              f->entry->name + 4, f->entry->name);
}

/* Pickled by name, as functions are: `__module__` and `__qualname__` (set by _core.py). */
static PyObject *acpf_reduce(PyObject *self, PyObject *unused) {
  (void)unused;
  return PyObject_GetAttrString(self, "__qualname__");
}

static PyObject *acpf_get_c_outputs(acpf_function *f, void *unused) {
  (void)unused;
  PyObject *t = PyTuple_New(f->entry->nout);
  if (!t) return NULL;
  for (int i = 0; i < f->entry->nout; i++) {
    PyObject *s = PyUnicode_FromString(f->entry->outputs[i]);
    if (!s) {
      Py_DECREF(t);
      return NULL;
    }
    PyTuple_SET_ITEM(t, i, s);
  }
  return t;
}

static PyObject *acpf_get_c_inputs(acpf_function *f, void *unused) {
  (void)unused;
  return PyUnicode_FromString(f->entry->types);
}

static PyMethodDef acpf_methods[] = {
    {"__reduce__", acpf_reduce, METH_NOARGS, NULL},
    {NULL, NULL, 0, NULL},
};

static PyGetSetDef acpf_getset[] = {
    {"__dict__", PyObject_GenericGetDict, PyObject_GenericSetDict, NULL, NULL},
    {"fast_outputs", (getter)acpf_get_c_outputs, NULL,
     "Output names of the C function on the fast path (out-pointers or struct fields).", NULL},
    {"fast_inputs", (getter)acpf_get_c_inputs, NULL,
     "Type codes of the C inputs on the fast path: d number, e enumeration, A aircraft, "
     "M mission.", NULL},
    {NULL, NULL, NULL, NULL, NULL},
};

static PyMemberDef acpf_members[] = {
    {"__wrapped__", T_OBJECT, offsetof(acpf_function, fallback), READONLY,
     "The Python function: the array path and every call that is not all-scalar."},
    {NULL, 0, 0, 0, NULL},
};

static PyTypeObject acpf_function_type = {
    PyVarObject_HEAD_INIT(NULL, 0)
    .tp_name = "acperf._fast.function",
    .tp_doc = "A public acperf function with a fast path for scalar calls (see fastcall.c).",
    .tp_basicsize = sizeof(acpf_function),
    .tp_flags = Py_TPFLAGS_DEFAULT | Py_TPFLAGS_HAVE_GC | Py_TPFLAGS_HAVE_VECTORCALL,
    .tp_new = acpf_new,
    .tp_dealloc = (destructor)acpf_dealloc,
    .tp_traverse = (traverseproc)acpf_traverse,
    .tp_clear = (inquiry)acpf_clear,
    .tp_call = PyVectorcall_Call,
    .tp_vectorcall_offset = offsetof(acpf_function, vectorcall),
    .tp_dictoffset = offsetof(acpf_function, dict),
    .tp_descr_get = acpf_get,
    .tp_repr = (reprfunc)acpf_repr,
    .tp_methods = acpf_methods,
    .tp_getset = acpf_getset,
    .tp_members = acpf_members,
};

/* set_error(AcperfError): the exception class of the SWIG layer. */
static PyObject *acpf_set_error(PyObject *module, PyObject *cls) {
  (void)module;
  if (!PyType_Check(cls) || !PyType_IsSubtype((PyTypeObject *)cls,
                                              (PyTypeObject *)PyExc_ValueError)) {
    PyErr_SetString(PyExc_TypeError, "set_error: expected acperf.AcperfError");
    return NULL;
  }
  Py_XSETREF(acpf_error, Py_NewRef(cls));
  Py_RETURN_NONE;
}

static PyObject *acpf_names(PyObject *module, PyObject *unused) {
  (void)module;
  (void)unused;
  PyObject *names = PyList_New(0);
  if (!names) return NULL;
  for (const acpf_entry *e = acpf_table; e->name; e++) {
    PyObject *s = PyUnicode_FromString(e->name);
    if (!s || PyList_Append(names, s) < 0) {
      Py_XDECREF(s);
      Py_DECREF(names);
      return NULL;
    }
    Py_DECREF(s);
  }
  return names;
}

/* c_loop(c_name, args, n, chained=False): seconds for n calls of the C function
   through its trampoline with these inputs (converted as a fast call converts
   them), no Python in the loop: the C cost that a scalar call from Python pays
   too (tests/bench/bench_python.py). chained: each call's first number waits
   for the previous result (+ 0.0 times it), so the calls cannot overlap in the
   CPU, as calls from Python do not. */
static PyObject *acpf_c_loop(PyObject *module, PyObject *args) {
  (void)module;
  const char *name;
  PyObject *values;
  long long n;
  int chained = 0;
  if (!PyArg_ParseTuple(args, "sO!L|p:c_loop", &name, &PyTuple_Type, &values, &n, &chained))
    return NULL;
  const acpf_entry *e = acpf_find(name);
  if (!e) return NULL;
  if (PyTuple_GET_SIZE(values) != e->nin || n < 1)
    return PyErr_Format(PyExc_ValueError, "%s: %d inputs and n >= 1 expected", name, e->nin);
  acpf_value in[ACPF_MAX_IN];
  double out[ACPF_MAX_OUT];
  int first = -1; /* the first number, chained to the result */
  for (int i = 0; i < e->nin; i++) {
    if (!acpf_convert(e->types[i], PyTuple_GET_ITEM(values, i), &in[i]))
      return PyErr_Format(PyExc_TypeError, "%s: argument %d is not a %c", name, i, e->types[i]);
    if (first < 0 && e->types[i] == 'd') first = i;
  }
  if (first < 0) return PyErr_Format(PyExc_ValueError, "%s: no number to chain", name);
  volatile double sink = 0.0;
  struct timespec t0, t1;
  clock_gettime(CLOCK_MONOTONIC, &t0);
  const double x = in[first].number;
  if (chained) {
    for (long long k = 0; k < n; k++) {
      e->call(in, out);
      in[first].number = x + out[0] * 0.0; /* the same value, after the result */
    }
  } else {
    for (long long k = 0; k < n; k++) {
      e->call(in, out);
      sink += out[0];
    }
  }
  clock_gettime(CLOCK_MONOTONIC, &t1);
  (void)sink;
  return PyFloat_FromDouble((double)(t1.tv_sec - t0.tv_sec) +
                            1e-9 * (double)(t1.tv_nsec - t0.tv_nsec));
}

static PyMethodDef module_methods[] = {
    {"c_loop", acpf_c_loop, METH_VARARGS,
     "c_loop(c_name, args, n, chained=False): seconds for n C calls with these inputs\n"
     "(benchmarks; chained: each call waits for the previous result)."},
    {"set_error", acpf_set_error, METH_O, "Set the exception class raised on failures."},
    {"names", acpf_names, METH_NOARGS, "C names of the functions that have a fast path."},
    {NULL, NULL, 0, NULL},
};

static struct PyModuleDef module_def = {
    PyModuleDef_HEAD_INIT, "acperf._fast",
    "Fast scalar calls of the acperf functions whose inputs are all doubles (fastcall.c).",
    -1, module_methods, NULL, NULL, NULL, NULL,
};

PyMODINIT_FUNC PyInit__fast(void) {
  if (PyType_Ready(&acpf_function_type) < 0 || PyType_Ready(&acpf_model_type) < 0) return NULL;
  PyObject *m = PyModule_Create(&module_def);
  if (!m) return NULL;
  if (PyModule_AddObjectRef(m, "function", (PyObject *)&acpf_function_type) < 0 ||
      PyModule_AddObjectRef(m, "model", (PyObject *)&acpf_model_type) < 0) {
    Py_DECREF(m);
    return NULL;
  }
  return m;
}
