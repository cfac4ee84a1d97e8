/* Unit tests of holent_hd_bg: every error path of the constructors and
 * of f, and the evaluators of f against direct formulas.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <string.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_integration.h>
#include <gsl/gsl_sf_gamma.h>
#include "holent_ctest.h"
#include "holent_hd_bg.h"

static void
test_init_errors (void)
{
  holent_hd_bg bg;
  double z[6] = { 0, 0.2, 0.4, 0.6, 0.8, 1.0 }, f[6];
  size_t bad = 99;
  HT_STATUS (holent_hd_bg_init (NULL, 4, HOLENT_HD_VACUUM, 1, 1, 1, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_init (&bg, 1, HOLENT_HD_VACUUM, 1, 1, 1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_init (&bg, HOLENT_HD_DMAX + 1, HOLENT_HD_VACUUM, 1, 1, 1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_VACUUM, 1, NAN, 1, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_VACUUM, 1, 1, -1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_VACUUM, 1, 1, 1, INFINITY), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_BRANE, NAN, 1, 1, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_BRANE, 0, 1, 1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_TABULATED, 1, 1, 1, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_init (&bg, 4, (holent_hd_kind) 77, 1, 1, 1, 1e-3), HOLENT_EINVAL);

  for (int i = 0; i < 6; i++)
    f[i] = 1 - gsl_pow_int (z[i] / 0.9, 4);
  HT_STATUS (holent_hd_bg_tabulated (NULL, 4, 6, z, f, 0, 1, 1, 1e-3, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, NULL, f, 0, 1, 1, 1e-3, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_tabulated (&bg, 2, 6, z, f, 0, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, z, f, 0, 1, 1, 0, &bad), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 4, z, f, 0, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  z[3] = NAN;
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, z, f, 0, 1, 1, 1e-3, &bad), HOLENT_EINVAL);
  HT_CHECK (bad == 3, "bad = %zu", bad);
  z[3] = 0.3;  /* not increasing */
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, z, f, 0, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  HT_CHECK (bad == 3, "bad = %zu", bad);
  z[3] = 0.6;
  z[0] = 0.01;
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, z, f, 0, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  HT_CHECK (bad == 0, "bad = %zu", bad);
  z[0] = 0;
  f[0] = 1.5;
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, z, f, 0, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  f[0] = 1;

  /* f - 1 = O(z^3) only, for d = 4: refused */
  {
    enum { N = 60 };
    double zz[N], ff[N];
    for (int i = 0; i < N; i++)
      {
        zz[i] = 1.5 * i / (N - 1);
        ff[i] = 1 - gsl_pow_int (zz[i], 3);
      }
    HT_STATUS (holent_hd_bg_tabulated (&bg, 4, N, zz, ff, 0, 1, 1, 1e-3, &bad), HOLENT_EDOM);
    HT_CHECK (bad >= 1 && bad < N, "bad = %zu", bad);
    /* ... accepted for d = 3, horizon at the sample z = 1 exactly */
    HT_STATUS (holent_hd_bg_tabulated (&bg, 3, N, zz, ff, 0, 1, 1, 1e-3, &bad), HOLENT_SUCCESS);
    HT_CLOSE (bg.zh, 1.0, 1e-12);
    HT_CLOSE (bg.fp_h, -3.0, 1e-5);
    HT_CLOSE (bg.m, 1.0, 1e-7);
    double fv, fpv;
    HT_STATUS (holent_hd_bg_f (&bg, 0.5, &fv, &fpv), HOLENT_SUCCESS);
    HT_CLOSE (fv, 1 - 0.125, 1e-6);
    HT_STATUS (holent_hd_bg_f (&bg, 1.6, &fv, &fpv), HOLENT_EDOM);
    HT_STATUS (holent_hd_bg_f (&bg, -0.1, &fv, &fpv), HOLENT_EDOM);
    HT_STATUS (holent_hd_bg_f (&bg, NAN, &fv, &fpv), HOLENT_EINVAL);
    HT_STATUS (holent_hd_bg_f (NULL, 0.1, &fv, &fpv), HOLENT_EINVAL);
    holent_hd_bg_free (&bg);
    holent_hd_bg_free (&bg);  /* twice is harmless */
    holent_hd_bg_free (NULL);
  }
}

static void
test_evaluators (void)
{
  /* the brane's f next to its horizon from zh - z (common practice:
     1 - x^d = (1 - x)(1 + ... + x^(d-1)) against long double) */
  holent_hd_bg bg;
  HT_STATUS (holent_hd_bg_init (&bg, 5, HOLENT_HD_BRANE, 2, 1, 1, 1e-3), HOLENT_SUCCESS);
  HT_CHECK (bg.n == 0 && bg.tz == NULL, "analytic: no interpolant");
  HT_CLOSE (bg.m, 1.0 / 32, 1e-15);
  HT_CLOSE (bg.fp_h, -2.5, 1e-15);
  double w = 1e-9, z = 2 - w;
  long double x = (long double) z / 2;
  long double fl = 1 - x * x * x * x * x;
  HT_CLOSE (holent_hd_bg_fval (&bg, z, w) / (double) fl, 1.0, 1e-6);
  HT_CLOSE (holent_hd_bg_fval (&bg, z, w) / (2.5 * w), 1.0, 1e-8);  /* -f'(zh) w */
  HT_CLOSE (holent_hd_bg_omf (&bg, 1e-3), pow (5e-4, 5), 1e-15);
  HT_CLOSE (holent_hd_bg_mcoef (&bg, 0.7), 1.0 / 32, 1e-15);
  double f, fp;
  HT_STATUS (holent_hd_bg_f (&bg, 1.0, &f, &fp), HOLENT_SUCCESS);
  HT_CLOSE (f, 1 - 1.0 / 32, 1e-15);
  HT_CLOSE (fp, -5.0 / 32, 1e-15);
  HT_STATUS (holent_hd_bg_f (&bg, 1.0, &f, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_hd_bg_f (&bg, 1.0, NULL, NULL), HOLENT_EINVAL);
  holent_hd_bg_free (&bg);  /* analytic: nothing to release */
  HT_STATUS (holent_hd_bg_init (&bg, 3, HOLENT_HD_VACUUM, 0, 1, 1, 1e-3), HOLENT_SUCCESS);
  HT_CHECK (isinf (bg.zh) && bg.m == 0, "vacuum");
  HT_CLOSE (holent_hd_bg_fval (&bg, 5, 0), 1.0, 0);
}

/* Tabulated data: the charged brane f = 1 - (1+q) z^4 + q z^6 (zh = 1,
   f'(1) = 2q - 4, m = 1 + q; derived from f), rebuilt from its spline,
   perturbed, extremal at q = 2, a table ending at the horizon.  */
static void
test_tabulated (void)
{
  enum { N = 600 };
  static double z[N], f[N];
  holent_hd_bg bg, br, bp;
  size_t bad = 99;
  for (int qi = 0; qi < 2; qi++)
    {
      double q = qi ? 2.0 : 1.5;
      for (int i = 0; i < N; i++)
        {
          z[i] = 1.2 * i / (N - 1);
          f[i] = 1 - (1 + q) * gsl_pow_int (z[i], 4) + q * gsl_pow_int (z[i], 6);
        }
      HT_STATUS (holent_hd_bg_tabulated (&bg, 4, N, z, f, 0, 1, 1, 1e-3, &bad), HOLENT_SUCCESS);
      HT_CLOSE (bg.zh, 1.0, 1e-9);
      HT_CLOSE (bg.m, 1 + q, 1e-8);
      HT_CHECK (fabs (bg.m - (1 + q)) <= 3 * bg.m_err, "m error %g", bg.m_err);
      HT_CHECK (bg.extremal == (q == 2.0), "extremal %d at q = %g", bg.extremal, q);
      HT_CHECK (fabs (bg.T - fabs (2 * q - 4) / (4 * M_PI)) <= bg.T_err + 1e-15, "T %g", bg.T);
      HT_CHECK (bg.noise > 0 && bg.noise < 1e-9, "noise %g", bg.noise);
      /* rebuilt from its spline: the same background, no refit */
      HT_STATUS (holent_hd_bg_spline (&br, 4, bg.n, bg.tz, bg.tg, bg.tg2, bg.noise, 1, 1, 1e-3, &bad), HOLENT_SUCCESS);
      HT_CHECK (br.zh == bg.zh && br.fp_h == bg.fp_h && br.m == bg.m && br.extremal == bg.extremal, "rebuilt");
      /* perturbed by the data's accuracy: the horizon moves a little */
      HT_STATUS (holent_hd_bg_perturbed (&bg, &bp), HOLENT_SUCCESS);
      HT_CHECK (fabs (bp.zh - bg.zh) < 1e-4 && bp.m > bg.m, "perturbed zh %g m %g", bp.zh, bp.m);
      holent_hd_bg_free (&bp);
      holent_hd_bg_free (&br);
      holent_hd_bg_free (&bg);
    }
  /* the table ends at the horizon: f = 1 - z^4 exp(z^2 - 1), f'(1) = -6 */
  for (int i = 0; i < N; i++)
    {
      z[i] = (double) i / (N - 1);
      f[i] = 1 - gsl_pow_int (z[i], 4) * exp (z[i] * z[i] - 1);
    }
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, N, z, f, 0, 1, 1, 1e-3, &bad), HOLENT_SUCCESS);
  HT_CHECK (bg.zh == 1.0, "zh %g", bg.zh);
  HT_CLOSE (bg.fp_h, -6.0, 1e-6);
  holent_hd_bg_free (&bg);
  /* errors: a low power, too few samples, spline arrays */
  for (int i = 0; i < N; i++)
    f[i] = 1 - 1e-2 * z[i] * z[i] - gsl_pow_int (z[i], 4);
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, N, z, f, 0, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  HT_CHECK (bg.why == HOLENT_HD_WHY_BOUNDARY && bad > 0 && bad < N, "why %d bad %zu", bg.why, bad);
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, z, f, 0, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  HT_CHECK (bg.why == HOLENT_HD_WHY_FEW, "why %d", bg.why);
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, N, z, f, NAN, 1, 1, 1e-3, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_spline (&bg, 4, N, z, f, NULL, 0, 1, 1, 1e-3, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_spline (&bg, 4, N, z, f, f, -1, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_perturbed (NULL, &bg), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_init (&br, 4, HOLENT_HD_BRANE, 1, 1, 1, 1e-3), HOLENT_SUCCESS);
  HT_STATUS (holent_hd_bg_perturbed (&br, &bg), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_init (&br, 4, HOLENT_HD_BRANE, 1e-300, 1, 1, 1e-3), HOLENT_EDOM);
  HT_CHECK (br.why == HOLENT_HD_WHY_RANGE, "range");
  double zh;
  HT_STATUS (holent_hd_brane_zh (4, 1 / M_PI, &zh), HOLENT_SUCCESS);
  HT_CLOSE (zh, 1.0, 1e-15);
  HT_STATUS (holent_hd_brane_zh (4, -1, &zh), HOLENT_EDOM);
  HT_STATUS (holent_hd_brane_zh (4, NAN, &zh), HOLENT_EINVAL);
}

/* the dimension check and the reasons of a refused table */
static void
test_reasons (void)
{
  holent_err e;
  int d = 0;
  HT_STATUS (holent_hd_dimension (4, &d, &e), HOLENT_SUCCESS);
  HT_CHECK (d == 4, "d = %d", d);
  HT_STATUS (holent_hd_dimension (1e300, &d, &e), HOLENT_EDOM);
  HT_CHECK (e.arg == 0 && strstr (e.reason, "integer from 2") != NULL, "%s", e.reason);
  HT_STATUS (holent_hd_dimension (2.5, &d, NULL), HOLENT_EDOM);
  HT_STATUS (holent_hd_dimension (NAN, &d, &e), HOLENT_ENAN);
  HT_STATUS (holent_hd_dimension (4, NULL, &e), HOLENT_EINVAL);
  /* f = 1 - z^3 in d = 4: not O(z^4), the reason names z^4 and a sample */
  enum { N = 50 };
  double z[N], f[N];
  size_t bad = HOLENT_NOINDEX;
  holent_hd_bg bg;
  for (int i = 0; i < N; i++)
    {
      z[i] = i / (N - 1.0);
      f[i] = 1 - z[i] * z[i] * z[i];
    }
  int st = holent_hd_bg_tabulated (&bg, 4, N, z, f, 0, 1, 1, 1e-3, &bad);
  HT_STATUS (st, HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_explain (&bg, 4, st, bad, z, &e), HOLENT_EDOM);
  HT_CHECK (strstr (e.reason, "like z^4") != NULL && e.status == HOLENT_EDOM, "%s", e.reason);
  f[0] = 2;
  st = holent_hd_bg_tabulated (&bg, 4, N, z, f, 0, 1, 1, 1e-3, &bad);
  holent_hd_bg_explain (&bg, 4, st, bad, z, &e);
  HT_CHECK (strstr (e.reason, "1 at z = 0") != NULL, "%s", e.reason);
  z[3] = z[2];
  st = holent_hd_bg_tabulated (&bg, 4, N, z, f, 0, 1, 1, 1e-3, &bad);
  holent_hd_bg_explain (&bg, 4, st, bad, z, &e);
  HT_CHECK (strstr (e.reason, "sample 4") != NULL, "%s", e.reason);
  HT_STATUS (holent_hd_bg_explain (&bg, 4, HOLENT_SUCCESS, 0, z, &e), HOLENT_SUCCESS);
  HT_CHECK (e.status == HOLENT_SUCCESS, "cleared");
}

int
main (void)
{
  gsl_set_error_handler_off ();
  test_reasons ();
  test_init_errors ();
  test_evaluators ();
  test_tabulated ();
  return HT_DONE ();
}
