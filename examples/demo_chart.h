/* SVG chart of a drag curve for the demo report (plain text output, no library). */
#ifndef ACPERF_DEMO_CHART_H
#define ACPERF_DEMO_CHART_H

#include <stddef.h>
#include <stdio.h>

typedef struct {
  const char *title;
  size_t n;
  const double *speed_kt;                  /* x: speed, kt */
  const double *parasite, *induced, *total; /* y: drag, kN */
  double vmd_kt, vmr_kt;                   /* marked speeds */
  double unstable_below_kt;                /* shaded: speed-unstable region (below VMD) */
  const char *x_label;
} drag_chart;

/* Write the chart as a standalone SVG document; 0 on success. */
int write_drag_chart_svg(FILE *f, const drag_chart *c);

#endif /* ACPERF_DEMO_CHART_H */
