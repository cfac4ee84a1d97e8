/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_mincut.c: Dinic maximum flow on undirected weighted graphs,
 * multi-source multi-sink, for entropy vectors of graph models.  See
 * holent_mincut.h.  */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include "holent_mincut.h"

struct holent_mincut_workspace
{
  size_t nv, ne;        /* capacity */
  size_t *start;        /* nv + 1: arcs of vertex v are adj[start[v] ..] */
  size_t *adj;          /* 2 ne arc indices */
  size_t *it;           /* current arc of each vertex (position in adj) */
  size_t *queue;        /* BFS queue, nv */
  size_t *stack;        /* DFS path of arcs, nv */
  long *level;          /* BFS level, -1 = unreached or dead end */
  double *flow;         /* 2 ne: flow on arc a (arc a ^ 1 is its reverse) */
  signed char *role;    /* +1 source, -1 sink, 0 bulk */
};

holent_mincut_workspace *
holent_mincut_workspace_alloc (size_t nv, size_t ne)
{
  holent_mincut_workspace *w;
  if (nv == 0 || nv > ((size_t) -1) / 16 || ne > ((size_t) -1) / 32)
    return NULL;
  w = calloc (1, sizeof *w);
  if (w == NULL)
    return NULL;
  w->nv = nv;
  w->ne = ne;
  w->start = malloc ((nv + 1) * sizeof *w->start);
  w->adj = malloc ((2 * ne + 1) * sizeof *w->adj);
  w->it = malloc (nv * sizeof *w->it);
  w->queue = malloc (nv * sizeof *w->queue);
  w->stack = malloc ((nv + 1) * sizeof *w->stack);
  w->level = malloc (nv * sizeof *w->level);
  w->flow = malloc ((2 * ne + 1) * sizeof *w->flow);
  w->role = malloc (nv * sizeof *w->role);
  if (!w->start || !w->adj || !w->it || !w->queue || !w->stack
      || !w->level || !w->flow || !w->role)
    {
      holent_mincut_workspace_free (w);
      return NULL;
    }
  return w;
}

void
holent_mincut_workspace_free (holent_mincut_workspace *w)
{
  if (w == NULL)
    return;
  free (w->start);
  free (w->adj);
  free (w->it);
  free (w->queue);
  free (w->stack);
  free (w->level);
  free (w->flow);
  free (w->role);
  free (w);
}

int
holent_mincut_check (size_t nv, size_t ne, const size_t *tail,
                     const size_t *head, const double *w, const int *label,
                     unsigned n, size_t *bad)
{
  size_t e, v;
  unsigned char seen[HOLENT_MINCUT_NMAX + 2] = { 0 };
  unsigned j;
  if (bad == NULL)
    return HOLENT_EINVAL;
  *bad = (size_t) -1;
  if (label == NULL || (ne > 0 && (tail == NULL || head == NULL || w == NULL)))
    return HOLENT_EINVAL;
  if (n == 0 || nv == 0)
    return HOLENT_EDOM;
  if (n > HOLENT_MINCUT_NMAX)
    return HOLENT_ETOOBIG;
  for (v = 0; v < nv; v++)
    {
      if (label[v] < 0 || label[v] > (int) n + 1)
        {
          *bad = v;
          return HOLENT_EDOM;
        }
      seen[label[v]] = 1;
    }
  for (e = 0; e < ne; e++)
    {
      *bad = e;
      if (tail[e] >= nv || head[e] >= nv)
        return HOLENT_EDOM;
      if (isnan (w[e]))
        return HOLENT_EINVAL;
      if (!(w[e] >= 0.0) || isinf (w[e]))
        return HOLENT_EDOM;
    }
  for (j = 1; j <= n; j++)
    if (!seen[j])
      {
        *bad = j - 1;
        return HOLENT_EEMPTY;
      }
  *bad = (size_t) -1;
  return HOLENT_SUCCESS;
}

/* Arc a: edge a / 2, from tail to head when a is even.  */
static size_t
arc_to (size_t a, const size_t *tail, const size_t *head)
{
  return (a & 1) ? tail[a >> 1] : head[a >> 1];
}

static void
build_adjacency (holent_mincut_workspace *ws, size_t nv, size_t ne,
                 const size_t *tail, const size_t *head)
{
  size_t e, v;
  memset (ws->start, 0, (nv + 1) * sizeof *ws->start);
  for (e = 0; e < ne; e++)
    {
      ws->start[tail[e] + 1]++;
      ws->start[head[e] + 1]++;
    }
  for (v = 0; v < nv; v++)
    ws->start[v + 1] += ws->start[v];
  memcpy (ws->it, ws->start, nv * sizeof *ws->it);
  for (e = 0; e < ne; e++)
    {
      ws->adj[ws->it[tail[e]]++] = 2 * e;
      ws->adj[ws->it[head[e]]++] = 2 * e + 1;
    }
}

/* Levels by BFS from every source through arcs with residual > eps; sink
   vertices are reached but not expanded.  Returns 1 when a sink is
   reached.  */
static int
bfs (holent_mincut_workspace *ws, size_t nv, const size_t *tail,
     const size_t *head, const double *w, double eps)
{
  size_t qh = 0, qt = 0, v, p;
  long stop = -1;  /* level of the nearest sink: no path is longer */
  int hit = 0;
  for (v = 0; v < nv; v++)
    {
      ws->level[v] = -1;
      if (ws->role[v] > 0)
        {
          ws->level[v] = 0;
          ws->queue[qt++] = v;
        }
    }
  while (qh < qt)
    {
      size_t u = ws->queue[qh++];
      if (ws->role[u] < 0 || (stop >= 0 && ws->level[u] >= stop))
        continue;
      for (p = ws->start[u]; p < ws->start[u + 1]; p++)
        {
          size_t a = ws->adj[p], x = arc_to (a, tail, head);
          if (ws->level[x] < 0 && w[a >> 1] - ws->flow[a] > eps)
            {
              ws->level[x] = ws->level[u] + 1;
              if (ws->role[x] < 0 && !hit)
                {
                  hit = 1;
                  stop = ws->level[x];
                }
              ws->queue[qt++] = x;
            }
        }
    }
  return hit;
}

/* One blocking flow from source s along level-increasing arcs, by an
   iterative depth-first search with current-arc pointers.  */
static void
blocking_from (holent_mincut_workspace *ws, size_t s, const size_t *tail,
               const size_t *head, const double *w, double eps)
{
  size_t top = 0, u = s, i;
  for (;;)
    {
      if (ws->role[u] < 0)
        {
          /* augment by the bottleneck, then retreat to the first
             saturated arc */
          double b = INFINITY;
          size_t cut = top;
          for (i = 0; i < top; i++)
            {
              size_t a = ws->stack[i];
              double r = w[a >> 1] - ws->flow[a];
              if (r < b)
                b = r;
            }
          for (i = 0; i < top; i++)
            {
              size_t a = ws->stack[i];
              ws->flow[a] += b;
              ws->flow[a ^ 1] -= b;
              if (cut == top && w[a >> 1] - ws->flow[a] <= eps)
                cut = i;
            }
          top = cut;
          u = top == 0 ? s : arc_to (ws->stack[top - 1], tail, head);
          continue;
        }
      while (ws->it[u] < ws->start[u + 1])
        {
          size_t a = ws->adj[ws->it[u]], x = arc_to (a, tail, head);
          if (ws->level[x] == ws->level[u] + 1
              && w[a >> 1] - ws->flow[a] > eps)
            break;
          ws->it[u]++;
        }
      if (ws->it[u] < ws->start[u + 1])
        {
          size_t a = ws->adj[ws->it[u]];
          ws->stack[top++] = a;
          u = arc_to (a, tail, head);
        }
      else
        {
          /* dead end: remove u from the level graph and retreat */
          ws->level[u] = -1;
          if (top == 0)
            return;
          top--;
          u = arc_to (ws->stack[top] ^ 1, tail, head);
          ws->it[u]++;
        }
    }
}

int
holent_mincut_cut (size_t nv, size_t ne, const size_t *tail,
                   const size_t *head, const double *w, const int *label,
                   unsigned n, uint32_t src, double *value,
                   unsigned char *side, holent_mincut_workspace *ws)
{
  size_t v, e;
  double wmax = 0.0, eps, cut = 0.0;
  if (ws == NULL || value == NULL || label == NULL
      || (ne > 0 && (tail == NULL || head == NULL || w == NULL)))
    return HOLENT_EINVAL;
  if (nv > ws->nv || ne > ws->ne || n == 0 || n > HOLENT_MINCUT_NMAX
      || src == 0 || (src >> n) != 0)
    return HOLENT_EDOM;
  build_adjacency (ws, nv, ne, tail, head);
  for (e = 0; e < ne; e++)
    if (w[e] > wmax)
      wmax = w[e];
  /* residuals below this are rounding left-overs of saturated arcs */
  eps = 64.0 * 2.220446049250313e-16 * wmax;
  memset (ws->flow, 0, 2 * ne * sizeof *ws->flow);
  for (v = 0; v < nv; v++)
    {
      int l = label[v];
      ws->role[v] = l == 0 ? 0 : (l <= (int) n && ((src >> (l - 1)) & 1u)) ? 1 : -1;
    }
  while (bfs (ws, nv, tail, head, w, eps))
    {
      memcpy (ws->it, ws->start, nv * sizeof *ws->it);
      for (v = 0; v < nv; v++)
        if (ws->role[v] > 0)
          blocking_from (ws, v, tail, head, w, eps);
    }
  /* the reachable set of the last BFS is the smallest source side */
  for (e = 0; e < ne; e++)
    {
      int a = ws->level[tail[e]] >= 0 && ws->role[tail[e]] >= 0;
      int b = ws->level[head[e]] >= 0 && ws->role[head[e]] >= 0;
      if (a != b)
        cut += w[e];
    }
  *value = cut;
  if (side != NULL)
    for (v = 0; v < nv; v++)
      side[v] = ws->level[v] >= 0 && ws->role[v] >= 0;
  return HOLENT_SUCCESS;
}

int
holent_mincut_entropy (size_t nv, size_t ne, const size_t *tail,
                       const size_t *head, const double *w, const int *label,
                       unsigned n, double *s, unsigned char *cuts,
                       size_t *bad, holent_mincut_workspace *ws,
                       const holent_poll *poll)
{
  uint32_t k;
  int st;
  if (s == NULL || ws == NULL)
    return HOLENT_EINVAL;
  if ((st = holent_mincut_check (nv, ne, tail, head, w, label, n, bad)))
    return st;
  for (k = 1; k < (1u << n); k++)
    {
      if (poll != NULL && poll->fn != NULL
          && poll->fn (poll->ctx, (double) (k - 1), (double) ((1u << n) - 1)))
        return HOLENT_EINTR;
      st = holent_mincut_cut (nv, ne, tail, head, w, label, n, k, &s[k - 1],
                              cuts ? cuts + (size_t) (k - 1) * nv : NULL, ws);
      if (st)
        return st;
    }
  return HOLENT_SUCCESS;
}
