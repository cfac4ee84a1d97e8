/* LEN = __holent_geodesic__ ("length", FN, BG, X1, X2, CLASS): regulated
 * geodesic lengths.  X1 and X2 have the same size (the wrapper
 * broadcasts); CLASS is 0 (shorter), 1 (positive arc) or 2 (negative
 * arc).  A bad pair is explained by the core (holent_geo_points_check).
 * The pairs go through the kernel in slabs of HOLENT_SLAB_VALUES, polled
 * between (Ctrl-C, progress line).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_array.h"
#include "holent_gw_poll.h"
#include "core/holent_geo.h"
#include "core/holent_slab.h"

static const char GW[] = "__holent_geodesic__";

typedef struct
{
  const holent_geo_bg *bg;
  const double *x1, *x2;
  holent_geo_class cls;
  double *len;
} job;

static int
slab (void *ctx, size_t i0, size_t m)
{
  job *j = ctx;
  size_t bad;
  return holent_geo_point_lengths (j->bg, m, j->x1 + i0, j->x2 + i0, j->cls,
                                   j->len + i0, &bad);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16], fn[64];
  holent_geo_bg bg;
  holent_err e;
  size_t n1, n2;
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
  /* Octave's own array: no copy of a large result on return, which
     would be a pause no poll can interrupt (doc/conventions.md) */
  mxArray *len = holent_gw_result_like (prhs[3]);
  job j = { &bg, x1, x2, (holent_geo_class) cls, mxGetPr (len) };
  int st = holent_slab_run (n1, HOLENT_SLAB_VALUES, slab, &j,
                            holent_gw_poll (fn));
  holent_gw_poll_end ();
  if (st)
    {
      mxDestroyArray (len);
      if (st == HOLENT_EINTR)
        holent_gw_interrupt ();
      if (holent_geo_points_check (&bg, n1, x1, x2, &e) == 0)
        holent_err_set (&e, st, -1, HOLENT_NOINDEX, NULL);
      holent_gw_raise_err (fn, &e, names, 2);
    }
  plhs[0] = len;
}
