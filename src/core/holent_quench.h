/* holent_quench.h: global quench in AdS3, the thin-shell Vaidya geometry:
 * a null shell sent in from the boundary at t = 0 turns the vacuum
 * (Poincare on a line, global AdS on a circle) into the BTZ black hole of
 * inverse temperature beta.  Geodesic lengths by matching the vacuum and
 * BTZ geodesics across the shell (refraction; Balasubramanian et al.
 * 2011, PRD 84, 026010; Abajo-Arrastia, Aparicio and Lopez 2010, JHEP 11
 * (2010) 149).  Derivation: doc/quench.md.
 *
 * For an interval (arc) l at boundary time t, with R t = 2 pi t/beta,
 * S = sinh(R t), C = cosh(R t):
 *   t <= 0:       the vacuum length;
 *   t >= l/2:     the BTZ length (saturation);
 *   0 < t < l/2:  len = 2 log( (beta/(pi eps)) S cosh(eta) ), eta > 0
 *                 from the crossing point of the shell:
 *     line:   asinh(S e^-eta) + (C - sqrt(1 + S^2 e^-2eta)) e^eta/S
 *               = pi l/beta;
 *     circle: the half-angle phi of the crossing solves
 *               C - cosh(a) - (L/beta) tan(phi) sinh(a) = 0,
 *               a = (L/beta)(pi l/L - phi),
 *             and e^-eta = sinh(a)/(S cos(phi)).
 * The state is pure on the circle: S(A) = S(A^c), no horizon term.
 *
 * Copyright (C) 2026 The holent developers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_QUENCH_H
#define HOLENT_QUENCH_H

#include <stddef.h>
#include "holent.h"
#include "holent_geo.h"
#include "holent_region.h"
#include "holent_rt.h"
#include "holent_tfd.h"

typedef struct
{
  holent_geo_bg vac;   /* before the shell: Poincare or global AdS   */
  holent_geo_bg bh;    /* after: planar BTZ or BTZ                   */
  double beta;
} holent_quench_bg;

/* HOLENT_EINVAL for NaN, HOLENT_EDOM for values out of range.  */
int holent_quench_init (holent_quench_bg *q, int circle, double L,
                        double eps, double beta, double c);

/* The constructor: every parameter checked as for the thermofield
   double of the final state (holent_tfd_make without a shock; err names
   the argument), then holent_quench_init.  */
int holent_quench_make (holent_quench_bg *q, int circle, double L,
                        double eps, double beta, double c, double ell,
                        holent_err *err);

/* Regulated length of the geodesic over an interval (line) or arc
 * (circle; the shorter of l and L - l is used: it gives the smaller
 * length) of length l at boundary time t.  *eta (if not NULL) receives
 * eta of the crossing (0 when the geodesic does not cross the shell, -1
 * before the quench).  HOLENT_EDOM for l outside (0, Inf) (line) or
 * (0, L) (circle), HOLENT_EINVAL for non-finite t, HOLENT_ENOCONV if the
 * crossing equation fails (never seen).  */
int holent_quench_length (const holent_quench_bg *q, double l, double t,
                          double *len, double *eta);

/* Where the geodesic of holent_quench_length crosses the shell v = 0:
 * at the bulk points (v = 0, r = *rc, xm -+ *xc), xm the interval's
 * centre, *xc in bulk units (boundary units on a line, an angle on a
 * circle, for the shorter arc), with *eta as there; *xc = *rc = 0 when it
 * does not cross (*eta 0 or -1).  Statuses as holent_quench_length.  */
int holent_quench_crossing (const holent_quench_bg *q, double l, double t,
                            double *eta, double *xc, double *rc);

/* The same for the boundary points x1, x2 (their distance; on a circle
   modulo L, the shorter arc): HOLENT_ECOINCIDE when they coincide.  */
int holent_quench_points_length (const holent_quench_bg *q, double x1,
                                 double x2, double t, double *len);

/* RT entropy of a region (holent_region_set on the boundary of q) at
   time t: the exact minimum over the non-crossing pairings, each
   geodesic with the quench length.  pairs/arcs as holent_rt_entropy.  */
int holent_quench_entropy (holent_rt_workspace *w, const holent_quench_bg *q,
                           const holent_region *r, double t,
                           holent_rt_result *res, size_t *pairs,
                           double *arcs);

/* A scan over many times of the same region: each chord's static
   lengths (before the quench, after saturation) are computed once and
   the crossing of the previous time starts the next one's root search.
   Holds regions of up to nmax intervals (2 nmax^2 chords);
   nmax <= HOLENT_QUENCH_SCAN_NMAX, else NULL.  */
#define HOLENT_QUENCH_SCAN_NMAX 512
typedef struct holent_quench_scan holent_quench_scan;
holent_quench_scan *holent_quench_scan_alloc (size_t nmax);
void holent_quench_scan_free (holent_quench_scan *s);

/* holent_quench_entropy with the scan's memory (scan may be NULL; a
   region larger than the scan holds is computed without it): the same
   result to rounding.  */
int holent_quench_entropy_scan (holent_rt_workspace *w,
                                const holent_quench_bg *q,
                                const holent_region *r, double t,
                                holent_quench_scan *scan,
                                holent_rt_result *res, size_t *pairs,
                                double *arcs);

#endif /* HOLENT_QUENCH_H */
