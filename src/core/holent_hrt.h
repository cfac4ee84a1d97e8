/* holent_hrt.h: covariant (HRT) geodesic lengths between boundary points
 * at different times in the eight AdS3 bulks, the timelike branch, and
 * the exact minimisation over region sets whose endpoints carry times.
 *
 * The length between (x1, t1) and (x2, t2) on the geodesic over a boundary
 * arc of signed extent s (the class) with dt = t2 - t1 is, from the
 * embedding-space distance (doc/hrt_time.md):
 *   line, vacuum:     -2 log eps + log((s - dt)(s + dt))
 *   BTZ family:       log(bL bR/(pi^2 eps^2)) + log sinh(pi(s - dt)/bL)
 *                                             + log sinh(pi(s + dt)/bR)
 *   global/thermal:   2 log(L/(pi eps)) + log sin(pi(s-dt)/L) sin(pi(s+dt)/L)
 *   conical defect:   the same with L -> L/alpha, capped where the class
 *                     has no geodesic: 2 log(L/(pi alpha eps)) +
 *                     2 log cos(pi alpha dt/L)
 * (s, dt flipped together for the negative class).  Endpoints must be
 * spacelike on the boundary: |dt| < |s| on a line, |dt| < the circle
 * distance on a circle; otherwise HOLENT_ETIMELIKE, or, when asked, the
 * timelike entanglement branch (Doi, Harper, Mollabashi, Takayanagi and
 * Taki 2023, PRL 130, 031601): the same expression with log of a negative
 * product read as log|.| + i pi.
 *
 * Copyright (C) 2026 The holent developers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_HRT_H
#define HOLENT_HRT_H

#include <stddef.h>
#include "holent.h"
#include "holent_geo.h"
#include "holent_region.h"
#include "holent_rt.h"

/* 1 when (x1, t1) and (x2, t2) are spacelike separated on the boundary of
   bg (strictly: null is not spacelike).  */
int holent_hrt_spacelike (const holent_geo_bg *bg, double x1, double t1,
                          double x2, double t2);

/* Regulated length over the geodesic of class cls (ignored on a line).
 * *re is the length; *im is 0, or pi on the timelike branch (only when
 * timelike != 0).  Returns HOLENT_EINVAL for NULL or non-finite input,
 * HOLENT_ECOINCIDE for coincident points, HOLENT_ETIMELIKE for a causal
 * pair (always for a null pair, and when the timelike branch has no
 * value: a causal pair whose product is positive, or a capped class of
 * the conical defect), HOLENT_EDOM for a class without a geodesic.  */
int holent_hrt_length (const holent_geo_bg *bg, double x1, double t1,
                       double x2, double t2, holent_geo_class cls,
                       int timelike, double *re, double *im);

/* Timelike entanglement entropy of the interval from (0, t) to (l, t +
 * dt) (Doi, Harper, Mollabashi, Takayanagi and Taki 2023): when the
 * endpoints are causally related, S = (c/6)(re + i im) of the one
 * geodesic of class positive and *causal = 1; otherwise *causal = 0 and
 * S is left alone (the HRT entropy applies).  Statuses as
 * holent_hrt_length with timelike on.  */
int holent_hrt_timelike_entropy (const holent_geo_bg *bg, double l, double t,
                                 double dt, double *S_re, double *S_im,
                                 int *causal);

/* Vectorised; im may be NULL when timelike == 0.  On failure *bad is the
   first offending index.  */
int holent_hrt_lengths (const holent_geo_bg *bg, size_t n, const double *x1,
                        const double *t1, const double *x2,
                        const double *t2, holent_geo_class cls,
                        int timelike, double *re, double *im, size_t *bad);

/* The times of the 2 r->n sorted endpoints r->pts of a region made by
 * holent_region_set from nin rows with start times ts[] and end times
 * te[].  Touching rows are merged by the region module, and a merged
 * endpoint has no single time: HOLENT_EOVERLAP (bad = a row of the merged
 * interval) when r->n != nin.  Times must be finite (HOLENT_EINVAL).  */
int holent_hrt_region_times (const holent_region *r, size_t nin,
                             const double *ts, const double *te,
                             double *tp, size_t *bad);

/* HRT entropy of a region with endpoint times tp (from
 * holent_hrt_region_times): the exact minimum over the candidates of
 * holent_rt_entropy, each geodesic with the covariant length.  Every pair
 * of endpoints must be spacelike (HOLENT_ETIMELIKE, *bad_i < *bad_j the
 * offending sorted endpoints).  pairs/arcs as in holent_rt_entropy.  */
int holent_hrt_entropy (holent_rt_workspace *w, const holent_geo_bg *bg,
                        const holent_region *r, const double *tp,
                        holent_rt_result *res, size_t *pairs, double *arcs,
                        size_t *bad_i, size_t *bad_j);

#endif /* HOLENT_HRT_H */
