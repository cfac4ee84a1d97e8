/* holent_causal.h: bulk causality in the AdS3 backgrounds.  A null
 * geodesic sent into the bulk from the boundary point x1 at t = 0 first
 * returns to the boundary where and when?  Derivation: doc/bulk_causality.md.
 *
 *   Poincare, planar BTZ (rotating or not), BTZ on a circle: no null
 *     geodesic that leaves the boundary comes back (Poincare: straight
 *     lines of the conformally flat half space; BTZ: J^2 f/r^2 < J^2, so
 *     every ray without a turning point falls through the horizon, and a
 *     turning point bounds the ray inside it): Inf.
 *   global AdS, thermal AdS: every ray reaches the antipode at t = L/2.
 *   conical defect (alpha < 1): every ray not through the apex reaches
 *     x1 +- L/(2 alpha) (the sign: the side it passes the apex on) at
 *     t = L/(2 alpha), later than the boundary light (Gao and Wald 2000,
 *     Class. Quant. Grav. 17, 4999).
 *
 * Copyright (C) 2026 The holent developers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_CAUSAL_H
#define HOLENT_CAUSAL_H

#include "holent.h"
#include "holent_geo.h"

/* *t_bulk: the first-return time of a bulk null ray from x1 landing at x2
 * (Inf when none lands there); *t_bdy: the boundary light time, |x2 - x1|
 * on a line, the circle distance on a circle.  x2 counts as a landing
 * point when within tol of it on the circle; a negative tol means the
 * default, 1e-9 times the circumference.  HOLENT_EINVAL for non-finite
 * input.  */
int holent_causal_times (const holent_geo_bg *bg, double x1, double x2,
                         double tol, double *t_bulk, double *t_bdy);

#endif /* HOLENT_CAUSAL_H */
