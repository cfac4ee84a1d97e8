/* holent_hd_bg.h: planar AdS_{d+1} backgrounds, d >= 3,
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

/* The interpolant of a tabulated f (opaque; owned by the background).  */
typedef struct holent_hd_tab holent_hd_tab;

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
  holent_hd_tab *tab;  /* tabulated: g(z) = (1 - f(z))/z^d; else NULL    */
  /* tabulated with a horizon: f(zh - w) = -sum_n hc[n] (-w)^n, the exact
     re-expansion of the interpolant about zh, used for 0 < w <= hw */
  double hc[HOLENT_HD_DMAX + 4];
  double hw;
} holent_hd_bg;

/* Analytic backgrounds (vacuum: zh ignored).  bg->tab is NULL.  */
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
