/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Unit tests of holent_mincut: every error path; entropy vectors of
 * random small graphs against a brute force written here (every
 * assignment of the bulk vertices to the two sides, the minimum cut
 * weight; min-cut = max-flow, Ford and Fulkerson 1956, common practice);
 * the smallest source side against the brute-force minimisers; the
 * four-leaf star (a perfect-tensor-like graph, Bao et al. 2015, JHEP 09
 * (2015) 130, from memory: S(I) = min(|I|, 4 - |I|)).  */
#include <math.h>
#include <stdint.h>
#include <stdlib.h>
#include <string.h>
#include "holent_ctest.h"
#include "holent_mincut.h"

static double
urand (unsigned *seed)
{
  *seed = *seed * 1103515245u + 12345u;
  return ((*seed >> 8) & 0xffffff) / 16777216.0;
}

/* brute force: minimum over bulk assignments; side of the smallest
   minimiser (intersection of all minimisers = smallest source side) */
static double
brute (size_t nv, size_t ne, const size_t *t, const size_t *h,
       const double *w, const int *lab, unsigned n, uint32_t src,
       unsigned char *smallest)
{
  size_t bulk[16], nb = 0, v, e;
  unsigned char in[32];
  double best = INFINITY;
  unsigned long m;
  unsigned char inter[32];
  for (v = 0; v < nv; v++)
    if (lab[v] == 0)
      bulk[nb++] = v;
  memset (inter, 1, sizeof inter);
  for (m = 0; m < (1ul << nb); m++)
    {
      double c = 0;
      for (v = 0; v < nv; v++)
        in[v] = lab[v] > 0 && lab[v] <= (int) n && ((src >> (lab[v] - 1)) & 1);
      for (v = 0; v < nb; v++)
        in[bulk[v]] = (m >> v) & 1;
      for (e = 0; e < ne; e++)
        if (in[t[e]] != in[h[e]])
          c += w[e];
      if (c < best - 1e-12)
        {
          best = c;
          memcpy (inter, in, nv);
        }
      else if (fabs (c - best) <= 1e-12)
        for (v = 0; v < nv; v++)
          inter[v] &= in[v];
    }
  memcpy (smallest, inter, nv);
  return best;
}

static int
stop_third (void *ctx, double done, double total)
{
  int *calls = ctx;
  (void) done, (void) total;
  return ++*calls == 3;
}

int
main (void)
{
  unsigned seed = 7, trial;
  size_t t[64], h[64], bad;
  double w[64], s[1023], sb;
  int lab[32];
  unsigned char cuts[1023 * 32], sm[32];
  holent_mincut_workspace *ws = holent_mincut_workspace_alloc (32, 64);
  HT_CHECK (ws != NULL, "alloc");
  HT_CHECK (holent_mincut_workspace_alloc (0, 3) == NULL, "nv = 0 refused");

  /* four-leaf star: centre 0, leaves 1..4 with parties 1, 2, 3 and O */
  {
    size_t st[4] = { 0, 0, 0, 0 }, sh[4] = { 1, 2, 3, 4 };
    double sw[4] = { 1, 1, 1, 1 };
    int sl[5] = { 0, 1, 2, 3, 4 };
    uint32_t k;
    HT_STATUS (holent_mincut_entropy (5, 4, st, sh, sw, sl, 3, s, cuts, &bad, ws, NULL),
               HOLENT_SUCCESS);
    for (k = 1; k < 8; k++)
      {
        unsigned c = __builtin_popcount (k);
        HT_CLOSE (s[k - 1], c < 4 - c ? c : 4 - c, 0);
      }
    /* S(A1) = 1: the smallest side is the leaf alone */
    HT_CHECK (cuts[1] == 1 && cuts[0] == 0, "smallest side of A1");
  }

  for (trial = 0; trial < 300; trial++)
    {
      unsigned n = 1 + trial % 4, pur = trial % 3 != 0;
      size_t nb = trial % 9, nv, ne = 0, v, a, b;
      uint32_t k;
      double p = 0.2 + 0.6 * urand (&seed);
      nv = 0;
      for (v = 0; v < n; v++)
        lab[nv++] = (int) v + 1;
      if (pur)
        lab[nv++] = (int) n + 1;
      for (v = 0; v < nb; v++)
        lab[nv++] = 0;
      /* a second vertex for some parties */
      if (trial % 5 == 0)
        lab[nv++] = 1;
      for (a = 0; a < nv; a++)
        for (b = a + 1; b < nv; b++)
          if (urand (&seed) < p && ne < 64)
            {
              t[ne] = a, h[ne] = b;
              /* integer weights make ties (several minimal cuts) common */
              w[ne++] = trial % 2 ? floor (4 * urand (&seed)) : urand (&seed);
            }
      HT_STATUS (holent_mincut_entropy (nv, ne, t, h, w, lab, n, s, cuts, &bad, ws, NULL),
                 HOLENT_SUCCESS);
      for (k = 1; k < (1u << n); k++)
        {
          sb = brute (nv, ne, t, h, w, lab, n, k, sm);
          HT_CLOSE (s[k - 1], sb, 1e-12);
          HT_CHECK (memcmp (sm, cuts + (k - 1) * nv, nv) == 0,
                    "trial %u subset %u: smallest side differs", trial, k);
        }
    }

  /* error paths */
  {
    size_t et[2] = { 0, 1 }, eh[2] = { 1, 2 };
    double ew[2] = { 1, 1 };
    int el[3] = { 1, 0, 2 };
    HT_STATUS (holent_mincut_entropy (3, 2, et, eh, ew, el, 1, s, NULL, &bad, ws, NULL),
               HOLENT_SUCCESS);
    HT_CLOSE (s[0], 1, 0);
    HT_STATUS (holent_mincut_entropy (3, 2, et, eh, ew, el, 1, NULL, NULL, &bad, ws, NULL),
               HOLENT_EINVAL);
    HT_STATUS (holent_mincut_check (3, 2, et, eh, ew, el, 1, NULL), HOLENT_EINVAL);
    HT_STATUS (holent_mincut_check (3, 2, NULL, eh, ew, el, 1, &bad), HOLENT_EINVAL);
    HT_STATUS (holent_mincut_check (3, 2, et, eh, ew, el, 0, &bad), HOLENT_EDOM);
    HT_STATUS (holent_mincut_check (3, 2, et, eh, ew, el, 17, &bad), HOLENT_ETOOBIG);
    el[2] = 3;
    HT_STATUS (holent_mincut_check (3, 2, et, eh, ew, el, 2, &bad), HOLENT_EEMPTY);
    HT_CHECK (bad == 1, "party 2 missing: bad = %zu", bad);
    el[2] = 5;
    HT_STATUS (holent_mincut_check (3, 2, et, eh, ew, el, 1, &bad), HOLENT_EDOM);
    HT_CHECK (bad == 2, "label: bad = %zu", bad);
    el[2] = 2;
    eh[1] = 3;
    HT_STATUS (holent_mincut_check (3, 2, et, eh, ew, el, 1, &bad), HOLENT_EDOM);
    HT_CHECK (bad == 1, "vertex: bad = %zu", bad);
    eh[1] = 2;
    ew[0] = -1;
    HT_STATUS (holent_mincut_check (3, 2, et, eh, ew, el, 1, &bad), HOLENT_EDOM);
    ew[0] = NAN;
    HT_STATUS (holent_mincut_check (3, 2, et, eh, ew, el, 1, &bad), HOLENT_EINVAL);
    ew[0] = INFINITY;
    HT_STATUS (holent_mincut_check (3, 2, et, eh, ew, el, 1, &bad), HOLENT_EDOM);
    ew[0] = 1;
    HT_STATUS (holent_mincut_cut (3, 2, et, eh, ew, el, 1, 0, &sb, NULL, ws), HOLENT_EDOM);
    HT_STATUS (holent_mincut_cut (3, 2, et, eh, ew, el, 1, 2, &sb, NULL, ws), HOLENT_EDOM);
    HT_STATUS (holent_mincut_cut (33, 2, et, eh, ew, el, 1, 1, &sb, NULL, ws), HOLENT_EDOM);
    HT_STATUS (holent_mincut_cut (3, 2, et, eh, ew, el, 1, 1, NULL, NULL, ws), HOLENT_EINVAL);
    HT_STATUS (holent_mincut_cut (3, 2, et, eh, ew, el, 1, 1, &sb, NULL, NULL), HOLENT_EINVAL);
  }
  /* interruption: the poll asks to stop at the third cut */
  {
    size_t et[1] = { 0 }, eh[1] = { 1 };
    double ew[1] = { 1 };
    int el[3] = { 1, 2, 3 };
    int calls = 0;
    holent_poll pl = { stop_third, &calls };
    HT_STATUS (holent_mincut_entropy (3, 1, et, eh, ew, el, 2, s, NULL, &bad, ws, &pl),
               HOLENT_EINTR);
    HT_CHECK (calls == 3, "poll called %d times", calls);
    pl.fn = NULL;
    HT_STATUS (holent_mincut_entropy (3, 1, et, eh, ew, el, 2, s, NULL, &bad, ws, &pl),
               HOLENT_SUCCESS);
  }
  holent_mincut_workspace_free (ws);
  holent_mincut_workspace_free (NULL);
  return HT_DONE ();
}
