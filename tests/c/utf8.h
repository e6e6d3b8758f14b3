/* UTF-8 well-formedness for the tests of error texts (test_aircraft.c, the
   parser's fuzz target): written from RFC 3629 (section 4, the syntax of
   UTF-8 byte sequences) apart from the library's own check, which it judges.
   No check values here. Plain C, no test framework. */
#ifndef ACPERF_TEST_UTF8_H
#define ACPERF_TEST_UTF8_H

#include <stddef.h>

/* s is well-formed UTF-8 (RFC 3629: no overlong forms, no surrogates, at
   most U+10FFFF). */
static inline int utf8_valid(const char *s) {
  for (const unsigned char *u = (const unsigned char *)s; *u;) {
    const unsigned c = u[0];
    if (c < 0x80) {
      ++u;
      continue;
    }
    const size_t len = c >= 0xC2 && c <= 0xDF ? 2 : c >= 0xE0 && c <= 0xEF ? 3
                     : c >= 0xF0 && c <= 0xF4 ? 4 : 0;
    const unsigned lo = c == 0xE0 ? 0xA0 : c == 0xF0 ? 0x90 : 0x80;
    const unsigned hi = c == 0xED ? 0x9F : c == 0xF4 ? 0x8F : 0xBF;
    if (len == 0 || u[1] < lo || u[1] > hi) return 0;
    for (size_t k = 2; k < len; ++k)
      if (u[k] < 0x80 || u[k] > 0xBF) return 0;
    u += len;
  }
  return 1;
}

#endif /* ACPERF_TEST_UTF8_H */
