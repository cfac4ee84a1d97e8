/* Unit tests of holent_tfd.  Independent checks: the bridge length
 * extremised numerically (GSL Brent minimisers) over the crossing point
 * on the shock, with each leg the embedding distance acosh(-X.Y) of the
 * Kruskal embedding of BTZ, and the crossing point of
 * holent_tfd_shock_crossing stationary for that sum; the published
 * limits of Hartman and Maldacena 2013 (JHEP 05 (2013) 014:
 * 2 log((beta/(pi eps)) cosh(2 pi t/beta))) and Shenker and Stanford 2014 (JHEP 03 (2014) 067: 2
 * log(beta/(pi eps)) + 2 log(1 + alpha/2), from memory); the shock shift
 * from the exact matching of r across a null shell; M against the first
 * law with the Bekenstein-Hawking entropy of holent_geo; the region
 * minimiser against brute force.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_min.h>
#include "holent_ctest.h"
#include "holent_tfd.h"
#include "holent_hrt.h"

/* Kruskal embedding of planar BTZ (R = 2 pi/beta, ell = 1).  */
static void
kr_point (double R, double u, double v, double x, double X[4])
{
  double d = 1.0 + u * v;
  X[0] = (1.0 - u * v) / d * cosh (R * x);
  X[1] = (1.0 - u * v) / d * sinh (R * x);
  X[2] = (v - u) / d;
  X[3] = (v + u) / d;
}

static double
kr_dist (const double X[4], const double Y[4])
{
  return acosh (X[0] * Y[0] - X[1] * Y[1] - X[2] * Y[2] + X[3] * Y[3]);
}

/* The cutoff point of a boundary point: side 1 right, 0 left.  */
static void
kr_boundary (double R, double eps, int side, double x, double t, double X[4])
{
  double r = 1.0 / eps + R * R * eps / 4.0;  /* FG cutoff, doc section 1 */
  double q = sqrt ((r - R) / (r + R));
  if (side)
    kr_point (R, -exp (-R * t) * q, exp (R * t) * q, x, X);
  else
    kr_point (R, exp (R * t) * q, -exp (-R * t) * q, x, X);
}

typedef struct
{
  double R, eps, alpha, xL, tL, xR, tR, x;
} ex_par;

/* Sum of the two legs through the shock point (u = 0, v, x); the left
   leg sees v + alpha.  Minus it, for the minimiser that maximises.  */
static double
legs (double v, void *p)
{
  const ex_par *e = p;
  double B[4], P[4], Q[4], C[4];
  kr_boundary (e->R, e->eps, 1, e->xR, e->tR, B);
  kr_point (e->R, 0.0, v, e->x, P);
  kr_point (e->R, 0.0, v + e->alpha, e->x, Q);
  kr_boundary (e->R, e->eps, 0, e->xL, e->tL, C);
  return -(kr_dist (B, P) + kr_dist (Q, C));
}

static double
minimise (double (*f) (double, void *), void *p, double lo, double hi,
          double guess)
{
  gsl_function F = { f, p };
  gsl_min_fminimizer *s = gsl_min_fminimizer_alloc (gsl_min_fminimizer_brent);
  double m = guess;
  if (gsl_min_fminimizer_set (s, &F, m, lo, hi) != GSL_SUCCESS)
    {
      gsl_min_fminimizer_free (s);
      return NAN;
    }
  for (int it = 0; it < 200; it++)
    {
      gsl_min_fminimizer_iterate (s);
      m = gsl_min_fminimizer_x_minimum (s);
      if (gsl_min_test_interval (gsl_min_fminimizer_x_lower (s),
                                 gsl_min_fminimizer_x_upper (s), 1e-13, 0)
          == GSL_SUCCESS)
        break;
    }
  double v = gsl_min_fminimizer_f_minimum (s);
  gsl_min_fminimizer_free (s);
  (void) m;
  return v;
}

/* Maximise over v (a timelike direction on the null shock), for a given
   x: the legs must stay spacelike, so v is bounded on both sides.  */
static double
over_v (double x, void *p)
{
  ex_par *e = p;
  e->x = x;
  /* Bracket: scan for a good interior point.  */
  double best = INFINITY, vb = 0.0;
  for (double v = -60; v <= 60; v += 0.01)
    {
      double f = legs (v, e);
      if (isfinite (f) && f < best)
        {
          best = f;
          vb = v;
        }
    }
  return -minimise (legs, e, vb - 0.01, vb + 0.01, vb);
}

static double
extremal_length (ex_par *e)
{
  /* Minimise the maximum over x (spacelike direction).  */
  double best = INFINITY, xb = 0.0;
  for (double x = -3; x <= 3; x += 0.1)
    {
      double f = over_v (x, e);
      if (f < best)
        {
          best = f;
          xb = x;
        }
    }
  return minimise (over_v, e, xb - 0.1, xb + 0.1, xb);
}

/* Two-sided BTZ on a circle of circumference L is the planar one with
   x ~ x + L (Banados, Henneaux, Teitelboim and Zanelli 1993, PRD 48,
   1506): the bridge geodesic of winding n joins the left point to the
   image x_R + n L of the right one, at the embedding distance
   acosh(-X.Y) (FG cutoff: agrees with the regulated length to O(eps^2)).
   The left point sits at x = 0 (a boost of the X0-X1 plane), so the
   inner product has no cancellation.  */
static void
test_winding (void)
{
  holent_tfd_bg b;
  const double eps = 1e-6, L = 3.0;
  static const double cases[][4] = {
    /* beta, xR, tL, tR */
    { 2.0, 0.4, 0.3, 0.1 }, { 1.0, 2.9, -0.2, 0.7 }, { 4.0, 1.5, 0.0, 0.0 },
    { 0.7, 0.1, 1.1, -0.4 }
  };
  for (size_t k = 0; k < 4; k++)
    {
      const double *c = cases[k], R = 2 * M_PI / c[0];
      HT_STATUS (holent_tfd_init (&b, 1, L, eps, c[0], 1.0, 0.0),
                 HOLENT_SUCCESS);
      for (long n = -2; n <= 2; n++)
        {
          double X[4], Y[4], len;
          kr_boundary (R, eps, 0, 0.0, c[2], X);
          kr_boundary (R, eps, 1, c[1] + n * L, c[3], Y);
          HT_STATUS (holent_tfd_cross_length_winding (&b, 0.0, c[2], c[1],
                                                      c[3], n, &len),
                     HOLENT_SUCCESS);
          double emb = kr_dist (X, Y);
          HT_CHECK (fabs (len - emb) < 1e-9 * emb,
                    "case %zu winding %ld: %.15g vs %.15g", k, n, len, emb);
          /* a common shift of x changes nothing */
          double l2;
          HT_STATUS (holent_tfd_cross_length_winding (&b, 1.7, c[2],
                                                      c[1] + 1.7, c[3], n,
                                                      &l2),
                     HOLENT_SUCCESS);
          HT_CLOSE (l2, len, 1e-12);
        }
    }
  double len;
  HT_STATUS (holent_tfd_init (&b, 0, 0.0, eps, 1.0, 1.0, 0.0),
             HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_cross_length_winding (&b, 0, 0, 1, 0, 1, &len),
             HOLENT_EDOM);
  HT_STATUS (holent_tfd_cross_length_winding (&b, 0, 0, 1, 0, 0, &len),
             HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_cross_length_winding (&b, 0, NAN, 1, 0, 0, &len),
             HOLENT_EINVAL);
  HT_STATUS (holent_tfd_cross_length_winding (NULL, 0, 0, 1, 0, 0, &len),
             HOLENT_EINVAL);
}

/* The annulus (both sides of the circle): purity of the thermofield
   double, S(A) = S(A^c) with the complement on both sides, and S(A_L u
   whole right) = S(A_L^c) one-sided (common practice); the whole of both
   sides: 0; the poll; Hartman-Maldacena growth while l << L.  */
static void
test_annulus (void)
{
  holent_tfd_bg b;
  holent_tfd_workspace *w = holent_tfd_workspace_alloc (6);
  holent_rt_result r1, r2;
  size_t nc;
  const double L = 5.0, eps = 1e-3;
  HT_STATUS (holent_tfd_init (&b, 1, L, eps, 1.3, 3.0, 0.4), HOLENT_SUCCESS);
  double la[2] = { 0.3, 2.0 }, lb[2] = { 1.1, 4.2 };
  double ra[2] = { 0.9, 3.1 }, rb[2] = { 2.5, 4.4 };
  double lca[2] = { 1.1, 4.2 }, lcb[2] = { 2.0, 5.3 };
  double rca[2] = { 2.5, 4.4 }, rcb[2] = { 3.1, 5.9 };
  double tl[2] = { 0.05, -0.1 }, tlb[2] = { 0.2, 0.0 };
  double tr[2] = { 0.1, 0.0 }, trb[2] = { -0.1, 0.15 };
  /* complement rows carry the times of their endpoints */
  double tlc[2] = { 0.2, 0.0 }, tlcb[2] = { -0.1, 0.05 };
  double trc[2] = { -0.1, 0.15 }, trcb[2] = { 0.0, 0.1 };
  holent_tfd_side A_L = { 2, la, lb, tl, tlb }, A_R = { 2, ra, rb, tr, trb };
  holent_tfd_side C_L = { 2, lca, lcb, tlc, tlcb };
  holent_tfd_side C_R = { 2, rca, rcb, trc, trcb };
  for (double t = 0.0; t < 3.0; t += 0.4)
    {
      HT_STATUS (holent_tfd_entropy (w, &b, &A_L, &A_R, t, &r1, &nc, NULL,
                                     NULL), HOLENT_SUCCESS);
      HT_STATUS (holent_tfd_entropy (w, &b, &C_L, &C_R, t, &r2, NULL, NULL,
                                     NULL), HOLENT_SUCCESS);
      HT_CLOSE (r1.S, r2.S, 1e-12);
      HT_CHECK (r1.m == 4 && r1.candidates > 0, "m %zu", r1.m);
    }
  double wa[1] = { 0.0 }, wb[1] = { L }, z[1] = { 0.0 };
  holent_tfd_side W = { 1, wa, wb, z, z };
  holent_tfd_side one_L = { 1, la, lb, tl, tlb };
  double ca[1] = { 1.1 }, cb[1] = { 0.3 + L }, cta[1] = { 0.2 },
    ctb[1] = { 0.05 };
  holent_tfd_side comp_L = { 1, ca, cb, cta, ctb };
  holent_tfd_side E0 = { 0, NULL, NULL, NULL, NULL };
  HT_STATUS (holent_tfd_entropy (w, &b, &one_L, &W, 0.3, &r1, &nc, NULL,
                                 NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_entropy (w, &b, &comp_L, &E0, 0.3, &r2, NULL, NULL,
                                 NULL), HOLENT_SUCCESS);
  HT_CLOSE (r1.S, r2.S, 1e-12);
  HT_CHECK (nc == 0, "no bridge to a whole side");
  HT_STATUS (holent_tfd_entropy (w, &b, &W, &W, 0.0, &r1, &nc, NULL, NULL),
             HOLENT_SUCCESS);
  HT_CHECK (r1.S == 0.0 && !r1.horizon, "whole u whole: %g", r1.S);
  HT_STATUS (holent_tfd_entropy (w, &b, &W, &E0, 0.0, &r1, &nc, NULL, NULL),
             HOLENT_SUCCESS);
  HT_CLOSE (r1.S, b.side.S_BH, 1e-14);
  /* Hartman and Maldacena 2013 while l << L: the line's values.  */
  HT_STATUS (holent_tfd_init (&b, 1, 40.0, eps, 1.0, 3.0, 0.0),
             HOLENT_SUCCESS);
  double a0[1] = { 0.0 }, b0[1] = { 2.0 };
  holent_tfd_side I = { 1, a0, b0, z, z };
  for (double t = 0; t < 2; t += 0.25)
    {
      HT_STATUS (holent_tfd_entropy (w, &b, &I, &I, t, &r1, &nc, NULL, NULL),
                 HOLENT_SUCCESS);
      double conn = 2 * log (1.0 / (M_PI * eps) * cosh (2 * M_PI * t));
      double disc = 2 * log (1.0 / (M_PI * eps) * sinh (2 * M_PI));
      HT_CLOSE (r1.S, fmin (conn, disc), 1e-12);
      HT_CHECK (nc == (conn < disc ? 2u : 0u), "ncross %zu at t %g", nc, t);
    }
  double ts;
  HT_STATUS (holent_tfd_mi_zero (w, &b, &I, &I, 10.0, &ts), HOLENT_SUCCESS);
  HT_CLOSE (ts, acosh (sinh (2 * M_PI)) / (2 * M_PI), 1e-10);
  /* A_L = A_R longer than L/2: the geodesics over both complements keep
     I > 0 without the bridge, at every time and shock.  */
  HT_STATUS (holent_tfd_init (&b, 1, 6.0, eps, 1.0, 3.0, 0.0),
             HOLENT_SUCCESS);
  double b4[1] = { 4.0 }, al;
  holent_tfd_side J = { 1, a0, b4, z, z };
  HT_STATUS (holent_tfd_mi_zero (w, &b, &J, &J, -1.0, &ts), HOLENT_SUCCESS);
  HT_CHECK (isinf (ts), "l > L/2: never, got %g", ts);
  HT_STATUS (holent_tfd_scrambling (w, &b, &J, &J, 1e-6, &al, &ts),
             HOLENT_SUCCESS);
  HT_CHECK (isinf (al) && isinf (ts), "l > L/2: %g %g", al, ts);
  HT_STATUS (holent_tfd_mi_zero (w, &b, &I, &I, -1.0, &ts), HOLENT_SUCCESS);
  HT_CLOSE (ts, acosh (sinh (2 * M_PI)) / (2 * M_PI), 1e-10);
  int calls = 1;  /* stop at once */
  holent_poll stop = { ht_stop_second, &calls };
  HT_STATUS (holent_tfd_workspace_set_poll (w, &stop), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_entropy (w, &b, &I, &I, 0.0, &r1, &nc, NULL, NULL),
             HOLENT_EINTR);
  HT_STATUS (holent_tfd_workspace_set_poll (w, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_entropy (w, &b, &I, &I, 0.0, &r1, &nc, NULL, NULL),
             HOLENT_SUCCESS);
  holent_tfd_workspace_free (w);
}

/* Embedding distance of two boundary points (side, x, t) of the covering
   planar BTZ, first brought by isometries to x = 0 and to symmetric
   times (the Killing time moves right times forward and forward left
   times back), so that the inner product does not cancel.  */
static double
kr_pair (double R, double eps, int s1, double x1, double t1, int s2,
         double x2, double t2)
{
  double X[4], Y[4];
  if (s1 == s2)
    {
      double t0 = 0.5 * (t1 + t2);
      t1 -= t0;
      t2 -= t0;
    }
  else
    {
      double h = 0.5 * (t1 - t2) * (s1 ? 1.0 : -1.0);   /* half of tR - tL */
      t1 -= h * (s1 ? 1.0 : -1.0);
      t2 -= h * (s2 ? 1.0 : -1.0);
    }
  kr_boundary (R, eps, s1, 0.0, t1, X);
  kr_boundary (R, eps, s2, x2 - x1, t2, Y);
  return kr_dist (X, Y);
}

/* Parity of the crossings of the lifted curve from (s1, a) to (s2, b)
   with the lifts (left pL + kL, right pR + kL) of a reference path from
   A^c on the left to A^c on the right (doc/tfd_shock.md, section 3).  */
static int
ref_parity (int s1, double a, int s2, double b, double pL, double pR,
            double L)
{
  int n = 0;
  for (int k = -8; k <= 8; k++)
    {
      if (s1 == s2)
        {
          double p = (s1 ? pR : pL) + k * L;
          n += p > fmin (a, b) && p < fmax (a, b);
        }
      else
        {
          double l = s1 ? b : a, r = s1 ? a : b;
          n += (l - pL - k * L) * (r - pR - k * L) < 0.0;
        }
    }
  return n & 1;
}

/* n random disjoint intervals on a circle (rows may wrap), times small
   enough for an achronal side; *p a point of the complement.  */
static void
rand_side (size_t n, double L, double *a, double *b, double *ta,
           double *tb, double *p)
{
  double x[8], sep;
  do
    {
      for (size_t i = 0; i < 2 * n; i++)
        x[i] = L * rand () / (RAND_MAX + 1.0);
      for (size_t i = 1; i < 2 * n; i++)   /* insertion sort */
        for (size_t j = i; j > 0 && x[j - 1] > x[j]; j--)
          {
            double q = x[j];
            x[j] = x[j - 1];
            x[j - 1] = q;
          }
      sep = x[0] + L - x[2 * n - 1];
      for (size_t i = 1; i < 2 * n; i++)
        sep = fmin (sep, x[i] - x[i - 1]);
    }
  while (sep < 0.03 * L);
  int comp = rand () & 1;   /* the complement's rows: one wraps */
  for (size_t i = 0; i < n; i++)
    {
      size_t k = 2 * i + comp;
      a[i] = x[k];
      b[i] = k + 1 < 2 * n ? x[k + 1] : x[0] + L;
      ta[i] = 0.9 * sep * (rand () / (RAND_MAX + 1.0) - 0.5);
      tb[i] = 0.9 * sep * (rand () / (RAND_MAX + 1.0) - 0.5);
    }
  *p = 0.5 * (b[0] + (n > 1 ? a[1] : a[0] + L));
}

/* The annulus' minimiser (holent_tfd_minimiser) for random two-sided
   regions with times: every endpoint used once, the sum of its pieces'
   lengths (within a side over the recorded arc, through the bridge at
   the recorded winding), each the embedding distance acosh(-X.Y) of the
   covering planar BTZ (Banados, Henneaux, Teitelboim and Zanelli 1993,
   PRD 48, 1506), plus the horizon's R L when it is used, is the minimum;
   bridges join endpoints of one kind, and the Z2 homology holds (an
   even number of crossings with a reference path, common practice).  */
static void
test_annulus_conf (void)
{
  holent_tfd_bg b;
  holent_tfd_workspace *w = holent_tfd_workspace_alloc (6);
  holent_tfd_config cf;
  holent_rt_result res;
  size_t nc;
  const double eps = 1e-6, c = 3.0;
  int nbridge = 0, nhor = 0, nwind = 0, bad = 0;
  srand (11);
  for (int trial = 0; trial < 300; trial++)
    {
      double beta = 0.5 + 2.0 * rand () / (RAND_MAX + 1.0);
      double L = trial % 3 ? 1.0 + 6.0 * rand () / (RAND_MAX + 1.0)
                           : 0.3 + 1.0 * rand () / (RAND_MAX + 1.0);
      double R = 2.0 * M_PI / beta;
      double dt = 1.2 * beta * pow (rand () / (RAND_MAX + 1.0), 2);
      double a[2][4], bb[2][4], ta[2][4], tb[2][4], p[2];
      size_t n[2] = { 1 + rand () % 3, 1 + rand () % 3 };
      HT_STATUS (holent_tfd_init (&b, 1, L, eps, beta, c, 0.0),
                 HOLENT_SUCCESS);
      for (int s = 0; s < 2; s++)
        rand_side (n[s], L, a[s], bb[s], ta[s], tb[s], &p[s]);
      holent_tfd_side sl = { n[0], a[0], bb[0], ta[0], tb[0] };
      holent_tfd_side sr = { n[1], a[1], bb[1], ta[1], tb[1] };
      int st = holent_tfd_entropy (w, &b, &sl, &sr, dt, &res, &nc, NULL,
                                   NULL);
      HT_STATUS (st, HOLENT_SUCCESS);
      HT_STATUS (holent_tfd_minimiser (w, &cf), HOLENT_SUCCESS);
      if (st || cf.npts != 2 * (n[0] + n[1]))
        {
          bad++;
          continue;
        }
      size_t m = cf.npts / 2, used[16] = { 0 }, ncr = 0;
      double len = 0.0;
      int par = cf.horizon;
      for (size_t k = 0; k < m; k++)
        {
          size_t i = cf.pairs[2 * k], j = cf.pairs[2 * k + 1];
          used[i]++;
          used[j]++;
          int si = cf.side[i], sj = cf.side[j];
          double x1, x2, t1, t2;
          if (si == sj)
            {
              /* over the recorded arc, from the endpoint it starts at */
              size_t lo = cf.x[i] < cf.x[j] ? i : j, hi = i + j - lo;
              double d = cf.x[hi] - cf.x[lo], arc = cf.arcs[k];
              int fwd = fabs (arc - d) < fabs (arc - (L - d));
              x1 = fwd ? cf.x[lo] : cf.x[hi];
              t1 = fwd ? cf.t[lo] : cf.t[hi];
              t2 = fwd ? cf.t[hi] : cf.t[lo];
              x2 = x1 + arc;
              bad += cf.winding[k] != 0 || !(arc > 0.0 && arc < L);
            }
          else
            {
              size_t l = si ? j : i, r = i + j - l;
              x1 = cf.x[l];
              t1 = cf.t[l];
              x2 = cf.x[r] + cf.winding[k] * L;
              t2 = cf.t[r];
              si = 0;
              sj = 1;
              ncr++;
              /* the shortest winding would reduce to [-L/2, L/2] */
              nwind += fabs (x2 - x1) > 0.5 * L * (1.0 + 1e-9);
              /* both ends of one kind: starts of intervals or ends */
              int kind[2];
              for (int q = 0; q < 2; q++)
                {
                  double x = q ? cf.x[r] : cf.x[l];
                  kind[q] = 0;
                  for (size_t u = 0; u < n[q]; u++)
                    kind[q] |= fabs (remainder (x - a[q][u], L)) < 1e-12;
                }
              HT_CHECK (kind[0] == kind[1], "trial %d: bridge of two kinds",
                        trial);
            }
          len += kr_pair (R, eps, si, x1, t1, sj, x2, t2);
          par += ref_parity (si, x1, sj, x2, p[0], p[1], L);
        }
      for (size_t i = 0; i < cf.npts; i++)
        bad += used[i] != 1;
      HT_CHECK (nc == ncr, "trial %d: crossings %zu vs %zu", trial, nc, ncr);
      HT_CHECK (cf.horizon == res.horizon
                && (cf.horizon ? cf.horizon_side == 0
                                 || cf.horizon_side == 1
                               : cf.horizon_side == -1),
                "trial %d: horizon %d side %d", trial, cf.horizon,
                cf.horizon_side);
      HT_CHECK (par % 2 == 0, "trial %d: odd crossings with the reference "
                "path", trial);
      double S = c / 6.0 * len + (cf.horizon ? c / 6.0 * R * L : 0.0);
      HT_CHECK (fabs (S - res.S) <= 1e-9 * fabs (res.S),
                "trial %d: pieces %.15g, minimum %.15g", trial, S, res.S);
      nbridge += ncr > 0;
      nhor += cf.horizon;
    }
  HT_CHECK (bad == 0, "%d malformed configurations", bad);
  /* every kind occurs: bridges, non-shortest windings, the horizon */
  HT_CHECK (nbridge > 50 && nwind > 0 && nhor > 5,
            "bridges %d, long windings %d, horizons %d", nbridge, nwind, nhor);
  /* two whole sides: no endpoints, no horizon */
  double wa[1] = { 0.0 }, wb[1] = { 2.0 }, z[1] = { 0.0 };
  HT_STATUS (holent_tfd_init (&b, 1, 2.0, eps, 1.0, c, 0.0), HOLENT_SUCCESS);
  holent_tfd_side W = { 1, wa, wb, z, z };
  HT_STATUS (holent_tfd_entropy (w, &b, &W, &W, 0.0, &res, &nc, NULL, NULL),
             HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_minimiser (w, &cf), HOLENT_SUCCESS);
  HT_CHECK (cf.npts == 0 && !cf.horizon, "whole u whole: %zu", cf.npts);
  const double *x, *t, *arcs;
  const int *side;
  const size_t *pairs;
  size_t np;
  HT_STATUS (holent_tfd_configuration (w, &np, &x, &t, &side, &pairs, &arcs),
             HOLENT_EEMPTY);
  /* A_L and the whole right: the face of the right hole lies in A_R, so
     S = S(A_L^c) one-sided: the complement's geodesic, no horizon, or
     the geodesic of A_L with the horizon counted on the right */
  double la[1] = { 0.2 }, lb[1] = { 1.5 };
  holent_tfd_side I = { 1, la, lb, z, z };
  HT_STATUS (holent_tfd_entropy (w, &b, &I, &W, 0.0, &res, &nc, NULL, NULL),
             HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_minimiser (w, &cf), HOLENT_SUCCESS);
  HT_CHECK (cf.npts == 2 && cf.side[0] == 0 && cf.winding[0] == 0,
            "A_L u whole right: %zu points", cf.npts);
  HT_CHECK (cf.horizon ? cf.horizon_side == 1 : cf.horizon_side == -1,
            "the horizon belongs to the whole side: %d", cf.horizon_side);
  HT_STATUS (holent_tfd_configuration (w, &np, &x, &t, &side, &pairs, &arcs),
             HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_minimiser (NULL, &cf), HOLENT_EINVAL);
  HT_STATUS (holent_tfd_minimiser (w, NULL), HOLENT_EINVAL);
  holent_tfd_workspace *w2 = holent_tfd_workspace_alloc (2);
  HT_STATUS (holent_tfd_minimiser (w2, &cf), HOLENT_EEMPTY);
  holent_tfd_workspace_free (w2);
  holent_tfd_workspace_free (w);
}

static void
test_cross (void)
{
  holent_tfd_bg b;
  double beta = 2.0 * M_PI, eps = 1e-4, len;  /* R = 1 */
  HT_STATUS (holent_tfd_init (&b, 0, 0, eps, beta, 1.0, 0.0), HOLENT_SUCCESS);
  /* Hartman and Maldacena 2013.  */
  for (double t = 0; t < 3; t += 0.7)
    {
      HT_STATUS (holent_tfd_cross_length (&b, 0.3, t, 0.3, t, &len), HOLENT_SUCCESS);
      HT_CLOSE (len, 2 * log (beta / (M_PI * eps) * cosh (2 * M_PI * t / beta)), 1e-13);
    }
  /* Shenker and Stanford 2014.  */
  HT_STATUS (holent_tfd_init (&b, 0, 0, eps, beta, 1.0, 3.0), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_cross_length (&b, 0, 0, 0, 0, &len), HOLENT_SUCCESS);
  HT_CLOSE (len, 2 * log (beta / (M_PI * eps)) + 2 * log (1 + 1.5), 1e-13);
  /* Numerical extremisation over the crossing point (general case).  */
  static const double cases[][5] = {
    /* alpha, xL, tL, xR, tR */
    { 0.0, 0.0, 0.4, 0.7, 0.1 }, { 2.0, 0.2, 0.0, -0.5, 0.3 },
    { 0.5, 0.0, -0.3, 1.2, 0.8 }
  };
  for (size_t k = 0; k < 3; k++)
    {
      const double *c = cases[k];
      ex_par e = { 1.0, eps, c[0], c[1], c[2], c[3], c[4], 0.0 };
      HT_STATUS (holent_tfd_init (&b, 0, 0, eps, beta, 1.0, c[0]), HOLENT_SUCCESS);
      HT_STATUS (holent_tfd_cross_length (&b, c[1], c[2], c[3], c[4], &len), HOLENT_SUCCESS);
      double num = extremal_length (&e);
      HT_CHECK (fabs (len - num) < 1e-7 * len, "case %zu: %.12g vs %.12g", k, len, num);
    }
  /* Circle: the shortest winding.  */
  double l2;
  HT_STATUS (holent_tfd_init (&b, 1, 10.0, eps, 2.0, 1.0, 0.0), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_cross_length (&b, 0.5, 0.1, 9.5, 0.2, &len), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_cross_length (&b, 0.5, 0.1, -0.5, 0.2, &l2), HOLENT_SUCCESS);
  HT_CLOSE (len, l2, 1e-12);
  /* Errors.  */
  HT_STATUS (holent_tfd_init (&b, 0, 0, eps, beta, 1.0, -1.0), HOLENT_EDOM);
  HT_STATUS (holent_tfd_init (&b, 0, 0, eps, beta, 1.0, NAN), HOLENT_EINVAL);
  HT_STATUS (holent_tfd_init (&b, 0, 0, eps, -1.0, 1.0, 0.0), HOLENT_EDOM);
  HT_STATUS (holent_tfd_init (&b, 0, 0, eps, beta, 1.0, INFINITY), HOLENT_EDOM);
  HT_STATUS (holent_tfd_cross_length (&b, NAN, 0, 0, 0, &len), HOLENT_EINVAL);
  HT_STATUS (holent_tfd_cross_length (NULL, 0, 0, 0, 0, &len), HOLENT_EINVAL);
}

/* The crossing point on the shock (holent_tfd_shock_crossing) is the
   stationary point of the sum of the two legs, each the embedding
   distance acosh(-X.Y) to the cutoff point (Banados, Henneaux, Teitelboim
   and Zanelli 1993 for the embedding): central differences in v and x
   vanish, the sum is a maximum along the null shock (v) and its maximum
   over v a minimum in x; its value is the bridge length.  */
static void
test_crossing (void)
{
  const double eps = 1e-6, beta = 2 * M_PI, h = 1e-4;   /* R = 1 */
  static const double cases[][5] = {
    /* alpha, xL, tL, xR, tR */
    { 0.0, 0.0, 0.4, 0.7, 0.1 }, { 2.0, 0.2, 0.0, -0.5, 0.3 },
    { 0.5, 0.0, -0.3, 1.2, 0.8 }, { 7.0, 1.0, 1.5, 1.0, -0.5 }
  };
  holent_tfd_bg b;
  double x, v, len;
  for (size_t k = 0; k < 4; k++)
    {
      const double *c = cases[k];
      HT_STATUS (holent_tfd_init (&b, 0, 0, eps, beta, 1.0, c[0]), HOLENT_SUCCESS);
      HT_STATUS (holent_tfd_shock_crossing (&b, c[1], c[2], c[3], c[4], &x, &v), HOLENT_SUCCESS);
      HT_STATUS (holent_tfd_cross_length (&b, c[1], c[2], c[3], c[4], &len), HOLENT_SUCCESS);
      ex_par e = { 1.0, eps, c[0], c[1], c[2], c[3], c[4], x };
      double f0 = legs (v, &e), fp = legs (v + h, &e), fm = legs (v - h, &e);
      HT_CHECK (fabs (-f0 - len) < 1e-9 * len, "case %zu: legs %.12g, length %.12g", k, -f0, len);
      HT_CHECK (fabs (fp - fm) / (2 * h) < 1e-6 && fp > f0 && fm > f0,
                "case %zu: not a maximum in v (%g %g %g)", k, fm - f0, fp - f0, (fp - fm) / (2 * h));
      e.x = x + h;
      fp = legs (v, &e);
      e.x = x - h;
      fm = legs (v, &e);
      HT_CHECK (fabs (fp - fm) / (2 * h) < 1e-6, "case %zu: d/dx %g", k, (fp - fm) / (2 * h));
      double m0 = over_v (x, &e), mp = over_v (x + 1e-3, &e), mm = over_v (x - 1e-3, &e);
      HT_CHECK (mp > m0 && mm > m0 && fabs (m0 - len) < 1e-9 * len,
                "case %zu: not a minimum in x (%g %g)", k, mm - m0, mp - m0);
    }
  /* times beyond double precision of v, and bad input */
  HT_STATUS (holent_tfd_init (&b, 0, 0, eps, beta, 1.0, 1.0), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_shock_crossing (&b, 0, 0, 0, 800, &x, &v), HOLENT_ERANGE);
  HT_STATUS (holent_tfd_shock_crossing (&b, NAN, 0, 0, 0, &x, &v), HOLENT_EINVAL);
  HT_STATUS (holent_tfd_shock_crossing (NULL, 0, 0, 0, 0, &x, &v), HOLENT_EINVAL);
  HT_STATUS (holent_tfd_shock_crossing (&b, 0, 0, 0, 0, NULL, &v), HOLENT_EINVAL);
  /* symmetric point: dx = 0, tL = tR = 0 crosses at x = xL, v = -alpha/2
     (the bridge T_K = 0 of the glued picture) */
  HT_STATUS (holent_tfd_shock_crossing (&b, 0.3, 0, 0.3, 0, &x, &v), HOLENT_SUCCESS);
  HT_CLOSE (x, 0.3, 1e-15);
  HT_CLOSE (v, -0.5, 1e-15);
}

static void
test_shift (void)
{
  /* Exact matching of r along a null shell u = u_w between BTZ of radii
     R (mass M) and R' (mass M + E), each side's Kruskal u_w set by the
     same boundary time tw: at the point where the shell meets v = 0 on
     one side, the other side's v' is the shift.  R'^2/R^2 = (M + E)/M.  */
  double beta = 1.7, c = 6.0, L = 3.0, R = L / beta * 1.0, M, alpha;
  (void) R;
  for (double tw = 2.0; tw <= 5.0; tw += 1.5)
    {
      double E = 1e-7;
      HT_STATUS (holent_tfd_shock_alpha (1, L, beta, c, E, tw, &alpha, &M), HOLENT_SUCCESS);
      /* bulk units: R = 2 pi/beta_bulk with tw in bulk time 2 pi tw/L.  */
      double Rb = L / beta, twb = 2 * M_PI * tw / L;
      double Rp = Rb * sqrt (1 + E / M);
      double uw = exp (-Rp * twb);
      double vp = (Rp - Rb) / ((Rp + Rb) * uw);
      /* vp is the shift in the Kruskal v of the massive side, whose
         normalisation differs from the massless side's by O(E/M).  */
      HT_CHECK (fabs (vp - alpha) < 1e-5 * alpha, "tw %g: %g vs %g", tw, vp, alpha);
    }
  /* M from the first law dM = T dS_BH, S_BH from holent_geo.  */
  holent_geo_bg g1, g2;
  double b1 = 1.7, b2 = 1.7 + 1e-6, M1, M2, a;
  HT_STATUS (holent_geo_bg_init (&g1, HOLENT_BULK_BTZ, L, 1e-3, b1, b1, 1, c), HOLENT_SUCCESS);
  HT_STATUS (holent_geo_bg_init (&g2, HOLENT_BULK_BTZ, L, 1e-3, b2, b2, 1, c), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_shock_alpha (1, L, b1, c, 1, 0, &a, &M1), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_shock_alpha (1, L, b2, c, 1, 0, &a, &M2), HOLENT_SUCCESS);
  HT_CLOSE ((M2 - M1) / (g2.S_BH - g1.S_BH), 1 / (b1 + 5e-7), 1e-6);
  double tw;
  HT_STATUS (holent_tfd_shock_alpha (0, 0, b1, c, 0.01, 2.5, &a, &M1), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_shock_time (0, 0, b1, c, 0.01, a, &tw), HOLENT_SUCCESS);
  HT_CLOSE (tw, 2.5, 1e-12);
  HT_STATUS (holent_tfd_shock_alpha (0, 0, b1, c, -1, 2.5, &a, NULL), HOLENT_EDOM);
  HT_STATUS (holent_tfd_shock_alpha (0, 0, b1, c, 1, INFINITY, &a, NULL), HOLENT_EDOM);
  HT_STATUS (holent_tfd_shock_alpha (0, 0, b1, c, 1, 1e6, &a, NULL), HOLENT_EDOM);
  HT_STATUS (holent_tfd_shock_alpha (1, -1, b1, c, 1, 1, &a, NULL), HOLENT_EDOM);
  HT_STATUS (holent_tfd_shock_time (0, 0, b1, c, 0, 1, &tw), HOLENT_EDOM);
}

/* Brute force over pairings of the bridge order (points lo..hi-1).  */
static double
brute (const holent_tfd_bg *b, const double *x, const double *t,
       const int *s, size_t lo, size_t hi)
{
  if (lo >= hi)
    return 0.0;
  double best = INFINITY;
  for (size_t j = lo + 1; j < hi; j += 2)
    {
      double len;
      if (s[lo] == s[j])
        holent_tfd_side_length (b, x[lo], t[lo], x[j], t[j], HOLENT_GEO_SHORTER, &len);
      else if (s[lo] == 0)
        holent_tfd_cross_length (b, x[lo], t[lo], x[j], t[j], &len);
      else
        holent_tfd_cross_length (b, x[j], t[j], x[lo], t[lo], &len);
      double v = len + brute (b, x, t, s, lo + 1, j) + brute (b, x, t, s, j + 1, hi);
      if (v < best)
        best = v;
    }
  return best;
}

static void
test_regions (void)
{
  holent_tfd_bg b;
  holent_tfd_workspace *w = holent_tfd_workspace_alloc (6);
  holent_rt_result res;
  size_t nc, row;
  int side;
  double beta = 1.0, eps = 1e-3, l = 2.0;
  HT_STATUS (holent_tfd_init (&b, 0, 0, eps, beta, 3.0, 0.0), HOLENT_SUCCESS);
  double a[1] = { 0 }, bb[1] = { l }, z[1] = { 0 };
  holent_tfd_side A = { 1, a, bb, z, z };
  /* Hartman-Maldacena growth and saturation of S(A_L u A_R).  */
  for (double t = 0; t < 2; t += 0.25)
    {
      HT_STATUS (holent_tfd_entropy (w, &b, &A, &A, t, &res, &nc, &side, &row), HOLENT_SUCCESS);
      double conn = 2 * log (beta / (M_PI * eps) * cosh (2 * M_PI * t / beta));
      double disc = 2 * log (beta / (M_PI * eps) * sinh (M_PI * l / beta));
      HT_CLOSE (res.S, 0.5 * 2 * fmin (conn, disc), 1e-12);
      HT_CHECK (nc == (conn < disc ? 2u : 0u), "ncross %zu at t %g", nc, t);
    }
  /* The time at which the mutual information vanishes:
     cosh(2 pi t/beta) = sinh(pi l/beta).  */
  double ts;
  HT_STATUS (holent_tfd_mi_zero (w, &b, &A, &A, 10.0, &ts), HOLENT_SUCCESS);
  HT_CLOSE (ts, beta / (2 * M_PI) * acosh (sinh (M_PI * l / beta)), 1e-10);
  HT_STATUS (holent_tfd_mi_zero (w, &b, &A, &A, 0.1, &ts), HOLENT_SUCCESS);
  HT_CHECK (isinf (ts), "still correlated at tmax");
  /* Scrambling: alpha* = 2 (sinh(pi l/beta) - 1) (Shenker-Stanford).  */
  double al;
  HT_STATUS (holent_tfd_mi_zero_alpha (w, &b, &A, &A, &al), HOLENT_SUCCESS);
  HT_CLOSE (al, 2 * (sinh (M_PI * l / beta) - 1), 1e-10);
  /* Brute force, three intervals with times on two sides, shocked.  */
  HT_STATUS (holent_tfd_init (&b, 0, 0, eps, beta, 3.0, 0.7), HOLENT_SUCCESS);
  double ra[2] = { 0.0, 1.3 }, rb[2] = { 1.0, 1.9 }, rta[2] = { 0.1, 0.3 }, rtb[2] = { 0.2, 0.0 };
  double la[1] = { 0.4 }, lb[1] = { 1.6 }, lta[1] = { -0.1 }, ltb[1] = { 0.2 };
  holent_tfd_side R = { 2, ra, rb, rta, rtb }, Ls = { 1, la, lb, lta, ltb };
  HT_STATUS (holent_tfd_entropy (w, &b, &Ls, &R, 0.3, &res, &nc, &side, &row), HOLENT_SUCCESS);
  double x[6] = { 0.0, 1.0, 1.3, 1.9, 1.6, 0.4 };
  double t[6] = { 0.4, 0.5, 0.6, 0.3, 0.5, 0.2 };
  int s[6] = { 1, 1, 1, 1, 0, 0 };
  HT_CLOSE (res.length, brute (&b, x, t, s, 0, 6), 1e-12);
  /* One side only equals the BTZ one-sided problem.  */
  HT_STATUS (holent_tfd_entropy (w, &b, &(holent_tfd_side) { 0, NULL, NULL, NULL, NULL }, &R, 0.0, &res, &nc, &side, &row), HOLENT_SUCCESS);
  HT_CLOSE (res.length, brute (&b, x, t, s, 0, 4), 1e-12);
  /* Errors.  */
  holent_tfd_side E0 = { 0, NULL, NULL, NULL, NULL };
  HT_STATUS (holent_tfd_entropy (w, &b, &E0, &E0, 0, &res, &nc, &side, &row), HOLENT_EEMPTY);
  double ta2[2] = { 0.0, 0.0 }, tb2[2] = { 0.0, 2.0 };
  holent_tfd_side Bad = { 2, ra, rb, ta2, tb2 };
  HT_STATUS (holent_tfd_entropy (w, &b, &Ls, &Bad, 0, &res, &nc, &side, &row), HOLENT_ETIMELIKE);
  HT_CHECK (side == 1, "side %d", side);
  double ob[2] = { 1.5, 1.9 };
  holent_tfd_side Ov = { 2, ra, ob, rta, rtb };
  HT_STATUS (holent_tfd_entropy (w, &b, &Ov, &R, 0, &res, &nc, &side, &row), HOLENT_EOVERLAP);
  HT_CHECK (side == 0, "side %d", side);
  HT_STATUS (holent_tfd_init (&b, 1, 5.0, eps, beta, 3.0, 0.0), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_entropy (w, &b, &Ls, &R, 0, &res, &nc, &side, &row), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_entropy (w, &b, &Ls, &Bad, 0, &res, &nc, &side, &row), HOLENT_ETIMELIKE);
  HT_CHECK (side == 1, "side %d", side);
  HT_STATUS (holent_tfd_entropy (w, &b, &E0, &R, 0, &res, &nc, &side, &row), HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_mi_zero (w, &b, &E0, &R, 1, &ts), HOLENT_EEMPTY);
  HT_STATUS (holent_tfd_mi_zero (w, &b, &Ls, &R, 0, &ts), HOLENT_EDOM);
  holent_tfd_workspace_free (w);
  HT_CHECK (holent_tfd_workspace_alloc (0) == NULL, "nmax 0");
}

/* The constructor: derived quantities against the thermodynamics of the
   BTZ black hole (S = (pi c/3) L T, E = (pi c/6) L T^2: Cardy's formula
   with the energy above the massless BTZ, doc/tfd_shock.md), every
   error with the argument it names.  */
static void
test_make (void)
{
  holent_tfd_bg b;
  holent_tfd_info in;
  holent_err e;
  double L = 3.0, beta = 0.7, c = 6.0, T = 1.0 / beta;
  HT_STATUS (holent_tfd_make (&b, &in, 1, L, 1e-6, beta, c, 1.0, 0, 0, 1,
                              1e-3, 1, 2.0, &e), HOLENT_SUCCESS);
  HT_CLOSE (in.S_BH, M_PI * c / 3.0 * L * T, 1e-13);
  HT_CLOSE (in.M, M_PI * c / 6.0 * L * T * T, 1e-13);
  HT_CLOSE (in.shock_M, in.M, 1e-13);
  HT_CLOSE (in.shock_alpha, 1e-3 / (4.0 * in.M) * exp (2 * M_PI * 2.0 / beta),
            1e-13);
  HT_CLOSE (b.alpha, in.shock_alpha, 1e-15);
  HT_CHECK (in.shock_time == 2.0 && in.shock_energy == 1e-3, "shock");
  HT_STATUS (holent_tfd_make (&b, &in, 0, 0.0, 1e-6, beta, c, 1.0, 1, 0.5,
                              0, 0, 0, 0, &e), HOLENT_SUCCESS);
  HT_CHECK (isinf (in.S_BH) && isnan (in.shock_time) && b.alpha == 0.5,
            "line");
  HT_CLOSE (in.entropy_density, M_PI * c / 3.0 * T, 1e-14);
  struct
  {
    double L, eps, beta, c, ell, a, E, tw;
    int ha, he, ht, status, arg;
  } bad[] = {
    { -1, 1e-6, 1, 1, 1, 0, 0, 0, 0, 0, 0, HOLENT_EDOM, HOLENT_TFD_ARG_L },
    { 3, NAN, 1, 1, 1, 0, 0, 0, 0, 0, 0, HOLENT_ENAN, HOLENT_TFD_ARG_EPS },
    { 3, 1e-6, INFINITY, 1, 1, 0, 0, 0, 0, 0, 0, HOLENT_EDOM,
      HOLENT_TFD_ARG_BETA },
    { 3, 1e-6, 1, 0, 1, 0, 0, 0, 0, 0, 0, HOLENT_EDOM, HOLENT_TFD_ARG_C },
    { 3, 1e-6, 1, 1, -2, 0, 0, 0, 0, 0, 0, HOLENT_EDOM, HOLENT_TFD_ARG_ELL },
    { 3, 1e-6, 1, 1, 1, -1, 0, 0, 1, 0, 0, HOLENT_EDOM,
      HOLENT_TFD_ARG_ALPHA },
    { 3, 1e-6, 1, 1, 1, 1, 1, 1, 1, 1, 1, HOLENT_EOPTION,
      HOLENT_TFD_ARG_ALPHA },
    { 3, 1e-6, 1, 1, 1, 0, 1, 0, 0, 1, 0, HOLENT_EOPTION,
      HOLENT_TFD_ARG_ENERGY },
    { 3, 1e-6, 1, 1, 1, 0, -1, 0, 0, 1, 1, HOLENT_EDOM,
      HOLENT_TFD_ARG_ENERGY },
    { 3, 1e-6, 1, 1, 1, 0, 1, NAN, 0, 1, 1, HOLENT_ENAN,
      HOLENT_TFD_ARG_TIME },
    { 3, 1e-6, 1, 1, 1, 0, 1, 1e4, 0, 1, 1, HOLENT_ERANGE,
      HOLENT_TFD_ARG_TIME },
  };
  for (size_t k = 0; k < sizeof bad / sizeof bad[0]; k++)
    {
      int st = holent_tfd_make (&b, &in, 1, bad[k].L, bad[k].eps,
                                bad[k].beta, bad[k].c, bad[k].ell, bad[k].ha,
                                bad[k].a, bad[k].he, bad[k].E, bad[k].ht,
                                bad[k].tw, &e);
      HT_CHECK (st == bad[k].status && e.status == st && e.arg == bad[k].arg
                && e.reason[0] != '\0',
                "bad %zu: status %d arg %d (%s)", k, st, e.arg, e.reason);
    }
  HT_STATUS (holent_tfd_make (NULL, &in, 1, 3, 1e-6, 1, 1, 1, 0, 0, 0, 0, 0,
                              0, &e), HOLENT_EINVAL);
}

/* Scrambling: alpha* = 2 (sinh(pi l/beta) - 1) for A_L = A_R = [0, l]
   (doc/tfd_shock.md) and t* from the inverse of the shift formula.  */
static void
test_scrambling (void)
{
  holent_tfd_bg b;
  holent_tfd_workspace *w = holent_tfd_workspace_alloc (4);
  double a0[1] = { 0.0 }, b0[1] = { 2.0 }, z[1] = { 0.0 };
  holent_tfd_side S = { 1, a0, b0, z, z };
  double beta = 1.0, E = 1e-4, alpha, ts;
  HT_STATUS (holent_tfd_init (&b, 0, 0.0, 1e-6, beta, 6.0, 0.0),
             HOLENT_SUCCESS);
  HT_STATUS (holent_tfd_scrambling (w, &b, &S, &S, E, &alpha, &ts),
             HOLENT_SUCCESS);
  HT_CLOSE (alpha, 2.0 * (sinh (2.0 * M_PI) - 1.0), 1e-10);
  HT_CLOSE (ts, beta / (2 * M_PI) * log (4.0 * M_PI / beta / beta * alpha / E),
            1e-12);
  HT_STATUS (holent_tfd_scrambling (w, &b, &S, &S, 0.0, &alpha, &ts),
             HOLENT_SUCCESS);
  HT_CHECK (isnan (ts), "no energy: NaN");
  HT_STATUS (holent_tfd_scrambling (w, &b, &S, &S, -1.0, &alpha, &ts),
             HOLENT_EDOM);
  /* the default tmax: 100 beta */
  HT_STATUS (holent_tfd_mi_zero (w, &b, &S, &S, -1.0, &ts), HOLENT_SUCCESS);
  HT_CLOSE (ts, beta / (2 * M_PI) * acosh (sinh (2.0 * M_PI)), 1e-10);
  holent_tfd_workspace_free (w);
}

int
main (void)
{
  test_make ();
  test_scrambling ();
  gsl_set_error_handler_off ();
  test_cross ();
  test_crossing ();
  test_winding ();
  test_annulus ();
  test_annulus_conf ();
  test_shift ();
  test_regions ();
  return HT_DONE ();
}
