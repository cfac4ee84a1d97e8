/* holent_root.h: the bracketing root finder shared by the core's modules
 * (GSL's Brent solver behind one loop).  Internal to the core; no GSL
 * types here.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_ROOT_H
#define HOLENT_ROOT_H

#include "holent.h"

/* The root of F (x, PAR) on [LO, HI], where F changes sign, by Brent's
 * method: stops when the bracket [a, b] meets
 * |b - a| < EPSABS + EPSREL min (|a|, |b|) (gsl_root_test_interval).
 * *X is the solver's last estimate.  HOLENT_ENOMEM, or HOLENT_ENOCONV when
 * GSL fails (e.g. no sign change) or after ITMAX iterations.  */
int holent_root_brent (double (*f) (double x, void *par), void *par,
                       double lo, double hi, double epsabs, double epsrel,
                       int itmax, double *x);

#endif
