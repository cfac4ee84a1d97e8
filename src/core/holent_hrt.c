/* holent_hrt.c: covariant geodesic lengths between boundary points with
 * times in the AdS3 bulks, and the HRT minimisation over region sets.
 * Derivations: doc/hrt_time.md.
 *
 * Copyright (C) 2026 The holent developers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <gsl/gsl_math.h>
#include "holent_hrt.h"

/* Arc from x1 to x2 in the positive sense, in [0, L) (circle), or the
   signed separation (line).  */
static double
pos_arc (const holent_geo_bg *bg, double x1, double x2)
{
  double d = x2 - x1;
  if (!bg->circle)
    return d;
  double a = fmod (d, bg->L);
  if (a < 0.0)
    a += bg->L;
  if (a >= bg->L)
    a = 0.0;
  return a;
}

/* Boundary spacelike test on the separation (arc in [0, L) on a circle). */
static int
spacelike_sep (const holent_geo_bg *bg, double arc, double dt)
{
  double d = fabs (arc);
  if (bg->circle && bg->L - arc < d)
    d = bg->L - arc;
  return fabs (dt) < d;
}

int
holent_hrt_spacelike (const holent_geo_bg *bg, double x1, double t1,
                      double x2, double t2)
{
  if (bg == NULL)
    return 0;
  return spacelike_sep (bg, pos_arc (bg, x1, x2), t2 - t1);
}

/* log|f(k (a - d))| + log|f(k' (a + d))| and the sign of the product, for
   the geodesic over an arc a > 0 with time difference d along it.  */
static int
class_length (const holent_geo_bg *bg, double a, double d, int timelike,
              double *re, double *im)
{
  double u = a - d, v = a + d, lu, lv;
  int neg;
  switch (bg->bulk)
    {
    case HOLENT_BULK_POINCARE:
      neg = (u < 0.0) != (v < 0.0);
      lu = log (fabs (u));
      lv = log (fabs (v));
      break;
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
    case HOLENT_BULK_CONICAL_DEFECT:
      {
        double k = bg->kL;
        if (bg->bulk == HOLENT_BULK_CONICAL_DEFECT && bg->alpha < 1.0
            && k * a >= M_PI_2)
          {
            /* No geodesic in this class: the path through the apex, the
               sum of two radial legs extremised over the apex time.  */
            if (timelike)
              return HOLENT_ETIMELIKE;
            *re = bg->pref + 2.0 * log (cos (k * d));
            *im = 0.0;
            return HOLENT_SUCCESS;
          }
        double su = sin (k * u), sv = sin (k * v);
        neg = (su < 0.0) != (sv < 0.0);
        lu = log (fabs (su));
        lv = log (fabs (sv));
        break;
      }
    default:
      /* BTZ family: k_L = pi/beta_L goes with s - dt (doc/hrt_time.md).  */
      neg = (u < 0.0) != (v < 0.0);
      lu = holent_geo_lnsinh (bg->kL * fabs (u));
      lv = holent_geo_lnsinh (bg->kR * fabs (v));
      break;
    }
  if (u == 0.0 || v == 0.0 || !isfinite (lu) || !isfinite (lv))
    return HOLENT_ETIMELIKE;  /* null separated: no finite length */
  if (neg && !timelike)
    return HOLENT_ETIMELIKE;
  if (!neg && timelike)
    return HOLENT_ETIMELIKE;  /* causal pair with no timelike branch */
  *re = bg->pref + lu + lv;
  *im = neg ? M_PI : 0.0;
  return HOLENT_SUCCESS;
}

/* 1 when the class over the arc a has a geodesic (or the defect's cap):
   the static module's rule.  */
static int
class_ok (const holent_geo_bg *bg, double a)
{
  double len;
  return holent_geo_arc_length (bg, a, &len) == HOLENT_SUCCESS;
}

int
holent_hrt_length (const holent_geo_bg *bg, double x1, double t1,
                   double x2, double t2, holent_geo_class cls, int timelike,
                   double *re, double *im)
{
  if (bg == NULL || re == NULL || im == NULL)
    return HOLENT_EINVAL;
  if (!isfinite (x1) || !isfinite (x2) || !isfinite (t1) || !isfinite (t2)
      || !isfinite (x2 - x1) || !isfinite (t2 - t1))
    return HOLENT_EINVAL;
  if (cls != HOLENT_GEO_SHORTER && cls != HOLENT_GEO_POSITIVE
      && cls != HOLENT_GEO_NEGATIVE)
    return HOLENT_EINVAL;
  double arc = pos_arc (bg, x1, x2), dt = t2 - t1;
  if (arc == 0.0)
    return HOLENT_ECOINCIDE;
  int space = spacelike_sep (bg, arc, dt);
  if (!space && !timelike)
    return HOLENT_ETIMELIKE;
  if (!bg->circle)
    return class_length (bg, fabs (arc), arc > 0 ? dt : -dt, !space, re,
                         im);
  /* Circle: the positive class runs over arc with dt, the negative one
     over L - arc with -dt (the separation flips sign).  */
  double ap = arc, an = bg->L - arc;
  if (cls == HOLENT_GEO_POSITIVE || cls == HOLENT_GEO_NEGATIVE)
    {
      double a = cls == HOLENT_GEO_POSITIVE ? ap : an;
      if (!class_ok (bg, a))
        return HOLENT_EDOM;
      return class_length (bg, a, cls == HOLENT_GEO_POSITIVE ? dt : -dt,
                           !space, re, im);
    }
  if (!space)  /* timelike branch: the class of the shorter arc */
    return ap <= an ? class_length (bg, ap, dt, 1, re, im)
                    : class_length (bg, an, -dt, 1, re, im);
  double r1, r2, i1, i2;
  int s1 = class_length (bg, ap, dt, 0, &r1, &i1);
  int s2 = class_length (bg, an, -dt, 0, &r2, &i2);
  if (s1 && s2)
    return s1;
  if (s1 || (!s2 && r2 < r1))
    {
      *re = r2;
      *im = i2;
    }
  else
    {
      *re = r1;
      *im = i1;
    }
  return HOLENT_SUCCESS;
}

int
holent_hrt_timelike_entropy (const holent_geo_bg *bg, double l, double t,
                             double dt, double *S_re, double *S_im,
                             int *causal)
{
  double re, im;
  if (S_re == NULL || S_im == NULL || causal == NULL)
    return HOLENT_EINVAL;
  int st = holent_hrt_length (bg, 0.0, t, l, t + dt, HOLENT_GEO_POSITIVE, 1,
                              &re, &im);
  *causal = st == HOLENT_SUCCESS && im != 0.0;
  if (*causal)
    {
      *S_re = bg->c / 6.0 * re;
      *S_im = bg->c / 6.0 * im;
    }
  return st;
}

int
holent_hrt_lengths (const holent_geo_bg *bg, size_t n, const double *x1,
                    const double *t1, const double *x2, const double *t2,
                    holent_geo_class cls, int timelike, double *re,
                    double *im, size_t *bad)
{
  if (bg == NULL
      || (n > 0 && (!x1 || !t1 || !x2 || !t2 || !re || (timelike && !im))))
    return HOLENT_EINVAL;
  for (size_t i = 0; i < n; i++)
    {
      double ii;
      int st = holent_hrt_length (bg, x1[i], t1[i], x2[i], t2[i], cls,
                                  timelike, &re[i], &ii);
      if (st)
        {
          if (bad)
            *bad = i;
          return st;
        }
      if (im)
        im[i] = ii;
    }
  return HOLENT_SUCCESS;
}

int
holent_hrt_region_times (const holent_region *r, size_t nin,
                         const double *ts, const double *te, double *tp,
                         size_t *bad)
{
  if (r == NULL || (nin > 0 && (ts == NULL || te == NULL)) || tp == NULL)
    return HOLENT_EINVAL;
  for (size_t i = 0; i < nin; i++)
    if (!isfinite (ts[i]) || !isfinite (te[i]))
      {
        if (bad)
          *bad = i;
        return HOLENT_EINVAL;
      }
  if (r->whole || r->n != nin)
    {
      /* A merged interval: report its first row.  */
      size_t k = 0;
      while (k + 1 < r->n && r->row[k + 1] == r->row[k] + 1)
        k++;
      if (bad)
        *bad = r->n > 0 ? r->row[k] : 0;
      return HOLENT_EOVERLAP;
    }
  size_t m = r->n;
  for (size_t k = 0; k < m; k++)
    {
      size_t row = r->row[k];
      if (r->start0)
        {
          tp[2 * k] = ts[row];
          tp[2 * k + 1] = te[row];
        }
      else if (k + 1 < m)
        {
          tp[2 * k + 1] = ts[row];
          tp[2 * k + 2] = te[row];
        }
      else
        {
          /* The interval through 0: its end is pts[0].  */
          tp[0] = te[row];
          tp[2 * m - 1] = ts[row];
        }
    }
  return HOLENT_SUCCESS;
}

typedef struct
{
  const holent_geo_bg *bg;
  const double *x, *t;
} hrt_ctx;

/* The covariant length over the arc from sorted point i to j.  */
static int
hrt_cost (void *vctx, size_t i, size_t j, double arc, double *len)
{
  const hrt_ctx *c = vctx;
  double im;
  double dt = c->t[j] - c->t[i];
  if (!c->bg->circle)
    return class_length (c->bg, arc, dt, 0, len, &im);
  if (!class_ok (c->bg, arc))
    return HOLENT_EDOM;
  return class_length (c->bg, arc, dt, 0, len, &im);
}

int
holent_hrt_entropy (holent_rt_workspace *w, const holent_geo_bg *bg,
                    const holent_region *r, const double *tp,
                    holent_rt_result *res, size_t *pairs, double *arcs,
                    size_t *bad_i, size_t *bad_j)
{
  if (w == NULL || bg == NULL || r == NULL || res == NULL
      || (tp == NULL && r->n > 0))
    return HOLENT_EINVAL;
  size_t N = 2 * r->n;
  /* The region must be achronal: every pair of endpoints spacelike.  */
  for (size_t i = 0; i < N; i++)
    for (size_t j = i + 1; j < N; j++)
      if (!spacelike_sep (bg, r->pts[j] - r->pts[i], tp[j] - tp[i]))
        {
          if (bad_i)
            *bad_i = i;
          if (bad_j)
            *bad_j = j;
          return HOLENT_ETIMELIKE;
        }
  hrt_ctx c = { bg, r->pts, tp };
  return holent_rt_entropy_cost (w, bg, r, hrt_cost, &c, res, pairs, arcs);
}
