/* Unit tests of holent_hd_size, the size inversion shared by strips and
 * balls, on synthetic size functions whose roots and extrema are found
 * independently here by dense scans and bisection (common practice).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include "holent_ctest.h"
#include "holent_hd_size.h"

typedef struct
{
  double amp;     /* size = zs + amp sin(8 zs): not monotonic for amp > 1/8 */
  double zbad;    /* size fails (EDOM) beyond this depth                     */
  int eval_fail;
  int calls;
} toy;

static double
toy_v (const toy *t, double zs)
{
  return zs + t->amp * sin (8 * zs);
}

static int
toy_size (void *ctx, double zs, double w, double *v)
{
  toy *t = ctx;
  (void) w;
  t->calls++;
  if (zs > t->zbad)
    return HOLENT_EDOM;
  *v = toy_v (t, zs);
  return HOLENT_SUCCESS;
}

/* the deeper surface has the smaller area: RT picks the deepest root */
static int
toy_eval (void *ctx, double zs, double w, double *fin, double *cut,
          double *extra)
{
  toy *t = ctx;
  (void) w;
  if (t->eval_fail)
    return HOLENT_ENOCONV;
  *fin = -zs * zs;
  *cut = 1 - zs * zs;
  *extra = zs;
  return HOLENT_SUCCESS;
}

/* deepest root of toy_v = s on (0, 1) by a scan and bisection */
static double
deepest_root (const toy *t, double s)
{
  double best = NAN;
  int N = 200000;
  for (int i = 0; i < N; i++)
    {
      double a = (double) i / N, b = (double) (i + 1) / N;
      if ((toy_v (t, a) - s) * (toy_v (t, b) - s) > 0)
        continue;
      for (int k = 0; k < 60; k++)
        {
          double m = 0.5 * (a + b);
          if ((toy_v (t, a) - s) * (toy_v (t, m) - s) <= 0)
            b = m;
          else
            a = m;
        }
      best = 0.5 * (a + b);
    }
  return best;
}

int
main (void)
{
  gsl_set_error_handler_off ();
  holent_hd_bg bg;
  holent_hd_size_workspace *ws = holent_hd_size_workspace_alloc ();
  HT_CHECK (ws != NULL, "workspace");
  holent_hd_size_workspace_free (NULL);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_BRANE, 1, 1, 1, 1e-3), HOLENT_SUCCESS);

  /* size checks */
  {
    double s[3] = { 0.1, 0.3, 0.2 }, lo, hi;
    size_t bad = 99;
    HT_STATUS (holent_hd_size_check (3, s, &bad, &lo, &hi), HOLENT_SUCCESS);
    HT_CHECK (lo == 0.1 && hi == 0.3, "range %g %g", lo, hi);
    s[1] = NAN;
    HT_STATUS (holent_hd_size_check (3, s, &bad, &lo, &hi), HOLENT_EINVAL);
    HT_CHECK (bad == 1, "bad = %zu", bad);
    s[1] = -1;
    HT_STATUS (holent_hd_size_check (3, s, &bad, &lo, &hi), HOLENT_EDOM);
    s[1] = INFINITY;
    HT_STATUS (holent_hd_size_check (3, s, NULL, &lo, &hi), HOLENT_EDOM);
  }

  /* monotonic size: the root is the inverse function */
  {
    toy t = { 0.05, 2, 0, 0 };
    holent_hd_size_problem pb = { toy_size, toy_eval, &t, 0, 0 };
    double reach, fin, cut, ex, zs;
    HT_STATUS (holent_hd_size_table (NULL, ws, &pb, 0.1, 0.5, 1, 1e-12, &reach), HOLENT_EINVAL);
    HT_STATUS (holent_hd_size_solve (&bg, ws, NULL, 0.3, &fin, &cut, &ex, &zs), HOLENT_EINVAL);
    HT_STATUS (holent_hd_size_table (&bg, ws, &pb, 0.1, 0.5, 1, 1e-12, &reach), HOLENT_SUCCESS);
    /* the largest size at the deepest admissible depth 1 - 1e-12 */
    HT_CLOSE (reach, toy_v (&t, 1 - 1e-12), 1e-12);
    HT_STATUS (holent_hd_size_solve (&bg, ws, &pb, 0.3, &fin, &cut, &ex, &zs), HOLENT_SUCCESS);
    HT_CLOSE (zs, deepest_root (&t, 0.3), 1e-11);
    HT_CLOSE (fin, -zs * zs, 1e-15);
    HT_CLOSE (ex, zs, 1e-15);
    t.eval_fail = 1;
    HT_STATUS (holent_hd_size_solve (&bg, ws, &pb, 0.3, &fin, &cut, &ex, &zs), HOLENT_ENOCONV);
    t.eval_fail = 0;
    /* a failing size function stops the table with its status */
    t.zbad = 0.6;
    HT_STATUS (holent_hd_size_table (&bg, ws, &pb, 0.1, 0.5, 1, 1e-12, &reach), HOLENT_EDOM);
    /* ... and leaves no table to solve on */
    HT_STATUS (holent_hd_size_solve (&bg, ws, &pb, 0.3, &fin, &cut, &ex, &zs), HOLENT_ENOCONV);
  }

  /* not monotonic: three roots for sizes between the local minimum and
     maximum; the deepest (least finite area) is returned and the reach
     is the local maximum found by the minimiser */
  {
    toy t = { 0.3, 2, 0, 0 };
    holent_hd_size_problem pb = { toy_size, toy_eval, &t, 1, 0 };
    double reach, fin, cut, ex, zs, vmax = -1;
    HT_STATUS (holent_hd_size_table (&bg, ws, &pb, 0.2, 0.6, 3.4, 1e-12, &reach), HOLENT_SUCCESS);
    for (int i = 0; i <= 1000000; i++)
      vmax = fmax (vmax, toy_v (&t, i * 1e-6));
    HT_CLOSE (reach, vmax, 1e-9);
    double s[3] = { 0.2, 0.45, 0.6 };
    for (int i = 0; i < 3; i++)
      {
        HT_STATUS (holent_hd_size_solve (&bg, ws, &pb, s[i], &fin, &cut, &ex, &zs), HOLENT_SUCCESS);
        HT_CLOSE (zs, deepest_root (&t, s[i]), 1e-10);
      }
    /* between the local extrema the deepest of three roots, not the first */
    HT_CHECK (zs > 0.7, "deepest root %g", zs);
  }
  holent_hd_size_workspace_free (ws);
  return HT_DONE ();
}
