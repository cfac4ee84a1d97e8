/* [COUNT, VIOLATED, WORST, REGIONS, UNDECIDED] = __holent_ineq__ ("eval",
 * FN, S, FAMILY, M, COMPLETE, TOL): one family of entropy inequalities evaluated
 * on the entropy vector S (2^N - 1 entries).  FAMILY is "sa", "al",
 * "ssa", "wm", "mmi" or "cyclic" (M = number of regions, odd, for
 * "cyclic"); COMPLETE nonzero asks for every instance.  REGIONS: the
 * party masks of the worst instance (a row, empty when there is none);
 * UNDECIDED: instances that evaluated to NaN.  Ctrl-C stops a long
 * enumeration (progress line: holent_gw_poll).  Errors name FN.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_poll.h"
#include "core/holent_ineq.h"

static const char GW[] = "__holent_ineq__";

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  static const char *names[] = { "sa", "al", "ssa", "wm", "mmi", "cyclic" };
  char fam[16];
  size_t len, k;
  unsigned n, f, j;
  double m, complete, tol, *out;
  holent_ineq_result res;
  int st;

  char mode[16], fn[64];
  holent_gw_init ();
  holent_gw_nargs (GW, nlhs, 5, nrhs, 7, 7);
  holent_gw_string (prhs[0], GW, "MODE", mode, sizeof mode);
  if (strcmp (mode, "eval") != 0)
    holent_gw_raise (GW, HOLENT_EINVAL, "MODE", HOLENT_NOINDEX,
                     "unknown mode '%s'", mode);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  const double *s = holent_gw_real (prhs[2], fn, "SVEC", &len);
  holent_gw_string (prhs[3], fn, "FAMILY", fam, sizeof fam);
  for (f = 0; f < sizeof names / sizeof names[0]; f++)
    if (strcmp (fam, names[f]) == 0)
      break;
  if (f == sizeof names / sizeof names[0])
    holent_gw_raise (fn, HOLENT_EOPTION, "FAMILY", HOLENT_NOINDEX,
                     "unknown family '%s'", fam);
  m = holent_gw_scalar (prhs[4], fn, "M");
  complete = holent_gw_scalar (prhs[5], fn, "COMPLETE");
  tol = holent_gw_scalar (prhs[6], fn, "TOL");
  if (!(m >= 0 && m <= HOLENT_INEQ_NMAX && m == floor (m)))
    holent_gw_raise (fn, HOLENT_EDOM, "M", HOLENT_NOINDEX,
                     "must be an integer in [0, %d]", HOLENT_INEQ_NMAX);
  if ((st = holent_ineq_nparties (len, &n)))
    holent_gw_raise (fn, st == HOLENT_ETOOBIG ? HOLENT_ETOOBIG : HOLENT_EDOM,
                     "SVEC", HOLENT_NOINDEX, "must have 2^N - 1 entries "
                     "with 1 <= N <= %d, got %zu", HOLENT_INEQ_NMAX, len);
  if (!(tol >= 0) || isinf (tol))
    holent_gw_raise (fn, HOLENT_EDOM, "tol", HOLENT_NOINDEX,
                     "must be finite and nonnegative");
  if (f == HOLENT_INEQ_CYCLIC
      && (m < 3 || fmod (m, 2) == 0 || m > n))
    holent_gw_raise (fn, HOLENT_EDOM, "M", HOLENT_NOINDEX,
                     "must be odd with 3 <= M <= N = %u, got %g", n, m);
  st = holent_ineq_eval (n, s, (holent_ineq_family) f, (unsigned) m,
                         complete != 0, tol, &res, holent_gw_poll (fn));
  holent_gw_poll_end ();
  if (st == HOLENT_EINVAL)
    {
      for (k = 0; k < len && isfinite (s[k]); k++)
        ;
      holent_gw_raise (fn, k < len && isnan (s[k]) ? HOLENT_ENAN
                                                   : HOLENT_EDOM,
                       "SVEC", k < len ? k : HOLENT_NOINDEX,
                       "must be finite");
    }
  if (st == HOLENT_ETOOBIG)
    holent_gw_raise (fn, HOLENT_ETOOBIG, "complete", HOLENT_NOINDEX,
                     "a complete enumeration of %s for N = %u exceeds "
                     "%.0f cases", fam, n, HOLENT_INEQ_BUDGET);
  if (st)
    holent_gw_fail (st, fn, "SVEC", HOLENT_NOINDEX);
  plhs[0] = mxCreateDoubleScalar (res.count);
  if (nlhs > 1)
    plhs[1] = mxCreateDoubleScalar (res.violated);
  if (nlhs > 2)
    plhs[2] = mxCreateDoubleScalar (res.worst);
  if (nlhs > 3)
    {
      plhs[3] = mxCreateDoubleMatrix (1, res.nregions, mxREAL);
      out = mxGetPr (plhs[3]);
      for (j = 0; j < res.nregions; j++)
        out[j] = (double) res.regions[j];
    }
  if (nlhs > 4)
    plhs[4] = mxCreateDoubleScalar (res.undecided);
}
