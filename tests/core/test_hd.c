/* Unit tests of holent_hd: every error path we can reach, the closed
 * forms against independent evaluations (GSL's QAWS on the untransformed
 * integrands, hand-derived constants), and the physics checks written in
 * doc/higher_dimensional.md.  */
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_integration.h>
#include <gsl/gsl_sf_gamma.h>
#include "holent_ctest.h"
#include "holent_hd.h"

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

/* the wall of a wide strip or ball of the brane (zh = 1):
   u^(1-d) (sqrt((1 - u^(2d-2))/f(u)) - 1), f = 1 - u^d: the ratio
   a/b = (1 - u^(2d-2))/(1 - u^d) as geometric sums (no 0/0 at u = 1) and
   a - b = u^d (1 + ... + u^(d-3)) (no cancellation at u = 0) */
static double
wall_int (double u, void *p)
{
  int d = *(int *) p;
  double c = 0, b = 0;  /* c = u^(1-d) (a - b) = u + ... + u^(d-2) */
  for (int k = 0; k < d; k++)
    b += gsl_pow_int (u, k);
  for (int j = 1; j <= d - 2; j++)
    c += gsl_pow_int (u, j);
  double q = sqrt (1 + gsl_pow_int (u, d - 1) * c / b);
  return c / (b * (q + 1));
}

static double
hemi_int (double y, void *p)
{
  int d = *(int *) p;
  return pow (1 - y * y, 0.5 * (d - 3)) * gsl_pow_int (y, 1 - d);
}

static void
test_init_errors (void)
{
  holent_hd_bg bg;
  double z[6] = { 0, 0.2, 0.4, 0.6, 0.8, 1.0 }, f[6];
  size_t bad = 99;
  HT_STATUS (holent_hd_bg_init (NULL, 4, HOLENT_HD_VACUUM, 1, 1, 1, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_init (&bg, 2, HOLENT_HD_VACUUM, 1, 1, 1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_init (&bg, HOLENT_HD_DMAX + 1, HOLENT_HD_VACUUM, 1, 1, 1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_VACUUM, 1, NAN, 1, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_VACUUM, 1, 1, -1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_VACUUM, 1, 1, 1, INFINITY), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_BRANE, NAN, 1, 1, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_BRANE, 0, 1, 1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_TABULATED, 1, 1, 1, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_init (&bg, 4, (holent_hd_kind) 77, 1, 1, 1, 1e-3), HOLENT_EINVAL);

  for (int i = 0; i < 6; i++)
    f[i] = 1 - gsl_pow_int (z[i] / 0.9, 4);
  HT_STATUS (holent_hd_bg_tabulated (NULL, 4, 6, z, f, 1, 1, 1e-3, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, NULL, f, 1, 1, 1e-3, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_hd_bg_tabulated (&bg, 2, 6, z, f, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, z, f, 1, 1, 0, &bad), HOLENT_EDOM);
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 4, z, f, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  z[3] = NAN;
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, z, f, 1, 1, 1e-3, &bad), HOLENT_EINVAL);
  HT_CHECK (bad == 3, "bad = %zu", bad);
  z[3] = 0.3;  /* not increasing */
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, z, f, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  HT_CHECK (bad == 3, "bad = %zu", bad);
  z[3] = 0.6;
  z[0] = 0.01;
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, z, f, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  HT_CHECK (bad == 0, "bad = %zu", bad);
  z[0] = 0;
  f[0] = 1.5;
  HT_STATUS (holent_hd_bg_tabulated (&bg, 4, 6, z, f, 1, 1, 1e-3, &bad), HOLENT_EDOM);
  f[0] = 1;

  /* f - 1 = O(z^3) only, for d = 4: refused */
  {
    enum { N = 60 };
    double zz[N], ff[N];
    for (int i = 0; i < N; i++)
      {
        zz[i] = 1.5 * i / (N - 1);
        ff[i] = 1 - gsl_pow_int (zz[i], 3);
      }
    HT_STATUS (holent_hd_bg_tabulated (&bg, 4, N, zz, ff, 1, 1, 1e-3, &bad), HOLENT_EDOM);
    HT_CHECK (bad >= 1 && bad < N, "bad = %zu", bad);
    /* ... accepted for d = 3, horizon at the sample z = 1 exactly */
    HT_STATUS (holent_hd_bg_tabulated (&bg, 3, N, zz, ff, 1, 1, 1e-3, &bad), HOLENT_SUCCESS);
    HT_CLOSE (bg.zh, 1.0, 1e-12);
    HT_CLOSE (bg.fp_h, -3.0, 1e-5);
    HT_CLOSE (bg.m, 1.0, 1e-7);
    double fv, fpv;
    HT_STATUS (holent_hd_f (&bg, 0.5, &fv, &fpv), HOLENT_SUCCESS);
    HT_CLOSE (fv, 1 - 0.125, 1e-6);
    HT_STATUS (holent_hd_f (&bg, 1.6, &fv, &fpv), HOLENT_EDOM);
    HT_STATUS (holent_hd_f (&bg, -0.1, &fv, &fpv), HOLENT_EDOM);
    HT_STATUS (holent_hd_f (&bg, NAN, &fv, &fpv), HOLENT_EINVAL);
    HT_STATUS (holent_hd_f (NULL, 0.1, &fv, &fpv), HOLENT_EINVAL);
    holent_hd_bg_free (&bg);
    holent_hd_bg_free (&bg);  /* twice is harmless */
    holent_hd_bg_free (NULL);
  }
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
      HT_CLOSE (holent_hd_strip_ratio (d), 2 * r, 1e-12);
    }
  /* hemisphere constants, by hand: C_3 = -1, C_4 = -1/4 - log(2)/2,
     C_5 = 2/3; C_6 (= 9/32 + 3 log(2)/8) by quadrature below.  */
  HT_CLOSE (holent_hd_ball_vacuum_c (3), -1.0, 1e-14);
  HT_CLOSE (holent_hd_ball_vacuum_c (4), -0.25 - 0.5 * M_LN2, 1e-14);
  HT_CLOSE (holent_hd_ball_vacuum_c (5), 2.0 / 3.0, 1e-14);
  /* d = 6: integral_delta^1 y^-5 (1-y^2)^(3/2) dy, finite part, by QAG of
     the integrand minus its divergent terms y^-5 - (3/2) y^-3 + (3/8) y^-1 */
  {
    int d = 6;
    double r, e, c = 0;
    gsl_function F = { hemi_int, &d };
    HT_STATUS (gsl_integration_qags (&F, 0.5, 1, 0, 1e-13, 500, iw, &r, &e), 0);
    /* on [0, 0.5] by series of the remainder: sum_{k>=3} c_k y^(2k-5) */
    double ck = 1, a = 1.5, s = 0;
    for (int k = 0; k < 200; k++)
      {
        if (k >= 3)
          s += ck * pow (0.5, 2 * k - 4) / (2 * k - 4);
        ck *= -(a - k) / (k + 1);
      }
    /* divergent terms integrated over [0.5, 1] subtracted in closed form */
    c = 0.5 + r - (0.25 * (pow (0.5, -4) - 1) - 0.75 * (pow (0.5, -2) - 1)
             + 0.375 * log (2.0)) + s;
    HT_CLOSE (holent_hd_ball_vacuum_c (6), c, 1e-11);
  }
  gsl_integration_qaws_table_free (t);
  gsl_integration_workspace_free (iw);
}

static void
test_strip (void)
{
  holent_hd_bg bg;
  holent_hd_workspace *w = holent_hd_workspace_alloc ();
  size_t bad = 99;
  double reach;
  HT_CHECK (w != NULL, "workspace");
  holent_hd_workspace_free (NULL);

  /* errors */
  double l[4] = { 0.2, 1.0, 2.0, 3.0 }, S[4], fin[4], del[4], zs[4];
  HT_STATUS (holent_hd_bg_init (&bg, 4, HOLENT_HD_BRANE, 1, 1, 1, 1e-4), HOLENT_SUCCESS);
  HT_STATUS (holent_hd_strip (NULL, w, 1, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_EINVAL);
  HT_STATUS (holent_hd_strip (&bg, NULL, 1, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_EINVAL);
  HT_STATUS (holent_hd_strip (&bg, w, 1, 4, NULL, S, fin, del, zs, &bad, &reach), HOLENT_EINVAL);
  HT_STATUS (holent_hd_strip (&bg, w, NAN, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_EINVAL);
  HT_STATUS (holent_hd_strip (&bg, w, -1, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_EDOM);
  l[2] = -2;
  HT_STATUS (holent_hd_strip (&bg, w, 1, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_EDOM);
  HT_CHECK (bad == 2, "bad = %zu", bad);
  l[2] = NAN;
  HT_STATUS (holent_hd_strip (&bg, w, 1, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_EINVAL);
  l[2] = 2;
  HT_STATUS (holent_hd_strip (&bg, w, 1, 0, l, S, fin, del, zs, &bad, &reach), HOLENT_SUCCESS);

  /* brane, d = 4: the width against GSL QAWS of the original integrand,
     and Hamilton-Jacobi dS/dl = ell^(d-1) Lp^(d-2)/(4 G zs^(d-1)).  */
  HT_STATUS (holent_hd_strip (&bg, w, 1, 4, l, S, fin, del, zs, &bad, &reach), HOLENT_SUCCESS);
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
      HT_STATUS (holent_hd_strip (&bg, w, 1, 2, lp, Sp, fp, NULL, NULL, &bad, NULL), HOLENT_SUCCESS);
      HT_CLOSE ((fp[0] - fp[1]) / (2 * h) / (1 / (4 * gsl_pow_int (zs[i], 3))), 1.0, 1e-6);
      HT_CHECK (i == 0 || zs[i] > zs[i - 1], "z* monotonic");
    }

  /* first law for strips (doc/): delta = m z*^2 B(1/3, 3/2)/6/4 for d = 4,
     ell = G = Lperp = 1, zh = 1; relative corrections O(z*^4) */
  {
    double ls[2] = { 1e-6, 1e-3 }, Ss[2], ds[2], zz[2];
    HT_STATUS (holent_hd_strip (&bg, w, 1, 2, ls, Ss, NULL, ds, zz, &bad, NULL), HOLENT_SUCCESS);
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
    HT_STATUS (holent_hd_bg_tabulated (&bt, 5, N, zz, ff, 1.3, 0.7, 1e-3, &bad), HOLENT_SUCCESS);
    HT_STATUS (holent_hd_bg_init (&bv, 5, HOLENT_HD_VACUUM, 0, 1.3, 0.7, 1e-3), HOLENT_SUCCESS);
    double lv[3] = { 0.1, 1, 1.8 }, St[3], ft[3], dt[3], zt[3], Sv[3], fv[3], dv[3], zv[3];
    HT_STATUS (holent_hd_strip (&bt, w, 2, 3, lv, St, ft, dt, zt, &bad, &reach), HOLENT_SUCCESS);
    HT_STATUS (holent_hd_strip (&bv, w, 2, 3, lv, Sv, fv, dv, zv, &bad, NULL), HOLENT_SUCCESS);
    for (int i = 0; i < 3; i++)
      {
        HT_CLOSE (zt[i], zv[i], 1e-12);
        HT_CLOSE (ft[i], fv[i], 1e-11);
        HT_CLOSE (St[i], Sv[i], 1e-13);
        HT_CHECK (fabs (dt[i]) < 1e-11 && dv[i] == 0, "delta %g %g", dt[i], dv[i]);
      }
    /* the widest strip turns at z_max = 3 */
    HT_CLOSE (reach, 3 * holent_hd_strip_ratio (5), 1e-9);
    double lb = 1.01 * reach;
    HT_STATUS (holent_hd_strip (&bt, w, 2, 1, &lb, St, NULL, NULL, NULL, &bad, &reach), HOLENT_EDOM);
    HT_CHECK (bad == 0, "bad = %zu", bad);

    /* cutoff comparable to z*: S = 0 beyond it, the tau form between */
    double lc[2] = { 1.5 * bv.eps * holent_hd_strip_ratio (5),
                     0.5 * bv.eps * holent_hd_strip_ratio (5) };
    HT_STATUS (holent_hd_strip (&bv, w, 1, 2, lc, Sv, fv, NULL, zv, &bad, NULL), HOLENT_SUCCESS);
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
    HT_STATUS (holent_hd_bg_tabulated (&bt, 4, N, zz, ff, 1, 1, 1e-4, &bad), HOLENT_SUCCESS);
    double St[4], ft[4], dt[4], zt[4];
    HT_STATUS (holent_hd_strip (&bt, w, 1, 4, l, St, ft, dt, zt, &bad, &reach), HOLENT_SUCCESS);
    for (int i = 0; i < 4; i++)
      {
        HT_CLOSE (zt[i], zs[i], 1e-8);
        HT_CLOSE (dt[i], del[i], 1e-8);
      }
    HT_CHECK (reach > 20 && reach < 40, "reach %g", reach);  /* w >= 1e-30 zh */
    {
      /* wide strips: the re-expanded interpolant near zh keeps delta */
      double lw[2] = { 10, 20 }, Sw[2], dw[2], db[2];
      HT_STATUS (holent_hd_strip (&bt, w, 1, 2, lw, Sw, NULL, dw, NULL, &bad, NULL), HOLENT_SUCCESS);
      HT_STATUS (holent_hd_strip (&bg, w, 1, 2, lw, Sw, NULL, db, NULL, &bad, NULL), HOLENT_SUCCESS);
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
    HT_STATUS (holent_hd_bg_tabulated (&bt, 4, N, zz, ff, 1, 1, 1e-3, &bad), HOLENT_SUCCESS);
    HT_CHECK (isinf (bt.zh), "no horizon");
    double lj[2] = { 3.0, 3.2 }, Sj[2], fj[2], zj[2];
    HT_STATUS (holent_hd_strip (&bt, w, 1, 2, lj, Sj, fj, NULL, zj, &bad, &reach), HOLENT_SUCCESS);
    HT_CHECK (zj[0] < 1 && zj[1] > 3, "branches: z* %g %g", zj[0], zj[1]);
    HT_CHECK (reach > 3.9 && reach < 3.95, "reach %g", reach);
    double lr[2] = { reach * (1 - 1e-7), reach * (1 + 1e-7) };
    HT_STATUS (holent_hd_strip (&bt, w, 1, 1, lr, Sj, NULL, NULL, zj, &bad, NULL), HOLENT_SUCCESS);
    HT_CHECK (fabs (zj[0] - 1.04) < 0.02, "z* at the peak %g", zj[0]);
    HT_STATUS (holent_hd_strip (&bt, w, 1, 1, lr + 1, Sj, NULL, NULL, NULL, &bad, NULL), HOLENT_EDOM);
    holent_hd_bg_free (&bt);
  }
  holent_hd_workspace_free (w);
}

static void
test_ball (void)
{
  holent_hd_bg bg;
  holent_hd_workspace *w = holent_hd_workspace_alloc ();
  size_t bad = 99;
  double reach, R[3] = { 0.05, 0.5, 1.2 }, S[3], fin[3], del[3], zt[3];
  HT_STATUS (holent_hd_bg_init (&bg, 5, HOLENT_HD_BRANE, 1, 1, 1, 1e-3), HOLENT_SUCCESS);
  HT_STATUS (holent_hd_ball (NULL, w, 3, R, S, fin, del, zt, &bad, &reach), HOLENT_EINVAL);
  HT_STATUS (holent_hd_ball (&bg, NULL, 3, R, S, fin, del, zt, &bad, &reach), HOLENT_EINVAL);
  HT_STATUS (holent_hd_ball (&bg, w, 3, R, NULL, fin, del, zt, &bad, &reach), HOLENT_EINVAL);
  R[1] = 0;
  HT_STATUS (holent_hd_ball (&bg, w, 3, R, S, fin, del, zt, &bad, &reach), HOLENT_EDOM);
  HT_CHECK (bad == 1, "bad = %zu", bad);
  R[1] = INFINITY;
  HT_STATUS (holent_hd_ball (&bg, w, 3, R, S, fin, del, zt, &bad, &reach), HOLENT_EDOM);
  R[1] = 0.5;
  HT_STATUS (holent_hd_ball (&bg, w, 0, R, S, fin, del, zt, &bad, &reach), HOLENT_SUCCESS);
  HT_STATUS (holent_hd_ball (&bg, w, 3, R, S, fin, del, zt, &bad, &reach), HOLENT_SUCCESS);
  /* first law: delta = 2 pi Omega_3 R^5 e/24, e = 4/(16 pi), Omega_3 = 2 pi^2 */
  HT_CLOSE (del[0] / (2 * M_PI * 2 * M_PI * M_PI * pow (0.05, 5) * 4 / (16 * M_PI) / 24), 1.0, 1e-5);
  HT_CHECK (zt[0] < zt[1] && zt[1] < zt[2] && zt[2] < 1, "tip depths");
  HT_CHECK (reach > 1.2, "reach %g", reach);
  double big = 10 * reach;
  HT_STATUS (holent_hd_ball (&bg, w, 1, &big, S, NULL, NULL, NULL, &bad, NULL), HOLENT_EDOM);

  /* wide balls of the brane (tips exponentially close to the horizon):
     delta = s Omega R^(d-1)/(d-1) + sigma Omega R^(d-2) + O(R^(d-3)), sigma
     the strip's wall term (doc/higher_dimensional.md), by GSL QAGS; the
     O(1/R) and O(1/R^2) terms removed by Richardson at R = 20, 30, 40 */
  for (int d = 3; d <= 6; d++)
    {
      holent_hd_bg bb;
      HT_STATUS (holent_hd_bg_init (&bb, d, HOLENT_HD_BRANE, 1, 1, 0.25, 1e-3), HOLENT_SUCCESS);
      double Rb[3] = { 20, 30, 40 }, Sb[3], db[3], zb[3], y[3], rb;
      HT_STATUS (holent_hd_ball (&bb, w, 3, Rb, Sb, NULL, db, zb, &bad, &rb), HOLENT_SUCCESS);
      HT_CHECK (rb > 75, "d = %d: reach %g", d, rb);
      HT_CHECK (zb[0] <= 1 && 1 - zb[0] < 1e-20, "tip next to the horizon");
      gsl_integration_workspace *iw = gsl_integration_workspace_alloc (500);
      gsl_function F = { wall_int, &d };
      double sig, e;
      HT_STATUS (gsl_integration_qags (&F, 0, 1, 0, 1e-12, 500, iw, &sig, &e), 0);
      sig -= 1.0 / (d - 2);
      gsl_integration_workspace_free (iw);
      double om = 2 * pow (M_PI, 0.5 * (d - 1)) / gsl_sf_gamma (0.5 * (d - 1));
      for (int i = 0; i < 3; i++)
        y[i] = (db[i] - om * pow (Rb[i], d - 1) / (d - 1)) / (om * pow (Rb[i], d - 2));
      /* quadratic in 1/R through the three points, at 1/R = 0 */
      double x0 = 1 / Rb[0], x1 = 1 / Rb[1], x2 = 1 / Rb[2];
      double est = y[0] * x1 * x2 / ((x0 - x1) * (x0 - x2))
                   + y[1] * x0 * x2 / ((x1 - x0) * (x1 - x2))
                   + y[2] * x0 * x1 / ((x2 - x0) * (x2 - x1));
      HT_CHECK (fabs (est - sig) < 2e-3 * fabs (sig) + 2e-4, "d = %d: wall %.8g, Richardson %.8g", d, sig, est);
      HT_CHECK (fabs (y[2] - sig) < 0.03, "d = %d: wall %.8g at R = 40: %.8g", d, sig, y[2]);
    }

  /* vacuum hemisphere at the cutoff against GSL quadrature, for eps/R
     below and above 1/2, and zero beyond R */
  for (int d = 3; d <= 7; d++)
    {
      holent_hd_bg bv;
      HT_STATUS (holent_hd_bg_init (&bv, d, HOLENT_HD_VACUUM, 0, 1, 0.25, 0.3), HOLENT_SUCCESS);
      double Rv[3] = { 5.0, 0.45, 0.2 }, Sv[3], fv[3], dv[3], zv[3];
      HT_STATUS (holent_hd_ball (&bv, w, 3, Rv, Sv, fv, dv, zv, &bad, NULL), HOLENT_SUCCESS);
      gsl_integration_workspace *iw = gsl_integration_workspace_alloc (500);
      gsl_function F = { hemi_int, &d };
      double om = 2 * pow (M_PI, 0.5 * (d - 1)) / gsl_sf_gamma (0.5 * (d - 1));
      for (int i = 0; i < 2; i++)
        {
          double r, e;
          HT_STATUS (gsl_integration_qags (&F, 0.3 / Rv[i], 1, 0, 1e-13, 500, iw, &r, &e), 0);
          HT_CLOSE (Sv[i], om * r, 1e-11);
          HT_CHECK (dv[i] == 0 && zv[i] == Rv[i], "vacuum delta, tip");
        }
      HT_CHECK (Sv[2] == 0, "inside the cutoff: %g", Sv[2]);
      HT_CLOSE (fv[0], om * holent_hd_ball_vacuum_c (d), 1e-14);
      gsl_integration_workspace_free (iw);
    }
  holent_hd_workspace_free (w);
}

int
main (void)
{
  gsl_set_error_handler_off ();
  test_init_errors ();
  test_closed_forms ();
  test_strip ();
  test_ball ();
  return HT_DONE ();
}
