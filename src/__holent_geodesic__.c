/* LEN = __holent_geodesic__ ("length", FN, BG, X1, X2, CLASS): regulated
 * geodesic lengths.  X1 and X2 have the same size (the wrapper
 * broadcasts); CLASS is 0 (shorter), 1 (positive arc) or 2 (negative
 * arc).  A bad pair is explained by the core (holent_geo_points_check).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <string.h>
#include "holent_gw.h"
#include "core/holent_geo.h"

static const char GW[] = "__holent_geodesic__";

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16], fn[64];
  holent_geo_bg bg;
  holent_err e;
  size_t n1, n2, bad = 0;
  static const char *const names[] = { "X1", "X2" };
  holent_gw_init ();
  holent_gw_nargs (GW, nlhs, 1, nrhs, 6, 6);
  holent_gw_string (prhs[0], GW, "MODE", mode, sizeof mode);
  if (strcmp (mode, "length") != 0)
    holent_gw_raise (GW, HOLENT_EINVAL, "MODE", HOLENT_NOINDEX,
                     "unknown mode '%s'", mode);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  holent_gw_bg (prhs[2], fn, &bg);
  const double *x1 = holent_gw_real (prhs[3], fn, "X1", &n1);
  const double *x2 = holent_gw_real (prhs[4], fn, "X2", &n2);
  if (n1 != n2)
    holent_gw_raise (fn, HOLENT_ESIZE, NULL, HOLENT_NOINDEX,
                     "X1 and X2 must have one size");
  double cls = holent_gw_scalar (prhs[5], fn, "CLASS");
  if (cls != 0.0 && cls != 1.0 && cls != 2.0)
    holent_gw_raise (fn, HOLENT_EINVAL, "CLASS", HOLENT_NOINDEX,
                     "must be 0, 1 or 2");
  plhs[0] = holent_gw_like (prhs[3]);
  int st = holent_geo_point_lengths (&bg, n1, x1, x2, (holent_geo_class) cls,
                                     mxGetPr (plhs[0]), &bad);
  if (st)
    {
      (void) bad;
      if (holent_geo_points_check (&bg, n1, x1, x2, &e) == 0)
        holent_err_set (&e, st, -1, HOLENT_NOINDEX, NULL);
      holent_gw_raise_err (fn, &e, names, 2);
    }
}
