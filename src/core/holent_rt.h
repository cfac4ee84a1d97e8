/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_rt.h: Ryu-Takayanagi entropy of a region made of many boundary
 * intervals, minimised over every RT candidate without enumerating them.
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
 * Two minimisers over the same candidates (doc/rt_fast.md):
 *   fast (the default for every static AdS3 bulk, whose geodesic length is
 *     a concave function of the boundary arc it spans):  a sweep over the
 *     right end of every run that keeps, for each left end, one partner;
 *     O(N^2) time (N^2/4 steps on a line, 3N^2/4 on a circle with a
 *     horizon or a defect), O(N) memory, no cap on n.  Exact for strictly
 *     concave lengths (proof in doc/rt_fast.md); for the conical defect
 *     past its cap verified against the DP, not proven.
 *   dp (exact; the general path and the oracle of the tests):  the
 *     interval dynamic programme, O(N^3) time (N^3/24 additions on a line and in
 *     global or thermal AdS, N^3/6 with a horizon or a defect), O(N^2)
 *     memory (about 12 N^2 bytes), n <= HOLENT_RT_NMAX.
 * N = 2n.  GPL-3.0-or-later.  */
#ifndef HOLENT_RT_H
#define HOLENT_RT_H

#include <stddef.h>
#include "holent.h"
#include "holent_geo.h"
#include "holent_region.h"

/* Largest number of intervals (after merging) the cubic DP accepts: its
   tables then hold about 12 N^2 bytes, N = 2n (800 MB).  The fast path
   has no such cap.  */
#define HOLENT_RT_NMAX ((size_t) 4096)

typedef struct holent_rt_workspace holent_rt_workspace;

typedef enum
{
  HOLENT_RT_AUTO = 0,  /* fast when the length is concave in the arc     */
  HOLENT_RT_DP = 1,    /* the cubic DP (needs holent_rt_workspace_alloc_dp)        */
  HOLENT_RT_FAST = 2   /* the sweep (HOLENT_EUNSUP for other costs)      */
} holent_rt_method;

/* Workspace for regions of up to nmax intervals, O(nmax) bytes, fast path
   only; NULL when nmax is 0 or on allocation failure.  */
holent_rt_workspace *holent_rt_workspace_alloc (size_t nmax);
/* The same plus the tables of the cubic DP; NULL also when nmax exceeds
   HOLENT_RT_NMAX.  */
holent_rt_workspace *holent_rt_workspace_alloc_dp (size_t nmax);
void holent_rt_workspace_free (holent_rt_workspace *w);

/* The minimisers of w call poll->fn (poll->ctx, done, total) about every
   1e5 elementary steps (done and total in those steps) and return
   HOLENT_EINTR when it returns nonzero; NULL (the default): never.  */
int holent_rt_set_poll (holent_rt_workspace *w, const holent_poll *poll);

/* Lower (never raise) the number of partner changes the fast path logs
   for unwinding its minimiser (8 N + 64 by default, a few per point are
   used in practice); past it, the unwinding sweeps sub-runs again.  For
   tests of that path.  */
int holent_rt_set_log_capacity (holent_rt_workspace *w, size_t records);

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
 * Both methods give the same minimum (the sums are formed in the same
 * order from the same lengths) and, without ties, the same minimiser.
 * Returns HOLENT_EINVAL for NULL pointers, an unknown method or a region
 * that does not belong to bg (line/circle, circumference), HOLENT_EEMPTY
 * for a region that was never set successfully, HOLENT_ETOOBIG when r->n
 * exceeds the workspace (or the DP was asked of a workspace without its
 * tables), HOLENT_EUNSUP for the fast method on a cost it does not
 * cover, and HOLENT_EDOM (HOLENT_EINVAL for NaN) when the endpoints are
 * not strictly increasing within one turn (only for regions not made by
 * holent_region_set, e.g. coincident endpoints).  */
int holent_rt_entropy_method (holent_rt_workspace *w,
                              const holent_geo_bg *bg,
                              const holent_region *r,
                              holent_rt_method method,
                              holent_rt_result *res, size_t *pairs,
                              double *arcs);

/* holent_rt_entropy_method with HOLENT_RT_AUTO.  */
int holent_rt_entropy (holent_rt_workspace *w, const holent_geo_bg *bg,
                       const holent_region *r, holent_rt_result *res,
                       size_t *pairs, double *arcs);

/* Geodesic lengths supplied by the caller (time-dependent states, issue
 * 12): *len for the geodesic from sorted endpoint i to sorted endpoint j
 * (0 <= i, j < 2 r->n) over the boundary arc of length arc that runs from
 * i to j in the positive sense (on a circle it may pass through 0).  A
 * nonzero return is passed on as the status.  Called from several
 * threads at once: no shared mutable state.  */
typedef int (*holent_rt_cost) (void *ctx, size_t i, size_t j, double arc,
                               double *len);

/* holent_rt_entropy with the lengths of cost, by the cubic DP (the
   workspace must come from holent_rt_workspace_alloc_dp); the candidates, S_BH and
   the result are as there.  HOLENT_EINVAL for cost == NULL.  */
int holent_rt_entropy_cost (holent_rt_workspace *w, const holent_geo_bg *bg,
                            const holent_region *r, holent_rt_cost cost,
                            void *ctx, holent_rt_result *res, size_t *pairs,
                            double *arcs);

/* The number of candidates for n intervals in bg (see above), and its
   logarithm; n = 0 stands for the whole circle.  */
int holent_rt_count (const holent_geo_bg *bg, size_t n, double *count,
                     double *log_count);

/* ---- Many regions, on OpenMP threads (one loop, serial or parallel).  */
typedef struct holent_rt_batch holent_rt_batch;

/* For nreg regions: per-thread regions (up to maxrows rows) and
   workspaces (up to nmax merged intervals; with the DP's tables when dp),
   one set unless nreg is large enough to be spread over threads; NULL on
   bad sizes or allocation failure.  */
holent_rt_batch *holent_rt_batch_alloc (size_t nreg, size_t maxrows,
                                        size_t nmax, int dp);
void holent_rt_batch_free (holent_rt_batch *b);

typedef struct
{
  size_t rows;               /* rows of the region as given             */
  const double *start, *end; /* rows entries each                        */
} holent_rt_input;

/* Per region, filled when configurations are asked for; the pointers are
   the caller's, sized by the region's rows m: pairs 2m, arcs m, pts 2m,
   start and len m each (the merged region's endpoints and intervals, as
   in holent_region).  */
typedef struct
{
  holent_rt_result res;
  size_t *pairs;
  double *arcs, *pts, *start, *len;
  size_t n;    /* merged intervals */
  int whole;
} holent_rt_conf;

/* S[k] for the regions in[0..nreg-1] of bg (and conf[k] if conf is not
   NULL); *n_short (if non-NULL) sums res.n_short.  The regions are spread
   over threads when there are at least 16 (a single large region keeps
   both threads for its own sweep).  On failure returns the status
   of the first failing region in order (holent_region_set's or
   holent_rt_entropy_method's; HOLENT_ETOOBIG when it has more rows than
   the batch was made for) and sets *failed (if non-NULL) to its index;
   the other entries are then unspecified.  poll (NULL: never) is called
   once per region done (done = regions done, total = nreg) and, below 16
   regions, inside each minimiser too; when it asks to stop, the regions
   not yet started are skipped and HOLENT_EINTR is returned (*failed: a
   region that was stopped or not started).  */
int holent_rt_batch_run (holent_rt_batch *b, const holent_geo_bg *bg,
                         holent_rt_method method, size_t nreg,
                         const holent_rt_input *in, double *S,
                         double *n_short, holent_rt_conf *conf,
                         size_t *failed, const holent_poll *poll);

#endif /* HOLENT_RT_H */
