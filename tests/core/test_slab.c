/* SPDX-License-Identifier: GPL-3.0-or-later
 * Unit tests of holent_slab: the slabs cover [0, n) once, in order, at
 * most SLAB values each; the poll is asked between slabs only, with the
 * values done so far and the total; a stop request ends the run with
 * HOLENT_EINTR before the next slab; a kernel's status ends it at once.
 * Then the interval kernel run in slabs over 3e6 lengths (a slab boundary
 * falls inside its 512-value blocks) gives the same bits as one call, and
 * stops after the first slab when the poll says so.  */
#include <stdlib.h>
#include <string.h>
#include "holent_ctest.h"
#include "holent_slab.h"
#include "holent_interval.h"

typedef struct
{
  size_t next, calls, maxm, fail_at;
  int order_ok;
} cover;

static int
cover_fn (void *ctx, size_t i0, size_t m)
{
  cover *c = ctx;
  if (i0 != c->next || m == 0)
    c->order_ok = 0;
  c->next = i0 + m;
  c->calls++;
  if (m > c->maxm)
    c->maxm = m;
  return c->calls == c->fail_at ? HOLENT_EDOM : HOLENT_SUCCESS;
}

typedef struct
{
  int calls;
  double done[8], total;
} seen;

static int
record (void *ctx, double done, double total)
{
  seen *s = ctx;
  if (s->calls < 8)
    s->done[s->calls] = done;
  s->calls++;
  s->total = total;
  return 0;
}

typedef struct
{
  const holent_geo_bg *bg;
  const double *l;
  double *S;
  unsigned char *br;
  size_t nshort;
} iv_job;

static int
iv_fn (void *ctx, size_t i0, size_t m)
{
  iv_job *j = ctx;
  size_t bad = 0, ns = 0;
  int st = holent_interval_entropy (j->bg, m, j->l + i0, j->S + i0,
                                    j->br + i0, &bad, &ns);
  j->nshort += ns;
  return st;
}

int
main (void)
{
  /* coverage, order, slab size, polls between slabs */
  {
    cover c = { 0, 0, 0, 0, 1 };
    seen s;
    memset (&s, 0, sizeof s);
    holent_poll p = { record, &s };
    HT_STATUS (holent_slab_run (10, 3, cover_fn, &c, &p), HOLENT_SUCCESS);
    HT_CHECK (c.order_ok && c.next == 10 && c.calls == 4 && c.maxm == 3,
              "slabs of 3 over 10: next %zu calls %zu max %zu", c.next,
              c.calls, c.maxm);
    HT_CHECK (s.calls == 3 && s.done[0] == 3 && s.done[1] == 6
              && s.done[2] == 9 && s.total == 10,
              "polls %d (%g %g %g of %g)", s.calls, s.done[0], s.done[1],
              s.done[2], s.total);
  }
  /* one slab (and n = 0): no poll at all; 0 means the default slab */
  {
    cover c = { 0, 0, 0, 0, 1 };
    int k = 0;
    holent_poll p = { ht_stop_second, &k };
    HT_STATUS (holent_slab_run (5, 5, cover_fn, &c, &p), HOLENT_SUCCESS);
    HT_STATUS (holent_slab_run (0, 5, cover_fn, &c, &p), HOLENT_SUCCESS);
    HT_CHECK (k == 0 && c.calls == 1, "polls %d, calls %zu", k, c.calls);
    cover d = { 0, 0, 0, 0, 1 };
    HT_STATUS (holent_slab_run (HOLENT_SLAB_VALUES + 1, 0, cover_fn, &d,
                                NULL), HOLENT_SUCCESS);
    HT_CHECK (d.calls == 2 && d.maxm == HOLENT_SLAB_VALUES && d.order_ok,
              "default slab: calls %zu max %zu", d.calls, d.maxm);
    HT_STATUS (holent_slab_run (5, 1, NULL, &c, &p), HOLENT_EINVAL);
  }
  /* a stop request: the slab before it ran, none after */
  {
    cover c = { 0, 0, 0, 0, 1 };
    int k = 0;
    holent_poll p = { ht_stop_second, &k };
    HT_STATUS (holent_slab_run (100, 10, cover_fn, &c, &p), HOLENT_EINTR);
    HT_CHECK (k == 2 && c.calls == 2 && c.next == 20,
              "stopped after %zu slabs (%d polls)", c.calls, k);
    holent_poll none = { NULL, NULL };
    cover d = { 0, 0, 0, 0, 1 };
    HT_STATUS (holent_slab_run (100, 10, cover_fn, &d, &none),
               HOLENT_SUCCESS);
    HT_CHECK (d.calls == 10, "calls %zu", d.calls);
  }
  /* a kernel's status ends the run at that slab */
  {
    cover c = { 0, 0, 0, 3, 1 };
    HT_STATUS (holent_slab_run (100, 10, cover_fn, &c, NULL), HOLENT_EDOM);
    HT_CHECK (c.calls == 3 && c.next == 30, "calls %zu", c.calls);
  }
  /* the interval kernel in slabs: the same bits as one call */
  {
    holent_geo_bg bg;
    HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_BTZ, 2 * M_PI, 1e-6,
                                   1.0, 1.0, 1.0, 3.0), HOLENT_SUCCESS);
    size_t n = 3000000, bad = 0, ns1 = 0;
    double *l = malloc (n * sizeof *l), *S1 = malloc (n * sizeof *S1);
    double *S2 = malloc (n * sizeof *S2);
    unsigned char *b1 = malloc (n), *b2 = malloc (n);
    HT_CHECK (l && S1 && S2 && b1 && b2, "out of memory");
    if (l && S1 && S2 && b1 && b2)
      {
        for (size_t i = 0; i < n; i++)
          l[i] = 2 * M_PI * (i + 1.0) / n;   /* up to the whole circle */
        HT_STATUS (holent_interval_entropy (&bg, n, l, S1, b1, &bad, &ns1),
                   HOLENT_SUCCESS);
        iv_job j = { &bg, l, S2, b2, 0 };
        seen s;
        memset (&s, 0, sizeof s);
        holent_poll p = { record, &s };
        HT_STATUS (holent_slab_run (n, 1000003, iv_fn, &j, &p),
                   HOLENT_SUCCESS);
        HT_CHECK (memcmp (S1, S2, n * sizeof *S1) == 0
                  && memcmp (b1, b2, n) == 0 && j.nshort == ns1,
                  "slabs differ from one call");
        HT_CHECK (s.calls == 2, "polls %d", s.calls);
        /* a stop after the first slab: EINTR, the rest not written */
        int k = 1;
        holent_poll stop = { ht_stop_second, &k };
        S2[n - 1] = -1.0;
        HT_STATUS (holent_slab_run (n, 1000003, iv_fn, &j, &stop),
                   HOLENT_EINTR);
        HT_CHECK (S2[n - 1] == -1.0, "the last slab ran after a stop");
      }
    free (l);
    free (S1);
    free (S2);
    free (b1);
    free (b2);
  }
  return HT_DONE ();
}
