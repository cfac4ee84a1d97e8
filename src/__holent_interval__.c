/* [S, BRANCH, NSHORT] = __holent_interval__ (BG, L): single-interval RT
 * entropies.  GPL-3.0-or-later.  */
#include "holent_gw.h"
#include "core/holent_interval.h"

static const char FN[] = "__holent_interval__";

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  holent_geo_bg bg;
  size_t n, bad = (size_t) -1, nshort = 0;
  unsigned char *br = NULL;
  holent_gw_init ();
  holent_gw_nargs (FN, nlhs, 3, nrhs, 2, 2);
  holent_gw_bg (prhs[0], FN, &bg);
  const double *l = holent_gw_real (prhs[1], FN, "L", &n);
  plhs[0] = holent_gw_like (prhs[1]);
  if (nlhs > 1)
    {
      plhs[1] = mxCreateNumericArray (mxGetNumberOfDimensions (prhs[1]),
                                      mxGetDimensions (prhs[1]),
                                      mxUINT8_CLASS, mxREAL);
      br = (unsigned char *) mxGetData (plhs[1]);
    }
  int st = holent_interval_entropy (&bg, n, l, mxGetPr (plhs[0]), br, &bad,
                                    &nshort);
  if (st)
    holent_gw_fail (st, FN, "L", bad);
  if (nlhs > 2)
    plhs[2] = mxCreateDoubleScalar ((double) nshort);
}
