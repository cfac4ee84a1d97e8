/* [S, BRANCH, NSHORT] = __holent_interval__ ("entropy", FN, BG, L):
 * single-interval RT entropies (holent_interval_entropy); a bad length is
 * explained by the core (holent_interval_check) and raised naming FN and
 * L(i).  SPDX-License-Identifier: GPL-3.0-or-later  */
#include <string.h>
#include "holent_gw.h"
#include "core/holent_interval.h"

static const char GW[] = "__holent_interval__";

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16], fn[64];
  holent_geo_bg bg;
  holent_err e;
  size_t n, bad = 0, nshort = 0;
  unsigned char *br = NULL;
  static const char *const names[] = { "L" };
  holent_gw_init ();
  holent_gw_nargs (GW, nlhs, 3, nrhs, 4, 4);
  holent_gw_string (prhs[0], GW, "MODE", mode, sizeof mode);
  if (strcmp (mode, "entropy") != 0)
    holent_gw_raise (GW, HOLENT_EINVAL, "MODE", HOLENT_NOINDEX,
                     "unknown mode '%s'", mode);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  holent_gw_bg (prhs[2], fn, &bg);
  const double *l = holent_gw_real (prhs[3], fn, "L", &n);
  plhs[0] = holent_gw_like (prhs[3]);
  if (nlhs > 1)
    {
      plhs[1] = mxCreateNumericArray (mxGetNumberOfDimensions (prhs[3]),
                                      mxGetDimensions (prhs[3]),
                                      mxLOGICAL_CLASS, mxREAL);
      br = (unsigned char *) mxGetData (plhs[1]);
    }
  int st = holent_interval_entropy (&bg, n, l, mxGetPr (plhs[0]), br, &bad,
                                    &nshort);
  if (st)
    {
      if (bad >= n || holent_interval_check (&bg, bad, l[bad], &e) == 0)
        holent_err_set (&e, st, 0, HOLENT_NOINDEX, NULL);
      holent_gw_raise_err (fn, &e, names, 1);
    }
  if (nlhs > 2)
    plhs[2] = mxCreateDoubleScalar ((double) nshort);
}
