/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_cone.h: the facets of the holographic entropy cone HEC_n for
 * n = 1 .. 5 parties (the purifier O is party n + 1; see
 * doc/entropy_cone.md).  A facet is a coefficient vector c over the
 * 2^n - 1 entries of an entropy vector (order of holent_ineq.h), the
 * inequality being sum_k c[k-1] S(subset k) >= 0; every instance of an
 * orbit is the image of its representative under a permutation of the
 * n + 1 parties A1 .. An O, a region that comes to contain O being
 * replaced by its complement, scaled to coprime integers.
 *
 * Orbit representatives (parties A .. E, purifier O), transcribed from
 * memory of Bao, Nezami, Ooguri, Stoica, Sully and Walter 2015, JHEP 09
 * (2015) 130, arXiv:1505.07839, and Hernandez-Cuenca 2019, PRD 100,
 * 026004, arXiv:1903.09148; each is proved by holent_contract in the
 * tests and shown to be a facet by the rank test on graph models:
 *   n >= 1: SA        S(A) + S(B) >= S(AB)
 *   n >= 3: MMI       S(AB) + S(BC) + S(AC) >= S(A) + S(B) + S(C) + S(ABC)
 *   n = 5:  MMI on (AB, CD, E), the cyclic inequality on five parties,
 *           and four more (the table in holent_cone.c).
 * Counts: n = 1: 1; 2: 3; 3: 7; 4: 20; 5: 372 facets in 8 orbits.  */
#ifndef HOLENT_CONE_H
#define HOLENT_CONE_H

#include <stddef.h>
#include "holent.h"

#define HOLENT_CONE_NMAX 5

/* Number of facets and of orbits of HEC_n.  */
int holent_cone_count (unsigned n, size_t *nfacets, unsigned *norbits);

/* The representative of orbit o < norbits: its name, its text with
   parties A, B, .. and O, and (c != NULL) its 2^n - 1 coefficients.  */
int holent_cone_orbit (unsigned n, unsigned o, const char **name,
                       const char **text, double *c);

/* Every facet: A[f * (2^n - 1) + k - 1] = c_f[k - 1] for f < nfacets,
   orbit[f] = its orbit; facets grouped by orbit, sorted within it.  */
int holent_cone_facets (unsigned n, double *A, unsigned *orbit);

#endif /* HOLENT_CONE_H */
