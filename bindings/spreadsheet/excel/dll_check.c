/*
 * dll_check: calls acperf.dll the way the VBA module does, for the wine test
 * (tests/spreadsheet/dll_wine.py). The DLL is loaded at run time with
 * LoadLibraryA and every function is found with GetProcAddress, as VBA's
 * Declare statements do; nothing is linked against the DLL.
 *
 * Reads commands on stdin, one a line, and prints one result line for each:
 *   aircraft                     start a new aircraft (acp_aircraft_new)
 *   set KEY NUMBER               acp_aircraft_set on the current aircraft
 *   text KEY WORD                acp_aircraft_set_text (WORD: no blanks)
 *   mission                      start a new mission (acp_mission_new)
 *   mset KEY UNIT NUMBER         acp_mission_set on the current mission, the
 *                                number converted from UNIT to SI first
 *   call ID SYMBOL SIG NIN UNIT VALUE ... NOUT UNIT ...
 *       SIG is the C prototype: return letter (d double, i int status), ':',
 *       then one letter per parameter (A aircraft, M mission, d double,
 *       i int (an enum: the VALUE is a whole number), P double *).
 *       A unit "A/B" that is no unit of the library is a composite, as in the
 *       VBA module: A converted by acp_to_si, divided by one B.
 *       Each input is converted from its unit to SI with the DLL's acp_to_si,
 *       each output from SI with acp_from_si ("-" : no conversion), as the VBA
 *       wrappers do. Prints "ID STATUS OUT..." (%.17g; nan for no result).
 *   symbols NAME...              prints "missing NAME" for each name that
 *                                GetProcAddress cannot find, then "done"
 */
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <windows.h>

typedef int (*to_si_fn)(double, const char *, double *);
typedef void *(*new_fn)(void);
typedef void (*free_fn)(void *);
typedef int (*set_fn)(void *, const char *, double);
typedef int (*set_text_fn)(void *, const char *, const char *);

static HMODULE dll;
static to_si_fn to_si_p, from_si_p;

/* to_si/from_si with composite units "A/B" (the VBA module's acpPer). */
static int convert(int to, double v, const char *unit, double *out) {
  double one;
  if (to_si_p(1.0, unit, &one) == 0 || !strrchr(unit, '/'))
    return (to ? to_si_p : from_si_p)(v, unit, out);
  char a[64];
  const char *slash = strrchr(unit, '/');
  size_t n = (size_t)(slash - unit);
  if (n >= sizeof a) return 1;
  memcpy(a, unit, n);
  a[n] = '\0';
  int st = to_si_p(1.0, slash + 1, &one);
  if (!st) st = (to ? to_si_p : from_si_p)(v, a, out);
  if (!st) *out = to ? *out / one : *out * one;
  return st;
}

static FARPROC sym(const char *name) {
  FARPROC p = GetProcAddress(dll, name);
  if (!p) {
    printf("error no symbol %s\n", name);
    exit(2);
  }
  return p;
}

#define MAXV 16
#define MAXOUT 40

/* Call SYMBOL with the prototype SIG; the doubles in and the out buffer. */
static int invoke(FARPROC f, const char *sig, void *ac, void *mi, const double *in,
                  double *out, double *value) {
  int st = 0;
  *value = NAN;
  if (!strcmp(sig, "d:d")) *value = ((double (*)(double))(void (*)(void))f)(in[0]);
  else if (!strcmp(sig, "d:dd"))
    *value = ((double (*)(double, double))(void (*)(void))f)(in[0], in[1]);
  else if (!strcmp(sig, "d:ddd"))
    *value = ((double (*)(double, double, double))(void (*)(void))f)(in[0], in[1], in[2]);
  else if (!strcmp(sig, "i:dP"))
    st = ((int (*)(double, double *))(void (*)(void))f)(in[0], out);
  else if (!strcmp(sig, "i:ddP"))
    st = ((int (*)(double, double, double *))(void (*)(void))f)(in[0], in[1], out);
  else if (!strcmp(sig, "i:ddddPPP"))
    st = ((int (*)(double, double, double, double, double *, double *, double *))(
        void (*)(void))f)(in[0], in[1], in[2], in[3], out, out + 1, out + 2);
  else if (!strcmp(sig, "i:AdddP"))
    st = ((int (*)(void *, double, double, double, double *))(void (*)(void))f)(
        ac, in[0], in[1], in[2], out);
  else if (!strcmp(sig, "i:AddddP"))
    st = ((int (*)(void *, double, double, double, double, double *))(void (*)(void))f)(
        ac, in[0], in[1], in[2], in[3], out);
  else if (!strcmp(sig, "d:ddddd"))
    *value = ((double (*)(double, double, double, double, double))(void (*)(void))f)(
        in[0], in[1], in[2], in[3], in[4]);
  else if (!strcmp(sig, "i:ddddddddP"))
    st = ((int (*)(double, double, double, double, double, double, double, double, double *))(
        void (*)(void))f)(in[0], in[1], in[2], in[3], in[4], in[5], in[6], in[7], out);
  else if (!strcmp(sig, "i:AddP"))
    st = ((int (*)(void *, double, double, double *))(void (*)(void))f)(ac, in[0], in[1], out);
  else if (!strcmp(sig, "i:AdddddP"))
    st = ((int (*)(void *, double, double, double, double, double, double *))(void (*)(void))f)(
        ac, in[0], in[1], in[2], in[3], in[4], out);
  else if (!strcmp(sig, "i:AddddddP"))
    st = ((int (*)(void *, double, double, double, double, double, double, double *))(
        void (*)(void))f)(ac, in[0], in[1], in[2], in[3], in[4], in[5], out);
  else if (!strcmp(sig, "i:AidddddP"))
    st = ((int (*)(void *, int, double, double, double, double, double, double *))(
        void (*)(void))f)(ac, (int)in[0], in[1], in[2], in[3], in[4], in[5], out);
  else if (!strcmp(sig, "i:AidddddidddP"))
    st = ((int (*)(void *, int, double, double, double, double, double, int, double, double,
                   double, double *))(void (*)(void))f)(ac, (int)in[0], in[1], in[2], in[3],
                                                         in[4], in[5], (int)in[6], in[7], in[8],
                                                         in[9], out);
  else if (!strcmp(sig, "i:AMdP"))
    st = ((int (*)(void *, void *, double, double *))(void (*)(void))f)(ac, mi, in[0], out);
  else {
    printf("error unsupported prototype %s\n", sig);
    exit(2);
  }
  return st;
}

int main(int argc, char **argv) {
  const char *path = argc > 1 ? argv[1] : "acperf.dll";
  dll = LoadLibraryA(path);
  if (!dll) {
    printf("error LoadLibrary %s failed (%lu)\n", path, (unsigned long)GetLastError());
    return 2;
  }
  to_si_p = (to_si_fn)(void (*)(void))sym("acp_to_si");
  from_si_p = (to_si_fn)(void (*)(void))sym("acp_from_si");
  void *ac = NULL, *mi = NULL;
  char line[4096];
  while (fgets(line, sizeof line, stdin)) {
    char *save = NULL, *w = strtok_s(line, " \t\r\n", &save);
    if (!w) continue;
    if (!strcmp(w, "aircraft")) {
      if (ac) ((free_fn)(void (*)(void))sym("acp_aircraft_free"))(ac);
      ac = ((new_fn)(void (*)(void))sym("acp_aircraft_new"))();
    } else if (!strcmp(w, "set") || !strcmp(w, "text")) {
      char *key = strtok_s(NULL, " \t\r\n", &save), *val = strtok_s(NULL, " \t\r\n", &save);
      int st = !strcmp(w, "set")
                   ? ((set_fn)(void (*)(void))sym("acp_aircraft_set"))(ac, key, strtod(val, NULL))
                   : ((set_text_fn)(void (*)(void))sym("acp_aircraft_set_text"))(ac, key, val);
      if (st) printf("error set %s: status %d\n", key, st);
    } else if (!strcmp(w, "mission")) {
      if (mi) ((free_fn)(void (*)(void))sym("acp_mission_free"))(mi);
      mi = ((new_fn)(void (*)(void))sym("acp_mission_new"))();
    } else if (!strcmp(w, "mset")) {
      char *key = strtok_s(NULL, " \t\r\n", &save), *unit = strtok_s(NULL, " \t\r\n", &save);
      double v = strtod(strtok_s(NULL, " \t\r\n", &save), NULL);
      int st = strcmp(unit, "-") ? convert(1, v, unit, &v) : 0;
      if (!st) st = ((set_fn)(void (*)(void))sym("acp_mission_set"))(mi, key, v);
      if (st) printf("error mset %s: status %d\n", key, st);
    } else if (!strcmp(w, "symbols")) {
      while ((w = strtok_s(NULL, " \t\r\n", &save)))
        if (!GetProcAddress(dll, w)) printf("missing %s\n", w);
      printf("done\n");
    } else if (!strcmp(w, "call")) {
      char *id = strtok_s(NULL, " \t\r\n", &save), *name = strtok_s(NULL, " \t\r\n", &save);
      char *sig = strtok_s(NULL, " \t\r\n", &save);
      double in[MAXV], out[MAXOUT], value = NAN;
      char *outunit[MAXOUT];
      int nin = atoi(strtok_s(NULL, " \t\r\n", &save)), st = 0;
      for (int i = 0; i < nin && i < MAXV; i++) {
        char *unit = strtok_s(NULL, " \t\r\n", &save);
        double v = strtod(strtok_s(NULL, " \t\r\n", &save), NULL);
        if (strcmp(unit, "-")) st = st ? st : convert(1, v, unit, &v);
        in[i] = v;
      }
      int nout = atoi(strtok_s(NULL, " \t\r\n", &save));
      for (int i = 0; i < nout && i < MAXOUT; i++) outunit[i] = strtok_s(NULL, " \t\r\n", &save);
      for (int i = 0; i < MAXOUT; i++) out[i] = NAN;
      if (!st) st = invoke(sym(name), sig, ac, mi, in, out, &value);
      if (sig[0] == 'd') out[0] = value;
      printf("%s %d", id, st);
      for (int i = 0; i < nout; i++) {
        double v = out[i];
        if (isfinite(v) && strcmp(outunit[i], "-") && convert(0, v, outunit[i], &v)) v = NAN;
        if (isfinite(v)) printf(" %.17g", v);
        else printf(" nan");
      }
      printf("\n");
    }
    fflush(stdout);
  }
  if (ac) ((free_fn)(void (*)(void))sym("acp_aircraft_free"))(ac);
  if (mi) ((free_fn)(void (*)(void))sym("acp_mission_free"))(mi);
  FreeLibrary(dll);
  return 0;
}
