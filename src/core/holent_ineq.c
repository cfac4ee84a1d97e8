/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_ineq.c: instances of the entropy inequalities, enumerated
 * without storing them (memory O(1) beyond the entropy vector).
 * Definitions and instance sets are in holent_ineq.h.
 * GPL-3.0-or-later.  */
#include <math.h>
#include <string.h>
#include "holent_ineq.h"

typedef struct
{
  const double *s;    /* s[k - 1] = S(subset k) */
  holent_ineq_family fam;
  unsigned t;         /* regions per instance */
  unsigned k;         /* cyclic: m = 2k + 1 */
  uint32_t full;      /* all n parties */
  double tol;         /* scaled like s */
  double inv;         /* 2^-e with max |s| < 2^e: sums of a few scaled
                         entries cannot overflow, and scaling is exact */
  holent_ineq_result *res;
  const holent_poll *poll;
  double done, total, next;  /* tuples visited, expected, next poll */
  int stop;
} walk;

/* S of a non-empty union (mask 0 never occurs: regions are non-empty),
   scaled.  */
#define SS(w, x) ((w)->s[(x) - 1] * (w)->inv)

/* Poll the caller every 2^16 tuples.  */
#define POLL_EVERY 65536.0
static void
tick (walk *w)
{
  w->next = w->done + POLL_EVERY;
  if (w->poll != NULL && w->poll->fn != NULL
      && w->poll->fn (w->poll->ctx, w->done, w->total))
    w->stop = 1;
}
#define TICK(w) \
  do { if (++(w)->done >= (w)->next) tick (w); } while (0)

/* The power of two 2^-e with max |s_i| < 2^e (1 when every s_i is 0).  */
static double
inv_scale (const double *s, size_t len)
{
  double mx = 0.0;
  int e;
  for (size_t i = 0; i < len; i++)
    mx = fmax (mx, fabs (s[i]));
  if (mx == 0.0 || !isfinite (mx))
    return 1.0;
  frexp (mx, &e);
  return ldexp (1.0, -e);
}

static double
value_of (const walk *w, const uint32_t *r)
{
  uint32_t x, y, z, all;
  double v;
  unsigned i, j, m;
  switch (w->fam)
    {
    case HOLENT_INEQ_SA:
      return SS (w, r[0]) + SS (w, r[1]) - SS (w, r[0] | r[1]);
    case HOLENT_INEQ_AL:
      return SS (w, r[0] | r[1]) + SS (w, r[1]) - SS (w, r[0]);
    case HOLENT_INEQ_SSA:
      x = r[0], y = r[1], z = r[2];
      return SS (w, x | y) + SS (w, y | z) - SS (w, y) - SS (w, x | y | z);
    case HOLENT_INEQ_WM:
      x = r[0], y = r[1], z = r[2];
      return SS (w, x | y) + SS (w, y | z) - SS (w, x) - SS (w, z);
    case HOLENT_INEQ_MMI:
      x = r[0], y = r[1], z = r[2];
      return SS (w, x | y) + SS (w, y | z) + SS (w, x | z) - SS (w, x)
             - SS (w, y) - SS (w, z) - SS (w, x | y | z);
    case HOLENT_INEQ_CYCLIC:
    default:
      /* sum_i S(X_i | X_{i+1} .. X_{i+k}) - S(all), indices mod m */
      m = w->t;
      v = 0.0;
      all = 0;
      for (i = 0; i < m; i++)
        {
          uint32_t u = 0;
          for (j = 1; j <= w->k; j++)
            u |= r[(i + j) % m];
          v += SS (w, u | r[i]) - SS (w, u);
          all |= r[i];
        }
      return v - SS (w, all);
    }
}

static void
visit (walk *w, const uint32_t *r)
{
  double v = value_of (w, r);
  holent_ineq_result *res = w->res;
  res->count += 1.0;
  if (isnan (v))
    {
      /* cannot happen for finite scaled entries; never count it as
         holding if it does */
      res->undecided += 1.0;
      return;
    }
  if (v < -w->tol)
    res->violated += 1.0;
  if (v < res->worst)
    {
      res->worst = v;
      res->nregions = w->t;
      memcpy (res->regions, r, w->t * sizeof r[0]);
    }
}

/* Is r[0..t-1] the representative of its symmetry orbit?  */
static int
canonical (const walk *w, const uint32_t *r)
{
  unsigned j;
  switch (w->fam)
    {
    case HOLENT_INEQ_SA:
      return r[0] < r[1];
    case HOLENT_INEQ_AL:
      return 1;
    case HOLENT_INEQ_SSA:
    case HOLENT_INEQ_WM:
      return r[0] < r[2];
    case HOLENT_INEQ_MMI:
      return r[0] < r[1] && r[1] < r[2];
    case HOLENT_INEQ_CYCLIC:
    default:
      for (j = 1; j < w->t; j++)
        if (r[j] < r[0])
          return 0;
      return r[1] < r[w->t - 1];
    }
}

/* A bound the region at depth d must exceed for the tuple to be able to
   be canonical (0: none).  */
static uint32_t
floor_of (const walk *w, const uint32_t *r, unsigned d)
{
  switch (w->fam)
    {
    case HOLENT_INEQ_SA:
    case HOLENT_INEQ_MMI:
      return d > 0 ? r[d - 1] : 0;
    case HOLENT_INEQ_SSA:
    case HOLENT_INEQ_WM:
      return d == 2 ? r[0] : 0;
    case HOLENT_INEQ_CYCLIC:
      return d > 0 ? r[0] : 0;
    default:
      return 0;
    }
}

/* Every ordered tuple of disjoint non-empty regions, depth d onwards,
   with the parties in used already taken; keep the canonical ones.  */
static void
all_tuples (walk *w, uint32_t *r, unsigned d, uint32_t used)
{
  uint32_t rest = w->full & ~used, x, lo;
  if (d == w->t)
    {
      if (canonical (w, r))
        visit (w, r);
      TICK (w);
      return;
    }
  lo = floor_of (w, r, d);
  /* the non-empty submasks of rest in increasing order (ends at 0), so
     that the first worst instance found has the lowest parties */
  for (x = (0u - rest) & rest; x && !w->stop; x = (x - rest) & rest)
    {
      if (x <= lo)
        continue;
      r[d] = x;
      all_tuples (w, r, d + 1, used | x);
    }
}

/* Triples of single parties, then triples covering all parties.  */
static void
subset_triples (walk *w, unsigned n)
{
  uint32_t r[3], x, y;
  unsigned a, b, c;
  for (a = 0; a < n; a++)
    for (b = 0; b < n; b++)
      for (c = 0; c < n; c++)
        if (a != b && b != c && a != c)
          {
            r[0] = 1u << a, r[1] = 1u << b, r[2] = 1u << c;
            if (canonical (w, r))
              visit (w, r);
          }
  for (x = 1; x <= w->full && !w->stop; x++)
    {
      uint32_t rest = w->full & ~x;
      for (y = (0u - rest) & rest; y; y = (y - rest) & rest)
        {
          r[0] = x, r[1] = y, r[2] = rest & ~y;
          if (r[2] && canonical (w, r))
            visit (w, r);
          TICK (w);
        }
    }
}

/* Cyclic, m >= 5: increasing single parties, then consecutive blocks.  */
static void
subset_cyclic (walk *w, unsigned n)
{
  unsigned m = w->t, idx[HOLENT_INEQ_NMAX], j;
  uint32_t r[HOLENT_INEQ_NMAX];
  /* combinations i_0 < .. < i_{m-1} of 0 .. n-1, lexicographic */
  for (j = 0; j < m; j++)
    idx[j] = j;
  for (;;)
    {
      for (j = 0; j < m; j++)
        r[j] = 1u << idx[j];
      visit (w, r);
      TICK (w);
      if (w->stop)
        return;
      for (j = m; j-- > 0;)
        if (idx[j] < n - m + j)
          break;
      if (j == (unsigned) -1)
        break;
      idx[j]++;
      for (j++; j < m; j++)
        idx[j] = idx[j - 1] + 1;
    }
  if (m == n)
    return;  /* the only cut into n blocks is the singletons, done */
  /* cuts: block j holds parties idx[j-1] .. idx[j]-1, with idx[-1] = 0
     and idx[m-1] = n; choose the m - 1 interior cut points in 1 .. n-1 */
  for (j = 0; j + 1 < m; j++)
    idx[j] = j + 1;
  for (;;)
    {
      unsigned lo = 0;
      for (j = 0; j < m; j++)
        {
          unsigned hi = j + 1 < m ? idx[j] : n;
          r[j] = (uint32_t) (((1u << hi) - 1u) & ~((1u << lo) - 1u));
          lo = hi;
        }
      visit (w, r);
      TICK (w);
      if (w->stop)
        return;
      for (j = m - 1; j-- > 0;)
        if (idx[j] < n - (m - 1) + j)
          break;
      if (j == (unsigned) -1)
        break;
      idx[j]++;
      for (j++; j + 1 < m; j++)
        idx[j] = idx[j - 1] + 1;
    }
}

int
holent_ineq_nparties (size_t len, unsigned *n)
{
  unsigned k;
  if (n == NULL)
    return HOLENT_EINVAL;
  for (k = 1; k < 8 * sizeof (size_t) - 1; k++)
    if (len == ((size_t) 1 << k) - 1)
      {
        if (k > HOLENT_INEQ_NMAX)
          return HOLENT_ETOOBIG;
        *n = k;
        return HOLENT_SUCCESS;
      }
  return HOLENT_EDOM;
}

int
holent_ineq_nregions (holent_ineq_family fam, unsigned m, unsigned *t)
{
  if (t == NULL)
    return HOLENT_EINVAL;
  switch (fam)
    {
    case HOLENT_INEQ_SA:
    case HOLENT_INEQ_AL:
      *t = 2;
      return HOLENT_SUCCESS;
    case HOLENT_INEQ_SSA:
    case HOLENT_INEQ_WM:
    case HOLENT_INEQ_MMI:
      *t = 3;
      return HOLENT_SUCCESS;
    case HOLENT_INEQ_CYCLIC:
      if (m < 3 || m % 2 == 0 || m > HOLENT_INEQ_NMAX)
        return HOLENT_EDOM;
      *t = m;
      return HOLENT_SUCCESS;
    default:
      return HOLENT_EINVAL;
    }
}

static int
setup (walk *w, unsigned n, const double *s, holent_ineq_family fam,
       unsigned m, unsigned *t)
{
  int st;
  if (s == NULL)
    return HOLENT_EINVAL;
  if (n == 0)
    return HOLENT_EDOM;
  if (n > HOLENT_INEQ_NMAX)
    return HOLENT_ETOOBIG;
  if ((st = holent_ineq_nregions (fam, m, t)))
    return st;
  if (fam == HOLENT_INEQ_CYCLIC && m > n)
    return HOLENT_EDOM;
  w->s = s;
  w->inv = inv_scale (s, ((size_t) 1 << n) - 1);
  w->poll = NULL;
  w->stop = 0;
  w->done = 0.0;
  w->next = POLL_EVERY;
  w->total = 0.0;
  w->fam = fam;
  w->t = *t;
  w->k = (*t - 1) / 2;
  w->full = (uint32_t) ((1u << n) - 1u);
  return HOLENT_SUCCESS;
}

int
holent_ineq_value (unsigned n, const double *s, holent_ineq_family fam,
                   unsigned m, const uint32_t *regions, double *value)
{
  walk w;
  unsigned t, j;
  uint32_t used = 0;
  int st;
  if (regions == NULL || value == NULL)
    return HOLENT_EINVAL;
  if ((st = setup (&w, n, s, fam, m, &t)))
    return st;
  for (j = 0; j < t; j++)
    {
      if (regions[j] == 0 || (regions[j] & ~w.full))
        return HOLENT_EDOM;
      if (regions[j] & used)
        return HOLENT_EOVERLAP;
      used |= regions[j];
    }
  /* exact unless the unscaled value leaves the double range (+-Inf) */
  *value = value_of (&w, regions) / w.inv;
  return HOLENT_SUCCESS;
}

/* Roughly how many tuples the enumeration visits (for progress only).  */
static double
expected_tuples (const walk *w, unsigned n, int complete)
{
  double t = w->t, ordered = 0.0, binom = 1.0;
  if (!complete)
    {
      if (w->t == 3)
        return pow (3.0, n);
      return 2.0 * pow (2.0, n < 30 ? n : 30);
    }
  /* ordered t-tuples of disjoint non-empty sets, by inclusion-exclusion */
  for (unsigned j = 0; j <= w->t; j++)
    {
      ordered += (j % 2 ? -1.0 : 1.0) * binom * pow (t + 1.0 - j, n);
      binom = binom * (t - j) / (j + 1.0);
    }
  switch (w->fam)
    {
    case HOLENT_INEQ_SA: case HOLENT_INEQ_SSA: case HOLENT_INEQ_WM:
      return ordered / 2.0;
    case HOLENT_INEQ_MMI:
      return ordered / 6.0;
    case HOLENT_INEQ_CYCLIC:
      return ordered / t;
    default:
      return ordered;
    }
}

int
holent_ineq_eval (unsigned n, const double *s, holent_ineq_family fam,
                  unsigned m, int complete, double tol,
                  holent_ineq_result *res, const holent_poll *poll)
{
  walk w;
  unsigned t;
  size_t i;
  uint32_t r[HOLENT_INEQ_NMAX];
  int st;
  if (res == NULL || isnan (tol))
    return HOLENT_EINVAL;
  if ((st = setup (&w, n, s, fam, m, &t)))
    return st;
  if (!(tol >= 0.0) || isinf (tol))
    return HOLENT_EDOM;
  for (i = 0; i < ((size_t) 1 << n) - 1; i++)
    if (!isfinite (s[i]))
      return HOLENT_EINVAL;
  /* SA and AL: the subset is the complete set */
  if (t == 2)
    complete = 1;
  if (complete && pow (t + 1.0, n) > HOLENT_INEQ_BUDGET)
    return HOLENT_ETOOBIG;
  w.tol = tol * w.inv;
  w.res = res;
  w.poll = poll;
  w.total = expected_tuples (&w, n, complete);
  res->count = res->violated = res->undecided = 0.0;
  res->worst = INFINITY;
  res->nregions = 0;
  memset (res->regions, 0, sizeof res->regions);
  if (complete)
    all_tuples (&w, r, 0, 0);
  else if (t == 3)
    subset_triples (&w, n);
  else
    subset_cyclic (&w, n);
  if (w.stop)
    return HOLENT_EINTR;
  /* back to the caller's scale: +-Inf only when the worst value itself
     is beyond the double range */
  if (isfinite (res->worst))
    res->worst /= w.inv;
  return HOLENT_SUCCESS;
}
