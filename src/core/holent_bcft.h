/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_bcft.h: AdS3/BCFT with end-of-the-world (ETW) branes.
 *
 * A 2D BCFT on the half line x > 0 or on the interval 0 < x < length is
 * dual to AdS3 cut off by a brane of tension T (|T| < 1, ell = 1) that is
 * anchored on the boundary of the BCFT (Takayanagi 2011, PRL 107, 101602).
 * RT surfaces are geodesics between boundary points or from a boundary
 * point to a brane, which they meet orthogonally.  Derivations, brane
 * profiles and the Page curve: doc/bcft.md.
 *
 * Geometries (ell = 1, regulated lengths as in holent_geo.h):
 *   half line, zero temperature   Poincare AdS3, brane x = -z T/sqrt(1-T^2)
 *   half line, beta               planar BTZ,  sinh(x/zh) = -(T/sqrt(1-T^2)) z/zh
 *   interval, thermal AdS saddle  one connected brane (equal tensions)
 *   interval, BTZ saddle          two branes, one per end, and a horizon
 *   TFD of two half lines          eternal planar BTZ, the brane through
 *                                  the Einstein-Rosen bridge (T >= 0)
 * rho = arctanh T is the brane's distance from the tensionless brane and
 * log g = (c/6) rho the boundary entropy.  */
#ifndef HOLENT_BCFT_H
#define HOLENT_BCFT_H

#include <stddef.h>
#include "holent.h"
#include "holent_geo.h"
#include "holent_tfd.h"

typedef enum
{
  HOLENT_BCFT_HALF_LINE = 0,
  HOLENT_BCFT_INTERVAL = 1,
  HOLENT_BCFT_TFD = 2           /* two half lines in the thermofield double */
} holent_bcft_kind;

typedef enum
{
  HOLENT_BCFT_DOMINANT = 0,     /* interval: the saddle of lower free energy */
  HOLENT_BCFT_BTZ = 1,
  HOLENT_BCFT_THERMAL_ADS = 2
} holent_bcft_saddle;

typedef struct
{
  holent_bcft_kind kind;
  double length;     /* interval length; Inf on the half line           */
  double eps;        /* UV cutoff (boundary length units)                */
  double beta;       /* inverse temperature; Inf at zero temperature     */
  double c;          /* central charge                                   */
  double T[2];       /* tensions at x = 0 and at x = length              */
  double rho[2];     /* arctanh T                                        */
  double log_g[2];   /* boundary entropies (c/6) rho                     */
  int btz;           /* 1: the bulk has a horizon (BTZ saddle)           */
  double beta_c;     /* interval with equal tensions: BTZ dominates for
                        beta < beta_c; NaN otherwise                     */
  double S_H;        /* horizon entropy: interval BTZ saddle finite,
                        half line at beta < Inf: Inf; otherwise 0        */
  double zh;         /* horizon depth beta/(2 pi) (Inf without)          */
  double z0;         /* thermal AdS: tip depth length/pi (Inf otherwise) */
  double ell;        /* AdS radius (bulk lengths above are in units of
                        ell; holent_bcft_bg_init sets 1)                 */
  double G;          /* Newton constant 3 ell/(2 c)                      */
  double tension[2]; /* physical tensions T/ell                          */
  int pure;          /* no horizon and zero temperature                  */
  holent_geo_bg geo; /* lengths between two points of one side: Poincare,
                        planar BTZ, or global AdS of circumference
                        2 length (the doubled interval, thermal AdS)     */
  holent_tfd_bg tfd; /* TFD: the two-sided geometry of holent_tfd        */
} holent_bcft_bg;

/* Check every parameter and fill *bg.  length is ignored (Inf) on the
 * half line and in the TFD; beta = Inf is zero temperature (not for the
 * TFD).  Returns HOLENT_EINVAL for NULL, NaN, or an unknown kind or
 * saddle; HOLENT_EDOM for eps, length, beta, c out of range, |T| >= 1,
 * T < 0 in the TFD, or a forced BTZ saddle whose branes would meet
 * (length + zh (rho0 + rho1) <= 0); HOLENT_EUNSUP for unequal tensions
 * where only the thermal AdS saddle exists (zero temperature, forced or
 * dominant thermal AdS) and for a TFD on an interval.  With unequal
 * tensions and finite beta the BTZ saddle is used (the thermal AdS one
 * would need a brane of two tensions).  bad (may be NULL) names the
 * offending input: 0 length, 1 eps, 2 beta, 3 T0, 4 T1, 5 c, 6 saddle.  */
int holent_bcft_bg_init (holent_bcft_bg *bg, holent_bcft_kind kind,
                         double length, double eps, double beta,
                         double T0, double T1, double c,
                         holent_bcft_saddle saddle, int *bad);

/* Everything a user gives for a BCFT background (ads3_background's
 * options), NaN (or has_* = 0) where not given: the caller rejects a NaN
 * that was given.  beta and T, when given, must be finite and positive.  */
typedef struct
{
  holent_bcft_kind kind;
  double length;          /* interval only (required there)             */
  double cutoff;          /* default 1e-6                               */
  double beta, T;         /* at most one; default beta = Inf            */
  double c, G, ell;       /* Brown-Henneaux c = 3 ell/(2G); defaults
                             ell = 1, c = 1                              */
  const double *values;   /* tension (ell = 1 units: T ell) or log g     */
  size_t nvalues;         /* 0 (tensionless), 1, or 2 on an interval    */
  int is_log_g;           /* values are boundary entropies log g        */
  int has_saddle;         /* an interval's forced saddle                */
  holent_bcft_saddle saddle;
} holent_bcft_spec;

/* The one constructor and validator of BCFT backgrounds: derives c, G,
 * beta, the tensions and everything of holent_bcft_bg_init from SPEC and
 * fills *bg (with ell, G and the physical tensions T/ell).  Errors fill
 * ERR (may be NULL) with what was expected: HOLENT_EOPTION (options that
 * do not apply or exclude each other), HOLENT_EINCONSISTENT (c and G),
 * HOLENT_ESIZE (number of tension values), HOLENT_ENAN, HOLENT_EDOM,
 * HOLENT_EUNSUP as holent_bcft_bg_init.  */
int holent_bcft_bg_make (holent_bcft_bg *bg, const holent_bcft_spec *spec,
                         holent_err *err);

/* Kind of the state/boundary names ("bcft" or "bcft_tfd"; "half_line" or
   "interval"); HOLENT_EBOUNDARY (reason in ERR) for a boundary the state
   does not have, HOLENT_EBACKGROUND for an unknown state.  */
int holent_bcft_kind_of (const char *state, const char *boundary,
                         holent_bcft_kind *kind, holent_err *err);

/* Saddle of its name ("dominant", "btz", "thermal_ads"; "" is dominant);
   HOLENT_EOPTION otherwise.  */
int holent_bcft_saddle_of (const char *name, holent_bcft_saddle *s,
                           holent_err *err);

/* Names of a built background, for the Octave struct: state, boundary,
   bulk ("poincare", "planar_btz", "thermal_ads", "eternal_planar_btz"),
   saddle ("btz", "thermal_ads" or "" on a half line without horizon) and
   the brane profile in words.  Never NULL.  */
const char *holent_bcft_state_name (const holent_bcft_bg *bg);
const char *holent_bcft_boundary_name (const holent_bcft_bg *bg);
const char *holent_bcft_bulk_name (const holent_bcft_bg *bg);
const char *holent_bcft_saddle_name (const holent_bcft_bg *bg);
const char *holent_bcft_profile_text (const holent_bcft_bg *bg);

/* Regulated length of the geodesic between boundary points x1 and x2 of
 * one side (one time slice).  HOLENT_EDOM outside the BCFT's domain
 * (x <= 0, x >= length), HOLENT_ECOINCIDE for x1 == x2.  */
int holent_bcft_pair_length (const holent_bcft_bg *bg, double x1,
                             double x2, double *len);

/* Regulated length of the geodesic from boundary point x to the brane
 * anchored at end (0: x = 0, 1: x = length), meeting it orthogonally,
 * and its landing point (xb, zb) in the bulk coordinates of doc/bcft.md
 * (may be NULL).  In the thermal AdS saddle there is one brane and end
 * is ignored.  HOLENT_EDOM for x outside the domain, HOLENT_EINVAL for
 * end 1 on the half line.  */
int holent_bcft_brane_length (const holent_bcft_bg *bg, double x, int end,
                              double *len, double *xb, double *zb);

/* Tension (ell = 1) of the brane with boundary entropy log_g:
 * T = tanh(6 log_g / c).  HOLENT_EINVAL for NaN, HOLENT_EDOM for c <= 0
 * or a log_g so large that |T| rounds to 1.  */
int holent_bcft_tension_of_log_g (double log_g, double c, double *T);

/* Brane profile on the time-symmetric slice: the boundary coordinate x of
 * the brane anchored at end (0 or 1) at depth z, in the bulk coordinates of
 * doc/bcft.md (x and z in units of bg->ell, as ads3_background's zh).  z in (0, zh] (BTZ; the TFD continues past the horizon,
 * z in (0, Inf)), (0, z0/cosh rho] (thermal AdS: beyond, the brane turns
 * over to the other end), (0, Inf) (Poincare).  HOLENT_EDOM outside.  */
int holent_bcft_brane_x (const holent_bcft_bg *bg, int end, double z,
                         double *x);

/* Which side of the brane at END the point (x, z) of the time-symmetric
 * slice lies on, in the bulk coordinates of doc/bcft.md with ell = 1
 * (thermal AdS: x = z0 theta, z = z0/cosh r): > 0 in the bulk that
 * remains, < 0 beyond the brane, 0 on it; NaN for a depth the brane
 * does not reach (past the horizon).  */
double holent_bcft_brane_side (const holent_bcft_bg *bg, int end, double x,
                               double z);

/* The boundary point whose geodesic to x is orthogonal to the brane at
 * END: x's mirror image in the tensionless brane (-x from end 0,
 * 2 length - x from end 1; the thermal AdS saddle: -x on the doubled
 * circle).  The geodesic from x to the brane is the part of that
 * geodesic from x to its landing point (doc/surfaces.md).  */
double holent_bcft_mirror (const holent_bcft_bg *bg, int end, double x);

/* ---- Regions and the exact minimiser ------------------------------- */

/* Largest number of endpoints (after merging) the minimiser accepts.  */
#define HOLENT_BCFT_MMAX ((size_t) 2048)

typedef struct holent_bcft_workspace holent_bcft_workspace;

/* Workspace for regions of up to nmax input rows (nmax <= MMAX/2).  */
holent_bcft_workspace *holent_bcft_workspace_alloc (size_t nmax);
void holent_bcft_workspace_free (holent_bcft_workspace *w);

typedef struct
{
  double S;          /* entropy (c/6) length (+ horizon entropy)          */
  double length;     /* regulated length of the geodesics                 */
  int horizon;       /* 1: the horizon is part of the surface            */
  size_t m;          /* endpoints that need a surface (sorted in pts)     */
  size_t npairs;     /* geodesics between two endpoints                   */
  size_t nbrane;     /* geodesics ending on a brane                       */
  size_t n_short;    /* intervals, gaps or distances to an end <= 2 eps   */
  const double *pts;     /* m endpoints ascending (workspace-owned)       */
  const size_t *pairs;   /* 2 npairs indices into pts, first < second    */
  const size_t *brane;   /* nbrane indices into pts                       */
  const int *brane_end;  /* nbrane: 0 brane at x = 0, 1 at x = length    */
  const double *brane_x; /* nbrane landing points (bulk coordinates)     */
  const double *brane_z;
  const double *start;   /* merged intervals, ascending (workspace-owned) */
  const double *end;
  size_t n;              /* number of merged intervals                    */
  size_t nbridge;        /* TFD (holent_bcft_page_configuration): geodesics
                            through the Einstein-Rosen bridge per side    */
  const size_t *bridge;  /* nbridge indices into pts                      */
} holent_bcft_result;

/* RT entropy of the region of n rows [a[i], b[i]] on a half-line or
 * interval background (one side of the TFD at t = 0 is the thermal half
 * line).  Rows: 0 <= a < b (b <= length on the interval); a row may start
 * at 0 or end at length (adjacent to the boundary); touching rows are
 * merged.  Candidates: every non-crossing set of geodesics in which each
 * endpoint pairs with another or ends on a brane, with the horizon where
 * the homology region needs it; minimised exactly (doc/bcft.md).
 * Errors (ERR, may be NULL, gets the row in index and what was expected):
 * HOLENT_EINVAL (NULL), HOLENT_ENAN (NaN), HOLENT_EDOM (Inf, a row
 * reaching past the boundary, b < a), HOLENT_EEMPTY (n == 0 or a == b),
 * HOLENT_EOVERLAP (index = a row overlapping an earlier one),
 * HOLENT_ETOOBIG (n above the workspace), HOLENT_EUNSUP (TFD; use the
 * Page-curve functions).  The pointers of *res stay valid until the
 * workspace is used again.  poll (may be NULL): the O(m^3) programme calls
 * poll->fn about every 1e5 steps and returns HOLENT_EINTR when it asks to
 * stop.  */
int holent_bcft_entropy (holent_bcft_workspace *w, const holent_bcft_bg *bg,
                         size_t n, const double *a, const double *b,
                         holent_bcft_result *res, holent_err *err,
                         const holent_poll *poll);

/* Largest number of endpoints for the runner-up (brute force).  */
#define HOLENT_BCFT_RUNNER_MMAX ((size_t) 16)

/* The runner-up of the last holent_bcft_entropy on w, whose minimiser is
 * *res: the least configuration among the same candidates (pairs, brane
 * endings, the horizon as homology asks) that differs from it, written
 * over *res (S, length, horizon, pairs, brane endings and landing points;
 * the pointers into w stay).  HOLENT_EDOM when there is no other
 * candidate, HOLENT_ETOOBIG above RUNNER_MMAX endpoints, HOLENT_EINVAL
 * unless *res comes from w.  */
int holent_bcft_runner_up (holent_bcft_workspace *w, const holent_bcft_bg *bg,
                           holent_bcft_result *res);

/* ---- Page curve of a radiation region in the TFD -------------------- */

typedef struct
{
  size_t m;          /* finite endpoints of the region on one side        */
  double h0;         /* log(beta/(pi eps)): bridge cost per side at t = 0 */
  double S_island;   /* entropy without bridge geodesics (t-independent)  */
  double page_time;  /* first time after which S = S_island (0: always)   */
  size_t n_island;   /* brane endings of the island configuration         */
  const double *island_x;  /* their landing points (workspace-owned)      */
  const double *island_z;
  const double *island_pt; /* their boundary endpoints                    */
  size_t n_island_pairs;   /* geodesics within a side in that configuration */
  const double *island_pairs; /* their endpoints x1, x2 (2 per pair)      */
  size_t n_short;
} holent_bcft_page;

/* Prepare the Page curve of R = rows [a, b] (b may be Inf) on each side
 * of a TFD background: the exact minimum over every non-crossing
 * configuration of geodesics within a side, through the bridge and to the
 * brane, reduced (doc/bcft.md) to S(t) = (c/3) min_k (A_k + k h(t)),
 * h(t) = h0 + log cosh(2 pi t/beta).  Errors as holent_bcft_entropy;
 * HOLENT_EUNSUP unless bg is a TFD; HOLENT_EDOM also for a row starting
 * at 0 (a point on the boundary of the BCFT: R lies on x > 0).  */
int holent_bcft_page_prepare (holent_bcft_workspace *w,
                              const holent_bcft_bg *bg, size_t n,
                              const double *a, const double *b,
                              holent_bcft_page *pg, holent_err *err,
                              const holent_poll *poll);

/* S[i] at the boundary times t[i] (any sign; both sides run forward);
 * kbridge[i] (may be NULL): geodesics through the bridge per side in the
 * minimiser (0: island phase); nbrane[i] (may be NULL): brane endings per
 * side; S_noisland[i] (may be NULL): the least entropy with at least one
 * bridge geodesic (Inf if none exists).  Ties go to fewer bridge
 * geodesics.  HOLENT_ENAN / HOLENT_EDOM for a NaN or infinite t (ERR
 * names the index).  Uses the workspace of the last prepare.  */
int holent_bcft_page_eval (const holent_bcft_workspace *w,
                           const holent_bcft_bg *bg, size_t nt,
                           const double *t, double *S, double *kbridge,
                           double *nbrane, double *S_noisland,
                           holent_err *err);

/* The minimiser (RUNNER 0) or the runner-up (RUNNER 1) at the boundary
 * time t (both sides) of the region of the last holent_bcft_page_prepare
 * on w (with the same bg), as a configuration of one side: the other
 * side is its mirror image (a symmetric configuration is optimal,
 * doc/bcft.md).  The minimiser is page_eval's (ties go to fewer bridge
 * geodesics).  The runner-up is the least configuration of the other
 * kind: without a geodesic through the bridge when the minimiser has one
 * (the island value S_island, independent of t), otherwise the least
 * with at least one (page_eval's S_noisland).  So before the Page time the
 * minimiser crosses the bridge and the runner-up is the island
 * configuration, after it the reverse, and the two values are the two
 * branches of the Page curve.  *res gets S and length of both sides, m
 * and pts, the pairs within a side, the brane endings (brane_end 0) with
 * their landing points, and nbridge, bridge: the endpoints whose geodesic
 * crosses the bridge to the same point on the other side (each of
 * length 2 h(t), independent of the point); horizon 0, and start, end,
 * n of the merged region.  Pointers stay valid until w is used again.
 * Errors (ERR may be NULL): HOLENT_EINVAL for NULL or a w not prepared
 * by holent_bcft_page_prepare, HOLENT_EUNSUP unless bg is a TFD,
 * HOLENT_ENAN / HOLENT_EDOM for a NaN or infinite t, HOLENT_ERANGE for
 * a t so late that the bridge length overflows (ERR's arg 0 names t).  */
int holent_bcft_page_configuration (holent_bcft_workspace *w,
                                    const holent_bcft_bg *bg, double t,
                                    int runner, holent_bcft_result *res,
                                    holent_err *err);

#endif /* HOLENT_BCFT_H */
