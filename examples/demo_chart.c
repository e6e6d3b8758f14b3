/* SVG drag-curve chart: parasite, induced and total drag against speed, VMD and
   VMR marked, the speed-unstable region shaded. */
#include "demo_chart.h"

#include <math.h>

#define W 760.0
#define H 460.0
#define LEFT 70.0
#define RIGHT 20.0
#define TOP 40.0
#define BOTTOM 60.0

static double max_of(const double *v, size_t n) {
  double m = 0.0;
  for (size_t i = 0; i < n; ++i)
    if (isfinite(v[i]) && v[i] > m) m = v[i];
  return m;
}

/* A round step near range/6 for the axis ticks. */
static double tick_step(double range) {
  const double raw = range / 6.0, mag = pow(10.0, floor(log10(raw)));
  const double f = raw / mag;
  return (f < 1.5 ? 1.0 : f < 3.5 ? 2.0 : f < 7.5 ? 5.0 : 10.0) * mag;
}

static void polyline(FILE *f, const drag_chart *c, const double *y, double x0, double x1,
                     double ymax, const char *colour, const char *dash) {
  fprintf(f, "<polyline fill=\"none\" stroke=\"%s\" stroke-width=\"2\"%s points=\"", colour, dash);
  for (size_t i = 0; i < c->n; ++i) {
    if (!isfinite(y[i]) || !isfinite(c->speed_kt[i])) continue;
    const double px = LEFT + (c->speed_kt[i] - x0) / (x1 - x0) * (W - LEFT - RIGHT);
    const double py = H - BOTTOM - y[i] / ymax * (H - TOP - BOTTOM);
    fprintf(f, "%.1f,%.1f ", px, py);
  }
  fprintf(f, "\"/>\n");
}

static void marker(FILE *f, double x, double x0, double x1, const char *label) {
  if (!isfinite(x)) return;
  const double px = LEFT + (x - x0) / (x1 - x0) * (W - LEFT - RIGHT);
  fprintf(f, "<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"#444\" "
             "stroke-dasharray=\"4 3\"/>\n", px, TOP, px, H - BOTTOM);
  fprintf(f, "<text x=\"%.1f\" y=\"%.1f\" font-size=\"12\" text-anchor=\"middle\">%s %.0f kt</text>\n",
          px, TOP - 6.0, label, x);
}

int write_drag_chart_svg(FILE *f, const drag_chart *c) {
  if (!f || !c || c->n < 2) return 1;
  const double x0 = c->speed_kt[0], x1 = c->speed_kt[c->n - 1];
  const double ymax_raw = max_of(c->total, c->n);
  if (!(x1 > x0) || !(ymax_raw > 0.0)) return 1;
  const double ystep = tick_step(ymax_raw), ymax = ceil(ymax_raw / ystep) * ystep;
  const double xstep = tick_step(x1 - x0);
  fprintf(f, "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"%.0f\" height=\"%.0f\" "
             "font-family=\"sans-serif\">\n", W, H);
  fprintf(f, "<rect width=\"100%%\" height=\"100%%\" fill=\"white\"/>\n");
  if (isfinite(c->unstable_below_kt) && c->unstable_below_kt > x0) {
    const double px = LEFT + (fmin(c->unstable_below_kt, x1) - x0) / (x1 - x0) * (W - LEFT - RIGHT);
    fprintf(f, "<rect x=\"%.1f\" y=\"%.1f\" width=\"%.1f\" height=\"%.1f\" fill=\"#f3d9d9\"/>\n",
            LEFT, TOP, px - LEFT, H - TOP - BOTTOM);
    fprintf(f, "<text x=\"%.1f\" y=\"%.1f\" font-size=\"12\" fill=\"#a33\">speed unstable</text>\n",
            LEFT + 6.0, TOP + 16.0);
  }
  for (double y = 0.0; y <= ymax + 1e-9; y += ystep) {
    const double py = H - BOTTOM - y / ymax * (H - TOP - BOTTOM);
    fprintf(f, "<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"#ddd\"/>\n", LEFT, py,
            W - RIGHT, py);
    fprintf(f, "<text x=\"%.1f\" y=\"%.1f\" font-size=\"11\" text-anchor=\"end\">%g</text>\n",
            LEFT - 6.0, py + 4.0, y);
  }
  for (double x = ceil(x0 / xstep) * xstep; x <= x1 + 1e-9; x += xstep) {
    const double px = LEFT + (x - x0) / (x1 - x0) * (W - LEFT - RIGHT);
    fprintf(f, "<text x=\"%.1f\" y=\"%.1f\" font-size=\"11\" text-anchor=\"middle\">%g</text>\n", px,
            H - BOTTOM + 16.0, x);
  }
  fprintf(f, "<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"black\"/>\n", LEFT,
          H - BOTTOM, W - RIGHT, H - BOTTOM);
  fprintf(f, "<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"black\"/>\n", LEFT, TOP,
          LEFT, H - BOTTOM);
  polyline(f, c, c->parasite, x0, x1, ymax, "#1f77b4", "");
  polyline(f, c, c->induced, x0, x1, ymax, "#2ca02c", "");
  polyline(f, c, c->total, x0, x1, ymax, "#000000", "");
  marker(f, c->vmd_kt, x0, x1, "VMD");
  marker(f, c->vmr_kt, x0, x1, "VMR");
  fprintf(f, "<text x=\"%.1f\" y=\"%.1f\" font-size=\"12\" text-anchor=\"middle\">%s</text>\n",
          (LEFT + W - RIGHT) / 2.0, H - 18.0, c->x_label);
  fprintf(f, "<text x=\"16\" y=\"%.1f\" font-size=\"12\" transform=\"rotate(-90 16 %.1f)\" "
             "text-anchor=\"middle\">drag (kN)</text>\n", (TOP + H - BOTTOM) / 2.0,
          (TOP + H - BOTTOM) / 2.0);
  fprintf(f, "<text x=\"%.1f\" y=\"18\" font-size=\"14\" text-anchor=\"middle\">%s</text>\n",
          W / 2.0, c->title);
  const char *names[] = {"parasite", "induced", "total"};
  const char *colours[] = {"#1f77b4", "#2ca02c", "#000000"};
  for (int i = 0; i < 3; ++i) {
    const double ly = TOP + 14.0 + 16.0 * i;
    fprintf(f, "<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"%s\" stroke-width=\"2\"/>\n",
            W - RIGHT - 110.0, ly, W - RIGHT - 90.0, ly, colours[i]);
    fprintf(f, "<text x=\"%.1f\" y=\"%.1f\" font-size=\"12\">%s</text>\n", W - RIGHT - 84.0, ly + 4.0,
            names[i]);
  }
  fprintf(f, "<text x=\"%.1f\" y=\"%.1f\" font-size=\"10\" fill=\"#666\">Engineering estimate, "
             "not approved flight-manual data.</text>\n", LEFT, H - 4.0);
  fprintf(f, "</svg>\n");
  return ferror(f) ? 1 : 0;
}
