/* holent_vmath.c: vectorised regulated lengths (holent_vmath.h).
 * SPDX-License-Identifier: GPL-3.0-or-later */
#include <float.h>
#include <math.h>
#include <gsl/gsl_math.h>
#include "holent_vmath.h"

/* glibc's libmvec has vector forms of log, sin and expm1; declaring them
   simd lets GCC call them from the loops below without -ffast-math (the
   declarations glibc itself makes need __FAST_MATH__).  Sanitizer builds
   (the C unit tests) keep the scalar libm.  */
#if defined(__GNUC__) && !defined(__clang__) && defined(__x86_64__) \
    && defined(__GLIBC__) && !defined(__SANITIZE_ADDRESS__)          \
    && !defined(HOLENT_NO_MVEC)
__attribute__ ((simd ("notinbranch"))) double log (double);
__attribute__ ((simd ("notinbranch"))) double sin (double);
__attribute__ ((simd ("notinbranch"))) double expm1 (double);
__attribute__ ((simd ("notinbranch"))) double exp (double);
#if defined(__ELF__)
#define VM_CLONES __attribute__ ((target_clones ("avx2", "default")))
#endif
#endif
#ifndef VM_CLONES
#define VM_CLONES
#endif

/* log sinh x, x > 0: no overflow, no branch, accurate near 0.  */
static inline double
lnsinh (double x)
{
  return x - M_LN2 + log (-expm1 (-2.0 * x));
}

VM_CLONES static void
len_poincare (double pref, size_t n, const double *arc, double *len)
{
#pragma omp simd
  for (size_t i = 0; i < n; i++)
    len[i] = pref + 2.0 * log (arc[i]);
}

/* Global and thermal AdS (cap = Inf) and the defect (cap = pi/2: beyond
   it the path through the apex, sin = 1, len = pref).  */
VM_CLONES static void
len_sine (double pref, double k, double cap, size_t n, const double *arc,
          double *len)
{
  /* Two passes: GCC does not if-convert the clamp in a loop that also
     calls the vector sin and log.  */
#pragma omp simd
  for (size_t i = 0; i < n; i++)
    {
      double ph = k * arc[i];
      len[i] = ph < cap ? ph : cap;
    }
#pragma omp simd
  for (size_t i = 0; i < n; i++)
    len[i] = pref + 2.0 * log (sin (len[i]));
}

#define VM_BLOCK 512

/* Two temperatures: g(xL) + g(xR) with one log of the product of the
   two expm1 terms (each in [-1, 0), so no overflow): two expm1 and one
   log a value instead of two of each.  The product is a normal number
   when both k arc >= 2^-500 (|expm1(-2x)| >= min(x, 0.6)); a block with
   a shorter arc (far below any cutoff) takes the two logs.  Past k arc =
   19 for both, log(p) = log(1) = 0 and the sum is the linear form of
   holent_vmath_arc_lengths_sorted to the last bit.  */
VM_CLONES static void
len_btz (double pref, double kL, double kR, size_t n, const double *arc,
         double *len)
{
  const double tiny = 0x1p-500 / (kL < kR ? kL : kR);
  for (size_t i0 = 0; i0 < n; i0 += VM_BLOCK)
    {
      const size_t m = n - i0 < VM_BLOCK ? n - i0 : VM_BLOCK;
      const double *a = arc + i0;
      double *y = len + i0;
      int small = 0;
#pragma omp simd reduction(| : small)
      for (size_t i = 0; i < m; i++)
        small |= a[i] < tiny;
      if (small)
        {
#pragma omp simd
          for (size_t i = 0; i < m; i++)
            y[i] = pref + (lnsinh (kL * a[i]) + lnsinh (kR * a[i]));
          continue;
        }
#pragma omp simd
      for (size_t i = 0; i < m; i++)
        {
          double xL = kL * a[i], xR = kR * a[i];
          double p = expm1 (-2.0 * xL) * expm1 (-2.0 * xR);
          y[i] = pref + (((xL - M_LN2) + (xR - M_LN2)) + log (p));
        }
    }
}

/* beta_L = beta_R: one log sinh (g + g = 2 g exactly).  */
VM_CLONES static void
len_btz1 (double pref, double k, size_t n, const double *arc, double *len)
{
#pragma omp simd
  for (size_t i = 0; i < n; i++)
    len[i] = pref + 2.0 * lnsinh (k * arc[i]);
}

void
holent_vmath_arc_lengths (const holent_geo_bg *bg, size_t n,
                          const double *arc, double *len)
{
  switch (bg->bulk)
    {
    case HOLENT_BULK_POINCARE:
      len_poincare (bg->pref, n, arc, len);
      break;
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
      len_sine (bg->pref, bg->kL, 4.0, n, arc, len);  /* ph < pi: no cap */
      break;
    case HOLENT_BULK_CONICAL_DEFECT:
      len_sine (bg->pref, bg->kL, bg->alpha < 1.0 ? M_PI_2 : 4.0, n,
                arc, len);
      break;
    default:
      if (bg->kL == bg->kR)
        len_btz1 (bg->pref, bg->kL, n, arc, len);
      else
        len_btz (bg->pref, bg->kL, bg->kR, n, arc, len);
      break;
    }
}

/* Above this x, expm1(-2x) rounds to -1 and log sinh x = x - log 2
   exactly (e^-38 is below half an ulp of 1).  */
#define LNSINH_LINEAR 19.0
/* From this x on, log(-expm1(-2x)) = log1p(-u), u = e^-2x <= e^-6, is its
   Taylor series to u^6: the remainder u^7/7 < 1e-19, far below an ulp of
   log sinh x >= 2.3, and the rounding of 1 - u that the log form suffers
   (1e-16 absolute) is gone.  One exp instead of an expm1 and a log.  */
#define LNSINH_SERIES 3.0

/* First index in ascending arc[0..n) with k arc >= x0 (bisection).  */
static size_t
first_at_least (double k, double x0, size_t lo, size_t n, const double *arc)
{
  size_t hi = n;
  while (lo < hi)
    {
      size_t mid = lo + (hi - lo) / 2;
      if (k * arc[mid] >= x0)
        hi = mid;
      else
        lo = mid + 1;
    }
  return lo;
}

VM_CLONES static void
lnsinh_series (double k, size_t n, const double *arc, double *g)
{
#pragma omp simd
  for (size_t i = 0; i < n; i++)
    {
      double x = k * arc[i], u = exp (-2.0 * x);
      double p = 1.0 / 5 + u * (1.0 / 6);
      p = 1.0 / 4 + u * p;
      p = 1.0 / 3 + u * p;
      p = 1.0 / 2 + u * p;
      p = 1.0 + u * p;
      g[i] = x - M_LN2 + -(u * p);
    }
}

VM_CLONES static void
lnsinh_full (double k, size_t n, const double *arc, double *g)
{
#pragma omp simd
  for (size_t i = 0; i < n; i++)
    g[i] = lnsinh (k * arc[i]);
}

/* g[i] = log sinh(k arc[i]) for ascending arcs: the log form below
   LNSINH_SERIES, the series up to LNSINH_LINEAR, x - log 2 beyond.  g
   may alias arc.  */
static void
lnsinh_sorted (double k, size_t n, const double *arc, double *g)
{
  size_t i1 = first_at_least (k, LNSINH_SERIES, 0, n, arc);
  size_t i2 = first_at_least (k, LNSINH_LINEAR, i1, n, arc);
  lnsinh_full (k, i1, arc, g);
  lnsinh_series (k, i2 - i1, arc + i1, g + i1);
#pragma omp simd
  for (size_t i = i2; i < n; i++)
    g[i] = k * arc[i] - M_LN2;
}

void
holent_vmath_arc_lengths_sorted (const holent_geo_bg *bg, size_t n,
                                 const double *arc, double *len)
{
  switch (bg->bulk)
    {
    case HOLENT_BULK_POINCARE:
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
    case HOLENT_BULK_CONICAL_DEFECT:
      holent_vmath_arc_lengths (bg, n, arc, len);
      return;
    default:
      break;
    }
  const double pref = bg->pref, kL = bg->kL, kR = bg->kR;
  if (kL == kR)
    {
      lnsinh_sorted (kL, n, arc, len);
#pragma omp simd
      for (size_t i = 0; i < n; i++)
        len[i] = pref + 2.0 * len[i];
      return;
    }
  /* two temperatures: blocks, each arc read before its length is put */
  double gL[VM_BLOCK], gR[VM_BLOCK];
  for (size_t i0 = 0; i0 < n; i0 += VM_BLOCK)
    {
      size_t m = n - i0 < VM_BLOCK ? n - i0 : VM_BLOCK;
      lnsinh_sorted (kL, m, arc + i0, gL);
      lnsinh_sorted (kR, m, arc + i0, gR);
#pragma omp simd
      for (size_t i = 0; i < m; i++)
        len[i0 + i] = pref + (gL[i] + gR[i]);
    }
}

/* The arc from x1 to x2 in the positive sense, or a status.  On a circle
   fmod is exact; for |d| < L it returns d itself, so that case skips the
   call.  */
static inline int
point_arc (const holent_geo_bg *bg, double a, double b, double *arc)
{
  double d = b - a;
  if (!isfinite (a) || !isfinite (b) || !isfinite (d))
    return HOLENT_EINVAL;
  if (!bg->circle)
    {
      *arc = fabs (d);
      return d == 0.0 ? HOLENT_ECOINCIDE : HOLENT_SUCCESS;
    }
  const double L = bg->L;
  double r = (d > -L && d < L) ? d : fmod (d, L);
  if (r < 0.0)
    r += L;
  *arc = r;
  return r == 0.0 || r >= L ? HOLENT_ECOINCIDE : HOLENT_SUCCESS;
}

/* The arcs of point_arc without a branch where |x2 - x1| < L (every pair
   on a line with a finite distance); returns the number of pairs it
   could not settle (bad, or to be reduced modulo L), whose len is then
   meaningless.  Counted in doubles: GCC vectorises that reduction.  */
HOLENT_VM_CLONES __attribute__ ((optimize ("no-trapping-math"))) static double
arcs_plain (const holent_geo_bg *bg, size_t n, const double *x1,
            const double *x2, double *len)
{
  double nb = 0.0;
  if (!bg->circle)
    {
#pragma omp simd reduction(+ : nb)
      for (size_t i = 0; i < n; i++)
        {
          double d = fabs (x2[i] - x1[i]);  /* NaN, Inf: not <= DBL_MAX */
          len[i] = d;
          nb += (d <= DBL_MAX && d != 0.0) ? 0.0 : 1.0;
        }
      return nb;
    }
  const double L = bg->L;
#pragma omp simd reduction(+ : nb)
  for (size_t i = 0; i < n; i++)
    {
      double d = x2[i] - x1[i], r = d < 0.0 ? d + L : d;
      len[i] = r;
      nb += (fabs (d) < L && r != 0.0 && r < L) ? 0.0 : 1.0;
    }
  return nb;
}

int
holent_vmath_point_lengths (const holent_geo_bg *bg, size_t n,
                            const double *x1, const double *x2,
                            holent_geo_class cls, double *len, size_t *bad)
{
  if (bg == NULL || (n > 0 && (x1 == NULL || x2 == NULL || len == NULL)))
    return HOLENT_EINVAL;
  if (cls != HOLENT_GEO_SHORTER && cls != HOLENT_GEO_POSITIVE
      && cls != HOLENT_GEO_NEGATIVE)
    return HOLENT_EINVAL;
  /* Arcs first (into len), in one branch-free pass; only when a pair is
     bad or needs the reduction modulo L, again pair by pair, stopping at
     the first bad one.  */
  if (arcs_plain (bg, n, x1, x2, len) > 0)
    for (size_t i = 0; i < n; i++)
      {
        int st = point_arc (bg, x1[i], x2[i], &len[i]);
        if (st)
          {
            if (bad)
              *bad = i;
            return st;
          }
      }
  const int other = bg->circle && cls != HOLENT_GEO_POSITIVE;
  const double L = bg->L;
  const long nb = (long) ((n + VM_BLOCK - 1) / VM_BLOCK);
#pragma omp parallel for schedule(static) if (n > 200000)
  for (long b = 0; b < nb; b++)
    {
      size_t i0 = (size_t) b * VM_BLOCK;
      size_t m = n - i0 < VM_BLOCK ? n - i0 : VM_BLOCK;
      double *x = len + i0, c[VM_BLOCK];
      if (!other)
        {
          holent_vmath_arc_lengths (bg, m, x, x);
          continue;
        }
      for (size_t i = 0; i < m; i++)
        c[i] = L - x[i];
      if (cls == HOLENT_GEO_NEGATIVE)
        {
          holent_vmath_arc_lengths (bg, m, c, x);
          continue;
        }
      /* The shorter geodesic is the one over the shorter arc: every
         length on a circle is a nondecreasing function of the arc up to
         L/2 and (global, thermal AdS) symmetric about it, or increasing
         (BTZ family, the defect up to its cap) (doc/fast_paths.md).  One
         length a pair.  */
      for (size_t i = 0; i < m; i++)
        x[i] = c[i] < x[i] ? c[i] : x[i];
      holent_vmath_arc_lengths (bg, m, x, x);
    }
  return HOLENT_SUCCESS;
}
