/* holent_hd_bg.c: planar AdS_{d+1} backgrounds (vacuum, brane,
 * tabulated).  See holent_hd_bg.h and doc/higher_dimensional.md.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_linalg.h>
#include <gsl/gsl_roots.h>
#include <gsl/gsl_spline.h>
#include "holent_hd_bg.h"

#define ROOT_ITMAX 200

struct holent_hd_tab
{
  gsl_spline *g;
};

static int
d_ok (int d)
{
  return d >= 3 && d <= HOLENT_HD_DMAX;
}

static int
common_ok (double ell, double G, double eps)
{
  if (isnan (ell) || isnan (G) || isnan (eps))
    return HOLENT_EINVAL;
  if (!(ell > 0) || !(G > 0) || !(eps > 0) || !isfinite (ell)
      || !isfinite (G) || !isfinite (eps))
    return HOLENT_EDOM;
  return HOLENT_SUCCESS;
}

int
holent_hd_bg_init (holent_hd_bg *bg, int d, holent_hd_kind kind, double zh,
                   double ell, double G, double eps)
{
  if (bg == NULL)
    return HOLENT_EINVAL;
  memset (bg, 0, sizeof *bg);
  if (!d_ok (d))
    return HOLENT_EDOM;
  int st = common_ok (ell, G, eps);
  if (st)
    return st;
  bg->d = d;
  bg->kind = kind;
  bg->ell = ell;
  bg->G = G;
  bg->eps = eps;
  bg->zmax = INFINITY;
  switch (kind)
    {
    case HOLENT_HD_VACUUM:
      bg->zh = INFINITY;
      bg->Z = 1.0;
      bg->m = 0.0;
      break;
    case HOLENT_HD_BRANE:
      if (isnan (zh))
        return HOLENT_EINVAL;
      if (!(zh > 0) || !isfinite (zh))
        return HOLENT_EDOM;
      bg->zh = zh;
      bg->Z = zh;
      bg->wmin = 1e-250 * zh;  /* f is evaluated from zh - z exactly */
      bg->m = 1.0 / gsl_pow_int (zh, d);
      bg->fp_h = -d / zh;
      break;
    default:
      return HOLENT_EINVAL;  /* tabulated: holent_hd_bg_tabulated */
    }
  return HOLENT_SUCCESS;
}

static double
g_eval (const holent_hd_bg *bg, double z, double *gp)
{
  double g;
  if (z > bg->zmax)
    z = bg->zmax;
  if (z < 0)
    z = 0;
  if (gsl_spline_eval_e (bg->tab->g, z, NULL, &g))
    return NAN;
  if (gp && gsl_spline_eval_deriv_e (bg->tab->g, z, NULL, gp))
    return NAN;
  return g;
}

static double
tab_f (double z, void *p)
{
  const holent_hd_bg *bg = p;
  return 1.0 - gsl_pow_int (z, bg->d) * g_eval (bg, z, NULL);
}

void
holent_hd_bg_free (holent_hd_bg *bg)
{
  if (bg && bg->tab)
    {
      if (bg->tab->g)
        gsl_spline_free (bg->tab->g);
      free (bg->tab);
      bg->tab = NULL;
    }
}

int
holent_hd_bg_tabulated (holent_hd_bg *bg, int d, size_t n, const double *z,
                        const double *f, double ell, double G, double eps,
                        size_t *bad)
{
  size_t i, ih = 0;
  int st;
  if (bg == NULL)
    return HOLENT_EINVAL;
  memset (bg, 0, sizeof *bg);
  if (z == NULL || f == NULL)
    return HOLENT_EINVAL;
  if (!d_ok (d))
    return HOLENT_EDOM;
  if ((st = common_ok (ell, G, eps)))
    return st;
  if (n < 5)
    return HOLENT_EDOM;
  for (i = 0; i < n; i++)
    if (!isfinite (z[i]) || !isfinite (f[i])
        || (i > 0 && !(z[i] > z[i - 1])))
      {
        if (bad)
          *bad = i;
        return (isnan (z[i]) || isnan (f[i])) ? HOLENT_EINVAL : HOLENT_EDOM;
      }
  if (z[0] != 0.0 || fabs (f[0] - 1.0) > 1e-10)
    {
      if (bad)
        *bad = 0;
      return HOLENT_EDOM;
    }
  for (i = 1; i < n && ih == 0; i++)
    if (f[i] <= 0)
      ih = i;
  double *gv = malloc (n * sizeof *gv);
  if (gv == NULL)
    return HOLENT_ENOMEM;
  for (i = 1; i < n; i++)
    gv[i] = (1.0 - f[i]) / gsl_pow_int (z[i], d);
  /* Near z = 0, g = (1 - f)/z^d carries the samples' roundoff divided by
     z^d.  Where that exceeds 1e-9 of g's scale (z < zn), and at z = 0,
     use a cubic fitted by weighted least squares (weights z^(2d), the
     inverse noise variance) to the samples up to max(4 zn, z[8]).  */
  {
    double zend = ih ? z[ih] : z[n - 1], zn = zend * pow (1e-7, 1.0 / d);
    double zf = fmax (4 * zn, z[n > 9 ? 8 : n - 1]);
    gsl_matrix *A = gsl_matrix_calloc (4, 4);
    gsl_vector *b = gsl_vector_calloc (4), *c = gsl_vector_alloc (4);
    gsl_permutation *pm = gsl_permutation_alloc (4);
    int sg;
    if (!A || !b || !c || !pm)
      st = HOLENT_ENOMEM;
    else
      {
        for (i = 1; i < n && z[i] <= zf; i++)
          {
            double x = z[i] / zf, wt = gsl_pow_int (x, 2 * d), xp[4];
            xp[0] = 1; xp[1] = x; xp[2] = x * x; xp[3] = x * x * x;
            for (int r = 0; r < 4; r++)
              {
                for (int q = 0; q < 4; q++)
                  *gsl_matrix_ptr (A, r, q) += wt * xp[r] * xp[q];
                *gsl_vector_ptr (b, r) += wt * xp[r] * gv[i];
              }
          }
        st = gsl_linalg_LU_decomp (A, pm, &sg);
        if (!st)
          st = gsl_linalg_LU_solve (A, pm, b, c);
        if (!st)
          {
            for (i = 1; i < n && z[i] < zn; i++)
              {
                double x = z[i] / zf;
                gv[i] = gsl_vector_get (c, 0) + x * (gsl_vector_get (c, 1)
                        + x * (gsl_vector_get (c, 2) + x * gsl_vector_get (c, 3)));
              }
            gv[0] = gsl_vector_get (c, 0);
          }
        st = st ? HOLENT_EDOM : HOLENT_SUCCESS;
      }
    gsl_matrix_free (A);
    gsl_vector_free (b);
    gsl_vector_free (c);
    gsl_permutation_free (pm);
    if (st || !isfinite (gv[0]))
      {
        free (gv);
        return st ? st : HOLENT_EDOM;
      }
  }
  /* f - 1 = O(z^d): g must stay bounded as z -> 0.  A term z^k, k < d,
     in 1 - f makes g grow like z^(k-d): refuse samples (above the noise
     scale zn) where |g| exceeds 2.5 times its largest value on [4z, 8z]
     plus half its largest value beyond zr = (horizon or z_max)/4.  */
  {
    double zend = ih ? z[ih] : z[n - 1], zn = zend * pow (1e-7, 1.0 / d);
    double zr = zend / 4, gfar = 0;
    for (i = 1; i < n; i++)
      if (z[i] >= zr)
        gfar = fmax (gfar, fabs (gv[i]));
    for (i = 1; i < n && 8 * z[i] < zr; i++)
      {
        double gnear = -1;
        if (z[i] < zn)
          continue;
        for (size_t j = i + 1; j < n && z[j] <= 8 * z[i]; j++)
          if (z[j] >= 4 * z[i])
            gnear = fmax (gnear, fabs (gv[j]));
        if (gnear >= 0 && fabs (gv[i]) > 2.5 * gnear + 0.5 * gfar
                                          + 1e-9 / gsl_pow_int (z[i], d))
          {
            free (gv);
            if (bad)
              *bad = i;
            return HOLENT_EDOM;
          }
      }
  }
  bg->tab = calloc (1, sizeof *bg->tab);
  if (bg->tab)
    bg->tab->g = gsl_spline_alloc (gsl_interp_cspline, n);
  if (bg->tab == NULL || bg->tab->g == NULL)
    {
      free (gv);
      holent_hd_bg_free (bg);
      return HOLENT_ENOMEM;
    }
  st = gsl_spline_init (bg->tab->g, z, gv, n);
  free (gv);
  if (st)
    {
      holent_hd_bg_free (bg);
      return HOLENT_EDOM;
    }
  bg->d = d;
  bg->kind = HOLENT_HD_TABULATED;
  bg->ell = ell;
  bg->G = G;
  bg->eps = eps;
  bg->zmax = z[n - 1];
  bg->zh = INFINITY;
  bg->m = g_eval (bg, 0.0, NULL);
  if (ih)
    {
      double zh = z[ih];
      if (f[ih] < 0)
        {
          /* first zero of the spline inside the bracketing samples */
          gsl_function F = { tab_f, bg };
          gsl_root_fsolver *s = gsl_root_fsolver_alloc (gsl_root_fsolver_brent);
          if (s == NULL)
            {
              holent_hd_bg_free (bg);
              return HOLENT_ENOMEM;
            }
          st = gsl_root_fsolver_set (s, &F, z[ih - 1], z[ih]);
          for (int it = 0; st == GSL_SUCCESS && it < ROOT_ITMAX; it++)
            {
              st = gsl_root_fsolver_iterate (s);
              if (st)
                break;
              st = gsl_root_test_interval (gsl_root_fsolver_x_lower (s),
                                           gsl_root_fsolver_x_upper (s),
                                           0, 1e-15);
              if (st == GSL_SUCCESS)
                break;
              if (st != GSL_CONTINUE)
                break;
              st = GSL_SUCCESS;
              if (it == ROOT_ITMAX - 1)
                st = GSL_EMAXITER;
            }
          zh = gsl_root_fsolver_root (s);
          gsl_root_fsolver_free (s);
          if (st)
            {
              holent_hd_bg_free (bg);
              return HOLENT_ENOCONV;
            }
        }
      bg->zh = zh;
      double fh, fph;
      holent_hd_bg_f (bg, zh, &fh, &fph);
      bg->fp_h = fph;
      /* Re-expand z^d g(z) about zh on the spline piece left of zh: near
         the horizon f = 1 - z^d g would lose digits to cancellation.  */
      {
        size_t k = 1;
        while (k < n - 1 && z[k] < zh)
          k++;
        double xl = z[k - 1], xr = z[k], a1 = xl + 0.25 * (xr - xl);
        double a2 = xl + 0.75 * (xr - xl), gc[4], b = 1, g2a, g2b, g1;
        gc[0] = g_eval (bg, zh, &g1);
        gc[1] = g1;
        if (gsl_spline_eval_deriv2_e (bg->tab->g, zh, NULL, &gc[2])
            || gsl_spline_eval_deriv2_e (bg->tab->g, a1, NULL, &g2a)
            || gsl_spline_eval_deriv2_e (bg->tab->g, a2, NULL, &g2b))
          {
            holent_hd_bg_free (bg);
            return HOLENT_EDOM;
          }
        gc[2] *= 0.5;
        gc[3] = (g2b - g2a) / (a2 - a1) / 6;
        for (int q = 0; q < HOLENT_HD_DMAX + 4; q++)
          bg->hc[q] = 0;
        for (int j = 0; j <= d; j++)  /* b = binom(d, j) */
          {
            for (int q = 0; q < 4; q++)
              bg->hc[j + q] += b * gsl_pow_int (zh, d - j) * gc[q];
            b = b * (d - j) / (j + 1);
          }
        bg->hw = fmin (zh - xl, 0.05 * zh);
      }
    }
  bg->Z = isfinite (bg->zh) ? bg->zh : bg->zmax;
  /* Next to a tabulated horizon the re-expansion keeps f accurate; the
     turning points stop at 1e-30 zh (the table stays short).  */
  bg->wmin = isfinite (bg->zh) ? 1e-30 * bg->zh : 1e-15 * bg->zmax;
  return HOLENT_SUCCESS;
}

int
holent_hd_bg_f (const holent_hd_bg *bg, double z, double *f, double *fp)
{
  if (bg == NULL || f == NULL || isnan (z))
    return HOLENT_EINVAL;
  if (z < 0 || z > bg->zmax)
    return HOLENT_EDOM;
  double d = bg->d, fpv = 0;
  switch (bg->kind)
    {
    case HOLENT_HD_VACUUM:
      *f = 1;
      break;
    case HOLENT_HD_BRANE:
      *f = 1 - gsl_pow_int (z / bg->zh, bg->d);
      fpv = -d * gsl_pow_int (z / bg->zh, bg->d - 1) / bg->zh;
      break;
    default:
      {
        double gp, g = g_eval (bg, z, &gp);
        *f = 1 - gsl_pow_int (z, bg->d) * g;
        fpv = -(d * gsl_pow_int (z, bg->d - 1) * g + gsl_pow_int (z, bg->d) * gp);
      }
    }
  if (fp)
    *fp = fpv;
  return HOLENT_SUCCESS;
}

double
holent_hd_bg_omf (const holent_hd_bg *bg, double z)
{
  switch (bg->kind)
    {
    case HOLENT_HD_VACUUM: return 0;
    case HOLENT_HD_BRANE: return gsl_pow_int (z / bg->zh, bg->d);
    default: return gsl_pow_int (z, bg->d) * g_eval (bg, z, NULL);
    }
}

double
holent_hd_bg_mcoef (const holent_hd_bg *bg, double z)
{
  switch (bg->kind)
    {
    case HOLENT_HD_VACUUM: return 0;
    case HOLENT_HD_BRANE: return bg->m;
    default: return g_eval (bg, z, NULL);
    }
}

/* For the brane near its horizon 1 - x^d = (1 - x)(1 + x + ... + x^(d-1))
   keeps every digit.  */
double
holent_hd_bg_fval (const holent_hd_bg *bg, double z, double wz)
{
  if (bg->kind == HOLENT_HD_BRANE)
    {
      double x = z / bg->zh;
      if (x < 0.5)
        return 1 - gsl_pow_int (x, bg->d);
      double s = 1;
      for (int k = 1; k < bg->d; k++)
        s = 1 + x * s;
      return (wz / bg->zh) * s;
    }
  if (bg->kind == HOLENT_HD_TABULATED && wz > 0 && wz <= bg->hw)
    {
      double s = 0;  /* -sum_{n >= 1} hc[n] (-wz)^n by Horner */
      for (int k = bg->d + 3; k >= 1; k--)
        s = bg->hc[k] - wz * s;
      return wz * s;
    }
  return 1 - holent_hd_bg_omf (bg, z);
}

