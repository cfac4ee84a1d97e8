/* holent_ball.h: Ryu-Takayanagi surfaces of balls in planar AdS_{d+1}
 * backgrounds (holent_hd_bg.h): the profile is shot from its tip with
 * an ODE solver (along the horizon in log(zh - z) for tips next to it),
 * the tip depth found by inversion of the radius (holent_hd_size.h).
 * Derivations: doc/higher_dimensional.md.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_BALL_H
#define HOLENT_BALL_H

#include <stddef.h>
#include "holent_hd_bg.h"

typedef struct holent_ball_workspace holent_ball_workspace;

holent_ball_workspace *holent_ball_workspace_alloc (void);
void holent_ball_workspace_free (holent_ball_workspace *w);

/* Long batches poll POLL (may be NULL: never interrupted) once per
   radius and return HOLENT_EINTR when it asks to stop.  */
void holent_ball_workspace_set_poll (holent_ball_workspace *w,
                                     const holent_poll *poll);

/* Balls need d >= 3: EDOM with the reason in E (may be NULL; arg 0, the
 * background) for d = 2, where a ball is an interval (a strip).  */
int holent_ball_check (const holent_hd_bg *bg, holent_err *e);

/* Balls of radii R[i]: S at the cutoff, fin (every divergent term of the
 * hemisphere, and for even d its log(R/eps), removed), delta = fin -
 * (vacuum fin), ztip = depth of the tip.  Any output but S may be NULL.
 * EDOM with *bad = i when R[i] <= 0 or beyond the largest reachable
 * radius (*reach, may be NULL); ERANGE with *bad = i when an entropy
 * is out of double range; EINTR when the workspace's poll asks to stop.  */
int holent_ball_entropy (const holent_hd_bg *bg, holent_ball_workspace *w,
                         size_t n, const double *R, double *S, double *fin,
                         double *delta, double *ztip, size_t *bad,
                         double *reach);

/* Accuracy of the finite parts fin[i] that the data of a tabulated f
 * allow (as holent_strip_accuracy).  */
int holent_ball_accuracy (const holent_hd_bg *bg, holent_ball_workspace *w,
                          size_t n, const double *R, const double *fin,
                          double *acc);

/* The hemisphere's constant C_d (finite part per ell^(d-1)
 * Omega_{d-2}/(4G)).  */
double holent_ball_vacuum_c (int d);

#endif /* HOLENT_BALL_H */
