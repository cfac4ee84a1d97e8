/* [EC, CONN, ZL, ZR, PTS, GEO, SHORT, ST] = __holent_ewcs__ (BG, A, B):
 * entanglement wedge cross sections of the interval pairs A(i,:), B(i,:)
 * (k x 2 each).  Per row: EC the cross section of the connected wedge
 * (entropy units), CONN the verdict of the two-interval minimisation,
 * ZL, ZR the cross-ratios, PTS (k x 6) the two points [t0 x0 r0 t1 x1 r1],
 * GEO (k x 4) the geodesic endpoints [g0a g0b g1a g1b], SHORT the shortest
 * of the intervals and gaps, ST the core status
 * (0 on success; the other outputs are NaN in failed rows).  The wrapper
 * turns a non-zero ST into an error naming its argument.
 * GPL-3.0-or-later.  */
#include <math.h>
#include "holent_gw.h"
#include "core/holent_ewcs.h"

static const char FN[] = "__holent_ewcs__";

static const double *
pairs_arg (const mxArray *a, const char *name, size_t *k)
{
  size_t n;
  const double *p = holent_gw_real (a, FN, name, &n);
  if (mxGetNumberOfDimensions (a) != 2 || mxGetN (a) != 2)
    mexErrMsgIdAndTxt ("holent:size", "%s must be a k x 2 matrix",
                       name);
  *k = mxGetM (a);
  return p;
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  holent_geo_bg bg;
  size_t k, kb;
  holent_gw_init ();
  holent_gw_nargs (FN, nlhs, 8, nrhs, 3, 3);
  holent_gw_bg (prhs[0], FN, &bg);
  const double *A = pairs_arg (prhs[1], "A", &k);
  const double *B = pairs_arg (prhs[2], "B", &kb);
  if (k != kb)
    mexErrMsgIdAndTxt ("holent:size", "A and B must have as many rows");
  static const size_t cols[8] = { 1, 1, 1, 1, 6, 4, 1, 1 };
  /* Octave's plhs holds max(nlhs, 1) slots: build all eight outputs
     here and hand over only those asked for.  */
  mxArray *arr[8];
  double *out[8];
  for (int j = 0; j < 8; j++)
    {
      arr[j] = mxCreateDoubleMatrix ((mwSize) k, (mwSize) cols[j], mxREAL);
      out[j] = mxGetPr (arr[j]);
    }
  for (size_t i = 0; i < k; i++)
    {
      /* column-major k x 2: row i is (p[i], p[i + k]) */
      const double a[2] = { A[i], A[i + k] }, b[2] = { B[i], B[i + k] };
      holent_ewcs_result r;
      int st = holent_ewcs_pair (&bg, a, b, &r);
      out[7][i] = (double) st;
      if (st)
        {
          for (int j = 0; j < 7; j++)
            for (size_t c = 0; c < cols[j]; c++)
              out[j][i + c * k] = NAN;
          continue;
        }
      out[0][i] = r.E_connected;
      out[1][i] = (double) r.connected;
      out[2][i] = r.z_L;
      out[3][i] = r.z_R;
      out[6][i] = r.shortest;
      for (int p = 0; p < 2; p++)
        {
          for (int c = 0; c < 3; c++)
            out[4][i + (size_t) (3 * p + c) * k] = r.point[p][c];
          for (int c = 0; c < 2; c++)
            out[5][i + (size_t) (2 * p + c) * k] = r.gap[p][c];
        }
    }
  const int nout = nlhs > 1 ? nlhs : 1;
  for (int j = 0; j < 8; j++)
    {
      if (j < nout)
        plhs[j] = arr[j];
      else
        mxDestroyArray (arr[j]);
    }
}
