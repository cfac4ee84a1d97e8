/* SPDX-License-Identifier: GPL-3.0-or-later */
/* __holent_cone__ (MODE, ...): graph models, contraction proofs and the
 * holographic entropy cone.  Unpack, call the core, pack; no physics.
 *
 *   [S, CUTS] = __holent_cone__ ("mincut", EDGES, W, LABELS, N)
 *     EDGES: E x 2 vertex indices (1-based), W: E weights, LABELS: one
 *     per vertex (0 bulk, 1..N party, N+1 purifier).  S: 2^N - 1 column;
 *     CUTS: V x (2^N - 1) logical, the smallest source side of each cut.
 *   [FOUND, MAP, INFO] = __holent_cone__ ("prove", N, LMASK, A, RMASK, B,
 *                                         MAX_NODES)
 *     the inequality sum A S(LMASK) >= sum B S(RMASK) (party masks);
 *     FOUND 1 / 0 (no map) / -1 (node limit); MAP: 2^L values f(x).
 *   [OK, BAD_X, BAD_L] = __holent_cone__ ("check", N, LMASK, A, RMASK, B, MAP)
 *     the independent checker of a map.
 *   [A, ORBIT, NAMES, TEXTS] = __holent_cone__ ("facets", N)
 *     the facets of the holographic entropy cone, N <= 5.
 */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include "holent_gw.h"
#include "core/holent_mincut.h"
#include "core/holent_contract.h"
#include "core/holent_cone.h"

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
                              mxGetPr (plhs[0]), cuts, &bad, ws, NULL);
  free (tail), free (head), free (label);
  holent_mincut_workspace_free (ws);
  if (st == HOLENT_EEMPTY)
    mexErrMsgIdAndTxt ("holent:inconsistent", "party %zu has no boundary vertex "
                       "(LABELS must use every party 1 .. N = %g)", bad + 1, n);
  if (st == HOLENT_EINVAL || st == HOLENT_EDOM)
    holent_gw_fail (st, "", "WEIGHTS", bad);
  if (st)
    holent_gw_fail (st, "", "EDGES", (size_t) -1);
}

/* Masks (whole numbers in [1, 2^n - 1]) and positive weights of one side;
   the caller frees *mask.  */
static void
side (const mxArray *m, const mxArray *w, const char *mname,
      const char *wname, unsigned n, uint32_t **mask, const double **wt,
      unsigned *k, void *also_free)
{
  size_t nm, nw, j;
  long *v;
  holent_gw_real (w, "", wname, &nw);
  v = whole_numbers (m, mname, 1, (double) ((1u << n) - 1), &nm, also_free);
  *wt = mxGetPr (w);
  if (nm != nw || nm > 64)
    {
      free (v);
      free (also_free);
      mexErrMsgIdAndTxt ("holent:size", "%s and %s must have the same length "
                         "(at most 64), got %zu and %zu", mname, wname, nm, nw);
    }
  *mask = malloc ((nm + 1) * sizeof **mask);
  if (*mask == NULL)
    {
      free (v);
      free (also_free);
      mexErrMsgIdAndTxt ("holent:nomem", "out of memory");
    }
  for (j = 0; j < nm; j++)
    (*mask)[j] = (uint32_t) v[j];
  free (v);
  *k = (unsigned) nm;
}

/* N, then both sides: arguments 1 .. 5 of "prove" and "check".  */
static unsigned
inequality (const mxArray *prhs[], uint32_t **lm, const double **a,
            unsigned *nl, uint32_t **rm, const double **b, unsigned *nr)
{
  double n = holent_gw_scalar (prhs[1], "", "N");
  if (!(n >= 1 && n <= HOLENT_CONTRACT_NMAX && n == floor (n)))
    mexErrMsgIdAndTxt ("holent:domain", "N must be an integer in [1, %d], got %g",
                       HOLENT_CONTRACT_NMAX, n);
  side (prhs[2], prhs[3], "LMASK", "A", (unsigned) n, lm, a, nl, NULL);
  side (prhs[4], prhs[5], "RMASK", "B", (unsigned) n, rm, b, nr, *lm);
  return (unsigned) n;
}

static void
contract_fail (int st, uint32_t *lm, uint32_t *rm, unsigned nl, unsigned nr)
{
  free (lm);
  free (rm);
  if (st == HOLENT_ETOOBIG)
    mexErrMsgIdAndTxt ("holent:toobig", "%u terms on the left and %u on the "
                       "right: at most %d and %d, %d together", nl, nr,
                       HOLENT_CONTRACT_LMAX, HOLENT_CONTRACT_RMAX,
                       HOLENT_CONTRACT_BITS);
  holent_gw_fail (st, "", "A, B", (size_t) -1);
}

static void
do_prove (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  static const char *fields[] = { "nodes", "backtracks", "log2_initial",
                                  "forced", "conflict", "conflict_parties" };
  uint32_t *lm, *rm, *f;
  const double *a, *b;
  unsigned n, nl, nr;
  double maxn;
  holent_contract_stats st;
  holent_contract_workspace *ws;
  size_t x, np;
  int s;
  mxArray *info;

  holent_gw_nargs ("", nlhs, 3, nrhs, 7, 7);
  maxn = holent_gw_scalar (prhs[6], "", "MAX_NODES");
  if (!(maxn >= 0))
    mexErrMsgIdAndTxt ("holent:domain", "MAX_NODES must be >= 0 (0: no limit)");
  n = inequality (prhs, &lm, &a, &nl, &rm, &b, &nr);
  ws = holent_contract_workspace_alloc (nl, nr);
  if (ws == NULL)
    contract_fail (nl == 0 || nr == 0 ? HOLENT_EDOM
                   : (nl > HOLENT_CONTRACT_LMAX || nr > HOLENT_CONTRACT_RMAX
                      || nl + nr > HOLENT_CONTRACT_BITS) ? HOLENT_ETOOBIG
                   : HOLENT_ENOMEM, lm, rm, nl, nr);
  np = (size_t) 1 << nl;
  f = malloc (np * sizeof *f);
  if (f == NULL)
    {
      holent_contract_workspace_free (ws);
      contract_fail (HOLENT_ENOMEM, lm, rm, nl, nr);
    }
  s = holent_contract_prove (n, nl, lm, a, nr, rm, b, maxn, f, &st, ws, NULL);
  holent_contract_workspace_free (ws);
  if (s)
    {
      free (f);
      contract_fail (s, lm, rm, nl, nr);
    }
  free (lm);
  free (rm);
  plhs[0] = mxCreateDoubleScalar (st.found);
  if (nlhs > 1)
    {
      plhs[1] = mxCreateDoubleMatrix (st.found == 1 ? np : 0, 1, mxREAL);
      for (x = 0; st.found == 1 && x < np; x++)
        mxGetPr (plhs[1])[x] = f[x];
    }
  free (f);
  if (nlhs > 2)
    {
      info = mxCreateStructMatrix (1, 1, 6, fields);
      mxSetField (info, 0, "nodes", mxCreateDoubleScalar (st.nodes));
      mxSetField (info, 0, "backtracks", mxCreateDoubleScalar (st.backtracks));
      mxSetField (info, 0, "log2_initial", mxCreateDoubleScalar (st.log2_initial));
      mxSetField (info, 0, "forced", mxCreateDoubleScalar (st.forced));
      mxSetField (info, 0, "conflict", mxCreateDoubleScalar (st.conflict));
      {
        mxArray *cp = mxCreateDoubleMatrix (1, st.conflict ? 2 : 0, mxREAL);
        if (st.conflict)
          {
            mxGetPr (cp)[0] = st.conflict_i + 1;
            mxGetPr (cp)[1] = st.conflict_j + 1;
          }
        mxSetField (info, 0, "conflict_parties", cp);
      }
      plhs[2] = info;
    }
}

static void
do_check (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  uint32_t *lm, *rm, *f, bx = 0;
  const double *a, *b, *fv;
  unsigned n, nl, nr, bl = 0;
  size_t nf, x;
  int ok = 0, s;

  holent_gw_nargs ("", nlhs, 3, nrhs, 7, 7);
  fv = holent_gw_real (prhs[6], "", "MAP", &nf);
  n = inequality (prhs, &lm, &a, &nl, &rm, &b, &nr);
  if (nl > HOLENT_CONTRACT_LMAX || nr > HOLENT_CONTRACT_RMAX)
    contract_fail (HOLENT_ETOOBIG, lm, rm, nl, nr);
  if (nf != ((size_t) 1 << nl))
    {
      free (lm);
      free (rm);
      mexErrMsgIdAndTxt ("holent:size", "MAP must have 2^L = %zu entries, got %zu",
                         (size_t) 1 << nl, nf);
    }
  for (x = 0; x < nf; x++)
    if (!(fv[x] >= 0 && fv[x] < (double) ((size_t) 1 << nr) && fv[x] == floor (fv[x])))
      {
        free (lm);
        free (rm);
        mexErrMsgIdAndTxt ("holent:domain", "MAP(%zu) must be an integer in "
                           "[0, 2^R - 1] with R = %u", x + 1, nr);
      }
  f = malloc ((nf + 1) * sizeof *f);
  if (f == NULL)
    contract_fail (HOLENT_ENOMEM, lm, rm, nl, nr);
  for (x = 0; x < nf; x++)
    f[x] = (uint32_t) fv[x];
  s = holent_contract_check (n, nl, lm, a, nr, rm, b, f, &ok, &bx, &bl);
  free (f);
  if (s)
    contract_fail (s, lm, rm, nl, nr);
  free (lm);
  free (rm);
  plhs[0] = mxCreateDoubleScalar (ok);
  if (nlhs > 1)
    plhs[1] = mxCreateDoubleScalar (ok ? -1 : (double) bx);
  if (nlhs > 2)
    plhs[2] = mxCreateDoubleScalar (ok || bl == (unsigned) -1 ? -1 : (double) bl + 1);
}

static void
do_facets (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  double n, *A;
  size_t nf, len, f, k;
  unsigned no, o, *orb;
  int s;
  holent_gw_nargs ("", nlhs, 4, nrhs, 2, 2);
  n = holent_gw_scalar (prhs[1], "", "N");
  if (!(n >= 1 && n <= HOLENT_CONE_NMAX && n == floor (n)))
    mexErrMsgIdAndTxt ("holent:domain", "N must be an integer in [1, %d], got %g",
                       HOLENT_CONE_NMAX, n);
  if ((s = holent_cone_count ((unsigned) n, &nf, &no)))
    holent_gw_fail (s, "", "N", (size_t) -1);
  len = ((size_t) 1 << (unsigned) n) - 1;
  A = malloc (nf * len * sizeof *A);
  orb = malloc (nf * sizeof *orb);
  if (A == NULL || orb == NULL || (s = holent_cone_facets ((unsigned) n, A, orb)))
    {
      free (A);
      free (orb);
      holent_gw_fail (s ? s : HOLENT_ENOMEM, "", "N", (size_t) -1);
    }
  plhs[0] = mxCreateDoubleMatrix (nf, len, mxREAL);
  for (f = 0; f < nf; f++)
    for (k = 0; k < len; k++)
      mxGetPr (plhs[0])[f + nf * k] = A[f * len + k];
  if (nlhs > 1)
    {
      plhs[1] = mxCreateDoubleMatrix (nf, 1, mxREAL);
      for (f = 0; f < nf; f++)
        mxGetPr (plhs[1])[f] = orb[f] + 1;
    }
  free (A);
  free (orb);
  if (nlhs > 2)
    {
      plhs[2] = mxCreateCellMatrix (no, 1);
      if (nlhs > 3)
        plhs[3] = mxCreateCellMatrix (no, 1);
      for (o = 0; o < no; o++)
        {
          const char *name, *text;
          holent_cone_orbit ((unsigned) n, o, &name, &text, NULL);
          mxSetCell (plhs[2], o, mxCreateString (name));
          if (nlhs > 3)
            mxSetCell (plhs[3], o, mxCreateString (text));
        }
    }
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
  else if (strcmp (mode, "prove") == 0)
    do_prove (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "check") == 0)
    do_check (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "facets") == 0)
    do_facets (nlhs, plhs, nrhs, prhs);
  else
    mexErrMsgIdAndTxt ("holent:option", "unknown MODE '%s'", mode);
}
