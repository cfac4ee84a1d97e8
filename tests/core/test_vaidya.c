/* Unit tests of holent_vaidya: shots entirely before a thin shell
 * against the vacuum strip (Ryu and Takayanagi 2006, closed forms checked
 * against GSL QAWS in test_strip.c), shots entirely after it against the
 * static brane strip and the tortoise coordinate by GSL QAG, the early
 * growth of S(t) (Liu and Suh 2014, PRD 89, 066012: dS = (pi/(d-1)) E A
 * t^2), saturation, and the error paths.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_integration.h>
#include "holent_ctest.h"
#include "holent_vaidya.h"
#include "holent_strip.h"

static double
inv_f4 (double z, void *p)
{
  (void) p;
  return 1 / (1 - gsl_pow_int (z, 4));
}


int
main (void)
{
  gsl_set_error_handler_off ();
  holent_hd_bg F;
  holent_vaidya_workspace *w = holent_vaidya_workspace_alloc ();
  holent_strip_workspace *sw = holent_strip_workspace_alloc ();
  HT_CHECK (w != NULL && sw != NULL, "workspaces");
  holent_vaidya_workspace_free (NULL);
  HT_STATUS (holent_hd_bg_init (&F, 4, HOLENT_HD_BRANE, 1, 1, 1, 1e-3), HOLENT_SUCCESS);
  double lh, tb, j;
  /* before the shell: the vacuum strip, v = t - z */
  for (int d = 3; d <= 5; d++)
    {
      holent_hd_bg Fd;
      HT_STATUS (holent_hd_bg_init (&Fd, d, HOLENT_HD_BRANE, 1, 1, 1, 1e-3), HOLENT_SUCCESS);
      HT_STATUS (holent_vaidya_shoot (&Fd, 0, w, 0.7, -3, &lh, &tb, &j), HOLENT_SUCCESS);
      HT_CLOSE (2 * lh, 0.7 * holent_strip_ratio (d), 1e-10);
      HT_CLOSE (tb, -3 + 0.7, 1e-10);
      HT_CLOSE (j, holent_strip_vacuum_j (d) * pow (0.7, 2 - d), 1e-9);
    }
  /* d = 2: the vacuum interval, finite area log(2 z*) = log(l) per
     2/(4G) (Ryu and Takayanagi 2006, PRL 96, 181602: S = (c/3) log(l/eps)
     with c = 3/(2G)) */
  {
    holent_hd_bg F2;
    HT_STATUS (holent_hd_bg_init (&F2, 2, HOLENT_HD_BRANE, 1, 1, 1, 1e-3), HOLENT_SUCCESS);
    HT_STATUS (holent_vaidya_shoot (&F2, 0, w, 0.7, -3, &lh, &tb, &j), HOLENT_SUCCESS);
    HT_CLOSE (2 * lh, 1.4, 1e-10);
    HT_CLOSE (tb, -3 + 0.7, 1e-10);
    HT_CLOSE (j, log (1.4), 1e-9);
  }
  /* after the shell: the static brane strip; t - v* = int_0^z* dz/f */
  {
    double l = 1.5, S, fin, zs, r, err;
    HT_STATUS (holent_strip_entropy (&F, sw, 1, 1, &l, &S, &fin, NULL, &zs, NULL, NULL), HOLENT_SUCCESS);
    HT_STATUS (holent_vaidya_shoot (&F, 0, w, zs, 0.5, &lh, &tb, &j), HOLENT_SUCCESS);
    HT_CLOSE (2 * lh, l, 1e-9);
    HT_CLOSE (0.5 * j, fin, 1e-9);  /* fin = (2/(4G)) j, G = 1 */
    gsl_integration_workspace *iw = gsl_integration_workspace_alloc (200);
    gsl_function G = { inv_f4, NULL };
    gsl_integration_qag (&G, 0, zs, 0, 1e-13, 200, 6, iw, &r, &err);
    gsl_integration_workspace_free (iw);
    HT_CLOSE (tb - 0.5, r, 1e-9);
    /* a smooth shell far after its passage: the same */
    HT_STATUS (holent_vaidya_shoot (&F, 0.05, w, zs, 3, &lh, &tb, &j), HOLENT_SUCCESS);
    HT_CLOSE (2 * lh, l, 1e-9);
    /* S(t): vacuum before, early t^2 growth, static after saturation */
    double t[5] = { 3, -0.2, 0.01, 0.02, 0.04 }, St[5], ft[5], zt[5], vt[5];
    unsigned char jt[5];
    size_t bad = 99;
    HT_STATUS (holent_vaidya_strip (&F, 0, w, 1, l, 5, t, St, ft, zt, vt, jt, &bad), HOLENT_SUCCESS);
    double zv = l / holent_strip_ratio (4), fv = 0.5 * holent_strip_vacuum_j (4) / (zv * zv);
    HT_CLOSE (ft[1], fv, 1e-10);
    HT_CLOSE (ft[0], fin, 1e-9);
    HT_CLOSE (St[0] - ft[0], 0.5 / (2 * 1e-6), 1e-12);  /* divergence */
    /* E = 3/(16 pi), A = 2: (pi/3) E A t^2 = t^2/8 */
    for (int i = 2; i < 5; i++)
      HT_CHECK (fabs ((ft[i] - fv) / (t[i] * t[i] / 8) - 1) < 3 * t[i], "t = %g: %g", t[i], (ft[i] - fv) / (t[i] * t[i] / 8));
    /* errors */
    HT_STATUS (holent_vaidya_strip (NULL, 0, w, 1, l, 5, t, St, ft, zt, vt, jt, &bad), HOLENT_EINVAL);
    HT_STATUS (holent_vaidya_strip (&F, -1, w, 1, l, 5, t, St, ft, zt, vt, jt, &bad), HOLENT_EDOM);
    HT_STATUS (holent_vaidya_strip (&F, 0, w, 1, -l, 5, t, St, ft, zt, vt, jt, &bad), HOLENT_EDOM);
    t[3] = NAN;
    HT_STATUS (holent_vaidya_strip (&F, 0, w, 1, l, 5, t, St, ft, zt, vt, jt, &bad), HOLENT_EINVAL);
    HT_CHECK (bad == 3, "bad = %zu", bad);
    HT_STATUS (holent_vaidya_strip (&F, 0, w, 1, l, 0, t, St, NULL, NULL, NULL, NULL, &bad), HOLENT_SUCCESS);
  }
  /* a refraction that turns the surface deeper (z' >= -1 after the
     shell): the shot goes back to x and still reaches the boundary
     (before, it stalled at v = 0); a deeper tip falls in */
  HT_STATUS (holent_vaidya_shoot (&F, 0, w, 2.72, -1.5, &lh, &tb, &j), HOLENT_SUCCESS);
  HT_CHECK (lh > 1.2 && lh < 1.3 && tb > 1.5 && tb < 2, "lh %g tb %g", lh, tb);
  HT_STATUS (holent_vaidya_shoot (&F, 0, w, 2.76, -1.5, &lh, &tb, &j), HOLENT_ENOCONV);
  /* a wide strip (l = 3 zh) from the vacuum to saturation through its
     swallow tail: vacuum before, the static brane strip after (Ryu and
     Takayanagi 2006 closed form; holent_strip_entropy), one change of
     branch, S non-decreasing */
  {
    double l = 3, tt[6] = { -0.1, 1.0, 2.0, 2.5, 2.7, 3.5 }, St[6], ft[6];
    unsigned char jt[6];
    double S, fin, zs;
    HT_STATUS (holent_vaidya_strip (&F, 0, w, 1, l, 6, tt, St, ft, NULL, NULL, jt, NULL), HOLENT_SUCCESS);
    HT_STATUS (holent_strip_entropy (&F, sw, 1, 1, &l, &S, &fin, NULL, &zs, NULL, NULL), HOLENT_SUCCESS);
    double zv = l / holent_strip_ratio (4);
    HT_CLOSE (ft[0], 0.5 * holent_strip_vacuum_j (4) / (zv * zv), 1e-10);
    HT_CLOSE (ft[5], fin, 1e-10);
    int nj = 0;
    for (int i = 1; i < 6; i++)
      {
        nj += jt[i];
        HT_CHECK (ft[i] >= ft[i - 1] - 1e-12, "S decreases at t = %g", tt[i]);
      }
    HT_CHECK (nj == 1 && jt[4] == 1, "jumps %d", nj);
  }
  HT_STATUS (holent_vaidya_shoot (&F, 0, w, -1, 0, &lh, &tb, &j), HOLENT_EDOM);
  HT_STATUS (holent_vaidya_shoot (NULL, 0, w, 1, 0, &lh, &tb, &j), HOLENT_EINVAL);
  holent_hd_bg V;
  HT_STATUS (holent_hd_bg_init (&V, 4, HOLENT_HD_VACUUM, 1, 1, 1, 1e-3), HOLENT_SUCCESS);
  double t0 = 1, S0;
  HT_STATUS (holent_vaidya_strip (&V, 0, w, 1, 1, 1, &t0, &S0, NULL, NULL, NULL, NULL, NULL), HOLENT_EDOM);
  /* the poll: EINTR at the second time */
  {
    int calls = 0;
    holent_poll poll = { ht_stop_second, &calls };
    double tt[3] = { -1, -0.5, -0.2 }, Sp[3];
    holent_vaidya_workspace_set_poll (w, &poll);
    HT_STATUS (holent_vaidya_strip (&F, 0, w, 1, 0.5, 3, tt, Sp, NULL, NULL, NULL, NULL, NULL), HOLENT_EINTR);
    HT_CHECK (calls == 2, "calls %d", calls);
    holent_vaidya_workspace_set_poll (w, NULL);
  }
  holent_strip_workspace_free (sw);
  holent_vaidya_workspace_free (w);
  return HT_DONE ();
}
