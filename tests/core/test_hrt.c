/* Unit tests of holent_hrt: covariant lengths against the geodesic
 * distance acosh(-X.Y) of the embedding coordinates of the two cutoff
 * points (evaluated numerically, not through the factorised closed form;
 * Banados, Henneaux, Teitelboim and Zanelli 1993, PRD 48, 1506 for the
 * BTZ embedding, from memory), equal times against holent_geo, the
 * timelike branch against Doi, Harper, Mollabashi, Takayanagi and Taki
 * 2023 (PRL 130, 031601), Lorentz invariance of the vacuum, and the
 * region minimisation against brute force over pairings.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_math.h>
#include "holent_ctest.h"
#include "holent_hrt.h"

/* Geodesic distance between two bulk points of the embedding
   -X0^2 + X1^2 + X2^2 - X3^2 = -1.  */
static double
emb_dist (const double X[4], const double Y[4])
{
  double s = X[0] * Y[0] - X[1] * Y[1] - X[2] * Y[2] + X[3] * Y[3];
  return acosh (s);
}

/* Cutoff point (boundary coordinate x, time t) of each bulk, in the
   coordinates of doc/ads3_geodesics.md section 1 (u(zeta) the FG map).  */
static void
emb_point (const holent_geo_bg *bg, double x, double t, double X[4])
{
  double zc, ph, tb, up, um, u;
  switch (bg->bulk)
    {
    case HOLENT_BULK_POINCARE:
      {
        /* X = (z^2 + x^2 - t^2 + 1, 2x, z^2 + x^2 - t^2 - 1, 2t)/(2z) */
        double z = bg->eps, q = z * z + x * x - t * t;
        X[0] = (q + 1.0) / (2.0 * z);
        X[1] = x / z;
        X[2] = (q - 1.0) / (2.0 * z);
        X[3] = t / z;
        return;
      }
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
    case HOLENT_BULK_CONICAL_DEFECT:
      {
        /* Cover: global AdS in rho, tau, psi = alpha phi, tau = alpha t.  */
        double a = bg->alpha, L = bg->L;
        zc = 2.0 * M_PI * bg->eps / L;
        double r = 1.0 / zc - a * a * zc / 4.0, rho = r / a;
        ph = a * 2.0 * M_PI * x / L;
        tb = a * 2.0 * M_PI * t / L;
        X[0] = sqrt (1.0 + rho * rho) * cos (tb);
        X[3] = sqrt (1.0 + rho * rho) * sin (tb);
        X[1] = rho * cos (ph);
        X[2] = rho * sin (ph);
        return;
      }
    default:
      {
        double L = bg->circle ? bg->L : 2.0 * M_PI;
        double scale = 2.0 * M_PI / L;  /* boundary -> bulk units */
        double rp = 0.5 * L * (1.0 / bg->beta_L + 1.0 / bg->beta_R);
        double rm = 0.5 * L * (1.0 / bg->beta_L - 1.0 / bg->beta_R);
        up = rp * rp;
        um = rm * rm;
        zc = scale * bg->eps;
        u = 1.0 / (zc * zc) + 0.5 * (up + um)
            + (up - um) * (up - um) * zc * zc / 16.0;
        ph = scale * x;
        tb = scale * t;
        double A = (u - um) / (up - um), B = (u - up) / (up - um);
        X[0] = sqrt (A) * cosh (rp * ph - rm * tb);
        X[1] = sqrt (A) * sinh (rp * ph - rm * tb);
        X[2] = sqrt (B) * cosh (rp * tb - rm * ph);
        X[3] = sqrt (B) * sinh (rp * tb - rm * ph);
        return;
      }
    }
}

static void
test_embedding (void)
{
  static const holent_bulk bulks[] = {
    HOLENT_BULK_POINCARE, HOLENT_BULK_GLOBAL_ADS, HOLENT_BULK_PLANAR_BTZ,
    HOLENT_BULK_BTZ, HOLENT_BULK_THERMAL_ADS, HOLENT_BULK_ROTATING_BTZ,
    HOLENT_BULK_PLANAR_ROTATING_BTZ, HOLENT_BULK_CONICAL_DEFECT
  };
  /* (x1, t1, x2, t2): spacelike pairs, both signs of dt and of x2 - x1.  */
  static const double pts[][4] = {
    { 0.1, 0.0, 1.3, 0.7 }, { 0.4, 0.5, 2.0, -0.3 }, { 2.5, 0.2, 0.3, 1.1 },
    { -1.0, 0.3, 0.2, 0.25 }, { 0.0, 0.0, 0.9, 0.0 }
  };
  for (size_t b = 0; b < sizeof bulks / sizeof bulks[0]; b++)
    for (size_t k = 0; k < sizeof pts / sizeof pts[0]; k++)
      {
        holent_geo_bg bg;
        double eps = 1e-6;
        HT_STATUS (holent_geo_bg_init (&bg, bulks[b], 7.0, eps, 1.3, 0.8,
                                       0.7, 1.0), HOLENT_SUCCESS);
        const double *p = pts[k];
        double X[4], Y[4], re, im;
        emb_point (&bg, p[0], p[1], X);
        emb_point (&bg, p[2], p[3], Y);
        /* The positive class over the arc x1 -> x2 (on a line: the only
           one); in the cover of the defect the points are unrolled the
           same way, so the distance is that class (uncapped here).  */
        holent_geo_class cls = bg.circle ? HOLENT_GEO_POSITIVE
                                         : HOLENT_GEO_SHORTER;
        double x2 = p[2];
        if (bg.circle && x2 < p[0])
          x2 += bg.L;
        /* Translate to the origin (a symmetry of every metric here):
           the products of large cosh and sinh then cancel less.  */
        emb_point (&bg, 0.0, 0.0, X);
        emb_point (&bg, x2 - p[0], p[3] - p[1], Y);
        HT_STATUS (holent_hrt_length (&bg, p[0], p[1], p[2], p[3], cls, 0,
                                      &re, &im), HOLENT_SUCCESS);
        HT_CHECK (fabs (re - emb_dist (X, Y)) < 1e-8 * re,
                  "bulk %d pair %zu: %.12g vs %.12g", (int) bulks[b], k, re,
                  emb_dist (X, Y));
        HT_CHECK (im == 0.0, "spacelike pair with imaginary part");
        if (p[1] == p[3])
          {
            double ref;
            HT_STATUS (holent_geo_point_lengths (&bg, 1, &p[0], &p[2], cls,
                                                 &ref, NULL), HOLENT_SUCCESS);
            HT_CLOSE (re, ref, 1e-12);
          }
      }
}

static void
test_timelike (void)
{
  holent_geo_bg bg;
  double re, im, eps = 1e-3;
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 0, eps, 0, 0, 0, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_length (&bg, 0, 0, 1, 2, HOLENT_GEO_SHORTER, 0, &re, &im), HOLENT_ETIMELIKE);
  HT_STATUS (holent_hrt_length (&bg, 0, 0, 1, 1, HOLENT_GEO_SHORTER, 1, &re, &im), HOLENT_ETIMELIKE);
  HT_STATUS (holent_hrt_length (&bg, 0, 0, 0, 1, HOLENT_GEO_SHORTER, 1, &re, &im), HOLENT_ECOINCIDE);
  /* Doi et al. 2023: a purely timelike interval T0 in the vacuum has
     S_T = (c/3) log(T0/eps) + i pi c/6, i.e. length 2 log(T0/eps) + i pi;
     a boosted one depends on T0^2 = dt^2 - dx^2 only.  */
  HT_STATUS (holent_hrt_length (&bg, 0, 0, 1e-300, 2, HOLENT_GEO_SHORTER, 1, &re, &im), HOLENT_SUCCESS);
  HT_CLOSE (re, 2 * log (2 / eps), 1e-12);
  HT_CLOSE (im, M_PI, 1e-15);
  HT_STATUS (holent_hrt_length (&bg, 0, 0, 3, 5, HOLENT_GEO_SHORTER, 1, &re, &im), HOLENT_SUCCESS);
  HT_CLOSE (re, 2 * log (4 / eps), 1e-12);
  /* The same as an entropy, c = 6 here: (c/3) log(T0/eps) + i pi c/6 with
     T0^2 = 1 - 0.6^2 (Doi et al. 2023), any start time; a spacelike pair
     is left to the HRT entropy.  */
  {
    holent_geo_bg b6;
    double sr = 7, si = 7;
    int causal = -1;
    HT_STATUS (holent_geo_bg_init (&b6, HOLENT_BULK_POINCARE, 0, eps, 0, 0, 0, 6), HOLENT_SUCCESS);
    HT_STATUS (holent_hrt_timelike_entropy (&b6, 0.6, 5.0, 1.0, &sr, &si, &causal), HOLENT_SUCCESS);
    HT_CHECK (causal == 1, "causal %d", causal);
    HT_CLOSE (sr, 2 * log (0.8 / eps), 1e-12);
    HT_CLOSE (si, M_PI, 1e-15);
    sr = si = 7;
    HT_STATUS (holent_hrt_timelike_entropy (&b6, 3.0, 0.0, 1.0, &sr, &si, &causal), HOLENT_SUCCESS);
    HT_CHECK (causal == 0 && sr == 7 && si == 7, "spacelike pair touched S");
    HT_STATUS (holent_hrt_timelike_entropy (&b6, 1.0, 0.0, 1.0, &sr, &si, &causal), HOLENT_ETIMELIKE);
    HT_STATUS (holent_hrt_timelike_entropy (&b6, 1.0, 0.0, 1.0, NULL, &si, &causal), HOLENT_EINVAL);
  }
  /* Finite temperature (Doi et al. 2023, thermal case):
     S_T = (c/3) log((beta/(pi eps)) sinh(pi T0/beta)) + i pi c/6.  */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_PLANAR_BTZ, 0, eps, 2, 2, 0, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_length (&bg, 0, 0, 1e-300, 1.5, HOLENT_GEO_SHORTER, 1, &re, &im), HOLENT_SUCCESS);
  HT_CLOSE (re, 2 * log (2 / (M_PI * eps) * sinh (M_PI * 1.5 / 2)), 1e-12);
  HT_CLOSE (im, M_PI, 1e-15);
  /* Errors.  */
  HT_STATUS (holent_hrt_length (&bg, NAN, 0, 1, 0, HOLENT_GEO_SHORTER, 0, &re, &im), HOLENT_EINVAL);
  HT_STATUS (holent_hrt_length (&bg, 0, INFINITY, 1, 0, HOLENT_GEO_SHORTER, 0, &re, &im), HOLENT_EINVAL);
  HT_STATUS (holent_hrt_length (NULL, 0, 0, 1, 0, HOLENT_GEO_SHORTER, 0, &re, &im), HOLENT_EINVAL);
  HT_STATUS (holent_hrt_length (&bg, 0, 0, 1, 0, (holent_geo_class) 7, 0, &re, &im), HOLENT_EINVAL);
  /* Circle: spacelike needs |dt| below the circle distance.  */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_BTZ, 4, eps, 1, 1, 0, 1), HOLENT_SUCCESS);
  HT_CHECK (holent_hrt_spacelike (&bg, 0, 0, 3.5, 0.4), "circle distance 0.5");
  HT_CHECK (!holent_hrt_spacelike (&bg, 0, 0, 3.5, 0.6), "beyond circle distance");
  HT_STATUS (holent_hrt_length (&bg, 0, 0, 3.5, 0.6, HOLENT_GEO_POSITIVE, 0, &re, &im), HOLENT_ETIMELIKE);
  HT_STATUS (holent_hrt_length (&bg, 0, 0, 4, 0.0, HOLENT_GEO_POSITIVE, 0, &re, &im), HOLENT_ECOINCIDE);
  /* Defect: a capped class has no timelike branch.  */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_CONICAL_DEFECT, 4, eps, 1, 1, 0.5, 1), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_length (&bg, 0, 0, 0.5, 0.6, HOLENT_GEO_NEGATIVE, 1, &re, &im), HOLENT_ETIMELIKE);
  size_t bad = 9;
  double x1[2] = { 0, 0 }, t1[2] = { 0, 0 }, x2[2] = { 1, 1 }, t2[2] = { 0, 1.2 }, o[2];
  HT_STATUS (holent_hrt_lengths (&bg, 2, x1, t1, x2, t2, HOLENT_GEO_SHORTER, 0, o, NULL, &bad), HOLENT_ETIMELIKE);
  HT_CHECK (bad == 1, "bad index %zu", bad);
  HT_STATUS (holent_hrt_lengths (&bg, 2, x1, t1, x2, t2, HOLENT_GEO_SHORTER, 1, o, NULL, &bad), HOLENT_EINVAL);
}

/* Brute force: every non-crossing pairing of 2n points on a line (i with
   a partner of the other parity), covariant lengths.  */
static double
brute_line (const holent_geo_bg *bg, const double *x, const double *t,
            size_t lo, size_t hi)
{
  if (lo >= hi)
    return 0.0;
  double best = INFINITY;
  for (size_t j = lo + 1; j < hi; j += 2)
    {
      double re, im;
      if (holent_hrt_length (bg, x[lo], t[lo], x[j], t[j], HOLENT_GEO_SHORTER,
                             0, &re, &im))
        return NAN;
      double v = re + brute_line (bg, x, t, lo + 1, j)
                 + brute_line (bg, x, t, j + 1, hi);
      if (v < best)
        best = v;
    }
  return best;
}

static void
test_regions (void)
{
  holent_geo_bg bg;
  holent_region *r = holent_region_alloc (8);
  holent_rt_workspace *w = holent_rt_workspace_alloc_dp (8);
  holent_rt_result res, ref;
  double tp[16];
  size_t bi = 0, bj = 0, bad = 0;
  /* Three intervals with times on the thermal line.  */
  double a[3] = { 0.0, 1.5, 2.3 }, b[3] = { 1.0, 2.0, 4.0 };
  double ts[3] = { 0.1, 0.0, 0.3 }, te[3] = { 0.3, 0.1, 0.0 };
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_PLANAR_BTZ, 0, 1e-3, 1.1, 1.1, 0, 3), HOLENT_SUCCESS);
  HT_STATUS (holent_region_set (r, 0, 0, 3, a, b), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_region_times (r, 3, ts, te, tp, &bad), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_entropy (w, &bg, r, tp, &res, NULL, NULL, &bi, &bj), HOLENT_SUCCESS);
  HT_CLOSE (res.length, brute_line (&bg, r->pts, tp, 0, 6), 1e-12);
  HT_CLOSE (res.S, 0.5 * res.length, 1e-12);
  /* Equal times: the static minimiser.  */
  double z[3] = { 0.4, 0.4, 0.4 };
  HT_STATUS (holent_hrt_region_times (r, 3, z, z, tp, &bad), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_entropy (w, &bg, r, tp, &res, NULL, NULL, &bi, &bj), HOLENT_SUCCESS);
  HT_STATUS (holent_rt_entropy (w, &bg, r, &ref, NULL, NULL), HOLENT_SUCCESS);
  HT_CLOSE (res.S, ref.S, 1e-12);
  /* Lorentz invariance of the vacuum: boost every endpoint.  */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 0, 1e-3, 0, 0, 0, 3), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_region_times (r, 3, ts, te, tp, &bad), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_entropy (w, &bg, r, tp, &ref, NULL, NULL, &bi, &bj), HOLENT_SUCCESS);
  double v = 0.3, g = 1.0 / sqrt (1 - v * v), a2[3], b2[3], ts2[3], te2[3];
  for (int i = 0; i < 3; i++)
    {
      a2[i] = g * (a[i] - v * ts[i]);
      ts2[i] = g * (ts[i] - v * a[i]);
      b2[i] = g * (b[i] - v * te[i]);
      te2[i] = g * (te[i] - v * b[i]);
    }
  HT_STATUS (holent_region_set (r, 0, 0, 3, a2, b2), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_region_times (r, 3, ts2, te2, tp, &bad), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_entropy (w, &bg, r, tp, &res, NULL, NULL, &bi, &bj), HOLENT_SUCCESS);
  HT_CLOSE (res.S, ref.S, 1e-11);
  /* A timelike pair of endpoints makes the region non-achronal.  */
  double tt[3] = { 0.0, 0.0, 2.5 };
  HT_STATUS (holent_region_set (r, 0, 0, 3, a, b), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_region_times (r, 3, z, tt, tp, &bad), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_entropy (w, &bg, r, tp, &res, NULL, NULL, &bi, &bj), HOLENT_ETIMELIKE);
  HT_CHECK (bi < bj && fabs (tp[bj] - tp[bi]) >= r->pts[bj] - r->pts[bi],
            "offending endpoints %zu %zu", bi, bj);
  /* Touching rows merge: no single time at the junction.  */
  double a3[2] = { 0, 1 }, b3[2] = { 1, 2 };
  HT_STATUS (holent_region_set (r, 0, 0, 2, a3, b3), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_region_times (r, 2, z, z, tp, &bad), HOLENT_EOVERLAP);
  double nn[3] = { 0, NAN, 0 };
  HT_STATUS (holent_region_set (r, 0, 0, 3, a, b), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_region_times (r, 3, nn, z, tp, &bad), HOLENT_EINVAL);
  HT_CHECK (bad == 1, "bad row %zu", bad);
  /* Circle with a horizon, an interval through 0: times land on the
     right endpoints; equal times reproduce the static value.  */
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_BTZ, 6.0, 1e-3, 1.0, 1.0, 0, 3), HOLENT_SUCCESS);
  double ca[2] = { 5.0, 1.0 }, cb[2] = { 6.5, 3.0 }, cs[2] = { 0.2, 0.1 }, ce[2] = { 0.3, 0.0 };
  HT_STATUS (holent_region_set (r, 1, 6.0, 2, ca, cb), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_region_times (r, 2, cs, ce, tp, &bad), HOLENT_SUCCESS);
  HT_CHECK (r->start0 == 0 && tp[0] == 0.3 && tp[3] == 0.2 && tp[1] == 0.1,
            "times of the wrapped region");
  HT_STATUS (holent_hrt_entropy (w, &bg, r, tp, &res, NULL, NULL, &bi, &bj), HOLENT_SUCCESS);
  HT_CHECK (isfinite (res.S), "finite entropy");
  HT_STATUS (holent_hrt_region_times (r, 2, z, z, tp, &bad), HOLENT_SUCCESS);
  HT_STATUS (holent_hrt_entropy (w, &bg, r, tp, &res, NULL, NULL, &bi, &bj), HOLENT_SUCCESS);
  HT_STATUS (holent_rt_entropy (w, &bg, r, &ref, NULL, NULL), HOLENT_SUCCESS);
  HT_CLOSE (res.S, ref.S, 1e-12);
  HT_STATUS (holent_hrt_entropy (NULL, &bg, r, tp, &res, NULL, NULL, &bi, &bj), HOLENT_EINVAL);
  holent_region_free (r);
  holent_rt_workspace_free (w);
}

int
main (void)
{
  test_embedding ();
  test_timelike ();
  test_regions ();
  return HT_DONE ();
}
