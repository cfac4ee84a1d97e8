/* Unit tests of holent_causal.  Independent check: the angle and time a
 * null ray of the metric -f dt^2 + dr^2/f + r^2 dphi^2 sweeps from the
 * boundary to its turning point and back, by GSL quadrature (QAGS):
 *   dphi = 2 int J dr/(r^2 s),  dt = 2 int E dr/(f s),
 *   s = sqrt(E^2 - J^2 f/r^2),
 * for f = r^2 + alpha^2 (conical defect; alpha = 1 global AdS), and the
 * absence of a turning point outside the horizon for f = r^2 - R^2 (BTZ).
 * Gao and Wald 2000 (Class. Quant. Grav. 17, 4999): never earlier than
 * the boundary light.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_integration.h>
#include <gsl/gsl_math.h>
#include "holent_ctest.h"
#include "holent_causal.h"

typedef struct
{
  double a2, J, r0;
  int which;  /* 0: dphi integrand, 1: dt integrand */
} ray;

/* Integrands in u = r0/r on (0, 1] (E = 1): dphi = 2 int J du/(r0 s),
   dt = 2 int r0 du/((r0^2 + a2 u^2) s); QAGS takes the 1/sqrt at u = 1. */
static double
integrand (double u, void *p)
{
  const ray *q = p;
  double s2 = 1.0 - q->J * q->J * (1.0 + q->a2 * u * u / (q->r0 * q->r0));
  double s = sqrt (fmax (s2, 1e-300));
  return q->which == 0 ? 2 * q->J / (q->r0 * s)
                       : 2 * q->r0 / ((q->r0 * q->r0 + q->a2 * u * u) * s);
}

static void
sweep (double alpha, double J, double *dphi, double *dt)
{
  /* Turning point: 1 = J^2 (1 + a2/r0^2) -> r0 = J alpha/sqrt(1 - J^2).  */
  ray q = { alpha * alpha, J, J * alpha / sqrt (1 - J * J), 0 };
  gsl_integration_workspace *w = gsl_integration_workspace_alloc (1000);
  gsl_function F = { integrand, &q };
  double err;
  gsl_integration_qags (&F, 0.0, 1.0, 1e-13, 1e-12, 1000, w, dphi, &err);
  q.which = 1;
  gsl_integration_qags (&F, 0.0, 1.0, 1e-13, 1e-12, 1000, w, dt, &err);
  gsl_integration_workspace_free (w);
}

int
main (void)
{
  gsl_set_error_handler_off ();
  holent_geo_bg bg;
  double tb, tl, L = 5.0;
  /* Rays of several J in the defect sweep pi/alpha in angle and in time
     (bulk units): the closed form's landing point and time.  */
  for (double alpha = 0.4; alpha <= 1.0; alpha += 0.3)
    for (double J = 0.2; J < 1.0; J += 0.35)
      {
        double dphi, dt;
        sweep (alpha, J, &dphi, &dt);
        HT_CLOSE (dphi, M_PI / alpha, 1e-9);
        HT_CLOSE (dt, M_PI / alpha, 1e-9);
        HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_CONICAL_DEFECT, L, 1e-3, 1, 1, alpha, 1), HOLENT_SUCCESS);
        double x2 = 0.3 + dphi * L / (2 * M_PI);  /* bulk angle -> x */
        HT_STATUS (holent_causal_times (&bg, 0.3, x2, 1e-9, &tb, &tl), HOLENT_SUCCESS);
        HT_CLOSE (tb, dt * L / (2 * M_PI), 1e-9);
        HT_CHECK (tb >= tl, "bulk beats boundary");
        HT_STATUS (holent_causal_times (&bg, 0.3, 0.3 - dphi * L / (2 * M_PI), 1e-9, &tb, &tl), HOLENT_SUCCESS);
        HT_CLOSE (tb, dt * L / (2 * M_PI), 1e-9);
      }
  /* Global AdS: the antipode at L/2 and nothing else.  */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_GLOBAL_ADS, L, 1e-3, 1, 1, 1, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_causal_times (&bg, 1.0, 3.5, 0, &tb, &tl), HOLENT_SUCCESS);
  HT_CLOSE (tb, 2.5, 1e-15);
  HT_CLOSE (tl, 2.5, 1e-15);
  HT_STATUS (holent_causal_times (&bg, 1.0, 3.4, 1e-9, &tb, &tl), HOLENT_SUCCESS);
  HT_CHECK (isinf (tb), "only the antipode");
  HT_CLOSE (tl, 2.4, 1e-14);
  /* BTZ: E^2 - J^2 (r^2 - R^2)/r^2 has a zero outside the horizon only
     for J > E, and then the ray lives at r below it: never back.  */
  double R = 1.3;
  for (double J = 0.5; J < 3; J += 0.5)
    {
      double r = 1e6, s2 = 1 - J * J * (r * r - R * R) / (r * r);
      HT_CHECK (J <= 1 || s2 < 0, "a ray from the boundary at J %g", J);
    }
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_BTZ, L, 1e-3, 1, 1, 1, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_causal_times (&bg, 0, 2.5, 1, &tb, &tl), HOLENT_SUCCESS);
  HT_CHECK (isinf (tb), "BTZ: Inf");
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, L, 1e-3, 1, 1, 1, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_causal_times (&bg, 0, -2.5, 0, &tb, &tl), HOLENT_SUCCESS);
  HT_CHECK (isinf (tb) && tl == 2.5, "line");
  HT_STATUS (holent_causal_times (&bg, NAN, 1, 0, &tb, &tl), HOLENT_EINVAL);
  HT_STATUS (holent_causal_times (&bg, 0, 1, INFINITY, &tb, &tl), HOLENT_EINVAL);
  /* a negative tol: the default 1e-9 L */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_GLOBAL_ADS, L, 1e-3, 1, 1, 1, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_causal_times (&bg, 1.0, 3.5 + 1e-9 * L, -1, &tb, &tl), HOLENT_SUCCESS);
  HT_CLOSE (tb, 2.5, 1e-15);
  HT_STATUS (holent_causal_times (&bg, 1.0, 3.5 + 2e-9 * L, -1, &tb, &tl), HOLENT_SUCCESS);
  HT_CHECK (isinf (tb), "beyond the default tol");
  HT_STATUS (holent_causal_times (NULL, 0, 1, 0, &tb, &tl), HOLENT_EINVAL);
  return HT_DONE ();
}
