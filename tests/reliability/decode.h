/* Turn fuzzer bytes into doubles that reach every corner of the API: each
   9-byte record is a tag and 8 bytes. The tag chooses raw IEEE bits (NaN
   payloads, infinities, denormals, huge values), a documented edge of the
   API or the next double on either side of it, or a value spread over the
   physical ranges. */
#ifndef ACPERF_RELIABILITY_DECODE_H
#define ACPERF_RELIABILITY_DECODE_H

#include <math.h>
#include <stddef.h>
#include <stdint.h>
#include <string.h>

#include "acperf.h"

/* Documented edges and special values (add the edges of new modules here). */
static const double DECODE_EDGES[] = {
    0.0, -0.0, 1.0, -1.0, 0.5, 0x1p-1074, 0x1p-1022, 1.7976931348623157e308,
    ACP_ISA_HP_MIN, ACP_ISA_HP_MAX, ACP_ISA_DTEMP_MIN, ACP_ISA_DTEMP_MAX, 11000.0, 20000.0,
    32000.0, 47000.0, 51000.0, 71000.0, -10000.0, 1.0e6, 0.37338, 177687.0, 101325.0,
    80000.0, 110000.0, 288.15, 216.65, 186.946, 1.225, ACP_MACH_MAX, 0.875, 1.0,
    ACP_A0, 5.0 * ACP_A0, 0.89292915873785409, 31.6506, ACP_REYNOLDS_MIN, ACP_REYNOLDS_MAX,
    1.5e-6, 6.3e-6, 6.283185307179586, 3.141592653589793, 1.5707963267948966, 100.0,
    250.0, 450.0,
};
#define DECODE_NEDGES (sizeof DECODE_EDGES / sizeof DECODE_EDGES[0])

static inline double decode_one(const uint8_t *p) {
  uint64_t bits;
  memcpy(&bits, p + 1, sizeof bits);
  double raw;
  memcpy(&raw, &bits, sizeof raw);
  const double edge = DECODE_EDGES[bits % DECODE_NEDGES];
  const double u = (double)(bits >> 11) * 0x1p-53; /* uniform in [0, 1) */
  switch (p[0] % 8) {
  case 0: return raw;
  case 1: return edge;
  case 2: return nextafter(edge, HUGE_VAL);
  case 3: return nextafter(edge, -HUGE_VAL);
  case 4: return -10000.0 + 100000.0 * u;          /* altitudes */
  case 5: return -150.0 + 3000.0 * u;              /* speeds, temperatures, deviations */
  case 6: return pow(10.0, -8.0 + 20.0 * u);       /* positive, many decades */
  default: return edge * (1.0 + (u - 0.5) * 1e-6); /* near an edge */
  }
}

/* Decode up to max doubles; returns the count. The last 4 bytes (if any left
   over) are the selector word. */
static inline size_t decode_doubles(const uint8_t *data, size_t size, double *out, size_t max,
                                    uint32_t *choice) {
  size_t n = 0;
  *choice = 0;
  while (size >= 9 && n < max) {
    out[n++] = decode_one(data);
    data += 9;
    size -= 9;
  }
  for (size_t i = 0; i < size && i < 4; ++i) *choice |= (uint32_t)data[i] << (8 * i);
  return n;
}

#endif
