/* SPDX-License-Identifier: GPL-3.0-or-later */
/* __holent_cone__ (MODE, FN, ...): graph models, contraction proofs and
 * the holographic entropy cone.  Unpack, call the core, pack; no physics.
 * FN is the public function's name: every error message starts with it.
 *
 *   [S, CUTS] = __holent_cone__ ("mincut", FN, EDGES, W, LABELS, N)
 *     EDGES: E x 2 vertex indices (1-based), W: E weights, LABELS: one
 *     per vertex (0 bulk, 1..N party, N+1 purifier).  S: 2^N - 1 column;
 *     CUTS: V x (2^N - 1) logical, the smallest source side of each cut.
 *   [FOUND, MAP, INFO] = __holent_cone__ ("prove", FN, N, LMASK, A, RMASK,
 *                                         B, MAX_NODES)
 *     the inequality sum A S(LMASK) >= sum B S(RMASK) (party masks);
 *     FOUND 1 / 0 (no map) / -1 (node limit); MAP: 2^L values f(x).
 *   [OK, BAD_X, BAD_L] = __holent_cone__ ("check", FN, N, LMASK, A, RMASK,
 *                                         B, MAP)
 *     the independent checker of a map.
 *   [A, ORBIT, NAMES, TEXTS] = __holent_cone__ ("facets", FN, N)
 *     the facets of the holographic entropy cone, N <= 5.
 *
 * The min-cuts over all 2^N - 1 subsets and the prover's search poll
 * holent_gw_poll: Ctrl-C stops them (and a progress line shows on long
 * runs).  */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_poll.h"
#include "core/holent_mincut.h"
#include "core/holent_contract.h"
#include "core/holent_cone.h"

/* The malloc'd blocks of one call, freed before any error is raised.  */
typedef struct
{
  void *p[8];
  int n;
} owned;

static void *
own (owned *o, void *p)
{
  if (p != NULL)
    o->p[o->n++] = p;
  return p;
}

static void
release (owned *o)
{
  while (o->n > 0)
    free (o->p[--o->n]);
}

/* Release O, then raise (never returns).  */
#define RAISE(o, ...) (release (o), holent_gw_raise (__VA_ARGS__))

static void *
alloc (owned *o, const char *fn, size_t n, size_t size)
{
  void *p = own (o, malloc ((n + 1) * size));
  if (p == NULL)
    RAISE (o, fn, HOLENT_ENOMEM, NULL, HOLENT_NOINDEX, NULL);
  return p;
}

/* A whole number in [lo, hi] (N, MAX_NODES checked elsewhere).  */
static double
whole_scalar (const mxArray *a, const char *fn, const char *name, double lo,
              double hi)
{
  double v = holent_gw_scalar (a, fn, name);
  if (!(v >= lo && v <= hi && v == floor (v)))
    holent_gw_raise (fn, HOLENT_EDOM, name, HOLENT_NOINDEX,
                     "must be an integer in [%g, %g], got %g", lo, hi, v);
  return v;
}

/* The elements of A (type-checked by the caller) as whole numbers in
   [lo, hi]; raises holent:domain naming ARG and the first bad element.  */
static long *
whole_numbers (owned *o, const mxArray *a, const char *fn, const char *name,
               double lo, double hi)
{
  size_t n = mxGetNumberOfElements (a), k;
  const double *p = mxGetPr (a);
  long *out = alloc (o, fn, n, sizeof *out);
  for (k = 0; k < n; k++)
    {
      if (!(p[k] >= lo && p[k] <= hi && p[k] == floor (p[k])))
        RAISE (o, fn, isnan (p[k]) ? HOLENT_ENAN : HOLENT_EDOM, name, k,
               "must be an integer in [%g, %g], got %g", lo, hi, p[k]);
      out[k] = (long) p[k];
    }
  return out;
}

static void
do_mincut (const char *fn, int nlhs, mxArray *plhs[], int nrhs,
           const mxArray *prhs[])
{
  owned o = { { NULL }, 0 };
  size_t ne, nw, nv, k, bad, ncut;
  long *ed, *lab;
  size_t *tail, *head;
  int *label;
  double n;
  holent_mincut_workspace *ws;
  unsigned char *cuts = NULL;
  int st;

  holent_gw_nargs (fn, nlhs, 2, nrhs, 6, 6);
  n = whole_scalar (prhs[5], fn, "N", 1, HOLENT_MINCUT_NMAX);
  const double *w = holent_gw_real (prhs[3], fn, "WEIGHTS", &nw);
  holent_gw_real (prhs[2], fn, "EDGES", &ne);
  holent_gw_real (prhs[4], fn, "LABELS", &nv);
  if (mxGetNumberOfDimensions (prhs[2]) != 2
      || (mxGetN (prhs[2]) != 2 && ne > 0))
    holent_gw_raise (fn, HOLENT_ESIZE, "EDGES", HOLENT_NOINDEX,
                     "must be an E x 2 matrix");
  ne = ne == 0 ? 0 : mxGetM (prhs[2]);
  if (nw != ne)
    holent_gw_raise (fn, HOLENT_ESIZE, "WEIGHTS", HOLENT_NOINDEX,
                     "must have one entry per edge (%zu), got %zu", ne, nw);
  if (nv == 0)
    holent_gw_raise (fn, HOLENT_EEMPTY, "LABELS", HOLENT_NOINDEX,
                     "must not be empty");
  lab = whole_numbers (&o, prhs[4], fn, "LABELS", 0, n + 1);
  ed = whole_numbers (&o, prhs[2], fn, "EDGES", 1, (double) nv);
  tail = alloc (&o, fn, ne, sizeof *tail);
  head = alloc (&o, fn, ne, sizeof *head);
  label = alloc (&o, fn, nv, sizeof *label);
  for (k = 0; k < ne; k++)
    {
      tail[k] = (size_t) ed[k] - 1;
      head[k] = (size_t) ed[k + ne] - 1;
    }
  for (k = 0; k < nv; k++)
    label[k] = (int) lab[k];
  ncut = ((size_t) 1 << (unsigned) n) - 1;
  ws = holent_mincut_workspace_alloc (nv, ne);
  if (ws == NULL)
    RAISE (&o, fn, HOLENT_ENOMEM, NULL, HOLENT_NOINDEX,
           "out of memory for %zu vertices and %zu edges", nv, ne);
  plhs[0] = mxCreateDoubleMatrix (ncut, 1, mxREAL);
  if (nlhs > 1)
    {
      plhs[1] = mxCreateLogicalMatrix (nv, ncut);
      cuts = (unsigned char *) mxGetLogicals (plhs[1]);
    }
  st = holent_mincut_entropy (nv, ne, tail, head, w, label, (unsigned) n,
                              mxGetPr (plhs[0]), cuts, &bad, ws,
                              holent_gw_poll (fn));
  holent_mincut_workspace_free (ws);
  release (&o);
  holent_gw_poll_end ();
  if (st == HOLENT_EEMPTY)
    holent_gw_raise (fn, HOLENT_EINCONSISTENT, "LABELS", HOLENT_NOINDEX,
                     "party %zu has no boundary vertex (LABELS must use "
                     "every party 1 .. N = %g)", bad + 1, n);
  if (st == HOLENT_EINVAL && bad != HOLENT_NOINDEX)
    holent_gw_raise (fn, HOLENT_ENAN, "WEIGHTS", bad, "must not be NaN");
  if (st == HOLENT_EDOM && bad != HOLENT_NOINDEX)
    holent_gw_raise (fn, HOLENT_EDOM, "WEIGHTS", bad,
                     "must be finite and nonnegative");
  if (st)
    holent_gw_fail (st, fn, NULL, HOLENT_NOINDEX);
}

/* The masks (whole numbers in [1, 2^n - 1]) and weights of one side,
   type-checked by the caller.  */
static uint32_t *
side (owned *o, const mxArray *m, const mxArray *w, const char *fn,
      const char *mname, const char *wname, unsigned n, const double **wt,
      unsigned *k)
{
  size_t nm = mxGetNumberOfElements (m), nw = mxGetNumberOfElements (w), j;
  uint32_t *mask;
  long *v;
  if (nm != nw || nm > 64)
    RAISE (o, fn, HOLENT_ESIZE, NULL, HOLENT_NOINDEX,
           "%s and %s must have the same length (at most 64), got %zu and "
           "%zu", mname, wname, nm, nw);
  v = whole_numbers (o, m, fn, mname, 1, (double) ((1u << n) - 1));
  mask = alloc (o, fn, nm, sizeof *mask);
  for (j = 0; j < nm; j++)
    mask[j] = (uint32_t) v[j];
  *wt = mxGetPr (w);
  *k = (unsigned) nm;
  return mask;
}

/* N, then both sides: arguments 2 .. 6 of "prove" and "check".  */
static unsigned
inequality (owned *o, const char *fn, const mxArray *prhs[], uint32_t **lm,
            const double **a, unsigned *nl, uint32_t **rm, const double **b,
            unsigned *nr)
{
  size_t dummy;
  double n = whole_scalar (prhs[2], fn, "N", 1, HOLENT_CONTRACT_NMAX);
  holent_gw_real (prhs[3], fn, "LMASK", &dummy);
  holent_gw_real (prhs[4], fn, "A", &dummy);
  holent_gw_real (prhs[5], fn, "RMASK", &dummy);
  holent_gw_real (prhs[6], fn, "B", &dummy);
  *lm = side (o, prhs[3], prhs[4], fn, "LMASK", "A", (unsigned) n, a, nl);
  *rm = side (o, prhs[5], prhs[6], fn, "RMASK", "B", (unsigned) n, b, nr);
  return (unsigned) n;
}

/* Raise a core status of the prover or the checker.  */
static void
contract_fail (owned *o, const char *fn, int st, unsigned nl, unsigned nr)
{
  if (st == HOLENT_ETOOBIG)
    RAISE (o, fn, HOLENT_ETOOBIG, NULL, HOLENT_NOINDEX,
           "%u terms on the left and %u on the right: at most %d and %d, "
           "%d together", nl, nr, HOLENT_CONTRACT_LMAX, HOLENT_CONTRACT_RMAX,
           HOLENT_CONTRACT_BITS);
  if (st == HOLENT_EDOM || st == HOLENT_EINVAL)
    RAISE (o, fn, st, NULL, HOLENT_NOINDEX,
           "A and B must be positive and finite, with at least one term on "
           "each side");
  RAISE (o, fn, st, NULL, HOLENT_NOINDEX, NULL);
}

static void
do_prove (const char *fn, int nlhs, mxArray *plhs[], int nrhs,
          const mxArray *prhs[])
{
  static const char *fields[] = { "nodes", "backtracks", "log2_initial",
                                  "forced", "conflict", "conflict_parties" };
  owned o = { { NULL }, 0 };
  uint32_t *lm, *rm, *f;
  const double *a, *b;
  unsigned n, nl, nr;
  double maxn;
  holent_contract_stats st;
  holent_contract_workspace *ws;
  size_t x, np;
  int s;
  mxArray *info;

  holent_gw_nargs (fn, nlhs, 3, nrhs, 8, 8);
  maxn = holent_gw_scalar (prhs[7], fn, "MAX_NODES");
  if (!(maxn >= 0))
    holent_gw_raise (fn, HOLENT_EDOM, "MAX_NODES", HOLENT_NOINDEX,
                     "must be >= 0 (0: no limit), got %g", maxn);
  n = inequality (&o, fn, prhs, &lm, &a, &nl, &rm, &b, &nr);
  if (nl == 0 || nr == 0 || nl > HOLENT_CONTRACT_LMAX
      || nr > HOLENT_CONTRACT_RMAX || nl + nr > HOLENT_CONTRACT_BITS)
    contract_fail (&o, fn, nl == 0 || nr == 0 ? HOLENT_EDOM : HOLENT_ETOOBIG,
                   nl, nr);
  np = (size_t) 1 << nl;
  f = alloc (&o, fn, np, sizeof *f);
  ws = holent_contract_workspace_alloc (nl, nr);
  if (ws == NULL)
    contract_fail (&o, fn, HOLENT_ENOMEM, nl, nr);
  s = holent_contract_prove (n, nl, lm, a, nr, rm, b, maxn, f, &st, ws,
                             holent_gw_poll (fn));
  holent_contract_workspace_free (ws);
  holent_gw_poll_end ();
  if (s)
    contract_fail (&o, fn, s, nl, nr);
  plhs[0] = mxCreateDoubleScalar (st.found);
  if (nlhs > 1)
    {
      plhs[1] = mxCreateDoubleMatrix (st.found == 1 ? np : 0, 1, mxREAL);
      for (x = 0; st.found == 1 && x < np; x++)
        mxGetPr (plhs[1])[x] = f[x];
    }
  release (&o);
  if (nlhs > 2)
    {
      mxArray *cp = mxCreateDoubleMatrix (1, st.conflict ? 2 : 0, mxREAL);
      info = mxCreateStructMatrix (1, 1, 6, fields);
      mxSetField (info, 0, "nodes", mxCreateDoubleScalar (st.nodes));
      mxSetField (info, 0, "backtracks", mxCreateDoubleScalar (st.backtracks));
      mxSetField (info, 0, "log2_initial",
                  mxCreateDoubleScalar (st.log2_initial));
      mxSetField (info, 0, "forced", mxCreateDoubleScalar (st.forced));
      mxSetField (info, 0, "conflict", mxCreateDoubleScalar (st.conflict));
      if (st.conflict)
        {
          mxGetPr (cp)[0] = st.conflict_i + 1;
          mxGetPr (cp)[1] = st.conflict_j + 1;
        }
      mxSetField (info, 0, "conflict_parties", cp);
      plhs[2] = info;
    }
}

static void
do_check (const char *fn, int nlhs, mxArray *plhs[], int nrhs,
          const mxArray *prhs[])
{
  owned o = { { NULL }, 0 };
  uint32_t *lm, *rm, *f, bx = 0;
  const double *a, *b, *fv;
  unsigned n, nl, nr, bl = 0;
  size_t nf, x;
  int ok = 0, s;

  holent_gw_nargs (fn, nlhs, 3, nrhs, 8, 8);
  fv = holent_gw_real (prhs[7], fn, "MAP", &nf);
  n = inequality (&o, fn, prhs, &lm, &a, &nl, &rm, &b, &nr);
  if (nl > HOLENT_CONTRACT_LMAX || nr > HOLENT_CONTRACT_RMAX)
    contract_fail (&o, fn, HOLENT_ETOOBIG, nl, nr);
  if (nf != ((size_t) 1 << nl))
    RAISE (&o, fn, HOLENT_ESIZE, "MAP", HOLENT_NOINDEX,
           "must have 2^L = %zu entries, got %zu", (size_t) 1 << nl, nf);
  f = alloc (&o, fn, nf, sizeof *f);
  for (x = 0; x < nf; x++)
    {
      if (!(fv[x] >= 0 && fv[x] < (double) ((size_t) 1 << nr)
            && fv[x] == floor (fv[x])))
        RAISE (&o, fn, isnan (fv[x]) ? HOLENT_ENAN : HOLENT_EDOM, "MAP", x,
               "must be an integer in [0, 2^R - 1] with R = %u, got %g", nr,
               fv[x]);
      f[x] = (uint32_t) fv[x];
    }
  s = holent_contract_check (n, nl, lm, a, nr, rm, b, f, &ok, &bx, &bl);
  if (s)
    contract_fail (&o, fn, s, nl, nr);
  release (&o);
  plhs[0] = mxCreateDoubleScalar (ok);
  if (nlhs > 1)
    plhs[1] = mxCreateDoubleScalar (ok ? -1 : (double) bx);
  if (nlhs > 2)
    plhs[2] = mxCreateDoubleScalar (ok || bl == (unsigned) -1
                                    ? -1 : (double) bl + 1);
}

static void
do_facets (const char *fn, int nlhs, mxArray *plhs[], int nrhs,
           const mxArray *prhs[])
{
  owned o = { { NULL }, 0 };
  double n, *A;
  size_t nf, len, f, k;
  unsigned no, oi, *orb;
  int s;
  holent_gw_nargs (fn, nlhs, 4, nrhs, 3, 3);
  n = whole_scalar (prhs[2], fn, "N", 1, HOLENT_CONE_NMAX);
  if ((s = holent_cone_count ((unsigned) n, &nf, &no)))
    holent_gw_fail (s, fn, "N", HOLENT_NOINDEX);
  len = ((size_t) 1 << (unsigned) n) - 1;
  A = alloc (&o, fn, nf * len, sizeof *A);
  orb = alloc (&o, fn, nf, sizeof *orb);
  if ((s = holent_cone_facets ((unsigned) n, A, orb)))
    RAISE (&o, fn, s, "N", HOLENT_NOINDEX, NULL);
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
  release (&o);
  if (nlhs > 2)
    {
      plhs[2] = mxCreateCellMatrix (no, 1);
      if (nlhs > 3)
        plhs[3] = mxCreateCellMatrix (no, 1);
      for (oi = 0; oi < no; oi++)
        {
          const char *name, *text;
          holent_cone_orbit ((unsigned) n, oi, &name, &text, NULL);
          mxSetCell (plhs[2], oi, mxCreateString (name));
          if (nlhs > 3)
            mxSetCell (plhs[3], oi, mxCreateString (text));
        }
    }
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16], fn[64];
  holent_gw_init ();
  if (nrhs < 2)
    holent_gw_raise ("__holent_cone__", HOLENT_ENARGS, NULL, HOLENT_NOINDEX,
                     "expected MODE, FN and the arguments of MODE");
  holent_gw_string (prhs[1], "__holent_cone__", "FN", fn, sizeof fn);
  holent_gw_string (prhs[0], fn, "MODE", mode, sizeof mode);
  if (strcmp (mode, "mincut") == 0)
    do_mincut (fn, nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "prove") == 0)
    do_prove (fn, nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "check") == 0)
    do_check (fn, nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "facets") == 0)
    do_facets (fn, nlhs, plhs, nrhs, prhs);
  else
    holent_gw_raise (fn, HOLENT_EOPTION, "MODE", HOLENT_NOINDEX,
                     "unknown mode '%s' (mincut, prove, check, facets)",
                     mode);
}
