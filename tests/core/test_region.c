/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Unit tests of holent_region: normalisation (sorting, wrapping through 0,
 * merging touching intervals, the whole circle) and every error path.  */
#include <float.h>
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include <gsl/gsl_math.h>
#include "holent_ctest.h"
#include "holent_region.h"

static void
test_alloc (void)
{
  HT_CHECK (holent_region_alloc (0) == NULL, "alloc(0) must fail");
  HT_CHECK (holent_region_alloc (HOLENT_REGION_NMAX + 1) == NULL,
            "alloc above the limit must fail");
  holent_region_free (NULL);  /* allowed */
}

static void
test_errors (void)
{
  holent_region *r = holent_region_alloc (4);
  double a[4], b[4];
  HT_CHECK (r != NULL, "alloc");

  HT_STATUS (holent_region_set (NULL, 0, 0, 1, a, b), HOLENT_EINVAL);
  a[0] = 0; b[0] = 1;
  HT_STATUS (holent_region_set (r, 0, 0, 1, NULL, b), HOLENT_EINVAL);
  HT_STATUS (holent_region_set (r, 0, 0, 1, a, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_region_set (r, 0, 0, 5, a, b), HOLENT_ETOOBIG);
  HT_STATUS (holent_region_set (r, 0, 0, 0, a, b), HOLENT_EEMPTY);
  HT_CHECK (r->n == 0 && !r->whole, "a failed set leaves an empty region");
  HT_STATUS (holent_region_set (r, 1, NAN, 1, a, b), HOLENT_EINVAL);
  HT_STATUS (holent_region_set (r, 1, -1.0, 1, a, b), HOLENT_EDOM);
  HT_STATUS (holent_region_set (r, 1, INFINITY, 1, a, b), HOLENT_EDOM);

  /* NaN / Inf coordinates, reported by row */
  a[0] = 0; b[0] = 1; a[1] = NAN; b[1] = 3;
  HT_STATUS (holent_region_set (r, 0, 0, 2, a, b), HOLENT_EINVAL);
  HT_CHECK (r->bad[0] == 1, "bad row %zu", r->bad[0]);
  a[1] = 2; b[1] = INFINITY;
  HT_STATUS (holent_region_set (r, 0, 0, 2, a, b), HOLENT_EINVAL);
  HT_CHECK (r->bad[0] == 1, "bad row %zu", r->bad[0]);
  a[1] = -1e308; b[1] = 1e308;  /* finite, but b - a overflows */
  HT_STATUS (holent_region_set (r, 0, 0, 2, a, b), HOLENT_EINVAL);

  /* line: reversed and zero-length rows */
  a[1] = 3; b[1] = 2;
  HT_STATUS (holent_region_set (r, 0, 0, 2, a, b), HOLENT_EDOM);
  HT_CHECK (r->bad[0] == 1, "bad row %zu", r->bad[0]);
  a[1] = 3; b[1] = 3;
  HT_STATUS (holent_region_set (r, 0, 0, 2, a, b), HOLENT_EEMPTY);
  HT_CHECK (r->bad[0] == 1, "bad row %zu", r->bad[0]);

  /* circle: longer than L, zero length modulo L */
  const double L = 2 * M_PI;
  a[0] = 1; b[0] = 1 + L + 0.5;
  HT_STATUS (holent_region_set (r, 1, L, 1, a, b), HOLENT_EDOM);
  a[0] = 1; b[0] = 1 - L;  /* zero modulo L */
  HT_STATUS (holent_region_set (r, 1, L, 1, a, b), HOLENT_EEMPTY);
  a[0] = 1; b[0] = 1;
  HT_STATUS (holent_region_set (r, 1, L, 1, a, b), HOLENT_EEMPTY);
  a[0] = 1; b[0] = nextafter (1.0, 0.0);  /* one ulp short of a full turn */
  HT_STATUS (holent_region_set (r, 1, L, 1, a, b), HOLENT_EEMPTY);

  /* overlaps: rows reported in ascending order */
  a[0] = 5; b[0] = 6; a[1] = 0; b[1] = 2; a[2] = 1; b[2] = 3;
  HT_STATUS (holent_region_set (r, 0, 0, 3, a, b), HOLENT_EOVERLAP);
  HT_CHECK (r->bad[0] == 1 && r->bad[1] == 2, "rows %zu %zu", r->bad[0],
            r->bad[1]);
  /* equal starts */
  a[0] = 1; b[0] = 2; a[1] = 1; b[1] = 1.5;
  HT_STATUS (holent_region_set (r, 0, 0, 2, a, b), HOLENT_EOVERLAP);
  /* overlap through a merged chain: [0,1] [1,2] touch, [1.5,3] overlaps
     the second */
  a[0] = 1.5; b[0] = 3; a[1] = 1; b[1] = 2; a[2] = 0; b[2] = 1;
  HT_STATUS (holent_region_set (r, 0, 0, 3, a, b), HOLENT_EOVERLAP);
  HT_CHECK (r->bad[0] == 0 && r->bad[1] == 1, "rows %zu %zu", r->bad[0],
            r->bad[1]);
  /* circle: a wrapping row overlapping the first one */
  a[0] = 0.5; b[0] = 1; a[1] = 6; b[1] = 0.7;
  HT_STATUS (holent_region_set (r, 1, L, 2, a, b), HOLENT_EOVERLAP);
  HT_CHECK (r->bad[0] == 0 && r->bad[1] == 1, "rows %zu %zu", r->bad[0],
            r->bad[1]);
  /* circle: a merged chain that overlaps itself after one turn */
  a[0] = 0; b[0] = 4; a[1] = 4; b[1] = 7;
  HT_STATUS (holent_region_set (r, 1, L, 2, a, b), HOLENT_EOVERLAP);
  /* whole circle together with another row */
  a[0] = 1; b[0] = 2; a[1] = 3; b[1] = 3 + L;
  HT_STATUS (holent_region_set (r, 1, L, 2, a, b), HOLENT_EOVERLAP);
  HT_CHECK (r->bad[0] == 0 && r->bad[1] == 1, "rows %zu %zu", r->bad[0],
            r->bad[1]);
  a[0] = 3; b[0] = 3 + L; a[1] = 1; b[1] = 1 + L;
  HT_STATUS (holent_region_set (r, 1, L, 2, a, b), HOLENT_EOVERLAP);
  holent_region_free (r);
}

static void
test_normalise (void)
{
  holent_region *r = holent_region_alloc (5);
  const double L = 10.0;
  double a[5], b[5];

  /* line: sorted, touching rows merged */
  a[0] = 4; b[0] = 5; a[1] = 0; b[1] = 1; a[2] = 1; b[2] = 2.5;
  HT_STATUS (holent_region_set (r, 0, 0, 3, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->n == 2 && r->start0 == 1, "n = %zu", r->n);
  HT_CLOSE (r->pts[0], 0, 0);
  HT_CLOSE (r->pts[1], 2.5, 0);
  HT_CLOSE (r->pts[2], 4, 0);
  HT_CLOSE (r->pts[3], 5, 0);
  HT_CHECK (r->row[0] == 1 && r->row[1] == 0, "rows %zu %zu", r->row[0],
            r->row[1]);

  /* circle: coordinates reduced mod L, a row wrapping through 0 */
  a[0] = 13; b[0] = 14; a[1] = 9; b[1] = 11; a[2] = -5; b[2] = -4;
  HT_STATUS (holent_region_set (r, 1, L, 3, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->n == 3 && r->start0 == 0, "n = %zu start0 = %d", r->n,
            r->start0);
  double want[6] = { 1, 3, 4, 5, 6, 9 };
  for (int k = 0; k < 6; k++)
    HT_CLOSE (r->pts[k], want[k], 1e-14);
  HT_CLOSE (r->start[2], 9, 1e-14);
  HT_CLOSE (r->len[2], 2, 1e-14);

  /* a start just below 0 reduces to 0, not to L */
  a[0] = -1e-300; b[0] = 1;
  HT_STATUS (holent_region_set (r, 1, L, 1, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->start[0] == 0.0 && r->start0 == 1, "start %g", r->start[0]);

  /* reversed row on a circle is the long way round */
  a[0] = 7; b[0] = 2;
  HT_STATUS (holent_region_set (r, 1, L, 1, a, b), HOLENT_SUCCESS);
  HT_CLOSE (r->len[0], 5, 1e-14);
  HT_CHECK (r->start0 == 0, "wraps");

  /* touching through 0: [8, 10] and [0, 1] merge into one wrapping row */
  a[0] = 0; b[0] = 1; a[1] = 8; b[1] = 10; a[2] = 3; b[2] = 4;
  HT_STATUS (holent_region_set (r, 1, L, 3, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->n == 2, "n = %zu", r->n);
  HT_CLOSE (r->start[1], 8, 1e-14);
  HT_CLOSE (r->len[1], 3, 1e-14);
  HT_CLOSE (r->pts[0], 1, 1e-14);

  /* whole circle, directly and by merging */
  a[0] = 2.5; b[0] = 12.5;
  HT_STATUS (holent_region_set (r, 1, L, 1, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->whole && r->n == 0, "whole");
  a[0] = 0; b[0] = 4; a[1] = 4; b[1] = 10;
  HT_STATUS (holent_region_set (r, 1, L, 2, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->whole, "whole by merging");
  /* 0.1 + 0.2 != 0.3: rounding below the tolerance still touches */
  a[0] = 0.1; b[0] = 0.1 + 0.2; a[1] = 0.3; b[1] = 0.5;
  HT_STATUS (holent_region_set (r, 0, 0, 2, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->n == 1, "merged despite rounding");
  /* a tiny true gap is kept */
  a[0] = 0; b[0] = 1; a[1] = 1 + 1e-9; b[1] = 2;
  HT_STATUS (holent_region_set (r, 0, 0, 2, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->n == 2, "gap kept");
  holent_region_free (r);
}

/* Copy the normalised intervals of r (on a line) as rows (start, end)
   into a, b: its endpoints are input coordinates, as given.  */
static size_t
rows_of (const holent_region *r, double *a, double *b)
{
  for (size_t k = 0; k < r->n; k++)
    {
      a[k] = r->pts[2 * k];
      b[k] = r->pts[2 * k + 1];
    }
  return r->n;
}

static double
urand (void)
{
  return rand () / (RAND_MAX + 1.0);
}

/* Tolerances belong to the comparison: the regions of the issue-10
   report, and random regions whose coordinates span many orders of
   magnitude.  */
static void
test_tolerance (void)
{
  enum { NR = 24 };
  holent_region *r = holent_region_alloc (2 * NR), *q = holent_region_alloc (2 * NR);
  double a[2 * NR], b[2 * NR], a2[2 * NR], b2[2 * NR];

  /* a 1e-6 interval next to one at 1e10 is not zero-length */
  a[0] = 0; b[0] = 1e-6; a[1] = 1e10; b[1] = 1e10 + 1;
  HT_STATUS (holent_region_set (r, 0, 0, 2, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->n == 2 && r->len[0] == 1e-6, "n %zu len %g", r->n, r->len[0]);
  /* a 1e-6 gap next to rows at +-1e10 is kept */
  a[0] = 0; b[0] = 1; a[1] = 1 + 1e-6; b[1] = 2;
  a[2] = 1e10; b[2] = 1e10 + 1; a[3] = -1e10 - 1; b[3] = -1e10;
  HT_STATUS (holent_region_set (r, 0, 0, 4, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->n == 4, "n %zu", r->n);
  /* the same far away on a circle of circumference 1e11 */
  HT_STATUS (holent_region_set (r, 1, 1e11, 2, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->n == 1, "at L = 1e11 a 1e-6 gap is below the tolerance: n %zu", r->n);
  HT_STATUS (holent_region_set (r, 1, 100.0, 2, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->n == 2, "n %zu", r->n);
  /* touching is decided at the scale of the two coordinates compared:
     a gap of 4 ulps at 1 touches, a gap of 1e-12 at 1 does not, whatever
     else the region holds */
  a[0] = 0; b[0] = 1; a[1] = 1 + 4 * DBL_EPSILON; b[1] = 2;
  a[1] = 1 + 1e-12;
  HT_STATUS (holent_region_set (r, 0, 0, 4, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->n == 4, "n %zu", r->n);
  a[1] = 1 + 4 * DBL_EPSILON;
  HT_STATUS (holent_region_set (r, 0, 0, 4, a, b), HOLENT_SUCCESS);
  HT_CHECK (r->n == 3, "n %zu", r->n);

  /* Random regions of rows at magnitudes 10^-8 .. 10^12, some touching
     to rounding, some separated by tiny true gaps.  Properties:
     (1) adding far-away rows leaves the intervals of the others as they
         were; (2) normalising the normalised intervals of a part A
         together with the raw rows of the rest B gives the same region as
         normalising all rows (a party and a union normalise the same
         points the same way); (3) lengths are positive, points strictly
         ascending.  */
  for (int trial = 0; trial < 2000; trial++)
    {
      size_t n = 1 + (size_t) (urand () * (NR - 2));
      double x = -pow (10.0, 12.0 * urand ()) * (urand () < 0.5);
      for (size_t i = 0; i < n; i++)
        {
          double mag = pow (10.0, -8.0 + 20.0 * urand ());
          double w = mag * (0.1 + urand ());
          int touch = urand () < 0.3;
          a[i] = touch ? x : x + mag * (urand () < 0.5 ? 1e-9 : urand ());
          if (touch && i > 0)
            a[i] = nextafter (x, urand () < 0.5 ? -INFINITY : INFINITY);
          b[i] = a[i] + w;
          if (!(b[i] - a[i] > 32 * DBL_EPSILON * fmax (fabs (a[i]), fabs (b[i]))))
            b[i] = a[i] + 64 * DBL_EPSILON * fmax (1e-300, fabs (a[i]));
          x = b[i];
        }
      /* shuffle */
      for (size_t i = n; i > 1; i--)
        {
          size_t j = (size_t) (urand () * i);
          double t = a[i - 1]; a[i - 1] = a[j]; a[j] = t;
          t = b[i - 1]; b[i - 1] = b[j]; b[j] = t;
        }
      int st = holent_region_set (r, 0, 0, n, a, b);
      if (st != HOLENT_SUCCESS)
        {
          HT_CHECK (st == HOLENT_EOVERLAP || st == HOLENT_EEMPTY, "trial %d status %d", trial, st);
          continue;
        }
      for (size_t k = 0; k + 1 < 2 * r->n; k++)
        HT_CHECK (r->pts[k] < r->pts[k + 1], "trial %d: points not ascending", trial);
      /* (1) far rows */
      double top = r->pts[2 * r->n - 1];
      a[n] = fabs (top) * 1e6 + 1e10; b[n] = a[n] * 1.5;
      HT_STATUS (holent_region_set (q, 0, 0, n + 1, a, b), HOLENT_SUCCESS);
      int same = q->n == r->n + 1;
      for (size_t k = 0; same && k < 2 * r->n; k++)
        same = q->pts[k] == r->pts[k];
      HT_CHECK (same, "trial %d: a far row changed the region", trial);
      /* (2) part A = the first half of the rows, normalised first */
      size_t na = n / 2;
      if (na == 0)
        continue;
      HT_STATUS (holent_region_set (q, 0, 0, na, a, b), HOLENT_SUCCESS);
      size_t m = rows_of (q, a2, b2);
      for (size_t i = na; i < n; i++)
        a2[m] = a[i], b2[m++] = b[i];
      HT_STATUS (holent_region_set (q, 0, 0, m, a2, b2), HOLENT_SUCCESS);
      same = q->n == r->n;
      for (size_t k = 0; same && k < 2 * r->n; k++)
        same = q->pts[k] == r->pts[k];
      HT_CHECK (same, "trial %d: part-then-union differs from the union", trial);
    }
  holent_region_free (r);
  holent_region_free (q);
}

/* The reasons of holent_region_check and holent_region_parties: status,
   argument and the rows named in words (common practice: a message says
   what was wrong and where).  */
static void
test_reasons (void)
{
  holent_region *r = holent_region_alloc (4);
  holent_err e;
  const char *names[] = { "A", "B{2}" };
  double a[4], b[4];
  a[0] = 0; b[0] = 2; a[1] = 1; b[1] = 3;
  HT_STATUS (holent_region_check (r, 0, 0, 2, a, b, &e), HOLENT_EOVERLAP);
  HT_CHECK (e.arg == 0 && e.index == HOLENT_NOINDEX, "arg %d", e.arg);
  HT_CHECK (strstr (e.reason, "rows 1 and 2 overlap") != NULL, "%s", e.reason);
  a[1] = 5; b[1] = 5;
  HT_STATUS (holent_region_check (r, 0, 0, 2, a, b, &e), HOLENT_EEMPTY);
  HT_CHECK (strstr (e.reason, "row 2 is a zero-length") != NULL, "%s", e.reason);
  b[1] = 4;
  HT_STATUS (holent_region_check (r, 0, 0, 2, a, b, &e), HOLENT_EDOM);
  HT_CHECK (strstr (e.reason, "row 2 must have start < end") != NULL, "%s", e.reason);
  HT_STATUS (holent_region_check (r, 1, 2.0, 1, a, b, &e), HOLENT_SUCCESS);
  HT_CHECK (e.status == 0 && e.reason[0] == '\0', "cleared");
  a[0] = 0; b[0] = 7;
  HT_STATUS (holent_region_check (r, 1, 2 * M_PI, 1, a, b, &e), HOLENT_EDOM);
  HT_CHECK (strstr (e.reason, "row 1 is longer than the circle") != NULL, "%s", e.reason);
  HT_STATUS (holent_region_check (r, 0, 0, 0, a, b, &e), HOLENT_EEMPTY);
  HT_CHECK (strstr (e.reason, "has no intervals") != NULL, "%s", e.reason);
  HT_STATUS (holent_region_check (r, 0, 0, 5, a, b, &e), HOLENT_ETOOBIG);
  HT_CHECK (strstr (e.reason, "too many rows") != NULL, "%s", e.reason);
  a[0] = NAN;
  HT_STATUS (holent_region_check (r, 0, 0, 1, a, b, &e), HOLENT_ENAN);
  a[0] = INFINITY;
  HT_STATUS (holent_region_check (r, 0, 0, 1, a, b, &e), HOLENT_EDOM);
  HT_CHECK (strstr (e.reason, "finite") != NULL, "%s", e.reason);
  a[0] = -1e308; b[0] = 1e308;
  HT_STATUS (holent_region_check (r, 0, 0, 1, a, b, &e), HOLENT_EDOM);
  HT_CHECK (strstr (e.reason, "overflows") != NULL, "%s", e.reason);
  HT_STATUS (holent_region_check (r, 1, -1.0, 1, a, b, &e), HOLENT_EDOM);
  HT_STATUS (holent_region_check (r, 0, 0, 1, a, b, NULL), HOLENT_EDOM);
  /* parties: A = {[0 1]}, B{2} = {[3 4], [0.5 2]}: row 1 of A meets row 2
     of B{2} */
  size_t rows[2] = { 1, 2 };
  a[0] = 0; b[0] = 1; a[1] = 3; b[1] = 4; a[2] = 0.5; b[2] = 2;
  HT_STATUS (holent_region_parties (r, 0, 0, 2, rows, a, b, names, &e),
             HOLENT_EOVERLAP);
  HT_CHECK (e.arg == -1, "arg %d", e.arg);
  HT_CHECK (strcmp (e.reason, "A(1,:) and B{2}(2,:) overlap: the parties "
                    "must be disjoint") == 0, "%s", e.reason);
  /* touching parties are fine, and normalise as one region */
  a[2] = 1; b[2] = 2;
  HT_STATUS (holent_region_parties (r, 0, 0, 2, rows, a, b, names, &e),
             HOLENT_SUCCESS);
  HT_CHECK (r->n == 2, "n %zu", r->n);
  HT_STATUS (holent_region_parties (r, 0, 0, 2, NULL, a, b, names, &e),
             HOLENT_EINVAL);
  holent_region_free (r);
}

int
main (void)
{
  srand (2026);
  test_reasons ();
  test_alloc ();
  test_errors ();
  test_normalise ();
  test_tolerance ();
  return HT_DONE ();
}
