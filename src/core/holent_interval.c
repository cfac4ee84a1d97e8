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
  if (bg == NULL || (n > 0 && (l == NULL || S == NULL)))
    return HOLENT_EINVAL;

  const double c6 = bg->c / 6.0, L = bg->L, two_eps = 2.0 * bg->eps;
  const long nn = (long) n;
  long nshort = 0, nbad = 0;

  /* One fused pass: check, count short intervals and evaluate.  Invalid
     entries are only counted here and located afterwards, so the loop
     has no early exit and parallelises.  */
#pragma omp parallel for schedule(static) reduction(+ : nshort, nbad) if (nn > 20000)
  for (long i = 0; i < nn; i++)
    {
      const double li = l[i];
      double s = 0.0;
      unsigned char b = 0;
      if (!length_ok (bg, li))
        nbad++;
      else
        {
          nshort += li <= two_eps;
          if (!bg->circle)
            s = c6 * holent_geo_len_unchecked (bg, li);
          else if (li >= L)
            {
              s = bg->S_BH;  /* whole circle: only the horizon, or nothing */
              b = 1;
            }
          else
            {
              /* both arcs lie in (0, L), which every circle bulk accepts */
              const double d = c6 * holent_geo_len_unchecked (bg, li);
              const double cp = c6 * holent_geo_len_unchecked (bg, L - li)
                                + bg->S_BH;
              /* Without a horizon both sides give the same surface up to
                 rounding when l = L/2; name the branch by geometry then.  */
              if (bg->horizon)
                b = cp < d;
              else
                b = li > L - li;
              s = b ? cp : d;
            }
        }
      S[i] = s;
      if (branch)
        branch[i] = b;
    }

  if (nbad > 0)
    {
      for (size_t i = 0; i < n; i++)
        if (!length_ok (bg, l[i]))
          {
            if (bad)
              *bad = i;
            return isnan (l[i]) ? HOLENT_EINVAL : HOLENT_EDOM;
          }
    }
  if (n_short)
    *n_short = (size_t) nshort;
  return HOLENT_SUCCESS;
}
