/* [COUNT, VIOLATED, WORST, REGIONS, UNDECIDED] = __holent_ineq__ (S,
 * FAMILY, M, COMPLETE, TOL): one family of entropy inequalities evaluated
 * on the entropy vector S (2^N - 1 entries).  FAMILY is "sa", "al",
 * "ssa", "wm", "mmi" or "cyclic" (M = number of regions, odd, for
 * "cyclic"); COMPLETE nonzero asks for every instance.  REGIONS: the
 * party masks of the worst instance (a row, empty when there is none);
 * UNDECIDED: instances that evaluated to NaN.  Ctrl-C stops a long
 * enumeration (progress line: holent_gw_poll).  GPL-3.0-or-later.  */
#include <math.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_poll.h"
#include "core/holent_ineq.h"

static const char FN[] = "__holent_ineq__";

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

  holent_gw_init ();
  holent_gw_nargs (FN, nlhs, 5, nrhs, 5, 5);
  const double *s = holent_gw_real (prhs[0], FN, "S", &len);
  holent_gw_string (prhs[1], FN, "FAMILY", fam, sizeof fam);
  for (f = 0; f < sizeof names / sizeof names[0]; f++)
    if (strcmp (fam, names[f]) == 0)
      break;
  if (f == sizeof names / sizeof names[0])
    mexErrMsgIdAndTxt ("holent:option", "unknown FAMILY '%s'", fam);
  m = holent_gw_scalar (prhs[2], FN, "M");
  complete = holent_gw_scalar (prhs[3], FN, "COMPLETE");
  tol = holent_gw_scalar (prhs[4], FN, "TOL");
  if (!(m >= 0 && m <= HOLENT_INEQ_NMAX && m == floor (m)))
    mexErrMsgIdAndTxt ("holent:domain", "M must be an integer in [0, %d]", HOLENT_INEQ_NMAX);
  if ((st = holent_ineq_nparties (len, &n)))
    mexErrMsgIdAndTxt (st == HOLENT_ETOOBIG ? "holent:toobig" : "holent:domain",
                       "%s: S must have 2^N - 1 entries with 1 <= N <= %d, "
                       "got %zu", FN, HOLENT_INEQ_NMAX, len);
  if (!(tol >= 0) || isinf (tol))
    mexErrMsgIdAndTxt ("holent:domain",
                       "TOL must be finite and nonnegative");
  if (f == HOLENT_INEQ_CYCLIC
      && (m < 3 || fmod (m, 2) == 0 || m > n))
    mexErrMsgIdAndTxt ("holent:domain",
                       "M must be odd with 3 <= M <= N = %u, got %g", n, m);
  st = holent_ineq_eval (n, s, (holent_ineq_family) f, (unsigned) m,
                         complete != 0, tol, &res,
                         holent_gw_poll ("entropy_inequalities"));
  holent_gw_poll_end ();
  if (st == HOLENT_EINVAL)
    {
      for (k = 0; k < len && isfinite (s[k]); k++)
        ;
      holent_gw_fail (st, FN, "S", k < len ? k : (size_t) -1);
    }
  if (st == HOLENT_ETOOBIG)
    mexErrMsgIdAndTxt ("holent:toobig",
                       "complete enumeration of %s for N = %u exceeds "
                       "%.0f cases", fam, n, HOLENT_INEQ_BUDGET);
  if (st)
    holent_gw_fail (st, FN, "S", (size_t) -1);
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
