/* AdS_{d+1} backgrounds, built and checked by the core:
 *   BG = __holent_hdbg__ ("vacuum", FN, D, ELL, G, EPS)
 *   BG = __holent_hdbg__ ("black_brane", FN, D, ELL, G, EPS, "zh"|"T", V)
 *   BG = __holent_hdbg__ ("tabulated", FN, D, ELL, G, EPS, Z, F, NOISE)
 *   BG = __holent_hdbg__ ("vaidya", FN, D, ELL, G, EPS, W, FINAL, ...)
 *        (FINAL "black_brane" or "tabulated" followed by its own inputs
 *        after EPS: a quench by a shell of width W into that state)
 * FN names the public function in messages.  The struct is packed from
 * the core's result only (derived quantities, accuracy and the spline
 * that later calls reuse without refitting).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_hd.h"

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16], kind[16], par[4], fn[64] = "";
  holent_hd_bg bg;
  holent_err err;
  size_t bad = HOLENT_NOINDEX, nz = 0, nf;
  const double *z = NULL, *f;
  const mxArray *zarg = NULL, *farg = NULL;
  int st, d, k = 6;  /* k: first input of the kind's own */
  double w = NAN;
  holent_gw_init ();
  if (nrhs >= 2)
    holent_gw_string (prhs[1], "__holent_hdbg__", "FN", fn, sizeof fn);
  holent_gw_nargs (fn, nlhs, 1, nrhs, 6, 11);
  holent_gw_string (prhs[0], fn, "MODE", mode, sizeof mode);
  memcpy (kind, mode, sizeof kind);
  if (strcmp (mode, "vaidya") == 0)
    {
      if (nrhs < 9)
        holent_gw_raise (fn, HOLENT_ENARGS, NULL, HOLENT_NOINDEX,
                         "a quench needs W, FINAL and the final state's "
                         "inputs");
      w = holent_gw_scalar (prhs[6], fn, "shell_width");
      if (!(w >= 0) || !isfinite (w))
        holent_gw_raise (fn, HOLENT_EDOM, "shell_width", HOLENT_NOINDEX,
                         "must be >= 0 and finite (0: thin shell), got %g",
                         w);
      holent_gw_string (prhs[7], fn, "FINAL", kind, sizeof kind);
      k = 8;
    }
  if ((st = holent_hd_dimension (holent_gw_scalar (prhs[2], fn, "D"), &d,
                                 &err)))
    {
      static const char *const names[] = { "D" };
      holent_gw_raise_err (fn, &err, names, 1);
    }
  double ell = holent_gw_scalar (prhs[3], fn, "ell");
  double G = holent_gw_scalar (prhs[4], fn, "G");
  double eps = holent_gw_scalar (prhs[5], fn, "cutoff");
  int nown = nrhs - k;
  if (strcmp (kind, "vacuum") == 0 && nown == 0)
    st = holent_hd_bg_init (&bg, d, HOLENT_HD_VACUUM, 1, ell, G, eps);
  else if (strcmp (kind, "black_brane") == 0 && nown == 2)
    {
      double zh;
      holent_gw_string (prhs[k], fn, "PARAM", par, sizeof par);
      double v = holent_gw_scalar (prhs[k + 1], fn, par);
      if (strcmp (par, "T") == 0)
        {
          if (holent_hd_brane_zh (d, v, &zh))
            holent_gw_raise (fn, HOLENT_EDOM, "T", HOLENT_NOINDEX,
                             "must be positive and finite, got %g", v);
        }
      else
        zh = v;
      st = holent_hd_bg_init (&bg, d, HOLENT_HD_BRANE, zh, ell, G, eps);
      if (st == HOLENT_EDOM && isfinite (zh) && zh > 0)
        holent_gw_raise (fn, st, NULL, HOLENT_NOINDEX,
                         "D = %d, zh = %g: the energy or entropy density of "
                         "this background is out of double precision range",
                         d, zh);
      if (st)
        holent_gw_raise (fn, st, par, HOLENT_NOINDEX,
                         "must be positive and finite, got %g", v);
    }
  else if (strcmp (kind, "tabulated") == 0 && nown == 3)
    {
      zarg = prhs[k];
      farg = prhs[k + 1];
      z = holent_gw_real (zarg, fn, "z", &nz);
      f = holent_gw_real (farg, fn, "f", &nf);
      double noise = holent_gw_scalar (prhs[k + 2], fn, "noise");
      if (nz != nf || nz < 5)
        holent_gw_raise (fn, HOLENT_ESIZE, NULL, HOLENT_NOINDEX,
                         "'z' and 'f' must be vectors of equal length >= 5");
      st = holent_hd_bg_tabulated (&bg, d, nz, z, f, noise, ell, G, eps, &bad);
      if (st)
        {
          holent_hd_bg_explain (&bg, d, st, bad, z, &err);
          holent_hd_bg_free (&bg);
          holent_gw_raise_err (fn, &err, NULL, 0);
        }
    }
  else
    holent_gw_raise (fn, HOLENT_EINVAL, NULL, HOLENT_NOINDEX,
                     "unknown kind '%s' or wrong inputs for it", kind);
  if (st)
    {
      holent_hd_bg_explain (&bg, d, st, bad, NULL, &err);
      holent_hd_bg_free (&bg);
      holent_gw_raise_err (fn, &err, NULL, 0);
    }
  mxArray *kinds = mxCreateString (kind);
  plhs[0] = holent_gw_hd_pack (&bg, kinds, zarg, farg);
  mxDestroyArray (kinds);
  holent_hd_bg_free (&bg);
  if (!isnan (w))
    {
      mxDestroyArray (mxGetField (plhs[0], 0, "kind"));
      mxSetField (plhs[0], 0, "kind", mxCreateString ("vaidya"));
      mxAddField (plhs[0], "final");
      mxSetField (plhs[0], 0, "final", mxCreateString (kind));
      mxAddField (plhs[0], "shell_width");
      mxSetField (plhs[0], 0, "shell_width", mxCreateDoubleScalar (w));
    }
}
