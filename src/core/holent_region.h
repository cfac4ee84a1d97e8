/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_region.h: region sets (unions of boundary intervals), sorted and
 * normalised in one place for everything that works on regions.
 *
 * A region is given as n rows [start, end].  On a line start < end.  On a
 * circle of circumference L the interval runs from start to end in the
 * positive direction, coordinates modulo L, so it may wrap through 0; a
 * row with end - start = L is the whole circle.  Touching intervals are
 * merged, overlapping ones are an error naming two offending rows, empty
 * or zero-length intervals are rejected.  See doc/rt_regions.md.
 * GPL-3.0-or-later.  */
#ifndef HOLENT_REGION_H
#define HOLENT_REGION_H

#include <stddef.h>
#include "holent.h"

/* Two coordinates x, y of a region coincide (touching rows merged,
   zero length, whole circle, and the border between touching and
   overlapping) when |x - y| <= HOLENT_REGION_ULPS DBL_EPSILON max(s_x,
   s_y), s the magnitude of the coordinate as given (at least L on a
   circle).  See doc/rt_regions.md.  */
#define HOLENT_REGION_ULPS 16.0

/* Largest number of input rows a region workspace accepts.  */
#define HOLENT_REGION_NMAX ((size_t) 1 << 26)

typedef struct
{
  /* Results of holent_region_set (owned by the struct).  */
  int circle;       /* 1: on a circle of circumference L                  */
  double L;         /* circumference (0 on a line)                         */
  int whole;        /* 1: the region is the whole circle (n == 0 then)     */
  size_t n;         /* intervals after merging                             */
  double *start;    /* n starts, ascending; in [0, L) on a circle          */
  double *len;      /* n lengths, > 0 (< L on a circle)                    */
  size_t *row;      /* n: the first input row (0-based) of each interval   */
  double *pts;      /* 2n endpoints ascending (in [0, L) on a circle)      */
  int start0;       /* 1 if pts[0] starts an interval; 0 if pts[0] ends
                       the interval that wraps through 0 (circle only)     */
  size_t bad[2];    /* offending input rows (0-based) on failure, or
                       (size_t) -1                                         */
  size_t nmax;      /* capacity in input rows                              */
  void *scratch;    /* sorting scratch                                     */
} holent_region;

/* A region able to hold up to nmax input rows; NULL if nmax is 0 or above
   HOLENT_REGION_NMAX, or on allocation failure.  */
holent_region *holent_region_alloc (size_t nmax);
void holent_region_free (holent_region *r);

/* Normalise the n rows (a[i], b[i]) on a line (circle = 0) or a circle of
 * circumference L.  Returns
 *   HOLENT_EINVAL   NULL pointers, NaN or Inf coordinates (bad[0] = row)
 *   HOLENT_ETOOBIG  n above the capacity
 *   HOLENT_EDOM     L not finite positive (circle); on a line end < start;
 *                   on a circle end - start > L (bad[0] = row)
 *   HOLENT_EEMPTY   n == 0, or a zero-length row (bad[0] = row)
 *   HOLENT_EOVERLAP two rows overlap: bad[0] < bad[1] are two of them.
 * Whether two coordinates count as equal (touching, zero length, whole
 * circle) is decided from those two coordinates alone (HOLENT_REGION_ULPS
 * above), so a row is normalised the same way in every region it is part
 * of.  */
int holent_region_set (holent_region *r, int circle, double L, size_t n,
                       const double *a, const double *b);

/* holent_region_set, with the reason of a failure in E (may be NULL) for
 * the caller's message: E->arg 0 (the region), E->index, E->index2 the
 * offending rows (0-based, HOLENT_NOINDEX when none; also in r->bad) and
 * E->reason what was expected, naming the rows 1-based (overlap naming
 * both rows, zero length, longer than the circle, start < end, too many
 * rows, NaN, Inf, overflow of end - start).  Returns E's status: that of
 * holent_region_set, except HOLENT_ENAN for a NaN coordinate and
 * HOLENT_EDOM for Inf or overflow (holent_region_set: HOLENT_EINVAL).  */
int holent_region_check (holent_region *r, int circle, double L, size_t n,
                         const double *a, const double *b, holent_err *e);

/* The union of np parties, party i being rows[i] consecutive rows of
 * (a, b), each party valid on its own: normalise it as holent_region_set
 * does; two parties that overlap fill E (arg -1) with a reason naming
 * both rows as NAMES[i](row,:) (names of the parties, for the message
 * only).  Returns E's status.  */
int holent_region_parties (holent_region *r, int circle, double L,
                           size_t np, const size_t *rows, const double *a,
                           const double *b, const char *const *names,
                           holent_err *e);

#endif /* HOLENT_REGION_H */
