/**
 * @file acperf.h
 * @brief Umbrella header of acperf, the aircraft performance library.
 *
 * Results are engineering estimates, not approved flight-manual data.
 * Operational use defers to the aircraft's approved data, the operator's
 * approved procedures and the local aviation authority's rules.
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
