/* Unit tests of holent_ode, the shared rk8pd stepper: the harmonic
 * oscillator against cos/sin (closed form), the retry of a step that
 * leaves the domain of f (y' = -1/(2 y), y = sqrt(1 - x) ending at x = 1),
 * fixed steps against the closed form, and the error paths.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <gsl/gsl_errno.h>
#include "holent_ctest.h"
#include "holent_ode.h"

static int
osc (double x, const double y[], double dy[], void *p)
{
  (void) x;
  (void) p;
  dy[0] = y[1];
  dy[1] = -y[0];
  return 0;
}

/* y' = -1/(2 y): y = sqrt(1 - x); undefined for y <= 0 */
static int
root (double x, const double y[], double dy[], void *p)
{
  (void) x;
  int *bad = p;
  if (!(y[0] > 0))
    {
      ++*bad;
      return 1;
    }
  dy[0] = -0.5 / y[0];
  return 0;
}

int
main (void)
{
  gsl_set_error_handler_off ();
  HT_CHECK (holent_ode_alloc (0, 1e-12, 1e-12) == NULL, "dim 0");
  HT_CHECK (holent_ode_alloc (100, 1e-12, 1e-12) == NULL, "dim too large");
  holent_ode_free (NULL);
  holent_ode *o = holent_ode_alloc (2, 1e-14, 1e-12);
  HT_CHECK (o != NULL, "alloc");
  /* oscillator over 10 periods */
  double x = 0, h = 1e-3, y[2] = { 1, 0 }, x1 = 20 * M_PI;
  holent_ode_reset (o);
  for (int k = 0; x < x1 && k < 100000; k++)
    HT_STATUS (holent_ode_step (o, osc, NULL, &x, x1, &h, 0, y), HOLENT_SUCCESS);
  HT_CLOSE (x, x1, 1e-15);
  HT_CHECK (fabs (y[0] - 1) < 1e-9 && fabs (y[1]) < 1e-9, "y = %g %g", y[0], y[1]);
  /* one fixed step: error O(h^9) */
  double yf[2] = { 1, 0 };
  HT_STATUS (holent_ode_fixed (o, osc, NULL, 0, 0.1, yf), HOLENT_SUCCESS);
  HT_CLOSE (yf[0], cos (0.1), 1e-13);
  HT_CLOSE (yf[1], -sin (0.1), 1e-12);
  holent_ode_free (o);
  /* a step beyond the end of the domain is retried shorter */
  holent_ode *r = holent_ode_alloc (1, 1e-14, 1e-12);
  int bad = 0;
  double xr = 0, hr = 0.5, yr[1] = { 1 };
  holent_ode_reset (r);
  int st = HOLENT_SUCCESS;
  for (int k = 0; xr < 0.999 && k < 10000 && !st; k++)
    st = holent_ode_step (r, root, &bad, &xr, 2, &hr, 1e-12, yr);
  HT_STATUS (st, HOLENT_SUCCESS);
  HT_CHECK (xr >= 0.999 && xr < 1, "x = %.17g", xr);
  HT_CLOSE (yr[0], sqrt (1 - xr), 1e-8);
  /* without retry the same step fails */
  xr = 0.9;  yr[0] = sqrt (0.1);  hr = 0.5;
  holent_ode_reset (r);
  HT_STATUS (holent_ode_step (r, root, &bad, &xr, 2, &hr, 0, yr), HOLENT_ENOCONV);
  HT_CHECK (bad > 0, "the domain was left");
  holent_ode_free (r);
  return HT_DONE ();
}
