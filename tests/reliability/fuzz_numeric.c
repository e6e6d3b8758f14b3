/* libFuzzer target: every public numeric function of the foundation modules
   (contract_modules.h: CONTRACT_MODULE) with arbitrary doubles, checked against the documented contract
   (contract.h). A violation prints the function and inputs and aborts, so
   libFuzzer keeps the input as a crash artifact. */
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>

#include "contract.h"
#include "decode.h"

#include <string.h>

/* ACPERF_FUZZ_KEEP_GOING=1 reports each kind of violation once and goes on
   (for surveying a new module); otherwise the first violation aborts. */
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

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size);

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size) {
  double args[CONTRACT_MAX_ARGS];
  uint32_t choice;
  const size_t n = decode_doubles(data, size, args, CONTRACT_MAX_ARGS, &choice);
  contract c;
  contract_init(&c, args, n, choice, NULL, 0, on_violation);
  contract_run_foundation(&c);
  return 0;
}
