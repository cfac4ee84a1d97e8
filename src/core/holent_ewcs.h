/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_ewcs.h: entanglement wedge cross section E_W of two disjoint
 * boundary intervals A and B, in closed form, with the two bulk points
 * where the minimal cross section meets the RT geodesics.
 *
 * Supported bulks: Poincare (vacuum on a line), global AdS and thermal
 * AdS (vacuum and the low-temperature saddle on a circle), planar BTZ
 * (thermal line) and planar rotating BTZ (rotating thermal line).  Every
 * one of them is, locally and on the region the wedge lives in, AdS3 with
 * a boundary that is a conformal image of the Poincare line in each
 * chiral half, which is why one formula serves all: with the chord
 * functions g(y) of the background (y, (L/pi) sin(pi y/L),
 * (beta/pi) sinh(pi y/beta)) the cross-ratio of a chiral half is
 *     z = g(l_A) g(l_B) / (g(d_1) g(d_2)),
 * d_1, d_2 the two gaps (on a line d_2 = l_A + d_1 + l_B), and the
 * minimal cross section has length (ell = 1)
 *     asinh(sqrt(z_L)) + asinh(sqrt(z_R)),
 * z_L = z_R = z for the static bulks, i.e. 2 asinh(sqrt z) =
 * log(1 + 2z + 2 sqrt(z (z + 1))) (Takayanagi and Umemoto 2017,
 * arXiv:1708.09393).  Derivation: doc/wedge_cross_section.md.
 *
 * Bulk points are returned as (t, x, r) in the metric
 *     ds^2 = -f dt^2 + dr^2/f + r^2 (dx - (r_+ r_-/r^2) dt)^2,
 *     f = (r^2 - r_+^2)(r^2 - r_-^2)/r^2,
 * x the boundary coordinate, r in inverse boundary length units:
 *   Poincare      r_+ = r_- = 0 (r = 1/z of Poincare z),
 *   global/thermal AdS  r_+^2 = -(2 pi/L)^2, r_- = 0, i.e.
 *                 f = r^2 + (2 pi/L)^2, r = (2 pi/L) sinh(rho),
 *   planar BTZ    r_+ = 2 pi/beta, r_- = 0,
 *   planar rotating BTZ  r_+ = pi (1/beta_L + 1/beta_R),
 *                        r_- = pi (1/beta_L - 1/beta_R).
 * GPL-3.0-or-later.  */
#ifndef HOLENT_EWCS_H
#define HOLENT_EWCS_H

#include "holent.h"
#include "holent_geo.h"

typedef struct
{
  int connected;       /* 1 when the two-interval minimisation picks the
                          connected surface (z_L z_R > 1), else 0         */
  double E;            /* E_W, entropy units: E_connected or 0             */
  double E_connected;  /* (c/6) length of the minimal cross section of the
                          connected wedge, whether or not it dominates    */
  double length;       /* that length, units of ell                        */
  double z_L, z_R;     /* cross-ratios of the chiral halves (beta_L, beta_R;
                          equal in the static bulks)                       */
  double log_z_L, log_z_R;
  double gap[2][2];    /* boundary endpoints of the two geodesics of the
                          connected surface: row 0 from the end of A to the
                          start of B, row 1 from the end of B to the start
                          of A (user coordinates; in [0, L) on a circle)   */
  double point[2][3];  /* (t, x, r) where the minimal cross section meets
                          the geodesic of row 0 and of row 1             */
  double shortest;     /* the shortest of l_A, l_B and the gap(s): the
                          closed forms need it well above the cutoff     */
  double s[2];         /* those points as signed arc length (ell = 1) from
                          the midpoint of each geodesic, towards its first
                          endpoint                                       */
} holent_ewcs_result;

/* E_W of A = [A[0], A[1]] and B = [B[0], B[1]] in bg.  On a line
 * start < end; on a circle an interval runs from start to end in the
 * positive direction modulo L with length in (0, L).  Returns
 *   HOLENT_EINVAL    NULL pointers, NaN or Inf coordinates
 *   HOLENT_EUNSUP    a bulk other than those listed above
 *   HOLENT_EDOM      on a line end < start; on a circle length >= L
 *   HOLENT_EEMPTY    a zero-length interval
 *   HOLENT_EOVERLAP  A and B overlap
 *   HOLENT_ECOINCIDE A and B touch (E_W of adjacent intervals needs the
 *                    cutoff: not returned)
 * Coordinates within 16 DBL_EPSILON max(L, |coordinates|) count as equal,
 * as in holent_region.  */
int holent_ewcs_pair (const holent_geo_bg *bg, const double A[2],
                      const double B[2], holent_ewcs_result *res);

/* The checks of holent_ewcs_pair with the reason in E: E->arg 0 for the
 * background (an unsupported bulk), 1 for A, 2 for B (also for an
 * overlap or a contact of the two, the reason then names both); NaN gives
 * HOLENT_ENAN, Inf HOLENT_EDOM.  Returns E's status (0 when the pair is
 * valid).  */
int holent_ewcs_check (const holent_geo_bg *bg, const double A[2],
                       const double B[2], holent_err *e);

/* The point at signed arc length s from the midpoint of the RT geodesic of
 * the t = 0 boundary points xP and xQ (towards xP), as (t, x, r) above.
 * On a circle the geodesic is the one of global AdS.  Returns
 * HOLENT_EINVAL (NULL, NaN/Inf), HOLENT_EUNSUP (bulk), HOLENT_ECOINCIDE
 * (xP = xQ, modulo L on a circle).  */
int holent_ewcs_geodesic_point (const holent_geo_bg *bg, double xP,
                                double xQ, double s, double out[3]);

/* asinh(sqrt(exp(lz))) for any real lz without overflow.  */
double holent_ewcs_asinh_sqrt_exp (double lz);

#endif /* HOLENT_EWCS_H */
