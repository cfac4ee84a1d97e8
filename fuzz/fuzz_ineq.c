/* libFuzzer harness: the entropy-inequality evaluator.
 * The bytes choose N <= 5 parties, an entropy vector with entries of any
 * sign and magnitude up to the double range, a family and m.  Oracle: an
 * independent enumeration in long double (wider range: nothing
 * overflows) of every assignment of the parties to the t regions or to
 * none, giving the exact orbit count (the symmetry group acts freely on
 * tuples of disjoint non-empty regions), the worst value and the
 * violations; the subset must be no worse than the complete set; no
 * instance is ever undecided, no value NaN; the worst instance reported
 * evaluates to the worst value.
 * fuzz-core: holent_ineq holent_status
 * fuzz-runs: 3000 (make check)
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <float.h>
#include <stdio.h>
#include <stdlib.h>
#include "fuzz_input.h"
#include "holent_ineq.h"


static long double
S (const double *s, uint32_t x)
{
  return (long double) s[x - 1];
}

static long double
value (const double *s, holent_ineq_family fam, unsigned t, const uint32_t *r)
{
  uint32_t x = r[0], y = r[1], z = t > 2 ? r[2] : 0;
  switch (fam)
    {
    case HOLENT_INEQ_SA: return S (s, x) + S (s, y) - S (s, x | y);
    case HOLENT_INEQ_AL: return S (s, x | y) + S (s, y) - S (s, x);
    case HOLENT_INEQ_SSA: return S (s, x | y) + S (s, y | z) - S (s, y) - S (s, x | y | z);
    case HOLENT_INEQ_WM: return S (s, x | y) + S (s, y | z) - S (s, x) - S (s, z);
    case HOLENT_INEQ_MMI:
      return S (s, x | y) + S (s, y | z) + S (s, x | z) - S (s, x) - S (s, y)
             - S (s, z) - S (s, x | y | z);
    default:
      {
        unsigned k = (t - 1) / 2;
        long double v = 0;
        uint32_t all = 0;
        for (unsigned i = 0; i < t; i++)
          {
            uint32_t u = 0;
            for (unsigned j = 1; j <= k; j++)
              u |= r[(i + j) % t];
            v += S (s, u | r[i]) - S (s, u);
            all |= r[i];
          }
        return v - S (s, all);
      }
    }
}

int
LLVMFuzzerTestOneInput (const uint8_t *data, size_t size)
{
  fuzz_in in = { data, size };
  unsigned n = (unsigned) fz_int (&in, 1, 5);
  holent_ineq_family fam = (holent_ineq_family) fz_int (&in, 0, 5);
  unsigned m = 3 + 2 * (unsigned) fz_int (&in, 0, 1), t;
  double s[31], scale = fz_mag (&in, -300, 308), tol;
  size_t len = ((size_t) 1 << n) - 1;
  for (size_t i = 0; i < len; i++)
    {
      unsigned kind = fz_byte (&in) % 4;
      double v = (kind == 0 ? 1.0 : fz_unit (&in)) * scale;
      if (kind == 3)
        v = -v;
      if (kind == 2)
        v = scale * __builtin_popcount ((unsigned) i + 1);  /* additive */
      s[i] = isfinite (v) ? v : DBL_MAX;
    }
  tol = fz_byte (&in) < 128 ? 0.0 : scale * fz_mag (&in, -16, 0);
  if (holent_ineq_nregions (fam, m, &t) != HOLENT_SUCCESS)
    return 0;
  holent_ineq_result res, sub;
  int st = holent_ineq_eval (n, s, fam, m, 1, tol, &res, NULL);
  if (fam == HOLENT_INEQ_CYCLIC && m > n)
    {
      CHECK (st == HOLENT_EDOM, "m > n: status %d", st);
      return 0;
    }
  CHECK (st == HOLENT_SUCCESS, "status %d", st);
  CHECK (res.undecided == 0 && !isnan (res.worst), "undecided %g worst %g",
         res.undecided, res.worst);

  /* independent enumeration: every map of the n parties to 0..t */
  unsigned group = fam == HOLENT_INEQ_SA || fam == HOLENT_INEQ_SSA || fam == HOLENT_INEQ_WM ? 2
                   : fam == HOLENT_INEQ_AL ? 1 : fam == HOLENT_INEQ_MMI ? 6 : 2 * t;
  long double worst = INFINITY, near = INFINITY, ltol = tol;
  double ordered = 0, viol = 0;
  unsigned long total = 1;
  for (unsigned j = 0; j < n; j++)
    total *= t + 1;
  for (unsigned long code = 0; code < total; code++)
    {
      uint32_t r[HOLENT_INEQ_NMAX] = { 0 };
      unsigned long c = code;
      for (unsigned j = 0; j < n; j++, c /= t + 1)
        if (c % (t + 1))
          r[c % (t + 1) - 1] |= 1u << j;
      unsigned ok = 1;
      for (unsigned j = 0; j < t; j++)
        ok &= r[j] != 0;
      if (!ok)
        continue;
      long double v = value (s, fam, t, r);
      ordered += 1;
      viol += v < -ltol;
      if (v < worst)
        worst = v;
      near = fminl (near, fabsl (v + ltol));
    }
  long double mag = 0;
  for (size_t i = 0; i < len; i++)
    mag = fmaxl (mag, fabsl ((long double) s[i]));
  long double err = 64 * DBL_EPSILON * mag;  /* a few roundings of scaled sums */
  CHECK (res.count * group == ordered, "count %g, orbits %g", res.count, ordered / group);
  if (ordered == 0)
    return 0;
  if (fabsl (worst) + err <= (long double) DBL_MAX)
    CHECK (fabsl ((long double) res.worst - worst) <= err,
           "worst %.17g, long double %.17Lg", res.worst, worst);
  else
    CHECK ((isinf (res.worst) || fabsl (res.worst - worst) <= err) && (res.worst > 0) == (worst > 0),
           "worst %g beyond the range should be +-Inf", res.worst);
  if (near > err)
    CHECK (res.violated * group == viol, "violated %g, expected %g", res.violated, viol / group);
  if (res.nregions > 0 && isfinite (res.worst))
    {
      double v;
      CHECK (holent_ineq_value (n, s, fam, m, res.regions, &v) == HOLENT_SUCCESS, "value");
      CHECK (v == res.worst, "worst instance %.17g vs worst %.17g", v, res.worst);
    }
  st = holent_ineq_eval (n, s, fam, m, 0, tol, &sub, NULL);
  CHECK (st == HOLENT_SUCCESS && !isnan (sub.worst) && sub.undecided == 0, "subset");
  CHECK (sub.worst >= res.worst, "subset worse than the complete set");
  return 0;
}
