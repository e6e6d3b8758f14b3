/* Run-time version, so a program can detect a header/library mismatch. */
#include "acperf/version.h"

int acp_version(void) { return ACP_VERSION; }

const char *acp_version_string(void) { return ACP_VERSION_STRING; }
