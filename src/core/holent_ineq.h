/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_ineq.h: evaluate entropy inequalities on an entropy vector.
 *
 * An entropy vector of N parties is s[k - 1] = S(subset k), k = 1 ..
 * 2^N - 1, where subset k holds the parties whose bits are set in k
 * (bit 0 = party 1).  A region of an instance is a non-empty union of
 * parties given by its mask; the regions of one instance are disjoint.
 * Every family is written lhs - rhs >= 0:
 *
 *   SA     (X, Y)     S(X) + S(Y) - S(XY)
 *   AL     (X, Y)     S(XY) + S(Y) - S(X)              (Araki-Lieb)
 *   SSA    (X, Y, Z)  S(XY) + S(YZ) - S(Y) - S(XYZ)
 *   WM     (X, Y, Z)  S(XY) + S(YZ) - S(X) - S(Z)
 *   MMI    (X, Y, Z)  S(XY) + S(YZ) + S(XZ) - S(X) - S(Y) - S(Z) - S(XYZ)
 *   CYCLIC (X_0 .. X_{m-1}), m = 2k + 1 >= 3, indices mod m:
 *          sum_i [S(X_i .. X_{i+k}) - S(X_{i+1} .. X_{i+k})] - S(X_0 .. X_{m-1})
 *          (= sum_i S(X_i | X_{i+1} .. X_{i+k}) - S(all); k = 1 is MMI)
 *
 * One instance per orbit of the symmetry of its family is evaluated; the
 * representative kept (masks compared as unsigned integers) is
 *   SA X < Y;  AL none;  SSA, WM X < Z;  MMI X < Y < Z;
 *   CYCLIC (dihedral group of order 2m) X_0 < X_j for j > 0, X_1 < X_{m-1}.
 *
 * Instance sets.  Complete: every instance.  Subset (for large N):
 *   SA, AL: every instance (the same as complete);
 *   SSA, WM, MMI, and CYCLIC with m = 3: the instances whose three
 *     regions are single parties, then those whose regions cover all N
 *     parties;
 *   CYCLIC with m >= 5: m single parties taken in increasing index
 *     order (i_1 < .. < i_m, the cyclic order being that order), then the
 *     cuts of parties 1 .. N, in order, into m consecutive blocks (the
 *     all-singletons cut, equal to the first kind when m = N, counted once).
 * Instances are visited in a fixed order; the worst one kept is the first
 * with the smallest value.
 *
 * GPL-3.0-or-later.  */
#ifndef HOLENT_INEQ_H
#define HOLENT_INEQ_H

#include <stddef.h>
#include <stdint.h>
#include "holent.h"

/* Largest number of parties accepted.  */
#define HOLENT_INEQ_NMAX 16
/* Complete enumeration is refused (HOLENT_ETOOBIG) when (t + 1)^N, the
   number of ways to give each party to one of the t regions or to none,
   exceeds this.  */
#define HOLENT_INEQ_BUDGET 1073741824.0

typedef enum
{
  HOLENT_INEQ_SA = 0,
  HOLENT_INEQ_AL,
  HOLENT_INEQ_SSA,
  HOLENT_INEQ_WM,
  HOLENT_INEQ_MMI,
  HOLENT_INEQ_CYCLIC
} holent_ineq_family;

typedef struct
{
  double count;     /* instances evaluated                               */
  double violated;  /* instances with lhs - rhs < -tol                   */
  double undecided; /* instances whose value came out NaN: neither
                       holding nor violated (none for finite s, which
                       are evaluated scaled by a power of two)          */
  double worst;     /* smallest lhs - rhs; +INFINITY when count = 0      */
  unsigned nregions;                   /* regions of the worst; 0 if none */
  uint32_t regions[HOLENT_INEQ_NMAX];  /* their masks, in family order   */
} holent_ineq_result;

/* *n = N when len = 2^N - 1 with 1 <= N <= HOLENT_INEQ_NMAX.
   EDOM when len is not of that form, ETOOBIG when N is too large.  */
int holent_ineq_nparties (size_t len, unsigned *n);

/* Number of regions t of one instance of family fam (m for CYCLIC, where
   m must be odd and >= 3).  */
int holent_ineq_nregions (holent_ineq_family fam, unsigned m, unsigned *t);

/* lhs - rhs of one instance: regions[0 .. t-1] (t from
   holent_ineq_nregions) must be non-empty, disjoint masks of n parties
   (EDOM otherwise, EOVERLAP when two meet).  s has 2^n - 1 entries.  */
int holent_ineq_value (unsigned n, const double *s, holent_ineq_family fam,
                       unsigned m, const uint32_t *regions, double *value);

/* Evaluate every instance of the family's complete set (complete != 0)
   or of its subset.  s must be finite (EINVAL), tol >= 0 (EDOM), m odd
   with 3 <= m <= n for CYCLIC (EDOM).  Values are computed on s scaled
   by a power of two, so entries near the double range do not overflow;
   worst is +-Inf only when the worst value itself is beyond that range.
   poll (may be NULL) is called every 2^16 tuples; HOLENT_EINTR when it
   asks to stop (*res is then partial).  */
int holent_ineq_eval (unsigned n, const double *s, holent_ineq_family fam,
                      unsigned m, int complete, double tol,
                      holent_ineq_result *res, const holent_poll *poll);

#endif /* HOLENT_INEQ_H */
