/* holent_hd_vel.c: entanglement and butterfly velocities.  See
 * holent_hd_vel.h.  SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_min.h>
#include "holent_hd_vel.h"

#define SCAN 400        /* grid of the first scan for the maximum        */
#define ZFAR 16.0       /* analytic f: the maximum lies below ZFAR zh    */

/* the rate -f(z)/z^(2d-2) (the square of sqrt(-f) z^(1-d)) */
static double
rate (double z, void *p)
{
  const holent_hd_bg *bg = p;
  double f;
  if (holent_hd_bg_f (bg, z, &f, NULL))
    return NAN;
  return -f / gsl_pow_int (z, 2 * bg->d - 2);
}

static double
neg_rate (double z, void *p)
{
  return -rate (z, p);
}

int
holent_hd_velocities (const holent_hd_bg *bg, double *vE, double *zm,
                      double *vB, double *zneed)
{
  if (bg == NULL)
    return HOLENT_EINVAL;
  double zh = bg->zh;
  if (!isfinite (zh))
    return HOLENT_EDOM;
  int d = bg->d;
  if (vB)
    *vB = bg->extremal ? 0 : sqrt (fabs (bg->fp_h) * zh / (2.0 * (d - 1)));
  if (bg->extremal)
    {
      if (vE)
        *vE = 0;
      if (zm)
        *zm = zh;
      return HOLENT_SUCCESS;
    }
  if (d == 2 && bg->kind == HOLENT_HD_BRANE)
    {
      /* planar BTZ: the rate 1/zh^2 - 1/z^2 grows to its supremum as
         z -> infinity, v_E = 1 (= v_B: light-cone spreading in 2D) */
      if (vE)
        *vE = 1;
      if (zm)
        *zm = INFINITY;
      return HOLENT_SUCCESS;
    }
  /* scan (zh, zend] for the largest rate; f must stay known past it */
  double zend = fmin (bg->zmax, ZFAR * zh), best = -INFINITY;
  size_t ib = 0;
  double zs[SCAN + 1];
  for (size_t i = 1; i <= SCAN; i++)
    {
      zs[i] = zh + (zend - zh) * i / SCAN;
      double r = rate (zs[i], (void *) bg);
      if (!isfinite (r))
        return HOLENT_EDOM;
      if (r > best)
        {
          best = r;
          ib = i;
        }
      if (r < 0)
        break;  /* f >= 0 again: an inner horizon closes the region */
    }
  if (!(best > 0))
    return HOLENT_EDOM;
  if (ib == SCAN)
    {
      if (zneed)
        *zneed = zend;
      return HOLENT_EDOM;
    }
  /* refine between the neighbours of the grid maximum (Brent; the
     maximum is flat: z_m to ~1e-7 zh gives v_E to ~1e-14) */
  double lo = ib > 1 ? zs[ib - 1] : zh, hi = zs[ib + 1], x = zs[ib];
  gsl_function F = { neg_rate, (void *) bg };
  gsl_min_fminimizer *s = gsl_min_fminimizer_alloc (gsl_min_fminimizer_brent);
  if (s == NULL)
    return HOLENT_ENOMEM;
  int st = gsl_min_fminimizer_set_with_values (s, &F, x, -best, lo,
                                               neg_rate (lo, (void *) bg), hi,
                                               neg_rate (hi, (void *) bg));
  for (int it = 0; st == GSL_SUCCESS; it++)
    {
      if (it > 200)
        {
          st = GSL_EMAXITER;
          break;
        }
      if ((st = gsl_min_fminimizer_iterate (s)))
        break;
      st = gsl_min_test_interval (gsl_min_fminimizer_x_lower (s),
                                  gsl_min_fminimizer_x_upper (s),
                                  1e-7 * zh, 0);
      if (st == GSL_SUCCESS)
        break;
      if (st == GSL_CONTINUE)
        st = GSL_SUCCESS;
    }
  if (!st)
    {
      x = gsl_min_fminimizer_x_minimum (s);
      best = -gsl_min_fminimizer_f_minimum (s);
    }
  gsl_min_fminimizer_free (s);
  if (st)
    return HOLENT_ENOCONV;
  if (vE)
    *vE = sqrt (best) * pow (zh, d - 1);
  if (zm)
    *zm = x;
  return HOLENT_SUCCESS;
}
