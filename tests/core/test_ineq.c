/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Unit tests of holent_ineq: every error path; instance counts and worst
 * values against a brute force written here independently (every way of
 * giving each party to one of the t regions or to none, orbits
 * represented by their lexicographically smallest tuple under the
 * family's symmetry group); the subsets against their own enumeration;
 * and the 4-party GHZ vector, which violates MMI (Hayden, Headrick and
 * Maloney 2011, arXiv:1107.2940, from memory: S = log 2 for every proper
 * subset of a 4-party GHZ state).  */
#include <math.h>
#include <stdint.h>
#include <stdlib.h>
#include <string.h>
#include "holent_ctest.h"
#include "holent_ineq.h"

#define NF 6
static const holent_ineq_family fams[NF] = {
  HOLENT_INEQ_SA, HOLENT_INEQ_AL, HOLENT_INEQ_SSA, HOLENT_INEQ_WM,
  HOLENT_INEQ_MMI, HOLENT_INEQ_CYCLIC
};

/* S of a non-empty mask in the test's own notation */
static double
S (const double *s, uint32_t x)
{
  return s[x - 1];
}

/* lhs - rhs written out from the definitions, independently of the core */
static double
ref_value (const double *s, holent_ineq_family f, unsigned t,
           const uint32_t *r)
{
  uint32_t x = r[0], y = r[1], z = t > 2 ? r[2] : 0, all = 0;
  unsigned i, j, k = (t - 1) / 2;
  double lhs = 0, rhs = 0;
  switch (f)
    {
    case HOLENT_INEQ_SA:
      return S (s, x) + S (s, y) - S (s, x | y);
    case HOLENT_INEQ_AL:
      return S (s, x | y) - (S (s, x) - S (s, y));
    case HOLENT_INEQ_SSA:
      return S (s, x | y) + S (s, y | z) - S (s, y) - S (s, x | y | z);
    case HOLENT_INEQ_WM:
      return S (s, x | y) + S (s, y | z) - S (s, x) - S (s, z);
    case HOLENT_INEQ_MMI:
      return (S (s, x | y) + S (s, y | z) + S (s, z | x))
             - (S (s, x) + S (s, y) + S (s, z) + S (s, x | y | z));
    default:
      /* sum of (k+1)-blocks >= sum of k-blocks + all (Bao et al 2015) */
      for (i = 0; i < t; i++)
        {
          uint32_t b1 = 0, b0 = 0;
          for (j = 0; j <= k; j++)
            b1 |= r[(i + j) % t];
          for (j = 0; j < k; j++)
            b0 |= r[(i + j) % t];
          lhs += S (s, b1);
          rhs += S (s, b0);
          all |= r[i];
        }
      return lhs - rhs - S (s, all);
    }
}

/* permutations of the family's symmetry group, perm[g][j] = source index */
static unsigned
group (holent_ineq_family f, unsigned t, unsigned perm[][HOLENT_INEQ_NMAX])
{
  static const unsigned s3[6][3] = { { 0, 1, 2 }, { 0, 2, 1 }, { 1, 0, 2 },
                                     { 1, 2, 0 }, { 2, 0, 1 }, { 2, 1, 0 } };
  unsigned g, j;
  switch (f)
    {
    case HOLENT_INEQ_SA:
      perm[0][0] = 0, perm[0][1] = 1, perm[1][0] = 1, perm[1][1] = 0;
      return 2;
    case HOLENT_INEQ_AL:
      perm[0][0] = 0, perm[0][1] = 1;
      return 1;
    case HOLENT_INEQ_SSA:
    case HOLENT_INEQ_WM:
      for (j = 0; j < 3; j++)
        perm[0][j] = j, perm[1][j] = 2 - j;
      return 2;
    case HOLENT_INEQ_MMI:
      for (g = 0; g < 6; g++)
        for (j = 0; j < 3; j++)
          perm[g][j] = s3[g][j];
      return 6;
    default:
      for (g = 0; g < t; g++)
        for (j = 0; j < t; j++)
          {
            perm[2 * g][j] = (g + j) % t;
            perm[2 * g + 1][j] = (g + t - j) % t;
          }
      return 2 * t;
    }
}

/* brute force over all (t+1)^n labellings; orbits counted once */
static void
brute (unsigned n, const double *s, holent_ineq_family f, unsigned t,
       double *count, double *worst)
{
  unsigned perm[2 * HOLENT_INEQ_NMAX][HOLENT_INEQ_NMAX];
  unsigned ng = group (f, t, perm), lab[HOLENT_INEQ_NMAX] = { 0 };
  unsigned i, j, g;
  *count = 0;
  *worst = INFINITY;
  for (;;)
    {
      uint32_t r[HOLENT_INEQ_NMAX] = { 0 };
      int ok = 1;
      for (i = 0; i < n; i++)
        if (lab[i])
          r[lab[i] - 1] |= 1u << i;
      for (j = 0; j < t; j++)
        ok = ok && r[j] != 0;
      for (g = 0; ok && g < ng; g++)
        for (j = 0; j < t; j++)
          {
            uint32_t a = r[perm[g][j]];
            if (a != r[j])
              {
                ok = a > r[j];  /* r must be lexicographically smallest */
                break;
              }
          }
      if (ok)
        {
          double v = ref_value (s, f, t, r);
          *count += 1;
          if (v < *worst)
            *worst = v;
        }
      for (i = 0; i < n && ++lab[i] > t; i++)
        lab[i] = 0;
      if (i == n)
        break;
    }
}

static double
randu (void)
{
  return rand () / (RAND_MAX + 1.0);
}

static int
popcount (uint32_t x)
{
  int c = 0;
  for (; x; x &= x - 1)
    c++;
  return c;
}

static void
test_errors (void)
{
  double s[31] = { 0 }, v;
  unsigned n, t;
  uint32_t r[3] = { 1, 2, 4 };
  holent_ineq_result res;
  HT_STATUS (holent_ineq_nparties (7, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_ineq_nparties (0, &n), HOLENT_EDOM);
  HT_STATUS (holent_ineq_nparties (6, &n), HOLENT_EDOM);
  HT_STATUS (holent_ineq_nparties (((size_t) 1 << 17) - 1, &n), HOLENT_ETOOBIG);
  HT_STATUS (holent_ineq_nparties (((size_t) 1 << 16) - 1, &n), HOLENT_SUCCESS);
  HT_CHECK (n == 16, "n = %u", n);
  HT_STATUS (holent_ineq_nparties (1, &n), HOLENT_SUCCESS);
  HT_CHECK (n == 1, "n = %u", n);
  HT_STATUS (holent_ineq_nregions (HOLENT_INEQ_SA, 0, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_ineq_nregions ((holent_ineq_family) 42, 0, &t), HOLENT_EINVAL);
  HT_STATUS (holent_ineq_nregions (HOLENT_INEQ_CYCLIC, 4, &t), HOLENT_EDOM);
  HT_STATUS (holent_ineq_nregions (HOLENT_INEQ_CYCLIC, 1, &t), HOLENT_EDOM);
  HT_STATUS (holent_ineq_nregions (HOLENT_INEQ_CYCLIC, 17, &t), HOLENT_EDOM);
  HT_STATUS (holent_ineq_nregions (HOLENT_INEQ_CYCLIC, 7, &t), HOLENT_SUCCESS);
  HT_CHECK (t == 7, "t = %u", t);

  HT_STATUS (holent_ineq_value (3, s, HOLENT_INEQ_MMI, 0, NULL, &v), HOLENT_EINVAL);
  HT_STATUS (holent_ineq_value (3, s, HOLENT_INEQ_MMI, 0, r, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_ineq_value (3, NULL, HOLENT_INEQ_MMI, 0, r, &v), HOLENT_EINVAL);
  HT_STATUS (holent_ineq_value (0, s, HOLENT_INEQ_MMI, 0, r, &v), HOLENT_EDOM);
  HT_STATUS (holent_ineq_value (17, s, HOLENT_INEQ_MMI, 0, r, &v), HOLENT_ETOOBIG);
  HT_STATUS (holent_ineq_value (2, s, HOLENT_INEQ_MMI, 0, r, &v), HOLENT_EDOM);
  HT_STATUS (holent_ineq_value (3, s, HOLENT_INEQ_CYCLIC, 5, r, &v), HOLENT_EDOM);
  r[1] = 0;
  HT_STATUS (holent_ineq_value (3, s, HOLENT_INEQ_MMI, 0, r, &v), HOLENT_EDOM);
  r[1] = 3;
  HT_STATUS (holent_ineq_value (3, s, HOLENT_INEQ_MMI, 0, r, &v), HOLENT_EOVERLAP);
  r[1] = 2;
  HT_STATUS (holent_ineq_value (3, s, HOLENT_INEQ_MMI, 0, r, &v), HOLENT_SUCCESS);

  HT_STATUS (holent_ineq_eval (3, s, HOLENT_INEQ_SA, 0, 1, 0, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_ineq_eval (3, NULL, HOLENT_INEQ_SA, 0, 1, 0, &res, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_ineq_eval (3, s, HOLENT_INEQ_SA, 0, 1, NAN, &res, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_ineq_eval (3, s, HOLENT_INEQ_SA, 0, 1, -1e-3, &res, NULL), HOLENT_EDOM);
  HT_STATUS (holent_ineq_eval (3, s, HOLENT_INEQ_SA, 0, 1, INFINITY, &res, NULL), HOLENT_EDOM);
  HT_STATUS (holent_ineq_eval (0, s, HOLENT_INEQ_SA, 0, 1, 0, &res, NULL), HOLENT_EDOM);
  HT_STATUS (holent_ineq_eval (17, s, HOLENT_INEQ_SA, 0, 1, 0, &res, NULL), HOLENT_ETOOBIG);
  HT_STATUS (holent_ineq_eval (3, s, (holent_ineq_family) -1, 0, 1, 0, &res, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_ineq_eval (3, s, HOLENT_INEQ_CYCLIC, 5, 1, 0, &res, NULL), HOLENT_EDOM);
  HT_STATUS (holent_ineq_eval (3, s, HOLENT_INEQ_CYCLIC, 2, 1, 0, &res, NULL), HOLENT_EDOM);
  s[4] = NAN;
  HT_STATUS (holent_ineq_eval (3, s, HOLENT_INEQ_SA, 0, 1, 0, &res, NULL), HOLENT_EINVAL);
  s[4] = INFINITY;
  HT_STATUS (holent_ineq_eval (3, s, HOLENT_INEQ_SA, 0, 1, 0, &res, NULL), HOLENT_EINVAL);
  s[4] = 0;
  {
    /* complete enumeration beyond the budget is refused, not attempted */
    double *big = calloc (((size_t) 1 << 16) - 1, sizeof *big);
    HT_CHECK (big != NULL, "calloc");
    if (big)
      {
        HT_STATUS (holent_ineq_eval (16, big, HOLENT_INEQ_MMI, 0, 1, 0, &res, NULL), HOLENT_ETOOBIG);
        HT_STATUS (holent_ineq_eval (16, big, HOLENT_INEQ_CYCLIC, 5, 1, 0, &res, NULL), HOLENT_ETOOBIG);
        HT_STATUS (holent_ineq_eval (12, big, HOLENT_INEQ_CYCLIC, 5, 1, 0, &res, NULL), HOLENT_ETOOBIG);
        /* SA is always complete: N = 16 is fine */
        HT_STATUS (holent_ineq_eval (16, big, HOLENT_INEQ_SA, 0, 0, 0, &res, NULL), HOLENT_SUCCESS);
        HT_CLOSE (res.count, (43046721.0 - 131072.0 + 1.0) / 2, 0);
        HT_CHECK (res.worst == 0.0 && res.violated == 0, "zero vector");
        free (big);
      }
  }
  /* N = 1: no instance at all */
  s[0] = 1.0;
  HT_STATUS (holent_ineq_eval (1, s, HOLENT_INEQ_SA, 0, 1, 0, &res, NULL), HOLENT_SUCCESS);
  HT_CHECK (res.count == 0 && isinf (res.worst) && res.nregions == 0, "N = 1");
}

/* complete sets against the brute force, random vectors */
static void
test_complete (void)
{
  double s[127], cnt, worst;
  holent_ineq_result res;
  unsigned n, f, m, i;
  for (n = 1; n <= 6; n++)
    for (f = 0; f < NF; f++)
      for (m = 3; m <= (fams[f] == HOLENT_INEQ_CYCLIC ? n : 3); m += 2)
        {
          unsigned t;
          holent_ineq_nregions (fams[f], m, &t);
          for (i = 0; i < ((1u << n) - 1); i++)
            s[i] = randu () * popcount (i + 1) - 0.3 * randu ();
          HT_STATUS (holent_ineq_eval (n, s, fams[f], m, 1, 0.0, &res, NULL), HOLENT_SUCCESS);
          brute (n, s, fams[f], t, &cnt, &worst);
          HT_CHECK (res.count == cnt, "n %u family %u m %u: count %g, brute %g",
                    n, f, m, res.count, cnt);
          /* the sums are formed in another order: rounding only */
          HT_CHECK (fabs (res.worst - worst) <= 1e-13 || (isinf (worst) && isinf (res.worst)),
                    "n %u family %u m %u: worst %.17g, brute %.17g", n, f, m,
                    res.worst, worst);
          if (res.count > 0)
            {
              double v;
              HT_CHECK (res.nregions == t, "nregions %u", res.nregions);
              HT_STATUS (holent_ineq_value (n, s, fams[f], m, res.regions, &v), HOLENT_SUCCESS);
              HT_CLOSE (v, ref_value (s, fams[f], t, res.regions), 1e-14);
              HT_CLOSE (v, res.worst, 0);
            }
        }
}

/* subsets: own enumeration of the documented rule */
static void
test_subsets (void)
{
  static double s[(1u << 8) - 1];
  holent_ineq_result res;
  unsigned n, f, m, i;
  for (n = 6; n <= 8; n++)
    {
      uint32_t full = (1u << n) - 1;
      for (i = 0; i < full; i++)
        s[i] = 3 * randu () - 1;
      for (f = 2; f < NF; f++)
        for (m = 3; m <= (fams[f] == HOLENT_INEQ_CYCLIC ? n : 3); m += 2)
          {
            double cnt = 0, worst = INFINITY, v, viol = 0, tol = 0.5;
            uint32_t r[HOLENT_INEQ_NMAX], x, y, z, c;
            unsigned t, j;
            holent_ineq_nregions (fams[f], m, &t);
            HT_STATUS (holent_ineq_eval (n, s, fams[f], m, 0, tol, &res, NULL), HOLENT_SUCCESS);
            if (t == 3)
              {
                /* single parties and covering triples, by brute force */
                for (x = 1; x <= full; x++)
                  for (y = 1; y <= full; y++)
                    for (z = 1; z <= full; z++)
                      {
                        int single = popcount (x) == 1 && popcount (y) == 1
                                     && popcount (z) == 1;
                        int cover = (x | y | z) == full;
                        int sym = fams[f] == HOLENT_INEQ_SSA || fams[f] == HOLENT_INEQ_WM
                                  ? x < z : x < y && y < z;
                        if ((x & y) || (y & z) || (x & z) || !sym || !(single || cover))
                          continue;
                        r[0] = x, r[1] = y, r[2] = z;
                        v = ref_value (s, fams[f], 3, r);
                        cnt++, viol += v < -tol;
                        worst = v < worst ? v : worst;
                      }
              }
            else
              {
                /* increasing single parties: masks with m bits */
                for (c = 1; c <= full; c++)
                  if (popcount (c) == (int) m)
                    {
                      for (i = 0, j = 0; i < n; i++)
                        if (c >> i & 1)
                          r[j++] = 1u << i;
                      v = ref_value (s, fams[f], m, r);
                      cnt++, viol += v < -tol;
                      worst = v < worst ? v : worst;
                    }
                /* cuts into m consecutive blocks: m - 1 of the n - 1 gaps */
                for (c = 0; c < (1u << (n - 1)); c++)
                  if (popcount (c) == (int) m - 1 && m < n)
                    {
                      uint32_t blk = 0;
                      for (i = 0, j = 0; i < n; i++)
                        {
                          blk |= 1u << i;
                          if (i == n - 1 || (c >> i & 1))
                            r[j++] = blk, blk = 0;
                        }
                      v = ref_value (s, fams[f], m, r);
                      cnt++, viol += v < -tol;
                      worst = v < worst ? v : worst;
                    }
              }
            HT_CHECK (res.count == cnt, "subset n %u f %u m %u: %g vs %g", n, f, m,
                      res.count, cnt);
            HT_CHECK (res.violated == viol, "subset n %u f %u m %u: violated %g vs %g",
                      n, f, m, res.violated, viol);
            HT_CLOSE (res.worst, worst, 1e-14);
          }
    }
}

/* The 4-party GHZ state: S = log 2 on every non-empty proper subset,
   S(ABCD) = 0 (pure).  MMI on three single parties gives -log 2.  */
static void
test_ghz (void)
{
  double s[15];
  holent_ineq_result res;
  unsigned i;
  for (i = 0; i < 15; i++)
    s[i] = log (2.0);
  s[14] = 0;
  HT_STATUS (holent_ineq_eval (4, s, HOLENT_INEQ_MMI, 0, 1, 1e-12, &res, NULL), HOLENT_SUCCESS);
  HT_CLOSE (res.worst, -log (2.0), 1e-15);
  /* MMI (X, Y, Z) with X, Y, Z single parties of not covering all four: 4 of 10 */
  HT_CHECK (res.count == 10, "count %g", res.count);
  HT_CHECK (res.violated == 4, "violated %g", res.violated);
  HT_CHECK (res.nregions == 3 && popcount (res.regions[0] | res.regions[1] | res.regions[2]) == 3,
            "worst regions");
  /* a quantum state: SA, AL, SSA, WM hold */
  for (i = HOLENT_INEQ_SA; i <= HOLENT_INEQ_WM; i++)
    {
      HT_STATUS (holent_ineq_eval (4, s, (holent_ineq_family) i, 0, 1, 1e-12, &res, NULL), HOLENT_SUCCESS);
      HT_CHECK (res.worst >= -1e-15 && res.violated == 0, "family %u worst %g", i, res.worst);
    }
  HT_STATUS (holent_ineq_eval (4, s, HOLENT_INEQ_CYCLIC, 3, 1, 1e-12, &res, NULL), HOLENT_SUCCESS);
  HT_CLOSE (res.worst, -log (2.0), 1e-15);
}

/* Entries near the double range: the unscaled MMI sum 3e308 overflows
   to +Inf and used to count as holding.  With S = a on every subset of
   three parties MMI is 3a - 3a - a = -a (the same formula by hand);
   the cyclic family with m = 3 is MMI.  Also: values beyond the double
   range come out as +-Inf, never NaN.  */
static void
test_overflow (void)
{
  double s[7], v;
  holent_ineq_result res;
  uint32_t r[3] = { 1, 2, 4 };
  for (unsigned i = 0; i < 7; i++)
    s[i] = 1e308;
  HT_STATUS (holent_ineq_eval (3, s, HOLENT_INEQ_MMI, 0, 1, 0.0, &res, NULL), HOLENT_SUCCESS);
  HT_CHECK (res.violated == 1 && res.undecided == 0, "violated %g undecided %g",
            res.violated, res.undecided);
  HT_CLOSE (res.worst, -1e308, 1e-15);
  HT_STATUS (holent_ineq_eval (3, s, HOLENT_INEQ_CYCLIC, 3, 1, 0.0, &res, NULL), HOLENT_SUCCESS);
  HT_CLOSE (res.worst, -1e308, 1e-15);
  HT_STATUS (holent_ineq_value (3, s, HOLENT_INEQ_MMI, 0, r, &v), HOLENT_SUCCESS);
  HT_CLOSE (v, -1e308, 1e-15);
  /* SA on X = A1, Y = A2 with S(A1A2) = -1.7e308: 3 * 1.7e308 > DBL_MAX */
  s[0] = s[1] = 1.7e308;
  s[2] = -1.7e308;
  r[0] = 1, r[1] = 2;
  HT_STATUS (holent_ineq_value (2, s, HOLENT_INEQ_SA, 0, r, &v), HOLENT_SUCCESS);
  HT_CHECK (isinf (v) && v > 0, "v = %g", v);
  /* Cyclic m = 5 on 5 parties with alternating huge entries: finite
     worst or +-Inf, never NaN, and every instance decided.  */
  double s5[31];
  for (unsigned i = 0; i < 31; i++)
    s5[i] = (i % 3 == 0 ? 1.7e308 : -1.6e308);
  HT_STATUS (holent_ineq_eval (5, s5, HOLENT_INEQ_CYCLIC, 5, 1, 0.0, &res, NULL), HOLENT_SUCCESS);
  HT_CHECK (!isnan (res.worst) && res.undecided == 0 && res.count == 12,
            "worst %g undecided %g count %g", res.worst, res.undecided, res.count);
}

/* The poll contract: called with done <= total increasing, a nonzero
   return gives HOLENT_EINTR; polling without stopping changes nothing.  */
typedef struct { int calls, stop_at; double last, total; int bad; } poll_rec;

static int
rec_poll (void *ctx, double done, double total)
{
  poll_rec *p = ctx;
  if (done < p->last || (p->calls > 0 && total != p->total))
    p->bad = 1;
  p->last = done;
  p->total = total;
  return ++p->calls >= p->stop_at;
}

static void
test_poll (void)
{
  enum { N = 12 };
  static double s[(1 << N) - 1];
  holent_ineq_result res, ref;
  for (unsigned i = 0; i < (1u << N) - 1; i++)
    s[i] = (double) ((i * 2654435761u) % 1000) / 100.0;
  poll_rec p = { 0, 1000000, 0.0, 0.0, 0 };
  holent_poll pl = { rec_poll, &p };
  HT_STATUS (holent_ineq_eval (N, s, HOLENT_INEQ_MMI, 0, 1, 0.0, &ref, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_ineq_eval (N, s, HOLENT_INEQ_MMI, 0, 1, 0.0, &res, &pl), HOLENT_SUCCESS);
  HT_CHECK (p.calls > 3 && !p.bad, "calls %d bad %d", p.calls, p.bad);
  HT_CHECK (res.count == ref.count && res.worst == ref.worst, "same result");
  /* done never runs past the expected total by much (progress display) */
  HT_CHECK (p.last <= 1.01 * p.total, "done %g of %g", p.last, p.total);
  poll_rec q = { 0, 2, 0.0, 0.0, 0 };
  holent_poll ql = { rec_poll, &q };
  HT_STATUS (holent_ineq_eval (N, s, HOLENT_INEQ_MMI, 0, 1, 0.0, &res, &ql), HOLENT_EINTR);
  HT_CHECK (q.calls == 2, "calls %d", q.calls);
  holent_poll none = { NULL, NULL };
  HT_STATUS (holent_ineq_eval (N, s, HOLENT_INEQ_MMI, 0, 1, 0.0, &res, &none), HOLENT_SUCCESS);
  /* the subset enumerations poll too */
  q.calls = 0, q.stop_at = 1;
  static double b[(1 << 16) - 1];
  HT_STATUS (holent_ineq_eval (16, b, HOLENT_INEQ_SSA, 0, 0, 0.0, &res, &ql), HOLENT_EINTR);
}

int
main (void)
{
  srand (12345);
  test_errors ();
  test_complete ();
  test_subsets ();
  test_ghz ();
  test_overflow ();
  test_poll ();
  return HT_DONE ();
}
