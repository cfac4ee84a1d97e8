/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_transition.h: parameter values where the RT minimiser (or the
 * dominant saddle) changes, by bracketing root finding (GSL Brent) on the
 * exact difference of the two competing configurations.
 *
 *   plateau      BTZ circle: the interval length l* in (L/2, L) beyond
 *                which the complement's geodesic plus the horizon wins:
 *                len(l) - len(L - l) - 6 S_BH / c = 0.
 *   separation   two intervals [0, l1], [l1 + d, l1 + d + l2]: the gap d*
 *                beyond which the disconnected pair wins (mutual
 *                information and entanglement wedge disconnect):
 *                len(d) + len(l1 + d + l2) - len(l1) - len(l2) = 0.
 *   hawking_page the temperature at which BTZ and thermal AdS have equal
 *                free energies at fixed Omega on a circle of length L.
 *   strip_pair   two parallel strips of widths l1, l2 in AdS_{d+1}: the
 *                separation s* beyond which the disconnected surface wins.
 * Each returns the root, the value of the difference at the root, and
 * HOLENT_EDOM when the bracket does not exist (no transition: *x = NaN,
 * status SUCCESS with *found = 0).  See doc/transitions.md.  */
#ifndef HOLENT_TRANSITION_H
#define HOLENT_TRANSITION_H

#include "holent.h"
#include "holent_geo.h"
#include "holent_hd_bg.h"
#include "holent_strip.h"

/* Result of one search: found = 0 means no transition in the allowed
   range (x is NaN then).  */
typedef struct
{
  double x;        /* the transition point                               */
  double lo, hi;   /* final bracket                                      */
  int found;
} holent_transition_result;

/* Plateau length on a circle with a horizon (BTZ, rotating BTZ); EUNSUP
   otherwise.  */
int holent_transition_plateau (const holent_geo_bg *bg,
                               holent_transition_result *res);

/* Separation of two intervals of lengths l1, l2 > 0 at which connected
   and disconnected geodesics have equal length.  Lines (Poincare, planar
   BTZ, rotating) and circles without horizon or defect (global, thermal
   AdS; there only gaps with l1 + l2 + d < L count); EUNSUP otherwise.  */
int holent_transition_separation (const holent_geo_bg *bg, double l1,
                                  double l2, holent_transition_result *res);

/* Hawking-Page temperature at boundary velocity Omega (|Omega| < 1) on a
   circle of circumference L, from the free energies of holent_thermo.  */
int holent_transition_hawking_page (double Omega, double L,
                                    holent_transition_result *res);

/* Separation of two strips of widths l1, l2 (transverse length 1, which
   drops out) at which connected and disconnected surfaces have equal
   area; found = 0 when the widths the background can reach run out
   first.  */
int holent_transition_strip_pair (const holent_hd_bg *bg,
                                  holent_strip_workspace *w, double l1,
                                  double l2, holent_transition_result *res);

#endif /* HOLENT_TRANSITION_H */
