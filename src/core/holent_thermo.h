/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_thermo.h: thermodynamics of the BTZ black hole on a boundary
 * circle of circumference L, the CFT (Virasoro) data of the state, and
 * the Hawking-Page competition with thermal AdS3.
 *
 * Units and conventions (doc/btz_thermodynamics.md has the derivations):
 * c is the Brown-Henneaux central charge 3 ell/(2G), ell the AdS radius,
 * L the circumference of the boundary circle (L = 2 pi ell is the frame in
 * which the BTZ coordinates t, phi ~ phi + 2 pi are the boundary ones).
 * Radii r_plus, r_minus are in units of ell and do not depend on L;
 * energies and temperatures scale as 2 pi ell/L.  Omega is the boundary
 * velocity (|Omega| < 1), conjugate to J through Omega_J = 2 pi Omega/L.
 * Internally every state is u = r_+ + r_- = L T_L, v = r_+ - r_- = L T_R.
 * GPL-3.0-or-later.  */
#ifndef HOLENT_THERMO_H
#define HOLENT_THERMO_H

#include <stddef.h>
#include "holent.h"

/* Which pair of numbers fixes the state.  */
typedef enum
{
  HOLENT_THERMO_RADII = 0,    /* a = r_plus, b = r_minus (units of ell)  */
  HOLENT_THERMO_T_OMEGA = 1,  /* a = T, b = Omega                         */
  HOLENT_THERMO_T_LR = 2,     /* a = T_L, b = T_R                         */
  HOLENT_THERMO_BETA_LR = 3,  /* a = beta_L, b = beta_R (one may be Inf)  */
  HOLENT_THERMO_M_J = 4,      /* a = M, b = J                             */
  HOLENT_THERMO_BETA_OMEGA = 5 /* a = beta = 1/T, b = Omega               */
} holent_thermo_pair;

/* Why a state was refused (the status is HOLENT_EINVAL for NOT_FINITE and
 * NULL pointers, HOLENT_EDOM otherwise).  */
typedef enum
{
  HOLENT_THERMO_OK = 0,
  HOLENT_THERMO_NOT_FINITE = 1,   /* NaN (or Inf where not allowed)       */
  HOLENT_THERMO_PARAM = 2,        /* c, ell or L not positive and finite  */
  HOLENT_THERMO_RADIUS = 3,       /* r_plus <= 0                          */
  HOLENT_THERMO_INNER = 4,        /* |r_minus| > r_plus                   */
  HOLENT_THERMO_TEMPERATURE = 5,  /* T <= 0, T_L < 0 or T_R < 0           */
  HOLENT_THERMO_OMEGA = 6,        /* |Omega| >= 1                         */
  HOLENT_THERMO_BETA = 7,         /* beta_L or beta_R <= 0                */
  HOLENT_THERMO_MASSLESS = 8,     /* M = J = 0, T_L = T_R = 0: no horizon */
  HOLENT_THERMO_BELOW_VACUUM = 9, /* M < -1/(8G) (ell = 1, L = 2 pi)      */
  HOLENT_THERMO_CONICAL = 10,     /* -1/(8G) <= M < 0: conical defect     */
  HOLENT_THERMO_OVERROTATING = 11,/* |J| > M ell (L/(2 pi ell))           */
  HOLENT_THERMO_RANGE = 12        /* a result is not representable        */
} holent_thermo_reason;

/* Short English description of a reason; never NULL.  */
const char *holent_thermo_strreason (int reason);

/* Everything known about one BTZ state.  */
typedef struct
{
  double r_plus, r_minus;   /* horizon radii, units of ell                */
  double M, J;              /* energy on the circle L, angular momentum   */
  double T, Omega;          /* temperature, boundary velocity             */
  double Omega_J;           /* 2 pi Omega/L: the conjugate of J           */
  double T_L, T_R;          /* temperatures of the L0 and Lbar0 sectors   */
  double S;                 /* Bekenstein-Hawking entropy                 */
  double F;                 /* grand potential M - T S - Omega_J J        */
  double C_Omega, C_J;      /* heat capacities T dS/dT at fixed Omega, J  */
  double horizon_length;    /* 2 pi r_plus, units of ell                  */
  double L0, Lbar0;         /* Virasoro zero modes of the state           */
  double F_thermal_ads;     /* thermal AdS at the same T, Omega: -pi c/(6L) */
  int btz_dominates;        /* 1 when F < F_thermal_ads                   */
} holent_thermo_state;

/* One state from the pair (a, b) on a circle of circumference L, with
 * central charge c and AdS radius ell.  Exactly extremal states
 * (T = 0, |Omega| = 1) are returned without NaN; over-rotation by no more
 * than 4 ulp of M ell L/(2 pi ell) counts as extremal (rounding).
 * *reason (may be NULL) says why a state was refused.  */
int holent_thermo_state_from (double c, double ell, double L,
                              holent_thermo_pair pair, double a, double b,
                              holent_thermo_state *st, int *reason);

/* Column pointers of a vectorised result; any may be NULL (skipped).  */
typedef struct
{
  double *r_plus, *r_minus, *M, *J, *T, *Omega, *Omega_J, *T_L, *T_R, *S,
      *F, *C_Omega, *C_J, *horizon_length, *L0, *Lbar0, *F_thermal_ads;
  unsigned char *btz_dominates;
} holent_thermo_table;

/* n states from a[i sa], b[i sb], L[i sL] with (sa, sb, sL) = step[0..2]
 * (step NULL: all 1; a step 0 repeats one value, so scalars need no
 * copies); L may be NULL: 2 pi ell for all.  On failure *bad (may be
 * NULL) is the first offending state i, *reason (may be NULL) why, and
 * nothing is promised about the table.  */
int holent_thermo_states (double c, double ell, holent_thermo_pair pair,
                          size_t n, const double *a, const double *b,
                          const double *L, const size_t *step,
                          const holent_thermo_table *out, size_t *bad,
                          int *reason);

/* Hawking-Page temperature on a circle of circumference L[i] at boundary
 * velocity Omega[i]: T_hp = sqrt(1 - Omega^2)/L, where
 * beta_L beta_R = L^2.  */
int holent_thermo_hawking_page (size_t n, const double *Omega,
                                const double *L, double *T_hp, size_t *bad,
                                int *reason);

/* The comparison of hawking_page: at n points on circles L[i sL] (L
 * NULL: 2 pi ell) the transition temperature T_hp and the BTZ state of
 * the pair (a, b) with its boundary velocity Omega, temperature T, grand
 * potential F, that of thermal AdS and whether BTZ dominates.  PAIR is
 * T_OMEGA, BETA_OMEGA or BETA_LR, or -1 for the state at the transition
 * itself (b = Omega, a unused, T = T_hp).  Any output may be NULL.  On
 * failure *bad is the first refused point and *reason why.  */
int holent_thermo_hp_compare (double c, double ell, int pair, size_t n,
                              const double *a, const double *b,
                              const double *L, const size_t *step,
                              double *T_hp, double *Omega, double *T,
                              double *F, double *F_thermal_ads,
                              unsigned char *btz_dominates, size_t *bad,
                              int *reason);

#endif /* HOLENT_THERMO_H */
