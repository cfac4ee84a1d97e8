/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_rt.c: RT minimisation over region sets (doc/rt_regions.md):
 * the interval DP below and the O(N^2) sweep further down
 * (doc/rt_fast.md).
 *
 * DP
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
#ifdef _OPENMP
#include <omp.h>
#endif
#include "holent_rt.h"
#include "holent_vmath.h"

/* State of one sweep (doc/rt_fast.md), arrays indexed by unrolled point:
   T[s] the best run from s to the current right end, A[s] the cost of
   the pair (s, P[s]) with everything inside it; arc and cost hold one
   column.  The log records every change of partner (start, new right
   end) so that the minimiser can be unwound.  */
typedef struct
{
  double *T, *T2, *A, *arc, *cost;
  size_t *P;
  size_t *lg_e, *lg_next, *head;  /* log: right end, previous record */
  size_t lg_n, lg_cap;
  int logging, overflow;
  /* interruption: the poll, steps since the last call, progress */
  const holent_poll *poll;
  double steps, done0, total;
  int stopped;
} sweep_state;

struct holent_rt_workspace
{
  size_t nmax;
  int dp;
  double *T, *W;          /* DP tables (NULL without them)            */
  size_t *stack, *pidx, *slot;
  double *parc;
  double *y, *full;       /* unrolled points, best run per start      */
  sweep_state sw[2];      /* one per thread of the circle sweep       */
  const holent_poll *poll;  /* NULL: never interrupted                */
};

#define RT_NONE ((size_t) -1)

static int
sweep_alloc (sweep_state *s, size_t P, size_t N)
{
  s->T = malloc ((P + 2) * sizeof *s->T);
  s->T2 = malloc ((P + 2) * sizeof *s->T2);
  s->A = malloc ((P + 2) * sizeof *s->A);
  s->P = malloc ((P + 2) * sizeof *s->P);
  s->head = malloc ((P + 2) * sizeof *s->head);
  s->arc = malloc (N * sizeof *s->arc);
  s->cost = malloc (4 * N * sizeof *s->cost);  /* four columns */
  /* A few records per point in practice (doc/rt_fast.md); beyond that
     the unwinding sweeps again over sub-runs instead.  */
  s->lg_cap = 8 * N + 64;
  s->lg_e = malloc (s->lg_cap * sizeof *s->lg_e);
  s->lg_next = malloc (s->lg_cap * sizeof *s->lg_next);
  return s->T && s->T2 && s->A && s->P && s->head && s->arc && s->cost && s->lg_e
         && s->lg_next;
}

static void
sweep_free (sweep_state *s)
{
  free (s->T);
  free (s->T2);
  free (s->A);
  free (s->P);
  free (s->head);
  free (s->arc);
  free (s->cost);
  free (s->lg_e);
  free (s->lg_next);
}

static holent_rt_workspace *
rt_alloc (size_t nmax, int dp)
{
  if (nmax == 0 || (dp && nmax > HOLENT_RT_NMAX)
      || nmax > ((size_t) -1) / 64)
    return NULL;
  holent_rt_workspace *w = calloc (1, sizeof *w);
  if (w == NULL)
    return NULL;
  size_t N = 2 * nmax;
  int ok = 1;
  if (dp)
    {
      /* Rows for two turns of the circle (2N + 1) of n + 1 run lengths.  */
      size_t cells = (2 * N + 1) * (nmax + 1);
      w->T = malloc (cells * sizeof *w->T);
      w->W = malloc (N * nmax * sizeof *w->W);
      ok = w->T && w->W;
    }
  w->stack = malloc (2 * (nmax + 2) * sizeof *w->stack);
  w->pidx = malloc (N * sizeof *w->pidx);
  w->slot = malloc (N * sizeof *w->slot);
  w->parc = malloc (nmax * sizeof *w->parc);
  w->y = malloc (2 * N * sizeof *w->y);
  w->full = malloc ((2 * N + 1) * sizeof *w->full);
  ok = ok && w->stack && w->pidx && w->slot && w->parc && w->y && w->full
       && sweep_alloc (&w->sw[0], 2 * N, N) && sweep_alloc (&w->sw[1], 2 * N, N);
  if (!ok)
    {
      holent_rt_workspace_free (w);
      return NULL;
    }
  w->nmax = nmax;
  w->dp = dp;
  return w;
}

int
holent_rt_set_poll (holent_rt_workspace *w, const holent_poll *poll)
{
  if (w == NULL)
    return HOLENT_EINVAL;
  w->poll = poll;
  return HOLENT_SUCCESS;
}

/* Between polls: about 1e5 elementary steps.  */
#define RT_POLL_STEPS 1e5

/* Count steps and poll every RT_POLL_STEPS; nonzero: stop.  done and
   total are this state's steps (each thread reports its own share).  */
static inline int
sweep_poll (sweep_state *st, double steps)
{
  st->steps += steps;
  if (st->steps < RT_POLL_STEPS || st->poll == NULL || st->poll->fn == NULL)
    return st->stopped;
  st->done0 += st->steps;
  st->steps = 0.0;
  if (st->poll->fn (st->poll->ctx, st->done0, st->total))
    st->stopped = 1;
  return st->stopped;
}

int
holent_rt_set_log_capacity (holent_rt_workspace *w, size_t records)
{
  if (w == NULL || records == 0)
    return HOLENT_EINVAL;
  for (int i = 0; i < 2; i++)
    if (records < w->sw[i].lg_cap)
      w->sw[i].lg_cap = records;
  return HOLENT_SUCCESS;
}

holent_rt_workspace *
holent_rt_workspace_alloc (size_t nmax)
{
  return rt_alloc (nmax, 0);
}

holent_rt_workspace *
holent_rt_workspace_alloc_dp (size_t nmax)
{
  return rt_alloc (nmax, 1);
}

void
holent_rt_workspace_free (holent_rt_workspace *w)
{
  if (w == NULL)
    return;
  free (w->T);
  free (w->W);
  free (w->stack);
  free (w->pidx);
  free (w->slot);
  free (w->parc);
  free (w->y);
  free (w->full);
  sweep_free (&w->sw[0]);
  sweep_free (&w->sw[1]);
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

/* Arc from unrolled point s to e (s < e, e - s < N), taken from the
   first turn: (q[b] + L) - (q[a] + L) would lose the digits of short
   arcs to the rounding of L.  */
static inline double
uarc (const double *y, size_t N, size_t s, size_t e)
{
  return s >= N ? y[e - N] - y[s - N] : y[e] - y[s];
}

typedef struct
{
  size_t N, K, K1, P;  /* endpoints, pairs, row stride, unrolled points */
  int circle;
  const double *y;     /* unrolled points (circle: q + L on turn two)  */
  double *T, *W;
  holent_rt_cost cost;  /* caller's lengths (NULL: the arc lengths of bg) */
  void *ctx;
} dp;

/* W[s][t]: the geodesic over the arc from point s to point s + 2t + 1;
   on a circle rows s >= N repeat rows s - N.  The points were checked
   (strictly increasing within one turn), so every arc is valid.  */
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
      size_t m = d->circle ? K : ((size_t) (N - s)) / 2;
      for (size_t t = 0; t < m; t++)
        w[t] = d->y[s + 2 * t + 1] - d->y[s];
      if (d->cost == NULL)
        {
          /* ascending arcs: the very kernel of the sweep's columns */
          holent_vmath_arc_lengths_sorted (bg, m, w, w);
          continue;
        }
      for (size_t t = 0; t < m; t++)
        {
          size_t j = ((size_t) s + 2 * t + 1) % d->N;
          int st = d->cost (d->ctx, (size_t) s, j, w[t], &w[t]);
          if (st)
            {
#pragma omp critical (holent_rt_cost_status)
              status = st;
              w[t] = INFINITY;
            }
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
fill_tables (dp *d, sweep_state *pl)
{
  const size_t K1 = d->K1, P = d->P;
  for (size_t s = P + 1; s-- > 0;)
    {
      size_t mmax = run_max (d, s);
      d->T[s * K1] = 0.0;
      if (mmax > 0)
        row_build (d, s, 1, mmax + 1);
      if (sweep_poll (pl, 0.5 * (double) mmax * (double) mmax))
        return;
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
      arc[k] = uarc (d->y, d->N, s, s + 2 * t + 1);
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

/* ---- The sweep (doc/rt_fast.md).  Runs [s, e] of unrolled points
 * with a <= s < e <= b and at most cap points.  After column e, T_e[s]
 * holds the best run [s, e] for every start s of the other parity; its
 * candidates are the partner kept from column e - 2 and the new point e:
 *   T_e[s] = min(A[s] + T_e[P[s] + 1], c(y[e] - y[s]) + T_{e-1}[s + 1]),
 * in the order of the DP's sums, so both give the same numbers.  Columns
 * go in pairs (e, e + 1) whose starts have opposite parities, so one
 * array holds both; consecutive pairs alternate between st->T and st->T2
 * (sweep_tcol).  full (if non-NULL) receives T_e[s] for each run of
 * exactly cap points.  */
static inline double *
sweep_tcol (const sweep_state *st, size_t a, size_t x)
{
  return ((x - a - 1) / 2) & 1 ? st->T2 : st->T;
}

/* A new partner e of s at cost v (rare: a few per point), logged when
   the unwinding needs it.  */
static inline void
sweep_take (sweep_state *st, double *T, size_t s, size_t e, double v,
            int first)
{
  T[s] = st->A[s] = v;
  st->P[s] = e;
  if (st->logging)
    {
      if (first)
        st->head[s] = RT_NONE;
      if (st->lg_n < st->lg_cap)
        {
          st->lg_e[st->lg_n] = e;
          st->lg_next[st->lg_n] = st->head[s];
          st->head[s] = st->lg_n++;
        }
      else
        st->overflow = 1;
    }
}

/* Column e (array T, the previous column's Tp) at start s, not its
   first: the kept partner against the new point e, whose length is c.
   Ties keep the earlier partner.  */
static inline void
sweep_step (sweep_state *st, double *restrict T, const double *Tp, size_t s,
            size_t e, double c)
{
  double vnew = c + Tp[s + 1];
  double vold = st->A[s] + T[st->P[s] + 1];
  if (__builtin_expect (vnew < vold, 0))
    sweep_take (st, T, s, e, vnew, 0);
  else
    T[s] = vold;
}

/* The lengths of column e into c (starts e - 1, e - 3, ..., at most cap
   points from the start a on); returns their number.  */
static size_t
sweep_column (sweep_state *st, const holent_geo_bg *bg, const double *y,
              size_t N, size_t a, size_t cap, size_t e, double *c)
{
  size_t lo = e + 1 >= a + cap ? e + 1 - cap : a;
  if ((e - 1 - lo) & 1)
    lo++;
  size_t J = (e - 1 - lo) / 2 + 1;
  /* uarc without its branch: the starts on the second turn come first */
  size_t jN = e - 1 >= N ? (e - 1 - N) / 2 + 1 : 0;
  if (jN > J)
    jN = J;
  double *restrict arc = st->arc;
  const double y2 = e >= N ? y[e - N] : 0.0, y1 = y[e];
  for (size_t j = 0; j < jN; j++)
    arc[j] = y2 - y[e - 1 - 2 * j - N];
  for (size_t j = jN; j < J; j++)
    arc[j] = y1 - y[e - 1 - 2 * j];
  holent_vmath_arc_lengths_sorted (bg, J, st->arc, c);  /* ascending */
  return J;
}

#define SWEEP_LANES 4

static void
sweep_run (sweep_state *st, const holent_geo_bg *bg, const double *y,
           size_t N, size_t a, size_t b, size_t cap, double *full)
{
  st->lg_n = 0;
  st->overflow = 0;
  /* the empty run [a + 1, a] before the first column */
  sweep_tcol (st, a, a)[a + 1] = 0.0;
  /* Four columns e, ..., e + 3 go together, step by step: column x at
     step j (start x - 1 - 2j) needs columns x - 1 and x - 2 at step j - 1
     only (T_{x-1}[s + 1], and A[s], P[s] as column x - 2 left them), so
     four independent chains of loads and adds keep the core busy where
     one would wait on the latency of each.  Columns x and x + 2 share
     the slots of A and P (one step apart) but not their T array.  */
  for (size_t e = a + 1; e <= b; e += SWEEP_LANES)
    {
      size_t nl = b - e + 1 < SWEEP_LANES ? b - e + 1 : SWEEP_LANES;
      double *T[SWEEP_LANES], *Tp[SWEEP_LANES], *c[SWEEP_LANES];
      size_t J[SWEEP_LANES] = { 0 }, Jc = (size_t) -1, Jsum = 0;
      for (size_t q = 0; q < nl; q++)
        {
          size_t x = e + q;
          T[q] = sweep_tcol (st, a, x);
          Tp[q] = sweep_tcol (st, a, x - 1);
          c[q] = st->cost + q * N;
          T[q][x + 1] = 0.0;  /* the empty run [x + 1, x] */
          J[q] = sweep_column (st, bg, y, N, a, cap, x, c[q]);
          Jc = J[q] < Jc ? J[q] : Jc;
          Jsum += J[q];
        }
      /* the first start of each column (the pair (x - 1, x)) */
      for (size_t q = 0; q < nl; q++)
        sweep_take (st, T[q], e + q - 1, e + q, c[q][0] + Tp[q][e + q], 1);
      size_t j = 1;
      if (nl == SWEEP_LANES)
        for (; j < Jc; j++)
          {
            sweep_step (st, T[0], Tp[0], e - 1 - 2 * j, e, c[0][j]);
            sweep_step (st, T[1], Tp[1], e - 2 * j, e + 1, c[1][j]);
            sweep_step (st, T[2], Tp[2], e + 1 - 2 * j, e + 2, c[2][j]);
            sweep_step (st, T[3], Tp[3], e + 2 - 2 * j, e + 3, c[3][j]);
          }
      /* the rest of each column, in column order */
      for (size_t q = 0; q < nl; q++)
        for (size_t i = j; i < J[q]; i++)
          sweep_step (st, T[q], Tp[q], e + q - 1 - 2 * i, e + q, c[q][i]);
      for (size_t q = 0; full && q < nl; q++)
        if (e + q + 1 >= a + cap)
          full[e + q + 1 - cap] = T[q][e + q + 1 - cap];
      if (sweep_poll (st, (double) Jsum))
        return;
    }
}

/* Record the pair (s, p) and push the run inside it, if any.  */
static inline void
emit_pair (const double *y, size_t N, size_t s, size_t p, size_t *pi,
           size_t *pj, double *arc, size_t *k, size_t *stack, size_t *top)
{
  pi[*k] = s;
  pj[*k] = p;
  arc[(*k)++] = uarc (y, N, s, p);
  if (p > s + 1)
    {
      stack[(*top)++] = s + 1;
      stack[(*top)++] = p - 1;
    }
}

/* Unwind the best run [s0, s0 + N - 1] into pairs of unrolled indices
 * (pi, pj) with their arcs.  Runs still to resolve sit on a stack; the
 * log of the last sweep resolves any run inside it, and when the log
 * overflowed the final partners give the top chain of the swept run and
 * its inner runs are swept again, each smaller than the last.  */
static int
sweep_unwind (holent_rt_workspace *w, const holent_geo_bg *bg, size_t s0,
              size_t N, int swept, size_t *pi, size_t *pj, double *arc)
{
  sweep_state *st = &w->sw[0];
  const double *y = w->y;
  size_t *stack = w->stack, top = 0, k = 0;
  size_t la = s0, lb = s0 + N - 1;
  int have_log = swept && !st->overflow;
  stack[top++] = s0;
  stack[top++] = s0 + N - 1;
  while (top > 0)
    {
      size_t e = stack[--top], s = stack[--top];
      if (!(have_log && la <= s && e <= lb))
        {
          st->logging = 1;
          st->total += 0.25 * (double) (e - s + 1) * (double) (e - s + 1);
          sweep_run (st, bg, y, N, s, e, e - s + 1, NULL);
          if (st->stopped)
            return HOLENT_EINTR;
          la = s;
          lb = e;
          have_log = !st->overflow;
          if (!have_log)
            {
              /* the top chain from the final partners */
              for (size_t x = s; x < e; x = st->P[x] + 1)
                emit_pair (y, N, x, st->P[x], pi, pj, arc, &k, stack, &top);
              continue;
            }
        }
      size_t r = st->head[s];
      while (st->lg_e[r] > e)
        r = st->lg_next[r];
      size_t p = st->lg_e[r];
      emit_pair (y, N, s, p, pi, pj, arc, &k, stack, &top);
      if (e > p)
        {
          stack[top++] = p + 1;
          stack[top++] = e;
        }
    }
  return HOLENT_SUCCESS;
}

/* Best run of every start on the circle: full[s] for s = 1..N, runs of
 * N points over two turns.  Two threads when there are two: one takes
 * the starts up to N/2, the other the rest (each sweeps 2/3 of the
 * single sweep's steps).  */
static void
sweep_circle (holent_rt_workspace *w, const holent_geo_bg *bg, size_t N)
{
  int two = 0;
#ifdef _OPENMP
  two = N >= 2000 && !omp_in_parallel () && omp_get_max_threads () > 1;
#endif
  w->sw[0].logging = w->sw[1].logging = 0;
  if (!two)
    {
      sweep_run (&w->sw[0], bg, w->y, N, 1, 2 * N - 1, N, w->full);
      return;
    }
  size_t h = N / 2;
  /* each thread reports its own share, N^2/2 steps */
  w->sw[0].total = w->sw[1].total = 0.5 * (double) N * (double) N;
#pragma omp parallel sections num_threads(2)
  {
#pragma omp section
    sweep_run (&w->sw[0], bg, w->y, N, 1, h + N - 1, N, w->full);
#pragma omp section
    sweep_run (&w->sw[1], bg, w->y, N, h + 1, 2 * N - 1, N, w->full);
  }
}

/* Every static AdS3 length is a concave function of the arc it spans
   (doc/rt_fast.md): 2 log l, log sinh, log sin (capped for the defect)
   and sums of them.  A cost that is not (boosted or time-dependent
   endpoints) must take the DP.  */
static int
cost_is_concave (const holent_geo_bg *bg)
{
  switch (bg->bulk)
    {
    case HOLENT_BULK_POINCARE:
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_PLANAR_BTZ:
    case HOLENT_BULK_BTZ:
    case HOLENT_BULK_THERMAL_ADS:
    case HOLENT_BULK_ROTATING_BTZ:
    case HOLENT_BULK_PLANAR_ROTATING_BTZ:
    case HOLENT_BULK_CONICAL_DEFECT:
      return 1;
    default:
      return 0;
    }
}

/* Sorted endpoints strictly increasing within one turn: then every arc
   the minimisers use lies in (0, L) (or is positive on a line).  */
static int
check_points (const holent_region *r)
{
  const size_t N = 2 * r->n;
  for (size_t i = 0; i < N; i++)
    if (isnan (r->pts[i]))
      return HOLENT_EINVAL;
  for (size_t i = 0; i < N; i++)
    if (!isfinite (r->pts[i]) || (i > 0 && !(r->pts[i] > r->pts[i - 1])))
      return HOLENT_EDOM;
  if (r->circle && !(r->pts[N - 1] - r->pts[0] < r->L))
    return HOLENT_EDOM;
  return HOLENT_SUCCESS;
}

/* Both public entry points; cost != NULL forces the DP.  */
static int
rt_minimise (holent_rt_workspace *w, const holent_geo_bg *bg,
             const holent_region *r, holent_rt_method method,
             holent_rt_cost cost, void *ctx, holent_rt_result *res,
             size_t *pairs, double *arcs)
{
  if (w == NULL || bg == NULL || r == NULL || res == NULL)
    return HOLENT_EINVAL;
  if (method != HOLENT_RT_AUTO && method != HOLENT_RT_DP
      && method != HOLENT_RT_FAST)
    return HOLENT_EINVAL;
  if ((r->circle != 0) != (bg->circle != 0) || (bg->circle && r->L != bg->L))
    return HOLENT_EINVAL;
  if (r->n == 0 && !r->whole)
    return HOLENT_EEMPTY;
  if (r->n > w->nmax || (method == HOLENT_RT_DP && !w->dp))
    return HOLENT_ETOOBIG;
  if (cost != NULL && method != HOLENT_RT_DP)
    return HOLENT_EUNSUP;
  int fast = method == HOLENT_RT_FAST
             || (method == HOLENT_RT_AUTO && cost_is_concave (bg));
  if (fast && !cost_is_concave (bg))
    return HOLENT_EUNSUP;
  if (!fast && !w->dp)
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
  int st = check_points (r);
  if (st)
    return st;
  for (size_t i = 0; i + 1 < N; i++)
    res->n_short += r->pts[i + 1] - r->pts[i] <= 2.0 * bg->eps;
  if (r->circle)
    res->n_short += r->pts[0] + r->L - r->pts[N - 1] <= 2.0 * bg->eps;

  rt_kind kind = kind_of (bg);
  /* Without a horizon or defect the geodesic does not depend on the
     side: one unrolling (cut before q[0]) holds every pairing.  With
     them, two turns of the circle hold every run of up to N points.  */
  int two_turns = kind != KIND_LINEAR;
  size_t P = two_turns ? 2 * N : N;
  for (size_t i = 0; i < P; i++)
    w->y[i] = i < N ? r->pts[i] : r->pts[i - N] + r->L;
  dp d = { N, n, n + 1, P, two_turns, w->y, w->T, w->W, cost, ctx };
  int want_conf = pairs != NULL || arcs != NULL;
  /* Progress in elementary steps: the sweep's (3/4 N^2 over two turns,
     N^2/2 for each of two threads, N^2/4 on one turn; every sweep of the
     unwinding adds its own), or the DP's (about N^3/24 or N^3/6).  */
  double Nd = (double) N, total;
  if (fast)
    total = (two_turns ? 0.75 : 0.25) * Nd * Nd;
  else
    total = (two_turns ? 1.0 / 6.0 : 1.0 / 24.0) * Nd * Nd * Nd;
  for (int i = 0; i < 2; i++)
    {
      sweep_state *ss = &w->sw[i];
      ss->poll = w->poll;
      ss->steps = ss->done0 = 0.0;
      ss->total = total;
      ss->stopped = 0;
    }
  if (fast)
    {
      if (two_turns)
        sweep_circle (w, bg, N);
      else
        {
          w->sw[0].logging = want_conf;
          sweep_run (&w->sw[0], bg, w->y, N, 0, N - 1, N, w->full);
        }
      if (w->sw[0].stopped || w->sw[1].stopped)
        return HOLENT_EINTR;
    }
  else
    {
      st = fill_weights (&d, bg);
      if (st)
        return st;
      fill_tables (&d, &w->sw[0]);
      if (w->sw[0].stopped)
        return HOLENT_EINTR;
      if (two_turns)
        for (size_t s = 1; s <= N; s++)
          w->full[s] = d.T[s * d.K1 + n];
      else
        w->full[0] = d.T[n];
    }

  size_t s0 = 0;
  double best;
  if (kind == KIND_LINEAR)
    best = w->full[0];
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
          double v = w->full[g + 1];
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
  if (!want_conf)
    return HOLENT_SUCCESS;

  size_t *pi = w->pidx, *pj = w->pidx + n, *slot = w->slot;
  double *arc = w->parc;
  if (fast)
    {
      st = sweep_unwind (w, bg, s0, N, !two_turns, pi, pj, arc);
      if (st)
        return st;
    }
  else
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

int
holent_rt_entropy_method (holent_rt_workspace *w, const holent_geo_bg *bg,
                          const holent_region *r, holent_rt_method method,
                          holent_rt_result *res, size_t *pairs, double *arcs)
{
  return rt_minimise (w, bg, r, method, NULL, NULL, res, pairs, arcs);
}

int
holent_rt_entropy_cost (holent_rt_workspace *w, const holent_geo_bg *bg,
                        const holent_region *r, holent_rt_cost cost,
                        void *ctx, holent_rt_result *res, size_t *pairs,
                        double *arcs)
{
  if (cost == NULL)
    return HOLENT_EINVAL;
  return rt_minimise (w, bg, r, HOLENT_RT_DP, cost, ctx, res, pairs, arcs);
}

int
holent_rt_entropy (holent_rt_workspace *w, const holent_geo_bg *bg,
                   const holent_region *r, holent_rt_result *res,
                   size_t *pairs, double *arcs)
{
  return holent_rt_entropy_method (w, bg, r, HOLENT_RT_AUTO, res, pairs,
                                   arcs);
}

/* ---- Many regions.  */
struct holent_rt_batch
{
  size_t nthreads, maxrows;
  holent_region **reg;
  holent_rt_workspace **ws;
};

/* Regions are spread over threads from this many on.  */
#define RT_BATCH_PAR 16

holent_rt_batch *
holent_rt_batch_alloc (size_t nreg, size_t maxrows, size_t nmax, int dp)
{
  if (maxrows == 0 || nmax == 0)
    return NULL;
  holent_rt_batch *b = calloc (1, sizeof *b);
  if (b == NULL)
    return NULL;
  size_t nt = 1;
#ifdef _OPENMP
  if (nreg >= RT_BATCH_PAR)
    nt = (size_t) omp_get_max_threads ();
#else
  (void) nreg;
#endif
  b->reg = calloc (nt, sizeof *b->reg);
  b->ws = calloc (nt, sizeof *b->ws);
  int ok = b->reg && b->ws;
  for (size_t t = 0; ok && t < nt; t++)
    {
      b->reg[t] = holent_region_alloc (maxrows);
      b->ws[t] = dp ? holent_rt_workspace_alloc_dp (nmax) : holent_rt_workspace_alloc (nmax);
      ok = b->reg[t] && b->ws[t];
      b->nthreads = t + 1;
    }
  if (!ok)
    {
      holent_rt_batch_free (b);
      return NULL;
    }
  b->maxrows = maxrows;
  return b;
}

void
holent_rt_batch_free (holent_rt_batch *b)
{
  if (b == NULL)
    return;
  for (size_t t = 0; t < b->nthreads; t++)
    {
      holent_region_free (b->reg[t]);
      holent_rt_workspace_free (b->ws[t]);
    }
  free (b->reg);
  free (b->ws);
  free (b);
}

/* One region: set, minimise, copy what the caller asked for.  */
static int
batch_one (holent_region *r, holent_rt_workspace *w, const holent_geo_bg *bg,
           holent_rt_method method, const holent_rt_input *in, double *S,
           size_t *n_short, holent_rt_conf *conf)
{
  int st = holent_region_set (r, bg->circle, bg->L, in->rows, in->start,
                              in->end);
  if (st)
    return st;
  holent_rt_result res;
  st = holent_rt_entropy_method (w, bg, r, method, &res,
                                 conf ? conf->pairs : NULL,
                                 conf ? conf->arcs : NULL);
  if (st)
    return st;
  *S = res.S;
  *n_short = res.n_short;
  if (conf)
    {
      conf->res = res;
      conf->n = r->n;
      conf->whole = r->whole;
      for (size_t i = 0; i < 2 * r->n; i++)
        conf->pts[i] = r->pts[i];
      for (size_t i = 0; i < r->n; i++)
        {
          conf->start[i] = r->start[i];
          conf->len[i] = r->len[i];
        }
    }
  return HOLENT_SUCCESS;
}

int
holent_rt_batch_run (holent_rt_batch *b, const holent_geo_bg *bg,
                     holent_rt_method method, size_t nreg,
                     const holent_rt_input *in, double *S, double *n_short,
                     holent_rt_conf *conf, size_t *failed,
                     const holent_poll *poll)
{
  if (b == NULL || bg == NULL || (nreg > 0 && (in == NULL || S == NULL)))
    return HOLENT_EINVAL;
  for (size_t k = 0; k < nreg; k++)
    if (in[k].rows > b->maxrows)
      {
        if (failed)
          *failed = k;
        return HOLENT_ETOOBIG;
      }
  /* One loop, serial or parallel: each thread owns a region and a
     workspace; the first failure in region order is reported.  A single
     large region keeps both threads for its own sweep.  */
  long first = -1;
  int fail_st = HOLENT_SUCCESS, stop = 0;
  double ns = 0.0, done = 0.0;
  const long nr = (long) nreg;
  const int par = nreg >= RT_BATCH_PAR && b->nthreads > 1;
  /* Serial: each minimiser polls inside too (one region may be large);
     on threads, once per region.  */
  for (size_t t = 0; t < b->nthreads; t++)
    b->ws[t]->poll = par ? NULL : poll;
#pragma omp parallel for schedule(dynamic, 8) reduction(+ : ns) \
    num_threads(b->nthreads) if (par)
  for (long k = 0; k < nr; k++)
    {
      int stopped;
#pragma omp atomic read
      stopped = stop;
      if (stopped)
        continue;
      size_t t = 0;
#ifdef _OPENMP
      t = (size_t) omp_get_thread_num ();  /* < b->nthreads */
#endif
      size_t nsh = 0;
      int st = batch_one (b->reg[t], b->ws[t], bg, method, &in[k], &S[k],
                          &nsh, conf ? &conf[k] : NULL);
      if (st == HOLENT_SUCCESS && poll && poll->fn)
        {
          double d;
#pragma omp atomic capture
          d = ++done;
          if (poll->fn (poll->ctx, d, (double) nreg))
            st = HOLENT_EINTR;
        }
      if (st == HOLENT_EINTR)
        {
#pragma omp atomic write
          stop = 1;
        }
      if (st)
        {
#pragma omp critical (holent_rt_batch_fail)
          if (first < 0 || k < first)
            {
              first = k;
              fail_st = st;
            }
          continue;
        }
      ns += (double) nsh;
    }
  if (n_short)
    *n_short = ns;
  if (first >= 0 && failed)
    *failed = (size_t) first;
  return fail_st;
}
