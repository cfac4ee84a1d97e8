/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_mincut.h: entropy vectors of graph models by minimum cuts.
 *
 * A graph model (Bao, Nezami, Ooguri, Stoica, Sully and Walter 2015,
 * JHEP 09 (2015) 130, arXiv:1505.07839) is an undirected graph with
 * nonnegative edge weights whose boundary vertices carry party labels.
 * Labels: 0 = bulk vertex, 1 .. n = party, n + 1 = purifier O.  The
 * entropy of a non-empty subset I of the n parties is the minimum weight
 * of a cut that separates the vertices labelled in I from every other
 * boundary vertex (the other parties and O).  The vector follows the
 * order of holent_ineq.h: s[k - 1] = S(subset k), bit j-1 of k = party j,
 * k = 1 .. 2^n - 1.  Without an O vertex the n parties are in a pure
 * state (S(all parties) = 0 cut).
 *
 * Maximum flow by Dinic's blocking flows (levels from every source vertex
 * at once, any sink vertex ends a path), no super-terminals.  The value
 * reported is the weight of the cut itself, a sum of input weights, so it
 * is exact to rounding for rational weights.  The cut kept is the
 * smallest source side: the vertices reachable from the I vertices in the
 * final residual graph (the smallest homology region).  */
#ifndef HOLENT_MINCUT_H
#define HOLENT_MINCUT_H

#include <stddef.h>
#include <stdint.h>
#include "holent.h"

/* Largest number of parties (2^n - 1 cuts).  */
#define HOLENT_MINCUT_NMAX 16

typedef struct holent_mincut_workspace holent_mincut_workspace;

/* Workspace for graphs with up to nv vertices and ne edges; NULL when
   out of memory or nv, ne too large for the index type.  */
holent_mincut_workspace *holent_mincut_workspace_alloc (size_t nv,
                                                        size_t ne);
void holent_mincut_workspace_free (holent_mincut_workspace *w);

/* Check a graph: tail[e], head[e] < nv (0-based), w[e] finite >= 0
   (EINVAL for NaN, EDOM for negative or infinite), label[v] in 0 .. n + 1
   (EDOM), every party 1 .. n labels at least one vertex (EEMPTY), n in
   1 .. HOLENT_MINCUT_NMAX (EDOM / ETOOBIG).  *bad = the offending index
   (edge, vertex or party - 1) or (size_t) -1.  */
int holent_mincut_check (size_t nv, size_t ne, const size_t *tail,
                         const size_t *head, const double *w,
                         const int *label, unsigned n, size_t *bad);

/* The minimum cut separating the vertices whose label is in the party
   mask src (bit j-1 = party j) from the other boundary vertices:
   *value, and when side != NULL side[v] = 1 for the vertices of the
   smallest source side, 0 otherwise.  The graph must pass
   holent_mincut_check (not repeated here).  */
int holent_mincut_cut (size_t nv, size_t ne, const size_t *tail,
                       const size_t *head, const double *w,
                       const int *label, unsigned n, uint32_t src,
                       double *value, unsigned char *side,
                       holent_mincut_workspace *ws);

/* The whole entropy vector s[0 .. 2^n - 2]; when cuts != NULL,
   cuts[(k - 1) * nv + v] = side of vertex v for subset k.  Checks the
   graph first (holent_mincut_check, *bad as there).  poll (NULL: never
   interrupted) is called once per cut; HOLENT_EINTR when it asks to
   stop.  */
int holent_mincut_entropy (size_t nv, size_t ne, const size_t *tail,
                           const size_t *head, const double *w,
                           const int *label, unsigned n, double *s,
                           unsigned char *cuts, size_t *bad,
                           holent_mincut_workspace *ws,
                           const holent_poll *poll);

#endif /* HOLENT_MINCUT_H */
