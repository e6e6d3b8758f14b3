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
  contract_init(&c, args, n, choice, NULL, 0, contract_fuzz_violation);
  c.sample = g_sample;
  contract_run_models(&c);
  return 0;
}
