/* [EC, CONN, ZL, ZR, PTS, GEO, NSHORT] = __holent_ewcs__ ("pairs", FN, BG,
 * A, B): entanglement wedge cross sections of the interval pairs (A, B).
 * A and B are each one interval (a 1 x 2 row) or a cell array of them; a
 * cell gives results of its size, cells of one element (and rows)
 * broadcast against the other.  Per pair: EC the cross section of the
 * connected wedge (entropy units), CONN the core's verdict of the
 * two-interval minimisation (logical), ZL, ZR the cross-ratios, PTS
 * (numel x 6) the two points [t0 x0 r0 t1 x1 r1], GEO (numel x 4) the
 * geodesic endpoints [g0a g0b g1a g1b]; NSHORT counts pairs with an
 * interval or gap not longer than twice the cutoff.  A bad pair is
 * raised with the core's reason (holent_ewcs_check) naming A{k} or B{k}.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdio.h>
#include <string.h>
#include "holent_gw.h"
#include "core/holent_ewcs.h"

static const char GW[] = "__holent_ewcs__";

/* Element k of X (a row, or a cell of rows broadcast when it has one
   element) as a pair of doubles; raises naming it.  */
static void
interval_at (const mxArray *X, const char *fn, const char *name, size_t k,
             double out[2])
{
  char nm[48];
  int cell = mxIsCell (X);
  const mxArray *a = X;
  if (cell)
    {
      size_t j = mxGetNumberOfElements (X) == 1 ? 0 : k;
      a = mxGetCell (X, j);
      snprintf (nm, sizeof nm, "%s{%zu}", name, j + 1);
    }
  else
    snprintf (nm, sizeof nm, "%s", name);
  if (a == NULL || !mxIsDouble (a) || mxIsComplex (a) || mxIsSparse (a)
      || mxGetNumberOfDimensions (a) != 2 || mxGetM (a) != 1
      || mxGetN (a) != 2)
    holent_gw_raise (fn, HOLENT_ETYPE, nm, HOLENT_NOINDEX,
                     "must be one interval, a real 1 x 2 row [start, end] "
                     "(several pairs go in cell arrays)");
  out[0] = mxGetPr (a)[0];
  out[1] = mxGetPr (a)[1];
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16], fn[64];
  holent_geo_bg bg;
  holent_err e;
  holent_gw_init ();
  holent_gw_nargs (GW, nlhs, 7, nrhs, 5, 5);
  holent_gw_string (prhs[0], GW, "MODE", mode, sizeof mode);
  if (strcmp (mode, "pairs") != 0)
    holent_gw_raise (GW, HOLENT_EINVAL, "MODE", HOLENT_NOINDEX,
                     "unknown mode '%s'", mode);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  holent_gw_bg (prhs[2], fn, &bg);
  const mxArray *A = prhs[3], *B = prhs[4];
  size_t na = mxIsCell (A) ? mxGetNumberOfElements (A) : 1;
  size_t nb = mxIsCell (B) ? mxGetNumberOfElements (B) : 1;
  if (na != 1 && nb != 1 && na != nb)
    holent_gw_raise (fn, HOLENT_ESIZE, NULL, HOLENT_NOINDEX,
                     "A (%zu pairs) and B (%zu pairs) must have as many "
                     "elements, or one", na, nb);
  /* the result has the shape of the cell that is not broadcast */
  const mxArray *shape = (na != 1 || (nb == 1 && mxIsCell (A))) ? A : B;
  size_t k = na != 1 ? na : nb;
  mwSize nd = 2, one[2] = { 1, 1 };
  const mwSize *dims = one;
  if (mxIsCell (shape))
    {
      nd = mxGetNumberOfDimensions (shape);
      dims = mxGetDimensions (shape);
    }
  static const char *const names[] = { "BG", "A", "B" };
  static const size_t cols[6] = { 1, 1, 1, 1, 6, 4 };
  /* Octave's plhs holds max(nlhs, 1) slots: build every output here and
     hand over only those asked for.  */
  mxArray *arr[6];
  double *out[6];
  for (int j = 0; j < 6; j++)
    {
      arr[j] = j < 4 ? mxCreateNumericArray (nd, dims, mxDOUBLE_CLASS, mxREAL)
                     : mxCreateDoubleMatrix ((mwSize) k, (mwSize) cols[j],
                                             mxREAL);
      out[j] = mxGetPr (arr[j]);
    }
  double nshort = 0.0;
  for (size_t i = 0; i < k; i++)
    {
      double a[2], b[2];
      holent_ewcs_result r;
      interval_at (A, fn, "A", i, a);
      interval_at (B, fn, "B", i, b);
      if (holent_ewcs_pair (&bg, a, b, &r))
        {
          char nm[3][48];
          const char *nmp[3] = { names[0], nm[1], nm[2] };
          for (int q = 1; q < 3; q++)
            {
              const mxArray *X = q == 1 ? A : B;
              if (mxIsCell (X))
                snprintf (nm[q], sizeof nm[q], "%s{%zu}", names[q],
                          mxGetNumberOfElements (X) == 1 ? 1 : i + 1);
              else
                snprintf (nm[q], sizeof nm[q], "%s", names[q]);
            }
          for (int j = 0; j < 6; j++)
            mxDestroyArray (arr[j]);
          holent_ewcs_check (&bg, a, b, &e);
          if (e.status == 0)
            holent_err_set (&e, HOLENT_EINTERNAL, -1, HOLENT_NOINDEX, NULL);
          holent_gw_raise_err (fn, &e, nmp, 3);
        }
      out[0][i] = r.E_connected;
      out[1][i] = (double) r.connected;
      out[2][i] = r.z_L;
      out[3][i] = r.z_R;
      nshort += r.shortest <= 2.0 * bg.eps;
      for (int p = 0; p < 2; p++)
        {
          for (int c = 0; c < 3; c++)
            out[4][i + (size_t) (3 * p + c) * k] = r.point[p][c];
          for (int c = 0; c < 2; c++)
            out[5][i + (size_t) (2 * p + c) * k] = r.gap[p][c];
        }
    }
  const int nout = nlhs > 1 ? nlhs : 1;
  for (int j = 0; j < 7; j++)
    {
      mxArray *v = j < 6 ? arr[j] : mxCreateDoubleScalar (nshort);
      if (j == 1)
        {
          /* CONN as logical */
          mxArray *lg = mxCreateLogicalArray (nd, dims);
          mxLogical *pl = mxGetLogicals (lg);
          for (size_t i = 0; i < k; i++)
            pl[i] = out[1][i] != 0.0;
          mxDestroyArray (v);
          v = lg;
        }
      if (j < nout)
        plhs[j] = v;
      else
        mxDestroyArray (v);
    }
}
