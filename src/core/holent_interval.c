/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_interval.c: single-interval RT entropies (entanglement plateaux
 * on the BTZ circle), evaluated in blocks by the vectorised length kernel.
 * GPL-3.0-or-later.  */
#include <float.h>
#include <math.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include "holent_root.h"
#include "holent_interval.h"
#include "holent_vmath.h"

static int
length_ok (const holent_geo_bg *bg, double l)
{
  if (!isfinite (l) || !(l > 0.0))
    return 0;
  return bg->circle ? l <= bg->L : 1;
}

/* One block of lengths, all valid.  On a circle one geodesic a value:
 * without a horizon the one over the shorter arc; with one, the geodesic
 * over l when the complement's arc L - l is at least m_star
 * (holent_interval_plateau), else the complementary one plus the horizon
 * (doc/fast_paths.md: the two candidates are equal at L - l = m_star and
 * their difference is monotone in l).  No per-element branch: the
 * selections vectorise and the lengths come from the vectorised kernel
 * in one call.  */
#define IV_BLOCK 512

/* no-trapping-math: lets GCC if-convert the selections (no FP exception
   flags are read anywhere; results are unchanged).  */
HOLENT_VM_CLONES __attribute__ ((optimize ("no-trapping-math"))) static void
entropy_block (const holent_geo_bg *bg, double m_star, size_t n,
               const double *l, double *S, unsigned char *branch)
{
  const double c6 = bg->c / 6.0, L = bg->L;
  double add[IV_BLOCK];
  if (!bg->circle)
    {
      holent_vmath_arc_lengths (bg, n, l, S);
#pragma omp simd
      for (size_t i = 0; i < n; i++)
        S[i] = c6 * S[i];
      if (branch)
        for (size_t i = 0; i < n; i++)
          branch[i] = 0;
      return;
    }
  /* The arc whose geodesic is taken (into S, then its length in place),
     and the branch: with a horizon the complement when its arc L - l is
     below m_star; without one the shorter side (both give the same
     surface up to rounding at l = L/2: the branch is named by geometry).
     l = L (the whole circle) gets a harmless stand-in, replaced below.  */
  const double sbh = bg->S_BH;
  const int hz = bg->horizon;
  const double whole = hz ? L : 0.5 * L;
#pragma omp simd
  for (size_t i = 0; i < n; i++)
    {
      double c = L - l[i], t = hz ? m_star : l[i];
      double a = c < t ? c : l[i], br = c < t ? 1.0 : 0.0;
      S[i] = l[i] < L ? a : whole;
      add[i] = l[i] < L ? br : 2.0;
    }
  holent_vmath_arc_lengths (bg, n, S, S);
  /* add[i] is the branch (0 or 1), or 2 for the whole circle (S_BH or
     0, branch 1); l is not read again, so S may alias it */
#pragma omp simd
  for (size_t i = 0; i < n; i++)
    {
      double s = c6 * S[i] + add[i] * sbh;
      S[i] = add[i] > 1.5 ? sbh : s;
    }
  if (branch)
    for (size_t i = 0; i < n; i++)
      branch[i] = add[i] != 0.0;
}

/* Invalid and short lengths, counted without a branch (in doubles, exact
   below 2^53: GCC vectorises this reduction, not the one in integers).  */
HOLENT_VM_CLONES static void
count_lengths (const holent_geo_bg *bg, size_t n, const double *l,
               size_t *nbad, size_t *nshort)
{
  const double two_eps = 2.0 * bg->eps;
  const double lmax = bg->circle ? bg->L : DBL_MAX;  /* rejects Inf, NaN */
  double b = 0.0, sh = 0.0;
#pragma omp simd reduction(+ : b, sh)
  for (size_t i = 0; i < n; i++)
    {
      b += (l[i] > 0.0 && l[i] <= lmax) ? 0.0 : 1.0;
      sh += l[i] <= two_eps ? 1.0 : 0.0;
    }
  *nbad = (size_t) b;
  *nshort = (size_t) sh;
}

/* F(m) = sum over the temperatures of log sinh k(L - m) - log sinh km -
   kL, written without the large terms that cancel: the length of the
   interval (arc L - m) minus that of the complement (arc m) plus the
   horizon, over c/6.  Decreasing in m: F'(m) = -sum k (coth k(L - m) +
   coth km) < 0.  */
static double
plateau_gap (double m, void *vbg)
{
  const holent_geo_bg *bg = vbg;
  const double L = bg->L, k2[2] = { bg->kL, bg->kR };
  double f = 0.0;
  for (int j = 0; j < 2; j++)
    {
      const double k = k2[j];
      f += (-k * m - M_LN2 + log (-expm1 (-2.0 * k * (L - m))))
           - holent_geo_lnsinh (k * m);
    }
  return f;
}

/* One temperature: k m* in closed form, from sinh(k l*) = e^{kL} sinh(k
   (L - l*)), i.e. e^{2 k l*} = (e^{2kL} + 1)/2 (doc/fast_paths.md).  */
static double
plateau_one (double k, double L)
{
  const double X = k * L;
  if (X >= 1.0)
    return (0.5 * M_LN2 - 0.5 * log1p (exp (-2.0 * X))) / k;
  return (X - 0.5 * log1p (0.5 * expm1 (2.0 * X))) / k;
}

int
holent_interval_plateau (const holent_geo_bg *bg, double *m_star)
{
  if (bg == NULL || m_star == NULL)
    return HOLENT_EINVAL;
  if (!bg->circle || !bg->horizon)
    return HOLENT_EDOM;
  const double L = bg->L;
  double lo = plateau_one (bg->kL, L), hi = plateau_one (bg->kR, L);
  if (lo == hi)
    {
      *m_star = lo;
      return HOLENT_SUCCESS;
    }
  if (lo > hi)
    {
      double t = lo;
      lo = hi;
      hi = t;
    }
  /* Two temperatures: the root of the sum lies between the roots of
     its two decreasing terms (Brent's method, GSL).  */
  if (plateau_gap (lo, (void *) bg) <= 0.0)
    {
      *m_star = lo;
      return HOLENT_SUCCESS;
    }
  if (plateau_gap (hi, (void *) bg) >= 0.0)
    {
      *m_star = hi;
      return HOLENT_SUCCESS;
    }
  double m;
  int st = holent_root_brent (plateau_gap, (void *) bg, lo, hi, 0.0,
                              4.0 * DBL_EPSILON, 200, &m);
  if (st)
    return st;
  *m_star = m;
  return HOLENT_SUCCESS;
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
  double m_star = 0.0;
  if (bg->circle && bg->horizon)
    {
      int st = holent_interval_plateau (bg, &m_star);
      if (st)
        return st;
    }
  const long nb = (long) ((n + IV_BLOCK - 1) / IV_BLOCK);
#pragma omp parallel for schedule(static) if (n > 200000)
  for (long b = 0; b < nb; b++)
    {
      size_t i0 = (size_t) b * IV_BLOCK;
      size_t m = n - i0 < IV_BLOCK ? n - i0 : IV_BLOCK;
      entropy_block (bg, m_star, m, l + i0, S + i0,
                     branch ? branch + i0 : NULL);
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
