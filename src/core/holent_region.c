/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_region.c: sorting and normalising region sets.  The RT
 * minimiser and the information quantities all go through here, so the
 * conventions (wrapping, merging, tolerances) live in one place.
 * GPL-3.0-or-later.  */
#include <float.h>
#include <math.h>
#include <stdint.h>
#include <stdlib.h>
#include <stdio.h>
#include "holent_region.h"

typedef struct
{
  double s, e;          /* start and end (e > s; e may pass L on a circle) */
  double ss, se;        /* the scale each was given at (see tol2)           */
  size_t row, last;     /* first and last input row merged into it          */
} piece;

/* Whether two coordinates coincide is decided from those two alone:
   |x - y| <= HOLENT_REGION_ULPS eps max(scale_x, scale_y), a scale being
   the magnitude the coordinate was given at (and at least L on a circle,
   where reducing mod L and adding L round at that scale).  Never from
   the rest of the region: a far-away row must not decide how the others
   merge, and a party and a union of parties then normalise the same
   points the same way.  */
static double
tol2 (double sx, double sy)
{
  return HOLENT_REGION_ULPS * DBL_EPSILON * fmax (sx, sy);
}

holent_region *
holent_region_alloc (size_t nmax)
{
  if (nmax == 0 || nmax > HOLENT_REGION_NMAX)
    return NULL;
  holent_region *r = calloc (1, sizeof *r);
  if (r == NULL)
    return NULL;
  r->start = malloc (nmax * sizeof *r->start);
  r->len = malloc (nmax * sizeof *r->len);
  r->row = malloc (nmax * sizeof *r->row);
  r->pts = malloc (2 * nmax * sizeof *r->pts);
  r->scratch = malloc (nmax * sizeof (piece));
  if (!r->start || !r->len || !r->row || !r->pts || !r->scratch)
    {
      holent_region_free (r);
      return NULL;
    }
  r->nmax = nmax;
  r->bad[0] = r->bad[1] = (size_t) -1;
  return r;
}

void
holent_region_free (holent_region *r)
{
  if (r == NULL)
    return;
  free (r->start);
  free (r->len);
  free (r->row);
  free (r->pts);
  free (r->scratch);
  free (r);
}

static int
cmp_piece (const void *pa, const void *pb)
{
  const piece *a = pa, *b = pb;
  if (a->s != b->s)
    return a->s < b->s ? -1 : 1;
  return a->row < b->row ? -1 : (a->row > b->row);
}

static int
fail2 (holent_region *r, int st, size_t i, size_t j)
{
  r->bad[0] = i < j ? i : j;
  r->bad[1] = i < j ? j : i;
  return st;
}

int
holent_region_set (holent_region *r, int circle, double L, size_t n,
                   const double *a, const double *b)
{
  if (r == NULL)
    return HOLENT_EINVAL;
  r->bad[0] = r->bad[1] = (size_t) -1;
  r->n = 0;
  r->whole = 0;
  if (n > 0 && (a == NULL || b == NULL))
    return HOLENT_EINVAL;
  if (n > r->nmax)
    return HOLENT_ETOOBIG;
  circle = circle != 0;
  if (circle)
    {
      if (isnan (L))
        return HOLENT_EINVAL;
      if (!(isfinite (L) && L > 0.0))
        return HOLENT_EDOM;
    }
  else
    L = 0.0;
  r->circle = circle;
  r->L = L;
  if (n == 0)
    return HOLENT_EEMPTY;

  for (size_t i = 0; i < n; i++)
    if (!isfinite (a[i]) || !isfinite (b[i]) || !isfinite (b[i] - a[i]))
      {
        r->bad[0] = i;
        return HOLENT_EINVAL;
      }

  piece *p = r->scratch;
  size_t whole_row = (size_t) -1;
  for (size_t i = 0; i < n; i++)
    {
      double d = b[i] - a[i];
      double sa = fmax (fabs (a[i]), L), sb = fmax (fabs (b[i]), L);
      double tol = tol2 (sa, sb);
      p[i].row = p[i].last = i;
      p[i].ss = sa;
      p[i].se = sb;
      if (!circle)
        {
          if (d < -tol)
            {
              r->bad[0] = i;
              return HOLENT_EDOM;
            }
          if (d <= tol)
            {
              r->bad[0] = i;
              return HOLENT_EEMPTY;
            }
          p[i].s = a[i];
          p[i].e = b[i];
          continue;
        }
      if (d > L + tol)
        {
          r->bad[0] = i;
          return HOLENT_EDOM;
        }
      if (fabs (d - L) <= tol)
        {
          if (whole_row != (size_t) -1)
            return fail2 (r, HOLENT_EOVERLAP, whole_row, i);
          whole_row = i;
          p[i].s = 0.0;
          p[i].e = L;
          continue;
        }
      double len = fmod (d, L);
      if (len < 0.0)
        len += L;
      if (len <= tol || len >= L - tol)
        {
          r->bad[0] = i;
          return HOLENT_EEMPTY;
        }
      double s = fmod (a[i], L);
      if (s < 0.0)
        s += L;
      if (s >= L)  /* -tiny + L rounds to L */
        s = 0.0;
      p[i].s = s;
      p[i].e = s + len;
    }
  if (whole_row != (size_t) -1)
    {
      if (n > 1)
        return fail2 (r, HOLENT_EOVERLAP, whole_row, whole_row == 0 ? 1 : 0);
      r->whole = 1;
      r->start0 = 1;
      return HOLENT_SUCCESS;
    }

  qsort (p, n, sizeof *p, cmp_piece);

  /* Sweep: merge touching pieces in place, stop at the first overlap.
     The end of a merged piece is the end of its last row, as given, so
     every comparison is between two input coordinates.  */
  size_t m = 0;
  for (size_t i = 1; i < n; i++)
    {
      double gap = p[i].s - p[m].e, tol = tol2 (p[m].se, p[i].ss);
      if (gap < -tol)
        return fail2 (r, HOLENT_EOVERLAP, p[m].last, p[i].row);
      if (gap <= tol)
        {
          p[m].e = p[i].e;
          p[m].se = p[i].se;
          p[m].last = p[i].last;
        }
      else
        p[++m] = p[i];
    }
  m++;

  if (circle)
    {
      /* The last piece against the first one, one turn later.  */
      double gap = p[0].s + L - p[m - 1].e;
      double tol = tol2 (p[m - 1].se, p[0].ss);
      if (gap < -tol)
        return fail2 (r, HOLENT_EOVERLAP, p[m - 1].last, p[0].row);
      if (gap <= tol)
        {
          if (m == 1)
            {
              r->whole = 1;
              r->start0 = 1;
              return HOLENT_SUCCESS;
            }
          /* Merge the first piece into the last, which now wraps.  */
          p[m - 1].e = p[0].e + L;
          p[m - 1].se = p[0].se;
          p[m - 1].last = p[0].last;
          for (size_t i = 1; i < m; i++)
            p[i - 1] = p[i];
          m--;
        }
    }

  r->n = m;
  for (size_t k = 0; k < m; k++)
    {
      r->start[k] = p[k].s;
      r->len[k] = p[k].e - p[k].s;
      r->row[k] = p[k].row;
    }
  r->start0 = 1;
  double last_end = p[m - 1].e;
  if (circle && last_end >= L)
    {
      /* The last interval wraps through 0: its end comes first.  */
      r->start0 = 0;
      r->pts[0] = last_end - L;
      for (size_t k = 0; k < m - 1; k++)
        {
          r->pts[2 * k + 1] = p[k].s;
          r->pts[2 * k + 2] = p[k].e;
        }
      r->pts[2 * m - 1] = p[m - 1].s;
    }
  else
    for (size_t k = 0; k < m; k++)
      {
        r->pts[2 * k] = p[k].s;
        r->pts[2 * k + 1] = p[k].e;
      }
  return HOLENT_SUCCESS;
}

int
holent_region_check (holent_region *r, int circle, double L, size_t n,
                     const double *a, const double *b, holent_err *e)
{
  holent_err_clear (e);
  int st = holent_region_set (r, circle, L, n, a, b);
  if (st == HOLENT_SUCCESS)
    return HOLENT_SUCCESS;
  if (r == NULL)
    return holent_err_set (e, st, -1, HOLENT_NOINDEX, NULL);
  size_t i = r->bad[0], j = r->bad[1];
  int known = i != (size_t) -1;
  int ret = st;
  char what[160];
  switch (st)
    {
    case HOLENT_EOVERLAP:
      snprintf (what, sizeof what, "rows %zu and %zu overlap (intervals of "
                "a region must be disjoint; touching ones are merged)",
                i + 1, j + 1);
      break;
    case HOLENT_EEMPTY:
      if (known)
        snprintf (what, sizeof what, "row %zu is a zero-length interval",
                  i + 1);
      else
        snprintf (what, sizeof what, "has no intervals");
      break;
    case HOLENT_EDOM:
      if (!known)
        snprintf (what, sizeof what, "the circumference must be finite and "
                  "positive");
      else if (r->circle)
        snprintf (what, sizeof what, "row %zu is longer than the circle "
                  "(end - start must not exceed the circumference %g)",
                  i + 1, r->L);
      else
        snprintf (what, sizeof what, "row %zu must have start < end on a "
                  "line", i + 1);
      break;
    case HOLENT_ETOOBIG:
      snprintf (what, sizeof what, "has too many rows (%zu; at most %zu)", n,
                r->nmax);
      break;
    case HOLENT_EINVAL:
      if (known && (isnan (a[i]) || isnan (b[i])))
        {
          ret = HOLENT_ENAN;
          snprintf (what, sizeof what, "row %zu must be numbers, not NaN",
                    i + 1);
        }
      else if (known && (!isfinite (a[i]) || !isfinite (b[i])))
        {
          ret = HOLENT_EDOM;
          snprintf (what, sizeof what, "row %zu must be finite", i + 1);
        }
      else if (known)
        {
          ret = HOLENT_EDOM;
          snprintf (what, sizeof what, "row %zu: end - start overflows "
                    "(coordinates too large)", i + 1);
        }
      else
        snprintf (what, sizeof what, "%s", holent_strerror (st));
      break;
    default:
      snprintf (what, sizeof what, "%s", holent_strerror (st));
      break;
    }
  /* The rows are named in the reason (and kept in r->bad): an index
     would be shown as an element, A(i), not as a row.  */
  return holent_err_set (e, ret, 0, HOLENT_NOINDEX, "%s", what);
}

/* Party of the union row K (rows[i] rows each); *row its row in it.  */
static size_t
party_of (size_t np, const size_t *rows, size_t k, size_t *row)
{
  size_t i = 0;
  while (i + 1 < np && k >= rows[i])
    k -= rows[i++];
  *row = k;
  return i;
}

int
holent_region_parties (holent_region *r, int circle, double L, size_t np,
                       const size_t *rows, const double *a, const double *b,
                       const char *const *names, holent_err *e)
{
  size_t n = 0;
  holent_err_clear (e);
  if (rows == NULL || names == NULL)
    return holent_err_set (e, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  for (size_t i = 0; i < np; i++)
    n += rows[i];
  int st = holent_region_check (r, circle, L, n, a, b, e);
  if (st != HOLENT_EOVERLAP)
    return st;
  size_t j1, j2, i1 = party_of (np, rows, r->bad[0], &j1);
  size_t i2 = party_of (np, rows, r->bad[1], &j2);
  if (i1 == i2)  /* not reached for valid parties */
    return holent_err_set (e, HOLENT_EOVERLAP, -1, HOLENT_NOINDEX,
                           "rows %zu and %zu of %s overlap", j1 + 1, j2 + 1,
                           names[i1]);
  return holent_err_set (e, HOLENT_EOVERLAP, -1, HOLENT_NOINDEX,
                         "%s(%zu,:) and %s(%zu,:) overlap: the parties must "
                         "be disjoint", names[i1], j1 + 1, names[i2], j2 + 1);
}
