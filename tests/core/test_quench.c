/* Unit tests of holent_quench.  Independent checks: the crossing points
 * rebuilt from eta are stationary points of the sum of the three legs
 * (BTZ leg, vacuum chord, BTZ leg), each leg the embedding distance of
 * its end points (ingoing Eddington-Finkelstein embedding of BTZ, the
 * Poincare and global AdS chord distances), differentiated by central
 * differences, and that sum equals the length; the limits: vacuum before
 * the shell, thermal after t = l/2 (Balasubramanian et al. 2011, PRD 84,
 * 026010), early growth dS = pi E A t^2 (Liu and Suh 2014, PRD 89,
 * 066012, d = 2), linear growth with unit entanglement velocity (Liu and
 * Suh 2014, 2D), and a large circle approaching the line.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <gsl/gsl_math.h>
#include "holent_ctest.h"
#include "holent_quench.h"

typedef struct
{
  double R, t, half, rc, vc; /* bulk R, bulk time, half arc, cutoff r, v */
  int circle;
} legs_par;

/* BTZ (ingoing EF, v, r, x) embedding, valid inside the horizon too.  */
static void
ef_point (long double R, long double v, long double r, long double x,
          long double X[4])
{
  X[0] = r / R * coshl (R * x);
  X[1] = r / R * sinhl (R * x);
  X[2] = (expl (R * v) * (r + R) + expl (-R * v) * (r - R)) / (2 * R);
  X[3] = (expl (R * v) * (r + R) - expl (-R * v) * (r - R)) / (2 * R);
}

/* In long double: the products cancel to about 1e-10 of their size.  */
static double
dist (const long double X[4], const long double Y[4])
{
  return (double) acoshl (X[0] * Y[0] - X[1] * Y[1] - X[2] * Y[2]
                          + X[3] * Y[3]);
}

/* Sum of legs with the crossing at (v = 0, r, +-x).  */
static double
legs (const legs_par *p, double x, double r)
{
  long double B[4], P[4];
  /* Boundary point moved to x = 0 (a symmetry), so the large cosh
     factors do not cancel.  */
  ef_point (p->R, p->vc, p->rc, 0.0, B);
  ef_point (p->R, 0.0, r, x - p->half, P);
  double chord = p->circle ? 2 * asinh (r * sin (x)) : 2 * asinh (r * x);
  return 2 * dist (B, P) + chord;
}

static void
check_stationary (int circle, double L, double beta, double l, double t)
{
  holent_quench_bg q;
  double eps = 1e-5, len, eta;
  HT_STATUS (holent_quench_init (&q, circle, L, eps, beta, 1.0), HOLENT_SUCCESS);
  HT_STATUS (holent_quench_length (&q, l, t, &len, &eta), HOLENT_SUCCESS);
  HT_CHECK (eta > 0, "crossing expected, eta %g", eta);
  /* Bulk units: on the circle phi = 2 pi x/L, time 2 pi t/L, R = L/beta.  */
  double sc = circle ? 2 * M_PI / L : 1.0, R = circle ? L / beta : 2 * M_PI / beta;
  double zc = sc * eps, rc = 1 / zc + R * R * zc / 4;
  legs_par p = { R, sc * t, sc * l / 2, rc, 0, circle };
  p.vc = p.t + log ((rc - R) / (rc + R)) / (2 * R);  /* v = t + r_* */
  double S = sinh (R * p.t), C = cosh (R * p.t), E = exp (-eta), x, r;
  if (!circle)
    {
      double w = (C - sqrt (1 + S * S * E * E)) / (S * sinh (eta) * E);
      r = R / w;
      x = sinh (eta) / r;
    }
  else
    {
      /* phi from the angular equation sinh(R (half - phi)) = S E
         cos(phi) alone, bisected from the top down.  */
      double hi = p.half, lo = 0, phi;
      double hf = sinh (R * (p.half - hi)) - S * E * cos (hi);
      if (fabs (hf) < 1e-14)
        phi = hi;
      else
        {
          for (int k = 1; k <= 4096; k++)
            {
              lo = p.half * (1 - k / 4096.0);
              double f = sinh (R * (p.half - lo)) - S * E * cos (lo);
              if ((f > 0) != (hf > 0))
                break;
              hi = lo;
            }
          for (int it = 0; it < 200; it++)
            {
              double m = 0.5 * (lo + hi);
              double f = sinh (R * (p.half - m)) - S * E * cos (m);
              if ((f > 0) == (hf > 0))
                hi = m;
              else
                lo = m;
            }
          phi = 0.5 * (lo + hi);
        }
      x = phi;
      r = sinh (eta) / sin (phi);
    }
  double F = legs (&p, x, r);
  /* O(eps^2) terms of the regulated legs aside, equal.  */
  HT_CHECK (fabs (F - len) < 1e-7 * len, "legs %.12g vs len %.12g (circle %d, l %g, t %g)", F, len, circle, l, t);
  double hx = 1e-5 * x, hr = 1e-5 * r;
  double gx = (legs (&p, x + hx, r) - legs (&p, x - hx, r)) / (2 * hx);
  double gr = (legs (&p, x, r + hr) - legs (&p, x, r - hr)) / (2 * hr);
  HT_CHECK (fabs (gx) * x < 1e-5 && fabs (gr) * r < 1e-5, "not stationary: %g %g (circle %d, l %g, t %g)", gx * x, gr * r, circle, l, t);
}

static void
test_limits (void)
{
  holent_quench_bg q;
  double eps = 1e-4, beta = 1.3, len, len2, eta;
  HT_STATUS (holent_quench_init (&q, 0, 0, eps, beta, 1.0), HOLENT_SUCCESS);
  HT_STATUS (holent_quench_length (&q, 2.0, -0.5, &len, &eta), HOLENT_SUCCESS);
  HT_CLOSE (len, 2 * log (2.0 / eps), 1e-14);
  HT_STATUS (holent_quench_length (&q, 2.0, 1.0, &len, &eta), HOLENT_SUCCESS);
  HT_CLOSE (len, 2 * log (beta / (M_PI * eps) * sinh (2 * M_PI / beta)), 1e-14);
  /* Continuity at both ends.  */
  HT_STATUS (holent_quench_length (&q, 2.0, 1.0 - 1e-9, &len2, &eta), HOLENT_SUCCESS);
  HT_CLOSE (len2, len, 1e-8);
  HT_STATUS (holent_quench_length (&q, 2.0, 1e-7, &len2, &eta), HOLENT_SUCCESS);
  HT_CLOSE (len2, 2 * log (2.0 / eps), 1e-8);
  /* Liu and Suh 2014: S(t) - S(0) = pi E A t^2 with E = pi c/(6 beta^2)
     (thermal energy density, c = 1) and A = 2 endpoints; lengths are
     (6/c) S.  */
  double t = 2e-3;
  HT_STATUS (holent_quench_length (&q, 2.0, t, &len2, &eta), HOLENT_SUCCESS);
  double dS = (len2 - 2 * log (2.0 / eps)) / 6.0;
  HT_CLOSE (dS / (t * t), M_PI * (M_PI / (6 * beta * beta)) * 2, 2e-3);
  /* Linear regime beta << t << l: dS/dt = 2 s_th v_E with s_th = pi c/(3
     beta) and v_E = 1 (Liu and Suh 2014; Hartman and Maldacena 2013).  */
  double l = 2e5, t1 = 10.0, t2 = 12.0, a, b;
  HT_STATUS (holent_quench_length (&q, l, t1, &a, &eta), HOLENT_SUCCESS);
  HT_STATUS (holent_quench_length (&q, l, t2, &b, &eta), HOLENT_SUCCESS);
  /* corrections fall like t/l: 2e-4 at l = 2000, 2e-6 at l = 2e5 */
  HT_CLOSE ((b - a) / 6.0 / (t2 - t1), 2 * M_PI / (3 * beta), 1e-5);
  /* Monotone growth.  */
  double prev = -INFINITY;
  for (double tt = 0; tt <= 1.0; tt += 0.05)
    {
      HT_STATUS (holent_quench_length (&q, 2.0, tt, &len, &eta), HOLENT_SUCCESS);
      HT_CHECK (len >= prev - 1e-12, "not monotone at %g", tt);
      prev = len;
    }
  /* A large circle is locally the line.  */
  holent_quench_bg qc;
  HT_STATUS (holent_quench_init (&qc, 1, 2000.0, eps, beta, 1.0), HOLENT_SUCCESS);
  HT_STATUS (holent_quench_length (&qc, 2.0, 0.6, &len, &eta), HOLENT_SUCCESS);
  HT_STATUS (holent_quench_length (&q, 2.0, 0.6, &len2, &eta), HOLENT_SUCCESS);
  HT_CLOSE (len, len2, 1e-6);
  /* Circle limits and the symmetric arc.  */
  HT_STATUS (holent_quench_init (&qc, 1, 5.0, eps, beta, 1.0), HOLENT_SUCCESS);
  HT_STATUS (holent_quench_length (&qc, 1.5, -1, &len, &eta), HOLENT_SUCCESS);
  HT_CLOSE (len, 2 * log (5.0 / (M_PI * eps) * sin (M_PI * 1.5 / 5)), 1e-14);
  HT_STATUS (holent_quench_length (&qc, 3.5, 0.3, &len, &eta), HOLENT_SUCCESS);
  HT_STATUS (holent_quench_length (&qc, 1.5, 0.3, &len2, &eta), HOLENT_SUCCESS);
  HT_CLOSE (len, len2, 1e-14);
  HT_STATUS (holent_quench_length (&qc, 2.5, 0.3, &len, &eta), HOLENT_SUCCESS);
  HT_STATUS (holent_quench_length (&qc, 2.5 - 1e-9, 0.3, &len2, &eta), HOLENT_SUCCESS);
  HT_CLOSE (len, len2, 1e-7);
  /* Errors.  */
  HT_STATUS (holent_quench_length (&q, 0.0, 1, &len, &eta), HOLENT_EDOM);
  HT_STATUS (holent_quench_length (&q, NAN, 1, &len, &eta), HOLENT_EINVAL);
  HT_STATUS (holent_quench_length (&q, 1, INFINITY, &len, &eta), HOLENT_EINVAL);
  HT_STATUS (holent_quench_length (&qc, 5.0, 1, &len, &eta), HOLENT_EDOM);
  HT_STATUS (holent_quench_init (&q, 0, 0, eps, -1, 1.0), HOLENT_EDOM);
  HT_STATUS (holent_quench_init (&q, 0, 0, eps, NAN, 1.0), HOLENT_EINVAL);
  HT_STATUS (holent_quench_init (&q, 1, INFINITY, eps, 1, 1.0), HOLENT_EDOM);
  HT_STATUS (holent_quench_init (NULL, 1, 1, eps, 1, 1.0), HOLENT_EINVAL);
}

static void
test_regions (void)
{
  holent_quench_bg q;
  holent_region *r = holent_region_alloc (4);
  holent_rt_workspace *w = holent_rt_workspace_alloc_dp (4);
  holent_rt_result res, ref;
  HT_STATUS (holent_quench_init (&q, 0, 0, 1e-3, 1.0, 3.0), HOLENT_SUCCESS);
  double a[2] = { 0, 2.2 }, b[2] = { 2, 4 };
  HT_STATUS (holent_region_set (r, 0, 0, 2, a, b), HOLENT_SUCCESS);
  /* Before: the vacuum; long after: the thermal state.  */
  HT_STATUS (holent_quench_entropy (w, &q, r, -1, &res, NULL, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_rt_entropy (w, &q.vac, r, &ref, NULL, NULL), HOLENT_SUCCESS);
  HT_CLOSE (res.S, ref.S, 1e-14);
  HT_STATUS (holent_quench_entropy (w, &q, r, 10, &res, NULL, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_rt_entropy (w, &q.bh, r, &ref, NULL, NULL), HOLENT_SUCCESS);
  HT_CLOSE (res.S, ref.S, 1e-14);
  /* In between: the smaller of the two pairings.  */
  double l1, l2, l3, l4;
  HT_STATUS (holent_quench_entropy (w, &q, r, 0.8, &res, NULL, NULL), HOLENT_SUCCESS);
  holent_quench_length (&q, 2, 0.8, &l1, NULL);
  holent_quench_length (&q, 1.8, 0.8, &l2, NULL);
  holent_quench_length (&q, 4, 0.8, &l3, NULL);
  holent_quench_length (&q, 0.2, 0.8, &l4, NULL);
  HT_CLOSE (res.length, fmin (l1 + l2, l3 + l4), 1e-14);
  /* Circle: pure state, the whole circle has S = 0.  */
  double ca[1] = { 0 }, cb[1] = { 5 };
  HT_STATUS (holent_quench_init (&q, 1, 5.0, 1e-3, 1.0, 3.0), HOLENT_SUCCESS);
  HT_STATUS (holent_region_set (r, 1, 5.0, 1, ca, cb), HOLENT_SUCCESS);
  HT_STATUS (holent_quench_entropy (w, &q, r, 3, &res, NULL, NULL), HOLENT_SUCCESS);
  HT_CHECK (res.S == 0.0, "whole circle %g", res.S);
  HT_STATUS (holent_quench_entropy (w, &q, r, NAN, &res, NULL, NULL), HOLENT_EINVAL);
  holent_region_free (r);
  holent_rt_workspace_free (w);
}

/* The constructor and point distances.  */
static void
test_make_points (void)
{
  holent_quench_bg q;
  holent_err e;
  double a, b;
  HT_STATUS (holent_quench_make (&q, 1, 4.0, 1e-6, 1.0, 3.0, 1.0, &e),
             HOLENT_SUCCESS);
  HT_STATUS (holent_quench_points_length (&q, 0.5, 4.5, 0.3, &a),
             HOLENT_ECOINCIDE);
  /* x2 - x1 = 3 on a circle of 4 is the arc 1 */
  HT_STATUS (holent_quench_points_length (&q, 0.5, 3.5, 0.3, &a),
             HOLENT_SUCCESS);
  HT_STATUS (holent_quench_length (&q, 1.0, 0.3, &b, NULL), HOLENT_SUCCESS);
  HT_CLOSE (a, b, 1e-14);
  HT_STATUS (holent_quench_points_length (&q, NAN, 1.0, 0.3, &a),
             HOLENT_EINVAL);
  HT_STATUS (holent_quench_make (&q, 1, 4.0, 1e-6, -1.0, 3.0, 1.0, &e),
             HOLENT_EDOM);
  HT_CHECK (e.arg == HOLENT_TFD_ARG_BETA, "arg %d", e.arg);
}

/* A scan's memory (static lengths kept, Newton warm-started) gives the
   plain computation's entropy to rounding, on the line and the circle,
   when the region changes inside one scan, and when a region is larger
   than the scan holds.  */
static void
test_scan (void)
{
  holent_quench_bg q;
  holent_region *r = holent_region_alloc (8);
  holent_rt_workspace *w = holent_rt_workspace_alloc_dp (8);
  holent_quench_scan *sc = holent_quench_scan_alloc (6);
  holent_rt_result res, ref;
  unsigned long seed = 12345;
  HT_CHECK (holent_quench_scan_alloc (0) == NULL, "nmax 0");
  HT_CHECK (holent_quench_scan_alloc (HOLENT_QUENCH_SCAN_NMAX + 1) == NULL,
            "nmax cap");
  double worst = 0.0;
  for (int circle = 0; circle < 2; circle++)
    {
      double L = 40.0;
      HT_STATUS (holent_quench_init (&q, circle, L, 1e-3, 1.0, 3.0),
                 HOLENT_SUCCESS);
      for (int reg = 0; reg < 6; reg++)
        {
          size_t n = 1 + (size_t) reg + (reg == 5 ? 2 : 0);  /* 8 > 6 */
          double a[8], b[8], x = 0.0;
          for (size_t k = 0; k < n; k++)
            {
              seed = seed * 6364136223846793005UL + 1442695040888963407UL;
              x += 0.3 + (double) (seed >> 11) / 9007199254740992.0 * 3.0;
              a[k] = x;
              seed = seed * 6364136223846793005UL + 1442695040888963407UL;
              x += 0.2 + (double) (seed >> 11) / 9007199254740992.0 * 3.0;
              b[k] = x;
            }
          HT_STATUS (holent_region_set (r, circle, L, n, a, b),
                     HOLENT_SUCCESS);
          for (int k = -5; k < 400; k++)
            {
              double t = 0.031 * k;
              HT_STATUS (holent_quench_entropy_scan (w, &q, r, t, sc, &res,
                                                     NULL, NULL),
                         HOLENT_SUCCESS);
              HT_STATUS (holent_quench_entropy (w, &q, r, t, &ref, NULL,
                                                NULL), HOLENT_SUCCESS);
              double d = fabs (res.S - ref.S) / fmax (1.0, fabs (ref.S));
              worst = d > worst ? d : worst;
            }
        }
    }
  HT_CHECK (worst <= 1e-13, "scan vs plain: worst relative %g", worst);
  holent_quench_scan_free (sc);
  holent_quench_scan_free (NULL);
  holent_region_free (r);
  holent_rt_workspace_free (w);
}

int
main (void)
{
  test_make_points ();
  check_stationary (0, 0, 1.0, 2.0, 0.3);
  check_stationary (0, 0, 1.0, 2.0, 0.95);
  check_stationary (0, 0, 0.5, 3.0, 0.1);
  check_stationary (0, 0, 2.0, 1.0, 0.45);
  check_stationary (1, 6.0, 1.0, 2.0, 0.3);
  check_stationary (1, 6.0, 1.0, 2.9, 0.7);
  check_stationary (1, 3.0, 2.0, 1.4, 0.5);
  check_stationary (1, 3.0, 2.0, 1.5, 0.2);
  test_limits ();
  test_regions ();
  test_scan ();
  return HT_DONE ();
}
