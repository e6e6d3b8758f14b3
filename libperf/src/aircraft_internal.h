/* The aircraft model's layout and key tables, shared by aircraft.c,
   aircraft_parse.c, polar.c and speeds.c. Not installed, not exported: the
   public type is opaque (acperf/aircraft.h). */
#ifndef ACPERF_AIRCRAFT_INTERNAL_H
#define ACPERF_AIRCRAFT_INTERNAL_H

#include <stddef.h>

#include "acperf/aircraft.h"
#include "acperf/atmosphere.h"
#include "acperf/polar.h"

/* Aircraft-level numeric keys: index into acp_aircraft.v. */
enum ac_key {
  AK_WING_AREA,
  AK_SPAN,
  AK_CD0,
  AK_OSWALD,
  AK_CL_MAX,
  AK_CL_MIN_DRAG,
  AK_SWEEP_LE,
  AK_WINGLET_HEIGHT,
  AK_KORN_KAPPA,
  AK_THICKNESS_RATIO, /* wing_thickness_ratio, for the Korn equation */
  AK_SWEEP_QC,
  AK_CD_MISC,
  AK_LEAKAGE,
  /* propulsion (propulsion.c) */
  AK_ENGINE_TYPE, /* 1 turbofan, 2 turboprop, 3 piston; text in the file */
  AK_ENGINE_COUNT,
  AK_ENGINE_THRUST,
  AK_THROTTLE_RATIO,
  AK_TSFC_C0,
  AK_TSFC_C1,
  AK_ENGINE_POWER,
  AK_POWER_LAPSE_EXPONENT,
  AK_PROPELLER_EFFICIENCY,
  AK_PSFC,
  AK_CLIMB_RATING,
  AK_CRUISE_RATING,
  AK_IDLE_THRUST_FRACTION,
  AK_IDLE_FUEL_FLOW,
  /* limits and masses */
  AK_VMO,
  AK_MMO,
  AK_MAX_ALTITUDE,
  AK_CL_BUFFET,
  AK_MASS_MAX_TAKEOFF,
  AK_MASS_MAX_LANDING,
  AK_MASS_MAX_ZERO_FUEL,
  AK_MASS_OPERATING_EMPTY,
  AK_FUEL_CAPACITY,
  /* speed schedules (schedule.c, climb.c, cruise.c) */
  AK_SPEED_LIMIT_CAS,
  AK_SPEED_LIMIT_ALTITUDE,
  AK_CLIMB_CAS,
  AK_CLIMB_MACH,
  AK_DESCENT_CAS,
  AK_DESCENT_MACH,
  AK_CRUISE_MACH,
  AK_APPROACH_CAS,
  AK_COUNT
};

/* Engine types: the values of AK_ENGINE_TYPE. */
enum ac_engine_type { ENGINE_TURBOFAN = 1, ENGINE_TURBOPROP = 2, ENGINE_PISTON = 3 };

/* Component numeric fields: index into ac_component.v. */
enum comp_key {
  CK_TYPE,
  CK_WETTED_AREA,
  CK_LENGTH,
  CK_THICKNESS_RATIO,
  CK_MAX_THICKNESS_POSITION,
  CK_SWEEP_MAX_THICKNESS,
  CK_FINENESS_RATIO,
  CK_INTERFERENCE,
  CK_LAMINAR_FRACTION,
  CK_ROUGHNESS,
  CK_FORM_FACTOR,
  CK_COUNT_OF, /* "count": number of identical copies */
  CK_COUNT
};

/* Flags of a key: which component types use it (bit 1 << type), required. */
#define KF_REQUIRED 0x100u /* must be given (for the types in the mask) */
#define KF_INTEGER 0x200u  /* must be a whole number */
#define KF_TYPES_ALL 0x1Eu /* bits 1..4: every component type */

typedef struct {
  const char *name;
  const char *unit; /* for messages and documentation */
  double lo, hi;    /* valid range, inclusive */
  double def;       /* default when not given; NaN: none */
  unsigned flags;   /* for component keys: type mask | KF_* */
} ac_keydef;

extern const ac_keydef AC_KEYS[AK_COUNT];
extern const ac_keydef COMP_KEYS[CK_COUNT];

typedef struct {
  char name[ACP_COMPONENT_NAME_MAX];
  unsigned line;        /* line of its section in the parsed text; 0 when set by key */
  double v[CK_COUNT];   /* NaN: not given */
  /* Derived by ac_derive(): the parts of the build-up that depend on the model
     alone, so that a drag evaluation does not compute them again. */
  double cutoff_base;   /* friction_cutoff_base(length, roughness) */
  double sweep_factor;  /* friction_sweep_factor(sweep_max_thickness) */
} ac_component;

struct acp_aircraft {
  char name[ACP_AIRCRAFT_NAME_MAX];
  double v[AK_COUNT];   /* NaN: not given */
  size_t ncomp;
  ac_component comp[ACP_AIRCRAFT_MAX_COMPONENTS];
  double induced_factor; /* derived by ac_derive(): polar_induced_factor() */
  int check_status;      /* derived by ac_derive(): ac_check() without its message */
};

/* Value of an aircraft key or its default (NaN when neither). */
double ac_value(const acp_aircraft *ac, enum ac_key k);
/* Value of a component field or its default for the component's type. */
double comp_value(const ac_component *c, enum comp_key k);

/* Reset to the empty model. */
void ac_clear(acp_aircraft *ac);

/* Recompute the derived members from the values: after every change of a model
   that can be evaluated (the public setters, the parser, ac_clear). */
void ac_derive(acp_aircraft *ac);

/* Completeness and consistency: ACP_OK or ACP_ERR_INVALID with a message. */
int ac_check(const acp_aircraft *ac, char *err, size_t errlen);

/* Set a numeric key "name" or "component.<c>.<field>", creating the
   component when absent. Status as acp_aircraft_set(); a message in err. */
int ac_set(acp_aircraft *ac, const char *key, double value, char *err, size_t errlen);
/* Same for the text keys "name" and "component.<c>.type". */
int ac_set_text(acp_aircraft *ac, const char *key, const char *value, char *err, size_t errlen);

/* Look up a component by name (length n); NULL when absent. */
ac_component *ac_find_component(acp_aircraft *ac, const char *name, size_t n);
/* Add a component; NULL when full or the name is invalid. */
ac_component *ac_add_component(acp_aircraft *ac, const char *name, size_t n);

/* True when name[0..n) is a valid component name: [A-Za-z0-9_-], 1 to
   ACP_COMPONENT_NAME_MAX - 1 characters. */
int ac_valid_name(const char *name, size_t n);

/* Read-only derived keys (aspect_ratio, induced_factor, ...), computed in
   polar.c: whether key is one, and its value (status as acp_aircraft_get). */
int polar_derived_key(const char *key);
int polar_derived_value(const acp_aircraft *ac, const char *key, double *value);

/* The induced-drag factor k = 1 / (pi A_eff e) of the model's values (NaN when
   they are incomplete); what ac_derive() keeps in ac->induced_factor. */
double polar_induced_factor(const acp_aircraft *ac);

/* The polar of a checked aircraft (ac_check() == ACP_OK) in air atm at
   true airspeed tas (m/s) with lift (N): ACP_OK or ACP_ERR_RANGE (Mach or a
   component Reynolds number outside the model); pp all NaN on error. */
int polar_eval(const acp_aircraft *ac, const acp_atmos *atm, double lift, double tas,
               acp_polar_point *pp);

/* Checks shared by the public drag and speed functions: NULL, NaN/Inf,
   ranges of mass, tas and load factor, the atmosphere (filled in) and the
   aircraft's completeness. ACP_OK or a status. */
int polar_condition(const acp_aircraft *ac, double mass, double hp, double dtemp, double tas,
                    double load_factor, acp_atmos *atm);

/* Total drag (N) of a checked aircraft, as polar_eval(); NaN on error. */
double polar_drag(const acp_aircraft *ac, const acp_atmos *atm, double lift, double tas);

#endif /* ACPERF_AIRCRAFT_INTERNAL_H */
