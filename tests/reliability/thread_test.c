/* Thread safety: every public function of the covered modules (through the
   contract driver) and the aircraft model (parse, get, drag, speeds on one
   shared read-only model) called from several threads at once; each thread's
   results must equal the single-threaded results bit for bit. Built twice:
   plain, and with ThreadSanitizer, which reports any data race.
   The model modules of the contract run on the demo aircraft of
   examples/aircraft (contract_models_init()), shared read-only.
   usage: thread_test <aircraft text file> <examples dir> */
#include <math.h>
#include <pthread.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "acperf.h"
#include "contract.h"
#include "decode.h"

#define NTHREADS 4
#define NSETS 300       /* argument sets, each driving every covered function */
#define SET_ARGS 48
#define MAX_RECORD 4096 /* outputs recorded per set */

static double g_args[NSETS][SET_ARGS];
static uint32_t g_choice[NSETS];
static double g_want[NSETS][MAX_RECORD];
static size_t g_nwant[NSETS];
static const char *g_text;               /* aircraft text, shared */
static const acp_aircraft *g_aircraft;   /* shared read-only model */
static double g_model_want[64];
static size_t g_model_n;

static void on_violation(contract *c, const char *message) {
  (void)c;
  (void)message; /* the fuzz target owns the contract; here only sameness counts */
}

/* Deterministic inputs: half edges and their neighbours, half spread values. */
static void make_inputs(void) {
  uint64_t s = 0x9e3779b97f4a7c15u;
  for (size_t k = 0; k < NSETS; ++k) {
    for (size_t i = 0; i < SET_ARGS; ++i) {
      uint8_t rec[9];
      for (int b = 0; b < 9; ++b) {
        s ^= s << 13;
        s ^= s >> 7;
        s ^= s << 17;
        rec[b] = (uint8_t)(s >> 24);
      }
      g_args[k][i] = decode_one(rec);
    }
    g_choice[k] = (uint32_t)(s >> 32);
  }
}

static size_t run_set(size_t k, double *record) {
  contract c;
  contract_init(&c, g_args[k], SET_ARGS, g_choice[k], record, MAX_RECORD, on_violation);
  contract_run(&c);
  return c.nrecord;
}

/* Reads of the shared model and a private parse of the shared text. */
static size_t run_model(double *out) {
  size_t n = 0;
  static const char *const KEYS[] = {"wing_area", "span", "aspect_ratio", "induced_factor",
                                     "oswald_effective", "component_count"};
  for (size_t i = 0; i < sizeof KEYS / sizeof KEYS[0]; ++i) {
    double v = NAN;
    out[n++] = acp_aircraft_get(g_aircraft, KEYS[i], &v);
    out[n++] = v;
  }
  acp_drag_parts d;
  out[n++] = acp_drag(g_aircraft, 30000.0, 10000.0, 5.0, 220.0, &d);
  out[n++] = d.parasite;
  out[n++] = d.induced;
  out[n++] = d.wave;
  out[n++] = d.total;
  acp_speed_set sp;
  out[n++] = acp_speeds(g_aircraft, 30000.0, 10000.0, 5.0, &sp);
  out[n++] = sp.vmd;
  out[n++] = sp.vmp;
  out[n++] = sp.vmr;
  out[n++] = sp.vs1g;
  out[n++] = sp.ld_max;
  acp_aircraft *own = acp_aircraft_new();
  char err[128];
  out[n++] = own ? acp_aircraft_parse(own, g_text, err, sizeof err) : -1;
  double v = NAN;
  if (own) acp_aircraft_get(own, "wing_area", &v);
  out[n++] = v;
  acp_aircraft_free(own);
  return n;
}

typedef struct {
  int id;
  unsigned long mismatches;
} worker;

static void *work(void *arg) {
  worker *w = arg;
  static _Thread_local double got[MAX_RECORD];
  for (size_t j = 0; j < NSETS; ++j) {
    const size_t k = (j + (size_t)w->id * 37u) % NSETS; /* threads start at different sets */
    const size_t n = run_set(k, got);
    if (n != g_nwant[k] || memcmp(got, g_want[k], (n < MAX_RECORD ? n : MAX_RECORD) * sizeof got[0]))
      w->mismatches++;
    double m[64];
    const size_t nm = run_model(m);
    if (nm != g_model_n || memcmp(m, g_model_want, nm * sizeof m[0])) w->mismatches++;
  }
  return NULL;
}

static char *read_file(const char *path) {
  FILE *f = fopen(path, "rb");
  if (!f) return NULL;
  static char buf[1 << 16];
  const size_t n = fread(buf, 1, sizeof buf - 1, f);
  fclose(f);
  buf[n] = '\0';
  return buf;
}

int main(int argc, char **argv) {
  if (argc < 3 || !(g_text = read_file(argv[1]))) {
    fprintf(stderr, "usage: thread_test <aircraft text file> <examples dir>\n");
    return 2;
  }
  if (contract_models_init(argv[2]) != 0) return 1;
  acp_aircraft *ac = acp_aircraft_new();
  char err[256];
  if (!ac || acp_aircraft_parse(ac, g_text, err, sizeof err) != ACP_OK) {
    fprintf(stderr, "aircraft %s: %s\n", argv[1], err);
    return 1;
  }
  g_aircraft = ac;
  make_inputs();
  size_t total = 0;
  for (size_t k = 0; k < NSETS; ++k) {
    g_nwant[k] = run_set(k, g_want[k]);
    if (g_nwant[k] > MAX_RECORD) {
      fprintf(stderr, "set %zu records %zu outputs; raise MAX_RECORD\n", k, g_nwant[k]);
      return 1;
    }
    total += g_nwant[k];
  }
  g_model_n = run_model(g_model_want);
  if (g_model_want[0] != ACP_OK || !(g_model_want[13] > 0.0)) {
    fprintf(stderr, "the shared model does not evaluate (get status %g, parasite drag %g)\n",
            g_model_want[0], g_model_want[13]);
    return 1;
  }

  pthread_t t[NTHREADS];
  worker w[NTHREADS];
  for (int i = 0; i < NTHREADS; ++i) {
    w[i] = (worker){i, 0};
    if (pthread_create(&t[i], NULL, work, &w[i]) != 0) return 1;
  }
  unsigned long bad = 0;
  for (int i = 0; i < NTHREADS; ++i) {
    pthread_join(t[i], NULL);
    bad += w[i].mismatches;
  }
  acp_aircraft_free(ac);
  contract_models_free();
  printf("%d threads x %d argument sets: %zu outputs per pass, %zu model outputs, %lu mismatches\n",
         NTHREADS, NSETS, total, g_model_n, bad);
  return bad == 0 ? 0 : 1;
}
