/*
 * Errors: acperf.AcperfError (a ValueError) carrying the status text of
 * acp_strerror() and the status code in its `status` attribute (None when the
 * C function reports failure only as a NaN result).
 */
%{
static PyObject *acpy_error = NULL; /* acperf.AcperfError, created at import */

/* Raise AcperfError(message) with attribute status (an int, or None when < 0). */
static void acpy_raise(const char *message, int status) {
  PyObject *exc = PyObject_CallFunction(acpy_error, "s", message);
  if (!exc) return;
  PyObject *code = status < 0 ? (Py_INCREF(Py_None), Py_None) : PyLong_FromLong(status);
  if (code && PyObject_SetAttrString(exc, "status", code) == 0)
    PyErr_SetObject(acpy_error, exc);
  Py_XDECREF(code);
  Py_DECREF(exc);
}

/* Detail text of a failed call: functions with a (char *err, size_t errlen)
   pair shadow this with their error buffer (see the typemap below). */
static const char *const acpy_detail = NULL;

/* True for the names SWIG gives to struct field getters. */
static int acpy_is_field_getter(const char *symname) {
  const size_t len = strlen(symname);
  return len > 4 && strcmp(symname + len - 4, "_get") == 0;
}

/* One argument as the message shows it: a model handle by what it is (never
   its address), anything else by its repr. */
static PyObject *acpy_show_arg(PyObject *arg) {
  if (SwigPyObject_Check(arg)) {
    const swig_type_info *ty = ((SwigPyObject *)arg)->ty;
    const char *name = ty && ty->name ? ty->name : "";
    return PyUnicode_FromString(strstr(name, "acp_aircraft") ? "<aircraft>"
                                : strstr(name, "acp_mission") ? "<mission>" : "<object>");
  }
  return PyObject_Repr(arg);
}

/* "(a, b, ...)" of a call's arguments. */
static PyObject *acpy_show_args(PyObject *args) {
  if (!args) return PyUnicode_FromString("()");
  if (!PyTuple_Check(args)) {
    PyObject *one = acpy_show_arg(args);
    PyObject *text = one ? PyUnicode_FromFormat("(%U)", one) : NULL;
    Py_XDECREF(one);
    return text;
  }
  PyObject *parts = PyList_New(0);
  if (!parts) return NULL;
  for (Py_ssize_t i = 0; i < PyTuple_GET_SIZE(args); ++i) {
    PyObject *one = acpy_show_arg(PyTuple_GET_ITEM(args, i));
    if (!one || PyList_Append(parts, one) < 0) {
      Py_XDECREF(one);
      Py_DECREF(parts);
      return NULL;
    }
    Py_DECREF(one);
  }
  PyObject *sep = PyUnicode_FromString(", ");
  PyObject *joined = sep ? PyUnicode_Join(sep, parts) : NULL;
  Py_XDECREF(sep);
  Py_DECREF(parts);
  PyObject *text = joined ? PyUnicode_FromFormat("(%U)", joined) : NULL;
  Py_XDECREF(joined);
  return text;
}

/* "<function><arguments>: <status text>[: <detail>]" for a failed scalar call. */
static void acpy_raise_call_detail(const char *function, PyObject *args, int status,
                                   const char *detail);
static void acpy_raise_call(const char *function, PyObject *args, int status) {
  acpy_raise_call_detail(function, args, status, NULL);
}
static void acpy_raise_call_detail(const char *function, PyObject *args, int status,
                                   const char *detail) {
  char text[96];
  if (status < 0)
    PyOS_snprintf(text, sizeof text, "%s, or %s (no result)", acp_strerror(ACP_ERR_INVALID),
                  acp_strerror(ACP_ERR_RANGE));
  else
    PyOS_snprintf(text, sizeof text, "%s", acp_strerror(status));
  PyObject *shown = acpy_show_args(args);
  if (!shown) return;
  PyObject *message = detail && detail[0]
      ? PyUnicode_FromFormat("%s%U: %s: %s", function, shown, text, detail)
      : PyUnicode_FromFormat("%s%U: %s", function, shown, text);
  Py_DECREF(shown);
  if (!message) return;
  const char *utf8 = PyUnicode_AsUTF8(message);
  if (utf8) acpy_raise(utf8, status);
  Py_DECREF(message);
}
%}

%init %{
  acpy_error = PyErr_NewExceptionWithDoc(
      "acperf.AcperfError",
      "A libacperf call failed: invalid argument, outside the model's valid range,\n"
      "no convergence, ... The message carries the status text of acp_strerror();\n"
      "`status` is the acp_status code, or None when the C function reports\n"
      "failure only as a NaN result.",
      PyExc_ValueError, NULL);
  if (!acpy_error || PyObject_SetAttrString(acpy_error, "status", Py_None) < 0 ||
      PyModule_AddObject(m, "AcperfError", acpy_error) < 0)
    return NULL;
  Py_INCREF(acpy_error); /* PyModule_AddObject stole one reference; keep ours */
  {
    /* -builtin lists the public names in __all__; the shim imports only those. */
    PyObject *all = PyDict_GetItemString(md, "__all__");
    PyObject *name = PyUnicode_FromString("AcperfError");
    if (!name || (all && PyList_Check(all) && PyList_Append(all, name) < 0)) return NULL;
    Py_DECREF(name);
  }
%}

/* A returned status: raise unless ACP_OK; the outputs follow as the result. */
%typemap(out) int ACPY_STATUS {
  if ($1 != ACP_OK) {
    acpy_raise_call_detail("$symname", args, $1, acpy_detail);
    SWIG_fail;
  }
  $result = SWIG_Py_Void();
}

/* A returned double that is NaN on failure. The field getters SWIG makes for
   output structs ("<struct>_<field>_get") return NaN legitimately (a field
   that does not apply) and pass through. */
%typemap(out) double ACPY_CHECKED {
  if (isnan($1) && !acpy_is_field_getter("$symname")) {
    acpy_raise_call("$symname", args, -1);
    SWIG_fail;
  }
  $result = PyFloat_FromDouble($1);
}

/* An error-text buffer: not a Python argument; its text joins the exception. */
%typemap(arginit, noblock=1) (char *err, size_t errlen) {
  char acpy_err_buf[512] = "";
  const char *acpy_detail = acpy_err_buf;
}
%typemap(in, numinputs=0) (char *err, size_t errlen) {
  $1 = acpy_err_buf;
  $2 = sizeof acpy_err_buf;
}

/* A text output buffer (key names, names, text values): returned as a str. */
%typemap(in, numinputs=0) (char *buf, size_t len) (char text[256]),
                          (char *key, size_t len) (char text[256]),
                          (char *name, size_t len) (char text[256]) {
  text[0] = '\0';
  $1 = text;
  $2 = sizeof text;
}
%typemap(argout) (char *buf, size_t len), (char *key, size_t len), (char *name, size_t len) {
  $result = SWIG_Python_AppendOutput($result, PyUnicode_FromString(text$argnum));
}

/* A str argument (keys, names, units, text, paths): a C string ends at its first
   NUL, so a str with an embedded NUL would reach C cut short (a key, a name or a
   whole aircraft text silently truncated). Refused before the call with
   AcperfError (status ACP_ERR_INVALID, a ValueError) naming the argument. */
%{
static void acpy_raise_nul(const char *function, const char *argument, PyObject *value,
                           size_t at) {
  PyObject *message =
      PyUnicode_GET_LENGTH(value) <= 40
          ? PyUnicode_FromFormat("%s: %s %R contains a NUL character at index %zu; C strings "
                                 "end there, so it is refused", function, argument, value, at)
          : PyUnicode_FromFormat("%s: %s (%zd characters) contains a NUL character at index "
                                 "%zu; C strings end there, so it is refused", function,
                                 argument, PyUnicode_GET_LENGTH(value), at);
  if (!message) return;
  const char *utf8 = PyUnicode_AsUTF8(message);
  if (utf8) acpy_raise(utf8, ACP_ERR_INVALID);
  Py_DECREF(message);
}
%}
%typemap(in, noblock=1) const char * (int res, char *buf = 0, size_t size = 0, int alloc = 0) {
  res = SWIG_AsCharPtrAndSize($input, &buf, &size, &alloc);
  if (!SWIG_IsOK(res)) {
    %argument_fail(res, "$type", $symname, $argnum);
  }
  if (buf && size > 0 && strlen(buf) != size - 1) {
    acpy_raise_nul("$symname", "$1_name", $input,
                   (size_t)PyUnicode_FindChar($input, 0, 0, PY_SSIZE_T_MAX, 1));
    SWIG_fail;
  }
  $1 = ($1_ltype)buf;
}
%typemap(freearg, noblock=1) const char * {
  if (alloc$argnum == SWIG_NEWOBJ) %delete_array(buf$argnum);
}
