/* holent_hd_bg.c: planar AdS_{d+1} backgrounds (vacuum, brane,
 * tabulated).  See holent_hd_bg.h and doc/higher_dimensional.md
 * ("Tabulated f: fit, horizon, accuracy").
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_linalg.h>
#include <gsl/gsl_multifit.h>
#include <gsl/gsl_min.h>
#include "holent_root.h"
#include "holent_hd_bg.h"

#define ROOT_ITMAX 200
#define FIT_PMAX 4       /* largest degree of the near-boundary polynomial */
#define FIT_WINDOWS 24   /* windows z_end 2^-k tried for the fit            */
#define END_FIT 12       /* samples of the local fit at the table's end     */

static int
d_ok (int d)
{
  return d >= 2 && d <= HOLENT_HD_DMAX;
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
holent_hd_brane_zh (int d, double T, double *zh)
{
  if (zh == NULL || isnan (T))
    return HOLENT_EINVAL;
  if (!d_ok (d))
    return HOLENT_EDOM;
  if (!(T > 0) || !isfinite (T))
    return HOLENT_EDOM;
  *zh = d / (4 * M_PI * T);
  return *zh > 0 && isfinite (*zh) ? HOLENT_SUCCESS : HOLENT_EDOM;
}

/* Thermodynamics from zh, f'(zh) and m (doc/higher_dimensional.md).  */
static int
derive (holent_hd_bg *bg)
{
  double l = pow (bg->ell, bg->d - 1);
  bg->e = (bg->d - 1) * l * bg->m / (16 * M_PI * bg->G);
  bg->T = bg->s = bg->T_err = 0;
  if (isfinite (bg->zh))
    {
      bg->T = fabs (bg->fp_h) / (4 * M_PI);
      bg->T_err = bg->fp_err / (4 * M_PI);
      bg->s = l / (4 * bg->G * pow (bg->zh, bg->d - 1));
    }
  if (!isfinite (bg->e) || !isfinite (bg->s) || !isfinite (bg->T)
      || !isfinite (bg->m))
    {
      bg->why = HOLENT_HD_WHY_RANGE;
      return HOLENT_EDOM;
    }
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
  return derive (bg);
}

void
holent_hd_bg_free (holent_hd_bg *bg)
{
  if (bg == NULL)
    return;
  free (bg->tz);
  free (bg->tg);
  free (bg->tg2);
  bg->tz = bg->tg = bg->tg2 = NULL;
  bg->n = 0;
}

/* ------------------------------------------------------------------ */
/* The spline of g                                                     */

/* the piece i with tz[i] <= z <= tz[i+1] */
static size_t
piece (const holent_hd_bg *bg, double z)
{
  size_t lo = 0, hi = bg->n - 1;
  while (hi - lo > 1)
    {
      size_t mid = (lo + hi) / 2;
      if (bg->tz[mid] <= z)
        lo = mid;
      else
        hi = mid;
    }
  return lo;
}

/* g, g', g''/2, g'''/6 of piece i at z */
static void
g_piece (const holent_hd_bg *bg, size_t i, double z, double c[4])
{
  double h = bg->tz[i + 1] - bg->tz[i], t = (z - bg->tz[i]) / h, s = 1 - t;
  double yl = bg->tg[i], yr = bg->tg[i + 1];
  double ml = bg->tg2[i], mr = bg->tg2[i + 1];
  c[0] = s * yl + t * yr + h * h / 6 * ((s * s * s - s) * ml + (t * t * t - t) * mr);
  c[1] = (yr - yl) / h + h / 6 * (-(3 * s * s - 1) * ml + (3 * t * t - 1) * mr);
  c[2] = 0.5 * (s * ml + t * mr);
  c[3] = (mr - ml) / (6 * h);
}

static double
g_eval (const holent_hd_bg *bg, double z, double *gp)
{
  double c[4];
  if (z > bg->zmax)
    z = bg->zmax;
  if (z < 0)
    z = 0;
  g_piece (bg, piece (bg, z), z, c);
  if (gp)
    *gp = c[1];
  return c[0];
}

static double
tab_f (double z, void *p)
{
  const holent_hd_bg *bg = p;
  return 1.0 - gsl_pow_int (z, bg->d) * g_eval (bg, z, NULL);
}

/* f' of the spline */
static double
tab_fp (const holent_hd_bg *bg, double z)
{
  double gp, g = g_eval (bg, z, &gp);
  return -(bg->d * gsl_pow_int (z, bg->d - 1) * g + gsl_pow_int (z, bg->d) * gp);
}

/* Second derivatives of the cubic spline through (x, y) with end slopes
   s0, s1 (clamped: accurate to O(h^4) up to both ends, where a natural
   spline would force g'' = 0 at a horizon that ends the table).  */
static int
clamped_spline (size_t n, const double *x, const double *y, double s0,
                double s1, double *m2)
{
  gsl_vector *dg = gsl_vector_alloc (n), *e = gsl_vector_alloc (n - 1);
  gsl_vector *b = gsl_vector_alloc (n);
  gsl_vector_view mv = gsl_vector_view_array (m2, n);
  int st = HOLENT_ENOMEM;
  if (dg && e && b)
    {
      for (size_t i = 0; i + 1 < n; i++)
        gsl_vector_set (e, i, x[i + 1] - x[i]);
      for (size_t i = 0; i < n; i++)
        {
          double hl = i > 0 ? x[i] - x[i - 1] : 0;
          double hr = i + 1 < n ? x[i + 1] - x[i] : 0;
          double sl = i > 0 ? (y[i] - y[i - 1]) / hl : s0;
          double sr = i + 1 < n ? (y[i + 1] - y[i]) / hr : s1;
          gsl_vector_set (dg, i, 2 * (hl + hr));
          gsl_vector_set (b, i, 6 * (sr - sl));
        }
      st = gsl_linalg_solve_symm_tridiag (dg, e, b, &mv.vector)
               ? HOLENT_EDOM : HOLENT_SUCCESS;
    }
  gsl_vector_free (dg);
  gsl_vector_free (e);
  gsl_vector_free (b);
  return st;
}

/* ------------------------------------------------------------------ */
/* Fits                                                                */

static int
cmp_double (const void *a, const void *b)
{
  double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

/* Accuracy of the samples: each f[i] against the cubic through its four
   neighbours (two on each side), scaled to one sample's share; the median
   absolute residual / 0.6745 (robust against a few outliers).  It is the
   noise of rounded or noisy data, and the interpolation error of smooth
   data on a coarse grid: the accuracy the spline can have either way.  */
static double
noise_estimate (size_t n, const double *z, const double *f)
{
  double fmaxv = 0, sig;
  for (size_t i = 0; i < n; i++)
    fmaxv = fmax (fmaxv, fabs (f[i]));
  double floor_ = 4 * GSL_DBL_EPSILON * fmaxv;
  if (n < 7)
    return floor_;
  double *r = malloc ((n - 4) * sizeof *r);
  if (r == NULL)
    return NAN;
  for (size_t i = 2; i + 2 < n; i++)
    {
      const double xs[4] = { z[i - 2], z[i - 1], z[i + 1], z[i + 2] };
      const double ys[4] = { f[i - 2], f[i - 1], f[i + 1], f[i + 2] };
      double p = 0, w2 = 0;
      for (int a = 0; a < 4; a++)
        {
          double w = 1;
          for (int b = 0; b < 4; b++)
            if (b != a)
              w *= (z[i] - xs[b]) / (xs[a] - xs[b]);
          p += w * ys[a];
          w2 += w * w;
        }
      r[i - 2] = fabs (f[i] - p) / sqrt (1 + w2);
    }
  qsort (r, n - 4, sizeof *r, cmp_double);
  sig = r[(n - 4) / 2] / 0.6745;
  free (r);
  return fmax (sig, floor_);
}

/* Weighted least squares (uniform noise sigma in f) of y = 1 - f on the
   samples 0 < z <= zw: y = sum_{j=1}^{low} a_j x^j + sum_{k=0}^{p}
   b_k x^(d+k), x = z/zw.  c gets (b_0..b_p, a_1..a_low) in x units, se
   their standard errors; *np the number of samples used.  */
static int
lsq (int d, size_t n, const double *z, const double *f, double zw, int p,
     int low, double sigma, double *c, double *se, size_t *np)
{
  size_t m = 0, ncol = (size_t) (p + 1 + low);
  while (m + 1 < n && z[m + 1] <= zw)
    m++;
  *np = m;
  if (m < ncol + 3)
    return HOLENT_EDOM;
  gsl_matrix *X = gsl_matrix_alloc (m, ncol), *cov = gsl_matrix_alloc (ncol, ncol);
  gsl_vector *y = gsl_vector_alloc (m), *w = gsl_vector_alloc (m);
  gsl_vector *cv = gsl_vector_alloc (ncol);
  gsl_multifit_linear_workspace *ws = gsl_multifit_linear_alloc (m, ncol);
  int st = HOLENT_ENOMEM;
  if (X && cov && y && w && cv && ws)
    {
      double chisq;
      for (size_t i = 0; i < m; i++)
        {
          double x = z[i + 1] / zw;
          for (int k = 0; k <= p; k++)
            gsl_matrix_set (X, i, (size_t) k, gsl_pow_int (x, d + k));
          for (int j = 1; j <= low; j++)
            gsl_matrix_set (X, i, (size_t) (p + j), gsl_pow_int (x, j));
          gsl_vector_set (y, i, 1 - f[i + 1]);
          gsl_vector_set (w, i, 1 / (sigma * sigma));
        }
      st = gsl_multifit_wlinear (X, w, y, cv, cov, &chisq, ws)
               ? HOLENT_EDOM : HOLENT_SUCCESS;
      for (size_t k = 0; !st && k < ncol; k++)
        {
          c[k] = gsl_vector_get (cv, k);
          se[k] = sqrt (gsl_matrix_get (cov, k, k));
          if (!isfinite (c[k]) || !isfinite (se[k]))
            st = HOLENT_EDOM;
        }
    }
  gsl_matrix_free (X);
  gsl_matrix_free (cov);
  gsl_vector_free (y);
  gsl_vector_free (w);
  gsl_vector_free (cv);
  if (ws)
    gsl_multifit_linear_free (ws);
  return st;
}

typedef struct
{
  double zw;                 /* window                                  */
  int p;                     /* degree                                  */
  double b[FIT_PMAX + 1];    /* g = sum b_k z^k on the window (z units) */
  double err;                /* error estimate of b_0 = m               */
} bfit;

/* The near-boundary fit: over windows zw = z_end 2^-k and degrees p, the
   one whose estimate 2 se(b0) + |b0(p) - b0(p+1)| (noise plus
   truncation) is least.  */
static int
boundary_fit (int d, size_t n, const double *z, const double *f,
              double sigma, bfit *best)
{
  double c[FIT_PMAX + 2 + HOLENT_HD_DMAX], se[FIT_PMAX + 2 + HOLENT_HD_DMAX];
  double c2[FIT_PMAX + 2 + HOLENT_HD_DMAX], se2[FIT_PMAX + 2 + HOLENT_HD_DMAX];
  size_t np;
  best->err = INFINITY;
  double zw = z[n - 1];
  for (int k = 0; k < FIT_WINDOWS; k++, zw *= 0.5)
    {
      int st = 0;
      for (int p = 1; p < FIT_PMAX && !st; p++)
        {
          st = lsq (d, n, z, f, zw, p, 0, sigma, c, se, &np);
          if (!st)
            st = lsq (d, n, z, f, zw, p + 1, 0, sigma, c2, se2, &np);
          if (st == HOLENT_ENOMEM)
            return st;
          if (st)
            break;
          double sc = gsl_pow_int (zw, d);
          double err = (2 * se[0] + fabs (c[0] - c2[0])) / sc;
          if (err < best->err)
            {
              best->err = err;
              best->zw = zw;
              best->p = p;
              for (int q = 0; q <= p; q++)
                best->b[q] = c[q] / gsl_pow_int (zw, d + q);
            }
        }
      if (st)
        break;  /* too few samples in smaller windows */
    }
  return isfinite (best->err) ? HOLENT_SUCCESS : HOLENT_EDOM;
}

/* f - 1 = O(z^d): with the powers z^1 ... z^(d-1) added to the chosen
   fit, none may be significant (|a_j| above 8 standard errors, 10 times
   the noise and 1e-2 of the largest |1 - f| in the window), in any window from the
   smallest with enough samples up to the fit's: a low power is most
   visible near the boundary, noise least in wide windows.  */
static int
boundary_check (int d, size_t n, const double *z, const double *f,
                double sigma, const bfit *bf, size_t *bad)
{
  double c[FIT_PMAX + 2 + HOLENT_HD_DMAX], se[FIT_PMAX + 2 + HOLENT_HD_DMAX];
  size_t np, i;
  int p = bf->p, checked = 0;
  double zw = bf->zw;
  while (zw > 0 && lsq (d, n, z, f, 0.5 * zw, p, d - 1, sigma, c, se, &np) == 0)
    zw *= 0.5;  /* the smallest window with enough samples */
  for (;; zw = fmin (2 * zw, z[n - 1]))
    {
      int st = lsq (d, n, z, f, zw, p, d - 1, sigma, c, se, &np);
      if (st == HOLENT_ENOMEM)
        return st;
      if (!st)
        {
          double scale = 0;
          checked = 1;
          for (i = 1; i <= np; i++)
            scale = fmax (scale, fabs (1 - f[i]));
          for (int j = 1; j < d; j++)
            {
              double a = c[p + j], s = se[p + j];
              /* (a is the power's share at z = zw) */
              if (fabs (a) > 8 * s && fabs (a) > 10 * sigma
                  && fabs (a) > 1e-2 * scale)
                {
                  /* first sample where the power z^j is felt */
                  for (i = 1; i < np && fabs (a) * pow (z[i] / zw, j) < 5 * sigma; i++)
                    ;
                  if (bad)
                    *bad = i;
                  return HOLENT_EDOM;
                }
            }
        }
      if (zw >= bf->zw || zw >= z[n - 1])
        break;
    }
  if (!checked)
    {
      /* fewer samples than unknowns: nothing can be checked */
      if (bad)
        *bad = n - 1;
      return HOLENT_EEMPTY;
    }
  return HOLENT_SUCCESS;
}

/* g' at the table's end from a least-squares cubic in z over the last
   END_FIT samples.  */
static double
end_slope (size_t n, const double *z, const double *g)
{
  size_t k = n < END_FIT ? n : END_FIT, i0 = n - k;
  double zr = z[n - 1], hs = zr - z[i0], s = NAN;
  gsl_matrix *X = gsl_matrix_alloc (k, 4), *cov = gsl_matrix_alloc (4, 4);
  gsl_vector *y = gsl_vector_alloc (k), *c = gsl_vector_alloc (4);
  gsl_multifit_linear_workspace *ws = gsl_multifit_linear_alloc (k, 4);
  if (X && cov && y && c && ws && k >= 5)
    {
      double chisq;
      for (size_t i = 0; i < k; i++)
        {
          double x = (z[i0 + i] - zr) / hs;
          for (int q = 0; q < 4; q++)
            gsl_matrix_set (X, i, (size_t) q, gsl_pow_int (x, q));
          gsl_vector_set (y, i, g[i0 + i]);
        }
      if (!gsl_multifit_linear (X, y, c, cov, &chisq, ws))
        s = gsl_vector_get (c, 1) / hs;
    }
  gsl_matrix_free (X);
  gsl_matrix_free (cov);
  gsl_vector_free (y);
  gsl_vector_free (c);
  if (ws)
    gsl_multifit_linear_free (ws);
  return s;
}

/* ------------------------------------------------------------------ */
/* Horizon                                                             */

static int
brent_root (const holent_hd_bg *bg, double lo, double hi, double *root)
{
  return holent_root_brent (tab_f, (void *) bg, lo, hi, 0.0, 1e-15,
                            ROOT_ITMAX, root);
}

/* least f on [lo, hi] where f' changes sign from - to + */
static int
min_f (const holent_hd_bg *bg, double lo, double hi, double *zm, double *fm)
{
  gsl_function F = { tab_f, (void *) bg };
  gsl_min_fminimizer *s = gsl_min_fminimizer_alloc (gsl_min_fminimizer_brent);
  if (s == NULL)
    return HOLENT_ENOMEM;
  double x = 0.5 * (lo + hi), fx = tab_f (x, (void *) bg);
  double flo = tab_f (lo, (void *) bg), fhi = tab_f (hi, (void *) bg);
  /* Brent's minimiser needs f(x) below both ends: probe a few points */
  for (int k = 1; k < 16 && !(fx < flo && fx < fhi); k++)
    {
      x = lo + (hi - lo) * k / 16.0;
      fx = tab_f (x, (void *) bg);
    }
  int st = GSL_SUCCESS;
  if (fx < flo && fx < fhi)
    {
      st = gsl_min_fminimizer_set_with_values (s, &F, x, fx, lo, flo, hi, fhi);
      for (int it = 0; st == GSL_SUCCESS && it < ROOT_ITMAX; it++)
        {
          if ((st = gsl_min_fminimizer_iterate (s)))
            break;
          st = gsl_min_test_interval (gsl_min_fminimizer_x_lower (s),
                                      gsl_min_fminimizer_x_upper (s), 0, 1e-12);
          if (st == GSL_SUCCESS)
            break;
          if (st == GSL_CONTINUE)
            st = GSL_SUCCESS;
        }
      x = gsl_min_fminimizer_x_minimum (s);
      fx = gsl_min_fminimizer_f_minimum (s);
    }
  else
    {
      x = flo < fhi ? lo : hi;
      fx = fmin (flo, fhi);
    }
  gsl_min_fminimizer_free (s);
  *zm = x;
  *fm = fx;
  return st ? HOLENT_ENOCONV : HOLENT_SUCCESS;
}

/* The first zero of f: a sign change, a dip below zero between samples,
   a touch within the noise (double zero), or the table's end within the
   noise.  Sets zh, fp_h, fp_err, extremal, hc, hw.  */
static int
locate_horizon (holent_hd_bg *bg)
{
  size_t n = bg->n;
  double tol = 10 * bg->noise, zh = INFINITY;
  int st, touch = 0;
  const double *z = bg->tz;
  for (size_t i = 0; i + 1 < n && !isfinite (zh); i++)
    {
      double fl = tab_f (z[i], bg), fr = tab_f (z[i + 1], bg);
      if (fr <= 0)
        {
          if (fr == 0 || fl <= 0)
            zh = fr == 0 ? z[i + 1] : z[i];
          else if ((st = brent_root (bg, z[i], z[i + 1], &zh)))
            return st;
          break;
        }
      if (fmin (fl, fr) > 0.25 || !(tab_fp (bg, z[i]) < 0)
          || !(tab_fp (bg, z[i + 1]) > 0))
        continue;
      double zm, fm;
      if ((st = min_f (bg, z[i], z[i + 1], &zm, &fm)) == HOLENT_ENOMEM)
        return st;
      if (fm < 0)
        {
          if ((st = brent_root (bg, z[i], zm, &zh)))
            return st;
        }
      else if (fm <= tol)
        {
          zh = zm;
          touch = 1;
        }
    }
  if (!isfinite (zh) && n > 1 && tab_f (z[n - 1], bg) <= tol
      && !(tab_fp (bg, z[n - 1]) > 0))
    zh = z[n - 1];  /* the table ends at the horizon */
  bg->zh = zh;
  if (!isfinite (zh))
    return HOLENT_SUCCESS;
  size_t k = piece (bg, zh);
  if (zh <= z[k] && k > 0)
    k--;  /* the piece left of zh */
  double h = z[k + 1] - z[k], gc[4], b = 1, fpp;
  g_piece (bg, k, zh, gc);
  bg->fp_h = tab_fp (bg, zh);
  /* f'' at zh, for the slope a noise sigma can fake at a double zero */
  {
    int d = bg->d;
    fpp = -(d * (d - 1.0) * gsl_pow_int (zh, d - 2) * gc[0]
            + 2.0 * d * gsl_pow_int (zh, d - 1) * gc[1]
            + gsl_pow_int (zh, d) * 2 * gc[2]);
  }
  /* slope error: the noise over a grid step, and at a double zero the
     slope sqrt(2 |f''| sigma) of a parabola lowered by sigma */
  double famb = sqrt (2 * fabs (fpp) * bg->noise);
  bg->fp_err = 2 * bg->noise / h + famb;
  bg->extremal = touch || fabs (bg->fp_h) <= 2 * bg->noise / h + 2 * famb;
  for (int q = 0; q < HOLENT_HD_DMAX + 4; q++)
    bg->hc[q] = 0;
  /* Re-expand z^d g(z) about zh on the piece left of zh: near the
     horizon f = 1 - z^d g would lose digits to cancellation.  */
  for (int j = 0; j <= bg->d; j++)  /* b = binom(d, j) */
    {
      for (int q = 0; q < 4; q++)
        bg->hc[j + q] += b * gsl_pow_int (zh, bg->d - j) * gc[q];
      b = b * (bg->d - j) / (j + 1);
    }
  if (bg->extremal)
    {
      bg->fp_h = 0;
      bg->hc[1] = 0;
      /* f(zh) = 0 and f'(zh) = 0: keep the curvature non-negative */
      if (bg->hc[2] > 0)
        bg->hc[2] = 0;
    }
  bg->hw = fmin (zh - z[k], 0.05 * zh);
  if (!(bg->hw > 0))
    bg->hw = fmin (h, 0.05 * zh);
  return HOLENT_SUCCESS;
}

/* ------------------------------------------------------------------ */
/* Constructors                                                        */

static int
samples_ok (holent_hd_bg *bg, size_t n, const double *z, const double *f,
            size_t *bad)
{
  bg->why = HOLENT_HD_WHY_SAMPLES;
  for (size_t i = 0; i < n; i++)
    if (!isfinite (z[i]) || !isfinite (f[i]) || (i > 0 && !(z[i] > z[i - 1])))
      {
        if (bad)
          *bad = i;
        return (isnan (z[i]) || isnan (f[i])) ? HOLENT_EINVAL : HOLENT_EDOM;
      }
  if (z[0] != 0.0)
    {
      if (bad)
        *bad = 0;
      return HOLENT_EDOM;
    }
  bg->why = HOLENT_HD_WHY_NONE;
  return HOLENT_SUCCESS;
}

static int
finish (holent_hd_bg *bg, int d, double ell, double G, double eps)
{
  bg->d = d;
  bg->kind = HOLENT_HD_TABULATED;
  bg->ell = ell;
  bg->G = G;
  bg->eps = eps;
  bg->zmax = bg->tz[bg->n - 1];
  bg->m = bg->tg[0];
  int st = locate_horizon (bg);
  if (st)
    return st;
  bg->Z = isfinite (bg->zh) ? bg->zh : bg->zmax;
  /* Next to a tabulated horizon the re-expansion keeps f accurate; the
     turning points stop at 1e-30 zh (the table stays short).  */
  bg->wmin = isfinite (bg->zh) ? 1e-30 * bg->zh : 1e-15 * bg->zmax;
  return derive (bg);
}

static int
alloc_arrays (holent_hd_bg *bg, size_t n)
{
  bg->tz = malloc (n * sizeof *bg->tz);
  bg->tg = malloc (n * sizeof *bg->tg);
  bg->tg2 = malloc (n * sizeof *bg->tg2);
  bg->n = n;
  if (!bg->tz || !bg->tg || !bg->tg2)
    {
      holent_hd_bg_free (bg);
      return HOLENT_ENOMEM;
    }
  return HOLENT_SUCCESS;
}

int
holent_hd_bg_tabulated (holent_hd_bg *bg, int d, size_t n, const double *z,
                        const double *f, double noise, double ell, double G,
                        double eps, size_t *bad)
{
  int st;
  bfit bf = { 0 };
  if (bg == NULL)
    return HOLENT_EINVAL;
  memset (bg, 0, sizeof *bg);
  if (z == NULL || f == NULL || isnan (noise))
    return HOLENT_EINVAL;
  if (!d_ok (d))
    return HOLENT_EDOM;
  if ((st = common_ok (ell, G, eps)))
    return st;
  if (n < 5 || !isfinite (noise))
    return HOLENT_EDOM;
  if ((st = samples_ok (bg, n, z, f, bad)))
    return st;
  double sigma = noise > 0 ? noise : noise_estimate (n, z, f);
  if (!isfinite (sigma))
    return HOLENT_ENOMEM;
  if (fabs (f[0] - 1.0) > fmax (1e-10, 10 * sigma))
    {
      if (bad)
        *bad = 0;
      bg->why = HOLENT_HD_WHY_F0;
      return HOLENT_EDOM;
    }
  if ((st = boundary_fit (d, n, z, f, sigma, &bf)))
    {
      if (bad && st == HOLENT_EDOM)
        *bad = n - 1;
      bg->why = HOLENT_HD_WHY_FEW;
      return st;
    }
  if ((st = boundary_check (d, n, z, f, sigma, &bf, bad)))
    {
      bg->why = st == HOLENT_EEMPTY ? HOLENT_HD_WHY_FEW : HOLENT_HD_WHY_BOUNDARY;
      return st == HOLENT_EEMPTY ? HOLENT_EDOM : st;
    }
  if ((st = alloc_arrays (bg, n)))
    return st;
  memcpy (bg->tz, z, n * sizeof *z);
  /* g from the samples; next to the boundary, where their noise divided
     by z^d exceeds the fit's error, from the fit */
  double zr = pow (sigma / fmax (bf.err, 1e-300), 1.0 / d);
  for (size_t i = 0; i < n; i++)
    {
      double x = z[i];
      if (i == 0 || (x <= bf.zw && x < zr))
        {
          double gv = 0;
          for (int q = bf.p; q >= 0; q--)
            gv = bf.b[q] + x * gv;
          bg->tg[i] = gv;
        }
      else
        bg->tg[i] = (1.0 - f[i]) / gsl_pow_int (x, d);
    }
  double s1 = end_slope (n, bg->tz, bg->tg);
  if (!isfinite (s1))
    s1 = (bg->tg[n - 1] - bg->tg[n - 2]) / (z[n - 1] - z[n - 2]);
  if ((st = clamped_spline (n, bg->tz, bg->tg, bf.p >= 1 ? bf.b[1] : 0, s1,
                            bg->tg2)))
    {
      holent_hd_bg_free (bg);
      return st;
    }
  bg->noise = sigma;
  bg->m_err = bf.err;
  if ((st = finish (bg, d, ell, G, eps)))
    {
      holent_hd_bg_free (bg);
      return st;
    }
  return HOLENT_SUCCESS;
}

int
holent_hd_bg_spline (holent_hd_bg *bg, int d, size_t n, const double *tz,
                     const double *tg, const double *tg2, double noise,
                     double ell, double G, double eps, size_t *bad)
{
  int st;
  if (bg == NULL)
    return HOLENT_EINVAL;
  memset (bg, 0, sizeof *bg);
  if (tz == NULL || tg == NULL || tg2 == NULL || isnan (noise))
    return HOLENT_EINVAL;
  if (!d_ok (d))
    return HOLENT_EDOM;
  if ((st = common_ok (ell, G, eps)))
    return st;
  if (n < 5 || !(noise >= 0) || !isfinite (noise))
    return HOLENT_EDOM;
  if ((st = samples_ok (bg, n, tz, tg, bad))
      || (st = samples_ok (bg, n, tz, tg2, bad)))
    return st;
  if ((st = alloc_arrays (bg, n)))
    return st;
  memcpy (bg->tz, tz, n * sizeof *tz);
  memcpy (bg->tg, tg, n * sizeof *tg);
  memcpy (bg->tg2, tg2, n * sizeof *tg2);
  bg->noise = noise;
  if ((st = finish (bg, d, ell, G, eps)))
    {
      holent_hd_bg_free (bg);
      return st;
    }
  return HOLENT_SUCCESS;
}

int
holent_hd_bg_perturbed (const holent_hd_bg *bg, holent_hd_bg *out)
{
  if (bg == NULL || out == NULL)
    return HOLENT_EINVAL;
  memset (out, 0, sizeof *out);
  if (bg->kind != HOLENT_HD_TABULATED || bg->n < 5)
    return HOLENT_EINVAL;
  double big = 0;
  for (size_t i = 0; i < bg->n; i++)
    big = fmax (big, fabs (gsl_pow_int (bg->tz[i], bg->d) * bg->tg[i]));
  double rho = big > 0 ? bg->noise / big : 0;
  if (bg->m != 0)
    rho = fmax (rho, bg->m_err / fabs (bg->m));
  int st = holent_hd_bg_spline (out, bg->d, bg->n, bg->tz, bg->tg, bg->tg2,
                                bg->noise, bg->ell, bg->G, bg->eps, NULL);
  if (st)
    return st;
  /* a spline scaled is the spline of the scaled values: no refit */
  for (size_t i = 0; i < out->n; i++)
    {
      out->tg[i] *= 1 + rho;
      out->tg2[i] *= 1 + rho;
    }
  if ((st = finish (out, bg->d, bg->ell, bg->G, bg->eps)))
    holent_hd_bg_free (out);
  return st;
}

/* ------------------------------------------------------------------ */
/* Evaluators                                                          */

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
      *f = tab_f (z, (void *) bg);
      fpv = tab_fp (bg, z);
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
  if (bg->kind == HOLENT_HD_TABULATED && isfinite (bg->zh) && wz > 0
      && wz <= bg->hw)
    {
      double s = 0;  /* -sum_{n >= 1} hc[n] (-wz)^n by Horner */
      for (int k = bg->d + 3; k >= 1; k--)
        s = bg->hc[k] - wz * s;
      return wz * s;
    }
  return 1 - holent_hd_bg_omf (bg, z);
}

int
holent_hd_dimension (double d, int *out, holent_err *e)
{
  if (out == NULL)
    return HOLENT_EINVAL;
  if (isnan (d))
    return holent_err_set (e, HOLENT_ENAN, 0, HOLENT_NOINDEX,
                           "must be an integer from 2 to %d, not NaN",
                           HOLENT_HD_DMAX);
  /* compared as a double first: a huge d must not reach the int cast */
  if (d != floor (d) || d < 2 || d > HOLENT_HD_DMAX)
    return holent_err_set (e, HOLENT_EDOM, 0, HOLENT_NOINDEX,
                           "must be an integer from 2 to %d, got %g",
                           HOLENT_HD_DMAX, d);
  *out = (int) d;
  return HOLENT_SUCCESS;
}

int
holent_hd_bg_explain (const holent_hd_bg *bg, int d, int status, size_t bad,
                      const double *z, holent_err *e)
{
  holent_hd_why why = bg != NULL ? bg->why : HOLENT_HD_WHY_NONE;
  if (status == HOLENT_SUCCESS)
    {
      holent_err_clear (e);
      return status;
    }
  switch (why)
    {
    case HOLENT_HD_WHY_SAMPLES:
      return holent_err_set (e, status, -1, HOLENT_NOINDEX,
                             "'z' and 'f' must be finite with z(1) = 0 < "
                             "z(2) < ... (sample %zu)", bad + 1);
    case HOLENT_HD_WHY_F0:
      return holent_err_set (e, status, -1, HOLENT_NOINDEX,
                             "'f' must be 1 at z = 0 (the AdS boundary)");
    case HOLENT_HD_WHY_BOUNDARY:
      if (z != NULL && bad != HOLENT_NOINDEX)
        return holent_err_set (e, status, -1, HOLENT_NOINDEX,
                               "f - 1 must vanish like z^%d at the boundary "
                               "(sample %zu, z = %g)", d, bad + 1, z[bad]);
      return holent_err_set (e, status, -1, HOLENT_NOINDEX,
                             "f - 1 must vanish like z^%d at the boundary",
                             d);
    case HOLENT_HD_WHY_FEW:
      return holent_err_set (e, status, -1, HOLENT_NOINDEX,
                             "too few samples near the boundary to fit f = "
                             "1 - m z^%d + ...: give at least %d", d, d + 7);
    case HOLENT_HD_WHY_RANGE:
      return holent_err_set (e, status, -1, HOLENT_NOINDEX,
                             "the energy or entropy density of this "
                             "background is out of double precision range");
    default:
      return holent_err_set (e, status, -1, HOLENT_NOINDEX, NULL);
    }
}
