/* holent_region.c: sorting and normalising region sets.  The RT
 * minimiser and the information quantities all go through here, so the
 * conventions (wrapping, merging, tolerances) live in one place.
 * GPL-3.0-or-later.  */
#include <float.h>
#include <math.h>
#include <stdint.h>
#include <stdlib.h>
#include "holent_region.h"

typedef struct
{
  double s, l;          /* start and length                         */
  size_t row, last;     /* first and last input row merged into it  */
} piece;

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

  /* One scale for "equal": rounding in a + L and in the reduction mod L
     is a few ulps of the largest coordinate.  */
  double scale = L;
  for (size_t i = 0; i < n; i++)
    {
      if (!isfinite (a[i]) || !isfinite (b[i]) || !isfinite (b[i] - a[i]))
        {
          r->bad[0] = i;
          return HOLENT_EINVAL;
        }
      scale = fmax (scale, fmax (fabs (a[i]), fabs (b[i])));
    }
  const double tol = 16.0 * DBL_EPSILON * scale;
  r->tol = tol;

  piece *p = r->scratch;
  size_t whole_row = (size_t) -1;
  for (size_t i = 0; i < n; i++)
    {
      double d = b[i] - a[i];
      p[i].row = p[i].last = i;
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
          p[i].l = d;
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
          p[i].l = L;
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
      p[i].l = len;
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

  /* Sweep: merge touching pieces in place, stop at the first overlap.  */
  size_t m = 0;
  for (size_t i = 1; i < n; i++)
    {
      double end = p[m].s + p[m].l, gap = p[i].s - end;
      if (gap < -tol)
        return fail2 (r, HOLENT_EOVERLAP, p[m].last, p[i].row);
      if (gap <= tol)
        {
          p[m].l = p[i].s + p[i].l - p[m].s;
          p[m].last = p[i].last;
        }
      else
        p[++m] = p[i];
    }
  m++;

  if (circle)
    {
      /* The last piece against the first one, one turn later.  */
      double gap = p[0].s + L - (p[m - 1].s + p[m - 1].l);
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
          p[m - 1].l = p[0].s + L + p[0].l - p[m - 1].s;
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
      r->len[k] = p[k].l;
      r->row[k] = p[k].row;
    }
  r->start0 = 1;
  double last_end = p[m - 1].s + p[m - 1].l;
  if (circle && last_end >= L)
    {
      /* The last interval wraps through 0: its end comes first.  */
      r->start0 = 0;
      r->pts[0] = last_end - L;
      for (size_t k = 0; k < m - 1; k++)
        {
          r->pts[2 * k + 1] = p[k].s;
          r->pts[2 * k + 2] = p[k].s + p[k].l;
        }
      r->pts[2 * m - 1] = p[m - 1].s;
    }
  else
    for (size_t k = 0; k < m; k++)
      {
        r->pts[2 * k] = p[k].s;
        r->pts[2 * k + 1] = p[k].s + p[k].l;
      }
  return HOLENT_SUCCESS;
}
