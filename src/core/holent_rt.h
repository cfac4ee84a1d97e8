/* holent_rt.h: Ryu-Takayanagi entropy of a region made of many boundary
 * intervals, minimised exactly over every RT candidate by dynamic
 * programming over arcs of the sorted endpoints.
 *
 * Candidates (doc/rt_regions.md):
 *   line (Poincare, planar BTZ):  the non-crossing pairings of the 2n
 *     endpoints, one geodesic per pair; Catalan(n) candidates.
 *   circle, global AdS or thermal AdS:  the same; each geodesic is the
 *     unique one between its endpoints; Catalan(n) candidates.
 *   circle with a horizon (BTZ, rotating BTZ):  a pairing and the face of
 *     its chord diagram that holds the horizon; each geodesic runs round
 *     the side away from that face, and S_BH is added when the face lies
 *     in A.  So S(A) = min(Sigma(A), Sigma(A^c) + S_BH), Sigma(X) the best
 *     candidate whose horizon face lies outside X.  A pairing of 2n points
 *     has n + 1 faces: binom(2n, n) candidates.
 *   circle with a conical defect:  a pairing and the face holding the
 *     defect, nothing added; binom(2n, n) candidates (alpha = 1 is global
 *     AdS: Catalan(n)).
 *   the whole circle:  S_BH (0 without a horizon); one candidate.
 *
 * Cost: O(N^3) time with N = 2n (about N^3/24 additions on a line and in
 * global or thermal AdS, N^3/6 over two turns of the circle with a horizon
 * or a defect), O(N^2) memory in a caller-owned workspace (about 12 N^2
 * bytes).  GPL-3.0-or-later.  */
#ifndef HOLENT_RT_H
#define HOLENT_RT_H

#include <stddef.h>
#include "holent.h"
#include "holent_geo.h"
#include "holent_region.h"

/* Largest number of intervals (after merging) the minimiser accepts:
   the workspace then holds about 12 N^2 bytes, N = 2n (800 MB).  */
#define HOLENT_RT_NMAX ((size_t) 4096)

typedef struct holent_rt_workspace holent_rt_workspace;

/* Workspace for regions of up to nmax intervals; NULL when nmax is 0 or
   above HOLENT_RT_NMAX, or on allocation failure.  */
holent_rt_workspace *holent_rt_alloc (size_t nmax);
void holent_rt_free (holent_rt_workspace *w);

typedef struct
{
  double S;              /* entropy, (c/6) length (+ S_BH)                 */
  double length;         /* regulated length of the geodesics, ell = 1    */
  int horizon;           /* 1: the horizon is part of the surface         */
  size_t m;              /* number of geodesics (n; 0 for the whole circle) */
  double candidates;     /* candidates the minimum was taken over: exact
                            below 2^53, rounded above, Inf above DBL_MAX  */
  double log_candidates; /* its natural logarithm (always finite)         */
  size_t n_short;        /* boundary segments (intervals and gaps) not
                            longer than twice the cutoff                  */
} holent_rt_result;

/* Minimise over the candidates of the region r (from holent_region_set
 * with the circle flag and circumference of bg).  On success *res is set;
 * pairs (if non-NULL, 2 r->n entries) receives the minimiser as index
 * pairs (pairs[2k] < pairs[2k+1]) into r->pts, sorted by first index;
 * arcs (if non-NULL, r->n entries) the length of the boundary arc each
 * geodesic subtends (the one whose geodesic it is: away from the horizon
 * or defect face; in global and thermal AdS, where both arcs give the
 * same geodesic, the shorter one).  Ties go to the candidate without the
 * horizon, then to the first cut in the sorted order.
 * Returns HOLENT_EINVAL for NULL pointers or a region that does not
 * belong to bg (line/circle, circumference), HOLENT_EEMPTY for a region
 * that was never set successfully, HOLENT_ETOOBIG when r->n exceeds the
 * workspace, and the status of holent_geo_arc_length when a geodesic
 * length cannot be had (only for regions not made by holent_region_set,
 * e.g. coincident endpoints).  */
int holent_rt_entropy (holent_rt_workspace *w, const holent_geo_bg *bg,
                       const holent_region *r, holent_rt_result *res,
                       size_t *pairs, double *arcs);

/* The number of candidates for n intervals in bg (see above), and its
   logarithm; n = 0 stands for the whole circle.  */
int holent_rt_count (const holent_geo_bg *bg, size_t n, double *count,
                     double *log_count);

#endif /* HOLENT_RT_H */
