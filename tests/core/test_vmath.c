/* SPDX-License-Identifier: GPL-3.0-or-later
 * Unit tests of holent_vmath: the block kernel against the regulated
 * lengths written out here in closed form (Ryu and Takayanagi 2006, PRL
 * 96, 181602; Hubeny, Rangamani and Takayanagi 2007, JHEP 07, 062 for the
 * rotating case; the defect with its apex cap, doc/conventions.md), in
 * every bulk and over arcs from 1e-9 to the whole circle; the point form
 * against the same closed forms for each homotopy class, and its errors.  */
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_math.h>
#include "holent_ctest.h"
#include "holent_vmath.h"

static double
closed_form (const holent_geo_bg *bg, double l)
{
  const double eps = bg->eps, L = bg->L;
  switch (bg->bulk)
    {
    case HOLENT_BULK_POINCARE:
      return 2 * log (l / eps);
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
      return 2 * log (L / (M_PI * eps) * sin (M_PI * l / L));
    case HOLENT_BULK_CONICAL_DEFECT:
      {
        double ph = M_PI * bg->alpha * l / L;
        return 2 * log (L / (M_PI * bg->alpha * eps)
                        * sin (ph < M_PI / 2 ? ph : M_PI / 2));
      }
    default:
      /* log of each sinh separately: no overflow for the arcs below */
      return log (bg->beta_L / (M_PI * eps) * sinh (M_PI * l / bg->beta_L))
             + log (bg->beta_R / (M_PI * eps) * sinh (M_PI * l / bg->beta_R));
    }
}

static void
test_kernel (void)
{
  enum { M = 1203 };  /* not a multiple of any vector width */
  static double arc[M], len[M];
  for (int b = 0; b < 8; b++)
    {
      holent_geo_bg bg;
      double bl = 0.7, br = (b == 5 || b == 6) ? 1.9 : 0.7;
      HT_STATUS (holent_geo_bg_init (&bg, (holent_bulk) b, 4.0, 1e-5, bl, br,
                                     b == 7 ? 0.4 : 1, 3),
                 HOLENT_SUCCESS);
      double top = bg.circle ? 4.0 : 30.0;
      int open = bg.circle && !bg.horizon && b != 7;  /* global: l < L */
      for (int i = 0; i < M; i++)
        arc[i] = top * exp (-20.0 * i / (M - 1.0)) * (open ? 0.999 : 1.0);
      holent_vmath_arc_lengths (&bg, M, arc, len);
      for (int i = 0; i < M; i++)
        HT_CLOSE (len[i], closed_form (&bg, arc[i]), 1e-13);
      /* in place */
      holent_vmath_arc_lengths (&bg, M, arc, arc);
      int same = 1;
      for (int i = 0; i < M; i++)
        same = same && arc[i] == len[i];
      HT_CHECK (same, "bulk %d: in place", b);
    }
}

/* Ascending arcs in the BTZ family: against the closed form; the log
   form, then the series of log1p(-e^-2x) from k arc = 3, then past
   k arc = 19 the linear form, which is the kernel's value to the last
   bit.  */
static void
test_sorted (void)
{
  enum { M = 2001 };
  static double arc[M], a1[M], a2[M];
  for (int b = 2; b <= 6; b++)
    {
      if (b == 4)
        continue;  /* thermal AdS: no sinh */
      holent_geo_bg bg;
      HT_STATUS (holent_geo_bg_init (&bg, (holent_bulk) b, 50.0, 1e-5, 0.3,
                                     b >= 5 ? 0.9 : 0.3, 1, 3),
                 HOLENT_SUCCESS);
      for (int i = 0; i < M; i++)
        arc[i] = 1e-6 + 49.9 * i / (M - 1.0);
      holent_vmath_arc_lengths (&bg, M, arc, a1);
      holent_vmath_arc_lengths_sorted (&bg, M, arc, a2);
      /* the series range (3 <= k arc < 19) may differ from the log form
         by rounding, and with two temperatures the kernel takes one log
         of the product of the two expm1 terms where the sorted form
         takes two logs (a few ulps of the log, |log| up to 25 here); the
         linear range is the kernel's value exactly */
      int same = 1;
      const double k = bg.kL < bg.kR ? bg.kL : bg.kR;
      const double tol = bg.kL == bg.kR ? 4e-16 : 1.5e-15;
      for (int i = 0; i < M; i++)
        {
          HT_CLOSE (a2[i], closed_form (&bg, arc[i]), 1e-13);
          HT_CLOSE (a2[i], a1[i], tol);
          if (k * arc[i] >= 19.0)
            same = same && a1[i] == a2[i];
        }
      HT_CHECK (same, "bulk %d: sorted = kernel past k arc = 19", b);
      /* in place (the DP's rows) */
      holent_vmath_arc_lengths_sorted (&bg, M, arc, arc);
      int inplace = 1;
      for (int i = 0; i < M; i++)
        inplace = inplace && arc[i] == a2[i];
      HT_CHECK (inplace, "bulk %d: sorted in place", b);
      for (int i = 0; i < M; i++)
        arc[i] = 1e-6 + 49.9 * i / (M - 1.0);
      /* and for x = k arc in [18.5, 60] directly: log(-expm1(-2x)) = 0 */
      int zero = 1;
      for (double x = 19.0; x < 60.0; x *= 1.00001)
        zero = zero && log (-expm1 (-2.0 * x)) == 0.0;
      HT_CHECK (zero, "log(-expm1(-2x)) = 0 past 19");
    }
}

static void
test_points (void)
{
  holent_geo_bg line, btz;
  holent_geo_bg_init (&line, HOLENT_BULK_POINCARE, 0, 1e-3, 0, 0, 1, 1);
  holent_geo_bg_init (&btz, HOLENT_BULK_BTZ, 5, 1e-3, 1.2, 1.2, 1, 1);
  enum { M = 700 };
  static double x1[M], x2[M], len[M];
  for (int i = 0; i < M; i++)
    {
      x1[i] = -7.0 + 0.05 * i;
      x2[i] = x1[i] + 0.3 + 0.011 * i;  /* separations up to ~8 (> L) */
    }
  HT_STATUS (holent_vmath_point_lengths (&line, M, x1, x2,
                                         HOLENT_GEO_SHORTER, len, NULL),
             HOLENT_SUCCESS);
  for (int i = 0; i < M; i++)
    HT_CLOSE (len[i], closed_form (&line, x2[i] - x1[i]), 1e-13);
  for (int c = 0; c < 3; c++)
    {
      HT_STATUS (holent_vmath_point_lengths (&btz, M, x2, x1,
                                             (holent_geo_class) c, len, NULL),
                 HOLENT_SUCCESS);
      for (int i = 0; i < M; i++)
        {
          double a = fmod (x1[i] - x2[i], 5.0);
          a = a < 0 ? a + 5.0 : a;
          double lp = closed_form (&btz, a), ln = closed_form (&btz, 5.0 - a);
          double want = c == 1 ? lp : c == 2 ? ln : fmin (lp, ln);
          HT_CLOSE (len[i], want, 1e-12);
        }
    }
  /* the shorter geodesic (evaluated over the shorter arc alone) in every
     circle bulk, against the smaller of both closed forms */
  for (int b = 1; b < 8; b++)
    {
      holent_geo_bg bg;
      if (b == 2 || b == 6)
        continue;  /* lines */
      HT_STATUS (holent_geo_bg_init (&bg, (holent_bulk) b, 5, 1e-3, 1.2,
                                     b == 5 ? 0.5 : 1.2, b == 7 ? 0.7 : 1, 1),
                 HOLENT_SUCCESS);
      HT_STATUS (holent_vmath_point_lengths (&bg, M, x2, x1,
                                             HOLENT_GEO_SHORTER, len, NULL),
                 HOLENT_SUCCESS);
      int ok = 1;
      for (int i = 0; i < M; i++)
        {
          double a = fmod (x1[i] - x2[i], 5.0);
          a = a < 0 ? a + 5.0 : a;
          double want = fmin (closed_form (&bg, a), closed_form (&bg, 5.0 - a));
          ok = ok && fabs (len[i] - want) <= 1e-12 * fmax (fabs (want), 1.0);
        }
      HT_CHECK (ok, "bulk %d: shorter = smaller of both", b);
    }
  size_t bad = 0;
  double a[3] = { 0, 1, 2 }, b[3] = { 1, 1, 3 };
  HT_STATUS (holent_vmath_point_lengths (&line, 3, a, b, HOLENT_GEO_SHORTER,
                                         len, &bad), HOLENT_ECOINCIDE);
  HT_CHECK (bad == 1, "bad = %zu", bad);
  b[1] = 6.0;  /* 1 and 6 are one point on the circle of circumference 5 */
  HT_STATUS (holent_vmath_point_lengths (&btz, 3, a, b, HOLENT_GEO_SHORTER,
                                         len, &bad), HOLENT_ECOINCIDE);
  HT_CHECK (bad == 1, "bad = %zu", bad);
  b[1] = NAN;
  HT_STATUS (holent_vmath_point_lengths (&btz, 3, a, b, HOLENT_GEO_SHORTER,
                                         len, &bad), HOLENT_EINVAL);
  b[1] = 2.0;
  a[2] = -1e308;
  b[2] = 1e308;
  HT_STATUS (holent_vmath_point_lengths (&line, 3, a, b, HOLENT_GEO_SHORTER,
                                         len, &bad), HOLENT_EINVAL);
  HT_CHECK (bad == 2, "bad = %zu", bad);
  HT_STATUS (holent_vmath_point_lengths (&line, 3, a, b, (holent_geo_class) 3,
                                         len, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_vmath_point_lengths (NULL, 3, a, b, HOLENT_GEO_SHORTER,
                                         len, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_vmath_point_lengths (&line, 0, NULL, NULL,
                                         HOLENT_GEO_SHORTER, NULL, NULL),
             HOLENT_SUCCESS);
}

int
main (void)
{
  test_kernel ();
  test_sorted ();
  test_points ();
  return HT_DONE ();
}
