/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_geo.c: regulated geodesic lengths in AdS3 backgrounds.
 * Derivations: doc/ads3_geodesics.md.  GPL-3.0-or-later.  */
#include <float.h>
#include <math.h>
#include <gsl/gsl_math.h>
#include "holent_geo.h"
#include "holent_vmath.h"

static int
finite_pos (double x)
{
  return isfinite (x) && x > 0.0;
}

int
holent_geo_bg_init (holent_geo_bg *bg, holent_bulk bulk, double L,
                    double eps, double beta_L, double beta_R, double alpha,
                    double c)
{
  if (bg == NULL)
    return HOLENT_EINVAL;
  if (isnan (eps) || isnan (c))
    return HOLENT_EINVAL;
  if (!finite_pos (eps) || !finite_pos (c))
    return HOLENT_EDOM;

  bg->bulk = bulk;
  bg->eps = eps;
  bg->c = c;
  bg->L = 0.0;
  bg->beta_L = bg->beta_R = 0.0;
  bg->alpha = 1.0;
  bg->horizon = 0;
  bg->S_BH = 0.0;
  bg->s_density = 0.0;

  switch (bulk)
    {
    case HOLENT_BULK_POINCARE:
      bg->circle = 0;
      break;
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
      bg->circle = 1;
      break;
    case HOLENT_BULK_PLANAR_BTZ:
    case HOLENT_BULK_PLANAR_ROTATING_BTZ:
      bg->circle = 0;
      break;
    case HOLENT_BULK_BTZ:
    case HOLENT_BULK_ROTATING_BTZ:
    case HOLENT_BULK_CONICAL_DEFECT:
      bg->circle = 1;
      break;
    default:
      return HOLENT_EINVAL;
    }

  if (bg->circle)
    {
      if (isnan (L))
        return HOLENT_EINVAL;
      if (!finite_pos (L))
        return HOLENT_EDOM;
      bg->L = L;
    }

  switch (bulk)
    {
    case HOLENT_BULK_PLANAR_BTZ:
    case HOLENT_BULK_BTZ:
      beta_R = beta_L;  /* non-rotating: one temperature */
      /* fall through */
    case HOLENT_BULK_ROTATING_BTZ:
    case HOLENT_BULK_PLANAR_ROTATING_BTZ:
      if (isnan (beta_L) || isnan (beta_R))
        return HOLENT_EINVAL;
      if (!finite_pos (beta_L) || !finite_pos (beta_R))
        return HOLENT_EDOM;
      bg->beta_L = beta_L;
      bg->beta_R = beta_R;
      bg->horizon = 1;
      /* Cardy / Bekenstein-Hawking: s = (pi c / 6) (1/beta_L + 1/beta_R) */
      bg->s_density = M_PI * c / 6.0 * (1.0 / beta_L + 1.0 / beta_R);
      bg->S_BH = bg->circle ? bg->s_density * L : INFINITY;
      break;
    case HOLENT_BULK_CONICAL_DEFECT:
      if (isnan (alpha))
        return HOLENT_EINVAL;
      if (!(alpha > 0.0 && alpha <= 1.0))
        return HOLENT_EDOM;
      bg->alpha = alpha;
      break;
    default:
      break;
    }

  switch (bulk)
    {
    case HOLENT_BULK_POINCARE:
      bg->pref = -2.0 * log (eps);
      break;
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
    case HOLENT_BULK_CONICAL_DEFECT:
      bg->kL = bg->kR = M_PI * bg->alpha / L;
      /* in logs: L/(pi alpha eps) overflows for L = 1e308, eps = 1e-320 */
      bg->pref = 2.0 * (log (L) - log (M_PI * bg->alpha) - log (eps));
      bg->wgt = 1.0;
      break;
    default:
      bg->kL = M_PI / bg->beta_L;
      bg->kR = M_PI / bg->beta_R;
      bg->pref = (log (bg->beta_L) - log (M_PI * eps))
                 + (log (bg->beta_R) - log (M_PI * eps));
      bg->wgt = 1.0;
      break;
    }
  /* No Inf and no lost digits without a word: the derived constants must
     be finite, the scale k eps of the shortest meaningful arc a normal
     number (else log sin(k l) loses its digits in subnormals or gives
     -Inf), and k L finite on a circle.  */
  if (!isfinite (bg->pref) || !isfinite (bg->s_density)
      || (bg->circle && !isfinite (bg->S_BH)))
    return HOLENT_EDOM;
  if (bulk != HOLENT_BULK_POINCARE
      && (!(fmin (bg->kL, bg->kR) * eps >= DBL_MIN)
          || !isfinite (fmax (bg->kL, bg->kR))
          || (bg->circle && !isfinite (fmax (bg->kL, bg->kR) * L))))
    return HOLENT_EDOM;
  return HOLENT_SUCCESS;
}

static int
arc_ok (const holent_geo_bg *bg, double arc)
{
  if (!(arc > 0.0) || !isfinite (arc))
    return 0;
  if (!bg->circle)
    return 1;
  switch (bg->bulk)
    {
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
      return arc < bg->L;
    case HOLENT_BULK_CONICAL_DEFECT:
      return bg->alpha < 1.0 ? arc <= bg->L : arc < bg->L;
    default:
      return arc <= bg->L;
    }
}

int
holent_geo_arc_length (const holent_geo_bg *bg, double arc, double *len)
{
  if (bg == NULL || len == NULL || isnan (arc))
    return HOLENT_EINVAL;
  if (!arc_ok (bg, arc))
    return HOLENT_EDOM;
  *len = holent_geo_len_unchecked (bg, arc);
  return HOLENT_SUCCESS;
}

int
holent_geo_arc_lengths (const holent_geo_bg *bg, size_t n,
                        const double *arc, double *len, size_t *bad)
{
  if (bg == NULL || (n > 0 && (arc == NULL || len == NULL)))
    return HOLENT_EINVAL;
  /* Check first, in one pass, so the parallel loop has no early exit.  */
  for (size_t i = 0; i < n; i++)
    if (!arc_ok (bg, arc[i]))
      {
        if (bad)
          *bad = i;
        return isnan (arc[i]) ? HOLENT_EINVAL : HOLENT_EDOM;
      }
  const long nn = (long) n;
#pragma omp parallel for schedule(static) if (nn > 20000)
  for (long i = 0; i < nn; i++)
    len[i] = holent_geo_len_unchecked (bg, arc[i]);
  return HOLENT_SUCCESS;
}

int
holent_geo_point_lengths (const holent_geo_bg *bg, size_t n,
                          const double *x1, const double *x2,
                          holent_geo_class cls, double *len, size_t *bad)
{
  /* vectorised, in holent_vmath.c */
  return holent_vmath_point_lengths (bg, n, x1, x2, cls, len, bad);
}

int
holent_geo_points_check (const holent_geo_bg *bg, size_t n,
                         const double *x1, const double *x2, holent_err *e)
{
  holent_err_clear (e);
  if (bg == NULL || (n > 0 && (x1 == NULL || x2 == NULL)))
    return holent_err_set (e, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  for (int k = 0; k < 2; k++)
    {
      const double *x = k ? x2 : x1;
      for (size_t i = 0; i < n; i++)
        {
          if (isnan (x[i]))
            return holent_err_set (e, HOLENT_ENAN, k, i, NULL);
          if (!isfinite (x[i]))
            return holent_err_set (e, HOLENT_EDOM, k, i, "must be finite");
        }
    }
  for (size_t i = 0; i < n; i++)
    {
      const double d = x2[i] - x1[i];
      if (!isfinite (d))
        return holent_err_set (e, HOLENT_EDOM, 1, i, "its distance to the "
                               "first point overflows double precision: "
                               "the points must be closer");
      if (d == 0.0 || (bg->circle && fmod (d, bg->L) == 0.0))
        return holent_err_set (e, HOLENT_ECOINCIDE, 1, i, "coincides with "
                               "the first point%s: no geodesic joins a "
                               "point to itself", bg->circle
                               ? " (modulo the circumference)" : "");
    }
  return HOLENT_SUCCESS;
}
