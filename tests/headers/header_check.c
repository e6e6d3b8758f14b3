/* The umbrella header must compile alone as strict C11. */
#include <acperf.h>

int header_check_version(void);
int header_check_version(void) { return ACP_VERSION_AT_LEAST(0, 1, 0) ? acp_version() : -1; }
