/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_interval.h: RT entropy of a single boundary interval, with the
 * homology constraint when the bulk has a horizon.  GPL-3.0-or-later.  */
#ifndef HOLENT_INTERVAL_H
#define HOLENT_INTERVAL_H

#include <stddef.h>
#include "holent_geo.h"

/* S[i] = RT entropy of an interval of length l[i]:
 *   line:   (c/6) len(l)
 *   circle: min((c/6) len(l), (c/6) len(L - l) + S_BH), l in (0, L];
 *           l = L (the whole circle) gives S_BH.
 * branch[i] (may be NULL) is 0 when the geodesic over the interval itself
 * wins and 1 when the complementary geodesic (plus the horizon, if any)
 * wins: with a horizon branch = (L - l < m_star) (holent_interval_plateau
 * below; one geodesic is evaluated a value, the minimum is the same up to
 * rounding), without one branch = (l > L/2), the side on which the (equal
 * or shorter) geodesic runs.  *n_short (may be NULL) counts lengths not
 * longer than twice the cutoff, where the regulated formula is
 * meaningless.  */
int holent_interval_entropy (const holent_geo_bg *bg, size_t n,
                             const double *l, double *S,
                             unsigned char *branch, size_t *bad,
                             size_t *n_short);

/* The plateau of an interval on a circle with a horizon (BTZ, rotating
 * BTZ): *m_star = L - l*, the arc of the complement at which the geodesic
 * over the interval and the complementary one plus the horizon have the
 * same length (the entanglement plateau of Hubeny, Maxfield, Rangamani
 * and Tonni 2013).  holent_interval_entropy takes the complement exactly
 * when L - l < *m_star.  Closed form for one temperature, a bracketed
 * root (Brent's method) to the last bits for two; 0 < *m_star <= L/2.
 * HOLENT_EINVAL for NULL, HOLENT_EDOM without a circle and a horizon,
 * HOLENT_ENOMEM or HOLENT_ENOCONV from the root finder (two
 * temperatures).  */
int holent_interval_plateau (const holent_geo_bg *bg, double *m_star);

/* Why the length l = lengths[i] fails holent_interval_entropy, in E (arg
 * 0: the lengths, index i): HOLENT_ENAN, HOLENT_EDOM (not positive, Inf,
 * longer than the circle), or HOLENT_SUCCESS (E cleared) when l is
 * valid.  Returns E's status.  */
int holent_interval_check (const holent_geo_bg *bg, size_t i, double l,
                           holent_err *e);

#endif /* HOLENT_INTERVAL_H */
