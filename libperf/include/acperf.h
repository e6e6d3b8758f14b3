/**
 * @file acperf.h
 * @brief Umbrella header of acperf, the aircraft performance library.
 *
 * Results are engineering estimates, not approved flight-manual data.
 * Operational use defers to the aircraft's approved data, the operator's
 * approved procedures and the local aviation authority's rules.
 *
 * Array forms (every `acp_<name>_n()` function and acp_drag_curve()):
 *  1. `(size_t n, const double *in..., double *out...)`: n contiguous
 *     elements per array; element i of each output is computed from element
 *     i of each input. An optional input (documented so, e.g. dtemp) may be
 *     NULL; a NULL output is not wanted and not written.
 *  2. Each returns the number of invalid elements; their outputs are NaN.
 *  3. In place: an output may be exactly one of the inputs (the same
 *     pointer, as numpy's `out=`); the results are those of separate arrays.
 *     Arrays that overlap otherwise (an output starting inside an input at
 *     another element) are not supported. Outputs must not overlap each
 *     other.
 *  4. Bounded work: when a required input (or the model) is NULL, every
 *     element is invalid: the call sets the given outputs to NaN and returns
 *     n without evaluating anything, so with every output NULL too it
 *     returns at once whatever n is.
 */
#ifndef ACPERF_H
#define ACPERF_H

#include "acperf/export.h"
#include "acperf/version.h"
#include "acperf/status.h"
#include "acperf/units.h"
#include "acperf/atmosphere.h"
#include "acperf/airspeed.h"
#include "acperf/friction.h"
#include "acperf/schedule.h"
#include "acperf/propulsion.h"
#include "acperf/climb.h"
#include "acperf/aircraft.h"
#include "acperf/polar.h"
#include "acperf/speeds.h"
#include "acperf/cruise.h"
#include "acperf/mission.h"

#endif /* ACPERF_H */
