/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_contract.h: proofs of holographic entropy inequalities by
 * contraction maps (Bao, Nezami, Ooguri, Stoica, Sully and Walter 2015,
 * JHEP 09 (2015) 130, arXiv:1505.07839, Theorem on proofs by
 * contraction, from memory).
 *
 * The inequality  sum_{l<L} a_l S(I_l) >= sum_{r<R} b_r S(J_r)  on n
 * parties (I_l, J_r non-empty party masks, bit j-1 = party j; a_l, b_r >
 * 0) holds for every graph model, hence every holographic state, when
 * there is a map f: {0,1}^L -> {0,1}^R with
 *   (i)  f(x^(i)) = y^(i) for every party i = 1 .. n and the purifier,
 *        x^(i)_l = [i in I_l], y^(i)_r = [i in J_r], x^(O) = 0, y^(O) = 0;
 *   (ii) |f(x) - f(x')|_b <= |x - x'|_a for all x, x' (weighted Hamming
 *        distances, |z|_a = sum of a_l over the bits set in z).
 * Points are stored as integers (bit l = term l); f is an array of 2^L
 * integers < 2^R.
 *
 * (ii) needs checking on hypercube edges only: |.|_a is the path metric
 * of the hypercube with edge weights a_l, so the triangle inequality of
 * |.|_b along a shortest path gives (ii) for all pairs.
 *
 * Search: each point starts with the candidates allowed by (ii) against
 * the boundary points, |y - y^(i)|_b <= |x - x^(i)|_a for every i; the
 * edge constraints are kept arc consistent (AC-3) and a depth-first
 * search assigns the point with the fewest candidates first, restoring
 * the candidate sets from a trail on backtracking.  A search that ends
 * without a map proves that no contraction map exists; it says nothing
 * about the validity of the inequality (contraction is sufficient, not
 * known to be necessary).  */
#ifndef HOLENT_CONTRACT_H
#define HOLENT_CONTRACT_H

#include <stddef.h>
#include <stdint.h>
#include "holent.h"

#define HOLENT_CONTRACT_NMAX 16   /* parties */
#define HOLENT_CONTRACT_LMAX 20   /* terms on the larger side */
#define HOLENT_CONTRACT_RMAX 24   /* terms on the smaller side */
#define HOLENT_CONTRACT_BITS 28   /* L + R: 2^(L+R) bits of candidates */

typedef struct
{
  int found;          /* 1 map found, 0 none exists, -1 node limit hit  */
  int conflict;       /* 1: two boundary conditions already violate (ii) */
  unsigned conflict_i, conflict_j;  /* those parties (n = purifier)     */
  double nodes;       /* candidate values tried in the depth-first search */
  double backtracks;  /* candidates rejected after propagation            */
  double log2_initial;/* log2 of the product of the candidate-set sizes
                         after the boundary filter and the first AC-3 */
  double forced;      /* points with one candidate at that stage         */
} holent_contract_stats;

typedef struct holent_contract_workspace holent_contract_workspace;

/* Workspace for L terms on the left and R on the right; NULL when out of
   memory or beyond the limits above.  */
holent_contract_workspace *holent_contract_workspace_alloc (unsigned nl,
                                                            unsigned nr);
void holent_contract_workspace_free (holent_contract_workspace *w);

/* Search for a contraction map.  max_nodes > 0 bounds the search (then
   found = -1).  f (2^L entries) receives the map when found = 1.
   EINVAL for NULL or NaN, EDOM for a bad mask or weight or n, ETOOBIG
   beyond the limits.  poll (NULL: never interrupted) is called every 64
   points of the candidate set-up, every 4096 points the propagation
   revises and every 64 search nodes (done = nodes, total = max_nodes or
   0); HOLENT_EINTR when it asks to stop.  */
int holent_contract_prove (unsigned n, unsigned nl, const uint32_t *lmask,
                           const double *a, unsigned nr,
                           const uint32_t *rmask, const double *b,
                           double max_nodes, uint32_t *f,
                           holent_contract_stats *st,
                           holent_contract_workspace *ws,
                           const holent_poll *poll);

/* Independent checker of a certificate f: *ok = 1 when (i) and (ii)
   hold.  Otherwise *bad_x is a failing point and *bad_l the failing
   edge direction (or (unsigned) -1 for a boundary condition, the party
   in *bad_l's place being reported as *bad_x = x^(i)).  Values in f must
   be < 2^R (EDOM otherwise).  */
int holent_contract_check (unsigned n, unsigned nl, const uint32_t *lmask,
                           const double *a, unsigned nr,
                           const uint32_t *rmask, const double *b,
                           const uint32_t *f, int *ok, uint32_t *bad_x,
                           unsigned *bad_l);

#endif /* HOLENT_CONTRACT_H */
