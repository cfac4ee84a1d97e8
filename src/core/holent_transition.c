/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_transition.c: see holent_transition.h and doc/transitions.md.  */
#include <math.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_roots.h>
#include "holent_transition.h"
#include "holent_thermo.h"

typedef double (*diff_fn) (double x, void *p, int *st);

typedef struct
{
  diff_fn f;
  void *p;
  int st;      /* first failure of f, if any */
} wrap_par;

static double
wrap (double x, void *vp)
{
  wrap_par *w = vp;
  int st = 0;
  double v = w->f (x, w->p, &st);
  if (st && !w->st)
    w->st = st;
  return v;
}

/* Brent on [lo, hi] where f changes sign; to the last bit of x.  */
static int
brent (diff_fn f, void *p, double lo, double hi,
       holent_transition_result *res)
{
  wrap_par w = { f, p, 0 };
  gsl_function F = { wrap, &w };
  gsl_root_fsolver *s = gsl_root_fsolver_alloc (gsl_root_fsolver_brent);
  if (s == NULL)
    return HOLENT_ENOMEM;
  int st = gsl_root_fsolver_set (s, &F, lo, hi), it = 0;
  double x = NAN;
  while (st == GSL_SUCCESS && it++ < 300)
    {
      st = gsl_root_fsolver_iterate (s);
      if (st)
        break;
      x = gsl_root_fsolver_root (s);
      lo = gsl_root_fsolver_x_lower (s);
      hi = gsl_root_fsolver_x_upper (s);
      if (gsl_root_test_interval (lo, hi, 0.0, 4 * GSL_DBL_EPSILON)
          == GSL_SUCCESS)
        break;
    }
  gsl_root_fsolver_free (s);
  if (w.st)
    return w.st;
  if (st || !isfinite (x))
    return HOLENT_ENOCONV;
  res->x = x;
  res->lo = lo;
  res->hi = hi;
  res->found = 1;
  return HOLENT_SUCCESS;
}

static void
none (holent_transition_result *res)
{
  res->x = res->lo = res->hi = NAN;
  res->found = 0;
}

/* ---- plateau ---- */

static double
plateau_f (double l, void *p, int *st)
{
  const holent_geo_bg *bg = p;
  (void) st;
  return holent_geo_len_unchecked (bg, l)
         - holent_geo_len_unchecked (bg, bg->L - l) - 6.0 * bg->S_BH / bg->c;
}

int
holent_transition_plateau (const holent_geo_bg *bg,
                           holent_transition_result *res)
{
  if (bg == NULL || res == NULL)
    return HOLENT_EINVAL;
  none (res);
  if (!bg->circle || !bg->horizon)
    return HOLENT_EUNSUP;
  /* at L/2 the difference is -6 S_BH/c < 0; near L it grows like
     -2 log(L - l): step towards L until it is positive */
  double L = bg->L, gap = 0.25 * L, hi = L - gap;
  void *p = (void *) bg;
  int st = 0;
  while (plateau_f (hi, p, &st) <= 0.0)
    {
      gap *= 0.25;
      if (gap < 1e-300 * L || L - gap == L)
        return HOLENT_SUCCESS;  /* not found (cannot happen for S_BH > 0) */
      hi = L - gap;
    }
  return brent (plateau_f, p, 0.5 * L, hi, res);
}

/* ---- two intervals ---- */

typedef struct
{
  const holent_geo_bg *bg;
  double l1, l2;
} sep_par;

static double
sep_f (double d, void *vp, int *st)
{
  sep_par *p = vp;
  (void) st;
  return holent_geo_len_unchecked (p->bg, d)
         + holent_geo_len_unchecked (p->bg, p->l1 + d + p->l2)
         - holent_geo_len_unchecked (p->bg, p->l1)
         - holent_geo_len_unchecked (p->bg, p->l2);
}

int
holent_transition_separation (const holent_geo_bg *bg, double l1, double l2,
                              holent_transition_result *res)
{
  if (bg == NULL || res == NULL || isnan (l1) || isnan (l2))
    return HOLENT_EINVAL;
  none (res);
  if (!(l1 > 0.0) || !(l2 > 0.0) || !isfinite (l1) || !isfinite (l2))
    return HOLENT_EDOM;
  int glob = bg->bulk == HOLENT_BULK_GLOBAL_ADS
             || bg->bulk == HOLENT_BULK_THERMAL_ADS
             || (bg->bulk == HOLENT_BULK_CONICAL_DEFECT && bg->alpha == 1.0);
  if (bg->circle && !glob)
    return HOLENT_EUNSUP;
  double dmax = bg->circle ? bg->L - l1 - l2 : INFINITY;
  if (!(dmax > 0.0))
    return HOLENT_EDOM;
  sep_par p = { bg, l1, l2 };
  int st = 0;
  /* small gaps: the connected surface wins (len(d) -> -inf) */
  double lo = 1e-3 * (l1 < l2 ? l1 : l2), hi;
  if (lo > 0.5 * dmax)
    lo = 0.5 * dmax;
  while (sep_f (lo, &p, &st) >= 0.0)
    {
      lo *= 1e-3;
      if (lo < 1e-300)
        return HOLENT_SUCCESS;
    }
  hi = lo;
  for (;;)
    {
      double next = bg->circle ? hi + 0.5 * (dmax - hi) : 2.0 * hi;
      if (bg->circle && (next == hi || next >= dmax))
        return HOLENT_SUCCESS;  /* connected all the way */
      if (!isfinite (next))
        return HOLENT_SUCCESS;
      if (sep_f (next, &p, &st) > 0.0)
        {
          lo = hi;
          hi = next;
          break;
        }
      hi = next;
    }
  return brent (sep_f, &p, lo, hi, res);
}

/* ---- Hawking-Page ---- */

typedef struct
{
  double Omega, L;
} hp_par;

static double
hp_f (double T, void *vp, int *st)
{
  hp_par *p = vp;
  holent_thermo_state s;
  int reason;
  int r = holent_thermo_state_from (1.0, 1.0, p->L, HOLENT_THERMO_T_OMEGA, T,
                                    p->Omega, &s, &reason);
  if (r)
    {
      *st = r;
      return NAN;
    }
  /* scale-free: the free energies are proportional to c */
  return s.F - s.F_thermal_ads;
}

int
holent_transition_hawking_page (double Omega, double L,
                                holent_transition_result *res)
{
  if (res == NULL || isnan (Omega) || isnan (L))
    return HOLENT_EINVAL;
  none (res);
  if (!(fabs (Omega) < 1.0) || !(L > 0.0) || !isfinite (L))
    return HOLENT_EDOM;
  hp_par p = { Omega, L };
  int st = 0;
  double lo = 1.0 / L, hi = 1.0 / L;
  for (int k = 0; k < 200 && hp_f (lo, &p, &st) <= 0.0; k++)
    lo *= 0.5;
  for (int k = 0; k < 200 && hp_f (hi, &p, &st) >= 0.0; k++)
    hi *= 2.0;
  if (st)
    return HOLENT_EDOM;
  if (!(hp_f (lo, &p, &st) > 0.0 && hp_f (hi, &p, &st) < 0.0))
    return HOLENT_SUCCESS;
  return brent (hp_f, &p, lo, hi, res);
}

/* ---- strips ---- */

typedef struct
{
  const holent_hd_bg *bg;
  holent_strip_workspace *w;
  double l1, l2, f12;
} strip_par;

static double
strip_f (double s, void *vp, int *st)
{
  strip_par *p = vp;
  double l[2] = { s, p->l1 + s + p->l2 }, S[2], fin[2];
  size_t bad;
  int r = holent_strip_entropy (p->bg, p->w, 1.0, 2, l, S, fin, NULL, NULL,
                                &bad, NULL);
  if (r)
    {
      *st = r;
      return NAN;
    }
  return fin[0] + fin[1] - p->f12;
}

int
holent_transition_strip_pair (const holent_hd_bg *bg,
                              holent_strip_workspace *w, double l1,
                              double l2, holent_transition_result *res)
{
  if (bg == NULL || w == NULL || res == NULL || isnan (l1) || isnan (l2))
    return HOLENT_EINVAL;
  none (res);
  if (!(l1 > 0.0) || !(l2 > 0.0) || !isfinite (l1) || !isfinite (l2))
    return HOLENT_EDOM;
  double l[2] = { l1, l2 }, S[2], fin[2];
  size_t bad;
  int st = holent_strip_entropy (bg, w, 1.0, 2, l, S, fin, NULL, NULL, &bad,
                                 NULL);
  if (st)
    return st;
  strip_par p = { bg, w, l1, l2, fin[0] + fin[1] };
  double lo = 1e-3 * (l1 < l2 ? l1 : l2), hi, v;
  st = 0;
  while ((v = strip_f (lo, &p, &st)) >= 0.0 && !st)
    {
      lo *= 1e-2;
      if (lo < 1e-200)
        return HOLENT_SUCCESS;
    }
  if (st)
    return st;
  hi = lo;
  for (int k = 0; k < 2000; k++)
    {
      double next = 2.0 * hi;
      v = strip_f (next, &p, &st);
      if (st == HOLENT_EDOM)
        return HOLENT_SUCCESS;  /* beyond the reachable widths: none */
      if (st)
        return st;
      if (v > 0.0)
        {
          lo = hi;
          hi = next;
          return brent (strip_f, &p, lo, hi, res);
        }
      hi = next;
    }
  return HOLENT_SUCCESS;
}
