/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_contract.c: search for contraction maps (see holent_contract.h)
 * with candidate sets as bitsets over {0,1}^R, AC-3 on the hypercube
 * edges and a trail for backtracking.  */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include "holent_contract.h"

typedef struct
{
  uint32_t x, wi;
  uint64_t old;
} trail_entry;

struct holent_contract_workspace
{
  unsigned nl, nr;
  size_t words;          /* 64-bit words per candidate set */
  uint64_t *dom;         /* 2^L candidate sets */
  uint32_t *count;       /* their sizes */
  uint32_t *queue;       /* AC-3 circular queue, 2^L + 1 slots */
  unsigned char *queued;
  trail_entry *trail;
  size_t ntrail, cap;
  double wlo[4096], whi[4096];  /* |z|_b by halves of z */
};

holent_contract_workspace *
holent_contract_workspace_alloc (unsigned nl, unsigned nr)
{
  holent_contract_workspace *w;
  size_t np;
  if (nl > HOLENT_CONTRACT_LMAX || nr > HOLENT_CONTRACT_RMAX
      || nl + nr > HOLENT_CONTRACT_BITS || nl == 0 || nr == 0)
    return NULL;
  w = calloc (1, sizeof *w);
  if (w == NULL)
    return NULL;
  np = (size_t) 1 << nl;
  w->nl = nl;
  w->nr = nr;
  w->words = nr >= 6 ? (size_t) 1 << (nr - 6) : 1;
  w->dom = malloc (np * w->words * sizeof *w->dom);
  w->count = malloc (np * sizeof *w->count);
  w->queue = malloc ((np + 1) * sizeof *w->queue);
  w->queued = malloc (np);
  w->cap = 1024;
  w->trail = malloc (w->cap * sizeof *w->trail);
  if (!w->dom || !w->count || !w->queue || !w->queued || !w->trail)
    {
      holent_contract_workspace_free (w);
      return NULL;
    }
  return w;
}

void
holent_contract_workspace_free (holent_contract_workspace *w)
{
  if (w == NULL)
    return;
  free (w->dom);
  free (w->count);
  free (w->queue);
  free (w->queued);
  free (w->trail);
  free (w);
}

typedef struct
{
  holent_contract_workspace *ws;
  unsigned nl, nr;
  const double *a;
  double tol;
  double nodes, backtracks, max_nodes;
  const holent_poll *poll;
  unsigned revisions;  /* since the last poll of propagate */
  int nomem, stop, intr;
} search;

/* Points dequeued by propagate between polls: one AC-3 pass over a large
   hypercube may run for seconds before the search takes its first
   node.  */
#define PROPAGATE_POLL 4096u

static double
wb (const holent_contract_workspace *ws, uint32_t z)
{
  return ws->wlo[z & 4095u] + ws->whi[z >> 12];
}

static uint64_t *
dom_of (const holent_contract_workspace *ws, uint32_t x)
{
  return ws->dom + (size_t) x * ws->words;
}

/* Overwrite word wi of D(x), remembering the old value.  */
static int
set_word (search *s, uint32_t x, uint32_t wi, uint64_t v)
{
  holent_contract_workspace *ws = s->ws;
  uint64_t *d = dom_of (ws, x);
  if (ws->ntrail == ws->cap)
    {
      size_t nc = 2 * ws->cap;
      trail_entry *t = realloc (ws->trail, nc * sizeof *t);
      if (t == NULL)
        {
          s->nomem = 1;
          return 0;
        }
      ws->trail = t;
      ws->cap = nc;
    }
  ws->trail[ws->ntrail].x = x;
  ws->trail[ws->ntrail].wi = wi;
  ws->trail[ws->ntrail].old = d[wi];
  ws->ntrail++;
  ws->count[x] -= (uint32_t) (__builtin_popcountll (d[wi]) - __builtin_popcountll (v));
  d[wi] = v;
  return 1;
}

static void
undo_to (holent_contract_workspace *ws, size_t mark)
{
  while (ws->ntrail > mark)
    {
      trail_entry *t = &ws->trail[--ws->ntrail];
      uint64_t *d = dom_of (ws, t->x);
      ws->count[t->x] += (uint32_t) (__builtin_popcountll (t->old)
                                     - __builtin_popcountll (d[t->wi]));
      d[t->wi] = t->old;
    }
}

/* Above this many candidates a set is not used to prune its neighbours:
   support is then almost certain and the test costs |D(u)| |D(v)|.  Safe,
   because a set is revised against once more when it shrinks to this
   size, and every set ends as a singleton.  */
#define SUPPORT_MAX 256

/* Keep in D(u) only the y with a y' in D(v) at |y - y'|_b <= a_l.
   Returns 1 when D(u) changed.  */
static int
revise (search *s, uint32_t u, uint32_t v, unsigned l)
{
  holent_contract_workspace *ws = s->ws;
  const uint64_t *dv = dom_of (ws, v);
  const uint64_t *du = dom_of (ws, u);
  double lim = s->a[l] + s->tol;
  uint32_t list[SUPPORT_MAX];
  size_t wi, nlist = 0, j;
  int changed = 0;
  if (ws->count[v] > SUPPORT_MAX)
    return 0;
  for (wi = 0; wi < ws->words; wi++)
    {
      uint64_t cb = dv[wi];
      while (cb)
        {
          list[nlist++] = (uint32_t) (wi * 64 + (unsigned) __builtin_ctzll (cb));
          cb &= cb - 1;
        }
    }
  for (wi = 0; wi < ws->words; wi++)
    {
      uint64_t keep = du[wi], bits = du[wi];
      while (bits)
        {
          unsigned bi = (unsigned) __builtin_ctzll (bits);
          uint32_t y = (uint32_t) (wi * 64 + bi);
          bits &= bits - 1;
          for (j = 0; j < nlist; j++)
            if (wb (ws, y ^ list[j]) <= lim)
              break;
          if (j == nlist)
            keep &= ~((uint64_t) 1 << bi);
        }
      if (keep != du[wi])
        {
          if (!set_word (s, u, (uint32_t) wi, keep))
            return 0;
          changed = 1;
        }
    }
  return changed;
}

/* AC-3 from the points already queued; 0 when a set becomes empty.  */
static int
propagate (search *s, size_t qh, size_t qt)
{
  holent_contract_workspace *ws = s->ws;
  size_t slots = ((size_t) 1 << s->nl) + 1;
  while (qh != qt)
    {
      uint32_t v = ws->queue[qh];
      unsigned l;
      if (++s->revisions >= PROPAGATE_POLL)
        {
          s->revisions = 0;
          if (s->poll != NULL && s->poll->fn != NULL
              && s->poll->fn (s->poll->ctx, s->nodes, s->max_nodes))
            s->stop = s->intr = 1;
        }
      if (s->intr)
        {
          while (qh != qt)
            {
              ws->queued[ws->queue[qh]] = 0;
              qh = (qh + 1) % slots;
            }
          return 0;
        }
      qh = (qh + 1) % slots;
      ws->queued[v] = 0;
      for (l = 0; l < s->nl; l++)
        {
          uint32_t u = v ^ (1u << l);
          if (revise (s, u, v, l))
            {
              if (ws->count[u] == 0)
                {
                  /* empty the queue flags before failing */
                  while (qh != qt)
                    {
                      ws->queued[ws->queue[qh]] = 0;
                      qh = (qh + 1) % slots;
                    }
                  return 0;
                }
              if (!ws->queued[u])
                {
                  ws->queued[u] = 1;
                  ws->queue[qt] = u;
                  qt = (qt + 1) % slots;
                }
            }
          if (s->nomem)
            return 0;
        }
    }
  return 1;
}

/* Depth-first search; 1 when every set is a singleton.  */
static int
dfs (search *s)
{
  holent_contract_workspace *ws = s->ws;
  size_t np = (size_t) 1 << s->nl, x, best = np, wi;
  uint32_t bc = UINT32_MAX;
  for (x = 0; x < np; x++)
    if (ws->count[x] > 1 && ws->count[x] < bc)
      {
        bc = ws->count[x];
        best = x;
      }
  if (best == np)
    return 1;
  {
    uint64_t *d = dom_of (ws, (uint32_t) best);
    size_t mark = ws->ntrail;
    /* the candidates, copied: D(best) changes below */
    uint64_t *cand = malloc (ws->words * sizeof *cand);
    if (cand == NULL)
      {
        s->nomem = 1;
        return 0;
      }
    memcpy (cand, d, ws->words * sizeof *cand);
    for (wi = 0; wi < ws->words; wi++)
      while (cand[wi])
        {
          unsigned bi = (unsigned) __builtin_ctzll (cand[wi]);
          size_t wj;
          cand[wi] &= cand[wi] - 1;
          if (s->max_nodes > 0 && s->nodes >= s->max_nodes)
            s->stop = 1;
          if (s->poll != NULL && s->poll->fn != NULL && fmod (s->nodes, 64) == 0
              && s->poll->fn (s->poll->ctx, s->nodes, s->max_nodes))
            s->stop = s->intr = 1;
          if (s->stop || s->nomem)
            {
              free (cand);
              return 0;
            }
          s->nodes += 1;
          for (wj = 0; wj < ws->words; wj++)
            {
              uint64_t v = wj == wi ? (uint64_t) 1 << bi : 0;
              if (d[wj] != v && !set_word (s, (uint32_t) best, (uint32_t) wj, v))
                break;
            }
          ws->queue[0] = (uint32_t) best;
          ws->queued[best] = 1;
          if (!s->nomem && propagate (s, 0, 1) && dfs (s))
            {
              free (cand);
              return 1;
            }
          s->backtracks += 1;
          undo_to (ws, mark);
        }
    free (cand);
  }
  return 0;
}

/* Masks, weights and the boundary points of parties 0 .. n-1 and O.  */
static int
boundary (unsigned n, unsigned nl, const uint32_t *lmask, const double *a,
          unsigned nr, const uint32_t *rmask, const double *b,
          uint32_t *xb, uint32_t *yb)
{
  unsigned i, l;
  if (n == 0 || nl == 0 || nr == 0)
    return HOLENT_EDOM;
  if (n > HOLENT_CONTRACT_NMAX || nl > HOLENT_CONTRACT_LMAX
      || nr > HOLENT_CONTRACT_RMAX || nl + nr > HOLENT_CONTRACT_BITS)
    return HOLENT_ETOOBIG;
  for (l = 0; l < nl; l++)
    {
      if (isnan (a[l]))
        return HOLENT_EINVAL;
      if (lmask[l] == 0 || (lmask[l] >> n) || !(a[l] > 0) || isinf (a[l]))
        return HOLENT_EDOM;
    }
  for (l = 0; l < nr; l++)
    {
      if (isnan (b[l]))
        return HOLENT_EINVAL;
      if (rmask[l] == 0 || (rmask[l] >> n) || !(b[l] > 0) || isinf (b[l]))
        return HOLENT_EDOM;
    }
  for (i = 0; i <= n; i++)
    {
      xb[i] = yb[i] = 0;
      for (l = 0; i < n && l < nl; l++)
        xb[i] |= ((lmask[l] >> i) & 1u) << l;
      for (l = 0; i < n && l < nr; l++)
        yb[i] |= ((rmask[l] >> i) & 1u) << l;
    }
  return HOLENT_SUCCESS;
}

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

/* With integer weights b summing to B <= 64: for every boundary value
   y^(i) and radius k <= B the ball {y : |y - y^(i)|_b <= k} as a bitset,
   so that a candidate set is an intersection of n + 1 balls.  NULL (use
   the direct test) for other weights or when the balls would need more
   than 64 MB.  */
static uint64_t *
boundary_balls (const search *s, unsigned n, const uint32_t *yb,
                size_t *bmax)
{
  const holent_contract_workspace *ws = s->ws;
  size_t words = ws->words, i, k, wi;
  uint32_t y, ny = (uint32_t) 1 << s->nr;
  double tot = wb (ws, ny - 1);
  uint64_t *balls;
  for (y = 0; y < s->nr; y++)
    if (wb (ws, (uint32_t) 1 << y) != floor (wb (ws, (uint32_t) 1 << y)))
      return NULL;
  if (tot > 64 || (n + 1) * (tot + 1) * words * 8.0 > 64.0 * 1048576.0)
    return NULL;
  *bmax = (size_t) tot;
  balls = calloc ((n + 1) * (*bmax + 1) * words, sizeof *balls);
  if (balls == NULL)
    return NULL;
  for (i = 0; i <= n; i++)
    {
      uint64_t *bi = balls + i * (*bmax + 1) * words;
      for (y = 0; y < ny; y++)
        {
          k = (size_t) wb (ws, y ^ yb[i]);
          bi[k * words + (y >> 6)] |= (uint64_t) 1 << (y & 63);
        }
      for (k = 1; k <= *bmax; k++)
        for (wi = 0; wi < words; wi++)
          bi[k * words + wi] |= bi[(k - 1) * words + wi];
    }
  return balls;
}

int
holent_contract_prove (unsigned n, unsigned nl, const uint32_t *lmask,
                       const double *a, unsigned nr, const uint32_t *rmask,
                       const double *b, double max_nodes, uint32_t *f,
                       holent_contract_stats *st,
                       holent_contract_workspace *ws, const holent_poll *poll)
{
  uint32_t xb[HOLENT_CONTRACT_NMAX + 1], yb[HOLENT_CONTRACT_NMAX + 1];
  double rad[HOLENT_CONTRACT_NMAX + 1], amax = 0, bmax = 0;
  size_t np, x, qt, ball_max = 0;
  uint64_t *balls;
  uint32_t y, ny;
  unsigned i, j, l;
  search s;
  int status;
  if (!lmask || !a || !rmask || !b || !f || !st || !ws || isnan (max_nodes))
    return HOLENT_EINVAL;
  if ((status = boundary (n, nl, lmask, a, nr, rmask, b, xb, yb)))
    return status;
  if (ws->nl != nl || ws->nr != nr)
    return HOLENT_EDOM;
  memset (st, 0, sizeof *st);
  for (l = 0; l < nl; l++)
    amax += a[l];
  for (l = 0; l < nr; l++)
    bmax += b[l];
  memset (&s, 0, sizeof s);
  s.ws = ws;
  s.nl = nl;
  s.nr = nr;
  s.a = a;
  /* integer and small rational weights are exact; this absorbs rounding */
  s.tol = 1e-9 * (amax > bmax ? amax : bmax);
  s.max_nodes = max_nodes;
  s.poll = poll;
  for (y = 0; y < 4096; y++)
    {
      ws->wlo[y] = wsum (b, nr < 12 ? nr : 12, y);
      ws->whi[y] = nr > 12 ? wsum (b + 12, nr - 12, y) : 0.0;
    }
  /* pairs of boundary conditions */
  for (i = 0; i <= n; i++)
    for (j = i + 1; j <= n; j++)
      if (wb (ws, yb[i] ^ yb[j]) > wsum (a, nl, xb[i] ^ xb[j]) + s.tol)
        {
          st->conflict = 1;
          st->conflict_i = i;
          st->conflict_j = j;
          return HOLENT_SUCCESS;
        }
  np = (size_t) 1 << nl;
  ny = (uint32_t) 1 << nr;
  ws->ntrail = 0;
  memset (ws->queued, 0, np);
  balls = boundary_balls (&s, n, yb, &ball_max);
  for (x = 0; x < np; x++)
    {
      uint64_t *d = dom_of (ws, (uint32_t) x);
      if (x % 64 == 0 && poll != NULL && poll->fn != NULL
          && poll->fn (poll->ctx, 0.0, max_nodes))
        {
          free (balls);
          return HOLENT_EINTR;
        }
      for (i = 0; i <= n; i++)
        rad[i] = wsum (a, nl, (uint32_t) x ^ xb[i]) + s.tol;
      if (balls != NULL)
        {
          /* D(x) = intersection of the balls around the boundary values */
          size_t wi;
          for (wi = 0; wi < ws->words; wi++)
            d[wi] = ~(uint64_t) 0;
          if (ny < 64)
            d[0] = ((uint64_t) 1 << ny) - 1;
          for (i = 0; i <= n; i++)
            if (rad[i] < (double) ball_max)
              {
                const uint64_t *bl = balls + ((size_t) i * (ball_max + 1)
                                              + (size_t) floor (rad[i])) * ws->words;
                for (wi = 0; wi < ws->words; wi++)
                  d[wi] &= bl[wi];
              }
          ws->count[x] = 0;
          for (wi = 0; wi < ws->words; wi++)
            ws->count[x] += (uint32_t) __builtin_popcountll (d[wi]);
        }
      else
        {
          memset (d, 0, ws->words * sizeof *d);
          ws->count[x] = 0;
          for (y = 0; y < ny; y++)
            {
              for (i = 0; i <= n; i++)
                if (wb (ws, y ^ yb[i]) > rad[i])
                  break;
              if (i > n)
                {
                  d[y >> 6] |= (uint64_t) 1 << (y & 63);
                  ws->count[x]++;
                }
            }
        }
      if (ws->count[x] == 0)
        {
          free (balls);
          st->found = 0;
          return HOLENT_SUCCESS;
        }
      ws->queue[x] = (uint32_t) x;
      ws->queued[x] = 1;
    }
  free (balls);
  qt = np;
  if (!propagate (&s, 0, qt) || s.nomem)
    {
      st->found = 0;
      return s.nomem ? HOLENT_ENOMEM : s.intr ? HOLENT_EINTR : HOLENT_SUCCESS;
    }
  for (x = 0; x < np; x++)
    {
      st->log2_initial += log2 ((double) ws->count[x]);
      st->forced += ws->count[x] == 1;
    }
  ws->ntrail = 0;
  st->found = dfs (&s);
  st->nodes = s.nodes;
  st->backtracks = s.backtracks;
  if (s.nomem)
    return HOLENT_ENOMEM;
  if (s.intr)
    return HOLENT_EINTR;
  if (!st->found)
    {
      st->found = s.stop ? -1 : 0;
      return HOLENT_SUCCESS;
    }
  for (x = 0; x < np; x++)
    {
      const uint64_t *d = dom_of (ws, (uint32_t) x);
      size_t wi;
      for (wi = 0; wi < ws->words; wi++)
        if (d[wi])
          {
            f[x] = (uint32_t) (wi * 64 + (unsigned) __builtin_ctzll (d[wi]));
            break;
          }
    }
  return HOLENT_SUCCESS;
}

int
holent_contract_check (unsigned n, unsigned nl, const uint32_t *lmask,
                       const double *a, unsigned nr, const uint32_t *rmask,
                       const double *b, const uint32_t *f, int *ok,
                       uint32_t *bad_x, unsigned *bad_l)
{
  uint32_t xb[HOLENT_CONTRACT_NMAX + 1], yb[HOLENT_CONTRACT_NMAX + 1];
  size_t np, x;
  unsigned i, l, r;
  double bsum = 0;
  int status;
  if (!lmask || !a || !rmask || !b || !f || !ok || !bad_x || !bad_l)
    return HOLENT_EINVAL;
  if ((status = boundary (n, nl, lmask, a, nr, rmask, b, xb, yb)))
    return status;
  np = (size_t) 1 << nl;
  for (x = 0; x < np; x++)
    if (f[x] >> nr)
      return HOLENT_EDOM;
  for (r = 0; r < nr; r++)
    bsum += b[r];
  *ok = 0;
  for (i = 0; i <= n; i++)
    if (f[xb[i]] != yb[i])
      {
        *bad_x = xb[i];
        *bad_l = (unsigned) -1;
        return HOLENT_SUCCESS;
      }
  /* every edge x -> x + e_l, weights summed term by term */
  for (x = 0; x < np; x++)
    for (l = 0; l < nl; l++)
      if (!((x >> l) & 1u))
        {
          uint32_t z = f[x] ^ f[x | ((size_t) 1 << l)];
          double d = 0;
          for (r = 0; r < nr; r++)
            if ((z >> r) & 1u)
              d += b[r];
          if (d > a[l] + 1e-9 * (bsum > a[l] ? bsum : a[l]))
            {
              *bad_x = (uint32_t) x;
              *bad_l = l;
              return HOLENT_SUCCESS;
            }
        }
  *ok = 1;
  return HOLENT_SUCCESS;
}
