/* RT surfaces in AdS_{d+1}:
 *   [S, FIN, DELTA, ZSTAR, REACH, ACC] = __holent_hd__ ("strip", BG, L, LPERP)
 *   [S, FIN, DELTA, ZTIP, REACH, ACC]  = __holent_hd__ ("ball", BG, R)
 *   [VE, VB, ZM] = __holent_hd__ ("velocity", BG)
 *   __holent_hd__ ("check", BG)   (raises holent:background unless valid)
 *   [S, FIN, ZSTAR, VSTAR, JUMP] = __holent_hd__ ("vaidya", BG, L, LPERP, T)
 * ACC: accuracy of FIN (and DELTA) allowed by a tabulated f's data.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_hd.h"

static const char FN[] = "__holent_hd__";

static void
fail (int st, holent_hd_bg *bg, holent_strip_workspace *sw,
      holent_ball_workspace *bw, const char *what, const char *name,
      const double *x, size_t bad, double reach)
{
  holent_hd_bg_free (bg);
  holent_strip_workspace_free (sw);
  holent_ball_workspace_free (bw);
  if (st == HOLENT_EDOM && bad != (size_t) -1 && isfinite (x[bad])
      && x[bad] > 0)
    mexErrMsgIdAndTxt ("holent:reach",
                       "%s(%zu) = %g is beyond the largest %s reachable "
                       "in this background (%g)", name, bad + 1, x[bad],
                       what, reach);
  holent_gw_fail (st, FN, name, bad);
}

/* [S, FIN, ZSTAR, VSTAR, JUMP] = __holent_hd__ ("vaidya", BG, L, LPERP, T) */
static void
vaidya (int nlhs, mxArray *plhs[], const mxArray *prhs[])
{
  holent_hd_bg bg;
  size_t n, bad = (size_t) -1;
  double l = holent_gw_scalar (prhs[2], FN, "L");
  double Lperp = holent_gw_scalar (prhs[3], FN, "LPERP");
  const double *t = holent_gw_real (prhs[4], FN, "T", &n);
  const mxArray *wf = mxGetField (prhs[1], 0, "shell_width");
  if (wf == NULL)
    mexErrMsgIdAndTxt ("holent:background",
                       "BG must be a quench made by ads_background (d, \"vaidya\", ...)");
  double w = holent_gw_scalar (wf, FN, "BG.shell_width");
  holent_gw_hd_bg (prhs[1], FN, &bg);
  holent_vaidya_workspace *ws = holent_vaidya_workspace_alloc ();
  mxArray *out[5];
  for (int k = 0; k < 4; k++)
    out[k] = holent_gw_like (prhs[4]);
  out[4] = mxCreateLogicalArray (mxGetNumberOfDimensions (prhs[4]),
                                 mxGetDimensions (prhs[4]));
  int st = ws ? holent_vaidya_strip (&bg, w, ws, Lperp, l, n, t,
                                     mxGetPr (out[0]), mxGetPr (out[1]),
                                     mxGetPr (out[2]), mxGetPr (out[3]),
                                     (unsigned char *) mxGetLogicals (out[4]),
                                     &bad)
              : HOLENT_ENOMEM;
  holent_hd_bg_free (&bg);
  holent_vaidya_workspace_free (ws);
  if (st)
    {
      for (int k = 0; k < 5; k++)
        mxDestroyArray (out[k]);
      if (st == HOLENT_ENOCONV && bad != (size_t) -1)
        mexErrMsgIdAndTxt ("holent:noconv",
                           "T(%zu) = %g: no extremal surface of width %g found",
                           bad + 1, t[bad], l);
      holent_gw_fail (st, FN, bad != (size_t) -1 ? "T" : "L", bad);
    }
  for (int k = 0; k < 5; k++)
    if (k < (nlhs > 1 ? nlhs : 1))
      plhs[k] = out[k];
    else
      mxDestroyArray (out[k]);
}

/* [VE, VB, ZM] = __holent_hd__ ("velocity", BG) */
static void
velocity (int nlhs, mxArray *plhs[], const mxArray *bgs)
{
  holent_hd_bg bg;
  double vE, vB, zm, zneed = NAN;
  holent_gw_hd_bg (bgs, FN, &bg);
  int st = holent_hd_velocities (&bg, &vE, &zm, &vB, &zneed);
  double zh = bg.zh;
  holent_hd_bg_free (&bg);
  if (st == HOLENT_EDOM && !isfinite (zh))
    mexErrMsgIdAndTxt ("holent:domain",
                       "BG has no horizon: the velocities need one");
  if (st == HOLENT_EDOM && isfinite (zneed))
    mexErrMsgIdAndTxt ("holent:domain",
                       "the samples of f must extend past the maximum of "
                       "-f(z)/z^(2d-2) inside the horizon (still growing at "
                       "z_max = %g): tabulate f further beyond zh = %g",
                       zneed, zh);
  if (st)
    holent_gw_fail (st, FN, "BG", (size_t) -1);
  plhs[0] = mxCreateDoubleScalar (vE);
  if (nlhs > 1)
    plhs[1] = mxCreateDoubleScalar (vB);
  if (nlhs > 2)
    plhs[2] = mxCreateDoubleScalar (zm);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char op[16];
  holent_hd_bg bg;
  size_t n, bad = (size_t) -1;
  double reach = INFINITY, Lperp = 1;
  holent_gw_init ();
  holent_gw_nargs (FN, nlhs, 6, nrhs, 2, 5);
  holent_gw_string (prhs[0], FN, "OP", op, sizeof op);
  if (strcmp (op, "check") == 0)
    {
      /* the background checked by one core call (its unpacking) */
      holent_hd_bg bg;
      if (nrhs != 2)
        mexErrMsgIdAndTxt ("holent:nargs", "wrong number of inputs for %s", op);
      holent_gw_hd_bg (prhs[1], FN, &bg);
      holent_hd_bg_free (&bg);
      return;
    }
  if (strcmp (op, "vaidya") == 0)
    {
      if (nrhs != 5)
        mexErrMsgIdAndTxt ("holent:nargs", "wrong number of inputs for %s", op);
      vaidya (nlhs, plhs, prhs);
      return;
    }
  if (strcmp (op, "velocity") == 0)
    {
      if (nrhs != 2)
        mexErrMsgIdAndTxt ("holent:nargs", "wrong number of inputs for %s", op);
      velocity (nlhs, plhs, prhs[1]);
      return;
    }
  int strip = strcmp (op, "strip") == 0;
  if (!strip && strcmp (op, "ball") != 0)
    mexErrMsgIdAndTxt ("holent:invalid", "unknown OP '%s'", op);
  if (nrhs != (strip ? 4 : 3))
    mexErrMsgIdAndTxt ("holent:nargs", "wrong number of inputs for %s", op);
  const double *x = holent_gw_real (prhs[2], FN, strip ? "L" : "R", &n);
  if (strip)
    Lperp = holent_gw_scalar (prhs[3], FN, "LPERP");
  /* all Octave-side checks done: from here free before raising */
  holent_gw_hd_bg (prhs[1], FN, &bg);
  holent_strip_workspace *sw = strip ? holent_strip_workspace_alloc () : NULL;
  holent_ball_workspace *bw = strip ? NULL : holent_ball_workspace_alloc ();
  if (sw == NULL && bw == NULL)
    fail (HOLENT_ENOMEM, &bg, sw, bw, "", "workspace", x, bad, reach);
  mxArray *out[6];
  for (int k = 0; k < 4; k++)
    out[k] = holent_gw_like (prhs[2]);
  out[5] = holent_gw_like (prhs[2]);
  double *S = mxGetPr (out[0]), *fin = mxGetPr (out[1]);
  double *del = mxGetPr (out[2]), *zs = mxGetPr (out[3]);
  int st = strip ? holent_strip_entropy (&bg, sw, Lperp, n, x, S, fin, del,
                                         zs, &bad, &reach)
                 : holent_ball_entropy (&bg, bw, n, x, S, fin, del, zs, &bad,
                                        &reach);
  if (st)
    fail (st, &bg, sw, bw, strip ? "width" : "radius", strip ? "L" : "R", x, bad,
          reach);
  if (nlhs > 5)
    {
      double *acc = mxGetPr (out[5]);
      st = strip ? holent_strip_accuracy (&bg, sw, Lperp, n, x, fin, acc)
                 : holent_ball_accuracy (&bg, bw, n, x, fin, acc);
      if (st)
        fail (st, &bg, sw, bw, "", "accuracy", x, (size_t) -1, reach);
    }
  out[4] = mxCreateDoubleScalar (reach);
  for (int k = 0; k < 6; k++)
    if (k < (nlhs > 1 ? nlhs : 1))
      plhs[k] = out[k];
    else
      mxDestroyArray (out[k]);
  holent_hd_bg_free (&bg);
  holent_strip_workspace_free (sw);
  holent_ball_workspace_free (bw);
}
