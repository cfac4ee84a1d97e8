/* __holent_geodesic__ (BG, X1, X2, CLASS): regulated geodesic lengths.
 * X1 and X2 have the same size (the wrapper broadcasts); CLASS is 0
 * (shorter), 1 (positive arc) or 2 (negative arc).  GPL-3.0-or-later.  */
#include "holent_gw.h"
#include "core/holent_geo.h"

static const char FN[] = "__holent_geodesic__";

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  holent_geo_bg bg;
  size_t n1, n2, bad = (size_t) -1;
  holent_gw_init ();
  holent_gw_nargs (FN, nlhs, 1, nrhs, 4, 4);
  holent_gw_bg (prhs[0], FN, &bg);
  const double *x1 = holent_gw_real (prhs[1], FN, "X1", &n1);
  const double *x2 = holent_gw_real (prhs[2], FN, "X2", &n2);
  if (n1 != n2)
    mexErrMsgIdAndTxt ("holent:size", "X1 and X2 must have one size");
  double cls = holent_gw_scalar (prhs[3], FN, "CLASS");
  if (cls != 0.0 && cls != 1.0 && cls != 2.0)
    mexErrMsgIdAndTxt ("holent:invalid", "CLASS must be 0, 1 or 2");
  plhs[0] = holent_gw_like (prhs[1]);
  int st = holent_geo_point_lengths (&bg, n1, x1, x2, (holent_geo_class) cls,
                                     mxGetPr (plhs[0]), &bad);
  if (st)
    holent_gw_fail (st, FN, "X1, X2", bad);
}
