/* SPDX-License-Identifier: GPL-3.0-or-later */
/* __holent_cone__ (MODE, ...): graph models, contraction proofs and the
 * holographic entropy cone.  Unpack, call the core, pack; no physics.
 *
 *   [S, CUTS] = __holent_cone__ ("mincut", EDGES, W, LABELS, N)
 *     EDGES: E x 2 vertex indices (1-based), W: E weights, LABELS: one
 *     per vertex (0 bulk, 1..N party, N+1 purifier).  S: 2^N - 1 column;
 *     CUTS: V x (2^N - 1) logical, the smallest source side of each cut.
 */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include "holent_gw.h"
#include "core/holent_mincut.h"

/* A vector of whole numbers in [lo, hi], converted; raises holent:type /
   holent:domain naming ARG and the first bad element.  The caller frees
   the result; also_free is freed before an error is raised.  */
static long *
whole_numbers (const mxArray *a, const char *name, double lo, double hi,
               size_t *n, void *also_free)
{
  const double *p = holent_gw_real (a, "", name, n);
  long *out = malloc ((*n + 1) * sizeof *out);
  size_t k;
  if (out == NULL)
    {
      free (also_free);
      mexErrMsgIdAndTxt ("holent:nomem", "%s: out of memory", name);
    }
  for (k = 0; k < *n; k++)
    {
      if (!(p[k] >= lo && p[k] <= hi && p[k] == floor (p[k])))
        {
          double bad = p[k];
          free (out);
          free (also_free);
          mexErrMsgIdAndTxt ("holent:domain", "%s(%zu) = %g must be an integer "
                             "in [%g, %g]", name, k + 1, bad, lo, hi);
        }
      out[k] = (long) p[k];
    }
  return out;
}

static void
do_mincut (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  size_t ne2, ne, nw, nv, k, bad, ncut;
  long *ed, *lab;
  size_t *tail, *head;
  int *label;
  double n;
  holent_mincut_workspace *ws;
  unsigned char *cuts = NULL;
  int st;

  holent_gw_nargs ("", nlhs, 2, nrhs, 5, 5);
  n = holent_gw_scalar (prhs[4], "", "N");
  if (!(n >= 1 && n <= HOLENT_MINCUT_NMAX && n == floor (n)))
    mexErrMsgIdAndTxt ("holent:domain", "N must be an integer in [1, %d], got %g",
                       HOLENT_MINCUT_NMAX, n);
  const double *w = holent_gw_real (prhs[2], "", "WEIGHTS", &nw);
  if (mxGetNumberOfDimensions (prhs[1]) != 2
      || (mxGetN (prhs[1]) != 2 && mxGetNumberOfElements (prhs[1]) > 0))
    mexErrMsgIdAndTxt ("holent:size", "EDGES must be an E x 2 matrix");
  ne = mxGetM (prhs[1]);
  if (mxGetNumberOfElements (prhs[1]) == 0)
    ne = 0;
  if (nw != ne)
    mexErrMsgIdAndTxt ("holent:size", "WEIGHTS must have one entry per edge "
                       "(%zu), got %zu", ne, nw);
  holent_gw_real (prhs[1], "", "EDGES", &ne2);
  lab = whole_numbers (prhs[3], "LABELS", 0, n + 1, &nv, NULL);
  if (nv == 0)
    {
      free (lab);
      mexErrMsgIdAndTxt ("holent:size", "LABELS must not be empty");
    }
  ed = whole_numbers (prhs[1], "EDGES", 1, (double) nv, &ne2, lab);
  tail = malloc ((ne + 1) * sizeof *tail);
  head = malloc ((ne + 1) * sizeof *head);
  label = malloc (nv * sizeof *label);
  ws = holent_mincut_workspace_alloc (nv, ne);
  ncut = ((size_t) 1 << (unsigned) n) - 1;
  if (nlhs > 1)
    {
      plhs[1] = mxCreateLogicalMatrix (nv, ncut);
      cuts = (unsigned char *) mxGetLogicals (plhs[1]);
    }
  if (!tail || !head || !label || !ws)
    {
      free (tail), free (head), free (label), free (lab), free (ed);
      holent_mincut_workspace_free (ws);
      mexErrMsgIdAndTxt ("holent:nomem", "out of memory for %zu vertices", nv);
    }
  for (k = 0; k < ne; k++)
    {
      tail[k] = (size_t) ed[k] - 1;
      head[k] = (size_t) ed[k + ne] - 1;
    }
  for (k = 0; k < nv; k++)
    label[k] = (int) lab[k];
  free (ed);
  free (lab);
  plhs[0] = mxCreateDoubleMatrix (ncut, 1, mxREAL);
  st = holent_mincut_entropy (nv, ne, tail, head, w, label, (unsigned) n,
                              mxGetPr (plhs[0]), cuts, &bad, ws);
  free (tail), free (head), free (label);
  holent_mincut_workspace_free (ws);
  if (st == HOLENT_EEMPTY)
    mexErrMsgIdAndTxt ("holent:labels", "party %zu has no boundary vertex "
                       "(LABELS must use every party 1 .. N = %g)", bad + 1, n);
  if (st == HOLENT_EINVAL || st == HOLENT_EDOM)
    holent_gw_fail (st, "", "WEIGHTS", bad);
  if (st)
    holent_gw_fail (st, "", "EDGES", (size_t) -1);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16];
  holent_gw_init ();
  if (nrhs < 1)
    mexErrMsgIdAndTxt ("holent:nargs", "expected a MODE");
  holent_gw_string (prhs[0], "", "MODE", mode, sizeof mode);
  if (strcmp (mode, "mincut") == 0)
    do_mincut (nlhs, plhs, nrhs, prhs);
  else
    mexErrMsgIdAndTxt ("holent:option", "unknown MODE '%s'", mode);
}
