/* Unit tests of holent_hd_vel: the Schwarzschild brane against the
 * closed forms of the literature, the charged brane against a golden-
 * section search and a finite-difference horizon slope written here from
 * the metric, v_E <= v_B, and the error paths.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include "holent_ctest.h"
#include "holent_hd_vel.h"

static double
fq (double z, double q)
{
  return 1 - (1 + q) * gsl_pow_int (z, 4) + q * gsl_pow_int (z, 6);
}

int
main (void)
{
  gsl_set_error_handler_off ();
  holent_hd_bg bg;
  double vE, vB, zm, zn;
  /* Schwarzschild brane: v_E = sqrt(d) (d-2)^(1/2-1/d)/(2(d-1))^(1-1/d)
     (Liu and Suh 2014, PRD 89, 066012; from memory) and v_B =
     sqrt(d/(2(d-1))) (Shenker and Stanford 2014; Roberts, Stanford and
     Susskind 2015; from memory) */
  for (int d = 3; d <= 8; d++)
    {
      HT_STATUS (holent_hd_bg_init (&bg, d, HOLENT_HD_BRANE, 1.7, 1, 1, 1e-3), HOLENT_SUCCESS);
      HT_STATUS (holent_hd_velocities (&bg, &vE, &zm, &vB, &zn), HOLENT_SUCCESS);
      HT_CLOSE (vE, sqrt (d) * pow (d - 2, 0.5 - 1.0 / d) / pow (2 * (d - 1), 1 - 1.0 / d), 1e-10);
      HT_CLOSE (vB, sqrt (d / (2.0 * (d - 1))), 1e-14);
      /* z_m^d = zh^d 2(d-1)/(d-2) (the maximum, derived by hand) */
      HT_CLOSE (zm, 1.7 * pow (2.0 * (d - 1) / (d - 2), 1.0 / d), 1e-6);
      HT_CHECK (vE <= vB, "vE %g > vB %g", vE, vB);
    }
  /* charged brane, tabulated beyond the horizon: v_E by golden-section
     search of -f z^(2-2d) on (1, inner horizon), v_B from U(r) = r^2
     f(1/r) (r = 1/z): v_B^2 = U'(r_h)/((d-1) 2 r_h), U' by central
     differences */
  for (int k = 0; k < 2; k++)
    {
      double q = k ? 1.5 : 0.5;
      enum { N = 3000 };
      static double z[N], f[N];
      for (int i = 0; i < N; i++)
        {
          z[i] = 1.6 * i / (N - 1);
          f[i] = fq (z[i], q);
        }
      HT_STATUS (holent_hd_bg_tabulated (&bg, 4, N, z, f, 0, 1, 1, 1e-3, NULL), HOLENT_SUCCESS);
      HT_STATUS (holent_hd_velocities (&bg, &vE, &zm, &vB, &zn), HOLENT_SUCCESS);
      double zi = sqrt ((1 + sqrt (1 + 4 * q)) / (2 * q)), a = 1, b = fmin (zi, 1.6);
      double g = 0.5 * (sqrt (5.0) - 1);
      for (int it = 0; it < 200; it++)
        {
          double c = b - g * (b - a), e = a + g * (b - a);
          if (-fq (c, q) / pow (c, 6) > -fq (e, q) / pow (e, 6))
            b = e;
          else
            a = c;
        }
      double zr = 0.5 * (a + b), ve = sqrt (-fq (zr, q)) / pow (zr, 3);
      HT_CLOSE (vE, ve, 1e-7);
      HT_CLOSE (zm, zr, 1e-4);
      double h = 1e-5, U1 = (1 + h) * (1 + h) * fq (1 / (1 + h), q);
      double U0 = (1 - h) * (1 - h) * fq (1 / (1 - h), q);
      HT_CLOSE (vB, sqrt ((U1 - U0) / (2 * h) / (3 * 2)), 1e-7);
      HT_CHECK (vE <= vB, "q = %g: vE %g > vB %g", q, vE, vB);
      holent_hd_bg_free (&bg);
    }
  /* a table that stops before the maximum: refused, with the depth */
  {
    enum { N = 400 };
    static double z[N], f[N];
    for (int i = 0; i < N; i++)
      {
        z[i] = 1.05 * i / (N - 1);
        f[i] = 1 - gsl_pow_int (z[i], 4);
      }
    HT_STATUS (holent_hd_bg_tabulated (&bg, 4, N, z, f, 0, 1, 1, 1e-3, NULL), HOLENT_SUCCESS);
    zn = 0;
    HT_STATUS (holent_hd_velocities (&bg, &vE, &zm, &vB, &zn), HOLENT_EDOM);
    HT_CLOSE (zn, 1.05, 1e-12);
    holent_hd_bg_free (&bg);
    /* extremal (q = 2): both vanish */
    for (int i = 0; i < N; i++)
      {
        z[i] = 1.3 * i / (N - 1);
        f[i] = fq (z[i], 2);
      }
    HT_STATUS (holent_hd_bg_tabulated (&bg, 4, N, z, f, 0, 1, 1, 1e-3, NULL), HOLENT_SUCCESS);
    HT_STATUS (holent_hd_velocities (&bg, &vE, &zm, &vB, NULL), HOLENT_SUCCESS);
    HT_CHECK (vE == 0 && vB == 0, "extremal %g %g", vE, vB);
    holent_hd_bg_free (&bg);
  }
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_VACUUM, 1, 1, 1, 1e-3), HOLENT_SUCCESS);
  HT_STATUS (holent_hd_velocities (&bg, &vE, &zm, &vB, NULL), HOLENT_EDOM);
  HT_STATUS (holent_hd_velocities (NULL, &vE, &zm, &vB, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_init (&bg, 5, HOLENT_HD_BRANE, 1, 1, 1, 1e-3), HOLENT_SUCCESS);
  HT_STATUS (holent_hd_velocities (&bg, NULL, NULL, NULL, NULL), HOLENT_SUCCESS);
  return HT_DONE ();
}
