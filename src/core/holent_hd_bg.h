/* holent_hd_bg.h: planar AdS_{d+1} backgrounds, d >= 2 (d = 2: planar
 * BTZ for the brane),
 *   ds^2 = (ell^2/z^2) (-f dt^2 + dz^2/f + dx_1^2 + ... + dx_{d-1}^2):
 * vacuum (f = 1), the black brane f = 1 - (z/zh)^d and f tabulated by
 * samples (interpolated).  The evaluators of f used by the strip and
 * ball modules live here.  Derivations: doc/higher_dimensional.md.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_HD_BG_H
#define HOLENT_HD_BG_H

#include <stddef.h>
#include "holent.h"

typedef enum
{
  HOLENT_HD_VACUUM = 0,     /* f = 1                                  */
  HOLENT_HD_BRANE = 1,      /* f = 1 - (z/zh)^d                       */
  HOLENT_HD_TABULATED = 2   /* f from samples, cubic spline           */
} holent_hd_kind;

#define HOLENT_HD_DMAX 12   /* largest d accepted (cost, overflow)    */

/* Why a constructor refused its input (bg->why, with *bad).  */
typedef enum
{
  HOLENT_HD_WHY_NONE = 0,
  HOLENT_HD_WHY_SAMPLES,    /* z not 0 = z[0] < z[1] < ..., or not finite */
  HOLENT_HD_WHY_F0,         /* f[0] != 1 (the AdS boundary)               */
  HOLENT_HD_WHY_BOUNDARY,   /* f - 1 is not O(z^d)                        */
  HOLENT_HD_WHY_FEW,        /* too few samples near the boundary to fit   */
  HOLENT_HD_WHY_RANGE       /* a density out of double range              */
} holent_hd_why;

typedef struct
{
  int d;
  holent_hd_why why;  /* set when a constructor fails */
  holent_hd_kind kind;
  double ell, G, eps;
  double zh;      /* horizon, INFINITY when there is none               */
  double zmax;    /* f known on [0, zmax]; INFINITY for analytic kinds   */
  double Z;       /* zh if finite, else zmax (scale of the root variable) */
  double wmin;    /* smallest Z - z* a surface may reach                 */
  double m;       /* f = 1 - m z^d + ... near the boundary               */
  double fp_h;    /* f'(zh) (0 without a horizon or at a double zero)    */
  int extremal;   /* the horizon is a double zero of f (T = 0)           */
  /* thermodynamics: T = |f'(zh)|/(4 pi), entropy density s = ell^(d-1)
     /(4 G zh^(d-1)), energy density e = (d-1) ell^(d-1) m/(16 pi G) (the
     Einstein-gravity value; 0, 0, e without a horizon), and T_err      */
  double T, s, e, T_err;
  /* accuracy (0 for analytic kinds): of the samples of f, of m and of
     f'(zh), estimated from the data (doc/higher_dimensional.md)         */
  double noise, m_err, fp_err;
  /* tabulated: g(z) = (1 - f(z))/z^d is the cubic spline through
     (tz[i], tg[i]) with second derivatives tg2[i], i < n (owned) */
  size_t n;
  double *tz, *tg, *tg2;
  /* tabulated with a horizon: f(zh - w) = -sum_n hc[n] (-w)^n, the exact
     re-expansion of the interpolant about zh, used for 0 < w <= hw */
  double hc[HOLENT_HD_DMAX + 4];
  double hw;
} holent_hd_bg;

/* The brane's horizon at temperature T: zh = d/(4 pi T) (EDOM unless
 * T > 0 is finite).  */
int holent_hd_brane_zh (int d, double T, double *zh);

/* Analytic backgrounds (vacuum: zh ignored).  bg->n is 0.  EDOM when a
 * density is out of double range.  */
int holent_hd_bg_init (holent_hd_bg *bg, int d, holent_hd_kind kind,
                       double zh, double ell, double G, double eps);

/* A tabulated background from n >= 5 samples z[0] = 0 < z[1] < ... with
 * f[0] = 1 and f - 1 = O(z^d) near z = 0 (checked by a least-squares fit
 * that also allows the powers z^1 ... z^(d-1): any of them significant
 * is refused, whatever the sampling).  noise is the accuracy of the
 * samples (<= 0: estimated from the data).  m comes from a least-squares
 * fit of (1 - f)/z^d by a polynomial over the window and degree of
 * least estimated error (m_err).  The horizon is the first zero of the
 * interpolant, a double zero (T = 0) when f touches zero within the
 * noise, or the last sample when the table ends there within the noise.
 * *bad (may be NULL) gets the index of the first offending sample.
 * Release with holent_hd_bg_free.  */
int holent_hd_bg_tabulated (holent_hd_bg *bg, int d, size_t n,
                            const double *z, const double *f, double noise,
                            double ell, double G, double eps, size_t *bad);

/* The same background rebuilt from its spline (tz, tg, tg2 as stored by
 * holent_hd_bg_tabulated, and its noise): no refit; the arrays are
 * checked and the horizon located again.  */
int holent_hd_bg_spline (holent_hd_bg *bg, int d, size_t n, const double *tz,
                         const double *tg, const double *tg2, double noise,
                         double ell, double G, double eps, size_t *bad);
void holent_hd_bg_free (holent_hd_bg *bg);

/* The dimension d from a double: EDOM (ENAN) with the reason in E (may
 * be NULL; arg 0) unless an integer from 2 to HOLENT_HD_DMAX; no int
 * overflow for any input.  */
int holent_hd_dimension (double d, int *out, holent_err *e);

/* The reason (what was expected) why a constructor returned STATUS for
 * bg of dimension d, in E: from bg->why, the index BAD of the sample it
 * named and the samples z (may be NULL).  Returns STATUS.  */
int holent_hd_bg_explain (const holent_hd_bg *bg, int d, int status,
                          size_t bad, const double *z, holent_err *e);

/* For accuracy estimates: the tabulated background bg with 1 - f scaled
 * by 1 + rho, rho the relative accuracy of 1 - f (noise / max|1 - f|, or
 * m_err/|m| if larger); its horizon moves by the amount the data leave
 * open.  The first-order change of a quantity between bg and *out
 * estimates the quantity's accuracy.  Release with holent_hd_bg_free.  */
int holent_hd_bg_perturbed (const holent_hd_bg *bg, holent_hd_bg *out);

/* f(z) and f'(z) (fp may be NULL) for 0 <= z <= zmax (EDOM outside).  */
int holent_hd_bg_f (const holent_hd_bg *bg, double z, double *f, double *fp);

/* Evaluators for the solvers (no checks; 0 <= z <= zmax):
 * omf = 1 - f(z), accurate for small z; mcoef = (1 - f(z))/z^d;
 * fval = f(z) given also wz = Z - z, keeping every digit next to a
 * horizon.  */
double holent_hd_bg_omf (const holent_hd_bg *bg, double z);
double holent_hd_bg_mcoef (const holent_hd_bg *bg, double z);
double holent_hd_bg_fval (const holent_hd_bg *bg, double z, double wz);

#endif /* HOLENT_HD_BG_H */
