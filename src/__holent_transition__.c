/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Transition points (gateway of holent_transition).
 *
 *   [X, FOUND] = __holent_transition__ ("plateau", BG)
 *   [X, FOUND] = __holent_transition__ ("separation", BG, L1, L2)
 *   [X, FOUND] = __holent_transition__ ("hawking_page", OMEGA, L)
 *   [X, FOUND] = __holent_transition__ ("strip_pair", HDBG, L1, L2)
 * L1, L2 (OMEGA, L) arrays of one size; X, FOUND of that size.  */
#include <math.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_hd.h"
#include "core/holent_transition.h"

static const char FN[] = "__holent_transition__";

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char op[16];
  holent_transition_result r;
  int st = 0;
  size_t n = 1, n2 = 1, bad = (size_t) -1;
  (void) nlhs;
  holent_gw_init ();
  holent_gw_nargs (FN, nlhs, 2, nrhs, 2, 4);
  holent_gw_string (prhs[0], FN, "OP", op, sizeof op);
  const mxArray *shape = NULL;
  const double *a = NULL, *b = NULL;
  if (strcmp (op, "plateau") == 0)
    {
      if (nrhs != 2)
        mexErrMsgIdAndTxt ("holent:nargs", "plateau needs BG");
    }
  else if (strcmp (op, "separation") == 0 || strcmp (op, "strip_pair") == 0
           || strcmp (op, "hawking_page") == 0)
    {
      int k = op[0] == 'h' ? 1 : 2;
      if (nrhs != k + 2)
        mexErrMsgIdAndTxt ("holent:nargs", "wrong number of inputs for %s", op);
      a = holent_gw_real (prhs[k], FN, "L1", &n);
      b = holent_gw_real (prhs[k + 1], FN, "L2", &n2);
      if (n != n2)
        mexErrMsgIdAndTxt ("holent:size", "L1 and L2 must have one size");
      shape = prhs[k];
    }
  else
    mexErrMsgIdAndTxt ("holent:invalid", "unknown OP '%s'", op);
  mxArray *X = shape ? holent_gw_like (shape) : mxCreateDoubleScalar (0);
  mxArray *F = shape ? holent_gw_like (shape) : mxCreateDoubleScalar (0);
  double *x = mxGetPr (X), *f = mxGetPr (F);
  if (op[0] == 'p')
    {
      holent_geo_bg bg;
      holent_gw_bg (prhs[1], FN, &bg);
      st = holent_transition_plateau (&bg, &r);
      x[0] = r.x;
      f[0] = r.found;
    }
  else if (op[0] == 's' && op[1] == 'e')
    {
      holent_geo_bg bg;
      holent_gw_bg (prhs[1], FN, &bg);
      for (size_t i = 0; i < n && !st; i++)
        {
          st = holent_transition_separation (&bg, a[i], b[i], &r);
          x[i] = r.x;
          f[i] = r.found;
          bad = i;
        }
    }
  else if (op[0] == 'h')
    {
      for (size_t i = 0; i < n && !st; i++)
        {
          st = holent_transition_hawking_page (a[i], b[i], &r);
          x[i] = r.x;
          f[i] = r.found;
          bad = i;
        }
    }
  else
    {
      holent_hd_bg bg;
      holent_gw_hd_bg (prhs[1], FN, &bg);
      holent_strip_workspace *w = holent_strip_workspace_alloc ();
      if (w == NULL)
        st = HOLENT_ENOMEM;
      for (size_t i = 0; i < n && !st; i++)
        {
          st = holent_transition_strip_pair (&bg, w, a[i], b[i], &r);
          x[i] = r.x;
          f[i] = r.found;
          bad = i;
        }
      holent_strip_workspace_free (w);
      holent_hd_bg_free (&bg);
    }
  if (st)
    {
      mxDestroyArray (X);
      mxDestroyArray (F);
      if (st == HOLENT_EUNSUP)
        mexErrMsgIdAndTxt ("holent:unsupported", "this transition is not "
                           "available for this background");
      holent_gw_fail (st, FN, shape ? "L1" : "BG", shape ? bad : (size_t) -1);
    }
  plhs[0] = X;
  if (nlhs > 1)
    plhs[1] = F;
  else
    mxDestroyArray (F);
}
