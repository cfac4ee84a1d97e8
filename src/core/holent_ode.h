/* holent_ode.h: the adaptive ODE stepper shared by the shooting solvers
 * (balls, Vaidya strips): GSL's rk8pd with a y-error control, owned by
 * the caller's workspace.  Internal to the core; no GSL types here.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_ODE_H
#define HOLENT_ODE_H

#include <stddef.h>
#include "holent.h"

/* dy/dx = f (x, y); nonzero return: y outside the domain of f.  */
typedef int (*holent_ode_fn) (double x, const double y[], double dy[],
                              void *par);

typedef struct holent_ode holent_ode;

/* A stepper for DIM components with absolute/relative tolerances.  */
holent_ode *holent_ode_alloc (size_t dim, double epsabs, double epsrel);
void holent_ode_free (holent_ode *o);

/* Start a new trajectory (forget the previous step sizes).  */
void holent_ode_reset (holent_ode *o);

/* One adaptive step of y' = f from *x towards x1 (step *h, updated).  A
 * trial step that leaves the domain of f is retried with h/10 while
 * |h| > hmin (hmin 0: no retry).  HOLENT_ENOCONV on failure.  */
int holent_ode_step (holent_ode *o, holent_ode_fn f, void *par, double *x,
                     double x1, double *h, double hmin, double y[]);

/* One fixed step of size h from x (no error control), y updated.  */
int holent_ode_fixed (holent_ode *o, holent_ode_fn f, void *par, double x,
                      double h, double y[]);

#endif /* HOLENT_ODE_H */
