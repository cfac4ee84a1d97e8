/* Unit tests of holent_ball: every error path, the hemisphere's
 * constants by hand and by GSL quadrature, first law and wall term.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <string.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_integration.h>
#include <gsl/gsl_sf_gamma.h>
#include "holent_ctest.h"
#include "holent_ball.h"

/* the wall of a wide strip or ball of the brane (zh = 1):
   u^(1-d) (sqrt((1 - u^(2d-2))/f(u)) - 1), f = 1 - u^d: the ratio
   a/b = (1 - u^(2d-2))/(1 - u^d) as geometric sums (no 0/0 at u = 1) and
   a - b = u^d (1 + ... + u^(d-3)) (no cancellation at u = 0) */
static double
wall_int (double u, void *p)
{
  int d = *(int *) p;
  double c = 0, b = 0;  /* c = u^(1-d) (a - b) = u + ... + u^(d-2) */
  for (int k = 0; k < d; k++)
    b += gsl_pow_int (u, k);
  for (int j = 1; j <= d - 2; j++)
    c += gsl_pow_int (u, j);
  double q = sqrt (1 + gsl_pow_int (u, d - 1) * c / b);
  return c / (b * (q + 1));
}

static double
hemi_int (double y, void *p)
{
  int d = *(int *) p;
  return pow (1 - y * y, 0.5 * (d - 3)) * gsl_pow_int (y, 1 - d);
}

static void
test_closed_forms (void)
{
  gsl_integration_workspace *iw = gsl_integration_workspace_alloc (500);
  /* hemisphere constants, by hand: C_3 = -1, C_4 = -1/4 - log(2)/2,
     C_5 = 2/3; C_6 (= 9/32 + 3 log(2)/8) by quadrature below.  */
  HT_CLOSE (holent_ball_vacuum_c (3), -1.0, 1e-14);
  HT_CLOSE (holent_ball_vacuum_c (4), -0.25 - 0.5 * M_LN2, 1e-14);
  HT_CLOSE (holent_ball_vacuum_c (5), 2.0 / 3.0, 1e-14);
  /* d = 6: integral_delta^1 y^-5 (1-y^2)^(3/2) dy, finite part, by QAG of
     the integrand minus its divergent terms y^-5 - (3/2) y^-3 + (3/8) y^-1 */
  {
    int d = 6;
    double r, e, c = 0;
    gsl_function F = { hemi_int, &d };
    HT_STATUS (gsl_integration_qags (&F, 0.5, 1, 0, 1e-13, 500, iw, &r, &e), 0);
    /* on [0, 0.5] by series of the remainder: sum_{k>=3} c_k y^(2k-5) */
    double ck = 1, a = 1.5, s = 0;
    for (int k = 0; k < 200; k++)
      {
        if (k >= 3)
          s += ck * pow (0.5, 2 * k - 4) / (2 * k - 4);
        ck *= -(a - k) / (k + 1);
      }
    /* divergent terms integrated over [0.5, 1] subtracted in closed form */
    c = 0.5 + r - (0.25 * (pow (0.5, -4) - 1) - 0.75 * (pow (0.5, -2) - 1)
             + 0.375 * log (2.0)) + s;
    HT_CLOSE (holent_ball_vacuum_c (6), c, 1e-11);
  }
  gsl_integration_workspace_free (iw);
}

static void
test_ball (void)
{
  holent_hd_bg bg;
  holent_ball_workspace *w = holent_ball_workspace_alloc ();
  size_t bad = 99;
  double reach, R[3] = { 0.05, 0.5, 1.2 }, S[3], fin[3], del[3], zt[3];
  HT_STATUS (holent_hd_bg_init (&bg, 5, HOLENT_HD_BRANE, 1, 1, 1, 1e-3), HOLENT_SUCCESS);
  HT_STATUS (holent_ball_entropy (NULL, w, 3, R, S, fin, del, zt, &bad, &reach), HOLENT_EINVAL);
  HT_STATUS (holent_ball_entropy (&bg, NULL, 3, R, S, fin, del, zt, &bad, &reach), HOLENT_EINVAL);
  HT_STATUS (holent_ball_entropy (&bg, w, 3, R, NULL, fin, del, zt, &bad, &reach), HOLENT_EINVAL);
  R[1] = 0;
  HT_STATUS (holent_ball_entropy (&bg, w, 3, R, S, fin, del, zt, &bad, &reach), HOLENT_EDOM);
  HT_CHECK (bad == 1, "bad = %zu", bad);
  R[1] = INFINITY;
  HT_STATUS (holent_ball_entropy (&bg, w, 3, R, S, fin, del, zt, &bad, &reach), HOLENT_EDOM);
  R[1] = 0.5;
  HT_STATUS (holent_ball_entropy (&bg, w, 0, R, S, fin, del, zt, &bad, &reach), HOLENT_SUCCESS);
  HT_STATUS (holent_ball_entropy (&bg, w, 3, R, S, fin, del, zt, &bad, &reach), HOLENT_SUCCESS);
  /* first law: delta = 2 pi Omega_3 R^5 e/24, e = 4/(16 pi), Omega_3 = 2 pi^2 */
  HT_CLOSE (del[0] / (2 * M_PI * 2 * M_PI * M_PI * pow (0.05, 5) * 4 / (16 * M_PI) / 24), 1.0, 1e-5);
  HT_CHECK (zt[0] < zt[1] && zt[1] < zt[2] && zt[2] < 1, "tip depths");
  HT_CHECK (reach > 1.2, "reach %g", reach);
  double big = 10 * reach;
  HT_STATUS (holent_ball_entropy (&bg, w, 1, &big, S, NULL, NULL, NULL, &bad, NULL), HOLENT_EDOM);

  /* wide balls of the brane (tips exponentially close to the horizon):
     delta = s Omega R^(d-1)/(d-1) + sigma Omega R^(d-2) + O(R^(d-3)), sigma
     the strip's wall term (doc/higher_dimensional.md), by GSL QAGS; the
     O(1/R) and O(1/R^2) terms removed by Richardson at R = 20, 30, 40 */
  for (int d = 3; d <= 6; d++)
    {
      holent_hd_bg bb;
      HT_STATUS (holent_hd_bg_init (&bb, d, HOLENT_HD_BRANE, 1, 1, 0.25, 1e-3), HOLENT_SUCCESS);
      double Rb[3] = { 20, 30, 40 }, Sb[3], db[3], zb[3], y[3], rb;
      HT_STATUS (holent_ball_entropy (&bb, w, 3, Rb, Sb, NULL, db, zb, &bad, &rb), HOLENT_SUCCESS);
      HT_CHECK (rb > 75, "d = %d: reach %g", d, rb);
      HT_CHECK (zb[0] <= 1 && 1 - zb[0] < 1e-20, "tip next to the horizon");
      gsl_integration_workspace *iw = gsl_integration_workspace_alloc (500);
      gsl_function F = { wall_int, &d };
      double sig, e;
      HT_STATUS (gsl_integration_qags (&F, 0, 1, 0, 1e-12, 500, iw, &sig, &e), 0);
      sig -= 1.0 / (d - 2);
      gsl_integration_workspace_free (iw);
      double om = 2 * pow (M_PI, 0.5 * (d - 1)) / gsl_sf_gamma (0.5 * (d - 1));
      for (int i = 0; i < 3; i++)
        y[i] = (db[i] - om * pow (Rb[i], d - 1) / (d - 1)) / (om * pow (Rb[i], d - 2));
      /* quadratic in 1/R through the three points, at 1/R = 0 */
      double x0 = 1 / Rb[0], x1 = 1 / Rb[1], x2 = 1 / Rb[2];
      double est = y[0] * x1 * x2 / ((x0 - x1) * (x0 - x2))
                   + y[1] * x0 * x2 / ((x1 - x0) * (x1 - x2))
                   + y[2] * x0 * x1 / ((x2 - x0) * (x2 - x1));
      HT_CHECK (fabs (est - sig) < 2e-3 * fabs (sig) + 2e-4, "d = %d: wall %.8g, Richardson %.8g", d, sig, est);
      HT_CHECK (fabs (y[2] - sig) < 0.03, "d = %d: wall %.8g at R = 40: %.8g", d, sig, y[2]);
    }

  /* vacuum hemisphere at the cutoff against GSL quadrature, for eps/R
     below and above 1/2, and zero beyond R */
  for (int d = 3; d <= 7; d++)
    {
      holent_hd_bg bv;
      HT_STATUS (holent_hd_bg_init (&bv, d, HOLENT_HD_VACUUM, 0, 1, 0.25, 0.3), HOLENT_SUCCESS);
      double Rv[3] = { 5.0, 0.45, 0.2 }, Sv[3], fv[3], dv[3], zv[3];
      HT_STATUS (holent_ball_entropy (&bv, w, 3, Rv, Sv, fv, dv, zv, &bad, NULL), HOLENT_SUCCESS);
      gsl_integration_workspace *iw = gsl_integration_workspace_alloc (500);
      gsl_function F = { hemi_int, &d };
      double om = 2 * pow (M_PI, 0.5 * (d - 1)) / gsl_sf_gamma (0.5 * (d - 1));
      for (int i = 0; i < 2; i++)
        {
          double r, e;
          HT_STATUS (gsl_integration_qags (&F, 0.3 / Rv[i], 1, 0, 1e-13, 500, iw, &r, &e), 0);
          HT_CLOSE (Sv[i], om * r, 1e-11);
          HT_CHECK (dv[i] == 0 && zv[i] == Rv[i], "vacuum delta, tip");
        }
      HT_CHECK (Sv[2] == 0, "inside the cutoff: %g", Sv[2]);
      HT_CLOSE (fv[0], om * holent_ball_vacuum_c (d), 1e-14);
      gsl_integration_workspace_free (iw);
    }
  holent_ball_workspace_free (w);
}



/* the poll: EINTR at the second radius */
static void
test_poll (void)
{
  holent_hd_bg bg;
  holent_ball_workspace *w = holent_ball_workspace_alloc ();
  int calls = 0;
  holent_poll poll = { ht_stop_second, &calls };
  double R[3] = { 0.2, 0.4, 0.6 }, S[3];
  size_t bad;
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_BRANE, 1, 1, 1, 1e-3), HOLENT_SUCCESS);
  holent_ball_workspace_set_poll (w, &poll);
  HT_STATUS (holent_ball_entropy (&bg, w, 3, R, S, NULL, NULL, NULL, &bad, NULL), HOLENT_EINTR);
  HT_CHECK (calls == 2, "calls %d", calls);
  holent_ball_workspace_set_poll (w, NULL);
  HT_STATUS (holent_ball_entropy (&bg, w, 3, R, S, NULL, NULL, NULL, &bad, NULL), HOLENT_SUCCESS);
  holent_ball_workspace_free (w);
}

int
main (void)
{
  gsl_set_error_handler_off ();
  test_poll ();
  test_closed_forms ();
  test_ball ();
  {
    /* d = 2: a ball is an interval; refused with the reason */
    holent_hd_bg b2;
    holent_ball_workspace *w = holent_ball_workspace_alloc ();
    holent_err e;
    double R = 1, S;
    HT_STATUS (holent_hd_bg_init (&b2, 2, HOLENT_HD_BRANE, 1, 1, 1, 1e-3), HOLENT_SUCCESS);
    HT_STATUS (holent_ball_check (&b2, &e), HOLENT_EDOM);
    HT_CHECK (e.arg == 0 && strstr (e.reason, "interval") != NULL, "%s", e.reason);
    HT_STATUS (holent_ball_entropy (&b2, w, 1, &R, &S, NULL, NULL, NULL, NULL, NULL), HOLENT_EDOM);
    HT_STATUS (holent_ball_check (NULL, &e), HOLENT_EINVAL);
    holent_ball_workspace_free (w);
  }
  return HT_DONE ();
}
