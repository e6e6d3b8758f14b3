/* Contract of status.h and version.h: every code has a name, the run-time
   version agrees with the headers. */
#include <limits.h>
#include <math.h>
#include <string.h>

#include "acperf.h"
#include "contract.h"

/* Status values are ABI (status.h: "never change meaning"); statuses are
   returned as int, so abidiff does not see the enum: pin it here. */
_Static_assert(ACP_OK == 0 && ACP_ERR_INVALID == 1 && ACP_ERR_RANGE == 2 &&
                   ACP_ERR_NO_CONVERGENCE == 3 && ACP_ERR_THRUST == 4 && ACP_ERR_PARSE == 5 &&
                   ACP_ERR_IO == 6 && ACP_ERR_MEMORY == 7 && ACP_ERR_UNKNOWN_KEY == 8,
               "status codes are part of the ABI");

void contract_status(contract *c) {
  /* Any int, including ones a caller makes up, names something. */
  const double x = contract_arg(c);
  const int code = (isfinite(x) && fabs(x) < 2e9) ? (int)x : (int)contract_pick(c, 64) - 8;
  const int probes[] = {code, INT_MIN, INT_MAX, -1, 0, ACP_ERR_UNKNOWN_KEY + 1};
  for (size_t i = 0; i < sizeof probes / sizeof probes[0]; ++i) {
    const char *s = acp_strerror(probes[i]);
    c->calls++;
    contract_expect(c, s != NULL && s[0] != '\0', "acp_strerror", "NULL or empty name");
    if (!s) continue;
    const int known = probes[i] >= ACP_OK && probes[i] <= ACP_ERR_UNKNOWN_KEY;
    contract_expect(c, known == (strcmp(s, "unknown status code") != 0), "acp_strerror",
                    "a defined code without its own name, or an undefined one with a name");
    contract_record(c, (double)strlen(s));
  }
  c->calls += 2;
  contract_expect(c, acp_version() == ACP_VERSION, "acp_version", "differs from ACP_VERSION");
  const char *v = acp_version_string();
  contract_expect(c, v != NULL && strcmp(v, ACP_VERSION_STRING) == 0, "acp_version_string",
                  "differs from ACP_VERSION_STRING");
}
