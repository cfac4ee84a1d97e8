/* AdS_{d+1} backgrounds, built and checked by the core:
 *   BG = __holent_hdbg__ (D, "vacuum", ELL, G, EPS)
 *   BG = __holent_hdbg__ (D, "black_brane", ELL, G, EPS, "zh"|"T", VALUE)
 *   BG = __holent_hdbg__ (D, "tabulated", ELL, G, EPS, Z, F, NOISE)
 *   BG = __holent_hdbg__ (D, "vaidya", ELL, G, EPS, W, FINAL, ...)
 *        (FINAL "black_brane" or "tabulated" followed by its inputs:
 *        a quench by a shell of width W into that state)
 * The struct is packed from the core's result only (derived quantities,
 * accuracy and the spline that later calls reuse without refitting).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_hd.h"

static const char FN[] = "__holent_hdbg__";

static void
tab_fail (holent_hd_bg *bg, int st, int d, const double *z, size_t bad)
{
  holent_hd_why why = bg->why;
  holent_hd_bg_free (bg);
  if (st != HOLENT_EDOM && st != HOLENT_EINVAL)
    holent_gw_fail (st, FN, "F", bad);
  if (why == HOLENT_HD_WHY_SAMPLES)
    mexErrMsgIdAndTxt (st == HOLENT_EINVAL ? "holent:invalid" : "holent:domain",
                       "'z' and 'f' must be finite with z(1) = 0 < z(2) < ... "
                       "(sample %zu)", bad + 1);
  if (why == HOLENT_HD_WHY_F0)
    mexErrMsgIdAndTxt ("holent:domain",
                       "'f' must be 1 at z = 0 (the AdS boundary)");
  if (why == HOLENT_HD_WHY_BOUNDARY)
    mexErrMsgIdAndTxt ("holent:domain",
                       "f - 1 must vanish like z^%d at the boundary "
                       "(sample %zu, z = %g)", d, bad + 1, z[bad]);
  if (why == HOLENT_HD_WHY_FEW)
    mexErrMsgIdAndTxt ("holent:domain",
                       "too few samples near the boundary to fit "
                       "f = 1 - m z^%d + ...: give at least %d", d, d + 7);
  if (why == HOLENT_HD_WHY_RANGE)
    mexErrMsgIdAndTxt ("holent:domain",
                       "the energy or entropy density of this background is "
                       "out of double precision range");
  holent_gw_fail (st, FN, "F", bad);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char kind[16], par[4];
  holent_hd_bg bg;
  size_t bad = (size_t) -1, nz = 0, nf;
  const double *z = NULL, *f;
  int st = HOLENT_SUCCESS;
  holent_gw_init ();
  holent_gw_nargs (FN, nlhs, 1, nrhs, 5, 10);
  /* a quench: the shell width, then the final state's own inputs */
  double w = NAN;
  const mxArray *a[8];
  for (int k = 0; k < nrhs && k < 8; k++)
    a[k] = prhs[k];
  if (nrhs > 1 && mxIsChar (prhs[1]))
    {
      holent_gw_string (prhs[1], FN, "KIND", kind, sizeof kind);
      if (strcmp (kind, "vaidya") == 0)
        {
          if (nrhs < 8)
            mexErrMsgIdAndTxt ("holent:nargs", "vaidya needs W, FINAL and its inputs");
          w = holent_gw_scalar (prhs[5], FN, "W");
          if (!(w >= 0))
            mexErrMsgIdAndTxt ("holent:domain",
                               "'shell_width' must be >= 0 (0: thin shell), got %g", w);
          a[1] = prhs[6];
          for (int k = 5; k + 2 < nrhs; k++)
            a[k] = prhs[k + 2];
          nrhs -= 2;
          prhs = a;
        }
    }
  double dd = holent_gw_scalar (prhs[0], FN, "D");
  holent_gw_string (prhs[1], FN, "KIND", kind, sizeof kind);
  double ell = holent_gw_scalar (prhs[2], FN, "ELL");
  double G = holent_gw_scalar (prhs[3], FN, "G");
  double eps = holent_gw_scalar (prhs[4], FN, "EPS");
  if (dd != floor (dd) || dd < 3 || dd > HOLENT_HD_DMAX)
    mexErrMsgIdAndTxt ("holent:domain",
                       "D must be an integer from 3 to %d, got %g",
                       HOLENT_HD_DMAX, dd);
  int d = (int) dd;
  if (strcmp (kind, "vacuum") == 0 && nrhs == 5)
    st = holent_hd_bg_init (&bg, d, HOLENT_HD_VACUUM, 1, ell, G, eps);
  else if (strcmp (kind, "black_brane") == 0 && nrhs == 7)
    {
      double zh, v;
      holent_gw_string (prhs[5], FN, "PARAM", par, sizeof par);
      v = holent_gw_scalar (prhs[6], FN, par);
      if (strcmp (par, "T") == 0)
        {
          st = holent_hd_brane_zh (d, v, &zh);
          if (st)
            mexErrMsgIdAndTxt ("holent:domain", "T must be positive, got %g", v);
        }
      else
        zh = v;
      st = holent_hd_bg_init (&bg, d, HOLENT_HD_BRANE, zh, ell, G, eps);
      if (st == HOLENT_EDOM && isfinite (zh) && zh > 0)
        mexErrMsgIdAndTxt ("holent:domain",
                           "D = %d, zh = %g: the energy or entropy density of "
                           "this background is out of double precision range",
                           d, zh);
    }
  else if (strcmp (kind, "tabulated") == 0 && nrhs == 8)
    {
      z = holent_gw_real (prhs[5], FN, "Z", &nz);
      f = holent_gw_real (prhs[6], FN, "F", &nf);
      double noise = holent_gw_scalar (prhs[7], FN, "NOISE");
      if (nz != nf || nz < 5)
        mexErrMsgIdAndTxt ("holent:domain",
                           "'z' and 'f' must be vectors of equal length >= 5");
      st = holent_hd_bg_tabulated (&bg, d, nz, z, f, noise, ell, G, eps, &bad);
      if (st)
        tab_fail (&bg, st, d, z, bad);
    }
  else
    mexErrMsgIdAndTxt ("holent:invalid", "unknown KIND '%s' or wrong inputs",
                       kind);
  if (st)
    holent_gw_fail (st, FN, "BG", bad);
  plhs[0] = holent_gw_hd_pack (&bg, prhs[1], nrhs == 8 ? prhs[5] : NULL,
                               nrhs == 8 ? prhs[6] : NULL);
  if (!isnan (w))
    {
      mxArray *fin = mxDuplicateArray (prhs[1]);
      mxSetField (plhs[0], 0, "kind", mxCreateString ("vaidya"));
      mxAddField (plhs[0], "final");
      mxSetField (plhs[0], 0, "final", fin);
      mxAddField (plhs[0], "shell_width");
      mxSetField (plhs[0], 0, "shell_width", mxCreateDoubleScalar (w));
    }
  holent_hd_bg_free (&bg);
}
