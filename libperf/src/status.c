/* Status codes and their names. */
#include "acperf/status.h"

const char *acp_strerror(int status) {
  switch (status) {
  case ACP_OK: return "success";
  case ACP_ERR_INVALID: return "invalid argument";
  case ACP_ERR_RANGE: return "outside the model's valid range";
  case ACP_ERR_NO_CONVERGENCE: return "no convergence";
  case ACP_ERR_THRUST: return "not enough thrust";
  case ACP_ERR_PARSE: return "parse error";
  case ACP_ERR_IO: return "input/output error";
  case ACP_ERR_MEMORY: return "out of memory";
  case ACP_ERR_UNKNOWN_KEY: return "unknown key or unit";
  default: return "unknown status code";
  }
}
