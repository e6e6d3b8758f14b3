/**
 * @file acperf/status.h
 * @brief Status codes returned by every acperf function that can fail.
 *
 * Functions that can fail return an int status and give their results
 * through out-pointers; on failure those outputs are set to NaN. Scalar
 * convenience functions return NaN on failure instead of a status.
 */
#ifndef ACPERF_STATUS_H
#define ACPERF_STATUS_H

#include "acperf/export.h"

ACP_BEGIN_DECLS

/** Status codes. Values are part of the ABI and never change meaning. */
enum acp_status {
  ACP_OK = 0,               /**< success */
  ACP_ERR_INVALID = 1,      /**< invalid argument: NaN, infinite, NULL, negative where impossible */
  ACP_ERR_RANGE = 2,        /**< argument or result outside the model's valid range */
  ACP_ERR_NO_CONVERGENCE = 3, /**< an iteration did not converge */
  ACP_ERR_THRUST = 4,       /**< not enough thrust for the requested condition */
  ACP_ERR_PARSE = 5,        /**< malformed input text */
  ACP_ERR_IO = 6,           /**< file could not be read */
  ACP_ERR_MEMORY = 7,       /**< allocation failed (model create only) */
  ACP_ERR_UNKNOWN_KEY = 8   /**< unknown model key or unit name */
};

/**
 * Human-readable name of a status code.
 *
 * @param status a status code returned by an acperf function
 * @return a static string; never NULL. Unknown codes give
 *         "unknown status code".
 */
ACP_API const char *acp_strerror(int status);

ACP_END_DECLS

#endif /* ACPERF_STATUS_H */
