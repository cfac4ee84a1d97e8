/* holent_hd_size.c: size(turning depth) inversion for strips and balls.
 * See holent_hd_size.h.  SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_roots.h>
#include <gsl/gsl_min.h>
#include "holent_hd_size.h"

#define ROOT_ITMAX 200
#define ROOT_EPSABS 1e-13
#define TABLE_STEP 0.5      /* analytic f: l(y) is monotonic            */
#define TABLE_STEP_TAB 0.1  /* tabulated f: look for narrow extrema too */

struct holent_hd_size_workspace
{
  gsl_root_fsolver *root;
  gsl_min_fminimizer *min;  /* extrema of a non-monotonic size(y)     */
  size_t nt;                /* table length                             */
  int mono;                 /* table monotonic                          */
  double ty[HOLENT_HD_SIZE_TABMAX];  /* root variable                   */
  double tv[HOLENT_HD_SIZE_TABMAX];  /* size                            */
};

holent_hd_size_workspace *
holent_hd_size_workspace_alloc (void)
{
  holent_hd_size_workspace *w = calloc (1, sizeof *w);
  if (w == NULL)
    return NULL;
  w->root = gsl_root_fsolver_alloc (gsl_root_fsolver_brent);
  w->min = gsl_min_fminimizer_alloc (gsl_min_fminimizer_brent);
  if (!w->root || !w->min)
    {
      holent_hd_size_workspace_free (w);
      return NULL;
    }
  return w;
}

void
holent_hd_size_workspace_free (holent_hd_size_workspace *w)
{
  if (w == NULL)
    return;
  if (w->root)
    gsl_root_fsolver_free (w->root);
  if (w->min)
    gsl_min_fminimizer_free (w->min);
  free (w);
}

static int
table_push (holent_hd_size_workspace *w, size_t k, double y, double v)
{
  if (k >= HOLENT_HD_SIZE_TABMAX)
    return HOLENT_ETOOBIG;
  w->ty[k] = y;
  w->tv[k] = v;
  return HOLENT_SUCCESS;
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
  const holent_hd_size_problem *pb;
  double target;
  int status;
} rpar;

static double
size_at (double y, void *vp)
{
  rpar *p = vp;
  double zs, w, v = NAN;
  int st;
  root_point (p->bg, y, &zs, &w);
  st = p->pb->size (p->pb->ctx, zs, w, &v);
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
brent (rpar *p, gsl_root_fsolver *s, double lo, double hi, double *y)
{
  gsl_function F = { size_at, p };
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

static int
table_build (const holent_hd_bg *bg, holent_hd_size_workspace *ws,
             const holent_hd_size_problem *pb, double smin, double smax,
             double ratio, double wmin, double *reach)
{
  rpar p = { bg, pb, 0, 0 };
  int ball = pb->ball, *mono = &ws->mono;
  size_t *nt = &ws->nt;
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
  int full = pb->fine;
  *mono = 1;
  /* balls of a tabulated f: beyond y = 20 (w < 2e-9 Z) R grows linearly
     in y, so the table steps by 1 there */
  for (double y = ylo;; y += !full ? TABLE_STEP
                             : (ball && y > 20) ? 1.0 : TABLE_STEP_TAB)
    {
      if (y > yhi)
        y = yhi;
      v = size_at (y, &p);
      /* a solver failing next to the horizon (noisy or extremal data)
         ends the table where it still worked: smaller sizes stay
         available, larger ones are beyond reach */
      if (p.status && n >= 2 && full
          && (p.status == HOLENT_ENOCONV || p.status == HOLENT_EDOM))
        {
          yhi = ws->ty[n - 1];
          p.status = 0;
          break;
        }
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

int
holent_hd_size_table (const holent_hd_bg *bg, holent_hd_size_workspace *ws,
                      const holent_hd_size_problem *pb, double smin,
                      double smax, double ratio, double wmin, double *reach)
{
  if (bg == NULL || ws == NULL || pb == NULL || reach == NULL)
    return HOLENT_EINVAL;
  ws->nt = 0;
  int st = table_build (bg, ws, pb, smin, smax, ratio, wmin, reach);
  if (st)
    ws->nt = 0;  /* no half-built table to solve on */
  return st;
}

void
holent_hd_size_table_get (const holent_hd_size_workspace *ws, size_t *nt,
                          const double **ty, const double **tv, int *mono)
{
  *nt = ws->nt;
  *ty = ws->ty;
  *tv = ws->tv;
  *mono = ws->mono;
}

int
holent_hd_size_check (size_t n, const double *l, size_t *bad, double *lmin,
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
   finite area (RT: the minimal extremal surface).  */
int
holent_hd_size_solve (const holent_hd_bg *bg, holent_hd_size_workspace *ws,
                      const holent_hd_size_problem *pb, double s,
                      double *best_fin, double *best_cut, double *best_extra,
                      double *best_x)
{
  rpar p = { bg, pb, s, 0 };
  if (bg == NULL || ws == NULL || pb == NULL)
    return HOLENT_EINVAL;
  if (ws->nt < 2)
    return HOLENT_ENOCONV;
  size_t nt = ws->nt, j0 = 0, j1 = nt - 1;
  int found = 0, st, mono = ws->mono;
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
      double a = ws->tv[j] - s, b = ws->tv[j + 1] - s, y, fin, cut, ex;
      double zs, w;
      if (a * b > 0)
        continue;
      if (a == 0)
        y = ws->ty[j];
      else if (b == 0)
        y = ws->ty[j + 1];
      else
        {
          if ((st = brent (&p, ws->root, ws->ty[j], ws->ty[j + 1], &y)))
            return st;
        }
      root_point (bg, y, &zs, &w);
      if ((st = pb->eval (pb->ctx, zs, w, &fin, &cut, &ex)))
        return st;
      if (fin < *best_fin)
        {
          *best_extra = ex;
          *best_fin = fin;
          *best_cut = cut;
          *best_x = zs;
        }
      found = 1;
    }
  return found ? HOLENT_SUCCESS : HOLENT_ENOCONV;
}


int
holent_hd_size_accuracy (const holent_hd_bg *bg,
                         int (*solve) (const holent_hd_bg *, void *, size_t,
                                       const double *, double *, double *),
                         void *ctx, size_t n, const double *s,
                         const double *fin, double *acc)
{
  holent_hd_bg bp;
  if (bg == NULL || solve == NULL
      || (n > 0 && (s == NULL || fin == NULL || acc == NULL)))
    return HOLENT_EINVAL;
  if (bg->kind != HOLENT_HD_TABULATED)
    {
      for (size_t i = 0; i < n; i++)
        acc[i] = 0;
      return HOLENT_SUCCESS;
    }
  int st = holent_hd_bg_perturbed (bg, &bp);
  if (st)
    return st;
  double *Sp = malloc (2 * n * sizeof *Sp + 1), *fp = Sp + n;
  if (Sp == NULL)
    st = HOLENT_ENOMEM;
  int all = st ? st : solve (&bp, ctx, n, s, Sp, fp);
  for (size_t i = 0; !st && !all && i < n; i++)
    acc[i] = fabs (fp[i] - fin[i]);
  /* else one size at a time: one the perturbed data cannot reach gets
     Inf */
  for (size_t i = 0; !st && all && i < n; i++)
    {
      int s1 = solve (&bp, ctx, 1, s + i, Sp + i, fp + i);
      if (s1 == HOLENT_ENOMEM)
        st = s1;
      acc[i] = s1 ? INFINITY : fabs (fp[i] - fin[i]);
    }
  free (Sp);
  holent_hd_bg_free (&bp);
  return st;
}
