/* The aircraft text format: a strict subset of TOML 1.0 (docs/aircraft-format.md).
   Line by line, no allocation: the model is built in a copy on the stack and
   replaces the caller's only when the whole text is good. */
#if defined(__unix__) || defined(__APPLE__)
#define _POSIX_C_SOURCE 200809L /* open, fstat, fcntl, fdopen */
#define ACP_POSIX_FILES 1
#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>
#elif defined(_WIN32)
#include <sys/stat.h>
#endif
#include <locale.h>
#include <stdarg.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "acperf/aircraft.h"
#include "acperf/status.h"
#include "aircraft_internal.h"
#include "internal.h"

#define NUMBER_MAX 64   /* longest number token accepted */
#define MESSAGE_MAX 256 /* a model message (ac_set, ac_check) in full: at most about 170 bytes */

typedef struct {
  acp_aircraft ac;        /* the model being built */
  ac_component *cur;      /* component of the current table; NULL at the root */
  unsigned name_line;     /* line of the root key "name" */
  unsigned root_line[AK_COUNT];
  unsigned comp_line[ACP_AIRCRAFT_MAX_COMPONENTS][CK_COUNT];
  char *err;
  size_t errlen;
} parser;

/* Cut s after its last complete UTF-8 sequence: a message cut to the
   caller's buffer must not end inside a character (the text's own UTF-8,
   a name or a type, is valid: parse_line() checks it). */
static void utf8_cut(char *s) {
  size_t n = strlen(s), k = n;
  while (k > 0 && n - k < 3 && ((unsigned char)s[k - 1] & 0xC0) == 0x80) --k;
  if (k == 0) return;
  const unsigned char lead = (unsigned char)s[k - 1];
  const size_t len = lead >= 0xF0 ? 4 : lead >= 0xE0 ? 3 : lead >= 0xC0 ? 2 : 1;
  if (n - (k - 1) < len) s[k - 1] = '\0';
}

static int fail(parser *p, unsigned line, const char *fmt, ...) {
  va_list ap;
  va_start(ap, fmt);
  if (p->err && p->errlen > 0) {
    const int n = line ? snprintf(p->err, p->errlen, "line %u: ", line) : 0;
    if (n >= 0 && (size_t)n < p->errlen) vsnprintf(p->err + n, p->errlen - (size_t)n, fmt, ap);
    utf8_cut(p->err);
  }
  va_end(ap);
  return ACP_ERR_PARSE;
}

/* A character of the text for a message, never a raw byte above 0x7F (which
   alone is not UTF-8): "'x'" or "non-ASCII byte 0xC3". Control characters
   never get here (parse_line() refuses them first). */
typedef struct {
  char s[24];
} char_name;

static char_name name_char(char c) {
  char_name d;
  const unsigned char u = (unsigned char)c;
  if (u >= 0x80)
    snprintf(d.s, sizeof d.s, "non-ASCII byte 0x%02X", (unsigned)u);
  else
    snprintf(d.s, sizeof d.s, "character '%c'", c);
  return d;
}

static int is_ws(char c) { return c == ' ' || c == '\t'; }
static int is_bare(char c) {
  return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9') || c == '_' ||
         c == '-';
}
static int is_digit(char c) { return c >= '0' && c <= '9'; }

static size_t skip_ws(const char *s, size_t i, size_t n) {
  while (i < n && is_ws(s[i])) ++i;
  return i;
}

/* After a header or a value: only blanks and an optional comment may follow. */
static int rest_ok(const char *s, size_t i, size_t n) {
  i = skip_ws(s, i, n);
  return i == n || s[i] == '#';
}

/* Validate a TOML decimal integer or float in s[0..n) and convert it.
   Returns NULL when good, else what is wrong. */
static const char *parse_number(const char *s, size_t n, double *out) {
  if (n >= NUMBER_MAX) return "number too long";
  for (size_t k = 0; k < n; ++k)
    if (s[k] == '_') return "underscores in numbers are not supported";
  size_t i = 0;
  if (s[i] == '+' || s[i] == '-') ++i;
  if (i < n && (s[i] == 'i' || s[i] == 'n')) return "inf and nan are not allowed";
  if (i + 1 < n && s[i] == '0' && (s[i + 1] == 'x' || s[i + 1] == 'o' || s[i + 1] == 'b'))
    return "hexadecimal, octal and binary numbers are not supported";
  const size_t int_start = i;
  while (i < n && is_digit(s[i])) ++i;
  if (i == int_start) return "not a number";
  if (s[int_start] == '0' && i - int_start > 1) return "leading zeros are not allowed";
  const int integer = i == n; /* a TOML integer: -0 is 0, as tomllib reads it */
  if (i < n && s[i] == '.') {
    const size_t frac_start = ++i;
    while (i < n && is_digit(s[i])) ++i;
    if (i == frac_start) return "a digit must follow the decimal point";
  }
  if (i < n && (s[i] == 'e' || s[i] == 'E')) {
    ++i;
    if (i < n && (s[i] == '+' || s[i] == '-')) ++i;
    const size_t exp_start = i;
    while (i < n && is_digit(s[i])) ++i;
    if (i == exp_start) return "a digit must follow the exponent mark";
  }
  if (i != n) return "not a number";
  /* strtod reads the locale's decimal point: put it in place of '.'. */
  char buf[NUMBER_MAX];
  const char *dp = localeconv()->decimal_point;
  const char point = (dp && dp[0] && !dp[1]) ? dp[0] : '.';
  for (size_t k = 0; k < n; ++k) buf[k] = s[k] == '.' ? point : s[k];
  buf[n] = '\0';
  char *end;
  *out = strtod(buf, &end);
  if (end != buf + n) return "not a number";
  if (!isfinite(*out)) return "number out of the range of a double";
  if (integer && *out == 0.0) *out = 0.0;
  return NULL;
}

/* A [table] header in s[0..n), s[0] == '['. */
static int header(parser *p, const char *s, size_t n, unsigned line) {
  if (n > 1 && s[1] == '[') return fail(p, line, "arrays of tables ([[...]]) are not supported");
  const char *seg[3];
  size_t seglen[3], nseg = 0;
  size_t i = 1;
  for (;;) {
    i = skip_ws(s, i, n);
    if (i < n && (s[i] == '"' || s[i] == '\''))
      return fail(p, line, "quoted keys in table headers are not supported");
    const size_t start = i;
    while (i < n && is_bare(s[i])) ++i;
    if (i == start) {
      if (i >= n) return fail(p, line, "unterminated table header (missing ']')");
      return fail(p, line, "invalid %s in table header", name_char(s[i]).s);
    }
    if (nseg < 3) {
      seg[nseg] = s + start;
      seglen[nseg] = i - start;
    }
    ++nseg;
    i = skip_ws(s, i, n);
    if (i < n && s[i] == '.') {
      ++i;
      continue;
    }
    break;
  }
  if (i >= n) return fail(p, line, "unterminated table header (missing ']')");
  if (s[i] != ']') return fail(p, line, "invalid %s in table header", name_char(s[i]).s);
  if (!rest_ok(s, i + 1, n)) return fail(p, line, "unexpected text after the table header");
  if (nseg != 2 || seglen[0] != 9 || memcmp(seg[0], "component", 9) != 0)
    return fail(p, line, "unknown table: the only tables are [component.NAME]");
  if (seglen[1] >= ACP_COMPONENT_NAME_MAX)
    return fail(p, line, "component name longer than %d characters", ACP_COMPONENT_NAME_MAX - 1);
  ac_component *c = ac_find_component(&p->ac, seg[1], seglen[1]);
  if (c) return fail(p, line, "table [component.%s] defined twice (first on line %u)", c->name,
                     c->line);
  c = ac_add_component(&p->ac, seg[1], seglen[1]);
  if (!c) return fail(p, line, "too many components (at most %d)", ACP_AIRCRAFT_MAX_COMPONENTS);
  c->line = line;
  p->cur = c;
  return ACP_OK;
}

/* Store key = value; text is the string value or NULL for a number. */
static int assign(parser *p, const char *key, const char *text, double number, unsigned line) {
  char full[96], why[MESSAGE_MAX];
  unsigned *first = NULL;
  const char *table = p->cur ? p->cur->name : NULL;
  if (!p->cur) {
    if (strcmp(key, "name") == 0) {
      first = &p->name_line;
    } else {
      for (int k = 0; k < AK_COUNT; ++k)
        if (strcmp(key, AC_KEYS[k].name) == 0) first = &p->root_line[k];
    }
    if (!first) return fail(p, line, "unknown key '%s'", key);
    snprintf(full, sizeof full, "%s", key);
  } else {
    for (int f = 0; f < CK_COUNT; ++f)
      if (strcmp(key, COMP_KEYS[f].name) == 0)
        first = &p->comp_line[p->cur - p->ac.comp][f];
    if (!first) {
      /* A root key placed after a table header belongs to that table in TOML. */
      for (int k = 0; k < AK_COUNT; ++k)
        if (strcmp(key, AC_KEYS[k].name) == 0)
          return fail(p, line, "key '%s' belongs before the first [table] header, not in "
                               "[component.%s]", key, table);
      return fail(p, line, "unknown key '%s' in [component.%s]", key, table);
    }
    snprintf(full, sizeof full, "component.%s.%s", table, key);
  }
  if (*first) return fail(p, line, "duplicate key '%s' (first on line %u)", key, *first);
  const int is_text_key = p->cur ? strcmp(key, "type") == 0
                                  : strcmp(key, "name") == 0 || strcmp(key, "engine_type") == 0;
  if (is_text_key && !text) return fail(p, line, "key '%s' takes a quoted text", key);
  if (!is_text_key && text) return fail(p, line, "key '%s' takes a number, not text", key);
  why[0] = '\0';
  const int st = text ? ac_set_text(&p->ac, full, text, why, sizeof why)
                      : ac_set(&p->ac, full, number, why, sizeof why);
  if (st != ACP_OK) return fail(p, line, "%s", why);
  *first = line;
  return ACP_OK;
}

/* key = value in s[0..n), s[0] a non-blank character other than '[' and '#'. */
static int key_value(parser *p, const char *s, size_t n, unsigned line) {
  if (s[0] == '"' || s[0] == '\'') return fail(p, line, "quoted keys are not supported");
  size_t i = 0;
  while (i < n && is_bare(s[i])) ++i;
  if (i == 0) return fail(p, line, "invalid %s at the start of a key", name_char(s[0]).s);
  char key[48];
  if (i >= sizeof key) return fail(p, line, "key too long");
  memcpy(key, s, i);
  key[i] = '\0';
  if (i < n && !is_ws(s[i]) && s[i] != '=' && s[i] != '.')
    return fail(p, line, "invalid %s in a key, after '%s' (keys are ASCII letters, digits, '_' "
                         "and '-')", name_char(s[i]).s, key);
  i = skip_ws(s, i, n);
  if (i < n && s[i] == '.')
    return fail(p, line, "dotted keys are not supported; use a [component.NAME] table");
  if (i >= n || s[i] != '=') return fail(p, line, "expected '=' after key '%s'", key);
  i = skip_ws(s, i + 1, n);
  if (i >= n || s[i] == '#') return fail(p, line, "missing value for key '%s'", key);

  const char c = s[i];
  if (c == '"' || c == '\'') {
    if (i + 2 < n && s[i + 1] == c && s[i + 2] == c)
      return fail(p, line, "multi-line strings are not supported");
    const size_t start = ++i;
    while (i < n && s[i] != c) {
      if (c == '"' && s[i] == '\\')
        return fail(p, line, "escape sequences in strings are not supported");
      ++i;
    }
    if (i >= n) return fail(p, line, "unterminated string");
    char text[ACP_AIRCRAFT_NAME_MAX + 1];
    const size_t len = i - start;
    if (len >= sizeof text) return fail(p, line, "text longer than %d bytes", ACP_AIRCRAFT_NAME_MAX - 1);
    memcpy(text, s + start, len);
    text[len] = '\0';
    if (!rest_ok(s, i + 1, n)) return fail(p, line, "unexpected text after the value");
    return assign(p, key, text, 0.0, line);
  }
  if (c == '[') return fail(p, line, "arrays are not supported");
  if (c == '{') return fail(p, line, "inline tables are not supported");
  const size_t start = i;
  while (i < n && !is_ws(s[i]) && s[i] != '#') ++i;
  const size_t len = i - start;
  if ((len == 4 && memcmp(s + start, "true", 4) == 0) ||
      (len == 5 && memcmp(s + start, "false", 5) == 0))
    return fail(p, line, "booleans are not used by any key");
  double value;
  const char *why = parse_number(s + start, len, &value);
  if (why) return fail(p, line, "value of '%s': %s", key, why);
  if (!rest_ok(s, i, n)) return fail(p, line, "unexpected text after the value");
  return assign(p, key, NULL, value, line);
}

/* Length of the well-formed UTF-8 sequence at s[0..n) (s[0] >= 0x80), 0 when
   ill-formed: overlong forms, surrogates and code points above U+10FFFF are
   rejected as Python's UTF-8 decoder (and so tomllib) rejects them. */
static size_t utf8_length(const unsigned char *s, size_t n) {
  size_t len;
  unsigned lo = 0x80, hi = 0xBF;
  if (s[0] >= 0xC2 && s[0] <= 0xDF) {
    len = 2;
  } else if (s[0] >= 0xE0 && s[0] <= 0xEF) {
    len = 3;
    if (s[0] == 0xE0) lo = 0xA0;
    if (s[0] == 0xED) hi = 0x9F;
  } else if (s[0] >= 0xF0 && s[0] <= 0xF4) {
    len = 4;
    if (s[0] == 0xF0) lo = 0x90;
    if (s[0] == 0xF4) hi = 0x8F;
  } else {
    return 0;
  }
  if (len > n || s[1] < lo || s[1] > hi) return 0;
  for (size_t k = 2; k < len; ++k)
    if (s[k] < 0x80 || s[k] > 0xBF) return 0;
  return len;
}

/* One line, without its line feed; lf: it had one (a CR before it is a CRLF
   line end, a CR at the end of the text is not: TOML and tomllib refuse it). */
static int parse_line(parser *p, const char *s, size_t n, unsigned line, int lf) {
  if (lf && n > 0 && s[n - 1] == '\r') --n; /* CRLF */
  if (line == 1 && n >= 3 && memcmp(s, "\xEF\xBB\xBF", 3) == 0)
    return fail(p, line, "byte order mark (U+FEFF) at the start of the text is not allowed");
  for (size_t k = 0; k < n; ++k) {
    const unsigned char ch = (unsigned char)s[k];
    if (ch == '\r')
      return fail(p, line, "control character (code 13, a CR without a LF after it) not allowed");
    if ((ch < 0x20 && ch != '\t') || ch == 0x7f)
      return fail(p, line, "control character (code %u) not allowed", (unsigned)ch);
    if (ch >= 0x80) {
      const size_t len = utf8_length((const unsigned char *)s + k, n - k);
      if (!len) return fail(p, line, "text is not valid UTF-8");
      k += len - 1;
    }
  }
  const size_t i = skip_ws(s, 0, n);
  if (i == n || s[i] == '#') return ACP_OK;
  if (s[i] == '[') return header(p, s + i, n - i, line);
  return key_value(p, s + i, n - i, line);
}

static void parser_begin(parser *p, char *err, size_t errlen) {
  memset(p, 0, sizeof *p);
  ac_clear(&p->ac);
  p->err = err;
  p->errlen = errlen;
  if (err && errlen > 0) err[0] = '\0';
}

static int parser_end(parser *p, acp_aircraft *ac) {
  char why[MESSAGE_MAX];
  if (ac_check(&p->ac, why, sizeof why) != ACP_OK)
    return fail(p, 0, "incomplete aircraft at the end of the text: %s", why);
  memcpy(ac, &p->ac, sizeof *ac);
  ac_derive(ac);
  return ACP_OK;
}

int acp_aircraft_parse(acp_aircraft *ac, const char *text, char *err, size_t errlen) {
  if (err && errlen > 0) err[0] = '\0';
  if (!ac || !text) {
    if (err && errlen > 0) snprintf(err, errlen, "no aircraft or no text (NULL)");
    return ACP_ERR_INVALID;
  }
  parser p;
  parser_begin(&p, err, errlen);
  unsigned line = 0;
  const char *s = text;
  for (;;) {
    const char *nl = strchr(s, '\n');
    const size_t n = nl ? (size_t)(nl - s) : strlen(s);
    ++line;
    const int st = parse_line(&p, s, n, line, nl != NULL);
    if (st != ACP_OK) return st;
    if (!nl) break;
    s = nl + 1;
  }
  return parser_end(&p, ac);
}

/* fopen(path, "rb") of a regular file only: anything else (a FIFO, which
   blocks in open() or read() until a writer comes, a device, a directory) is
   refused; *not_regular tells which failure it was. */
static FILE *open_regular(const char *path, int *not_regular) {
  *not_regular = 0;
#ifdef ACP_POSIX_FILES
  const int fd = open(path, O_RDONLY | O_NONBLOCK | O_CLOEXEC); /* a FIFO opens at once */
  if (fd < 0) return NULL;
  struct stat st;
  FILE *f = NULL;
  if (fstat(fd, &st) == 0) {
    const int flags = fcntl(fd, F_GETFL);
    if (!S_ISREG(st.st_mode))
      *not_regular = 1;
    else if (flags >= 0 && fcntl(fd, F_SETFL, flags & ~O_NONBLOCK) == 0)
      f = fdopen(fd, "rb");
  }
  if (!f) close(fd);
  return f;
#else
  FILE *f = fopen(path, "rb");
#ifdef _WIN32
  struct _stat st;
  if (f && (_fstat(_fileno(f), &st) != 0 || (st.st_mode & _S_IFMT) != _S_IFREG)) {
    *not_regular = 1;
    fclose(f);
    return NULL;
  }
#endif
  return f;
#endif
}

int acp_aircraft_load(acp_aircraft *ac, const char *path, char *err, size_t errlen) {
  if (err && errlen > 0) err[0] = '\0';
  if (!ac || !path) {
    if (err && errlen > 0) snprintf(err, errlen, "no aircraft or no path (NULL)");
    return ACP_ERR_INVALID;
  }
  int not_regular;
  FILE *f = open_regular(path, &not_regular);
  if (!f) {
    if (err && errlen > 0)
      snprintf(err, errlen, not_regular ? "'%s' is not a regular file" : "cannot open '%s' for reading",
               path);
    return ACP_ERR_IO;
  }
  parser p;
  parser_begin(&p, err, errlen);
  char buf[ACP_AIRCRAFT_LINE_MAX];
  unsigned line = 0;
  int st = ACP_OK, ch = 0;
  while (st == ACP_OK && ch != EOF) {
    size_t n = 0;
    ++line;
    while ((ch = getc(f)) != EOF && ch != '\n') {
      if (ch == '\0') {
        st = fail(&p, line, "NUL character in the file");
        break;
      }
      if (n + 1 >= sizeof buf) {
        st = fail(&p, line, "line longer than %d bytes", ACP_AIRCRAFT_LINE_MAX - 1);
        break;
      }
      buf[n++] = (char)ch;
    }
    if (st == ACP_OK && ferror(f)) {
      if (err && errlen > 0) snprintf(err, errlen, "read error in '%s'", path);
      st = ACP_ERR_IO;
    }
    if (st == ACP_OK) st = parse_line(&p, buf, n, line, ch == '\n');
  }
  fclose(f);
  if (st != ACP_OK) return st;
  return parser_end(&p, ac);
}
