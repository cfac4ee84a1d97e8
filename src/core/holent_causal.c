/* holent_causal.c: first-return times of bulk null rays.
 * Derivation: doc/bulk_causality.md.
 *
 * Copyright (C) 2026 The holent developers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <gsl/gsl_math.h>
#include "holent_causal.h"

/* Distance on the circle of circumference L.  */
static double
circ_dist (double d, double L)
{
  d = fmod (fabs (d), L);
  return d > 0.5 * L ? L - d : d;
}

int
holent_causal_times (const holent_geo_bg *bg, double x1, double x2,
                     double tol, double *t_bulk, double *t_bdy)
{
  if (bg == NULL || t_bulk == NULL || t_bdy == NULL)
    return HOLENT_EINVAL;
  if (!isfinite (x1) || !isfinite (x2) || !isfinite (x2 - x1)
      || isnan (tol) || !isfinite (tol))
    return HOLENT_EINVAL;
  if (tol < 0.0)
    tol = 1e-9 * (bg->circle ? bg->L : 1.0);
  double d = x2 - x1;
  *t_bulk = INFINITY;
  if (!bg->circle)
    {
      *t_bdy = fabs (d);
      return HOLENT_SUCCESS;
    }
  double L = bg->L;
  *t_bdy = circ_dist (d, L);
  switch (bg->bulk)
    {
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
    case HOLENT_BULK_CONICAL_DEFECT:
      {
        /* The landing points x1 +- L/(2 alpha); alpha = 1 is the
           antipode (both signs agree).  */
        double h = 0.5 * L / bg->alpha;
        if (circ_dist (d - h, L) <= tol || circ_dist (d + h, L) <= tol)
          *t_bulk = h;
        break;
      }
    default:
      break;
    }
  return HOLENT_SUCCESS;
}
