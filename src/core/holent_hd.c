/* holent_hd.c: strips and balls in planar AdS_{d+1} backgrounds.
 * See holent_hd.h and doc/higher_dimensional.md.  GPL-3.0-or-later.  */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_sf_gamma.h>
#include <gsl/gsl_sf_psi.h>
#include <gsl/gsl_linalg.h>
#include "holent_hd.h"

#define QAG_LIMIT 200
#define QAG_EPSREL 1e-12
#define QAG_EPSABS 1e-15
#define ROOT_ITMAX 200
#define ROOT_EPSABS 1e-13
#define TABLE_STEP 0.5      /* analytic f: l(y) is monotonic            */
#define TABLE_STEP_TAB 0.1  /* tabulated f: look for narrow extrema too */
#define ODE_T0 (-12.0)   /* log tan(phi) at the start next to the tip   */
#define ODE_T1 16.0      /* log tan(phi) where the boundary is reached   */
#define HUG_W 1e-2       /* tips within HUG_W zh of a horizon: shot in
                            log(zh - z) along the horizon first        */
#define BALL_WMIN_TAB 1e-100 /* closest tip to a tabulated horizon     */

/* ------------------------------------------------------------------ */
/* Backgrounds                                                          */

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
  if (gsl_spline_eval_e (bg->g, z, NULL, &g))
    return NAN;
  if (gp && gsl_spline_eval_deriv_e (bg->g, z, NULL, gp))
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
  if (bg && bg->g)
    {
      gsl_spline_free (bg->g);
      bg->g = NULL;
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
  bg->g = gsl_spline_alloc (gsl_interp_cspline, n);
  if (bg->g == NULL)
    {
      free (gv);
      return HOLENT_ENOMEM;
    }
  st = gsl_spline_init (bg->g, z, gv, n);
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
      holent_hd_f (bg, zh, &fh, &fph);
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
        if (gsl_spline_eval_deriv2_e (bg->g, zh, NULL, &gc[2])
            || gsl_spline_eval_deriv2_e (bg->g, a1, NULL, &g2a)
            || gsl_spline_eval_deriv2_e (bg->g, a2, NULL, &g2b))
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
holent_hd_f (const holent_hd_bg *bg, double z, double *f, double *fp)
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

/* 1 - f(z), accurate for small z.  */
static double
omf (const holent_hd_bg *bg, double z)
{
  switch (bg->kind)
    {
    case HOLENT_HD_VACUUM: return 0;
    case HOLENT_HD_BRANE: return gsl_pow_int (z / bg->zh, bg->d);
    default: return gsl_pow_int (z, bg->d) * g_eval (bg, z, NULL);
    }
}

/* (1 - f(z))/z^d */
static double
mcoef (const holent_hd_bg *bg, double z)
{
  switch (bg->kind)
    {
    case HOLENT_HD_VACUUM: return 0;
    case HOLENT_HD_BRANE: return bg->m;
    default: return g_eval (bg, z, NULL);
    }
}

/* f(z) given also wz = Z - z: for the brane near its horizon
   1 - x^d = (1 - x)(1 + x + ... + x^(d-1)) keeps every digit.  */
static double
fval (const holent_hd_bg *bg, double z, double wz)
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
  return 1 - omf (bg, z);
}

/* ------------------------------------------------------------------ */
/* Workspace                                                           */

static int ball_rhs (double t, const double y[], double dydt[], void *p);

holent_hd_workspace *
holent_hd_workspace_alloc (void)
{
  holent_hd_workspace *w = calloc (1, sizeof *w);
  if (w == NULL)
    return NULL;
  w->iw = gsl_integration_workspace_alloc (QAG_LIMIT);
  w->root = gsl_root_fsolver_alloc (gsl_root_fsolver_brent);
  w->min = gsl_min_fminimizer_alloc (gsl_min_fminimizer_brent);
  w->step = gsl_odeiv2_step_alloc (gsl_odeiv2_step_rk8pd, 3);
  w->ctrl = gsl_odeiv2_control_y_new (1e-15, 1e-12);
  w->evol = gsl_odeiv2_evolve_alloc (3);
  w->cap = 256;
  w->ty = malloc (w->cap * sizeof *w->ty);
  w->tv = malloc (w->cap * sizeof *w->tv);
  if (!w->iw || !w->root || !w->min || !w->step || !w->ctrl || !w->evol || !w->ty
      || !w->tv)
    {
      holent_hd_workspace_free (w);
      return NULL;
    }
  return w;
}

void
holent_hd_workspace_free (holent_hd_workspace *w)
{
  if (w == NULL)
    return;
  if (w->iw)
    gsl_integration_workspace_free (w->iw);
  if (w->root)
    gsl_root_fsolver_free (w->root);
  if (w->min)
    gsl_min_fminimizer_free (w->min);
  if (w->step)
    gsl_odeiv2_step_free (w->step);
  if (w->ctrl)
    gsl_odeiv2_control_free (w->ctrl);
  if (w->evol)
    gsl_odeiv2_evolve_free (w->evol);
  free (w->ty);
  free (w->tv);
  free (w);
}

static int
table_push (holent_hd_workspace *w, size_t k, double y, double v)
{
  if (k >= w->cap)
    {
      size_t nc = 2 * w->cap;
      if (nc > 1u << 20)
        return HOLENT_ETOOBIG;
      double *a = realloc (w->ty, nc * sizeof *a);
      if (a == NULL)
        return HOLENT_ENOMEM;
      w->ty = a;
      a = realloc (w->tv, nc * sizeof *a);
      if (a == NULL)
        return HOLENT_ENOMEM;
      w->tv = a;
      w->cap = nc;
    }
  w->ty[k] = y;
  w->tv[k] = v;
  return HOLENT_SUCCESS;
}

/* ------------------------------------------------------------------ */
/* Closed forms                                                        */

double
holent_hd_strip_ratio (int d)
{
  double a = 1.0 / (2.0 * (d - 1));
  return 2 * sqrt (M_PI) * gsl_sf_gamma (d * a) / gsl_sf_gamma (a);
}

double
holent_hd_strip_vacuum_j (int d)
{
  double a = 1.0 / (2.0 * (d - 1));
  return sqrt (M_PI) * gsl_sf_gamma ((2.0 - d) * a)
         / (2.0 * (d - 1) * gsl_sf_gamma (a));
}

/* c_k: coefficients of (1 - y^2)^((d-3)/2) = sum c_k y^(2k).  */
static double
ball_c (int d, int k)
{
  double a = 0.5 * (d - 3), c = 1;
  for (int j = 0; j < k; j++)
    c *= -(a - j) / (j + 1);
  return c;
}

double
holent_hd_ball_vacuum_c (int d)
{
  if (d % 2)
    return 0.5 * gsl_sf_gamma (0.5 * (2 - d)) * gsl_sf_gamma (0.5 * (d - 1))
           / sqrt (M_PI);
  int n = (d - 2) / 2;
  return 0.5 * ball_c (d, n) * (gsl_sf_psi_int (n + 1) - gsl_sf_psi (0.5));
}

static double
omega_sphere (int d)  /* volume of the unit (d-2)-sphere */
{
  return 2 * pow (M_PI, 0.5 * (d - 1)) / gsl_sf_gamma (0.5 * (d - 1));
}

static double
hemi_integrand (double y, void *p)
{
  int d = *(const int *) p;
  return pow (1 + y, 0.5 * (d - 3)) * gsl_pow_int (y, 1 - d);
}

/* integral_delta^1 y^(1-d) (1 - y^2)^((d-3)/2) dy: the hemisphere's area
   above the cutoff per ell^(d-1) Omega_{d-2}.  */
static int
hemisphere (int d, double delta, holent_hd_workspace *w, double *out)
{
  if (delta >= 1)
    {
      *out = 0;
      return HOLENT_SUCCESS;
    }
  if (delta > 0.5)
    {
      gsl_integration_qaws_table *t
          = gsl_integration_qaws_table_alloc (0.0, 0.5 * (d - 3), 0, 0);
      if (t == NULL)
        return HOLENT_ENOMEM;
      gsl_function F = { hemi_integrand, &d };
      double err;
      int st = gsl_integration_qaws (&F, delta, 1.0, t, QAG_EPSABS,
                                     QAG_EPSREL, QAG_LIMIT, w->iw, out, &err);
      gsl_integration_qaws_table_free (t);
      return st ? HOLENT_ENOCONV : HOLENT_SUCCESS;
    }
  double s = holent_hd_ball_vacuum_c (d);
  int k;
  for (k = 0; 2 * k < d - 2; k++)
    s += ball_c (d, k) * pow (delta, 2 * k + 2 - d) / (d - 2 - 2 * k);
  if (d % 2 == 0)
    s += ball_c (d, k++) * log (1 / delta);
  if (d % 2 == 0)
    for (; k < 400; k++)
      {
        double t = ball_c (d, k) * pow (delta, 2 * k + 2 - d) / (2 * k + 2 - d);
        s -= t;
        if (fabs (t) < 1e-17 * fabs (s))
          break;
      }
  *out = s;
  return HOLENT_SUCCESS;
}

/* ------------------------------------------------------------------ */
/* Strips                                                              */

typedef struct
{
  const holent_hd_bg *bg;
  double zs, w, a, sa;
  int pw;
  int excess;  /* weigh by 1 - sqrt(f): the integrand minus the vacuum's */
} spar;

/* The turning-point end in the variable v = 1 - u = a sinh^2(tau): the
   1/sqrt(v (v + a)) behaviour of 1/sqrt(f(z* u) (1 - u^(2d-2))) becomes
   a smooth integrand in tau (a ~ f(z*)/(|f'(z*)| z*) tracks the horizon).  */
static double
tau_integrand (double tau, void *p)
{
  const spar *q = p;
  const holent_hd_bg *bg = q->bg;
  double em = expm1 (tau), e = em + 1;
  double sh = em * (em + 2) / (2 * e), ch = 0.5 * (e + 1 / e);
  double v = q->a * sh * sh;
  if (v > 1)
    v = 1;
  double u = 1 - v, qv = 1;
  for (int k = 1; k <= 2 * bg->d - 3; k++)   /* (1 - u^(2d-2))/(1 - u) */
    qv = 1 + u * qv;
  double f = fval (bg, q->zs * u, q->w + q->zs * v);
  if (!(f > 0))
    return NAN;
  double r = 2 * q->sa * ch / sqrt (f * qv) * gsl_pow_int (u, q->pw);
  if (q->excess)  /* 1/sqrt(f) - 1 = (1 - f)/(sqrt f (1 + sqrt f)) */
    r *= omf (bg, q->zs * u) / (1 + sqrt (f));
  return r;
}

/* u^(1-d) (1/sqrt(f) - 1)/sqrt(1 - u^(2d-2)) on [0, 1/2]: the excess of the
   area integrand over the vacuum's at the same z*.  */
static double
u_excess (double u, void *p)
{
  const spar *q = p;
  const holent_hd_bg *bg = q->bg;
  int d = bg->d;
  double z = q->zs * u, f = 1 - omf (bg, z), sf = sqrt (f);
  double up = gsl_pow_int (u, d - 1);
  if (!(f > 0))
    return NAN;
  return gsl_pow_int (q->zs, d) * u * mcoef (bg, z)
         / (sqrt (1 - up * up) * sf * (1 + sf));
}

/* u^(1-d) (1/sqrt(f (1 - u^(2d-2))) - 1) with no cancellation near u = 0.  */
static double
u_integrand (double u, void *p)
{
  const spar *q = p;
  const holent_hd_bg *bg = q->bg;
  int d = bg->d;
  double z = q->zs * u;
  double om = omf (bg, z), f = 1 - om, up = gsl_pow_int (u, d - 1);
  double qq = f * (1 - up * up), sq = sqrt (qq);
  if (!(qq > 0))
    return NAN;
  double num = gsl_pow_int (q->zs, d) * u * mcoef (bg, z) + f * up;
  return num / (sq * (1 + sq));
}

static int
qag (holent_hd_workspace *w, double (*fn) (double, void *), spar *p,
     double a, double b, double *out)
{
  gsl_function F = { fn, p };
  double err;
  if (!(b > a))
    {
      *out = 0;
      return HOLENT_SUCCESS;
    }
  int st = gsl_integration_qag (&F, a, b, QAG_EPSABS, QAG_EPSREL, QAG_LIMIT,
                                GSL_INTEG_GAUSS21, w->iw, out, &err);
  /* Roundoff in f (tabulated, next to a horizon) can stop QAG short of
     1e-12 (roundoff detected, or the subdivision limit reached); accept
     what it reached if its error estimate is still within 1e-9.  */
  if ((st == GSL_EROUND || st == GSL_EMAXITER)
      && err <= 1e-9 * fabs (*out) + QAG_EPSABS)
    st = GSL_SUCCESS;
  if (st || !isfinite (*out))
    return HOLENT_ENOCONV;
  return HOLENT_SUCCESS;
}

static int
strip_setup (const holent_hd_bg *bg, double zs, double w, spar *p)
{
  double f, fp;
  p->bg = bg;
  p->zs = zs;
  p->w = w;
  p->excess = 0;
  if (zs > bg->zmax)
    return HOLENT_EDOM;
  if (holent_hd_f (bg, zs, &f, &fp))
    return HOLENT_EDOM;
  f = fval (bg, zs, w);
  if (!(f > 0))
    return HOLENT_EDOM;
  p->a = 1;
  if (fp < 0)
    p->a = fmin (1.0, f / (-fp * zs));
  p->sa = sqrt (p->a);
  return HOLENT_SUCCESS;
}

/* Width l of the strip turning at zs (w = Z - zs).  */
static int
strip_width (const holent_hd_bg *bg, holent_hd_workspace *ws, double zs,
             double w, double *l)
{
  spar p;
  double K;
  int st = strip_setup (bg, zs, w, &p);
  if (st)
    return st;
  p.pw = bg->d - 1;
  st = qag (ws, tau_integrand, &p, 0, asinh (sqrt (1 / p.a)), &K);
  *l = 2 * zs * K;
  return st;
}

/* Area integrals J (finite: eps -> 0; cut: at the cutoff) with
   A = 2 ell^(d-1) Lperp^(d-2) zs^(2-d) J, written as the vacuum's J plus
   the excess dJ of the integrand at the same z* (no cancellation), and
   *ddel = zs^(d-2) (A_fin - A_fin,vac(same width)) / (2 ell^(d-1) Lperp^(d-2)),
   using the width's excess dK: l = 2 zs (K_vac + dK).  */
static int
strip_area (const holent_hd_bg *bg, holent_hd_workspace *ws, double zs,
            double w, double *jfin, double *jcut, double *ddel)
{
  spar p;
  int d = bg->d, st = strip_setup (bg, zs, w, &p);
  double jt, ju, i0 = 0, dK = 0, del = bg->eps / zs;
  double jv = holent_hd_strip_vacuum_j (d), kv = 0.5 * holent_hd_strip_ratio (d);
  if (st)
    return st;
  p.excess = 1;
  p.pw = 1 - d;
  if ((st = qag (ws, tau_integrand, &p, 0, asinh (sqrt (0.5 / p.a)), &jt)))
    return st;
  if ((st = qag (ws, u_excess, &p, 0, 0.5, &ju)))
    return st;
  p.pw = d - 1;
  if ((st = qag (ws, tau_integrand, &p, 0, asinh (sqrt (1 / p.a)), &dK)))
    return st;
  p.excess = 0;
  double dJ = jt + ju;
  *jfin = jv + dJ;
  *ddel = dJ - jv * expm1 ((2 - d) * log1p (dK / kv));
  if (del < 0.5)
    {
      if ((st = qag (ws, u_integrand, &p, 0, del, &i0)))
        return st;
      *jcut = *jfin + pow (del, 2 - d) / (d - 2) - i0;
    }
  else if (del < 1)
    {
      p.pw = 1 - d;
      st = qag (ws, tau_integrand, &p, 0, asinh (sqrt ((1 - del) / p.a)),
                jcut);
    }
  else
    *jcut = 0;
  return st;
}

static void
root_point (const holent_hd_bg *bg, double y, double *zs, double *w)
{
  *zs = bg->Z / (1 + exp (-y));
  *w = bg->Z / (1 + exp (y));
}

typedef struct
{
  const holent_hd_bg *bg;
  holent_hd_workspace *ws;
  double target;
  int ball;
  int status;
} rpar;

static int ball_shoot (const holent_hd_bg *bg, holent_hd_workspace *ws,
                       double z0, double w0, double *R, double *J);

static double
size_at (double y, void *vp)
{
  rpar *p = vp;
  double zs, w, v = NAN, J;
  int st;
  root_point (p->bg, y, &zs, &w);
  st = p->ball ? ball_shoot (p->bg, p->ws, zs, w, &v, &J)
               : strip_width (p->bg, p->ws, zs, w, &v);
  if (st)
    {
      p->status = st;
      return NAN;
    }
  return v - p->target;
}

typedef struct
{
  rpar *p;
  double sign;
} mpar;

static double
signed_size (double y, void *vp)
{
  const mpar *m = vp;
  return m->sign * size_at (y, m->p);
}

/* Root of size(y) = target inside [lo, hi] by Brent's method.  */
static int
brent (rpar *p, double lo, double hi, double *y)
{
  gsl_function F = { size_at, p };
  gsl_root_fsolver *s = p->ws->root;
  p->status = HOLENT_SUCCESS;
  int st = gsl_root_fsolver_set (s, &F, lo, hi);
  for (int it = 0; st == GSL_SUCCESS; it++)
    {
      if (it >= ROOT_ITMAX)
        return HOLENT_ENOCONV;
      if ((st = gsl_root_fsolver_iterate (s)))
        break;
      st = gsl_root_test_interval (gsl_root_fsolver_x_lower (s),
                                   gsl_root_fsolver_x_upper (s), ROOT_EPSABS,
                                   1e-14);
      if (st == GSL_SUCCESS)
        {
          *y = gsl_root_fsolver_root (s);
          return HOLENT_SUCCESS;
        }
      if (st == GSL_CONTINUE)
        st = GSL_SUCCESS;
    }
  return p->status ? p->status : HOLENT_ENOCONV;
}

/* Table of size(y) on a grid covering [smin, smax] (or up to the widest
   reachable).  *nt gets its length, *reach its largest value.  */
static int
build_table (const holent_hd_bg *bg, holent_hd_workspace *ws, int ball,
             double smin, double smax, double ratio, double wmin, size_t *nt,
             double *reach, int *mono)
{
  rpar p = { bg, ws, 0, ball, 0 };
  double Z = bg->Z, zlo = fmin (0.25 * smin / ratio, 0.25 * Z);
  double ylo = log (zlo / (Z - zlo)), yhi = log ((Z - wmin) / wmin), v;
  int st;
  for (int k = 0;; k++)
    {
      v = size_at (ylo, &p);
      if (p.status)
        return p.status;
      if (v < smin)
        break;
      if (k > 40)
        return HOLENT_ENOCONV;
      ylo -= 2;
    }
  size_t n = 0;
  double mx = -INFINITY;
  int full = bg->kind == HOLENT_HD_TABULATED;
  *mono = 1;
  /* balls of a tabulated f: beyond y = 20 (w < 2e-9 Z) R grows linearly
     in y, so the table steps by 1 there */
  for (double y = ylo;; y += !full ? TABLE_STEP
                             : (ball && y > 20) ? 1.0 : TABLE_STEP_TAB)
    {
      if (y > yhi)
        y = yhi;
      v = size_at (y, &p);
      if (p.status)
        return p.status;
      if ((st = table_push (ws, n, y, v)))
        return st;
      /* a dip below the previous entry beyond roundoff */
      if (n > 0 && !(v > ws->tv[n - 1] - 1e-9 * fabs (v)))
        *mono = 0;
      n++;
      mx = fmax (mx, v);
      if (y >= yhi || (!full && v > smax))
        break;
    }
  *nt = n;
  /* Not monotonic: move each table extremum onto the true local extremum
     of size(y) (GSL's Brent minimiser), so that size(y) is monotonic
     between neighbouring entries and every extremal surface is bracketed.  */
  for (size_t j = 1; !*mono && j + 1 < n; j++)
    {
      double a = ws->tv[j] - ws->tv[j - 1], b = ws->tv[j + 1] - ws->tv[j];
      double tiny = 1e-9 * fabs (ws->tv[j]);
      if (!(a * b < 0) || fabs (a) < tiny || fabs (b) < tiny)
        continue;
      mpar mp = { &p, a > 0 ? -1.0 : 1.0 };
      gsl_function F = { signed_size, &mp };
      gsl_min_fminimizer *m = ws->min;
      st = gsl_min_fminimizer_set_with_values (
          m, &F, ws->ty[j], mp.sign * ws->tv[j], ws->ty[j - 1],
          mp.sign * ws->tv[j - 1], ws->ty[j + 1], mp.sign * ws->tv[j + 1]);
      for (int it = 0; st == GSL_SUCCESS && it < ROOT_ITMAX; it++)
        {
          if ((st = gsl_min_fminimizer_iterate (m)))
            break;
          st = gsl_min_test_interval (gsl_min_fminimizer_x_lower (m),
                                      gsl_min_fminimizer_x_upper (m),
                                      ROOT_EPSABS, 0);
          if (st == GSL_SUCCESS)
            break;
          if (st == GSL_CONTINUE)
            st = GSL_SUCCESS;
        }
      if (p.status)
        return p.status;
      if (st)
        continue;  /* keep the grid value: brackets stay valid */
      ws->ty[j] = gsl_min_fminimizer_x_minimum (m);
      ws->tv[j] = mp.sign * gsl_min_fminimizer_f_minimum (m);
      mx = fmax (mx, ws->tv[j]);
    }
  /* stopped short of the last admissible turning point: the largest
     reachable size is the size there (one more evaluation) */
  if (ws->ty[n - 1] < yhi)
    {
      v = size_at (yhi, &p);
      if (p.status)
        return p.status;
      mx = fmax (mx, v);
    }
  *reach = mx;
  return HOLENT_SUCCESS;
}

static int
check_sizes (size_t n, const double *l, size_t *bad, double *lmin,
             double *lmax)
{
  *lmin = INFINITY;
  *lmax = 0;
  for (size_t i = 0; i < n; i++)
    {
      if (isnan (l[i]) || !(l[i] > 0) || !isfinite (l[i]))
        {
          if (bad)
            *bad = i;
          return isnan (l[i]) ? HOLENT_EINVAL : HOLENT_EDOM;
        }
      *lmin = fmin (*lmin, l[i]);
      *lmax = fmax (*lmax, l[i]);
    }
  return HOLENT_SUCCESS;
}

/* Every root of size(y) = s in the table; keep the one with the least
   finite area (RT: the minimal extremal surface).  eval computes the
   finite/cut values at a root.  */
typedef int (*eval_fn) (const holent_hd_bg *, holent_hd_workspace *, double,
                        double *, double *, double *);

static int
solve_one (const holent_hd_bg *bg, holent_hd_workspace *ws, int ball,
           size_t nt, int mono, double s, eval_fn ev, double *best_y,
           double *best_fin, double *best_cut, double *best_x)
{
  rpar p = { bg, ws, s, ball, 0 };
  size_t j0 = 0, j1 = nt - 1;
  int found = 0, st;
  double best_extra = 0;
  if (mono)
    {
      size_t lo = 0, hi = nt - 1;
      while (hi - lo > 1)
        {
          size_t mid = (lo + hi) / 2;
          if (ws->tv[mid] < s)
            lo = mid;
          else
            hi = mid;
        }
      j0 = lo;
      j1 = lo + 1;
    }
  *best_fin = INFINITY;
  for (size_t j = j0; j < j1; j++)
    {
      double a = ws->tv[j] - s, b = ws->tv[j + 1] - s, y, fin, cut, x;
      if (a * b > 0)
        continue;
      if (a == 0)
        y = ws->ty[j];
      else if (b == 0)
        y = ws->ty[j + 1];
      else
        {
          /* brent() reuses the table-free root solver of the workspace */
          if ((st = brent (&p, ws->ty[j], ws->ty[j + 1], &y)))
            return st;
        }
      if ((st = ev (bg, ws, y, &fin, &cut, &x)))
        return st;
      if (fin < *best_fin)
        {
          best_extra = ws->extra;
          *best_fin = fin;
          *best_cut = cut;
          *best_y = y;
          *best_x = x;
        }
      found = 1;
    }
  ws->extra = best_extra;
  return found ? HOLENT_SUCCESS : HOLENT_ENOCONV;
}

static int
strip_eval (const holent_hd_bg *bg, holent_hd_workspace *ws, double y,
            double *fin, double *cut, double *zs_out)
{
  double zs, w;
  root_point (bg, y, &zs, &w);
  *zs_out = zs;
  int st = strip_area (bg, ws, zs, w, fin, cut, &ws->extra);
  if (st)
    return st;
  /* per unit 2 ell^(d-1) Lperp^(d-2)/(4G) */
  double sc = pow (zs, 2 - bg->d);
  *fin *= sc;
  *cut *= sc;
  ws->extra *= sc;
  return HOLENT_SUCCESS;
}

int
holent_hd_strip (const holent_hd_bg *bg, holent_hd_workspace *ws,
                 double Lperp, size_t n, const double *l, double *S,
                 double *fin, double *delta, double *zstar, size_t *bad,
                 double *reach)
{
  double lmin, lmax, rch = INFINITY;
  int st, mono = 1;
  size_t nt = 0;
  if (bg == NULL || ws == NULL || (n > 0 && (l == NULL || S == NULL))
      || isnan (Lperp))
    return HOLENT_EINVAL;
  if (!(Lperp > 0) || !isfinite (Lperp))
    return HOLENT_EDOM;
  if ((st = check_sizes (n, l, bad, &lmin, &lmax)))
    return st;
  if (n == 0)
    return HOLENT_SUCCESS;
  int d = bg->d;
  double ratio = holent_hd_strip_ratio (d), jv = holent_hd_strip_vacuum_j (d);
  double pref = 2 * pow (bg->ell, d - 1) * pow (Lperp, d - 2) / (4 * bg->G);
  if (bg->kind != HOLENT_HD_VACUUM)
    {
      st = build_table (bg, ws, 0, lmin, lmax, ratio, bg->wmin, &nt, &rch,
                        &mono);
      if (st)
        return st;
    }
  if (reach)
    *reach = rch;
  for (size_t i = 0; i < n; i++)
    {
      double y, jf, jc, zs;
      if (l[i] > rch)
        {
          if (bad)
            *bad = i;
          return HOLENT_EDOM;
        }
      if (bg->kind == HOLENT_HD_VACUUM)
        {
          zs = l[i] / ratio;
          if ((st = strip_area (bg, ws, zs, 0, &jf, &jc, &ws->extra)))
            return st;
          jf = jv * pow (zs, 2 - d);
          jc *= pow (zs, 2 - d);
          ws->extra = 0;
        }
      else if ((st = solve_one (bg, ws, 0, nt, mono, l[i], strip_eval, &y,
                                &jf, &jc, &zs)))
        {
          if (bad)
            *bad = i;
          return st;
        }
      S[i] = pref * jc;
      if (fin)
        fin[i] = pref * jf;
      if (delta)
        delta[i] = pref * ws->extra;
      if (zstar)
        zstar[i] = zs;
    }
  return HOLENT_SUCCESS;
}

/* ------------------------------------------------------------------ */
/* Balls                                                               */

/* State (rho, psi, J) against t = log tan(phi), phi the polar angle in
   the (r, z) half plane seen from the boundary centre: z = rho cos(phi),
   r = rho sin(phi); psi = theta + phi is the tilt of the tangent from the
   hemisphere's; J accumulates the finite area beyond the hemisphere.  */
typedef struct
{
  const holent_hd_bg *bg;
  double sc;   /* psi and J are carried divided by sc = |1 - f(tip)| */
} bpar;

static int
ball_rhs (double t, const double y[], double dydt[], void *p)
{
  const holent_hd_bg *bg = ((const bpar *) p)->bg;
  const double scale = ((const bpar *) p)->sc;
  int d = bg->d;
  double q = exp (-fabs (t)), nq = 1 / sqrt (1 + q * q);
  double sp = t < 0 ? q * nq : nq, cp = t < 0 ? nq : q * nq;
  double rho = y[0], psi = y[1] * scale;
  double z = rho * cp;
  if (!(z >= 0) || z > bg->zmax || !(rho > 0))
    return GSL_EBADFUNC;
  double o = omf (bg, z), f = 1 - o;
  if (!(f > 0))
    return GSL_EBADFUNC;
  double s = sqrt (f), om = o / (1 + s);
  double spsi = sin (psi), cpsi = cos (psi), sth = spsi * cp - cpsi * sp;
  double Dr = cpsi + om * sp * sth;
  if (!(Dr > 0))
    return GSL_EBADFUNC;
  double sc = sp * cp, N = spsi - om * cp * sth;
  double sh = sin (0.5 * psi);
  dydt[0] = rho * N * sc / Dr;
  dydt[1] = ((d - 1) * om * cpsi * sc + om * sp * sth * sc
             - (d - 2) * spsi * cp * cp - (d - 1) * s * spsi * sp * sp)
            / (Dr * scale);
  dydt[2] = gsl_pow_int (sp, d - 1) * gsl_pow_int (cp, 2 - d)
            * (2 * sh * sh - om * sp * sth) / (Dr * scale);
  return GSL_SUCCESS;
}

/* The polar integration from t (state y = rho, psi/sc, J/sc) to the
   boundary: radius R and J.  */
static int
ball_polar (const holent_hd_bg *bg, holent_hd_workspace *ws, double t,
            double y[3], double sc, double *R, double *J)
{
  double h = 1e-2;
  bpar bp = { bg, sc };
  gsl_odeiv2_system sys = { ball_rhs, NULL, 3, &bp };
  gsl_odeiv2_step_reset (ws->step);
  gsl_odeiv2_evolve_reset (ws->evol);
  for (int k = 0; t < ODE_T1; k++)
    {
      if (k > 100000)
        return HOLENT_ENOCONV;
      int st = gsl_odeiv2_evolve_apply (ws->evol, ws->ctrl, ws->step, &sys,
                                        &t, ODE_T1, &h, y);
      if (st)
        return HOLENT_ENOCONV;
    }
  *R = y[0];
  *J = y[2] * sc;
  return HOLENT_SUCCESS;
}

/* Along the horizon: state (lambda = log(u/u0), chi = -sin(theta)/sqrt(u),
   J) against r, u = zh - z.  f/u is evaluated from u itself, and chi stays
   O(1) where the profile linearises (u grows like exp(2 k r)), so tips
   exponentially close to the horizon keep every digit.  */
typedef struct
{
  const holent_hd_bg *bg;
  double u0;
} hpar;

static int
hug_rhs (double r, const double y[], double dydt[], void *p)
{
  const hpar *hp = p;
  const holent_hd_bg *bg = hp->bg;
  int d = bg->d;
  double u = hp->u0 * exp (y[0]), z = bg->zh - u, chi = y[1];
  if (!(u > 0) || !(z > 0) || !(r > 0))
    return GSL_EBADFUNC;
  double fu = fval (bg, z, u) / u, c2 = 1 - chi * chi * u;
  if (!(fu > 0) || !(c2 > 0))
    return GSL_EBADFUNC;
  double q = sqrt (fu), ct = sqrt (c2), rho = hypot (r, z);
  double W = gsl_pow_int (r, d - 2) * gsl_pow_int (z, 1 - d);
  dydt[0] = chi * q / ct;
  dydt[1] = -(d - 2) * chi / r + (d - 1) * ct * q / z - 0.5 * chi * chi * q / ct;
  /* area element minus the hemisphere's sin^(d-2) cos^(1-d) dphi */
  dydt[2] = W * (1 - (z * ct + r * chi * u * q) / rho) / ct;
  return GSL_SUCCESS;
}

static int
ball_hug (const holent_hd_bg *bg, holent_hd_workspace *ws, double z0,
          double w0, double *R, double *J)
{
  double zh = bg->zh, r = 1e-6 * zh, h = 1e-6 * zh, rend = 1e6 * zh;
  double fu0 = fval (bg, z0, w0) / w0;
  if (!(fu0 > 0))
    return HOLENT_EDOM;
  hpar hp = { bg, w0 };
  /* series at the tip: theta = -sqrt(f0) r/z0, u = u0 + f0 r^2/(2 z0) */
  double y[3] = { 0.5 * fu0 * r * r / z0, sqrt (fu0) * r / z0, 0 };
  gsl_odeiv2_system sys = { hug_rhs, NULL, 3, &hp };
  gsl_odeiv2_step_reset (ws->step);
  gsl_odeiv2_evolve_reset (ws->evol);
  for (int k = 0; w0 * exp (y[0]) < HUG_W * zh; k++)
    {
      if (k > 100000 || !(r < rend))
        return HOLENT_ENOCONV;
      int st = gsl_odeiv2_evolve_apply (ws->evol, ws->ctrl, ws->step, &sys,
                                        &r, rend, &h, y);
      if (st)
        return HOLENT_ENOCONV;
    }
  /* hand over to the polar variables (u >= HUG_W zh: z has its digits) */
  double u = w0 * exp (y[0]), z = zh - u;
  double th = -asin (y[1] * sqrt (u)), p[3];
  p[0] = hypot (r, z);
  p[1] = th + atan2 (r, z);
  p[2] = y[2];
  return ball_polar (bg, ws, log (r / z), p, 1.0, R, J);
}

/* Shoot from the tip at depth z0 = Z - w0 (series start: psi = (1 - sqrt f0) phi,
   rho = z0 (1 + (1 - f0) phi^2/2)) to the boundary: radius R and J.  */
static int
ball_shoot (const holent_hd_bg *bg, holent_hd_workspace *ws, double z0,
            double w0, double *R, double *J)
{
  double f0, y[3];
  if (isfinite (bg->zh) && w0 > 0 && w0 < HUG_W * bg->zh)
    return ball_hug (bg, ws, z0, w0, R, J);  /* z0 may round to zh */
  if (holent_hd_f (bg, z0, &f0, NULL) || !(f0 > 0))
    return HOLENT_EDOM;
  double ph = atan (exp (ODE_T0));
  double o0 = omf (bg, z0);  /* 1 - f0 with all its digits */
  double sc = fabs (o0) > 1e-300 ? fabs (o0) : 1;
  y[0] = z0 * (1 + 0.5 * o0 * ph * ph);
  y[1] = o0 / (1 + sqrt (f0)) * ph / sc;
  y[2] = 0;
  return ball_polar (bg, ws, ODE_T0, y, sc, R, J);
}

static int
ball_eval (const holent_hd_bg *bg, holent_hd_workspace *ws, double y,
           double *fin, double *cut, double *zt)
{
  double zs, w, R;
  root_point (bg, y, &zs, &w);
  *zt = zs;
  *cut = 0;
  int st = ball_shoot (bg, ws, zs, w, &R, fin);
  ws->extra = *fin;
  return st;
}

int
holent_hd_ball (const holent_hd_bg *bg, holent_hd_workspace *ws, size_t n,
                const double *R, double *S, double *fin, double *delta,
                double *ztip, size_t *bad, double *reach)
{
  double rmin, rmax, rch = INFINITY;
  int st, mono = 1;
  size_t nt = 0;
  if (bg == NULL || ws == NULL || (n > 0 && (R == NULL || S == NULL)))
    return HOLENT_EINVAL;
  if ((st = check_sizes (n, R, bad, &rmin, &rmax)))
    return st;
  if (n == 0)
    return HOLENT_SUCCESS;
  int d = bg->d;
  double pref = pow (bg->ell, d - 1) * omega_sphere (d) / (4 * bg->G);
  double cd = holent_hd_ball_vacuum_c (d);
  if (bg->kind != HOLENT_HD_VACUUM)
    {
      /* tips next to a horizon are shot in log(zh - z): the brane goes
         to its 1e-250 zh, a tabulated horizon to 1e-100 zh */
      double wmin = bg->kind == HOLENT_HD_TABULATED && isfinite (bg->zh)
                        ? BALL_WMIN_TAB * bg->Z : bg->wmin;
      st = build_table (bg, ws, 1, rmin, rmax, 1.0, wmin, &nt, &rch, &mono);
      if (st)
        return st;
    }
  if (reach)
    *reach = rch;
  for (size_t i = 0; i < n; i++)
    {
      double y, J = 0, cut, zt = R[i], hemi;
      if (R[i] > rch)
        {
          if (bad)
            *bad = i;
          return HOLENT_EDOM;
        }
      if (bg->kind != HOLENT_HD_VACUUM
          && (st = solve_one (bg, ws, 1, nt, mono, R[i], ball_eval, &y, &J,
                              &cut, &zt)))
        {
          if (bad)
            *bad = i;
          return st;
        }
      if ((st = hemisphere (d, bg->eps / R[i], ws, &hemi)))
        return st;
      S[i] = pref * (hemi + J);
      if (fin)
        fin[i] = pref * (cd + J);
      if (delta)
        delta[i] = pref * J;
      if (ztip)
        ztip[i] = zt;
    }
  return HOLENT_SUCCESS;
}
