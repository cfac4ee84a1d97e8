/* holent_root.c: one Brent loop for the core (see holent_root.h).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <gsl/gsl_errno.h>
#include <gsl/gsl_roots.h>

#include "holent_root.h"

int
holent_root_brent (double (*f) (double, void *), void *par, double lo,
                   double hi, double epsabs, double epsrel, int itmax,
                   double *x)
{
  gsl_function F = { f, par };
  gsl_root_fsolver *s = gsl_root_fsolver_alloc (gsl_root_fsolver_brent);
  if (s == NULL)
    return HOLENT_ENOMEM;
  int st = gsl_root_fsolver_set (s, &F, lo, hi);
  for (int it = 0; st == GSL_SUCCESS; it++)
    {
      if (it >= itmax)
        {
          st = GSL_EMAXITER;
          break;
        }
      if ((st = gsl_root_fsolver_iterate (s)))
        break;
      st = gsl_root_test_interval (gsl_root_fsolver_x_lower (s),
                                   gsl_root_fsolver_x_upper (s), epsabs,
                                   epsrel);
      if (st == GSL_SUCCESS)
        break;
      if (st == GSL_CONTINUE)
        st = GSL_SUCCESS;
    }
  *x = gsl_root_fsolver_root (s);
  gsl_root_fsolver_free (s);
  return st ? HOLENT_ENOCONV : HOLENT_SUCCESS;
}
