/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_interval.c: single-interval RT entropies (entanglement plateaux
 * on the BTZ circle), evaluated in blocks by the vectorised length kernel.
 * GPL-3.0-or-later.  */
#include <float.h>
#include <math.h>
#include "holent_interval.h"
#include "holent_vmath.h"

static int
length_ok (const holent_geo_bg *bg, double l)
{
  if (!isfinite (l) || !(l > 0.0))
    return 0;
  return bg->circle ? l <= bg->L : 1;
}

/* One block of lengths, all valid: the geodesic over l and, on a circle,
 * the one over L - l (plus the horizon); no per-element branch, so the
 * lengths come from the vectorised kernel and the choice vectorises.  */
#define IV_BLOCK 512

/* no-trapping-math: lets GCC if-convert the selections (no FP exception
   flags are read anywhere; results are unchanged).  */
__attribute__ ((optimize ("no-trapping-math"))) static void
entropy_block (const holent_geo_bg *bg, size_t n, const double *l,
               double *S, unsigned char *branch)
{
  const double c6 = bg->c / 6.0, L = bg->L;
  double d[IV_BLOCK], cp[IV_BLOCK];
  holent_vmath_arc_lengths (bg, n, l, d);
  if (!bg->circle)
    {
#pragma omp simd
      for (size_t i = 0; i < n; i++)
        S[i] = c6 * d[i];
      if (branch)
        for (size_t i = 0; i < n; i++)
          branch[i] = 0;
      return;
    }
  /* the complementary arc; l = L (the whole circle) gets a harmless
     stand-in and is replaced below */
  /* (selections only: with IEEE traps GCC does not if-convert arithmetic) */
#pragma omp simd
  for (size_t i = 0; i < n; i++)
    {
      double c = L - l[i];
      cp[i] = l[i] < L ? c : L;
    }
  holent_vmath_arc_lengths (bg, n, cp, cp);
  const double sbh = bg->S_BH;
  if (bg->horizon)
    {
#pragma omp simd
      for (size_t i = 0; i < n; i++)
        {
          double a = c6 * d[i], b = c6 * cp[i] + sbh;
          double s = b < a ? b : a, br = b < a ? 1.0 : 0.0;
          S[i] = l[i] >= L ? sbh : s;  /* whole circle: the horizon */
          cp[i] = l[i] >= L ? 1.0 : br;
        }
    }
  else
    {
      /* Both sides give the same surface, up to rounding at l = L/2:
         name the branch by geometry.  */
#pragma omp simd
      for (size_t i = 0; i < n; i++)
        {
          double a = c6 * d[i], b = c6 * cp[i], c = L - l[i];
          double s = l[i] > c ? b : a, br = l[i] > c ? 1.0 : 0.0;
          S[i] = l[i] >= L ? 0.0 : s;  /* whole circle: nothing */
          cp[i] = l[i] >= L ? 1.0 : br;
        }
    }
  if (branch)
    for (size_t i = 0; i < n; i++)
      branch[i] = (unsigned char) cp[i];
}

/* Invalid and short lengths, counted without a branch.  */
__attribute__ ((optimize ("no-trapping-math"))) static void
count_lengths (const holent_geo_bg *bg, size_t n, const double *l,
               size_t *nbad, size_t *nshort)
{
  const double two_eps = 2.0 * bg->eps;
  const double lmax = bg->circle ? bg->L : DBL_MAX;  /* rejects Inf, NaN */
  size_t b = 0, sh = 0;
#pragma omp simd reduction(+ : b, sh)
  for (size_t i = 0; i < n; i++)
    {
      b += !((l[i] > 0.0) & (l[i] <= lmax));
      sh += l[i] <= two_eps;
    }
  *nbad = b;
  *nshort = sh;
}

int
holent_interval_entropy (const holent_geo_bg *bg, size_t n, const double *l,
                         double *S, unsigned char *branch, size_t *bad,
                         size_t *n_short)
{
  if (bg == NULL || (n > 0 && (l == NULL || S == NULL)))
    return HOLENT_EINVAL;

  /* Check first, in one pass without an early exit (the common case is
     all valid), counting the short intervals on the way.  */
  size_t nbad, nshort;
  count_lengths (bg, n, l, &nbad, &nshort);
  if (nbad > 0)
    {
      for (size_t i = 0; i < n; i++)
        if (!length_ok (bg, l[i]))
          {
            if (bad)
              *bad = i;
            return isnan (l[i]) ? HOLENT_EINVAL : HOLENT_EDOM;
          }
    }
  const long nb = (long) ((n + IV_BLOCK - 1) / IV_BLOCK);
#pragma omp parallel for schedule(static) if (n > 200000)
  for (long b = 0; b < nb; b++)
    {
      size_t i0 = (size_t) b * IV_BLOCK;
      size_t m = n - i0 < IV_BLOCK ? n - i0 : IV_BLOCK;
      entropy_block (bg, m, l + i0, S + i0, branch ? branch + i0 : NULL);
    }
  if (n_short)
    *n_short = nshort;
  return HOLENT_SUCCESS;
}

int
holent_interval_check (const holent_geo_bg *bg, size_t i, double l,
                       holent_err *e)
{
  holent_err_clear (e);
  if (bg == NULL)
    return holent_err_set (e, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  if (isnan (l))
    return holent_err_set (e, HOLENT_ENAN, 0, i, NULL);
  if (length_ok (bg, l))
    return HOLENT_SUCCESS;
  if (bg->circle)
    return holent_err_set (e, HOLENT_EDOM, 0, i, "must lie in (0, "
                           "circumference] = (0, %g], got %g", bg->L, l);
  return holent_err_set (e, HOLENT_EDOM, 0, i, "must be a positive length "
                         "(finite), got %g", l);
}
