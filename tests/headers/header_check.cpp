// The umbrella header must compile as C++ and link through extern "C".
#include <acperf.h>

#include <cmath>

int main() {
  acp_atmos a;
  if (acp_isa(0.0, 0.0, &a) != ACP_OK) return 1;
  if (std::fabs(a.pressure - 101325.0) > 1e-9) return 2;
  return acp_version() == ACP_VERSION ? 0 : 3;
}
