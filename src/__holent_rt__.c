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
 *   [STATUS, ROW1, ROW2] = __holent_rt__ ("check", BG, A)
 *       normalise A only; STATUS is 0 or a core status code, ROW1/ROW2 the
 *       offending rows (1-based, 0 when none).  Never raises for A.
 * GPL-3.0-or-later.  */
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
  char id[32];
  char msg[512];
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

/* Free everything, then raise (mexErrMsgIdAndTxt does not return).  */
static void
gw_raise (gw_state *g)
{
  gw_release (g);
  holent_gw_poll_end ();
  mexErrMsgIdAndTxt (g->id, "%s", g->msg);
}

/* "A" or "A{k}" for messages.  */
static void
region_name (char *buf, size_t sz, const char *name, int is_cell, size_t k)
{
  if (is_cell)
    snprintf (buf, sz, "%s{%zu}", name, k + 1);
  else
    snprintf (buf, sz, "%s", name);
}

/* Check the type and shape of one region; 0 if fine (message set).  */
static int
region_ok (gw_state *g, const mxArray *a, const char *fn, const char *nm)
{
  if (a == NULL || !mxIsDouble (a) || mxIsComplex (a) || mxIsSparse (a)
      || mxGetNumberOfDimensions (a) != 2)
    {
      snprintf (g->id, sizeof g->id, "holent:type");
      snprintf (g->msg, sizeof g->msg,
                "%s: %s must be a real n x 2 matrix of [start, end] rows",
                fn, nm);
      return 0;
    }
  if (mxGetM (a) == 0)
    {
      snprintf (g->id, sizeof g->id, "holent:empty");
      snprintf (g->msg, sizeof g->msg, "%s: %s has no intervals", fn, nm);
      return 0;
    }
  if (mxGetN (a) != 2)
    {
      snprintf (g->id, sizeof g->id, "holent:type");
      snprintf (g->msg, sizeof g->msg,
                "%s: %s must be an n x 2 matrix of [start, end] rows, got "
                "%zu columns", fn, nm, (size_t) mxGetN (a));
      return 0;
    }
  const double *p = mxGetPr (a);
  size_t n = mxGetM (a);
  for (size_t i = 0; i < 2 * n; i++)
    if (!isfinite (p[i]))
      {
        snprintf (g->id, sizeof g->id, isnan (p[i]) ? "holent:nan"
                                                    : "holent:domain");
        snprintf (g->msg, sizeof g->msg, "%s: %s(%zu,%zu) must be %s", fn,
                  nm, i % n + 1, i / n + 1,
                  isnan (p[i]) ? "a number, not NaN" : "finite");
        return 0;
      }
  return 1;
}

/* Message for a failed holent_region_set.  */
static void
region_fail (gw_state *g, int st, const char *fn, const char *nm, int circle)
{
  const holent_region *r = g->reg;
  switch (st)
    {
    case HOLENT_EOVERLAP:
      snprintf (g->id, sizeof g->id, "holent:overlap");
      snprintf (g->msg, sizeof g->msg,
                "%s: rows %zu and %zu of %s overlap (intervals of a region "
                "must be disjoint; touching ones are merged)", fn,
                r->bad[0] + 1, r->bad[1] + 1, nm);
      break;
    case HOLENT_EEMPTY:
      snprintf (g->id, sizeof g->id, "holent:empty");
      snprintf (g->msg, sizeof g->msg,
                "%s: row %zu of %s is a zero-length interval", fn,
                r->bad[0] + 1, nm);
      break;
    case HOLENT_EDOM:
      snprintf (g->id, sizeof g->id, "holent:domain");
      if (circle)
        snprintf (g->msg, sizeof g->msg,
                  "%s: row %zu of %s is longer than the circle (end - start "
                  "must not exceed the circumference)", fn, r->bad[0] + 1,
                  nm);
      else
        snprintf (g->msg, sizeof g->msg,
                  "%s: row %zu of %s must have start < end on a line", fn,
                  r->bad[0] + 1, nm);
      break;
    case HOLENT_ETOOBIG:
      snprintf (g->id, sizeof g->id, "holent:toobig");
      snprintf (g->msg, sizeof g->msg, "%s: %s has too many rows", fn, nm);
      break;
    case HOLENT_EINVAL:
      snprintf (g->id, sizeof g->id, "holent:domain");
      snprintf (g->msg, sizeof g->msg,
                "%s: row %zu of %s: end - start overflows (coordinates too "
                "large)", fn, r->bad[0] + 1, nm);
      break;
    default:
      snprintf (g->id, sizeof g->id, "holent:invalid");
      snprintf (g->msg, sizeof g->msg, "%s: %s: %s", fn, nm,
                holent_strerror (st));
      break;
    }
}

static void
make_conf_entry (const holent_rt_conf *c, const holent_geo_bg *bg,
                 mxArray *conf, size_t k)
{
  const holent_rt_result *res = &c->res;
  size_t m = res->m, N = 2 * c->n;
  mxArray *pairs = mxCreateDoubleMatrix (m, 2, mxREAL);
  mxArray *coords = mxCreateDoubleMatrix (m, 2, mxREAL);
  mxArray *arcs = mxCreateDoubleMatrix (m, 1, mxREAL);
  double *pp = mxGetPr (pairs), *pc = mxGetPr (coords), *pa = mxGetPr (arcs);
  for (size_t i = 0; i < m; i++)
    {
      pp[i] = (double) c->pairs[2 * i] + 1.0;
      pp[i + m] = (double) c->pairs[2 * i + 1] + 1.0;
      pc[i] = c->pts[c->pairs[2 * i]];
      pc[i + m] = c->pts[c->pairs[2 * i + 1]];
      pa[i] = c->arcs[i];
    }
  mxArray *ep = mxCreateDoubleMatrix (N, 1, mxREAL);
  memcpy (mxGetPr (ep), c->pts, N * sizeof (double));
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
  gw_state g = { 0 };
  holent_gw_nargs (GW, nlhs, 3, nrhs, 5, 6);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  holent_gw_string (prhs[2], GW, "NAME", name, sizeof name);
  holent_gw_bg (prhs[3], fn, &bg);
  holent_rt_method method = HOLENT_RT_AUTO;
  if (nrhs > 5)
    {
      char ms[8];
      holent_gw_string (prhs[5], GW, "METHOD", ms, sizeof ms);
      if (strcmp (ms, "dp") == 0)
        method = HOLENT_RT_DP;
      else if (strcmp (ms, "fast") == 0)
        method = HOLENT_RT_FAST;
      else if (strcmp (ms, "auto") != 0)
        mexErrMsgIdAndTxt ("holent:invalid",
                           "METHOD must be \"auto\", \"dp\" or \"fast\"");
    }

  const mxArray *A = prhs[4];
  int is_cell = mxIsCell (A);
  size_t ncell = is_cell ? mxGetNumberOfElements (A) : 1, maxrows = 1;
  for (size_t k = 0; k < ncell; k++)
    {
      const mxArray *a = is_cell ? mxGetCell (A, k) : A;
      region_name (nm, sizeof nm, name, is_cell, k);
      if (!region_ok (&g, a, fn, nm))
        gw_raise (&g);
      if (mxGetM (a) > maxrows)
        maxrows = mxGetM (a);
    }
  if (maxrows > HOLENT_REGION_NMAX)
    mexErrMsgIdAndTxt ("holent:toobig", "%s: %s has too many rows", fn,
                       name);

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

  /* Normalise everything first: errors come before any large
     allocation, and the workspace is sized by the largest merged region.  */
  g.reg = holent_region_alloc (maxrows);
  if (g.reg == NULL)
    {
      snprintf (g.id, sizeof g.id, "holent:nomem");
      snprintf (g.msg, sizeof g.msg, "%s: out of memory for %zu rows", fn,
                maxrows);
      gw_raise (&g);
    }
  size_t wsn = 1;
  for (size_t k = 0; k < ncell; k++)
    {
      const mxArray *a = is_cell ? mxGetCell (A, k) : A;
      const double *p = mxGetPr (a);
      size_t n = mxGetM (a);
      int st = holent_region_set (g.reg, bg.circle, bg.L, n, p, p + n);
      int big = method == HOLENT_RT_DP && g.reg->n > HOLENT_RT_NMAX;
      if (st || big)
        region_name (nm, sizeof nm, name, is_cell, k);
      if (st)
        {
          region_fail (&g, st, fn, nm, bg.circle);
          gw_raise (&g);
        }
      if (big)
        {
          snprintf (g.id, sizeof g.id, "holent:toobig");
          snprintf (g.msg, sizeof g.msg,
                    "%s: %s has %zu intervals; the DP takes at most %zu",
                    fn, nm, g.reg->n, (size_t) HOLENT_RT_NMAX);
          gw_raise (&g);
        }
      if (g.reg->n > wsn)
        wsn = g.reg->n;
    }
  /* The core spreads the regions over threads (one loop for one region
     or many); the configurations come back in buffers sized by rows.  */
  g.batch = holent_rt_batch_alloc (ncell, maxrows, wsn,
                                   method == HOLENT_RT_DP);
  g.in = mxMalloc (ncell * sizeof *g.in);
  size_t total = 0;
  for (size_t k = 0; k < ncell; k++)
    {
      const mxArray *a = is_cell ? mxGetCell (A, k) : A;
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
      snprintf (g.id, sizeof g.id, "holent:nomem");
      snprintf (g.msg, sizeof g.msg,
                "%s: out of memory for a region of %zu intervals", fn, wsn);
      gw_raise (&g);
    }
  double nshort = 0.0;
  size_t failed = 0;
  /* Ctrl-C and progress: per region, and inside the minimisers.  */
  int st = holent_rt_batch_run (g.batch, &bg, method, ncell, g.in, S,
                                &nshort, g.conf, &failed, holent_gw_poll (fn));
  if (st == HOLENT_EINTR)
    {
      gw_release (&g);
      holent_gw_interrupt ();
    }
  if (st)
    {
      region_name (nm, sizeof nm, name, is_cell, failed);
      snprintf (g.id, sizeof g.id, st == HOLENT_ENOMEM ? "holent:nomem"
                                                       : "holent:internal");
      snprintf (g.msg, sizeof g.msg, "%s: %s: minimisation failed (%s)", fn,
                nm, holent_strerror (st));
      gw_raise (&g);
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
do_check (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  holent_geo_bg bg;
  gw_state g = { 0 };
  holent_gw_nargs (GW, nlhs, 3, nrhs, 3, 3);
  holent_gw_bg (prhs[1], GW, &bg);
  const mxArray *a = prhs[2];
  if (!region_ok (&g, a, GW, "A"))
    mexErrMsgIdAndTxt (g.id, "%s", g.msg);
  size_t n = mxGetM (a);
  if (n > HOLENT_REGION_NMAX)
    mexErrMsgIdAndTxt ("holent:toobig", "A has too many rows");
  g.reg = holent_region_alloc (n);
  if (g.reg == NULL)
    mexErrMsgIdAndTxt ("holent:nomem", "out of memory");
  const double *p = mxGetPr (a);
  int st = holent_region_set (g.reg, bg.circle, bg.L, n, p, p + n);
  double r1 = g.reg->bad[0] == (size_t) -1 ? 0.0 : (double) g.reg->bad[0] + 1;
  double r2 = g.reg->bad[1] == (size_t) -1 ? 0.0 : (double) g.reg->bad[1] + 1;
  gw_release (&g);
  plhs[0] = mxCreateDoubleScalar ((double) st);
  if (nlhs > 1)
    plhs[1] = mxCreateDoubleScalar (r1);
  if (nlhs > 2)
    plhs[2] = mxCreateDoubleScalar (r2);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16];
  holent_gw_init ();
  if (nrhs < 1)
    mexErrMsgIdAndTxt ("holent:nargs", "MODE missing");
  holent_gw_string (prhs[0], GW, "MODE", mode, sizeof mode);
  if (strcmp (mode, "entropy") == 0)
    do_entropy (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "check") == 0)
    do_check (nlhs, plhs, nrhs, prhs);
  else
    mexErrMsgIdAndTxt ("holent:invalid", "unknown MODE '%s'", mode);
}
