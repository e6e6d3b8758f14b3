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


int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size);

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size) {
  double args[CONTRACT_MAX_ARGS];
  uint32_t choice;
  const size_t n = decode_doubles(data, size, args, CONTRACT_MAX_ARGS, &choice);
  contract c;
  contract_init(&c, args, n, choice, NULL, 0, contract_fuzz_violation);
  contract_run_foundation(&c);
  return 0;
}
