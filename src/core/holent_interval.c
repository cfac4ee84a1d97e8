/* holent_interval.c: single-interval RT entropies (entanglement plateaux
 * on the BTZ circle).  GPL-3.0-or-later.  */
#include <math.h>
#include "holent_interval.h"

static int
length_ok (const holent_geo_bg *bg, double l)
{
  if (!isfinite (l) || !(l > 0.0))
    return 0;
  return bg->circle ? l <= bg->L : 1;
}

int
holent_interval_entropy (const holent_geo_bg *bg, size_t n, const double *l,
                         double *S, unsigned char *branch, size_t *bad,
                         size_t *n_short)
{
  size_t nshort = 0;
  if (bg == NULL || (n > 0 && (l == NULL || S == NULL)))
    return HOLENT_EINVAL;
  for (size_t i = 0; i < n; i++)
    {
      if (!length_ok (bg, l[i]))
        {
          if (bad)
            *bad = i;
          return isnan (l[i]) ? HOLENT_EINVAL : HOLENT_EDOM;
        }
      if (l[i] <= 2.0 * bg->eps)
        nshort++;
    }
  if (n_short)
    *n_short = nshort;

  const double c6 = bg->c / 6.0;
  const long nn = (long) n;
  int status = HOLENT_SUCCESS;

#pragma omp parallel for schedule(static) if (nn > 20000)
  for (long i = 0; i < nn; i++)
    {
      double d, cp, s;
      unsigned char b = 0;
      if (!bg->circle)
        {
          (void) holent_geo_arc_length (bg, l[i], &d);
          s = c6 * d;
        }
      else if (l[i] >= bg->L)
        {
          s = bg->S_BH;  /* whole circle: only the horizon (or nothing) */
          b = 1;
        }
      else
        {
          /* Both arcs lie in (0, L): arc_length cannot fail here.  */
          (void) holent_geo_arc_length (bg, l[i], &d);
          (void) holent_geo_arc_length (bg, bg->L - l[i], &cp);
          d *= c6;
          cp = c6 * cp + bg->S_BH;
          s = d;
          if (cp < d)
            {
              s = cp;
              b = 1;
            }
        }
      S[i] = s;
      if (branch)
        branch[i] = b;
    }
  return status;
}
