/* The standard atmosphere's layer table and helpers shared with airspeed.c. */
#ifndef ACPERF_ATMOSPHERE_LAYERS_H
#define ACPERF_ATMOSPHERE_LAYERS_H

#define ATM_NLAYERS 7

typedef struct {
  double h;        /* base geopotential altitude, m */
  double lapse;    /* temperature gradient, K/m */
  double t;        /* base temperature, K */
  double p;        /* base pressure, Pa */
  double exponent; /* -g0/(R lapse); 0 in isothermal layers */
} atm_layer;

extern const atm_layer ATM_LAYERS[ATM_NLAYERS];

/* ACP_OK when hp and dtemp are finite and inside the model, else a status. */
int atm_check(double hp, double dtemp);

/* Standard temperature and pressure at a range-checked pressure altitude. */
void atm_standard(double hp, double *temperature, double *pressure);

/* Array path: standard temperature + dtemp and pressure of n <= ACP_BLOCK points
   (dtemp may be NULL); NaN for invalid points, whose count is returned. */
#include <stddef.h>
size_t atm_block(size_t n, const double *hp, const double *dtemp, double *t, double *p);

#endif /* ACPERF_ATMOSPHERE_LAYERS_H */
