/* holent_hd.h: Ryu-Takayanagi surfaces in AdS_{d+1}, d >= 3, for planar
 * backgrounds  ds^2 = (ell^2/z^2) (-f dt^2 + dz^2/f + dx_1^2 + ... ):
 * strips (turning point by root finding, area by quadrature with the
 * turning-point singularity removed by a substitution) and balls
 * (profile shot from its tip with an ODE solver).
 * Derivations: doc/higher_dimensional.md.  GPL-3.0-or-later.  */
#ifndef HOLENT_HD_H
#define HOLENT_HD_H

#include <stddef.h>
#include <gsl/gsl_spline.h>
#include <gsl/gsl_integration.h>
#include <gsl/gsl_roots.h>
#include <gsl/gsl_min.h>
#include <gsl/gsl_odeiv2.h>
#include "holent.h"

typedef enum
{
  HOLENT_HD_VACUUM = 0,     /* f = 1                                  */
  HOLENT_HD_BRANE = 1,      /* f = 1 - (z/zh)^d                       */
  HOLENT_HD_TABULATED = 2   /* f from samples, cubic spline           */
} holent_hd_kind;

#define HOLENT_HD_DMAX 12   /* largest d accepted (cost, overflow)    */

typedef struct
{
  int d;
  holent_hd_kind kind;
  double ell, G, eps;
  double zh;      /* horizon, INFINITY when there is none               */
  double zmax;    /* f known on [0, zmax]; INFINITY for analytic kinds   */
  double Z;       /* zh if finite, else zmax (scale of the root variable) */
  double wmin;    /* smallest Z - z* a surface may reach                 */
  double m;       /* f = 1 - m z^d + ... near the boundary               */
  double fp_h;    /* f'(zh) (0 without a horizon)                        */
  gsl_spline *g;  /* tabulated: g(z) = (1 - f(z))/z^d                    */
  /* tabulated with a horizon: f(zh - w) = -sum_n hc[n] (-w)^n, the exact
     re-expansion of the interpolant about zh, used for 0 < w <= hw */
  double hc[HOLENT_HD_DMAX + 4];
  double hw;
} holent_hd_bg;

/* Analytic backgrounds (vacuum: zh ignored).  bg->g is NULL.  */
int holent_hd_bg_init (holent_hd_bg *bg, int d, holent_hd_kind kind,
                       double zh, double ell, double G, double eps);

/* A tabulated background from n samples z[0] = 0 < z[1] < ... with
 * f[0] = 1 and f - 1 = O(z^d) near z = 0 (checked).  The horizon is the
 * first zero of the spline.  *bad (may be NULL) gets the index of the
 * first offending sample.  Release with holent_hd_bg_free.  */
int holent_hd_bg_tabulated (holent_hd_bg *bg, int d, size_t n,
                            const double *z, const double *f, double ell,
                            double G, double eps, size_t *bad);
void holent_hd_bg_free (holent_hd_bg *bg);

/* f(z) and f'(z) for 0 <= z <= zmax (EDOM outside).  */
int holent_hd_f (const holent_hd_bg *bg, double z, double *f, double *fp);

typedef struct
{
  gsl_integration_workspace *iw;
  gsl_root_fsolver *root;
  gsl_min_fminimizer *min;  /* extrema of a non-monotonic size(y)     */
  gsl_odeiv2_step *step;
  gsl_odeiv2_control *ctrl;
  gsl_odeiv2_evolve *evol;
  size_t cap;              /* table capacity                            */
  double *ty, *tv;         /* table: root variable, width or radius     */
  double extra;            /* scratch: excess over the vacuum at a root */
} holent_hd_workspace;

holent_hd_workspace *holent_hd_workspace_alloc (void);
void holent_hd_workspace_free (holent_hd_workspace *w);

/* Strips of widths l[i] (transverse size Lperp): S at the cutoff,
 * fin = S - 2 ell^(d-1) Lperp^(d-2)/((d-2) eps^(d-2) 4G) in the limit
 * eps -> 0, delta = fin - (vacuum fin of the same width), zstar.  Any
 * output but S may be NULL.  EDOM with *bad = i when l[i] <= 0 or beyond
 * the widest reachable strip (*reach, may be NULL, gets that width).  */
int holent_hd_strip (const holent_hd_bg *bg, holent_hd_workspace *w,
                     double Lperp, size_t n, const double *l, double *S,
                     double *fin, double *delta, double *zstar, size_t *bad,
                     double *reach);

/* Balls of radii R[i]: same outputs (fin with every divergent term of the
 * hemisphere, and for even d its log(R/eps), removed), ztip = depth of
 * the tip.  */
int holent_hd_ball (const holent_hd_bg *bg, holent_hd_workspace *w,
                    size_t n, const double *R, double *S, double *fin,
                    double *delta, double *ztip, size_t *bad, double *reach);

/* Vacuum closed forms: width/zstar of the strip, its finite part per
 * unit 2 ell^(d-1) Lperp^(d-2)/(4G) times zstar^(d-2), and the
 * hemisphere's constant C_d (finite part per ell^(d-1) Omega_{d-2}/(4G)).  */
double holent_hd_strip_ratio (int d);
double holent_hd_strip_vacuum_j (int d);
double holent_hd_ball_vacuum_c (int d);

#endif /* HOLENT_HD_H */
