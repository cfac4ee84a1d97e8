/* holent_ode.c: see holent_ode.h.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_odeiv2.h>
#include "holent_ode.h"

#define ODE_DIMMAX 8

struct holent_ode
{
  size_t dim;
  gsl_odeiv2_step *step;
  gsl_odeiv2_control *ctrl;
  gsl_odeiv2_evolve *evol;
};

holent_ode *
holent_ode_alloc (size_t dim, double epsabs, double epsrel)
{
  if (dim == 0 || dim > ODE_DIMMAX)
    return NULL;
  holent_ode *o = calloc (1, sizeof *o);
  if (o == NULL)
    return NULL;
  o->dim = dim;
  o->step = gsl_odeiv2_step_alloc (gsl_odeiv2_step_rk8pd, dim);
  o->ctrl = gsl_odeiv2_control_y_new (epsabs, epsrel);
  o->evol = gsl_odeiv2_evolve_alloc (dim);
  if (!o->step || !o->ctrl || !o->evol)
    {
      holent_ode_free (o);
      return NULL;
    }
  return o;
}

void
holent_ode_free (holent_ode *o)
{
  if (o == NULL)
    return;
  if (o->step)
    gsl_odeiv2_step_free (o->step);
  if (o->ctrl)
    gsl_odeiv2_control_free (o->ctrl);
  if (o->evol)
    gsl_odeiv2_evolve_free (o->evol);
  free (o);
}

void
holent_ode_reset (holent_ode *o)
{
  gsl_odeiv2_step_reset (o->step);
  gsl_odeiv2_evolve_reset (o->evol);
}

/* GSL wants a non-zero status from f to mean "bad point" */
typedef struct
{
  holent_ode_fn f;
  void *par;
} wrap;

static int
call (double x, const double y[], double dy[], void *p)
{
  const wrap *w = p;
  return w->f (x, y, dy, w->par) ? GSL_EBADFUNC : GSL_SUCCESS;
}

int
holent_ode_step (holent_ode *o, holent_ode_fn f, void *par, double *x,
                 double x1, double *h, double hmin, double y[])
{
  wrap w = { f, par };
  gsl_odeiv2_system sys = { call, NULL, o->dim, &w };
  for (;;)
    {
      int st = gsl_odeiv2_evolve_apply (o->evol, o->ctrl, o->step, &sys, x,
                                        x1, h, y);
      if (st == GSL_SUCCESS)
        return HOLENT_SUCCESS;
      /* GSL restored y: a trial step left the domain, try a shorter one */
      if (st == GSL_EBADFUNC && fabs (*h) > hmin && hmin > 0)
        {
          *h *= 0.1;
          continue;
        }
      return HOLENT_ENOCONV;
    }
}

int
holent_ode_fixed (holent_ode *o, holent_ode_fn f, void *par, double x,
                  double h, double y[])
{
  wrap w = { f, par };
  gsl_odeiv2_system sys = { call, NULL, o->dim, &w };
  double err[ODE_DIMMAX];
  gsl_odeiv2_step_reset (o->step);
  return gsl_odeiv2_step_apply (o->step, x, h, y, err, NULL, NULL, &sys)
             ? HOLENT_ENOCONV : HOLENT_SUCCESS;
}
