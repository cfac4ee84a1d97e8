/* Unit tests of holent_strip: every error path, the closed forms
 * against GSL's QAWS on the untransformed integrands, and the physics
 * checks written in doc/higher_dimensional.md.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_integration.h>
#include <gsl/gsl_sf_gamma.h>
#include "holent_ctest.h"
#include "holent_strip.h"

/* width integrand without the (1 - u)^(-1/2) weight, for QAWS:
   u^(d-1) / sqrt(f(zs u) (1 - u^(2d-2))/(1 - u)), brane zh = 1 */
typedef struct { int d; double zs; } wp;

static double
w_int (double u, void *p)
{
  const wp *q = p;
  double f = 1 - gsl_pow_int (q->zs * u, q->d);
  double ratio = 0;
  for (int k = 0; k < 2 * q->d - 2; k++)
    ratio += gsl_pow_int (u, k);
  return gsl_pow_int (u, q->d - 1) / sqrt (f * ratio);
}

static double
a_int (double u, void *p)
{
  const wp *q = p;
  return w_int (u, p) / gsl_pow_int (u, 2 * q->d - 2);
}

static void
test_closed_forms (void)
{
  /* l/z* = 2 sqrt(pi) G(d/(2d-2))/G(1/(2d-2)) against GSL's QAWS on the
     width integral with its (1-u)^(-1/2) weight (vacuum: zs -> 0).  */
  gsl_integration_workspace *iw = gsl_integration_workspace_alloc (500);
  gsl_integration_qaws_table *t = gsl_integration_qaws_table_alloc (0, -0.5, 0, 0);
  for (int d = 3; d <= 8; d++)
    {
      wp p = { d, 0.0 };
      gsl_function F = { w_int, &p };
      double r, e;
      HT_STATUS (gsl_integration_qaws (&F, 0, 1, t, 0, 1e-13, 500, iw, &r, &e), 0);
      HT_CLOSE (holent_strip_ratio (d), 2 * r, 1e-12);
    }
  gsl_integration_qaws_table_free (t);
  gsl_integration_workspace_free (iw);
}

static void
test_strip (void)
{
  holent_hd_bg bg;
  holent_strip_workspace *w = holent_strip_workspace_alloc ();
  size_t bad = 99;
  double reach;
  HT_CHECK (w != NULL, "workspace");
  holent_strip_workspace_free (NULL);

  /* errors */
  double l[4] = { 0.2, 1.0, 2.0, 3.0 }, S[4], fin[4], del[4], zs[4];
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_BRANE, 1, 1, 1, 1e-4), HOLENT_SUCCESS);
  HT_STATUS (holent_strip_entropy (NULL, w, 1, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_EINVAL);
  HT_STATUS (holent_strip_entropy (&bg, NULL, 1, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_EINVAL);
  HT_STATUS (holent_strip_entropy (&bg, w, 1, 4, NULL, S, fin, del, zs, &bad, &reach), HOLENT_EINVAL);
  HT_STATUS (holent_strip_entropy (&bg, w, NAN, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_EINVAL);
  HT_STATUS (holent_strip_entropy (&bg, w, -1, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_EDOM);
  l[2] = -2;
  HT_STATUS (holent_strip_entropy (&bg, w, 1, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_EDOM);
  HT_CHECK (bad == 2, "bad = %zu", bad);
  l[2] = NAN;
  HT_STATUS (holent_strip_entropy (&bg, w, 1, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_EINVAL);
  l[2] = 2;
  HT_STATUS (holent_strip_entropy (&bg, w, 1, 0, l, S, fin, del, zs, &bad, &reach), HOLENT_SUCCESS);

  /* brane, d = 4: the width against GSL QAWS of the original integrand,
     and Hamilton-Jacobi dS/dl = ell^(d-1) Lp^(d-2)/(4 G zs^(d-1)).  */
  HT_STATUS (holent_strip_entropy (&bg, w, 1, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_SUCCESS);
  {
    gsl_integration_workspace *iw = gsl_integration_workspace_alloc (500);
    gsl_integration_qaws_table *t = gsl_integration_qaws_table_alloc (0, -0.5, 0, 0);
    for (int i = 0; i < 3; i++)  /* z* not too close to zh for plain QAWS */
      {
        wp p = { 4, zs[i] };
        gsl_function F = { w_int, &p };
        double r, e;
        HT_STATUS (gsl_integration_qaws (&F, 0, 1, t, 0, 1e-12, 500, iw, &r, &e), 0);
        HT_CLOSE (2 * zs[i] * r, l[i], 1e-10);
      }
    gsl_integration_qaws_table_free (t);
    gsl_integration_workspace_free (iw);
  }
  for (int i = 0; i < 4; i++)
    {
      double h = 1e-4, lp[2] = { l[i] + h, l[i] - h }, Sp[2], fp[2];
      HT_STATUS (holent_strip_entropy (&bg, w, 1, 2, lp, Sp, fp, NULL, NULL, &bad, NULL), HOLENT_SUCCESS);
      HT_CLOSE ((fp[0] - fp[1]) / (2 * h) / (1 / (4 * gsl_pow_int (zs[i], 3))), 1.0, 1e-6);
      HT_CHECK (i == 0 || zs[i] > zs[i - 1], "z* monotonic");
    }

  /* first law for strips (doc/): delta = m z*^2 B(1/3, 3/2)/6/4 for d = 4,
     ell = G = Lperp = 1, zh = 1; relative corrections O(z*^4) */
  {
    double ls[2] = { 1e-6, 1e-3 }, Ss[2], ds[2], zz[2];
    HT_STATUS (holent_strip_entropy (&bg, w, 1, 2, ls, Ss, NULL, ds, zz, &bad, NULL), HOLENT_SUCCESS);
    for (int i = 0; i < 2; i++)
      HT_CLOSE (ds[i] / (zz[i] * zz[i] * gsl_sf_beta (1.0 / 3, 1.5) / 24), 1.0, 1e-9);
  }

  /* vacuum through the numerical path: a tabulated f = 1 */
  {
    enum { N = 50 };
    holent_hd_bg bt, bv;
    double zz[N], ff[N];
    for (int i = 0; i < N; i++)
      {
        zz[i] = 3.0 * i / (N - 1);
        ff[i] = 1;
      }
    HT_STATUS (holent_hd_bg_tabulated (&bt, 5, N, zz, ff, 0, 1.3, 0.7, 1e-3, &bad), HOLENT_SUCCESS);
    HT_STATUS (holent_hd_bg_init (&bv, 5, HOLENT_HD_VACUUM, 0, 1.3, 0.7, 1e-3), HOLENT_SUCCESS);
    double lv[3] = { 0.1, 1, 1.8 }, St[3], ft[3], dt[3], zt[3], Sv[3], fv[3], dv[3], zv[3];
    HT_STATUS (holent_strip_entropy (&bt, w, 2, 3, lv, St, ft, dt, zt, &bad, &reach), HOLENT_SUCCESS);
    HT_STATUS (holent_strip_entropy (&bv, w, 2, 3, lv, Sv, fv, dv, zv, &bad, NULL), HOLENT_SUCCESS);
    for (int i = 0; i < 3; i++)
      {
        HT_CLOSE (zt[i], zv[i], 1e-12);
        HT_CLOSE (ft[i], fv[i], 1e-11);
        HT_CLOSE (St[i], Sv[i], 1e-13);
        HT_CHECK (fabs (dt[i]) < 1e-11 && dv[i] == 0, "delta %g %g", dt[i], dv[i]);
      }
    /* the widest strip turns at z_max = 3 */
    HT_CLOSE (reach, 3 * holent_strip_ratio (5), 1e-9);
    double lb = 1.01 * reach;
    HT_STATUS (holent_strip_entropy (&bt, w, 2, 1, &lb, St, NULL, NULL, NULL, &bad, &reach), HOLENT_EDOM);
    HT_CHECK (bad == 0, "bad = %zu", bad);

    /* cutoff comparable to z*: S = 0 beyond it, the tau form between */
    double lc[2] = { 1.5 * bv.eps * holent_strip_ratio (5),
                     0.5 * bv.eps * holent_strip_ratio (5) };
    HT_STATUS (holent_strip_entropy (&bv, w, 1, 2, lc, Sv, fv, NULL, zv, &bad, NULL), HOLENT_SUCCESS);
    HT_CHECK (Sv[0] > 0 && Sv[1] == 0, "S %g %g", Sv[0], Sv[1]);
    {
      /* independent: QAWS of u^(1-d)/sqrt((1 - u^(2d-2))/(1 - u)) on
         [eps/z*, 1] with the weight (1 - u)^(-1/2) */
      gsl_integration_workspace *iw = gsl_integration_workspace_alloc (500);
      gsl_integration_qaws_table *t = gsl_integration_qaws_table_alloc (0, -0.5, 0, 0);
      wp p = { 5, 0.0 };
      gsl_function F = { a_int, &p };
      double r, e;
      HT_STATUS (gsl_integration_qaws (&F, bv.eps / zv[0], 1, t, 0, 1e-13, 500, iw, &r, &e), 0);
      HT_CLOSE (Sv[0], 2 * pow (1.3, 4) / (4 * 0.7) * pow (zv[0], -3) * r, 1e-11);
      gsl_integration_qaws_table_free (t);
      gsl_integration_workspace_free (iw);
    }
    holent_hd_bg_free (&bt);
  }

  /* tabulated brane: the same entropies to the spline's accuracy */
  {
    enum { N = 900 };
    holent_hd_bg bt;
    double zz[N], ff[N];
    for (int i = 0; i < N; i++)
      {
        zz[i] = 1.3 * i / (N - 1);
        ff[i] = 1 - gsl_pow_int (zz[i], 4);
      }
    HT_STATUS (holent_hd_bg_tabulated (&bt, 4, N, zz, ff, 0, 1, 1, 1e-4, &bad), HOLENT_SUCCESS);
    double St[4], ft[4], dt[4], zt[4];
    HT_STATUS (holent_strip_entropy (&bt, w, 1, 4, l, St, ft, dt, zt, &bad, &reach), HOLENT_SUCCESS);
    for (int i = 0; i < 4; i++)
      {
        HT_CLOSE (zt[i], zs[i], 1e-8);
        HT_CLOSE (dt[i], del[i], 1e-8);
      }
    HT_CHECK (reach > 20 && reach < 40, "reach %g", reach);  /* w >= 1e-30 zh */
    {
      /* wide strips: the re-expanded interpolant near zh keeps delta */
      double lw[2] = { 10, 20 }, Sw[2], dw[2], db[2];
      HT_STATUS (holent_strip_entropy (&bt, w, 1, 2, lw, Sw, NULL, dw, NULL, &bad, NULL), HOLENT_SUCCESS);
      HT_STATUS (holent_strip_entropy (&bg, w, 1, 2, lw, Sw, NULL, db, NULL, &bad, NULL), HOLENT_SUCCESS);
      HT_CLOSE (dw[0], db[0], 1e-9);
      HT_CLOSE (dw[1], db[1], 1e-9);
    }
    holent_hd_bg_free (&bt);
  }
  /* a near-horizon (f dips to 0.02 at z = 1): l(z*) rises to a narrow
     peak, falls and rises again; RT jumps between branches, and the peak
     (found by the minimiser) is the widest reachable strip */
  {
    enum { N = 2000 };
    holent_hd_bg bt;
    static double zz[N], ff[N];
    for (int i = 0; i < N; i++)
      {
        zz[i] = 4.0 * i / (N - 1);
        ff[i] = 1 - 1.96 * gsl_pow_int (zz[i], 4) / (1 + gsl_pow_int (zz[i], 8));
      }
    HT_STATUS (holent_hd_bg_tabulated (&bt, 4, N, zz, ff, 0, 1, 1, 1e-3, &bad), HOLENT_SUCCESS);
    HT_CHECK (isinf (bt.zh), "no horizon");
    double lj[2] = { 3.0, 3.2 }, Sj[2], fj[2], zj[2];
    HT_STATUS (holent_strip_entropy (&bt, w, 1, 2, lj, Sj, fj, NULL, zj, &bad, &reach), HOLENT_SUCCESS);
    HT_CHECK (zj[0] < 1 && zj[1] > 3, "branches: z* %g %g", zj[0], zj[1]);
    HT_CHECK (reach > 3.9 && reach < 3.95, "reach %g", reach);
    double lr[2] = { reach * (1 - 1e-7), reach * (1 + 1e-7) };
    HT_STATUS (holent_strip_entropy (&bt, w, 1, 1, lr, Sj, NULL, NULL, zj, &bad, NULL), HOLENT_SUCCESS);
    HT_CHECK (fabs (zj[0] - 1.04) < 0.02, "z* at the peak %g", zj[0]);
    HT_STATUS (holent_strip_entropy (&bt, w, 1, 1, lr + 1, Sj, NULL, NULL, NULL, &bad, NULL), HOLENT_EDOM);
    holent_hd_bg_free (&bt);
  }
  /* accuracy: 0 for analytic f; for rounded data small and covering the
     difference to the analytic brane */
  {
    enum { N = 700 };
    static double zz[N], ff[N];
    holent_hd_bg bt, bb;
    double lw[2] = { 0.5, 2 }, Sa[2], fa[2], acc[2], Sb[2], fb[2];
    HT_STATUS (holent_hd_bg_init (&bb, 4, HOLENT_HD_BRANE, 1, 1, 1, 1e-4), HOLENT_SUCCESS);
    HT_STATUS (holent_strip_entropy (&bb, w, 1, 2, lw, Sb, fb, NULL, NULL, &bad, NULL), HOLENT_SUCCESS);
    HT_STATUS (holent_strip_accuracy (&bb, w, 1, 2, lw, fb, acc), HOLENT_SUCCESS);
    HT_CHECK (acc[0] == 0 && acc[1] == 0, "analytic accuracy");
    for (int i = 0; i < N; i++)
      {
        zz[i] = 1.2 * i / (N - 1);
        ff[i] = round ((1 - gsl_pow_int (zz[i], 4)) * 1e7) / 1e7;  /* 7 decimals */
      }
    HT_STATUS (holent_hd_bg_tabulated (&bt, 4, N, zz, ff, 0, 1, 1, 1e-4, &bad), HOLENT_SUCCESS);
    HT_STATUS (holent_strip_entropy (&bt, w, 1, 2, lw, Sa, fa, NULL, NULL, &bad, NULL), HOLENT_SUCCESS);
    HT_STATUS (holent_strip_accuracy (&bt, w, 1, 2, lw, fa, acc), HOLENT_SUCCESS);
    for (int i = 0; i < 2; i++)
      HT_CHECK (acc[i] > 0 && acc[i] < 1e-4 && fabs (fa[i] - fb[i]) <= 5 * acc[i],
                "accuracy %g, error %g", acc[i], fabs (fa[i] - fb[i]));
    HT_STATUS (holent_strip_accuracy (&bt, NULL, 1, 2, lw, fa, acc), HOLENT_EINVAL);
    HT_STATUS (holent_strip_accuracy (&bt, w, 1, 2, lw, NULL, acc), HOLENT_EINVAL);
    holent_hd_bg_free (&bt);
  }
  holent_strip_workspace_free (w);
}



/* the poll: EINTR at the second width; the divergence's closed form */
static void
test_poll (void)
{
  holent_hd_bg bg;
  holent_strip_workspace *w = holent_strip_workspace_alloc ();
  int calls = 0;
  holent_poll poll = { ht_stop_second, &calls };
  double l[3] = { 0.5, 1, 1.5 }, S[3];
  size_t bad;
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_BRANE, 1, 1.2, 0.3, 1e-3), HOLENT_SUCCESS);
  holent_strip_workspace_set_poll (w, &poll);
  HT_STATUS (holent_strip_entropy (&bg, w, 1, 3, l, S, NULL, NULL, NULL, &bad, NULL), HOLENT_EINTR);
  HT_CHECK (calls == 2, "calls %d", calls);
  holent_strip_workspace_set_poll (w, NULL);
  HT_STATUS (holent_strip_entropy (&bg, w, 1, 3, l, S, NULL, NULL, NULL, &bad, NULL), HOLENT_SUCCESS);
  /* 2 ell^(d-1) Lperp^(d-2)/((d-2) eps^(d-2) 4G) (Ryu and Takayanagi 2006) */
  HT_CLOSE (holent_strip_divergence (&bg, 2), 2 * pow (1.2, 3) * 4 / (2 * 1e-6 * 1.2), 1e-14);
  /* a width so small that the entropy overflows: ERANGE naming it */
  double tiny[2] = { 1, 1e-300 };
  HT_STATUS (holent_strip_entropy (&bg, w, 1, 2, tiny, S, NULL, NULL, NULL, &bad, NULL), HOLENT_ERANGE);
  HT_CHECK (bad == 1, "bad %zu", bad);
  holent_strip_workspace_set_poll (NULL, NULL);
  holent_strip_workspace_free (w);
}

/* The series path (holent_strip.h, doc/fast_paths.md) against the exact
   path of the same module: every output, widths from 0.02 zh to near the
   horizon; which widths it takes; its poll.  */
static void
test_series (void)
{
  enum { N = 400 };
  static double l[N], S[N], fin[N], del[N], zs[N], Se[N], fe[N], de[N], ze[N];
  holent_strip_workspace *w = holent_strip_workspace_alloc ();
  holent_hd_bg bg;
  size_t bad, cnt = 7;
  HT_CHECK (isnan (holent_strip_series_error (NULL, &cnt)) && cnt == 0, "NULL");
  holent_strip_workspace_set_method (NULL, HOLENT_STRIP_SERIES);
  for (int d = 3; d <= 6; d++)
    {
      HT_STATUS (holent_hd_bg_init (&bg, d, HOLENT_HD_BRANE, 1.3, 1.1, 0.7, 1e-3), HOLENT_SUCCESS);
      for (int i = 0; i < N; i++)  /* 0.02 zh .. 40 zh, log-spaced */
        l[i] = 1.3 * 0.02 * pow (2000.0, (double) i / (N - 1));
      holent_strip_workspace_set_method (w, HOLENT_STRIP_SERIES);
      HT_STATUS (holent_strip_entropy (&bg, w, 1.5, N, l, S, fin, del, zs, &bad, NULL), HOLENT_SUCCESS);
      double err = holent_strip_series_error (w, &cnt);
      HT_CHECK (cnt == N && err < 1e-11, "d = %d: %zu from the series, error %g", d, cnt, err);
      holent_strip_workspace_set_method (w, HOLENT_STRIP_EXACT);
      HT_STATUS (holent_strip_entropy (&bg, w, 1.5, N, l, Se, fe, de, ze, &bad, NULL), HOLENT_SUCCESS);
      HT_CHECK (isnan (holent_strip_series_error (w, &cnt)) && cnt == 0, "exact");
      double eS = 0, ez = 0, ed = 0, ef = 0;
      double fv = fabs (holent_strip_vacuum_j (d)) * 2 * pow (1.1, d - 1) * pow (1.5, d - 2) / (4 * 0.7);
      for (int i = 0; i < N; i++)
        {
          double zv = l[i] / holent_strip_ratio (d);
          eS = fmax (eS, fabs (S[i] / Se[i] - 1));
          ez = fmax (ez, fabs (zs[i] / ze[i] - 1));
          ed = fmax (ed, fabs (del[i] / de[i] - 1));
          ef = fmax (ef, fabs (fin[i] - fe[i]) / fmax (fabs (fe[i]), fv * pow (zv, 2 - d)));
        }
      HT_CHECK (eS < 1e-10 && ez < 1e-10 && ed < 1e-10 && ef < 1e-10,
                "d = %d: S %g z* %g delta %g finite %g", d, eS, ez, ed, ef);
      /* AUTO (also any unknown value): the series from
         HOLENT_STRIP_SERIES_MIN widths on */
      holent_strip_workspace_set_method (w, (holent_strip_method) 9);
      HT_STATUS (holent_strip_entropy (&bg, w, 1.5, HOLENT_STRIP_SERIES_MIN - 1, l, S, NULL, NULL, NULL, &bad, NULL), HOLENT_SUCCESS);
      HT_CHECK (isnan (holent_strip_series_error (w, &cnt)) && cnt == 0, "auto, few");
      HT_STATUS (holent_strip_entropy (&bg, w, 1.5, HOLENT_STRIP_SERIES_MIN, l, S, NULL, NULL, NULL, &bad, NULL), HOLENT_SUCCESS);
      holent_strip_series_error (w, &cnt);
      HT_CHECK (cnt == HOLENT_STRIP_SERIES_MIN, "auto, many: %zu", cnt);
    }
  /* the vacuum keeps its closed forms */
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_VACUUM, 0, 1, 1, 1e-3), HOLENT_SUCCESS);
  holent_strip_workspace_set_method (w, HOLENT_STRIP_SERIES);
  HT_STATUS (holent_strip_entropy (&bg, w, 1, N, l, S, NULL, NULL, NULL, &bad, NULL), HOLENT_SUCCESS);
  HT_CHECK (isnan (holent_strip_series_error (w, &cnt)) && cnt == 0, "vacuum");
  /* a width not monotonic in z* (f dips to 0.02): the exact path, with
     the same numbers as when asked for */
  {
    enum { M = 2000 };
    static double zz[M], ff[M];
    holent_hd_bg bt;
    for (int i = 0; i < M; i++)
      {
        zz[i] = 4.0 * i / (M - 1);
        ff[i] = 1 - 1.96 * gsl_pow_int (zz[i], 4) / (1 + gsl_pow_int (zz[i], 8));
      }
    HT_STATUS (holent_hd_bg_tabulated (&bt, 4, M, zz, ff, 0, 1, 1, 1e-2, &bad), HOLENT_SUCCESS);
    for (int i = 0; i < 100; i++)
      l[i] = 0.5 + 3.0 * i / 99;
    HT_STATUS (holent_strip_entropy (&bt, w, 1, 100, l, S, NULL, NULL, zs, &bad, NULL), HOLENT_SUCCESS);
    HT_CHECK (isnan (holent_strip_series_error (w, &cnt)) && cnt == 0, "not monotonic");
    holent_strip_workspace_set_method (w, HOLENT_STRIP_EXACT);
    HT_STATUS (holent_strip_entropy (&bt, w, 1, 100, l, Se, NULL, NULL, ze, &bad, NULL), HOLENT_SUCCESS);
    for (int i = 0; i < 100; i++)
      HT_CHECK (S[i] == Se[i] && zs[i] == ze[i], "width %d", i);
    holent_hd_bg_free (&bt);
  }
  /* the poll is asked while the series are fitted */
  {
    int calls = 0;
    holent_poll poll = { ht_stop_second, &calls };
    HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_BRANE, 1, 1, 1, 1e-3), HOLENT_SUCCESS);
    for (int i = 0; i < N; i++)
      l[i] = 0.05 + 30.0 * i / (N - 1);
    holent_strip_workspace_set_method (w, HOLENT_STRIP_SERIES);
    holent_strip_workspace_set_poll (w, &poll);
    HT_STATUS (holent_strip_entropy (&bg, w, 1, N, l, S, NULL, NULL, NULL, &bad, NULL), HOLENT_EINTR);
    HT_CHECK (calls == 2, "calls %d", calls);
  }
  holent_strip_workspace_free (w);
}

/* d = 2 (AdS3): an interval.  Vacuum: the semicircle z^2 + x^2 = z*^2
   has the area 2 int_eps^z* z* dz/(z sqrt(z*^2 - z^2)) = 2 acosh(z* / eps)
   above the cutoff (derived here), fin = (2/4G) log(l).  Planar BTZ
   (f = 1 - z^2/zh^2, beta = 2 pi zh): fin = (2/4G) log((beta/pi)
   sinh(pi l/beta)) (Calabrese and Cardy 2004, J. Stat. Mech. P06002,
   with c = 3/(2G); from memory).  */
static void
test_d2 (void)
{
  holent_hd_bg bv, bb, bt;
  holent_strip_workspace *w = holent_strip_workspace_alloc ();
  double l[3] = { 0.3, 1.0, 4.0 }, S[3], fin[3], del[3], zs[3], eps = 1e-4;
  double G = 0.5, zh = 0.5, beta = 2 * M_PI * zh;
  HT_STATUS (holent_hd_bg_init (&bv, 2, HOLENT_HD_VACUUM, 1, 1, G, eps), HOLENT_SUCCESS);
  HT_STATUS (holent_strip_entropy (&bv, w, 1, 3, l, S, fin, del, zs, NULL, NULL), HOLENT_SUCCESS);
  HT_CLOSE (holent_strip_divergence (&bv, 7), -2 * log (eps) / (4 * G), 1e-14);
  for (int i = 0; i < 3; i++)
    {
      HT_CLOSE (zs[i], l[i] / 2, 1e-14);
      HT_CLOSE (S[i], 2 * acosh (l[i] / (2 * eps)) / (4 * G), 1e-12);
      HT_CLOSE (fin[i], 2 * log (l[i]) / (4 * G), 1e-12);
    }
  HT_STATUS (holent_hd_bg_init (&bb, 2, HOLENT_HD_BRANE, zh, 1, G, eps), HOLENT_SUCCESS);
  HT_STATUS (holent_strip_entropy (&bb, w, 1, 3, l, S, fin, del, zs, NULL, NULL), HOLENT_SUCCESS);
  for (int i = 0; i < 3; i++)
    {
      double fx = 2 * log (beta / M_PI * sinh (M_PI * l[i] / beta)) / (4 * G);
      HT_CLOSE (fin[i], fx, 1e-10);
      HT_CLOSE (del[i], fx - 2 * log (l[i]) / (4 * G), 1e-10);
      HT_CLOSE (S[i] - fin[i], -2 * log (eps) / (4 * G), 1e-6);  /* O(eps^2/zh^2) */
    }
  /* the same brane as samples: the spline reproduces it */
  enum { N = 601 };
  double z[N], f[N], fint[3];
  for (int i = 0; i < N; i++)
    {
      z[i] = 0.6 * i / (N - 1.0);
      f[i] = 1 - z[i] * z[i] / (zh * zh);
    }
  HT_STATUS (holent_hd_bg_tabulated (&bt, 2, N, z, f, 0, 1, G, eps, NULL), HOLENT_SUCCESS);
  HT_CLOSE (bt.zh, zh, 1e-9);
  HT_CLOSE (bt.T, 1 / beta, 1e-8);
  HT_STATUS (holent_strip_entropy (&bt, w, 1, 3, l, S, fint, NULL, NULL, NULL, NULL), HOLENT_SUCCESS);
  for (int i = 0; i < 2; i++)
    HT_CLOSE (fint[i], fin[i], 1e-8);
  holent_hd_bg_free (&bt);
  holent_strip_workspace_free (w);
}

int
main (void)
{
  gsl_set_error_handler_off ();
  test_poll ();
  test_closed_forms ();
  test_strip ();
  test_series ();
  test_d2 ();
  return HT_DONE ();
}
