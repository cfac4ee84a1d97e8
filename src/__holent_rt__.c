/* RT minimisation over region sets (gateway of holent_region, holent_rt).
 *
 *   [S, NSHORT, CONF] = __holent_rt__ ("entropy", FN, NAME, BG, A, METHOD)
 *       METHOD (optional) "auto" (default), "dp" (the cubic DP, at most
 *       HOLENT_RT_NMAX intervals; the tests' oracle) or "fast".
 *       A an n x 2 real double matrix or a cell array of them; S has the
 *       size of the cell (1 x 1 for a matrix), NSHORT counts boundary
 *       segments not longer than twice the cutoff, CONF (built only when
 *       asked for: it costs more than the minimisation for small regions)
 *       is a struct array of the size of S.
 *   __holent_rt__ ("parties", FN, NAMES, ISCELL, L, R)
 *       check the parties of an information quantity: R an np x nel cell
 *       of regions (party i of instance k in R{i,k}), NAMES the np party
 *       names (a party given as a cell is named NAMES{i}{k}, ISCELL(i)
 *       true), L the circumference (Inf: a line).  Each region is checked
 *       alone, then the parties of each instance for disjointness;
 *       raises on the first failure, returns true.
 * Errors are raised by holent_gw_raise(_err) naming FN and the region;
 * the reasons of region errors come from the core (holent_region_check).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <stdio.h>
#include <string.h>
#include <math.h>
#include "holent_gw.h"
#include "holent_gw_poll.h"
#include "core/holent_region.h"
#include "core/holent_rt.h"

static const char GW[] = "__holent_rt__";

static const char *conf_fields[] = {
  "pairs", "pair_coords", "arcs", "horizon", "candidates",
  "log_candidates", "endpoints", "intervals", "length"
};
#define N_CONF_FIELDS (sizeof conf_fields / sizeof conf_fields[0])

typedef struct
{
  holent_region *reg;
  holent_rt_batch *batch;
  holent_rt_input *in;
  holent_rt_conf *conf;
  size_t *pairs;
  double *dbl;
} gw_state;

static void
gw_release (gw_state *g)
{
  holent_region_free (g->reg);
  holent_rt_batch_free (g->batch);
  mxFree (g->in);
  mxFree (g->conf);
  mxFree (g->pairs);
  mxFree (g->dbl);
  g->reg = NULL;
  g->batch = NULL;
  g->in = NULL;
  g->conf = NULL;
  g->pairs = NULL;
  g->dbl = NULL;
}

/* Free everything, then raise the core's report E about region NM.  */
static void
gw_fail (gw_state *g, const char *fn, const holent_err *e, const char *nm)
{
  const char *names[1] = { nm };
  gw_release (g);
  holent_gw_raise_err (fn, e, names, 1);
}

/* Check the class and shape of one region (its values are the core's);
   raises naming it.  */
static void
region_ok (gw_state *g, const mxArray *a, const char *fn, const char *nm)
{
  int st = HOLENT_SUCCESS;
  const char *what = NULL;
  if (a == NULL || !mxIsDouble (a) || mxIsComplex (a) || mxIsSparse (a)
      || mxGetNumberOfDimensions (a) != 2)
    {
      st = HOLENT_ETYPE;
      what = "must be a real n x 2 matrix of [start, end] rows";
    }
  else if (mxGetM (a) == 0)
    {
      st = HOLENT_EEMPTY;
      what = "has no intervals";
    }
  else if (mxGetN (a) != 2)
    {
      st = HOLENT_ETYPE;
      what = "must be an n x 2 matrix of [start, end] rows";
    }
  if (st)
    {
      gw_release (g);
      holent_gw_raise (fn, st, nm, HOLENT_NOINDEX, "%s", what);
    }
}

static void
make_conf_entry (const holent_rt_conf *c, const holent_geo_bg *bg,
                 mxArray *conf, size_t k)
{
  const holent_rt_result *res = &c->res;
  size_t m = res->m, N = 2 * c->n;
  mxArray *coords;
  mxArray *pairs = holent_gw_pairs (m, c->pairs, c->pts, &coords);
  mxArray *arcs = holent_gw_column (m, c->arcs);
  mxArray *ep = holent_gw_column (N, c->pts);
  mxArray *iv = mxCreateDoubleMatrix (c->whole ? 1 : c->n, 2, mxREAL);
  double *pi = mxGetPr (iv);
  if (c->whole)
    {
      pi[0] = 0.0;
      pi[1] = bg->L;
    }
  else
    for (size_t i = 0; i < c->n; i++)
      {
        pi[i] = c->start[i];
        pi[i + c->n] = c->start[i] + c->len[i];
      }
  mxSetFieldByNumber (conf, k, 0, pairs);
  mxSetFieldByNumber (conf, k, 1, coords);
  mxSetFieldByNumber (conf, k, 2, arcs);
  mxSetFieldByNumber (conf, k, 3, mxCreateLogicalScalar (res->horizon != 0));
  mxSetFieldByNumber (conf, k, 4, mxCreateDoubleScalar (res->candidates));
  mxSetFieldByNumber (conf, k, 5, mxCreateDoubleScalar (res->log_candidates));
  mxSetFieldByNumber (conf, k, 6, ep);
  mxSetFieldByNumber (conf, k, 7, iv);
  mxSetFieldByNumber (conf, k, 8, mxCreateDoubleScalar (res->length));
}

static void
do_entropy (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char fn[64], name[32], nm[64];
  holent_geo_bg bg;
  holent_err e;
  gw_state g = { 0 };
  holent_gw_nargs (GW, nlhs, 3, nrhs, 5, 6);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  holent_gw_string (prhs[2], fn, "NAME", name, sizeof name);
  holent_gw_bg (prhs[3], fn, &bg);
  holent_rt_method method = HOLENT_RT_AUTO;
  if (nrhs > 5)
    {
      char ms[8];
      holent_gw_string (prhs[5], fn, "METHOD", ms, sizeof ms);
      if (strcmp (ms, "dp") == 0)
        method = HOLENT_RT_DP;
      else if (strcmp (ms, "fast") == 0)
        method = HOLENT_RT_FAST;
      else if (strcmp (ms, "auto") != 0)
        holent_gw_raise (fn, HOLENT_EINVAL, "METHOD", HOLENT_NOINDEX,
                         "must be \"auto\", \"dp\" or \"fast\"");
    }

  const mxArray *A = prhs[4];
  int is_cell = mxIsCell (A);
  size_t ncell = is_cell ? mxGetNumberOfElements (A) : 1, maxrows = 1;
  for (size_t k = 0; k < ncell; k++)
    {
      const mxArray *a = holent_gw_region (A, k);
      holent_gw_region_name (nm, sizeof nm, name, A, k, HOLENT_NOINDEX);
      region_ok (&g, a, fn, nm);
      if (mxGetM (a) > maxrows)
        maxrows = mxGetM (a);
    }
  if (maxrows > HOLENT_REGION_NMAX)
    holent_gw_raise (fn, HOLENT_ETOOBIG, name, HOLENT_NOINDEX,
                     "has too many rows (at most %zu)",
                     (size_t) HOLENT_REGION_NMAX);

  /* Normalise everything first: errors come before any large
     allocation, and the workspace is sized by the largest merged region.  */
  g.reg = holent_region_alloc (maxrows);
  if (g.reg == NULL)
    holent_gw_raise (fn, HOLENT_ENOMEM, name, HOLENT_NOINDEX,
                     "out of memory for %zu rows", maxrows);
  size_t wsn = 1;
  for (size_t k = 0; k < ncell; k++)
    {
      const mxArray *a = holent_gw_region (A, k);
      const double *p = mxGetPr (a);
      size_t n = mxGetM (a);
      if (holent_region_check (g.reg, bg.circle, bg.L, n, p, p + n, &e))
        {
          holent_gw_region_name (nm, sizeof nm, name, A, k, HOLENT_NOINDEX);
          gw_fail (&g, fn, &e, nm);
        }
      if (method == HOLENT_RT_DP && g.reg->n > HOLENT_RT_NMAX)
        {
          holent_gw_region_name (nm, sizeof nm, name, A, k, HOLENT_NOINDEX);
          holent_err_set (&e, HOLENT_ETOOBIG, 0, HOLENT_NOINDEX,
                          "has %zu intervals; the DP takes at most %zu",
                          g.reg->n, (size_t) HOLENT_RT_NMAX);
          gw_fail (&g, fn, &e, nm);
        }
      if (g.reg->n > wsn)
        wsn = g.reg->n;
    }

  if (is_cell)
    plhs[0] = mxCreateNumericArray (mxGetNumberOfDimensions (A),
                                    mxGetDimensions (A), mxDOUBLE_CLASS,
                                    mxREAL);
  else
    plhs[0] = mxCreateDoubleScalar (0.0);
  double *S = mxGetPr (plhs[0]);
  mxArray *conf = NULL;
  if (nlhs > 2)
    {
      if (is_cell)
        conf = mxCreateStructArray (mxGetNumberOfDimensions (A),
                                    mxGetDimensions (A), N_CONF_FIELDS,
                                    conf_fields);
      else
        conf = mxCreateStructMatrix (1, 1, N_CONF_FIELDS, conf_fields);
      plhs[2] = conf;
    }

  /* The core spreads the regions over threads (one loop for one region
     or many); the configurations come back in buffers sized by rows.  */
  g.batch = holent_rt_batch_alloc (ncell, maxrows, wsn,
                                   method == HOLENT_RT_DP);
  g.in = mxMalloc (ncell * sizeof *g.in);
  size_t total = 0;
  for (size_t k = 0; k < ncell; k++)
    {
      const mxArray *a = holent_gw_region (A, k);
      g.in[k].rows = mxGetM (a);
      g.in[k].start = mxGetPr (a);
      g.in[k].end = mxGetPr (a) + g.in[k].rows;
      total += g.in[k].rows;
    }
  if (conf)
    {
      g.conf = mxMalloc (ncell * sizeof *g.conf);
      g.pairs = mxMalloc (2 * total * sizeof *g.pairs);
      g.dbl = mxMalloc (6 * total * sizeof *g.dbl);
      size_t off = 0;
      for (size_t k = 0; k < ncell; k++)
        {
          size_t m = g.in[k].rows;
          g.conf[k].pairs = g.pairs + 2 * off;
          g.conf[k].arcs = g.dbl + off;
          g.conf[k].pts = g.dbl + total + 2 * off;
          g.conf[k].start = g.dbl + 3 * total + off;
          g.conf[k].len = g.dbl + 4 * total + off;
          off += m;
        }
    }
  if (g.batch == NULL)
    {
      gw_release (&g);
      holent_gw_raise (fn, HOLENT_ENOMEM, name, HOLENT_NOINDEX,
                       "out of memory for a region of %zu intervals", wsn);
    }
  double nshort = 0.0;
  size_t failed = 0;
  /* Ctrl-C and progress: per region, and inside the minimisers.  */
  int st = holent_rt_batch_run (g.batch, &bg, method, ncell, g.in, S,
                                &nshort, g.conf, &failed, holent_gw_poll (fn));
  if (st)
    {
      /* Ctrl-C (HOLENT_EINTR) returns to the prompt inside the raise.  */
      holent_gw_region_name (nm, sizeof nm, name, A, failed, HOLENT_NOINDEX);
      holent_err_set (&e, st, 0, HOLENT_NOINDEX, "minimisation failed (%s)",
                      holent_strerror (st));
      gw_fail (&g, fn, &e, nm);
    }
  if (conf)
    for (size_t k = 0; k < ncell; k++)
      make_conf_entry (&g.conf[k], &bg, conf, k);
  gw_release (&g);
  holent_gw_poll_end ();
  if (nlhs > 1)
    plhs[1] = mxCreateDoubleScalar (nshort);
}

static void
do_parties (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char fn[64];
  holent_err e;
  gw_state g = { 0 };
  holent_gw_nargs (GW, nlhs, 1, nrhs, 6, 6);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  const mxArray *N = prhs[2], *C = prhs[3], *R = prhs[5];
  double L = holent_gw_scalar (prhs[4], fn, "L");
  if (!mxIsCell (N) || !mxIsCell (R) || mxGetNumberOfDimensions (R) != 2
      || !mxIsLogical (C)
      || mxGetNumberOfElements (C) != mxGetNumberOfElements (N)
      || mxGetM (R) != mxGetNumberOfElements (N) || mxGetM (R) == 0
      || mxGetM (R) > 64)
    holent_gw_raise (fn, HOLENT_EINVAL, "R", HOLENT_NOINDEX,
                     "must be an np x nel cell of regions with np names");
  size_t np = mxGetM (R), nel = mxGetN (R), total = 1;
  char nm[64][32];
  const char *names[64];
  size_t rows[64];
  int *iscl = mxCalloc (np, sizeof *iscl);
  {
    const mxLogical *cp = mxGetLogicals (C);
    for (size_t i = 0; i < np; i++)
      iscl[i] = cp[i] != 0;
  }
  for (size_t i = 0; i < np; i++)
    {
      holent_gw_string (mxGetCell (N, i), fn, "NAMES", nm[i], sizeof nm[i]);
    }
  /* Each region alone, named as the user wrote it.  */
  for (size_t k = 0; k < nel; k++)
    for (size_t i = 0; i < np; i++)
      {
        const mxArray *a = mxGetCell (R, i + k * np);
        char nmk[72];
        snprintf (nmk, sizeof nmk, iscl[i] ? "%s{%zu}" : "%s", nm[i], k + 1);
        region_ok (&g, a, fn, nmk);
        total += mxGetM (a);
      }
  g.reg = holent_region_alloc (total);
  g.dbl = mxMalloc (2 * total * sizeof *g.dbl);
  if (g.reg == NULL)
    {
      mxFree (iscl);
      gw_release (&g);
      holent_gw_raise (fn, HOLENT_ENOMEM, NULL, HOLENT_NOINDEX, NULL);
    }
  int circle = isfinite (L);
  for (size_t k = 0; k < nel; k++)
    {
      size_t n = 0;
      char nmk[64][72];
      for (size_t i = 0; i < np; i++)
        {
          const mxArray *a = mxGetCell (R, i + k * np);
          const double *p = mxGetPr (a);
          snprintf (nmk[i], sizeof nmk[i], iscl[i] ? "%s{%zu}" : "%s", nm[i],
                    k + 1);
          names[i] = nmk[i];
          rows[i] = mxGetM (a);
          if (holent_region_check (g.reg, circle, L, rows[i], p, p + rows[i],
                                   &e))
            {
              mxFree (iscl);
              gw_fail (&g, fn, &e, nmk[i]);
            }
          memcpy (g.dbl + n, p, rows[i] * sizeof (double));
          memcpy (g.dbl + total + n, p + rows[i], rows[i] * sizeof (double));
          n += rows[i];
        }
      if (np > 1
          && holent_region_parties (g.reg, circle, L, np, rows, g.dbl,
                                    g.dbl + total, names, &e))
        {
          mxFree (iscl);
          gw_fail (&g, fn, &e, NULL);
        }
    }
  mxFree (iscl);
  gw_release (&g);
  plhs[0] = mxCreateLogicalScalar (1);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16];
  holent_gw_init ();
  if (nrhs < 1)
    holent_gw_raise (GW, HOLENT_ENARGS, NULL, HOLENT_NOINDEX,
                     "MODE missing");
  holent_gw_string (prhs[0], GW, "MODE", mode, sizeof mode);
  if (strcmp (mode, "entropy") == 0)
    do_entropy (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "parties") == 0)
    do_parties (nlhs, plhs, nrhs, prhs);
  else
    holent_gw_raise (GW, HOLENT_EINVAL, "MODE", HOLENT_NOINDEX,
                     "unknown mode '%s'", mode);
}
