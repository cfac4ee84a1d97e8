/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Unit tests of holent_ewcs: every error path; the closed form against
 * Takayanagi and Umemoto 2017 (arXiv:1708.09393, Nature Phys. 14, 573
 * (2018)), E_W = (c/6) log(1 + 2z + 2 sqrt(z(z+1))); and the returned
 * bulk points checked with formulas written here from each metric (the
 * Poincare half-plane distance, the hyperboloid law of cosines of global
 * AdS, the BTZ embedding of Banados, Henneaux, Teitelboim and Zanelli 1993,
 * Phys. Rev. D 48, 1506, from memory): their distance is the cross
 * section's length, each lies on its RT geodesic, and moving either one
 * along its geodesic only lengthens the cross section.  */
#include <float.h>
#include <math.h>
#include <string.h>
#include <stdlib.h>
#include <gsl/gsl_math.h>
#include "holent_ctest.h"
#include "holent_geo.h"
#include "holent_ewcs.h"

/* Embedding of a bulk point (t, x, r) of bg in R^{2,2}, metric
   diag(-1, +1, -1, +1) on (T1, X1, T2, X2).  */
static void
embed (const holent_geo_bg *bg, const double p[3], double X[4])
{
  const double t = p[0], x = p[1], r = p[2];
  switch (bg->bulk)
    {
    case HOLENT_BULK_POINCARE:
      {
        /* Poincare z = 1/r:  X = (z/2)(1 + (1 + x^2 - t^2)/z^2), ... */
        const double z = 1.0 / r, q = x * x - t * t;
        X[0] = 0.5 * z * (1.0 + (1.0 + q) / (z * z));
        X[1] = x / z;
        X[2] = t / z;
        X[3] = 0.5 * z * (1.0 - (1.0 - q) / (z * z));
        return;
      }
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
      {
        const double k = 2.0 * M_PI / bg->L, rho = asinh (r / k);
        const double tau = k * t, phi = k * x;
        X[0] = cosh (rho) * cos (tau);
        X[1] = sinh (rho) * cos (phi);
        X[2] = cosh (rho) * sin (tau);
        X[3] = sinh (rho) * sin (phi);
        return;
      }
    default:
      {
        const double rp = M_PI * (1 / bg->beta_L + 1 / bg->beta_R);
        const double rm = M_PI * (1 / bg->beta_L - 1 / bg->beta_R);
        const double A = (r * r - rm * rm) / (rp * rp - rm * rm), B = A - 1;
        const double al = rp * x - rm * t, ga = rp * t - rm * x;
        X[0] = sqrt (A) * cosh (al);
        X[1] = sqrt (A) * sinh (al);
        X[2] = sqrt (B) * sinh (ga);
        X[3] = sqrt (B) * cosh (ga);
        return;
      }
    }
}

static double
dot (const double X[4], const double Y[4])
{
  return -X[0] * Y[0] + X[1] * Y[1] - X[2] * Y[2] + X[3] * Y[3];
}

static double
dist (const holent_geo_bg *bg, const double p[3], const double q[3])
{
  double X[4], Y[4];
  embed (bg, p, X);
  embed (bg, q, Y);
  return acosh (-dot (X, Y));
}

/* A boundary point at t = 0 as a point at large r, rescaled: a null
   direction of the embedding up to O(1/r^2).  */
static void
boundary (const holent_geo_bg *bg, double x, double P[4])
{
  const double R = 1e7, p[3] = { 0.0, x, R };
  embed (bg, p, P);
  for (int k = 0; k < 4; k++)
    P[k] /= R;
}

/* Distance of the embedded point X from the plane spanned by the null
   directions P, Q (geodesics of AdS3 are such plane sections).  */
static double
off_plane (const double X[4], const double P[4], const double Q[4])
{
  const double pq = dot (P, Q), a = dot (X, Q) / pq, b = dot (X, P) / pq;
  double s = 0.0;
  for (int k = 0; k < 4; k++)
    {
      const double d = X[k] - a * P[k] - b * Q[k];
      s += d * d;
    }
  return sqrt (s / (a * a + b * b));
}

static void
check_geometry (const holent_geo_bg *bg, const double A[2],
                const double B[2], double tol)
{
  holent_ewcs_result r;
  double X[4], P[4], Q[4], pt[3], p0[3], p1[3], len;
  /* translations along the line are isometries: centre the pair before
     embedding, so that cosh(r+ x) stays small and -X.Y keeps its digits */
  const int line = bg->bulk == HOLENT_BULK_POINCARE
                   || bg->bulk == HOLENT_BULK_PLANAR_BTZ
                   || bg->bulk == HOLENT_BULK_PLANAR_ROTATING_BTZ;
  const double xc = line ? 0.25 * (A[0] + A[1] + B[0] + B[1]) : 0.0;
  HT_STATUS (holent_ewcs_pair (bg, A, B, &r), HOLENT_SUCCESS);
  for (int k = 0; k < 3; k++)
    {
      p0[k] = r.point[0][k];
      p1[k] = r.point[1][k];
    }
  p0[1] -= xc;
  p1[1] -= xc;
  len = dist (bg, p0, p1);
  HT_CLOSE (len, r.length, tol);
  HT_CLOSE (r.E_connected, bg->c / 6.0 * r.length, 1e-14);
  for (int i = 0; i < 2; i++)
    {
      embed (bg, i ? p1 : p0, X);
      boundary (bg, r.gap[i][0] - xc, P);
      boundary (bg, r.gap[i][1] - xc, Q);
      HT_CHECK (off_plane (X, P, Q) < 1e-6, "bulk %d point %d off its geodesic: %g",
                (int) bg->bulk, i, off_plane (X, P, Q));
      /* local minimality: slide each end along its geodesic */
      for (int sg = -1; sg <= 1; sg += 2)
        {
          HT_STATUS (holent_ewcs_geodesic_point (bg, r.gap[i][0], r.gap[i][1],
                                                 r.s[i] + sg * 1e-3, pt),
                     HOLENT_SUCCESS);
          pt[1] -= xc;
          const double l2 = dist (bg, pt, i ? p0 : p1);
          HT_CHECK (l2 > len - 1e-12, "moving point %d shortens: %g < %g", i,
                    l2, len);
        }
    }
}

static void
test_poincare (void)
{
  holent_geo_bg bg;
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 0, 1e-6, 0, 0, 0, 3), HOLENT_SUCCESS);
  srand (7);
  for (int it = 0; it < 200; it++)
    {
      double a1 = 10.0 * rand () / RAND_MAX - 5.0;
      double a2 = a1 + 0.01 + 3.0 * rand () / RAND_MAX;
      double b1 = a2 + 0.01 + 2.0 * rand () / RAND_MAX;
      double b2 = b1 + 0.01 + 3.0 * rand () / RAND_MAX;
      double A[2] = { a1, a2 }, B[2] = { b1, b2 };
      holent_ewcs_result r, r2;
      /* Takayanagi and Umemoto 2017, eq. for two intervals in Poincare
         AdS3, z = (a2-a1)(b2-b1)/((b1-a2)(b2-a1)).  */
      double z = (a2 - a1) * (b2 - b1) / ((b1 - a2) * (b2 - a1));
      double tu = 3.0 / 6.0 * log (1 + 2 * z + 2 * sqrt (z * (z + 1)));
      HT_STATUS (holent_ewcs_pair (&bg, A, B, &r), HOLENT_SUCCESS);
      HT_CLOSE (r.E_connected, tu, 1e-12);
      HT_CLOSE (r.z_L, z, 1e-12);
      HT_CLOSE (r.z_R, z, 1e-12);
      /* connected iff S(gap) + S(span) < S(A) + S(B) (Headrick 2010) */
      HT_CHECK (r.connected == ((b1 - a2) * (b2 - a1) < (a2 - a1) * (b2 - b1)),
                "phase at z = %g", z);
      HT_CLOSE (r.E, r.connected ? tu : 0.0, 1e-12);
      /* symmetric in A <-> B, the point rows swap */
      HT_STATUS (holent_ewcs_pair (&bg, B, A, &r2), HOLENT_SUCCESS);
      HT_CLOSE (r2.E_connected, r.E_connected, 1e-12);
      HT_CLOSE (r2.point[0][1], r.point[1][1], 1e-9);
      HT_CLOSE (r2.point[1][2], r.point[0][2], 1e-9);
      HT_CLOSE (r2.gap[0][0], r.gap[1][0], 1e-15);
      if (it < 40)
        check_geometry (&bg, A, B, 1e-7);
    }
  /* the symmetric configuration by hand: cross section x = 0 from z = 1
     to z = 3, length log 3 */
  {
    double A[2] = { -3, -1 }, B[2] = { 1, 3 };
    holent_ewcs_result r;
    HT_STATUS (holent_ewcs_pair (&bg, A, B, &r), HOLENT_SUCCESS);
    HT_CLOSE (r.length, log (3.0), 1e-14);
    HT_CLOSE (r.point[0][1], 0.0, 1e-14);
    HT_CLOSE (r.point[0][2], 1.0, 1e-14);
    HT_CLOSE (r.point[1][2], 1.0 / 3.0, 1e-14);
    HT_CLOSE (r.gap[0][0], -1, 0);
    HT_CLOSE (r.gap[0][1], 1, 0);
    HT_CLOSE (r.gap[1][0], 3, 0);
    HT_CLOSE (r.gap[1][1], -3, 0);
  }
}

static void
test_circle (void)
{
  holent_geo_bg bg;
  const double L = 7.0;
  for (int which = 0; which < 2; which++)
    {
      HT_STATUS (holent_geo_bg_init (&bg, which ? HOLENT_BULK_THERMAL_ADS
                                                : HOLENT_BULK_GLOBAL_ADS,
                                     L, 1e-6, 9, 9, 1, 1), HOLENT_SUCCESS);
      srand (11);
      for (int it = 0; it < 60; it++)
        {
          double u[4], s = 0;
          for (int k = 0; k < 4; k++)
            s += (u[k] = 0.02 + (double) rand () / RAND_MAX);
          double a1 = 20.0 * rand () / RAND_MAX - 10.0;
          double lA = u[0] * L / s, d1 = u[1] * L / s, lB = u[2] * L / s;
          double d2 = L - lA - d1 - lB;
          double A[2] = { a1, a1 + lA }, B[2] = { a1 + lA + d1, a1 + lA + d1 + lB };
          holent_ewcs_result r;
          /* chordal cross-ratio of the circle (sines of the arcs) */
          double sn = sin (M_PI * lA / L) * sin (M_PI * lB / L)
                      / (sin (M_PI * d1 / L) * sin (M_PI * d2 / L));
          HT_STATUS (holent_ewcs_pair (&bg, A, B, &r), HOLENT_SUCCESS);
          HT_CLOSE (r.z_L, sn, 1e-11);
          HT_CLOSE (r.length, log (1 + 2 * sn + 2 * sqrt (sn * (sn + 1))), 1e-11);
          /* the same intervals written modulo L, B wrapping through 0 */
          double A2[2] = { fmod (A[0] + 100 * L, L), fmod (A[1] + 100 * L, L) };
          double B2[2] = { fmod (B[0] + 100 * L, L), fmod (B[1] + 100 * L, L) };
          holent_ewcs_result r2;
          HT_STATUS (holent_ewcs_pair (&bg, A2, B2, &r2), HOLENT_SUCCESS);
          HT_CLOSE (r2.length, r.length, 1e-10);
          HT_CLOSE (r2.point[0][2], r.point[0][2], 1e-8);
          if (it < 30)
            check_geometry (&bg, A, B, 1e-7);
        }
    }
}

static void
test_btz (void)
{
  holent_geo_bg bg;
  const double bl[3] = { 1.0, 0.4, 2.5 }, br[3] = { 1.0, 1.3, 0.7 };
  for (int which = 0; which < 3; which++)
    {
      HT_STATUS (holent_geo_bg_init (&bg, which ? HOLENT_BULK_PLANAR_ROTATING_BTZ
                                                : HOLENT_BULK_PLANAR_BTZ,
                                     0, 1e-6, bl[which], br[which], 1, 2),
                 HOLENT_SUCCESS);
      srand (5 + which);
      for (int it = 0; it < 60; it++)
        {
          /* lengths in units of the shorter beta, so that the embedding
             coordinates stay small enough for the cancellations in
             the independent distance below */
          const double sc = fmin (bl[which], br[which]);
          double a1 = sc * (2.0 * rand () / RAND_MAX - 1.0);
          double a2 = a1 + sc * (0.02 + 1.0 * rand () / RAND_MAX);
          double b1 = a2 + sc * (0.01 + 0.5 * rand () / RAND_MAX);
          double b2 = b1 + sc * (0.02 + 1.0 * rand () / RAND_MAX);
          double A[2] = { a1, a2 }, B[2] = { b1, b2 };
          holent_ewcs_result r;
          HT_STATUS (holent_ewcs_pair (&bg, A, B, &r), HOLENT_SUCCESS);
          /* cross-ratios of the exponential maps w = exp(2 pi x/beta) */
          for (int k = 0; k < 2; k++)
            {
              const double be = k ? bg.beta_R : bg.beta_L;
              double w[4] = { exp (2 * M_PI * a1 / be), exp (2 * M_PI * a2 / be),
                              exp (2 * M_PI * b1 / be), exp (2 * M_PI * b2 / be) };
              double z = (w[1] - w[0]) * (w[3] - w[2]) / ((w[2] - w[1]) * (w[3] - w[0]));
              HT_CLOSE (k ? r.z_R : r.z_L, z, 1e-9);
            }
          HT_CHECK (r.connected == (r.z_L * r.z_R > 1), "rotating phase");
          if (it < 30)
            check_geometry (&bg, A, B, 1e-7);
        }
      /* long intervals far from the origin: no overflow, the
         translation invariance of the line holds */
      {
        double A[2] = { 1000, 1800 }, B[2] = { 1800.02, 2900 };
        double A0[2] = { 0, 800 }, B0[2] = { 800.02, 1900 };
        holent_ewcs_result r, r0;
        HT_STATUS (holent_ewcs_pair (&bg, A, B, &r), HOLENT_SUCCESS);
        HT_STATUS (holent_ewcs_pair (&bg, A0, B0, &r0), HOLENT_SUCCESS);
        HT_CHECK (isfinite (r.length) && isfinite (r.point[0][2]) && isfinite (r.point[1][2]),
                  "long intervals: %g %g %g", r.length, r.point[0][2], r.point[1][2]);
        HT_CLOSE (r.length, r0.length, 1e-12);
        HT_CLOSE (r.point[0][1] - 1000, r0.point[0][1], 1e-9);
        HT_CLOSE (r.point[1][2], r0.point[1][2], 1e-9);
        HT_CHECK (r.connected, "long intervals, small gap: connected");
      }
    }
}

static void
test_asinh (void)
{
  for (double lz = -700; lz < 700; lz += 3.7)
    {
      double v = holent_ewcs_asinh_sqrt_exp (lz);
      if (lz < 300)
        HT_CLOSE (v, gsl_asinh (sqrt (exp (lz))), 1e-13);
      else
        HT_CLOSE (v, 0.5 * lz + M_LN2, 1e-13);
    }
}

static void
test_errors (void)
{
  holent_geo_bg bg, bc;
  holent_ewcs_result r;
  double pt[3];
  double A[2] = { 0, 1 }, B[2] = { 2, 3 };
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 0, 1e-6, 0, 0, 0, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_geo_bg_init (&bc, HOLENT_BULK_GLOBAL_ADS, 6, 1e-6, 0, 0, 0, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_ewcs_pair (NULL, A, B, &r), HOLENT_EINVAL);
  HT_STATUS (holent_ewcs_pair (&bg, NULL, B, &r), HOLENT_EINVAL);
  HT_STATUS (holent_ewcs_pair (&bg, A, NULL, &r), HOLENT_EINVAL);
  HT_STATUS (holent_ewcs_pair (&bg, A, B, NULL), HOLENT_EINVAL);
  {
    double An[2] = { 0, NAN }, Bi[2] = { INFINITY, 3 };
    HT_STATUS (holent_ewcs_pair (&bg, An, B, &r), HOLENT_EINVAL);
    HT_STATUS (holent_ewcs_pair (&bg, A, Bi, &r), HOLENT_EINVAL);
  }
  /* unsupported and invalid bulks */
  {
    holent_geo_bg bu;
    const holent_bulk uns[3] = { HOLENT_BULK_BTZ, HOLENT_BULK_ROTATING_BTZ,
                                 HOLENT_BULK_CONICAL_DEFECT };
    for (int k = 0; k < 3; k++)
      {
        HT_STATUS (holent_geo_bg_init (&bu, uns[k], 6, 1e-6, 1, 2, 0.5, 1), HOLENT_SUCCESS);
        HT_STATUS (holent_ewcs_pair (&bu, A, B, &r), HOLENT_EUNSUP);
        HT_STATUS (holent_ewcs_geodesic_point (&bu, 0, 1, 0, pt), HOLENT_EUNSUP);
      }
    bu = bg;
    bu.bulk = (holent_bulk) 42;
    HT_STATUS (holent_ewcs_pair (&bu, A, B, &r), HOLENT_EINVAL);
    HT_STATUS (holent_ewcs_geodesic_point (&bu, 0, 1, 0, pt), HOLENT_EINVAL);
  }
  /* line: reversed, empty, overlapping, nested, touching (both orders) */
  {
    double Ar[2] = { 1, 0 }, Ae[2] = { 1, 1 }, Bo[2] = { 0.5, 3 };
    double Bn[2] = { 0.2, 0.4 }, Bt[2] = { 1, 3 }, Bl[2] = { -2, 0 };
    HT_STATUS (holent_ewcs_pair (&bg, Ar, B, &r), HOLENT_EDOM);
    HT_STATUS (holent_ewcs_pair (&bg, A, Ar, &r), HOLENT_EDOM);
    HT_STATUS (holent_ewcs_pair (&bg, Ae, B, &r), HOLENT_EEMPTY);
    HT_STATUS (holent_ewcs_pair (&bg, A, Ae, &r), HOLENT_EEMPTY);
    HT_STATUS (holent_ewcs_pair (&bg, A, Bo, &r), HOLENT_EOVERLAP);
    HT_STATUS (holent_ewcs_pair (&bg, Bo, A, &r), HOLENT_EOVERLAP);
    HT_STATUS (holent_ewcs_pair (&bg, A, Bn, &r), HOLENT_EOVERLAP);
    HT_STATUS (holent_ewcs_pair (&bg, A, Bt, &r), HOLENT_ECOINCIDE);
    HT_STATUS (holent_ewcs_pair (&bg, A, Bl, &r), HOLENT_ECOINCIDE);
  }
  /* circle: whole circle, more than it, zero length mod L, overlap at
     either end, touching at either end */
  {
    double Aw[2] = { 1, 7 }, Am[2] = { 1, 8 }, Az[2] = { 1, 1 - 6 };
    double Bo1[2] = { 0.5, 1.5 }, Bo2[2] = { 3, 6.5 }, Bt1[2] = { 1, 2 };
    double Bt2[2] = { 3, 6 }, Bs[2] = { 0, 0.5 }, Bw[2] = { 5, 0.5 };
    HT_STATUS (holent_ewcs_pair (&bc, Aw, B, &r), HOLENT_EDOM);
    HT_STATUS (holent_ewcs_pair (&bc, Am, B, &r), HOLENT_EDOM);
    HT_STATUS (holent_ewcs_pair (&bc, Az, B, &r), HOLENT_EEMPTY);
    HT_STATUS (holent_ewcs_pair (&bc, A, Bo1, &r), HOLENT_EOVERLAP);
    HT_STATUS (holent_ewcs_pair (&bc, A, Bo2, &r), HOLENT_EOVERLAP);
    HT_STATUS (holent_ewcs_pair (&bc, A, Bt1, &r), HOLENT_ECOINCIDE);
    HT_STATUS (holent_ewcs_pair (&bc, A, Bt2, &r), HOLENT_ECOINCIDE);
    HT_STATUS (holent_ewcs_pair (&bc, A, Bs, &r), HOLENT_EOVERLAP);
    HT_STATUS (holent_ewcs_pair (&bc, A, Bw, &r), HOLENT_EOVERLAP);
    double Ae2[2] = { 2, 2 }, Bjust[2] = { 1 - 1e-15, 3 };
    HT_STATUS (holent_ewcs_pair (&bc, Ae2, B, &r), HOLENT_EEMPTY);
    HT_STATUS (holent_ewcs_pair (&bc, A, Ae2, &r), HOLENT_EEMPTY);
    /* B starting a rounding error before A: the same start, overlap */
    double A1[2] = { 1, 2 };
    HT_STATUS (holent_ewcs_pair (&bc, A1, Bjust, &r), HOLENT_EOVERLAP);
    /* B written as wrapping through 0 and disjoint: fine */
    double Bok[2] = { 5, 5.5 - 6 };
    HT_STATUS (holent_ewcs_pair (&bc, A, Bok, &r), HOLENT_SUCCESS);
  }
  /* the point helper */
  HT_STATUS (holent_ewcs_geodesic_point (NULL, 0, 1, 0, pt), HOLENT_EINVAL);
  HT_STATUS (holent_ewcs_geodesic_point (&bg, 0, 1, 0, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_ewcs_geodesic_point (&bg, NAN, 1, 0, pt), HOLENT_EINVAL);
  HT_STATUS (holent_ewcs_geodesic_point (&bg, 0, 1, INFINITY, pt), HOLENT_EINVAL);
  HT_STATUS (holent_ewcs_geodesic_point (&bg, -DBL_MAX, DBL_MAX, 0, pt), HOLENT_EINVAL);
  HT_STATUS (holent_ewcs_geodesic_point (&bg, 1, 1, 0, pt), HOLENT_ECOINCIDE);
  HT_STATUS (holent_ewcs_geodesic_point (&bc, 1, 7, 0, pt), HOLENT_ECOINCIDE);
  HT_STATUS (holent_ewcs_geodesic_point (&bc, 1, 4, 0, pt), HOLENT_SUCCESS);
  /* a geodesic through the centre of global AdS: r = (2 pi/L) |sinh s| */
  HT_CLOSE (pt[2], 0.0, 1e-15);
  HT_STATUS (holent_ewcs_geodesic_point (&bc, 1, 4, 0.7, pt), HOLENT_SUCCESS);
  HT_CLOSE (pt[2], 2 * M_PI / 6 * sinh (0.7), 1e-14);
  HT_CLOSE (pt[1], 1.0, 1e-14);
}

/* The reasons of holent_ewcs_check: which argument, which words.  */
static void
test_reasons (void)
{
  holent_geo_bg bg;
  holent_err e;
  const double A[2] = { 0, 1 }, B[2] = { 0.5, 2 }, C[2] = { 1, 2 };
  const double R[2] = { 3, 2 }, Z[2] = { 3, 3 }, N[2] = { NAN, 1 };
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 0, 1e-6, 0, 0, 1, 3), HOLENT_SUCCESS);
  HT_STATUS (holent_ewcs_check (&bg, A, B, &e), HOLENT_EOVERLAP);
  HT_CHECK (e.arg == 2 && strstr (e.reason, "A and B overlap"), "%d %s", e.arg, e.reason);
  HT_STATUS (holent_ewcs_check (&bg, A, C, &e), HOLENT_ECOINCIDE);
  HT_CHECK (strstr (e.reason, "touch") != NULL, "%s", e.reason);
  HT_STATUS (holent_ewcs_check (&bg, A, R, &e), HOLENT_EDOM);
  HT_CHECK (e.arg == 2 && strstr (e.reason, "start < end"), "%d %s", e.arg, e.reason);
  HT_STATUS (holent_ewcs_check (&bg, Z, C, &e), HOLENT_EEMPTY);
  HT_CHECK (e.arg == 1, "arg %d", e.arg);
  HT_STATUS (holent_ewcs_check (&bg, N, C, &e), HOLENT_ENAN);
  HT_STATUS (holent_ewcs_check (&bg, A, Z, NULL), HOLENT_EEMPTY);
  HT_STATUS (holent_ewcs_check (&bg, A, (const double[2]) { 3, 4 }, &e), HOLENT_SUCCESS);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_BTZ, 2 * M_PI, 1e-6, 1, 1, 1, 3), HOLENT_SUCCESS);
  HT_STATUS (holent_ewcs_check (&bg, A, R, &e), HOLENT_EUNSUP);
  HT_CHECK (e.arg == 0 && strstr (e.reason, "'btz'"), "%d %s", e.arg, e.reason);
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_GLOBAL_ADS, 2 * M_PI, 1e-6, 1, 1, 1, 3), HOLENT_SUCCESS);
  HT_STATUS (holent_ewcs_check (&bg, A, (const double[2]) { 2, 2 + 2 * M_PI }, &e), HOLENT_EDOM);
  HT_CHECK (strstr (e.reason, "shorter than the circle") != NULL, "%s", e.reason);
}

int
main (void)
{
  test_reasons ();
  test_errors ();
  test_asinh ();
  test_poincare ();
  test_circle ();
  test_btz ();
  return HT_DONE ();
}
