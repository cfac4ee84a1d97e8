/* Unit tests of holent_region: normalisation (sorting, wrapping through 0,
 * merging touching intervals, the whole circle) and every error path.  */
#include <math.h>
#include <stdlib.h>
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

int
main (void)
{
  test_alloc ();
  test_errors ();
  test_normalise ();
  return HT_DONE ();
}
