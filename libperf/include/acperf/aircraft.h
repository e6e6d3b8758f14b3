/**
 * @file acperf/aircraft.h
 * @brief The aircraft model (opaque; create / free / set / get by key) and
 *        its text format, a strict subset of TOML.
 *
 * An aircraft holds what the drag polar needs: reference geometry, either a
 * single zero-lift drag coefficient `cd0` or a component drag build-up (up
 * to ACP_AIRCRAFT_MAX_COMPONENTS components, each a `[component.NAME]`
 * table of the text format), the induced-drag and compressibility
 * parameters and the clean maximum lift coefficient. Every key, its unit
 * and its valid range are listed in docs/aircraft-format.md.
 *
 * Keys (SI units; angles in radians):
 *  - aircraft level: `wing_area`, `span`, `cd0`, `oswald`, `cl_max`,
 *    `cl_min_drag`, `sweep_leading_edge`, `winglet_height`, `korn_kappa`,
 *    `wing_thickness_ratio`, `sweep_quarter_chord`, `cd_misc`,
 *    `leakage_fraction`; the text key `name`;
 *  - per component, as "component.NAME.FIELD": `type` (text "surface",
 *    "body", "nacelle", "other", or the codes ACP_COMPONENT_*), `wetted_area`,
 *    `length`, `thickness_ratio`, `max_thickness_position`,
 *    `sweep_max_thickness`, `fineness_ratio`, `interference`,
 *    `laminar_fraction`, `roughness`, `form_factor`, `count`;
 *  - read-only, derived (acp_aircraft_get only): `aspect_ratio`,
 *    `aspect_ratio_effective` (with the winglet), `oswald_estimate`
 *    (Raymer's estimate, see polar.h), `oswald_effective` (the e used),
 *    `induced_factor` (k), `component_count`.
 *
 * The model allocates only in acp_aircraft_new(); nothing else here
 * allocates. A model may be read from many threads at once; writing it
 * while another thread reads it is the caller's race.
 */
#ifndef ACPERF_AIRCRAFT_H
#define ACPERF_AIRCRAFT_H

#include <stddef.h>
#include "acperf/export.h"

#define ACP_AIRCRAFT_MAX_COMPONENTS 16 /**< components of one drag build-up, at most */
#define ACP_AIRCRAFT_NAME_MAX 64       /**< bytes of the `name` text, with its terminating NUL */
#define ACP_COMPONENT_NAME_MAX 32      /**< bytes of a component name, with its terminating NUL */
#define ACP_AIRCRAFT_LINE_MAX 4096     /**< longest line acp_aircraft_load() reads, with its newline */

/** Component types: the value of the key "component.NAME.type". */
enum acp_component_type {
  ACP_COMPONENT_SURFACE = 1, /**< wing, tail, strut, pylon: Raymer's lifting-surface form factor */
  ACP_COMPONENT_BODY = 2,    /**< fuselage, canopy, boom: Raymer's body form factor */
  ACP_COMPONENT_NACELLE = 3, /**< nacelle, external store: Raymer's nacelle form factor */
  ACP_COMPONENT_OTHER = 4    /**< anything else: a given form factor (default 1) */
};

ACP_BEGIN_DECLS

/**
 * Which of the aircraft's limits a flight function found exceeded (the
 * `limit` field of acp_profile, acp_profile_point and acp_cruise_result).
 * A limit is checked when its key is given; exceeding one is ACP_ERR_RANGE,
 * with the code and the excess (kg, m or the lift coefficient) in the
 * output. Which limits are errors and which are flags: docs/limits.md.
 */
enum acp_limit {
  ACP_LIMIT_NONE = 0,                 /**< inside every limit that is given */
  ACP_LIMIT_MASS_MAX_TAKEOFF = 1,     /**< a mass above mass_max_takeoff (excess kg) */
  ACP_LIMIT_MASS_OPERATING_EMPTY = 2, /**< a mass below mass_operating_empty, or fuel burnt
                                           to below it (excess kg); 1 kg when not given */
  ACP_LIMIT_MAX_ALTITUDE = 3,         /**< a pressure altitude above max_altitude (excess m) */
  ACP_LIMIT_CL_MAX = 4,               /**< 1 g lift coefficient above cl_max: below the stall
                                           (excess: CL - cl_max) */
  ACP_LIMIT_VMO = 5,                  /**< a CAS above vmo (excess m/s) */
  ACP_LIMIT_MMO = 6                   /**< a Mach number above mmo (excess in Mach) */
};

/** Opaque aircraft model. */
typedef struct acp_aircraft acp_aircraft;

/**
 * Create an empty aircraft (no keys set, no components).
 * @return the model, or NULL when memory is exhausted. Free with acp_aircraft_free().
 */
ACP_API acp_aircraft *acp_aircraft_new(void);

/** Free a model from acp_aircraft_new(); NULL is allowed and does nothing. */
ACP_API void acp_aircraft_free(acp_aircraft *ac);

/**
 * Copy one model onto another (both from acp_aircraft_new()).
 * @return ACP_OK; ACP_ERR_INVALID for a NULL pointer.
 */
ACP_API int acp_aircraft_copy(acp_aircraft *dst, const acp_aircraft *src);

/**
 * Set a numeric key.
 *
 * Setting a key "component.NAME.FIELD" of a component not yet in the model
 * adds it (its type must then be set too before the model is used).
 *
 * @param ac    the model
 * @param key   key name (see the file comment and docs/aircraft-format.md)
 * @param value value in the key's SI unit, finite and inside the key's range
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, a read-only key, a
 *         non-integer where a whole number is needed, a bad component name);
 *         ACP_ERR_UNKNOWN_KEY; ACP_ERR_RANGE (value outside the key's range,
 *         or a 17th component). The model is unchanged on error.
 */
ACP_API int acp_aircraft_set(acp_aircraft *ac, const char *key, double value);

/**
 * Read a numeric key.
 *
 * @param value out: the value given, else the key's default, else NaN
 *              (a key without default that was not given: ACP_OK and NaN).
 *              "component.NAME.type" reads as its code ACP_COMPONENT_*.
 * @return ACP_OK; ACP_ERR_INVALID (NULL); ACP_ERR_UNKNOWN_KEY (also for a
 *         component not in the model). *value is NaN on error.
 */
ACP_API int acp_aircraft_get(const acp_aircraft *ac, const char *key, double *value);

/**
 * Remove a key's value (back to its default or "not given"); the key
 * "component.NAME" removes that component.
 * @return ACP_OK; ACP_ERR_INVALID (NULL, read-only key); ACP_ERR_UNKNOWN_KEY.
 */
ACP_API int acp_aircraft_unset(acp_aircraft *ac, const char *key);

/**
 * Set a text key: "name" (at most ACP_AIRCRAFT_NAME_MAX - 1 bytes, printable),
 * "engine_type" ("turbofan", "turboprop", "piston") or "component.NAME.type"
 * ("surface", "body", "nacelle", "other").
 * @return ACP_OK; ACP_ERR_INVALID (NULL, bad text); ACP_ERR_UNKNOWN_KEY.
 */
ACP_API int acp_aircraft_set_text(acp_aircraft *ac, const char *key, const char *value);

/**
 * Read a text key ("name", "engine_type" or "component.NAME.type") into buf (len bytes).
 * An unset name reads as "". The text is cut to fit and always terminated.
 * @return ACP_OK; ACP_ERR_INVALID (NULL or len 0); ACP_ERR_UNKNOWN_KEY.
 */
ACP_API int acp_aircraft_get_text(const acp_aircraft *ac, const char *key, char *buf, size_t len);

/**
 * The index-th key that has a value given (not a default), in a fixed
 * order: aircraft keys, then each component's fields (type first). Lets a
 * caller list or save a model. Text keys ("name", "engine_type", "component.X.type") are
 * included; read them with acp_aircraft_get_text().
 *
 * @param index 0, 1, 2, ...
 * @param key   out: the key name, cut to fit len bytes and terminated
 * @return ACP_OK; ACP_ERR_INVALID (NULL or len 0); ACP_ERR_RANGE past the last key.
 */
ACP_API int acp_aircraft_key_at(const acp_aircraft *ac, size_t index, char *key, size_t len);

/**
 * Check that the model is complete and consistent enough to compute with:
 * wing_area and span; exactly one of cd0 or a component build-up; every
 * component with a type and the fields its type needs and none it does
 * not use; korn_kappa with wing_thickness_ratio. The drag functions make
 * the same check and return ACP_ERR_INVALID when it fails.
 *
 * @param err    out: what is missing or inconsistent (may be NULL)
 * @param errlen size of err
 * @return ACP_OK; ACP_ERR_INVALID.
 */
ACP_API int acp_aircraft_check(const acp_aircraft *ac, char *err, size_t errlen);

/**
 * Replace the model with the aircraft described by a text in the aircraft
 * text format (docs/aircraft-format.md): `key = value` lines, `#`
 * comments, root keys first, then `[component.NAME]` tables. A strict
 * subset of TOML 1.0: every text accepted here reads the same with
 * Python's tomllib. Anything else is a parse error naming the line.
 *
 * Numbers are TOML decimal integers or floats (no underscores, no inf/nan,
 * no hex). Strings are TOML basic strings without escapes, or literal
 * strings. Keys are bare keys; a key twice in one table, a table twice,
 * an unknown key and a value outside its range are errors. After the
 * last line the model is checked as by acp_aircraft_check(). The text must
 * be valid UTF-8 without control characters other than tab (as TOML), with
 * LF or CRLF line ends (a CR without a LF after it, also at the very end,
 * is an error) and no byte order mark. The integer -0 reads as 0, the
 * float -0.0 as -0.0 (as tomllib). Numbers are read with strtod() with '.'
 * put in place of the current C locale's decimal point, so a program's
 * setlocale() does not change them; the numbers in err are written with
 * '.' whatever the locale. err is valid UTF-8 also when cut to errlen: a
 * byte of the text outside ASCII is named in hex ("non-ASCII byte 0xC3").
 *
 * @param ac     the model; unchanged on error
 * @param text   NUL-terminated text
 * @param err    out: "line N: what is wrong" on error, "" on success (may be NULL)
 * @param errlen size of err
 * @return ACP_OK; ACP_ERR_INVALID (NULL ac or text); ACP_ERR_PARSE (syntax,
 *         unknown key, wrong type of value, value out of range, incomplete model).
 */
ACP_API int acp_aircraft_parse(acp_aircraft *ac, const char *text, char *err, size_t errlen);

/**
 * Read an aircraft text file (see acp_aircraft_parse()). Lines are read
 * into a fixed buffer: a line longer than ACP_AIRCRAFT_LINE_MAX - 1 bytes
 * is a parse error. No memory is allocated.
 *
 * @return as acp_aircraft_parse(), and ACP_ERR_IO when the file cannot be
 *         opened or read, or is not a regular file (a FIFO, a device or a
 *         directory is refused without reading from it, so a FIFO without a
 *         writer does not block); err says which.
 */
ACP_API int acp_aircraft_load(acp_aircraft *ac, const char *path, char *err, size_t errlen);

/**
 * Name of the index-th component (in the order of the text or of creation).
 * @return ACP_OK; ACP_ERR_INVALID (NULL, len 0); ACP_ERR_RANGE (no such index).
 */
ACP_API int acp_aircraft_component(const acp_aircraft *ac, size_t index, char *name, size_t len);

ACP_END_DECLS

#endif /* ACPERF_AIRCRAFT_H */
