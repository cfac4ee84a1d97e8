/* SPDX-License-Identifier: GPL-3.0-or-later
 * Unit tests of holent_root_brent: roots known in closed form (sqrt 2 of
 * x^2 - 2; pi of sin on [3, 4]; ln 3 of e^x - 3) to the requested
 * tolerance, a bracket without a sign change and a too small iteration
 * budget refused with HOLENT_ENOCONV (common practice).  */
#include <math.h>
#include <gsl/gsl_errno.h>
#include "holent_ctest.h"
#include "holent_root.h"

static double sq2 (double x, void *p) { (void) p; return x * x - 2.0; }
static double sn (double x, void *p) { (void) p; return sin (x); }
static double ex3 (double x, void *p) { (void) p; return exp (x) - 3.0; }

int
main (void)
{
  double x;
  gsl_set_error_handler_off ();   /* as the gateways do */
  HT_STATUS (holent_root_brent (sq2, NULL, 0.0, 2.0, 0.0, 4e-16, 200, &x),
             HOLENT_SUCCESS);
  HT_CLOSE (x, sqrt (2.0), 8e-16);
  HT_STATUS (holent_root_brent (sn, NULL, 3.0, 4.0, 0.0, 4e-16, 200, &x),
             HOLENT_SUCCESS);
  HT_CLOSE (x, M_PI, 8e-16);
  HT_STATUS (holent_root_brent (ex3, NULL, 0.0, 5.0, 1e-12, 0.0, 200, &x),
             HOLENT_SUCCESS);
  HT_CLOSE (x, log (3.0), 2e-12);
  HT_STATUS (holent_root_brent (sq2, NULL, 2.0, 3.0, 0.0, 4e-16, 200, &x),
             HOLENT_ENOCONV);
  HT_STATUS (holent_root_brent (sq2, NULL, 0.0, 2.0, 0.0, 4e-16, 2, &x),
             HOLENT_ENOCONV);
  return HT_DONE ();
}
