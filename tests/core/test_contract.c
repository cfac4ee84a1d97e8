/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Unit tests of holent_contract: every error path; the search against an
 * exhaustive enumeration of every map {0,1}^L -> {0,1}^R for random small
 * inequalities (written here, checking every pair of points, not only
 * edges); proofs of SA, SSA and MMI (Bao, Nezami, Ooguri, Stoica, Sully
 * and Walter 2015, JHEP 09 (2015) 130: MMI is proved by contraction
 * there, from memory) and of the five-party cyclic inequality (same
 * reference); reversed MMI has no map; corrupted certificates are
 * rejected by the checker.  */
#include <math.h>
#include <stdint.h>
#include <stdlib.h>
#include <string.h>
#include "holent_ctest.h"
#include "holent_contract.h"

static double
wsum (const double *w, unsigned k, uint32_t z)
{
  double t = 0;
  unsigned j;
  for (j = 0; j < k; j++)
    if ((z >> j) & 1u)
      t += w[j];
  return t;
}

/* does any map satisfy (i) and (ii) on all pairs?  */
static int
brute_exists (unsigned n, unsigned nl, const uint32_t *lm, const double *a,
              unsigned nr, const uint32_t *rm, const double *b)
{
  unsigned np = 1u << nl, ny = 1u << nr, i, l, x, x2;
  uint32_t f[8];
  unsigned long code, total = 1;
  for (x = 0; x < np; x++)
    total *= ny;
  for (code = 0; code < total; code++)
    {
      unsigned long c = code;
      int ok = 1;
      for (x = 0; x < np; x++)
        {
          f[x] = (uint32_t) (c % ny);
          c /= ny;
        }
      for (i = 0; i <= n && ok; i++)
        {
          uint32_t xb = 0, yb = 0;
          for (l = 0; i < n && l < nl; l++)
            xb |= ((lm[l] >> i) & 1u) << l;
          for (l = 0; i < n && l < nr; l++)
            yb |= ((rm[l] >> i) & 1u) << l;
          ok = f[xb] == yb;
        }
      for (x = 0; x < np && ok; x++)
        for (x2 = 0; x2 < np && ok; x2++)
          ok = wsum (b, nr, f[x] ^ f[x2]) <= wsum (a, nl, x ^ x2) + 1e-12;
      if (ok)
        return 1;
    }
  return 0;
}

static unsigned
urand (unsigned *seed, unsigned m)
{
  *seed = *seed * 1103515245u + 12345u;
  return (*seed >> 16) % m;
}

static int
prove (unsigned n, unsigned nl, const uint32_t *lm, const double *a,
       unsigned nr, const uint32_t *rm, const double *b, uint32_t *f,
       holent_contract_stats *st)
{
  holent_contract_workspace *ws = holent_contract_workspace_alloc (nl, nr);
  int s = holent_contract_prove (n, nl, lm, a, nr, rm, b, 0, f, st, ws, NULL);
  holent_contract_workspace_free (ws);
  return s;
}

static int
stop_second (void *ctx, double done, double total)
{
  int *calls = ctx;
  (void) done, (void) total;
  return ++*calls == 2;
}

/* Counts calls and stops at the call number stored in ctx[1].  */
static int
stop_at (void *ctx, double done, double total)
{
  int *c = ctx;
  (void) done, (void) total;
  return ++c[0] == c[1];
}

static int
stop_now (void *ctx, double done, double total)
{
  (void) ctx, (void) done, (void) total;
  return 1;
}

int
main (void)
{
  uint32_t f[1 << 10], bx;
  unsigned bl, trial, seed = 3;
  int ok;
  holent_contract_stats st;
  /* parties A = bit 0, B = bit 1, C = bit 2 */
  const uint32_t mmi_l[3] = { 3, 6, 5 }, mmi_r[4] = { 1, 2, 4, 7 };
  const double one[16] = { 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1 };

  /* MMI: S(AB) + S(BC) + S(AC) >= S(A) + S(B) + S(C) + S(ABC) */
  HT_STATUS (prove (3, 3, mmi_l, one, 4, mmi_r, one, f, &st), HOLENT_SUCCESS);
  HT_CHECK (st.found == 1, "MMI proved");
  HT_STATUS (holent_contract_check (3, 3, mmi_l, one, 4, mmi_r, one, f, &ok, &bx, &bl),
             HOLENT_SUCCESS);
  HT_CHECK (ok, "MMI certificate");
  /* corrupted certificates: the boundary points are x^(A) = 5, x^(B) =
     3, x^(C) = 6, x^(O) = 0; f(7) = 1111 is at b-distance 4 from f(0) =
     0000 while |7 - 0|_a = 3 */
  {
    uint32_t keep = f[7];
    f[7] = 15;
    HT_STATUS (holent_contract_check (3, 3, mmi_l, one, 4, mmi_r, one, f, &ok, &bx, &bl),
               HOLENT_SUCCESS);
    HT_CHECK (!ok && bl != (unsigned) -1, "contraction failure rejected");
    f[7] = keep;
  }
  f[5] ^= 2;  /* boundary point of A: must be rejected */
  HT_STATUS (holent_contract_check (3, 3, mmi_l, one, 4, mmi_r, one, f, &ok, &bx, &bl),
             HOLENT_SUCCESS);
  HT_CHECK (!ok, "corrupted boundary value rejected");
  /* reversed MMI: no map */
  HT_STATUS (prove (3, 4, mmi_r, one, 3, mmi_l, one, f, &st), HOLENT_SUCCESS);
  HT_CHECK (st.found == 0, "reversed MMI has no map");
  /* SSA: S(AB) + S(BC) >= S(B) + S(ABC) */
  {
    const uint32_t l[2] = { 3, 6 }, r[2] = { 2, 7 };
    HT_STATUS (prove (3, 2, l, one, 2, r, one, f, &st), HOLENT_SUCCESS);
    HT_CHECK (st.found == 1, "SSA proved");
    HT_STATUS (holent_contract_check (3, 2, l, one, 2, r, one, f, &ok, &bx, &bl), 0);
    HT_CHECK (ok, "SSA certificate");
    /* S(B) + S(ABC) >= S(AB) + S(BC) is false (A, C a Bell pair each
       with B... ): the boundary conditions of B and the purifier clash */
    HT_STATUS (prove (3, 2, r, one, 2, l, one, f, &st), HOLENT_SUCCESS);
    HT_CHECK (st.found == 0, "reversed SSA has no map");
  }
  /* cyclic, five parties: S(ABC)+S(BCD)+S(CDE)+S(DEA)+S(EAB) >=
     S(AB)+S(BC)+S(CD)+S(DE)+S(EA)+S(ABCDE) */
  {
    const uint32_t l[5] = { 7, 14, 28, 25, 19 }, r[6] = { 3, 6, 12, 24, 17, 31 };
    HT_STATUS (prove (5, 5, l, one, 6, r, one, f, &st), HOLENT_SUCCESS);
    HT_CHECK (st.found == 1, "cyclic proved");
    HT_STATUS (holent_contract_check (5, 5, l, one, 6, r, one, f, &ok, &bx, &bl), 0);
    HT_CHECK (ok, "cyclic certificate");
    /* weight 1/2 on the whole-system term still proves it... and weight
       2 on S(AB) does not (the Bell pair A-O would violate it) */
    {
      double b2[6] = { 2, 1, 1, 1, 1, 1 };
      HT_STATUS (prove (5, 5, l, one, 6, r, b2, f, &st), HOLENT_SUCCESS);
      HT_CHECK (st.found == 0, "cyclic with 2 S(AB) has no map");
    }
  }

  /* random small inequalities against the exhaustive enumeration */
  for (trial = 0; trial < 400; trial++)
    {
      unsigned n = 2 + urand (&seed, 2), nl = 1 + urand (&seed, 3);
      unsigned nr = 1 + urand (&seed, nl == 3 ? 2 : 3), k;
      uint32_t lm[3], rm[3];
      double a[3], b[3];
      int want;
      for (k = 0; k < nl; k++)
        {
          lm[k] = 1 + urand (&seed, (1u << n) - 1);
          a[k] = 1 + urand (&seed, 2);
        }
      for (k = 0; k < nr; k++)
        {
          rm[k] = 1 + urand (&seed, (1u << n) - 1);
          /* half-integer weights take the direct candidate test, integer
             ones the precomputed balls */
          b[k] = (1 + urand (&seed, 2)) * (trial % 2 ? 1.0 : 0.75);
        }
      want = brute_exists (n, nl, lm, a, nr, rm, b);
      HT_STATUS (prove (n, nl, lm, a, nr, rm, b, f, &st), HOLENT_SUCCESS);
      HT_CHECK ((st.found == 1) == want, "trial %u: search %d, brute %d", trial,
                st.found, want);
      if (st.found == 1)
        {
          HT_STATUS (holent_contract_check (n, nl, lm, a, nr, rm, b, f, &ok, &bx, &bl), 0);
          HT_CHECK (ok, "trial %u: certificate", trial);
        }
    }

  /* node limit */
  {
    const uint32_t l[5] = { 7, 14, 28, 25, 19 }, r[6] = { 3, 6, 12, 24, 17, 31 };
    holent_contract_workspace *ws = holent_contract_workspace_alloc (5, 6);
    HT_STATUS (holent_contract_prove (5, 5, l, one, 6, r, one, 0.5, f, &st, ws, NULL), 0);
    HT_CHECK (st.found == -1 || (st.found == 1 && st.nodes == 0),
              "node limit: found %d nodes %g", st.found, st.nodes);
    /* error paths */
    HT_STATUS (holent_contract_prove (5, 5, l, one, 6, r, one, 0, NULL, &st, ws, NULL), HOLENT_EINVAL);
    HT_STATUS (holent_contract_prove (5, 5, l, one, 6, r, one, NAN, f, &st, ws, NULL), HOLENT_EINVAL);
    HT_STATUS (holent_contract_prove (4, 5, l, one, 6, r, one, 0, f, &st, ws, NULL), HOLENT_EDOM);
    HT_STATUS (holent_contract_prove (0, 5, l, one, 6, r, one, 0, f, &st, ws, NULL), HOLENT_EDOM);
    HT_STATUS (holent_contract_prove (17, 5, l, one, 6, r, one, 0, f, &st, ws, NULL), HOLENT_ETOOBIG);
    HT_STATUS (holent_contract_prove (5, 5, l, one, 5, r, one, 0, f, &st, ws, NULL), HOLENT_EDOM);
    {
      double bad[6] = { 1, 1, -1, 1, 1, 1 };
      HT_STATUS (holent_contract_prove (5, 5, l, one, 6, r, bad, 0, f, &st, ws, NULL), HOLENT_EDOM);
      bad[2] = NAN;
      HT_STATUS (holent_contract_prove (5, 5, l, one, 6, r, bad, 0, f, &st, ws, NULL), HOLENT_EINVAL);
      HT_STATUS (holent_contract_check (5, 5, l, one, 6, r, bad, f, &ok, &bx, &bl), HOLENT_EINVAL);
    }
    f[3] = 64;
    HT_STATUS (holent_contract_check (5, 5, l, one, 6, r, one, f, &ok, &bx, &bl), HOLENT_EDOM);
    HT_STATUS (holent_contract_check (5, 5, l, one, 6, r, one, f, NULL, &bx, &bl), HOLENT_EINVAL);
    holent_contract_workspace_free (ws);
  }
  /* interruption at the first poll, in the set-up */
  {
    const uint32_t l[5] = { 7, 14, 28, 25, 19 }, r[6] = { 3, 6, 12, 24, 17, 31 };
    holent_contract_workspace *ws = holent_contract_workspace_alloc (5, 6);
    holent_poll pl = { stop_now, NULL };
    int calls = 0;
    HT_STATUS (holent_contract_prove (5, 5, l, one, 6, r, one, 0, f, &st, ws, &pl),
               HOLENT_EINTR);
    /* and in the search: 32 points make one set-up call, the second call
       comes from the first search node */
    pl.fn = stop_second;
    pl.ctx = &calls;
    HT_STATUS (holent_contract_prove (5, 5, l, one, 6, r, one, 0, f, &st, ws, &pl),
               HOLENT_EINTR);
    HT_CHECK (calls == 2, "poll called %d times", calls);
    holent_contract_workspace_free (ws);
  }
  /* and in the first propagation, before any search node: subadditivity
     of 13 parties, S(A1) + .. + S(A13) >= S(A1 .. A13), has 2^13 points,
     so 128 set-up calls, then the propagation dequeues every point and
     polls after 4096 of them */
  {
    uint32_t l[13], r[1] = { (1u << 13) - 1 };
    double a13[13];
    uint32_t *f13 = malloc (((size_t) 1 << 13) * sizeof *f13);
    int c[2] = { 0, 129 };
    holent_poll pl = { stop_at, c };
    holent_contract_workspace *ws = holent_contract_workspace_alloc (13, 1);
    for (int k = 0; k < 13; k++)
      {
        l[k] = 1u << k;
        a13[k] = 1.0;
      }
    HT_STATUS (holent_contract_prove (13, 13, l, a13, 1, r, one, 0, f13, &st, ws, &pl),
               HOLENT_EINTR);
    HT_CHECK (c[0] == 129 && st.nodes == 0, "poll called %d times, %g nodes",
              c[0], st.nodes);
    /* uninterrupted, the same workspace proves it */
    c[0] = 0;
    c[1] = -1;
    HT_STATUS (holent_contract_prove (13, 13, l, a13, 1, r, one, 0, f13, &st, ws, &pl),
               HOLENT_SUCCESS);
    HT_CHECK (st.found == 1 && c[0] > 129, "found %d, %d polls", st.found, c[0]);
    holent_contract_workspace_free (ws);
    free (f13);
  }
  HT_CHECK (holent_contract_workspace_alloc (0, 3) == NULL, "L = 0 refused");
  HT_CHECK (holent_contract_workspace_alloc (21, 3) == NULL, "L = 21 refused");
  HT_CHECK (holent_contract_workspace_alloc (15, 15) == NULL, "L + R = 30 refused");
  holent_contract_workspace_free (NULL);
  return HT_DONE ();
}
