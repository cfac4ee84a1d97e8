/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Unit tests of holent_rt: both minimisers (the dynamic programme and the
 * fast sweep) against an exhaustive enumeration written here (every
 * non-crossing pairing, every face, with the regulated lengths in closed
 * form, not via holent_geo); the sweep against the DP on random regions
 * in every bulk (same minimum and minimiser), also with its unwinding log
 * cut short; the batch of many regions against single calls;
 * interruption through the poll callback; the
 * candidate counts against the Catalan and central
 * binomial numbers; and every error path.  */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_rng.h>
#include <gsl/gsl_sf_gamma.h>
#include "holent_ctest.h"
#include "holent_rt.h"

#define NP 14   /* up to 7 intervals */

typedef struct
{
  int bulk;     /* holent_bulk */
  double L, eps, bl, br, alpha, c, SBH;
  int circle, horizon;
} model;

/* Regulated lengths, written out again (Ryu and Takayanagi 2006, PRL 96,
   181602; Hubeny, Rangamani and Takayanagi 2007, JHEP 07, 062 for the
   rotating case; the defect form with the apex cap, doc/conventions.md). */
static double
len_of (const model *m, double l)
{
  switch (m->bulk)
    {
    case HOLENT_BULK_POINCARE:
      return 2 * log (l / m->eps);
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
      return 2 * log (m->L / (M_PI * m->eps) * sin (M_PI * l / m->L));
    case HOLENT_BULK_CONICAL_DEFECT:
      {
        double ph = M_PI * m->alpha * l / m->L;
        return 2 * log (m->L / (M_PI * m->alpha * m->eps)
                        * sin (ph < M_PI / 2 ? ph : M_PI / 2));
      }
    default:
      return log (m->bl * m->br / (M_PI * M_PI * m->eps * m->eps)
                  * sinh (M_PI * l / m->bl) * sinh (M_PI * l / m->br));
    }
}

/* Exhaustive search state.  */
typedef struct
{
  const model *m;
  const double *p;   /* sorted endpoints */
  int N, start0;
  int partner[NP];
  double best, second;  /* best value, best value of another config */
  int best_partner[NP], best_hor;
  unsigned best_face;
  long count;
} brute;

static void
consider (brute *b, double v, int hor, unsigned face)
{
  b->count++;
  if (v < b->best - 1e-12 * fabs (v))
    {
      if (b->best < b->second)
        b->second = b->best;
      b->best = v;
      memcpy (b->best_partner, b->partner, sizeof b->partner);
      b->best_hor = hor;
      b->best_face = face;
    }
  else if (v < b->second)
    b->second = v;
}

/* All faces of the finished pairing.  */
static void
evaluate (brute *b)
{
  const model *m = b->m;
  int N = b->N, nc = 0, ca[NP], cb[NP];
  for (int i = 0; i < N; i++)
    if (b->partner[i] > i)
      {
        ca[nc] = i;
        cb[nc] = b->partner[i];
        nc++;
      }
  if (!m->circle || m->bulk == HOLENT_BULK_GLOBAL_ADS
      || m->bulk == HOLENT_BULK_THERMAL_ADS)
    {
      double v = 0;
      for (int k = 0; k < nc; k++)
        v += len_of (m, b->p[cb[k]] - b->p[ca[k]]);
      consider (b, m->c / 6 * v, 0, 0);
      return;
    }
  /* Faces: segments (q_g, q_g+1) with the same set of enclosing chords.  */
  unsigned seen[NP + 1];
  int nseen = 0;
  for (int g = 0; g < N; g++)
    {
      unsigned mask = 0;
      for (int k = 0; k < nc; k++)
        if (ca[k] <= g && g < cb[k])
          mask |= 1u << k;
      int dup = 0;
      for (int f = 0; f < nseen; f++)
        dup |= seen[f] == mask;
      if (dup)
        continue;
      seen[nseen++] = mask;
      double v = 0;
      for (int k = 0; k < nc; k++)
        {
          double inner = b->p[cb[k]] - b->p[ca[k]];
          v += len_of (m, (mask >> k) & 1 ? m->L - inner : inner);
        }
      int in_a = ((g % 2) == 0) == (b->start0 != 0);
      int hor = m->horizon && in_a;
      consider (b, m->c / 6 * v + (hor ? m->SBH : 0), hor, mask);
    }
}

/* Pair the first unpaired point with every admissible partner.  */
static void
enumerate (brute *b, int lo, int hi)
{
  /* pair points lo..hi-1 among themselves, then continue after */
  (void) hi;
  int i = 0;
  while (i < b->N && b->partner[i] >= 0)
    i++;
  if (i == b->N)
    {
      evaluate (b);
      return;
    }
  (void) lo;
  for (int j = i + 1; j < b->N; j += 2)
    {
      if (b->partner[j] >= 0)
        continue;
      /* non-crossing: every point strictly between i and j must be paired
         inside (i, j) or still free, and the free ones even in number */
      int ok = 1, nfree = 0;
      for (int k = i + 1; k < j && ok; k++)
        {
          if (b->partner[k] < 0)
            nfree++;
          else if (b->partner[k] < i || b->partner[k] > j)
            ok = 0;
        }
      if (!ok || nfree % 2)
        continue;
      b->partner[i] = j;
      b->partner[j] = i;
      enumerate (b, 0, 0);
      b->partner[i] = b->partner[j] = -1;
    }
}

static void
test_against_enumeration (void)
{
  gsl_rng *rng = gsl_rng_alloc (gsl_rng_mt19937);
  const int bulks[] = { HOLENT_BULK_POINCARE, HOLENT_BULK_PLANAR_BTZ,
                        HOLENT_BULK_GLOBAL_ADS, HOLENT_BULK_THERMAL_ADS,
                        HOLENT_BULK_BTZ, HOLENT_BULK_ROTATING_BTZ,
                        HOLENT_BULK_CONICAL_DEFECT };
  holent_region *r = holent_region_alloc (7);
  holent_rt_workspace *w = holent_rt_workspace_alloc_dp (7);
  int nconf = 0;
  for (int method = HOLENT_RT_DP; method <= HOLENT_RT_FAST; method++)
  for (size_t ib = 0; ib < sizeof bulks / sizeof bulks[0]; ib++)
    for (int trial = 0; trial < 40; trial++)
      {
        model m = { bulks[ib], 2 * M_PI, 1e-4, 0.6, 0.6, 0.55, 2.0, 0, 0, 0 };
        if (m.bulk == HOLENT_BULK_ROTATING_BTZ)
          m.br = 1.7;
        if (m.bulk == HOLENT_BULK_PLANAR_BTZ)
          m.bulk = HOLENT_BULK_ROTATING_BTZ, m.circle = 0;  /* see below */
        holent_geo_bg bg;
        int line = bulks[ib] == HOLENT_BULK_POINCARE
                   || bulks[ib] == HOLENT_BULK_PLANAR_BTZ;
        HT_STATUS (holent_geo_bg_init (&bg, bulks[ib], m.L, m.eps, m.bl,
                                       m.br, m.alpha, m.c),
                   HOLENT_SUCCESS);
        m.circle = !line;
        m.horizon = bg.horizon && m.circle;
        m.SBH = bg.S_BH;
        if (bulks[ib] == HOLENT_BULK_PLANAR_BTZ)
          m.bulk = HOLENT_BULK_BTZ;  /* same closed form, bl = br */
        int n = 1 + (int) gsl_rng_uniform_int (rng, 7);
        double p[NP], a[7], bb[7];
        /* 2n sorted random points, then pair them as intervals */
        for (int k = 0; k < 2 * n; k++)
          p[k] = (line ? 5.0 : m.L) * gsl_rng_uniform (rng);
        for (int k = 1; k < 2 * n; k++)  /* insertion sort */
          for (int j = k; j > 0 && p[j] < p[j - 1]; j--)
            {
              double t = p[j];
              p[j] = p[j - 1];
              p[j - 1] = t;
            }
        int start0 = line || gsl_rng_uniform (rng) < 0.5;
        for (int k = 0; k < n; k++)
          {
            if (start0)
              {
                a[k] = p[2 * k];
                bb[k] = p[2 * k + 1];
              }
            else
              {
                a[k] = p[2 * k + 1];
                bb[k] = k + 1 < n ? p[2 * k + 2] : p[0] + m.L;
              }
          }
        HT_STATUS (holent_region_set (r, m.circle, m.L, n, a, bb),
                   HOLENT_SUCCESS);
        brute b = { &m, p, 2 * n, start0, { 0 }, INFINITY, INFINITY,
                    { 0 }, 0, 0, 0 };
        for (int k = 0; k < NP; k++)
          b.partner[k] = -1;
        enumerate (&b, 0, 2 * n);

        holent_rt_result res;
        size_t pairs[14];
        double arcs[7];
        HT_STATUS (holent_rt_entropy_method (w, &bg, r, method, &res, pairs,
                                             arcs),
                   HOLENT_SUCCESS);
        HT_CLOSE (res.S, b.best, 1e-10);
        HT_CHECK ((double) b.count == res.candidates,
                  "bulk %d n %d: %ld candidates enumerated, %g counted",
                  bulks[ib], n, b.count, res.candidates);
        if (b.second - b.best > 1e-8 * fmax (1, fabs (b.best)))
          {
            nconf++;
            HT_CHECK (res.horizon == b.best_hor, "horizon");
            for (int k = 0; k < n; k++)
              {
                int i = (int) pairs[2 * k], j = (int) pairs[2 * k + 1];
                HT_CHECK (b.best_partner[i] == j,
                          "bulk %d n %d pair %d-%d", bulks[ib], n, i, j);
                double inner = p[j] - p[i];
                double want = inner;
                if (m.circle && (m.bulk == HOLENT_BULK_GLOBAL_ADS
                                 || m.bulk == HOLENT_BULK_THERMAL_ADS))
                  want = fmin (inner, m.L - inner);
                else if (m.circle)
                  {
                    /* chord index in the enumeration's order */
                    int kk = 0;
                    for (int q = 0; q < i; q++)
                      kk += b.best_partner[q] > q;
                    if ((b.best_face >> kk) & 1)
                      want = m.L - inner;
                  }
                HT_CLOSE (arcs[k], want, 1e-12);
              }
          }
      }
  HT_CHECK (nconf > 400, "configurations compared: %d", nconf);
  holent_region_free (r);
  holent_rt_workspace_free (w);
  gsl_rng_free (rng);
}

static void
test_counts (void)
{
  holent_geo_bg line, btz;
  double cnt, lc;
  holent_geo_bg_init (&line, HOLENT_BULK_POINCARE, 0, 1e-3, 0, 0, 1, 1);
  holent_geo_bg_init (&btz, HOLENT_BULK_BTZ, 1, 1e-3, 1, 1, 1, 1);
  for (unsigned n = 1; n <= 60; n++)
    {
      /* Catalan(n) = binom(2n, n)/(n + 1) via GSL's lnchoose */
      double lb = gsl_sf_lnchoose (2 * n, n);
      HT_STATUS (holent_rt_count (&line, n, &cnt, &lc), HOLENT_SUCCESS);
      HT_CLOSE (lc, lb - log (n + 1.0), 1e-12);
      HT_CLOSE (cnt, exp (lb - log (n + 1.0)), 1e-11);
      HT_STATUS (holent_rt_count (&btz, n, &cnt, &lc), HOLENT_SUCCESS);
      HT_CLOSE (lc, lb, 1e-12);
    }
  holent_rt_count (&line, 20, &cnt, &lc);
  HT_CHECK (cnt == 6564120420.0, "Catalan(20) = %.17g", cnt);
  holent_rt_count (&btz, 30, &cnt, &lc);
  HT_CHECK (cnt == 118264581564861424.0, "binom(60,30) = %.17g", cnt);
  holent_rt_count (&btz, 600, &cnt, &lc);
  HT_CHECK (isinf (cnt) && isfinite (lc), "overflow to Inf");
  HT_CLOSE (lc, gsl_sf_lnchoose (1200, 600), 1e-12);
  holent_rt_count (&btz, 0, &cnt, &lc);
  HT_CHECK (cnt == 1 && lc == 0, "whole circle: one candidate");
  HT_STATUS (holent_rt_count (NULL, 1, &cnt, &lc), HOLENT_EINVAL);
  HT_STATUS (holent_rt_count (&btz, 1, NULL, &lc), HOLENT_EINVAL);
  HT_STATUS (holent_rt_count (&btz, 1, &cnt, NULL), HOLENT_EINVAL);
}

static void
test_errors (void)
{
  holent_geo_bg line, circ;
  holent_rt_result res;
  HT_CHECK (holent_rt_workspace_alloc (0) == NULL, "alloc(0)");
  HT_CHECK (holent_rt_workspace_alloc_dp (0) == NULL, "alloc_dp(0)");
  HT_CHECK (holent_rt_workspace_alloc_dp (HOLENT_RT_NMAX + 1) == NULL, "DP too big");
  HT_CHECK (holent_rt_workspace_alloc ((size_t) -1 / 2) == NULL, "fast too big");
  holent_rt_workspace_free (NULL);
  holent_rt_workspace *w = holent_rt_workspace_alloc_dp (2);
  holent_rt_workspace *wf = holent_rt_workspace_alloc (3);
  holent_region *r = holent_region_alloc (3);
  holent_geo_bg_init (&line, HOLENT_BULK_POINCARE, 0, 1e-3, 0, 0, 1, 1);
  holent_geo_bg_init (&circ, HOLENT_BULK_BTZ, 5, 1e-3, 1, 1, 1, 1);
  double a[3] = { 0, 2, 4 }, b[3] = { 1, 3, 4.5 };

  HT_STATUS (holent_rt_entropy (w, &line, r, &res, NULL, NULL), HOLENT_EEMPTY);
  HT_STATUS (holent_region_set (r, 0, 0, 3, a, b), HOLENT_SUCCESS);
  HT_STATUS (holent_rt_entropy (NULL, &line, r, &res, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_rt_entropy (w, NULL, r, &res, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_rt_entropy (w, &line, NULL, &res, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_rt_entropy (w, &line, r, NULL, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_rt_entropy (w, &circ, r, &res, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_rt_entropy (w, &line, r, &res, NULL, NULL), HOLENT_ETOOBIG);
  HT_STATUS (holent_rt_entropy_method (wf, &line, r, HOLENT_RT_DP, &res,
                                       NULL, NULL), HOLENT_ETOOBIG);
  HT_STATUS (holent_rt_entropy_method (wf, &line, r, (holent_rt_method) 7,
                                       &res, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_rt_entropy_method (wf, &line, r, HOLENT_RT_FAST, &res,
                                       NULL, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_rt_set_log_capacity (wf, 0), HOLENT_EINVAL);
  HT_STATUS (holent_rt_set_log_capacity (NULL, 5), HOLENT_EINVAL);
  holent_rt_workspace_free (wf);
  HT_STATUS (holent_region_set (r, 1, 6, 2, a, b), HOLENT_SUCCESS);
  HT_STATUS (holent_rt_entropy (w, &circ, r, &res, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_rt_entropy (w, &line, r, &res, NULL, NULL), HOLENT_EINVAL);

  /* a hand-made region with coincident endpoints: no geodesic */
  holent_region bad = *r;
  double pts[4] = { 0, 1, 1, 2 };
  bad.circle = 0;
  bad.L = 0;
  bad.n = 2;
  bad.whole = 0;
  bad.pts = pts;
  HT_STATUS (holent_rt_entropy (w, &line, &bad, &res, NULL, NULL), HOLENT_EDOM);
  HT_STATUS (holent_rt_entropy_method (w, &line, &bad, HOLENT_RT_DP, &res,
                                       NULL, NULL), HOLENT_EDOM);
  pts[2] = NAN;
  HT_STATUS (holent_rt_entropy (w, &line, &bad, &res, NULL, NULL),
             HOLENT_EINVAL);
  /* on a circle the endpoints must lie within one turn */
  double cpts[4] = { 0, 1, 2, 5.5 };
  bad.circle = 1;
  bad.L = 5;
  bad.pts = cpts;
  HT_STATUS (holent_rt_entropy (w, &circ, &bad, &res, NULL, NULL),
             HOLENT_EDOM);
  /* whole circle: S_BH, horizon, nothing paired */
  a[0] = 1;
  b[0] = 6;
  HT_STATUS (holent_region_set (r, 1, 5, 1, a, b), HOLENT_SUCCESS);
  HT_STATUS (holent_rt_entropy (w, &circ, r, &res, NULL, NULL), HOLENT_SUCCESS);
  HT_CLOSE (res.S, circ.S_BH, 1e-14);
  HT_CHECK (res.horizon && res.m == 0 && res.candidates == 1, "whole");
  /* short segments are counted */
  a[0] = 0; b[0] = 1; a[1] = 1.0015; b[1] = 2;
  HT_STATUS (holent_region_set (r, 0, 0, 2, a, b), HOLENT_SUCCESS);
  HT_STATUS (holent_rt_entropy (w, &line, r, &res, NULL, NULL), HOLENT_SUCCESS);
  HT_CHECK (res.n_short == 1, "n_short = %zu", res.n_short);
  holent_region_free (r);
  holent_rt_workspace_free (w);
}

/* The sweep against the DP on random regions of every bulk: the same
 * minimum (1e-12 relative) and the same minimiser (pairs, arcs, horizon);
 * a third of the time with the sweep's log cut short so that its
 * unwinding sweeps sub-runs again.  */
static void
test_oracle (void)
{
  gsl_rng *rng = gsl_rng_alloc (gsl_rng_mt19937);
  gsl_rng_set (rng, 11);
  const size_t nmax = 90;
  holent_region *r = holent_region_alloc (nmax);
  holent_rt_workspace *w = holent_rt_workspace_alloc_dp (nmax);
  holent_rt_workspace *ws = holent_rt_workspace_alloc (nmax);
  size_t *p1 = malloc (2 * nmax * sizeof *p1), *p2 = malloc (2 * nmax * sizeof *p2);
  double *a1 = malloc (nmax * sizeof *a1), *a2 = malloc (nmax * sizeof *a2);
  double *x = malloc (2 * nmax * sizeof *x), *a = malloc (nmax * sizeof *a),
         *b = malloc (nmax * sizeof *b);
  int compared = 0;
  for (int trial = 0; trial < 320; trial++)
    {
      holent_bulk bulk = (holent_bulk) (trial % 8);
      holent_geo_bg bg;
      double L = 0.5 + 10 * gsl_rng_uniform (rng);
      HT_STATUS (holent_geo_bg_init (&bg, bulk, L,
                                     1e-6 + 1e-3 * gsl_rng_uniform (rng),
                                     0.2 + 2 * gsl_rng_uniform (rng),
                                     0.2 + 2 * gsl_rng_uniform (rng),
                                     0.05 + 0.95 * gsl_rng_uniform (rng),
                                     1 + gsl_rng_uniform (rng)),
                 HOLENT_SUCCESS);
      size_t n = 1 + gsl_rng_uniform_int (rng, trial < 300 ? 30 : nmax);
      /* gaps of three kinds: uniform, log-uniform over 6 decades, mixed */
      int style = trial / 8 % 3;
      double acc = 0;
      for (size_t i = 0; i < 2 * n; i++)
        {
          double u = gsl_rng_uniform_pos (rng);
          acc += style == 0 ? u : style == 1 ? exp (14 * u - 7)
                 : (gsl_rng_uniform (rng) < 0.5 ? 0.01 * u : u);
          x[i] = acc;
        }
      double span = bg.circle ? L : 1 + 30 * gsl_rng_uniform (rng);
      double tot = acc * (1 + 0.5 * gsl_rng_uniform_pos (rng));
      double off = bg.circle ? L * gsl_rng_uniform (rng) : -3;
      int shift = bg.circle && gsl_rng_uniform (rng) < 0.5;
      for (size_t k = 0; k < n; k++)
        {
          size_t i = 2 * k + shift;
          a[k] = off + span * x[i] / tot;
          b[k] = off + (i + 1 < 2 * n ? span * x[i + 1] / tot
                                       : span * x[0] / tot + L);
        }
      HT_STATUS (holent_region_set (r, bg.circle, L, n, a, b),
                 HOLENT_SUCCESS);
      holent_rt_result r1, r2, r3;
      HT_STATUS (holent_rt_entropy_method (w, &bg, r, HOLENT_RT_DP, &r1, p1,
                                           a1), HOLENT_SUCCESS);
      holent_rt_workspace *wf = trial % 2 ? w : ws;
      HT_STATUS (holent_rt_set_log_capacity (ws, trial % 3 ? 8 * nmax : 3),
                 HOLENT_SUCCESS);
      HT_STATUS (holent_rt_entropy_method (wf, &bg, r, HOLENT_RT_FAST, &r2,
                                           p2, a2), HOLENT_SUCCESS);
      HT_STATUS (holent_rt_entropy (wf, &bg, r, &r3, NULL, NULL),
                 HOLENT_SUCCESS);
      HT_CLOSE (r2.S, r1.S, 1e-12 * fmax (1, fabs (r1.S)));
      HT_CHECK (r3.S == r2.S, "auto = fast");
      /* random data: no ties, so the minimisers must agree */
      int same = r1.horizon == r2.horizon;
      for (size_t k = 0; k < 2 * r->n; k++)
        same = same && p1[k] == p2[k];
      for (size_t k = 0; k < r->n; k++)
        same = same && fabs (a1[k] - a2[k]) <= 1e-13 * L;
      HT_CHECK (same, "trial %d bulk %d n %zu: minimisers differ", trial,
                (int) bulk, r->n);
      compared++;
    }
  HT_CHECK (compared > 300, "compared %d", compared);
  free (p1);
  free (p2);
  free (a1);
  free (a2);
  free (x);
  free (a);
  free (b);
  holent_region_free (r);
  holent_rt_workspace_free (w);
  holent_rt_workspace_free (ws);
  gsl_rng_free (rng);
}

/* The batch (one loop, serial below 16 regions, threads above) gives
 * what single calls give, configurations included, and reports the first
 * failing region.  */
static void
test_batch (void)
{
  holent_geo_bg bg;
  holent_geo_bg_init (&bg, HOLENT_BULK_BTZ, 6, 1e-4, 0.8, 0.8, 1, 2);
  gsl_rng *rng = gsl_rng_alloc (gsl_rng_mt19937);
  enum { NR = 40, MR = 12 };
  static double st[NR][MR], en[NR][MR], S[NR], pts[NR][2 * MR], arcs[NR][MR],
    sta[NR][MR], len[NR][MR];
  static size_t pairs[NR][2 * MR];
  holent_rt_input in[NR];
  holent_rt_conf conf[NR];
  for (int k = 0; k < NR; k++)
    {
      size_t m = 2 + gsl_rng_uniform_int (rng, MR - 1);
      for (size_t i = 0; i < m; i++)
        {
          st[k][i] = 6.0 * (i + 0.1 * gsl_rng_uniform (rng)) / m;
          en[k][i] = st[k][i] + 6.0 * (0.2 + 0.5 * gsl_rng_uniform (rng)) / m;
        }
      in[k] = (holent_rt_input) { m, st[k], en[k] };
      conf[k] = (holent_rt_conf) { .pairs = pairs[k], .arcs = arcs[k],
                                   .pts = pts[k], .start = sta[k],
                                   .len = len[k] };
    }
  holent_region *r = holent_region_alloc (MR);
  holent_rt_workspace *w = holent_rt_workspace_alloc (MR);
  for (size_t nr = 1; nr <= NR; nr += NR - 1)  /* 1 region, then 40 */
    {
      holent_rt_batch *b = holent_rt_batch_alloc (nr, MR, MR, 0);
      double nshort = -1;
      size_t failed = 99;
      HT_STATUS (holent_rt_batch_run (b, &bg, HOLENT_RT_AUTO, nr, in, S,
                                      &nshort, conf, &failed, NULL),
                 HOLENT_SUCCESS);
      HT_CHECK (nshort == 0 && failed == 99, "nshort %g", nshort);
      for (size_t k = 0; k < nr; k++)
        {
          holent_rt_result res;
          size_t p[2 * MR];
          HT_STATUS (holent_region_set (r, 1, 6, in[k].rows, st[k], en[k]),
                     HOLENT_SUCCESS);
          HT_STATUS (holent_rt_entropy (w, &bg, r, &res, p, NULL),
                     HOLENT_SUCCESS);
          HT_CHECK (S[k] == res.S && conf[k].res.S == res.S
                    && conf[k].n == r->n && conf[k].res.horizon == res.horizon,
                    "region %zu", k);
          for (size_t i = 0; i < 2 * r->n; i++)
            HT_CHECK (conf[k].pairs[i] == p[i] && conf[k].pts[i] == r->pts[i],
                      "region %zu entry %zu", k, i);
        }
      /* an overlap in region 7 (and one in 30): the first is reported */
      double keep = en[7][0], keep30 = en[30][0];
      en[7][0] = st[7][0] + 5.9;
      en[30][0] = st[30][0] + 5.9;
      if (nr == NR)
        {
          HT_STATUS (holent_rt_batch_run (b, &bg, HOLENT_RT_AUTO, nr, in, S,
                                          NULL, NULL, &failed, NULL),
                     HOLENT_EOVERLAP);
          HT_CHECK (failed == 7, "failed = %zu", failed);
        }
      en[7][0] = keep;
      en[30][0] = keep30;
      holent_rt_batch_free (b);
    }
  holent_rt_batch *b = holent_rt_batch_alloc (NR, 3, 3, 0);
  size_t failed = 0;
  HT_STATUS (holent_rt_batch_run (b, &bg, HOLENT_RT_AUTO, NR, in, S, NULL,
                                  NULL, &failed, NULL), HOLENT_ETOOBIG);
  HT_STATUS (holent_rt_batch_run (NULL, &bg, HOLENT_RT_AUTO, NR, in, S, NULL,
                                  NULL, &failed, NULL), HOLENT_EINVAL);
  HT_CHECK (holent_rt_batch_alloc (1, 0, 3, 0) == NULL, "no rows");
  holent_rt_batch_free (b);
  holent_rt_batch_free (NULL);
  holent_region_free (r);
  holent_rt_workspace_free (w);
  gsl_rng_free (rng);
}

/* Interruption: a poll that stops after a few calls makes every long
 * path return HOLENT_EINTR (sweep on a line, on two threads over two
 * turns, the unwinding, the DP, the batch); one that never stops changes
 * nothing, and its progress only grows, up to about the total.  */
typedef struct
{
  int calls, stop_at;
  double last, total;
  int monotone;
} poll_probe;

static int
probe_fn (void *ctx, double done, double total)
{
  poll_probe *p;
#pragma omp critical (test_rt_probe)
  {
    p = ctx;
    p->calls++;
    p->monotone = p->monotone && total >= 0 && done >= 0;
    p->last = done > p->last ? done : p->last;
    p->total = total;
  }
  return p->stop_at > 0 && p->calls >= p->stop_at;
}

static void
test_poll (void)
{
  const size_t n = 1100;
  holent_geo_bg line, btz;
  holent_geo_bg_init (&line, HOLENT_BULK_POINCARE, 0, 1e-3, 0, 0, 1, 1);
  holent_geo_bg_init (&btz, HOLENT_BULK_BTZ, 6, 1e-4, 0.8, 0.8, 1, 1);
  holent_region *rl = holent_region_alloc (n), *rc = holent_region_alloc (n);
  holent_rt_workspace *w = holent_rt_workspace_alloc (n);
  holent_rt_workspace *wd = holent_rt_workspace_alloc_dp (300);
  double *a = malloc (n * sizeof *a), *b = malloc (n * sizeof *b);
  for (size_t k = 0; k < n; k++)
    {
      a[k] = 6.0 * (k + 0.05 * (k % 7)) / n;
      b[k] = a[k] + 6.0 * (0.3 + 0.04 * (k % 5)) / n;
    }
  HT_STATUS (holent_region_set (rl, 0, 0, n, a, b), HOLENT_SUCCESS);
  HT_STATUS (holent_region_set (rc, 1, 6, n, a, b), HOLENT_SUCCESS);
  holent_rt_result r0, r1;
  size_t *pairs = malloc (2 * n * sizeof *pairs);
  for (int c = 0; c < 2; c++)
    {
      const holent_geo_bg *bg = c ? &btz : &line;
      const holent_region *r = c ? rc : rl;
      HT_STATUS (holent_rt_entropy (w, bg, r, &r0, pairs, NULL),
                 HOLENT_SUCCESS);
      poll_probe never = { 0, 0, 0, 0, 1 };
      holent_poll pn = { probe_fn, &never };
      HT_STATUS (holent_rt_set_poll (w, &pn), HOLENT_SUCCESS);
      HT_STATUS (holent_rt_entropy (w, bg, r, &r1, pairs, NULL),
                 HOLENT_SUCCESS);
      HT_CHECK (r1.S == r0.S && never.calls > 3 && never.monotone
                && never.last <= 1.05 * never.total
                && never.last >= 0.5 * never.total,
                "case %d: %d calls, done %g of %g", c, never.calls,
                never.last, never.total);
      for (int at = 1; at <= 9; at += 4)  /* early, and in the unwinding */
        {
          poll_probe stop = { 0, at, 0, 0, 1 };
          holent_poll ps = { probe_fn, &stop };
          holent_rt_set_poll (w, &ps);
          HT_STATUS (holent_rt_entropy (w, bg, r, &r1, pairs, NULL),
                     HOLENT_EINTR);
        }
      holent_rt_set_poll (w, NULL);
    }
  /* the DP */
  HT_STATUS (holent_region_set (rc, 1, 6, 300, a, b), HOLENT_SUCCESS);
  poll_probe stop = { 0, 2, 0, 0, 1 };
  holent_poll ps = { probe_fn, &stop };
  holent_rt_set_poll (wd, &ps);
  HT_STATUS (holent_rt_entropy_method (wd, &btz, rc, HOLENT_RT_DP, &r1, NULL,
                                       NULL), HOLENT_EINTR);
  HT_STATUS (holent_rt_set_poll (NULL, &ps), HOLENT_EINVAL);
  /* the batch: per region, serial and on threads */
  enum { NR = 40 };
  holent_rt_input in[NR];
  double S[NR];
  for (int k = 0; k < NR; k++)
    in[k] = (holent_rt_input) { 5, a + 5 * k, b + 5 * k };
  for (size_t nr = 4; nr <= NR; nr += NR - 4)
    {
      holent_rt_batch *bt = holent_rt_batch_alloc (nr, 5, 5, 0);
      poll_probe cnt = { 0, 0, 0, 0, 1 };
      holent_poll pc = { probe_fn, &cnt };
      HT_STATUS (holent_rt_batch_run (bt, &btz, HOLENT_RT_AUTO, nr, in, S,
                                      NULL, NULL, NULL, &pc),
                 HOLENT_SUCCESS);
      HT_CHECK (cnt.calls == (int) nr && cnt.last == (double) nr
                && cnt.total == (double) nr, "batch of %zu: %d calls", nr,
                cnt.calls);
      poll_probe st2 = { 0, 2, 0, 0, 1 };
      holent_poll p2 = { probe_fn, &st2 };
      size_t failed = 99;
      HT_STATUS (holent_rt_batch_run (bt, &btz, HOLENT_RT_AUTO, nr, in, S,
                                      NULL, NULL, &failed, &p2),
                 HOLENT_EINTR);
      HT_CHECK (failed < nr, "failed = %zu", failed);
      holent_rt_batch_free (bt);
    }
  free (a);
  free (b);
  free (pairs);
  holent_region_free (rl);
  holent_region_free (rc);
  holent_rt_workspace_free (w);
  holent_rt_workspace_free (wd);
}

static void
test_large (void)
{
  /* n = 300 on a BTZ circle: the horizon face must be found for the
     complement of a thin region too (S(A) - S(A^c) = S_BH on the
     plateau, Araki-Lieb saturation).  */
  const size_t n = 300;
  const double L = 2 * M_PI;
  holent_geo_bg bg;
  holent_geo_bg_init (&bg, HOLENT_BULK_BTZ, L, 1e-6, 0.3, 0.3, 1, 1);
  holent_region *r = holent_region_alloc (n), *rc = holent_region_alloc (n);
  holent_rt_workspace *w = holent_rt_workspace_alloc (n);
  double *a = malloc (n * sizeof *a), *b = malloc (n * sizeof *b);
  double *ac = malloc (n * sizeof *a), *bc = malloc (n * sizeof *b);
  for (size_t k = 0; k < n; k++)
    {
      a[k] = L * k / n;
      b[k] = a[k] + 0.97 * L / n;
      ac[k] = b[k];
      bc[k] = L * (k + 1) / n;
    }
  holent_rt_result res, resc;
  HT_STATUS (holent_region_set (r, 1, L, n, a, b), HOLENT_SUCCESS);
  HT_STATUS (holent_region_set (rc, 1, L, n, ac, bc), HOLENT_SUCCESS);
  HT_STATUS (holent_rt_entropy (w, &bg, r, &res, NULL, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_rt_entropy (w, &bg, rc, &resc, NULL, NULL), HOLENT_SUCCESS);
  HT_CHECK (res.horizon && !resc.horizon, "plateau");
  HT_CLOSE (res.S - resc.S, bg.S_BH, 1e-9);
  free (a);
  free (b);
  free (ac);
  free (bc);
  holent_region_free (r);
  holent_region_free (rc);
  holent_rt_workspace_free (w);
}

int
main (void)
{
  test_against_enumeration ();
  test_counts ();
  test_errors ();
  test_oracle ();
  test_batch ();
  test_poll ();
  test_large ();
  return HT_DONE ();
}
