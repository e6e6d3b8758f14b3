/* libFuzzer target: the aircraft text parser, acp_aircraft_parse().

   Checked on every input (abort on violation):
   - the status is ACP_OK or ACP_ERR_PARSE;
   - the error text fits its buffer, is terminated, leaves the bytes past
     errlen alone, is "" on success, says something on error and is valid
     UTF-8 (also when cut to the buffer);
   - on error the model is unchanged (a preset aircraft survives);
   - on success the model passes acp_aircraft_check(), its geometry is
     finite and positive, and a drag evaluation at a cruise-like condition
     gives a documented status and finite, non-negative parts;
   - parsing the same text again into a fresh model gives the same status
     and message (no hidden state). */
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "acperf.h"
#include "../c/utf8.h"

#define CHECK(cond, what)                                                     \
  do {                                                                        \
    if (!(cond)) {                                                            \
      fprintf(stderr, "aircraft parse contract violation: %s\n", what);      \
      abort();                                                                \
    }                                                                         \
  } while (0)

/* An invented minimal aircraft the failed parses must leave in place. */
static const char PRESET[] = "wing_area = 20.0\nspan = 12.0\ncd0 = 0.025\noswald = 0.8\n";

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size);

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size) {
  static const size_t ERRLENS[] = {0, 1, 9, 64, 256};
  enum { GUARD = 16 };
  char *text = malloc(size + 1);
  if (!text) return 0;
  memcpy(text, data, size);
  text[size] = '\0';

  acp_aircraft *ac = acp_aircraft_new();
  acp_aircraft *fresh = acp_aircraft_new();
  CHECK(ac && fresh, "acp_aircraft_new failed");
  CHECK(acp_aircraft_parse(ac, PRESET, NULL, 0) == ACP_OK, "preset aircraft refused");

  char err[256 + GUARD], err2[256 + GUARD];
  const size_t errlen = ERRLENS[size % 5];
  memset(err, 0x5a, sizeof err);
  const int st = acp_aircraft_parse(ac, text, errlen ? err : NULL, errlen);
  CHECK(st == ACP_OK || st == ACP_ERR_PARSE, "status other than ACP_OK or ACP_ERR_PARSE");
  for (size_t i = errlen; i < sizeof err; ++i) CHECK(err[i] == 0x5a, "wrote past errlen");
  if (errlen > 0) {
    CHECK(memchr(err, '\0', errlen) != NULL, "error text not terminated");
    if (st == ACP_OK) CHECK(err[0] == '\0', "error text on success");
    if (st != ACP_OK && errlen > 1) CHECK(err[0] != '\0', "empty error text on error");
    CHECK(utf8_valid(err), "error text not valid UTF-8");
  }

  double v;
  if (st != ACP_OK) {
    CHECK(acp_aircraft_get(ac, "wing_area", &v) == ACP_OK && v == 20.0, "model changed on error");
    CHECK(acp_aircraft_get(ac, "cd0", &v) == ACP_OK && v == 0.025, "model changed on error");
  } else {
    char why[128];
    CHECK(acp_aircraft_check(ac, why, sizeof why) == ACP_OK, "accepted text fails the check");
    CHECK(acp_aircraft_get(ac, "wing_area", &v) == ACP_OK && isfinite(v) && v > 0.0,
          "wing_area not finite and positive");
    CHECK(acp_aircraft_get(ac, "span", &v) == ACP_OK && isfinite(v) && v > 0.0,
          "span not finite and positive");
    acp_drag_parts d;
    const int dst = acp_drag(ac, 20000.0, 9000.0, 0.0, 200.0, &d);
    CHECK(dst == ACP_OK || dst == ACP_ERR_RANGE, "drag of a parsed aircraft: undocumented status");
    if (dst == ACP_OK)
      CHECK(isfinite(d.total) && d.total >= 0.0 && isfinite(d.induced) && d.induced >= 0.0 &&
                isfinite(d.parasite) && d.parasite >= 0.0,
            "drag of a parsed aircraft not finite and non-negative");
    else
      CHECK(isnan(d.total) && isnan(d.parasite), "drag outputs not NaN on error");
  }

  /* Same text, fresh model, full-size buffer: same answer. */
  memset(err2, 0, sizeof err2);
  const int st2 = acp_aircraft_parse(fresh, text, err2, 256);
  CHECK(st2 == st, "status depends on the model parsed into");
  if (errlen == 256) CHECK(strcmp(err, err2) == 0, "message differs between two parses");

  acp_aircraft_free(ac);
  acp_aircraft_free(fresh);
  free(text);
  return 0;
}
