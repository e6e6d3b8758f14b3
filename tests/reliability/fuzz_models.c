/* libFuzzer target: every public function of the model modules
   (contract_modules.h: CONTRACT_MODEL: aircraft model, polar, schedule,
   propulsion, speeds, climb, cruise, mission) with arbitrary doubles on the
   demo aircraft (parsed once, shared read-only) and on private copies with
   fuzzed keys, checked against the documented contract (contract.h). The
   expensive functions (speeds, glide, climbs, ceilings, cruise, trips) run
   on 1 input in ACPERF_FUZZ_SAMPLE (default 8), chosen by the input itself,
   so a bounded run still tries many inputs. A violation aborts. */
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "contract.h"
#include "decode.h"

#ifndef ACPERF_EXAMPLES_DIR
#error "ACPERF_EXAMPLES_DIR (the examples/ directory with aircraft/) must be defined"
#endif

static unsigned g_sample = 8;

static void on_violation(contract *c, const char *message) {
  (void)c;
  static char seen[64][48];
  static int nseen = -1;
  if (nseen < 0) nseen = getenv("ACPERF_FUZZ_KEEP_GOING") ? 0 : 64;
  if (nseen >= 64) {
    fprintf(stderr, "contract violation: %s\n", message);
    abort();
  }
  for (int i = 0; i < nseen; ++i)
    if (strncmp(seen[i], message, 40) == 0) return;
  strncpy(seen[nseen], message, 40);
  seen[nseen++][40] = '\0';
  fprintf(stderr, "contract violation: %s\n", message);
}

int LLVMFuzzerInitialize(int *argc, char ***argv);
int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size);

int LLVMFuzzerInitialize(int *argc, char ***argv) {
  (void)argc;
  (void)argv;
  const char *s = getenv("ACPERF_FUZZ_SAMPLE");
  if (s) g_sample = (unsigned)strtoul(s, NULL, 10);
  if (contract_models_init(ACPERF_EXAMPLES_DIR) != 0) abort();
  return 0;
}

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size) {
  double args[CONTRACT_MAX_ARGS];
  uint32_t choice;
  const size_t n = decode_doubles(data, size, args, CONTRACT_MAX_ARGS, &choice);
  contract c;
  contract_init(&c, args, n, choice, NULL, 0, on_violation);
  c.sample = g_sample;
  contract_run_models(&c);
  return 0;
}
