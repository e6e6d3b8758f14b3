/* An outside program using the installed library: checks one standard value. */
#include <acperf.h>
#include <math.h>
#include <stdio.h>

int main(void) {
  acp_atmos a;
  if (acp_isa(11000.0, 0.0, &a) != ACP_OK) return 1;
  /* ISO 2533: 216.65 K and 22,632 Pa at the 11 km tropopause. */
  if (fabs(a.temperature - 216.65) > 1e-9 || fabs(a.pressure - 22632.04) > 0.01) return 2;
  if (acp_version() != ACP_VERSION) return 3;
  printf("consumer ok: acperf %s\n", acp_version_string());
  return 0;
}
