/* RT surfaces in AdS_{d+1}:
 *   [S, FIN, DELTA, ZSTAR, REACH] = __holent_hd__ ("strip", BG, L, LPERP)
 *   [S, FIN, DELTA, ZTIP, REACH]  = __holent_hd__ ("ball", BG, R)
 *   [ZH, FPH, M] = __holent_hd__ ("tabulated", D, Z, F)  (checks samples)
 * GPL-3.0-or-later.  */
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

static void
tabulated (int nlhs, mxArray *plhs[], const mxArray *prhs[])
{
  holent_hd_bg bg;
  size_t nz, nf, bad = (size_t) -1;
  double dd = holent_gw_scalar (prhs[1], FN, "D");
  const double *z = holent_gw_real (prhs[2], FN, "Z", &nz);
  const double *f = holent_gw_real (prhs[3], FN, "F", &nf);
  if (dd != floor (dd) || nz != nf)
    mexErrMsgIdAndTxt ("holent:invalid", "bad D, Z or F");
  int st = holent_hd_bg_tabulated (&bg, (int) dd, nz, z, f, 1, 1, 1, &bad);
  if (st)
    holent_gw_fail (st, FN, "F", bad);
  plhs[0] = mxCreateDoubleScalar (bg.zh);
  if (nlhs > 1)
    plhs[1] = mxCreateDoubleScalar (bg.fp_h);
  if (nlhs > 2)
    plhs[2] = mxCreateDoubleScalar (bg.m);
  if (nlhs > 3)
    plhs[3] = mxCreateDoubleScalar (bg.zmax);
  holent_hd_bg_free (&bg);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char op[16];
  holent_hd_bg bg;
  size_t n, bad = (size_t) -1;
  double reach = INFINITY, Lperp = 1;
  holent_gw_init ();
  holent_gw_nargs (FN, nlhs, 5, nrhs, 3, 4);
  holent_gw_string (prhs[0], FN, "OP", op, sizeof op);
  int strip = strcmp (op, "strip") == 0;
  if (strcmp (op, "tabulated") == 0)
    {
      if (nrhs != 4)
        mexErrMsgIdAndTxt ("holent:nargs", "tabulated needs D, Z, F");
      tabulated (nlhs, plhs, prhs);
      return;
    }
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
  mxArray *out[5];
  for (int k = 0; k < 4; k++)
    out[k] = holent_gw_like (prhs[2]);
  double *S = mxGetPr (out[0]), *fin = mxGetPr (out[1]);
  double *del = mxGetPr (out[2]), *zs = mxGetPr (out[3]);
  int st = strip ? holent_strip_entropy (&bg, sw, Lperp, n, x, S, fin, del,
                                         zs, &bad, &reach)
                 : holent_ball_entropy (&bg, bw, n, x, S, fin, del, zs, &bad,
                                        &reach);
  if (st)
    fail (st, &bg, sw, bw, strip ? "width" : "radius", strip ? "L" : "R", x, bad,
          reach);
  out[4] = mxCreateDoubleScalar (reach);
  for (int k = 0; k < 5; k++)
    if (k < (nlhs > 1 ? nlhs : 1))
      plhs[k] = out[k];
    else
      mxDestroyArray (out[k]);
  holent_hd_bg_free (&bg);
  holent_strip_workspace_free (sw);
  holent_ball_workspace_free (bw);
}
