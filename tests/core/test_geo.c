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
#include <gsl/gsl_roots.h>
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

/* The plateau of an interval on a circle with a horizon (Hubeny,
 * Maxfield, Rangamani and Tonni 2013, JHEP 08, 092: for l beyond l* the
 * complement plus the horizon is the RT surface; from memory), and
 * holent_interval_entropy, which evaluates one geodesic a value chosen by
 * comparing L - l with m* = L - l*.  Independent route: the two
 * candidates written out with GSL's log sinh (Ryu and Takayanagi 2006;
 * Hubeny, Rangamani and Takayanagi 2007 for two temperatures), their
 * crossing found by GSL's Brent solver, and their minimum at random
 * lengths and at lengths within 300 ulps of l*.  */
typedef struct
{
  double bl, br, L, c, eps;
} pl_case;

static double
pl_len (const pl_case *p, double l)
{
  return log (p->bl / (M_PI * p->eps)) + gsl_sf_lnsinh (M_PI * l / p->bl)
         + log (p->br / (M_PI * p->eps)) + gsl_sf_lnsinh (M_PI * l / p->br);
}

/* complement plus horizon minus the interval, at complement arc m */
static double
pl_gap (double m, void *vp)
{
  const pl_case *p = vp;
  double sbh = M_PI * p->c / 6 * (1 / p->bl + 1 / p->br) * p->L;
  return p->c / 6 * pl_len (p, m) + sbh - p->c / 6 * pl_len (p, p->L - m);
}

static void
test_interval_plateau (void)
{
  const pl_case cs[] = {
    { 0.5, 0.5, 2 * M_PI, 3, 1e-6 }, { 3, 3, 2 * M_PI, 12, 1e-4 },
    { 50, 50, 2 * M_PI, 1, 1e-6 },   /* k L < 1: the other closed form */
    { 1000, 1000, 1, 2, 1e-7 },      /* nearly no horizon: l* -> L/2 */
    { 0.001, 0.001, 10, 1, 1e-9 },   /* k L ~ 3e4 */
    { 0.7, 0.4, 2 * M_PI, 3, 1e-6 }, { 5, 0.3, 2 * M_PI, 1, 1e-6 },
    { 100, 1, 2 * M_PI, 24, 1e-5 },  { 0.02, 0.01, 1, 1, 1e-8 },
  };
  enum { NR = 3000, NU = 601 };
  static double l[NR + NU], S[NR + NU];
  static unsigned char br[NR + NU];
  gsl_root_fsolver *rs = gsl_root_fsolver_alloc (gsl_root_fsolver_brent);
  HT_CHECK (rs != NULL, "brent");
  srand (11);
  for (size_t k = 0; rs && k < sizeof cs / sizeof cs[0]; k++)
    {
      pl_case p = cs[k];
      holent_geo_bg bg;
      holent_bulk bulk = p.bl == p.br ? HOLENT_BULK_BTZ : HOLENT_BULK_ROTATING_BTZ;
      HT_STATUS (holent_geo_bg_init (&bg, bulk, p.L, p.eps, p.bl, p.br, 1, p.c), HOLENT_SUCCESS);
      double ms;
      HT_STATUS (holent_interval_plateau (&bg, &ms), HOLENT_SUCCESS);
      HT_CHECK (ms > 0 && ms <= p.L / 2, "case %zu: m* = %g", k, ms);
      /* the crossing by Brent on the written-out candidates */
      gsl_function F = { pl_gap, &p };
      double lo = 1e-12 * p.L, hi = p.L / 2, root = 0;
      gsl_root_fsolver_set (rs, &F, lo, hi);
      for (int it = 0; it < 200; it++)
        {
          gsl_root_fsolver_iterate (rs);
          root = gsl_root_fsolver_root (rs);
          lo = gsl_root_fsolver_x_lower (rs);
          hi = gsl_root_fsolver_x_upper (rs);
          if (gsl_root_test_interval (lo, hi, 0, 1e-15) == GSL_SUCCESS)
            break;
        }
      HT_CHECK (fabs (ms - root) <= 1e-11 * root, "case %zu: m* %.17g, Brent %.17g", k, ms, root);
      /* random lengths, then L - m* give or take 300 ulps */
      double lstar = p.L - ms;
      for (int i = 0; i < NR; i++)
        l[i] = p.L * (rand () + 1.0) / (RAND_MAX + 2.0);
      for (int i = 0; i < NU; i++)
        {
          double x = lstar;
          for (int j = 0; j < abs (i - NU / 2); j++)
            x = nextafter (x, i < NU / 2 ? 0.0 : p.L);
          l[NR + i] = x;
        }
      HT_STATUS (holent_interval_entropy (&bg, NR + NU, l, S, br, NULL, NULL), HOLENT_SUCCESS);
      double sbh = M_PI * p.c / 6 * (1 / p.bl + 1 / p.br) * p.L;
      int ok = 1, okb = 1;
      for (int i = 0; i < NR + NU; i++)
        {
          double a = p.c / 6 * pl_len (&p, l[i]);
          double b = p.c / 6 * pl_len (&p, p.L - l[i]) + sbh;
          double want = a < b ? a : b, sc = fabs (want) > 1 ? fabs (want) : 1;
          if (!(fabs (S[i] - want) <= 1e-14 * sc))
            {
              if (ok)
                HT_CHECK (0, "case %zu: l = %.17g: S %.17g, min %.17g", k, l[i], S[i], want);
              ok = 0;
            }
          /* the branch where the candidates differ beyond rounding */
          if (fabs (a - b) > 1e-14 * sc && br[i] != (b < a))
            okb = 0;
        }
      HT_CHECK (ok, "case %zu: S = min of both candidates", k);
      /* in place (S aliasing the lengths), the whole circle included */
      static double ip[NR + NU];
      for (int i = 0; i < NR + NU; i++)
        ip[i] = i == 7 ? p.L : l[i];
      HT_STATUS (holent_interval_entropy (&bg, NR + NU, ip, ip, NULL, NULL, NULL), HOLENT_SUCCESS);
      int same = ip[7] == sbh;
      for (int i = 0; i < NR + NU; i++)
        same = same && (i == 7 || ip[i] == S[i]);
      HT_CHECK (same, "case %zu: in place", k);
      HT_CHECK (okb, "case %zu: branch", k);
      /* the difference of the candidates grows with l (its derivative is
         (c/6) sum k (coth kl + coth k(L - l)) > 0): on a grid */
      int mono = 1;
      double prev = -INFINITY;
      for (int i = 1; i < 2000; i++)
        {
          double x = p.L * i / 2000.0, g = -pl_gap (p.L - x, &p);
          mono = mono && g > prev - 1e-12 * fabs (g);
          prev = g;
        }
      HT_CHECK (mono, "case %zu: monotone difference", k);
    }
  gsl_root_fsolver_free (rs);
  holent_geo_bg bg;
  double ms;
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_GLOBAL_ADS, 1, 1e-3, 0, 0, 1, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_interval_plateau (&bg, &ms), HOLENT_EDOM);
  HT_STATUS (holent_interval_plateau (NULL, &ms), HOLENT_EINVAL);
  HT_STATUS (holent_interval_plateau (&bg, NULL), HOLENT_EINVAL);
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
  test_interval_plateau ();
  HT_CHECK (holent_strerror (HOLENT_EOVERLAP)[0] != '\0', "strerror");
  HT_CHECK (holent_strerror (12345)[0] != '\0', "strerror unknown");
  return HT_DONE ();
}
