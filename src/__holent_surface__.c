/* SPDX-License-Identifier: GPL-3.0-or-later */
/* RT surfaces as curves (gateway of holent_surface).
 *
 *   C = __holent_surface__ ("curves", FN, BG, PTS, PAIRS, ARCS, TOL)
 *       PTS the sorted endpoints, PAIRS m x 2 (1-based), ARCS m: one
 *       k x 2 (k x 3 with the time in rotating BTZ) curve per pair.
 *   [PAIRS, ARCS, HOR, S] = __holent_surface__ ("runner", FN, BG, IV, PAIRS, ARCS, HOR)
 *       IV the normalised intervals [start, end] of the region.
 *   [C, DEPTH] = __holent_surface__ ("horizon", FN, BG, XA, XB, TOL)
 *   C = __holent_surface__ ("profile", FN, HDBG, BALL, TOP, TOL)
 *   C = __holent_surface__ ("boosted", FN, BG, X1, T1, X2, T2, TOL)
 *       one k x 3 curve [X Y t] per element (endpoints at times T1, T2)
 * FN, the public function's name, starts every message.
 */
#include <math.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_hd.h"
#include "core/holent_surface.h"
#include "core/holent_region.h"

static const char GW[] = "__holent_surface__";

static mxArray *
curve_out (const holent_curve *c, int with_t)
{
  size_t nc = with_t ? 3 : 2;
  mxArray *a = mxCreateDoubleMatrix (c->n, nc, mxREAL);
  double *p = mxGetPr (a);
  memcpy (p, c->x, c->n * sizeof *p);
  memcpy (p + c->n, c->y, c->n * sizeof *p);
  if (with_t)
    memcpy (p + 2 * c->n, c->t, c->n * sizeof *p);
  return a;
}

static holent_surface_workspace *
ws_new (const char *fn)
{
  holent_surface_workspace *w = holent_surface_workspace_alloc ();
  if (w == NULL)
    holent_gw_raise (fn, HOLENT_ENOMEM, NULL, HOLENT_NOINDEX, NULL);
  return w;
}

/* 0-based pair indices from an m x 2 double array of 1-based ones.  */
static void
get_pairs (const char *fn, const mxArray *a, size_t npts, size_t *out,
           size_t m)
{
  const double *p = mxGetPr (a);
  for (size_t i = 0; i < m; i++)
    for (int k = 0; k < 2; k++)
      {
        double v = p[i + k * m];
        if (!(v >= 1.0 && v <= (double) npts && v == floor (v)))
          holent_gw_raise (fn, HOLENT_EDOM, "PAIRS", i + k * m,
                           "must be an endpoint index");
        out[2 * i + k] = (size_t) v - 1;
      }
}

static void
op_curves (const char *fn, int nlhs, mxArray *plhs[], int nrhs,
           const mxArray *prhs[])
{
  holent_geo_bg bg;
  size_t npts, np, na;
  holent_gw_nargs (fn, nlhs, 4, nrhs, 7, 7);
  holent_gw_bg (prhs[2], fn, &bg);
  const double *pts = holent_gw_real (prhs[3], fn, "PTS", &npts);
  holent_gw_real (prhs[4], fn, "PAIRS", &np);
  const double *arcs = holent_gw_real (prhs[5], fn, "ARCS", &na);
  double tol = holent_gw_scalar (prhs[6], fn, "TOL");
  size_t m = na;
  if (np != 2 * m || (m > 0 && mxGetN (prhs[4]) != 2))
    holent_gw_raise (fn, HOLENT_ESIZE, "PAIRS", HOLENT_NOINDEX,
                     "must be m x 2 with m = numel (ARCS)");
  size_t *pr = mxCalloc (2 * m + 1, sizeof *pr);
  get_pairs (fn, prhs[4], npts, pr, m);
  int with_t = bg.bulk == HOLENT_BULK_ROTATING_BTZ
               || bg.bulk == HOLENT_BULK_PLANAR_ROTATING_BTZ;
  holent_surface_workspace *w = ws_new (fn);
  mxArray *cell = mxCreateCellMatrix (1, m);
  for (size_t i = 0; i < m; i++)
    {
      /* the geodesic over the arc arcs[i] (the core picks the side) */
      int st = holent_surface_pair (w, &bg, pts[pr[2 * i]], 0.0,
                                    pts[pr[2 * i + 1]], 0.0, arcs[i], tol);
      if (st)
        {
          holent_surface_workspace_free (w);
          mxFree (pr);
          mxDestroyArray (cell);
          holent_gw_raise (fn, st, "geodesic", i, NULL);
        }
      mxSetCell (cell, i, curve_out (&w->cur, with_t));
    }
  holent_surface_workspace_free (w);
  mxFree (pr);
  plhs[0] = cell;
}

static void
op_runner (const char *fn, int nlhs, mxArray *plhs[], int nrhs,
           const mxArray *prhs[])
{
  holent_geo_bg bg;
  size_t niv, np, na;
  holent_gw_nargs (fn, nlhs, 4, nrhs, 7, 7);
  holent_gw_bg (prhs[2], fn, &bg);
  const double *iv = holent_gw_real (prhs[3], fn, "IV", &niv);
  holent_gw_real (prhs[4], fn, "PAIRS", &np);
  const double *amin = holent_gw_real (prhs[5], fn, "ARCS", &na);
  double hmin = holent_gw_scalar (prhs[6], fn, "HOR");
  size_t n = niv / 2;
  if (niv != 2 * n || np != 2 * na || na != n)
    holent_gw_raise (fn, HOLENT_ESIZE, NULL, HOLENT_NOINDEX,
                     "IV, PAIRS and ARCS do not match");
  if (n > HOLENT_SURFACE_RUNNER_NMAX)
    holent_gw_raise (fn, HOLENT_ETOOBIG, NULL, HOLENT_NOINDEX,
                     "the runner-up is available for at most %d intervals, "
                     "got %zu", (int) HOLENT_SURFACE_RUNNER_NMAX, n);
  size_t pmin[2 * HOLENT_SURFACE_RUNNER_NMAX], pr[2 * HOLENT_SURFACE_RUNNER_NMAX];
  double arcs[HOLENT_SURFACE_RUNNER_NMAX], S = 0;
  int hor = 0;
  get_pairs (fn, prhs[4], 2 * n, pmin, n);
  holent_region *r = holent_region_alloc (n > 0 ? n : 1);
  holent_surface_workspace *w = holent_surface_workspace_alloc ();
  int st = (r == NULL || w == NULL) ? HOLENT_ENOMEM : HOLENT_SUCCESS;
  if (!st)
    st = holent_region_set (r, bg.circle, bg.L, n, iv, iv + n);
  if (!st && r->n != n)
    st = HOLENT_EINVAL;
  if (!st)
    st = holent_surface_runner_up (w, &bg, r, pmin, amin, hmin != 0.0, pr,
                                   arcs, &hor, &S);
  holent_region_free (r);
  holent_surface_workspace_free (w);
  if (st == HOLENT_EDOM)
    holent_gw_raise (fn, st, NULL, HOLENT_NOINDEX, "the region has a "
                     "single RT candidate: there is no runner-up");
  if (st)
    holent_gw_raise (fn, st, "region", HOLENT_NOINDEX, NULL);
  mxArray *P = mxCreateDoubleMatrix (n, 2, mxREAL), *A = mxCreateDoubleMatrix (n, 1, mxREAL);
  for (size_t i = 0; i < n; i++)
    {
      mxGetPr (P)[i] = (double) pr[2 * i] + 1;
      mxGetPr (P)[i + n] = (double) pr[2 * i + 1] + 1;
      mxGetPr (A)[i] = arcs[i];
    }
  plhs[0] = P;
  plhs[1] = A;
  plhs[2] = mxCreateLogicalScalar (hor != 0);
  plhs[3] = mxCreateDoubleScalar (S);
}

static void
op_horizon (const char *fn, int nlhs, mxArray *plhs[], int nrhs,
           const mxArray *prhs[])
{
  holent_geo_bg bg;
  double depth;
  holent_gw_nargs (fn, nlhs, 4, nrhs, 6, 6);
  holent_gw_bg (prhs[2], fn, &bg);
  double xa = holent_gw_scalar (prhs[3], fn, "XA");
  double xb = holent_gw_scalar (prhs[4], fn, "XB");
  double tol = holent_gw_scalar (prhs[5], fn, "TOL");
  holent_surface_workspace *w = ws_new (fn);
  int st = holent_surface_horizon (w, &bg, xa, xb, tol, &depth);
  if (st)
    {
      holent_surface_workspace_free (w);
      holent_gw_raise (fn, st, "BG", HOLENT_NOINDEX, NULL);
    }
  plhs[0] = curve_out (&w->cur, 0);
  plhs[1] = mxCreateDoubleScalar (depth);
  holent_surface_workspace_free (w);
}

static void
op_profile (const char *fn, int nlhs, mxArray *plhs[], int nrhs,
           const mxArray *prhs[])
{
  holent_hd_bg bg;
  holent_gw_nargs (fn, nlhs, 4, nrhs, 6, 6);
  double ball = holent_gw_scalar (prhs[3], fn, "BALL");
  double top = holent_gw_scalar (prhs[4], fn, "TOP");
  double tol = holent_gw_scalar (prhs[5], fn, "TOL");
  holent_gw_hd_bg (prhs[2], fn, &bg);
  holent_surface_workspace *w = holent_surface_workspace_alloc ();
  int st = w == NULL ? HOLENT_ENOMEM
                     : holent_surface_profile (w, &bg, ball != 0.0, top, tol);
  holent_hd_bg_free (&bg);
  if (st)
    {
      holent_surface_workspace_free (w);
      holent_gw_raise (fn, st, "profile", HOLENT_NOINDEX, NULL);
    }
  plhs[0] = curve_out (&w->cur, 0);
  holent_surface_workspace_free (w);
}

static void
op_boosted (const char *fn, int nlhs, mxArray *plhs[], int nrhs,
           const mxArray *prhs[])
{
  holent_geo_bg bg;
  size_t n[4];
  holent_gw_nargs (fn, nlhs, 4, nrhs, 8, 8);
  holent_gw_bg (prhs[2], fn, &bg);
  const double *x1 = holent_gw_real (prhs[3], fn, "X1", &n[0]);
  const double *t1 = holent_gw_real (prhs[4], fn, "T1", &n[1]);
  const double *x2 = holent_gw_real (prhs[5], fn, "X2", &n[2]);
  const double *t2 = holent_gw_real (prhs[6], fn, "T2", &n[3]);
  double tol = holent_gw_scalar (prhs[7], fn, "TOL");
  if (n[1] != n[0] || n[2] != n[0] || n[3] != n[0])
    holent_gw_raise (fn, HOLENT_ESIZE, NULL, HOLENT_NOINDEX,
                     "X1, T1, X2 and T2 must have one size");
  holent_surface_workspace *w = ws_new (fn);
  mxArray *cell = mxCreateCellMatrix (n[0], 1);
  for (size_t i = 0; i < n[0]; i++)
    {
      double b = x2[i];
      if (bg.circle)
        {
          /* the arc from x1 in the positive direction */
          b = x1[i] + fmod (x2[i] - x1[i], bg.L);
          if (b <= x1[i])
            b += bg.L;
        }
      int st = holent_surface_geodesic_t (w, &bg, x1[i], t1[i], b, t2[i], tol);
      if (st)
        {
          holent_surface_workspace_free (w);
          mxDestroyArray (cell);
          if (st == HOLENT_ETIMELIKE)
            holent_gw_raise (fn, st, NULL, HOLENT_NOINDEX, "endpoints %zu "
                             "are not spacelike separated", i + 1);
          holent_gw_raise (fn, st, "X1", i, NULL);
        }
      mxSetCell (cell, i, curve_out (&w->cur, 1));
    }
  holent_surface_workspace_free (w);
  plhs[0] = cell;
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  static const char *modes[] = { "curves", "runner", "horizon", "profile",
                                 "boosted" };
  static void (*const ops[]) (const char *, int, mxArray **, int,
                              const mxArray **) = {
    op_curves, op_runner, op_horizon, op_profile, op_boosted
  };
  char mode[16], fn[64];
  holent_gw_init ();
  holent_gw_nargs (GW, nlhs, 4, nrhs, 2, 8);
  holent_gw_string (prhs[0], GW, "MODE", mode, sizeof mode);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  for (size_t k = 0; k < sizeof modes / sizeof modes[0]; k++)
    if (strcmp (mode, modes[k]) == 0)
      {
        ops[k] (fn, nlhs, plhs, nrhs, prhs);
        return;
      }
  holent_gw_raise (fn, HOLENT_EOPTION, "MODE", HOLENT_NOINDEX,
                   "unknown mode '%s'", mode);
}
