/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Unit tests of holent_geo and holent_interval: every error path, and the
 * closed forms against GSL's special functions (gsl_sf_lnsinh, gsl_sf_sin)
 * as an independent evaluation.  */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_sf_trig.h>
#include <gsl/gsl_errno.h>
#include "holent_ctest.h"
#include "holent_geo.h"
#include "holent_interval.h"

static void
test_init_errors (void)
{
  holent_geo_bg bg;
  HT_STATUS (holent_geo_bg_init (NULL, HOLENT_BULK_POINCARE, 1, 1e-3, 1, 1, 1, 1), HOLENT_EINVAL);
  HT_STATUS (holent_geo_bg_init (&bg, (holent_bulk) 99, 1, 1e-3, 1, 1, 1, 1), HOLENT_EINVAL);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 1, NAN, 1, 1, 1, 1), HOLENT_EINVAL);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 1, 0.0, 1, 1, 1, 1), HOLENT_EDOM);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 1, 1e-3, 1, 1, 1, -2), HOLENT_EDOM);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 1, INFINITY, 1, 1, 1, 1), HOLENT_EDOM);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_GLOBAL_ADS, NAN, 1e-3, 1, 1, 1, 1), HOLENT_EINVAL);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_GLOBAL_ADS, -1, 1e-3, 1, 1, 1, 1), HOLENT_EDOM);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_BTZ, 1, 1e-3, 0.0, 1, 1, 1), HOLENT_EDOM);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_ROTATING_BTZ, 1, 1e-3, 1, NAN, 1, 1), HOLENT_EINVAL);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_PLANAR_ROTATING_BTZ, 1, 1e-3, 1, INFINITY, 1, 1), HOLENT_EDOM);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_CONICAL_DEFECT, 1, 1e-3, 1, 1, 0.0, 1), HOLENT_EDOM);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_CONICAL_DEFECT, 1, 1e-3, 1, 1, 1.5, 1), HOLENT_EDOM);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_CONICAL_DEFECT, 1, 1e-3, 1, 1, NAN, 1), HOLENT_EINVAL);
}

static void
test_lengths (void)
{
  holent_geo_bg bg;
  double len, eps = 1e-4, L = 7.0;
  size_t bad = 0;

  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 0, eps, 0, 0, 0, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_geo_arc_length (&bg, 2.0, &len), HOLENT_SUCCESS);
  HT_CLOSE (len, 2 * log (2.0 / eps), 1e-14);
  HT_STATUS (holent_geo_arc_length (&bg, 0.0, &len), HOLENT_EDOM);
  HT_STATUS (holent_geo_arc_length (&bg, NAN, &len), HOLENT_EINVAL);
  HT_STATUS (holent_geo_arc_length (&bg, 1.0, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_geo_arc_length (NULL, 1.0, &len), HOLENT_EINVAL);

  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_GLOBAL_ADS, L, eps, 0, 0, 0, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_geo_arc_length (&bg, 2.0, &len), HOLENT_SUCCESS);
  HT_CLOSE (len, 2 * log (L / (M_PI * eps) * gsl_sf_sin (M_PI * 2.0 / L)), 1e-14);
  HT_STATUS (holent_geo_arc_length (&bg, L, &len), HOLENT_EDOM);

  /* BTZ: compare with GSL's log(sinh) */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_ROTATING_BTZ, L, eps, 0.3, 1.7, 0, 1), HOLENT_SUCCESS);
  for (double l = 0.01; l <= L; l *= 1.7)
    {
      HT_STATUS (holent_geo_arc_length (&bg, l, &len), HOLENT_SUCCESS);
      HT_CLOSE (len, log (0.3 * 1.7 / (M_PI * M_PI * eps * eps))
                         + gsl_sf_lnsinh (M_PI * l / 0.3) + gsl_sf_lnsinh (M_PI * l / 1.7),
                1e-13);
    }
  HT_STATUS (holent_geo_arc_length (&bg, L, &len), HOLENT_SUCCESS);
  HT_STATUS (holent_geo_arc_length (&bg, L * 1.01, &len), HOLENT_EDOM);
  HT_CLOSE (bg.S_BH, M_PI / 6.0 * L * (1 / 0.3 + 1 / 1.7), 1e-14);

  for (double x = 1e-6; x < 800; x *= 1.9)
    HT_CLOSE (holent_geo_lnsinh (x), gsl_sf_lnsinh (x), 1e-13);

  /* conical defect: the capped form beyond alpha theta = pi */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_CONICAL_DEFECT, 2 * M_PI, eps, 0, 0, 0.8, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_geo_arc_length (&bg, 2.0, &len), HOLENT_SUCCESS);
  HT_CLOSE (len, 2 * log (2 / (0.8 * eps) * sin (0.8 * 2.0 / 2)), 1e-14);
  HT_STATUS (holent_geo_arc_length (&bg, 6.0, &len), HOLENT_SUCCESS);
  HT_CLOSE (len, 2 * log (2 / (0.8 * eps)), 1e-14);

  /* alpha = 1 is the vacuum: no cap beyond half the circle */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_CONICAL_DEFECT, 2 * M_PI, eps, 0, 0, 1.0, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_geo_arc_length (&bg, 5.0, &len), HOLENT_SUCCESS);
  HT_CLOSE (len, 2 * log (2 / eps * sin (2.5)), 1e-14);
  HT_STATUS (holent_geo_arc_length (&bg, 2 * M_PI, &len), HOLENT_EDOM);

  /* vector form and its bad index */
  double arcs[4] = { 1, 2, -1, 3 }, out[4];
  HT_STATUS (holent_geo_arc_lengths (&bg, 4, arcs, out, &bad), HOLENT_EDOM);
  HT_CHECK (bad == 2, "bad index %zu", bad);
  arcs[2] = NAN;
  HT_STATUS (holent_geo_arc_lengths (&bg, 4, arcs, out, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_geo_arc_lengths (&bg, 4, NULL, out, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_geo_arc_lengths (&bg, 0, NULL, NULL, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_geo_arc_lengths (NULL, 0, NULL, NULL, NULL), HOLENT_EINVAL);

  /* point lengths and homotopy classes */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_BTZ, L, eps, 1.0, 1.0, 0, 1), HOLENT_SUCCESS);
  double x1[3] = { 0.5, 0.5, 6.5 }, x2[3] = { 1.5, 1.5 + 3 * L, 1.0 }, l3[3];
  HT_STATUS (holent_geo_point_lengths (&bg, 3, x1, x2, HOLENT_GEO_POSITIVE, l3, &bad), HOLENT_SUCCESS);
  HT_CLOSE (l3[0], 2 * log (1 / (M_PI * eps)) + 2 * gsl_sf_lnsinh (M_PI), 1e-12);
  HT_CLOSE (l3[1], l3[0], 1e-12);
  HT_CLOSE (l3[2], 2 * log (1 / (M_PI * eps)) + 2 * gsl_sf_lnsinh (M_PI * 1.5), 1e-12);
  HT_STATUS (holent_geo_point_lengths (&bg, 3, x1, x2, HOLENT_GEO_NEGATIVE, l3, &bad), HOLENT_SUCCESS);
  HT_CLOSE (l3[0], 2 * log (1 / (M_PI * eps)) + 2 * gsl_sf_lnsinh (M_PI * (L - 1)), 1e-12);
  HT_STATUS (holent_geo_point_lengths (&bg, 3, x1, x2, HOLENT_GEO_SHORTER, l3, &bad), HOLENT_SUCCESS);
  HT_CLOSE (l3[2], 2 * log (1 / (M_PI * eps)) + 2 * gsl_sf_lnsinh (M_PI * 1.5), 1e-12);
  HT_STATUS (holent_geo_point_lengths (&bg, 3, x1, x2, (holent_geo_class) 7, l3, &bad), HOLENT_EINVAL);
  x2[1] = 0.5 + L;
  HT_STATUS (holent_geo_point_lengths (&bg, 3, x1, x2, HOLENT_GEO_SHORTER, l3, &bad), HOLENT_ECOINCIDE);
  HT_CHECK (bad == 1, "bad index %zu", bad);
  x2[1] = INFINITY;
  HT_STATUS (holent_geo_point_lengths (&bg, 3, x1, x2, HOLENT_GEO_SHORTER, l3, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_geo_point_lengths (&bg, 3, NULL, x2, HOLENT_GEO_SHORTER, l3, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 0, eps, 0, 0, 0, 1), HOLENT_SUCCESS);
  x2[1] = 0.5;
  HT_STATUS (holent_geo_point_lengths (&bg, 3, x1, x2, HOLENT_GEO_SHORTER, l3, &bad), HOLENT_ECOINCIDE);
}

static void
test_interval (void)
{
  holent_geo_bg bg;
  const double L = 2 * M_PI, eps = 1e-6, beta = 0.5, c = 3.0;
  double l[5] = { 0.2, 1.0, 3.0, 6.0, L }, S[5];
  unsigned char br[5];
  size_t bad, nshort = 99;
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_BTZ, L, eps, beta, beta, 0, c), HOLENT_SUCCESS);
  HT_STATUS (holent_interval_entropy (&bg, 5, l, S, br, &bad, &nshort), HOLENT_SUCCESS);
  HT_CHECK (nshort == 0, "nshort %zu", nshort);
  for (int i = 0; i < 4; i++)
    {
      double d = c / 6 * (2 * log (beta / (M_PI * eps)) + 2 * gsl_sf_lnsinh (M_PI * l[i] / beta));
      double e = c / 6 * (2 * log (beta / (M_PI * eps)) + 2 * gsl_sf_lnsinh (M_PI * (L - l[i]) / beta))
                 + M_PI * c / 3 * L / beta;
      HT_CLOSE (S[i], d < e ? d : e, 1e-13);
      HT_CHECK (br[i] == (e < d), "branch %d", i);
    }
  HT_CLOSE (S[4], M_PI * c / 3 * L / beta, 1e-14);
  HT_CHECK (br[4] == 1, "whole circle branch");
  l[2] = L * 1.5;
  HT_STATUS (holent_interval_entropy (&bg, 5, l, S, br, &bad, NULL), HOLENT_EDOM);
  HT_CHECK (bad == 2, "bad %zu", bad);
  l[2] = NAN;
  HT_STATUS (holent_interval_entropy (&bg, 5, l, S, NULL, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_interval_entropy (&bg, 5, NULL, S, NULL, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_interval_entropy (NULL, 0, NULL, NULL, NULL, NULL, NULL), HOLENT_EINVAL);
  l[2] = 1.5 * eps;
  HT_STATUS (holent_interval_entropy (&bg, 5, l, S, NULL, NULL, &nshort), HOLENT_SUCCESS);
  HT_CHECK (nshort == 1, "nshort %zu", nshort);

  /* a large array takes the OpenMP path */
  size_t n = 100000;
  double *ll = malloc (n * sizeof *ll), *ss = malloc (n * sizeof *ss);
  HT_CHECK (ll && ss, "malloc");
  if (ll && ss)
    {
      for (size_t i = 0; i < n; i++)
        ll[i] = L * (i + 1.0) / n;
      HT_STATUS (holent_interval_entropy (&bg, n, ll, ss, NULL, NULL, NULL), HOLENT_SUCCESS);
      HT_CLOSE (ss[n - 1], bg.S_BH, 1e-14);
      HT_CHECK (ss[n / 2] > 0, "positive");
    }
  free (ll);
  free (ss);
}

/* Derived constants that overflow, or cutoff-scale arcs that would be
   subnormal, are refused (EDOM) instead of giving Inf or digit-less
   lengths; large but representable ratios are computed in logs and
   agree with the closed form (Calabrese and Cardy 2004), 2 log((L/(pi
   eps)) sin(pi l/L)), taken here as logs of the pieces.  */
static void
test_init_range (void)
{
  holent_geo_bg bg;
  double len;
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_GLOBAL_ADS, 1e308, 1e-320, 0, 0, 1, 1), HOLENT_EDOM);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_GLOBAL_ADS, 2 * M_PI, 1e-320, 0, 0, 1, 1), HOLENT_EDOM);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_CONICAL_DEFECT, 1e308, 1e-3, 0, 0, 0.5, 1), HOLENT_EDOM);
  /* BTZ: S_BH = (pi c/6)(2/beta) L overflows */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_BTZ, 1e300, 1e-300, 1e-20, 1e-20, 1, 1e10), HOLENT_EDOM);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_PLANAR_BTZ, 0, 1e-3, 1e-310, 1e-310, 1, 1), HOLENT_EDOM);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_GLOBAL_ADS, 1e200, 1e-100, 0, 0, 1, 3), HOLENT_SUCCESS);
  HT_STATUS (holent_geo_arc_length (&bg, 1e150, &len), HOLENT_SUCCESS);
  HT_CLOSE (len, 2 * (log (1e200) - log (M_PI) - log (1e-100) + log (sin (M_PI * 1e-50))), 1e-14);
  /* the Poincare line has no scale k: any positive cutoff is fine */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 0, 1e-320, 0, 0, 1, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_geo_arc_length (&bg, 1.0, &len), HOLENT_SUCCESS);
  HT_CHECK (isfinite (len), "len %g", len);
}

/* The reasons of holent_interval_check and holent_geo_points_check.  */
static void
test_reasons (void)
{
  holent_geo_bg bg;
  holent_err e;
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_BTZ, 2 * M_PI, 1e-6, 1, 1, 1, 3), HOLENT_SUCCESS);
  HT_STATUS (holent_interval_check (&bg, 4, 7.0, &e), HOLENT_EDOM);
  HT_CHECK (e.arg == 0 && e.index == 4, "arg %d index %zu", e.arg, e.index);
  HT_CHECK (strstr (e.reason, "must lie in (0, circumference]") != NULL, "%s", e.reason);
  HT_STATUS (holent_interval_check (&bg, 0, NAN, &e), HOLENT_ENAN);
  HT_STATUS (holent_interval_check (&bg, 0, 2 * M_PI, &e), HOLENT_SUCCESS);
  HT_STATUS (holent_interval_check (NULL, 0, 1, &e), HOLENT_EINVAL);
  HT_STATUS (holent_geo_points_check (&bg, 1, (const double[1]) { 1.0 }, (const double[1]) { 1.0 + 2 * M_PI }, &e), HOLENT_ECOINCIDE);
  HT_CHECK (e.arg == 1 && e.index == 0, "arg %d", e.arg);
  HT_CHECK (strstr (e.reason, "modulo the circumference") != NULL, "%s", e.reason);
  /* values before pairs: the NaN of X1(2) is named, not the coincident
     pair 1 */
  HT_STATUS (holent_geo_points_check (&bg, 2, (const double[2]) { 0.5, NAN },
                                      (const double[2]) { 0.5, 1 }, &e),
             HOLENT_ENAN);
  HT_CHECK (e.arg == 0 && e.index == 1, "arg %d index %zu", e.arg, e.index);
  HT_STATUS (holent_geo_points_check (&bg, 1, (const double[1]) { 1.0 }, (const double[1]) { 2.0 }, &e), HOLENT_SUCCESS);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 0, 1e-6, 0, 0, 1, 3), HOLENT_SUCCESS);
  HT_STATUS (holent_interval_check (&bg, 0, -1.0, &e), HOLENT_EDOM);
  HT_CHECK (strstr (e.reason, "positive length") != NULL, "%s", e.reason);
  HT_STATUS (holent_interval_check (&bg, 0, INFINITY, &e), HOLENT_EDOM);
  HT_STATUS (holent_geo_points_check (&bg, 1, (const double[1]) { NAN }, (const double[1]) { 1.0 }, &e), HOLENT_ENAN);
  HT_CHECK (e.arg == 0, "arg %d", e.arg);
  HT_STATUS (holent_geo_points_check (&bg, 1, (const double[1]) { 1.0 }, (const double[1]) { -INFINITY }, &e), HOLENT_EDOM);
  HT_CHECK (e.arg == 1, "arg %d", e.arg);
  HT_STATUS (holent_geo_points_check (&bg, 1, (const double[1]) { -1e308 }, (const double[1]) { 1e308 }, &e), HOLENT_EDOM);
  HT_CHECK (strstr (e.reason, "overflows") != NULL, "%s", e.reason);
  HT_STATUS (holent_geo_points_check (&bg, 1, (const double[1]) { 3.0 }, (const double[1]) { 3.0 }, &e), HOLENT_ECOINCIDE);
}

int
main (void)
{
  gsl_set_error_handler_off ();
  test_reasons ();
  test_init_errors ();
  test_init_range ();
  test_lengths ();
  test_interval ();
  HT_CHECK (holent_strerror (HOLENT_EOVERLAP)[0] != '\0', "strerror");
  HT_CHECK (holent_strerror (12345)[0] != '\0', "strerror unknown");
  return HT_DONE ();
}
