/* [S, BRANCH, NSHORT] = __holent_interval__ ("entropy", FN, BG, L):
 * single-interval RT entropies (holent_interval_entropy); a bad length is
 * explained by the core (holent_interval_check) and raised naming FN and
 * L(i).  The lengths go through the kernel in slabs of
 * HOLENT_SLAB_VALUES, polled between (Ctrl-C, progress line).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_array.h"
#include "holent_gw_poll.h"
#include "core/holent_interval.h"
#include "core/holent_slab.h"

static const char GW[] = "__holent_interval__";

typedef struct
{
  const holent_geo_bg *bg;
  const double *l;
  double *S;
  unsigned char *br;
  size_t bad, nshort;
} job;

static int
slab (void *ctx, size_t i0, size_t m)
{
  job *j = ctx;
  size_t bad = m, ns = 0;
  int st = holent_interval_entropy (j->bg, m, j->l + i0, j->S + i0,
                                    j->br ? j->br + i0 : NULL, &bad, &ns);
  if (st && bad < m)
    j->bad = i0 + bad;
  j->nshort += ns;
  return st;
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16], fn[64];
  holent_geo_bg bg;
  holent_err e;
  size_t n;
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
  /* Octave's own array: no copy of a large result on return, which
     would be a pause no poll can interrupt (doc/conventions.md) */
  mxArray *S = holent_gw_result_like (prhs[3]), *B = NULL;
  job j = { &bg, l, mxGetPr (S), NULL, n, 0 };
  if (nlhs > 1)
    {
      B = mxCreateNumericArray (mxGetNumberOfDimensions (prhs[3]),
                                mxGetDimensions (prhs[3]), mxLOGICAL_CLASS,
                                mxREAL);
      j.br = (unsigned char *) mxGetData (B);
    }
  int st = holent_slab_run (n, HOLENT_SLAB_VALUES, slab, &j,
                            holent_gw_poll (fn));
  holent_gw_poll_end ();
  if (st)
    {
      mxDestroyArray (S);
      if (B)
        mxDestroyArray (B);
      if (st == HOLENT_EINTR)
        holent_gw_interrupt ();
      if (j.bad >= n || holent_interval_check (&bg, j.bad, l[j.bad], &e) == 0)
        holent_err_set (&e, st, 0, HOLENT_NOINDEX, NULL);
      holent_gw_raise_err (fn, &e, names, 1);
    }
  plhs[0] = S;
  if (nlhs > 1)
    plhs[1] = B;
  if (nlhs > 2)
    plhs[2] = mxCreateDoubleScalar ((double) j.nshort);
}
