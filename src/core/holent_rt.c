/* holent_rt.c: exact RT minimisation over region sets by dynamic
 * programming over arcs of the sorted endpoints (doc/rt_regions.md).
 *
 * Tables, for the N = 2n endpoints q[0..N-1] and K = n, over P unrolled
 * points (P = N on a line; P = 2N, two turns with q[i+N] = q[i] + L, on a
 * circle with a horizon or a defect):
 *   T[s][m]  least total length of a non-crossing pairing of the 2m
 *            consecutive points s, ..., s+2m-1 (s + 2m <= P), each
 *            geodesic taken over its arc inside that run;
 *   W[s][t]  length of the geodesic over the arc from q[s] to q[s+2t+1].
 * Pairing s with s+2t+1 (the partner has the other parity, which halves
 * the split loop) leaves the runs (s+1, t) and (s+2t+2, m-1-t):
 *   T[s][m] = min_t W[s][t] + T[s+1][t] + T[s+2t+2][m-1-t].
 * On a circle the run of all N points starting at g+1 is the best
 * candidate whose horizon (or defect) face touches the gap between q[g]
 * and q[g+1]: one table serves every cut.  GPL-3.0-or-later.  */
#include <float.h>
#include <math.h>
#include <stdint.h>
#include <stdlib.h>
#include "holent_rt.h"

struct holent_rt_workspace
{
  size_t nmax;
  double *T, *W;
  size_t *stack, *pidx, *slot;
  double *parc;
};

holent_rt_workspace *
holent_rt_alloc (size_t nmax)
{
  if (nmax == 0 || nmax > HOLENT_RT_NMAX)
    return NULL;
  holent_rt_workspace *w = calloc (1, sizeof *w);
  if (w == NULL)
    return NULL;
  /* Rows for two turns of the circle (2N + 1) of n + 1 run lengths.  */
  size_t N = 2 * nmax, cells = (2 * N + 1) * (nmax + 1);
  w->T = malloc (cells * sizeof *w->T);
  w->W = malloc (N * nmax * sizeof *w->W);
  w->stack = malloc (2 * (nmax + 2) * sizeof *w->stack);
  w->pidx = malloc (N * sizeof *w->pidx);
  w->slot = malloc (N * sizeof *w->slot);
  w->parc = malloc (nmax * sizeof *w->parc);
  if (!w->T || !w->W || !w->stack || !w->pidx || !w->slot
      || !w->parc)
    {
      holent_rt_free (w);
      return NULL;
    }
  w->nmax = nmax;
  return w;
}

void
holent_rt_free (holent_rt_workspace *w)
{
  if (w == NULL)
    return;
  free (w->T);
  free (w->W);
  free (w->stack);
  free (w->pidx);
  free (w->slot);
  free (w->parc);
  free (w);
}

typedef enum
{
  KIND_LINEAR,   /* line, or a circle where both arcs give one geodesic */
  KIND_HORIZON,  /* BTZ, rotating BTZ                                   */
  KIND_DEFECT    /* conical defect                                      */
} rt_kind;

static rt_kind
kind_of (const holent_geo_bg *bg)
{
  if (!bg->circle)
    return KIND_LINEAR;
  switch (bg->bulk)
    {
    case HOLENT_BULK_BTZ:
    case HOLENT_BULK_ROTATING_BTZ:
      return KIND_HORIZON;
    case HOLENT_BULK_CONICAL_DEFECT:
      /* alpha = 1 is global AdS: no defect, both arcs one geodesic */
      return bg->alpha < 1.0 ? KIND_DEFECT : KIND_LINEAR;
    default:
      return KIND_LINEAR;
    }
}

int
holent_rt_count (const holent_geo_bg *bg, size_t n, double *count,
                 double *log_count)
{
  if (bg == NULL || count == NULL || log_count == NULL)
    return HOLENT_EINVAL;
  if (n == 0)
    {
      *count = 1.0;
      *log_count = 0.0;
      return HOLENT_SUCCESS;
    }
  /* binom(2n, n) with n + 1 faces per pairing, or Catalan(n) =
     binom(2n, n)/(n + 1) pairings alone.  */
  int faces = kind_of (bg) != KIND_LINEAR;
  double nd = (double) n;
  double lb = lgamma (2.0 * nd + 1.0) - 2.0 * lgamma (nd + 1.0);
  *log_count = faces ? lb : lb - log (nd + 1.0);
  if (n <= 30)
    {
      /* Exact in 64 bits: r = binom(n + k, k) after step k.  */
      uint64_t r = 1;
      for (uint64_t k = 1; k <= n; k++)
        r = r * (n + k) / k;
      if (!faces)
        r /= n + 1;
      *count = (double) r;
      *log_count = log (*count);
    }
  else
    *count = *log_count > log (DBL_MAX) ? INFINITY : exp (*log_count);
  return HOLENT_SUCCESS;
}

/* The hot loop gains from wider vectors where the CPU has them; GCC
   picks the clone at load time.  */
#if defined(__GNUC__) && !defined(__clang__) && defined(__x86_64__) \
    && !defined(__SANITIZE_ADDRESS__) && defined(__ELF__)
#define HOLENT_RT_CLONES __attribute__ ((target_clones ("avx2", "default")))
#else
#define HOLENT_RT_CLONES
#endif

/* best[j] = min(best[j], b + row[j]), j < len: the hot loop.  */
static inline void
row_scatter (double *restrict best, const double *restrict row, double b,
             size_t len)
{
#pragma omp simd
  for (size_t j = 0; j < len; j++)
    {
      double v = b + row[j];
      best[j] = v < best[j] ? v : best[j];
    }
}

typedef struct
{
  size_t N, K, K1, P;  /* endpoints, pairs, row stride, unrolled points */
  int circle;
  double L;
  const double *q;
  double *T, *W;
} dp;

/* Point i of the unrolled sequence (circle: two turns, q + L on the
   second) and the arc between unrolled points i < j.  */
static inline double
arc_fwd (const dp *d, size_t i, size_t j)
{
  double qi = d->q[i % d->N] + (i >= d->N ? d->L : 0.0);
  double qj = d->q[j % d->N] + (j >= d->N ? d->L : 0.0);
  return qj - qi;
}

/* W[s][t]: the geodesic over the arc from point s to point s + 2t + 1;
   on a circle rows s >= N repeat rows s - N.  */
static int
fill_weights (dp *d, const holent_geo_bg *bg)
{
  const long N = (long) d->N;
  const size_t K = d->K;
  int status = HOLENT_SUCCESS;
#pragma omp parallel for schedule(dynamic, 16) if (N > 200)
  for (long s = 0; s < N; s++)
    {
      double *w = d->W + (size_t) s * K;
      for (size_t t = 0; t < K; t++)
        {
          size_t j = (size_t) s + 2 * t + 1;
          if (!d->circle && j >= d->N)
            break;
          double len;
          int st = holent_geo_arc_length (bg, arc_fwd (d, (size_t) s, j),
                                          &len);
          if (st)
            {
#pragma omp critical (holent_rt_status)
              status = st;
              len = INFINITY;
            }
          w[t] = len;
        }
    }
  return status;
}

/* Most pairs in a run starting at unrolled point s.  */
static inline size_t
run_max (const dp *d, size_t s)
{
  size_t m = (d->P - s) / 2;
  return m < d->K ? m : d->K;
}

/* Runs of row s with lo <= m < hi pairs: pair s with s + 2t + 1, the
 * rest runs from u = s + 2t + 2, so each step scatters a contiguous piece
 * of row T[u] into the row being built (which stays in L1).  */
HOLENT_RT_CLONES static void
row_build (const dp *d, size_t s, size_t lo, size_t hi)
{
  const size_t K1 = d->K1;
  double *row = d->T + s * K1;
  const double *w = d->W + (s % d->N) * d->K;
  const double *inner = d->T + (s + 1) * K1;
  for (size_t m = lo; m < hi; m++)
    row[m] = INFINITY;
  for (size_t t = 0; t + 1 < hi; t++)
    {
      size_t j0 = t + 1 > lo ? t + 1 : lo;  /* first m reached */
      const double *u = d->T + (s + 2 * t + 2) * K1;
      row_scatter (row + j0, u + (j0 - t - 1), w[t] + inner[t], hi - j0);
    }
}

/* Fill the rows of T from the last unrolled point down: row s needs only
 * rows above it.  One thread: a barrier per row costs more than it gains
 * on a loaded machine, and the whole table of n = 1000 takes well under
 * a second.  */
static void
fill_tables (dp *d)
{
  const size_t K1 = d->K1, P = d->P;
  for (size_t s = P + 1; s-- > 0;)
    {
      size_t mmax = run_max (d, s);
      d->T[s * K1] = 0.0;
      if (mmax > 0)
        row_build (d, s, 1, mmax + 1);
    }
}

/* The first split t attaining the run (s, m) of value v.  */
static size_t
run_argmin (const dp *d, size_t s, size_t m, double v)
{
  const size_t K = d->K, K1 = d->K1;
  const double *w = d->W + (s % d->N) * K;
  size_t arg = 0;
  double best = INFINITY;
  for (size_t t = 0; t < m; t++)
    {
      double x = (w[t] + d->T[(s + 1) * K1 + t])
                 + d->T[(s + 2 * t + 2) * K1 + (m - 1 - t)];
      if (x == v)
        return t;
      if (x < best)
        {
          best = x;
          arg = t;
        }
    }
  return arg;
}

/* Unwind the minimiser of the run (s0, m0); pairs as unrolled indices.  */
static void
backtrack (const dp *d, size_t s0, size_t m0, size_t *stack, size_t *pi,
           size_t *pj, double *arc)
{
  const size_t K1 = d->K1;
  size_t top = 0, k = 0;
  stack[top++] = s0;
  stack[top++] = m0;
  while (top > 0)
    {
      size_t m = stack[--top], s = stack[--top];
      size_t t = run_argmin (d, s, m, d->T[s * K1 + m]);
      pi[k] = s;
      pj[k] = s + 2 * t + 1;
      arc[k] = arc_fwd (d, s, s + 2 * t + 1);
      k++;
      /* Only runs with pairs in them: at most n on the stack.  */
      if (t > 0)
        {
          stack[top++] = s + 1;
          stack[top++] = t;
        }
      if (m - 1 - t > 0)
        {
          stack[top++] = s + 2 * t + 2;
          stack[top++] = m - 1 - t;
        }
    }
}

int
holent_rt_entropy (holent_rt_workspace *w, const holent_geo_bg *bg,
                   const holent_region *r, holent_rt_result *res,
                   size_t *pairs, double *arcs)
{
  if (w == NULL || bg == NULL || r == NULL || res == NULL)
    return HOLENT_EINVAL;
  if ((r->circle != 0) != (bg->circle != 0) || (bg->circle && r->L != bg->L))
    return HOLENT_EINVAL;
  if (r->n == 0 && !r->whole)
    return HOLENT_EEMPTY;
  if (r->n > w->nmax)
    return HOLENT_ETOOBIG;

  const size_t n = r->n, N = 2 * n;
  const double c6 = bg->c / 6.0;
  res->horizon = 0;
  res->length = 0.0;
  res->m = n;
  res->n_short = 0;
  (void) holent_rt_count (bg, n, &res->candidates, &res->log_candidates);
  if (r->whole)
    {
      /* Nothing to pair: the horizon alone (or the empty surface).  */
      res->S = bg->horizon ? bg->S_BH : 0.0;
      res->horizon = bg->horizon != 0;
      return HOLENT_SUCCESS;
    }
  for (size_t i = 0; i + 1 < N; i++)
    res->n_short += r->pts[i + 1] - r->pts[i] <= 2.0 * bg->eps;
  if (r->circle)
    res->n_short += r->pts[0] + r->L - r->pts[N - 1] <= 2.0 * bg->eps;

  rt_kind kind = kind_of (bg);
  /* Without a horizon or defect the geodesic does not depend on the
     side: one unrolling (cut before q[0]) holds every pairing.  With
     them, two turns of the circle hold every run of up to N points.  */
  int two_turns = kind != KIND_LINEAR;
  dp d = { N, n, n + 1, two_turns ? 2 * N : N, two_turns, r->L, r->pts,
           w->T, w->W };
  int st = fill_weights (&d, bg);
  if (st)
    return st;
  fill_tables (&d);

  size_t s0 = 0;
  double best;
  if (kind == KIND_LINEAR)
    best = d.T[n];
  else
    {
      /* Segment g (from q[g] to q[g+1]) lies in A iff g has the parity
         of the first start.  Cut in segment g: the run starts at g+1.
         The candidates of that run are those whose horizon (defect)
         face touches segment g.  */
      best = INFINITY;
      double best_in = INFINITY;
      size_t g_out = 0, g_in = 0;
      for (size_t g = 0; g < N; g++)
        {
          double v = d.T[(g + 1) * d.K1 + n];
          int in_a = ((g & 1) == 0) == (r->start0 != 0);
          if (kind == KIND_HORIZON && in_a)
            {
              if (v < best_in)
                {
                  best_in = v;
                  g_in = g;
                }
            }
          else if (v < best)
            {
              best = v;
              g_out = g;
            }
        }
      s0 = g_out + 1;
      if (kind == KIND_HORIZON && c6 * best_in + bg->S_BH < c6 * best)
        {
          best = best_in;
          s0 = g_in + 1;
          res->horizon = 1;
        }
    }
  res->length = best;
  res->S = c6 * best + (res->horizon ? bg->S_BH : 0.0);
  if (pairs == NULL && arcs == NULL)
    return HOLENT_SUCCESS;

  size_t *pi = w->pidx, *pj = w->pidx + n, *slot = w->slot;
  double *arc = w->parc;
  backtrack (&d, s0, n, w->stack, pi, pj, arc);
  for (size_t a = 0; a < N; a++)
    slot[a] = 0;
  for (size_t k = 0; k < n; k++)
    {
      size_t a = pi[k] % N, b = pj[k] % N;
      if (a > b)
        {
          size_t t = a;
          a = b;
          b = t;
        }
      pi[k] = a;
      pj[k] = b;
      if (r->circle && kind == KIND_LINEAR)
        arc[k] = fmin (arc[k], r->L - arc[k]);
      slot[a] = k + 1;
    }
  size_t out = 0;
  for (size_t a = 0; a < N; a++)
    if (slot[a])
      {
        size_t k = slot[a] - 1;
        if (pairs)
          {
            pairs[2 * out] = pi[k];
            pairs[2 * out + 1] = pj[k];
          }
        if (arcs)
          arcs[out] = arc[k];
        out++;
      }
  return HOLENT_SUCCESS;
}
