/* holent_bg3.h: the AdS3 background as one core object.  The physical
 * parameters a user gives for a state of a 2D CFT (vacuum, thermal,
 * rotating, heavy primary; the shared part of the time-dependent
 * thermofield double and quench) are checked here and nowhere else, and
 * every derived quantity (Brown-Henneaux c <-> G, temperatures, the
 * Hawking-Page saddle, horizon entropy and radii, M, J, L0, Lbar0, the
 * Casimir energy) is computed here, with holent_geo_bg_init and
 * holent_thermo.  The Octave struct of ads3_background is this object
 * packed; a struct handed back to any function is unpacked by building
 * the object again from its parameters and comparing.
 * Conventions: doc/conventions.md; thermodynamics:
 * doc/btz_thermodynamics.md.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_BG3_INCLUDED
#define HOLENT_BG3_INCLUDED

#include "holent.h"
#include "holent_geo.h"

typedef enum
{
  HOLENT_BG3_VACUUM = 0,
  HOLENT_BG3_THERMAL = 1,
  HOLENT_BG3_ROTATING = 2,
  HOLENT_BG3_HEAVY = 3,
  HOLENT_BG3_TFD = 4,     /* thermofield double: c, cutoff, L, beta only */
  HOLENT_BG3_QUENCH = 5,  /* global quench: the same                     */
  HOLENT_BG3_NSTATE = 6
} holent_bg3_state;

/* The parameters (options of ads3_background), in this order; the index
   is holent_err.arg of a refused parameter.  The shock options belong to
   the thermofield double: only their applicability is checked here.  */
typedef enum
{
  HOLENT_BG3_C = 0, HOLENT_BG3_G, HOLENT_BG3_ELL, HOLENT_BG3_CUTOFF,
  HOLENT_BG3_CIRCUMFERENCE, HOLENT_BG3_BETA, HOLENT_BG3_T,
  HOLENT_BG3_BETA_L, HOLENT_BG3_BETA_R, HOLENT_BG3_OMEGA,
  HOLENT_BG3_ALPHA, HOLENT_BG3_H, HOLENT_BG3_SADDLE,
  HOLENT_BG3_SHOCK_ALPHA, HOLENT_BG3_SHOCK_ENERGY, HOLENT_BG3_SHOCK_TIME,
  HOLENT_BG3_NPARAM
} holent_bg3_param;

typedef enum
{
  HOLENT_BG3_SADDLE_NONE = 0,      /* no competition (result only)      */
  HOLENT_BG3_SADDLE_DOMINANT = 1,  /* Hawking-Page decides              */
  HOLENT_BG3_SADDLE_BTZ = 2,
  HOLENT_BG3_SADDLE_THERMAL_ADS = 3
} holent_bg3_saddle;

/* Name of a parameter, state or saddle ("beta_L", "rotating", "btz");
   NULL when out of range.  */
const char *holent_bg3_param_name (int param);
const char *holent_bg3_state_name (int state);
const char *holent_bg3_saddle_name (int saddle);

/* The one table of AdS3 bulk names ("poincare", "btz", ...): the name of
   BULK (NULL when out of range), and the bulk of NAME (-1 when none).  */
const char *holent_bg3_bulk_name (int bulk);
int holent_bg3_bulk_from_name (const char *name);

/* What the user gave: bit (1u << p) of GIVEN says parameter p was given
   with VALUE[p] (the saddle's value is a holent_bg3_saddle).  */
typedef struct
{
  holent_bg3_state state;
  int circle;                  /* boundary: 1 circle, 0 line          */
  unsigned given;
  double value[HOLENT_BG3_NPARAM];
} holent_bg3_spec;

/* The background.  Fields not used by a state keep the neutral values
   of the struct (beta = Inf, alpha = 1, 0 elsewhere).  */
typedef struct
{
  holent_bg3_state state;
  int circle;
  int has_bulk;                /* 0 for the tfd/quench base           */
  holent_bulk bulk;
  double c, G, ell, cutoff, L; /* L = Inf on a line                    */
  double beta, T, beta_L, beta_R, T_L, T_R, Omega;
  double alpha, h;
  holent_bg3_saddle saddle;    /* NONE where there is no competition  */
  int horizon, pure;
  double S_BH, s_density;      /* horizon entropy (Inf on a line) and
                                  its density                          */
  double r_plus, r_minus;      /* horizon radii, units of ell (circle
                                  rescaled to 2 pi)                    */
  double M, J, L0, Lbar0;      /* energy, angular momentum, Virasoro
                                  zero modes; Inf on a thermal line    */
  double scale;                /* smallest length of the state         */
  int cutoff_large;            /* cutoff > scale/100                   */
  holent_geo_bg geo;           /* the kernels' background (has_bulk)   */
} holent_bg3;

/* Brown-Henneaux, c = 3 ell/(2G): c, G and ell from those of them given
   (ell = 1 and c = 1 by default); c and G both given must agree to
   1e-12.  */
int holent_bg3_units (const holent_bg3_spec *spec, double *c, double *G,
                      double *ell, holent_err *err);

/* Build *bg from *spec, checking every parameter; on failure *err says
   which parameter (arg: a holent_bg3_param, -1 for the state as a whole)
   and what was expected.  */
int holent_bg3_init (holent_bg3 *bg, const holent_bg3_spec *spec,
                     holent_err *err);

#endif /* HOLENT_BG3_INCLUDED */
