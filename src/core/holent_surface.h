/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_surface.h: RT surfaces as curves, for pictures and checks.
 *
 * AdS3 (constant-time slice; doc/surfaces.md):
 *   picture "half plane" on a line: points (x, z), z the areal coordinate
 *     1/r (the Poincare z in the vacuum, the Fefferman-Graham z of the
 *     static planar BTZ metric (1/z^2)(dz^2/f + dx^2), f = 1 - z^2 r_+^2);
 *   picture "disk" on a circle: points (R cos phi, R sin phi) with
 *     phi = 2 pi x / L and R = r/(1 + sqrt(1 + r^2)), r the areal radius
 *     (circumference 2 pi r); for global and thermal AdS this is the
 *     Poincare disk, where geodesics are circles orthogonal to |w| = 1.
 *     With a conical defect r is the areal radius of the covering global
 *     AdS (r_cov = r/alpha) and the angle is the true one.
 *   Rotating BTZ: the HRT geodesic leaves the t = 0 slice; its points come
 *   with their time t (third coordinate) and are drawn projected.
 * Geodesics are built in the embedding space R^{2,2} as
 *   X(s) = (e^s p + e^-s q)/sqrt(-2 p.q),  s the proper length,
 * p, q the null rays of the endpoints, and mapped back to the picture.
 *
 * Sampling: 32 equal steps in s between the two parameters where the curve
 * comes within tol/16 of the boundary, then every step is halved while the
 * midpoint of the curve is farther than tol (picture units) from the
 * midpoint of the chord (at most 40 halvings); the exact boundary
 * endpoints close the curve.  In the Kruskal picture the distance allowed
 * is tol max(1, |X_K|, |T_K|) at the midpoint: the coordinates grow like
 * e^{2 pi |t|/beta} towards late boundary points.
 *
 * AdS_{d+1} strips and balls: the profile is a geodesic of the conformally
 * flat 2-metric Omega^2 (dr^2 + dz^2/f), Omega = r^{d-2}/z^{d-1} (strip:
 * r^0); in its arc-length parameter with direction angle theta
 *   r' = cos th,  z' = sqrt(f) sin th,
 *   th' = -(d-1) sqrt(f) cos th / z - (d-2) sin th / r,
 * integrated from the turning point (r = 0, th = 0) to the boundary with
 * GSL's rk8pd, steps capped so that the sagitta h^2 |th'|/8 stays below
 * tol.  GPL-3.0-or-later.  */
#ifndef HOLENT_SURFACE_H
#define HOLENT_SURFACE_H

#include <stddef.h>
#include "holent.h"
#include "holent_geo.h"
#include "holent_region.h"
#include "holent_hd_bg.h"
#include "holent_bcft.h"
#include "holent_quench.h"
#include "holent_tfd.h"

/* Smallest sampling tolerance (picture units; for profiles relative to
   the turning point's depth): below it the number of samples explodes.  */
#define HOLENT_SURFACE_TOLMIN 1e-10

/* Largest number of intervals for the runner-up (brute force).  */
#define HOLENT_SURFACE_RUNNER_NMAX ((size_t) 8)

/* A growing list of points: x[i], y[i] in picture coordinates, t[i] the
   boundary time of the point (0 on static slices).  */
typedef struct
{
  size_t n, cap;
  double *x, *y, *t;
} holent_curve;

typedef struct
{
  holent_curve cur;
  /* runner-up enumeration scratch */
  size_t *pairings;       /* all non-crossing pairings, 2n per pairing   */
  size_t npairing, cap_pairing;   /* pairings held; room in entries   */
  size_t *stack;
} holent_surface_workspace;

holent_surface_workspace *holent_surface_workspace_alloc (void);
void holent_surface_workspace_free (holent_surface_workspace *w);

/* Picture kind of a background: 0 half plane (line), 1 disk (circle).  */
int holent_surface_picture (const holent_geo_bg *bg);

/* The geodesic from boundary point x1 to x2 (boundary coordinates) that
 * subtends the arc from x1 to x2 in the positive direction (on a circle
 * 0 < x2 - x1 <= L; on a line x1 != x2), sampled to tol into w->cur
 * (replacing its contents), tol in [TOLMIN, 1].  With a conical defect and
 * alpha (x2 - x1) 2 pi / L >= pi the infimum is the path through the
 * apex: two radial segments (sampled as holent_surface_geodesic_t's).
 * Returns EINVAL/EDOM on bad input, ENOMEM.  */
int holent_surface_geodesic (holent_surface_workspace *w,
                             const holent_geo_bg *bg, double x1, double x2,
                             double tol);

/* The same between boundary points at times t1 and t2 (a boosted
 * interval: the geodesic leaves the constant-time slice; each point
 * carries its boundary time in w->cur.t).  HOLENT_ETIMELIKE unless the
 * endpoints are spacelike separated (in the covering space for the
 * circle bulks).  The path through a defect's apex is the two radial
 * legs meeting at the mean covering time (doc/hrt_time.md), straight in
 * the picture and sampled like a geodesic for their times.  */
int holent_surface_geodesic_t (holent_surface_workspace *w,
                               const holent_geo_bg *bg, double x1, double t1,
                               double x2, double t2, double tol);

/* The geodesic of a region's pair: sorted endpoints xa < xb (boundary
 * coordinates, times ta, tb) joined over the boundary arc ARC (on a
 * circle the forward arc xb - xa or its complement L - (xb - xa), as the
 * minimiser reports it; ignored on a line): holent_surface_geodesic_t
 * from the first endpoint of that arc.  */
int holent_surface_pair (holent_surface_workspace *w,
                         const holent_geo_bg *bg, double xa, double ta,
                         double xb, double tb, double arc, double tol);

/* ---- time-dependent states (doc/surfaces.md) --------------------------
 * Each piece of a surface is a piece of an AdS3 geodesic, built in the
 * embedding space (between two null rays, from a bulk point to a null
 * ray, or between two bulk points) and mapped to the picture.
 *
 * Quench (thin-shell Vaidya): the picture of the vacuum (half plane or
 * disk, areal r as above) with the third coordinate the ingoing
 * Eddington-Finkelstein time v (boundary units; the boundary time at the
 * boundary, the shell at v = 0).  The geodesic of the interval xa < xb
 * (on a circle: over the shorter arc) at boundary time t: for 0 < t <
 * l/2 the BTZ leg from (xa, t) to the shell, the vacuum chord inside the
 * shell (v < 0), the BTZ leg out to (xb, t), the crossings pushed exactly
 * (v = 0) at the points of holent_quench_crossing; for t <= 0 the vacuum
 * geodesic, for t >= l/2 the BTZ one.  */
int holent_surface_quench (holent_surface_workspace *w,
                           const holent_quench_bg *q, double xa, double xb,
                           double t, double tol);

/* Thermofield double: the Kruskal picture (X_K, T_K) = ((v - u)/2,
 * (v + u)/2) of the two-sided BTZ (right boundary X_K = cosh(R t_R),
 * T_K = sinh(R t_R); left X_K = -cosh(R t_L), T_K = sinh(R t_L), both
 * times forward; horizons |X_K| = |T_K|; singularities T_K^2 - X_K^2 = 1)
 * with the third coordinate x (boundary units).  The geodesic from
 * (xa, ta) on side sa (0 left, 1 right) to (xb, tb) on side sb: within a
 * side (on a circle xa < xb joined over ARC, as holent_surface_pair) or
 * through the bridge (on a circle the shortest winding, as
 * holent_tfd_cross_length).  Through a shock (alpha > 0) the bridge
 * geodesic is two BTZ pieces: from the left boundary point to the
 * crossing (u = 0, v + alpha) of holent_tfd_shock_crossing in the left
 * side's coordinates, one row of NaN (the null jump along u = 0, of zero
 * length), from (u = 0, v) in the right side's coordinates to the right
 * boundary point; each piece sampled like the others, its crossing an
 * exact sample with X_K = T_K.  HOLENT_ETIMELIKE for a causal pair on one
 * side, HOLENT_ERANGE when the picture overflows.  */
int holent_surface_tfd (holent_surface_workspace *w, const holent_tfd_bg *b,
                        double xa, double ta, int sa, double xb, double tb,
                        int sb, double arc, double tol);

/* The same with the winding of a geodesic through the bridge given (the
 * minimiser's, holent_tfd_minimiser): on a circle it joins the left point
 * to the image of the right one at lifted separation xR - xL + winding L
 * (doc/tfd_shock.md, section 1).  HOLENT_EDOM for a nonzero winding
 * within a side or on the line.  */
int holent_surface_tfd_winding (holent_surface_workspace *w,
                                const holent_tfd_bg *b, double xa,
                                double ta, int sa, double xb, double tb,
                                int sb, double arc, long winding,
                                double tol);

/* The bifurcation circle (u = v = 0) of the Kruskal picture as two
   points (0, 0, xa), (0, 0, xb).  */
int holent_surface_tfd_horizon (holent_surface_workspace *w,
                                const holent_tfd_bg *b, double xa,
                                double xb);

/* The horizon of a background with one (r = r_+) sampled to tol into
 * w->cur: the circle of radius R_h in the disk (closed: first point
 * repeated last); on a line, the segment z = 1/r_+ for x in [xa, xb].
 * *depth gets R_h or 1/r_+.  EUNSUP without a horizon.  */
int holent_surface_horizon (holent_surface_workspace *w,
                            const holent_geo_bg *bg, double xa, double xb,
                            double tol, double *depth);

/* The best candidate that differs from the minimiser (pairs/arcs of
 * holent_rt_entropy, horizon flag hmin): same candidate set as
 * holent_rt, enumerated by brute force for r->n <= RUNNER_NMAX.
 * pairs (2 n), arcs (n), *horizon and *S receive it.  EDOM when the
 * region has a single candidate, ETOOBIG above RUNNER_NMAX.  */
int holent_surface_runner_up (holent_surface_workspace *w,
                              const holent_geo_bg *bg,
                              const holent_region *r, const size_t *pmin,
                              const double *amin, int hmin, size_t *pairs,
                              double *arcs, int *horizon, double *S);

/* The best candidate other than the minimiser (pairs pmin, sorted by
 * first index) of a two-sided region on the line's thermofield double:
 * every non-crossing pairing of the np endpoints x, t, side in the bridge
 * order of holent_tfd_minimiser (the candidates of holent_tfd_entropy on
 * the line: each pair within a side, holent_tfd_side_length, or through
 * the bridge, holent_tfd_cross_length with the shock), by brute force
 * for np/2 <= RUNNER_NMAX.  pairs (np) and *S (c/6 times the regulated
 * length) receive it.  EUNSUP on a circle, EDOM for a single candidate,
 * ETOOBIG above RUNNER_NMAX.  */
int holent_surface_tfd_runner_up (holent_surface_workspace *w,
                                  const holent_tfd_bg *b, size_t np,
                                  const double *x, const double *t,
                                  const int *side, const size_t *pmin,
                                  size_t *pairs, double *S);

/* The same on a static line with endpoint times (x ascending, times t):
 * every non-crossing pairing, each geodesic the covariant one of
 * holent_hrt_length (the candidates of the time path on a line; the
 * horizon of a line is not compact).  EUNSUP on a circle (its faces and
 * horizon), otherwise as holent_surface_tfd_runner_up.  */
int holent_surface_hrt_runner_up (holent_surface_workspace *w,
                                  const holent_geo_bg *bg, size_t np,
                                  const double *x, const double *t,
                                  const size_t *pmin, size_t *pairs,
                                  double *S);

/* The same for the global quench at time t (holent_quench_entropy's
 * candidates: every non-crossing pairing of the sorted endpoints x, each
 * geodesic with holent_quench_points_length, on a line or a circle).  */
int holent_surface_quench_runner_up (holent_surface_workspace *w,
                                     const holent_quench_bg *q, size_t np,
                                     const double *x, double t,
                                     const size_t *pmin, size_t *pairs,
                                     double *S);

/* Profile of the strip of turning point top = z* (ball = 0) or of the
 * ball of tip depth top (ball = 1), sampled to tol into w->cur as points
 * (x or r, z) from the turning point (0, top) to the boundary (half
 * width or radius, 0).  */
int holent_surface_profile (holent_surface_workspace *w,
                            const holent_hd_bg *bg, int ball, double top,
                            double tol);

/* ---- BCFT: surfaces ending on end-of-the-world branes ----------------
 * Pictures (boundary units, ell = 1): the half plane (x, z) of
 * holent_bcft (z = 1/r, as for a line above) for the half line, the TFD's
 * exterior and the BTZ saddle of an interval; the disk of the doubled
 * interval (circumference 2 length, phi = pi x/length, the Poincare disk)
 * for its thermal AdS saddle.  Geodesics between two boundary points are
 * holent_surface_geodesic's on bg->geo.  A geodesic ending on a brane is
 * the part, from x to its landing point, of the geodesic from x to its
 * mirror image (holent_bcft_mirror), which meets the brane orthogonally:
 * sampled as that geodesic, cut at the first sample beyond the brane, and
 * closed by the exact landing point of holent_bcft_brane_length.  */

/* 1 for the disk picture (thermal AdS saddle of an interval), else 0.  */
int holent_surface_bcft_picture (const holent_bcft_bg *bg);

/* The geodesic from boundary point x to the brane at END, sampled to tol
   into w->cur from (x, 0) (or its disk point) to the landing point.  */
int holent_surface_bcft_brane_geodesic (holent_surface_workspace *w,
                                        const holent_bcft_bg *bg, double x,
                                        int end, double tol);

/* The brane at END sampled to tol into w->cur from its boundary anchor:
   in the half plane down to depth zmax (at most the horizon), in the disk
   the whole brane from x = 0 to x = length (zmax ignored).  */
int holent_surface_bcft_brane (holent_surface_workspace *w,
                               const holent_bcft_bg *bg, int end,
                               double zmax, double tol);

/* Two-sided BCFT (bg a TFD): the geodesic from the boundary point x of
 * side SIDE (0 left, 1 right) at boundary time t to the brane, in the
 * Kruskal picture of holent_surface_tfd ([X_K, T_K, x], both times
 * forward).  The brane is static, so the curve is the one of
 * holent_surface_bcft_brane_geodesic (sampled to tol in the half plane
 * of the exterior) on the slice of Schwarzschild time t, mapped point by
 * point: (x, z) -> (+-q cosh(t/zh), q sinh(t/zh), x),
 * q = sqrt((zh - z)/(zh + z)).  HOLENT_EUNSUP unless bg is a TFD,
 * HOLENT_EINVAL for a NaN or a side other than 0, 1, HOLENT_EDOM for an
 * infinite t, HOLENT_ERANGE when cosh(t/zh) overflows.  */
int holent_surface_bcft_tfd_brane (holent_surface_workspace *w,
                                   const holent_bcft_bg *bg, double x,
                                   double t, int side, double tol);

#endif /* HOLENT_SURFACE_H */
