/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Gateway of holent_bcft: BCFT backgrounds with end-of-the-world branes.
 * Every mode takes the public function's name FN after the mode; errors
 * are raised by holent_gw_raise as "FN: ARG: what was expected".
 *
 *   BG = __holent_bcft__ ("bg", FN, STATE, BOUNDARY, NAME, VALUE, ...)
 *       the options of ads3_background (c, G, ell, cutoff, length, beta,
 *       T, tension, log_g, saddle); built, checked and derived once by
 *       the core constructor holent_bcft_bg_make, packed here.
 *   [S, NSHORT, CONF] = __holent_bcft__ ("entropy", FN, NAME, BG, A)
 *       A an n x 2 matrix or a cell of them (as __holent_rt__).
 *   [STATUS, ROW1, ROW2] = __holent_bcft__ ("check", FN, BG, A)
 *       disjointness only: STATUS 0 or a core status, the two rows.
 *   [S, KB, NB, SNO, INFO] = __holent_bcft__ ("page", FN, BG, R, T)
 *   X = __holent_bcft__ ("profile", FN, BG, Z, END)  (NaN where no brane)
 *   SURF = __holent_bcft__ ("surface", FN, BG, A, TOL [, RUNNER [, T]])
 *       the minimal configuration (RUNNER true: the runner-up) as curves
 *       (rt_surface), with the branes;
 *       on a two-sided background without T the island configuration of
 *       R = A; with T the minimiser (or runner-up) at the boundary time
 *       T on both sides in the Kruskal picture, with fields times, sides
 *       (doc/surfaces.md).
 * Unpack, call the core, pack; no physics.  */
#include <ctype.h>
#include <stdio.h>
#include <string.h>
#include <math.h>
#include "holent_gw.h"
#include "holent_gw_poll.h"
#include "core/holent_bcft.h"
#include "core/holent_region.h"
#include "core/holent_surface.h"

static const char GW[] = "__holent_bcft__";

static const mxArray *
field (const mxArray *s, const char *fn, const char *name)
{
  const mxArray *f = mxGetField (s, 0, name);
  if (f == NULL)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                     "is missing field '%s': make it with ads3_background",
                     name);
  return f;
}

/* The background of a BG struct, checked by the one core constructor.  */
static void
unpack_bg (const mxArray *s, const char *fn, holent_bcft_bg *bg)
{
  char state[16], boundary[16], saddle[16];
  holent_err err;
  if (s == NULL || !mxIsStruct (s) || mxGetNumberOfElements (s) != 1)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                     "must be a scalar struct from ads3_background");
  holent_gw_string (field (s, fn, "state"), fn, "BG.state", state,
                    sizeof state);
  holent_gw_string (field (s, fn, "boundary"), fn, "BG.boundary", boundary,
                    sizeof boundary);
  holent_gw_string (field (s, fn, "saddle"), fn, "BG.saddle", saddle,
                    sizeof saddle);
  holent_bcft_spec sp;
  memset (&sp, 0, sizeof sp);
  if (holent_bcft_kind_of (state, boundary, &sp.kind, &err))
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX, "%s",
                     err.reason);
  size_t nt;
  sp.values = holent_gw_real (field (s, fn, "tension"), fn, "BG.tension",
                              &nt);
  if (nt != 2)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG.tension", HOLENT_NOINDEX,
                     "must hold two values");
  sp.nvalues = sp.kind == HOLENT_BCFT_INTERVAL ? 2 : 1;
  sp.ell = holent_gw_scalar (field (s, fn, "ell"), fn, "BG.ell");
  sp.c = holent_gw_scalar (field (s, fn, "c"), fn, "BG.c");
  sp.G = NAN;
  sp.T = NAN;
  sp.cutoff = holent_gw_scalar (field (s, fn, "cutoff"), fn, "BG.cutoff");
  sp.beta = holent_gw_scalar (field (s, fn, "beta"), fn, "BG.beta");
  if (sp.beta == INFINITY)   /* zero temperature: no beta given */
    sp.beta = NAN;
  sp.length = NAN;
  if (sp.kind == HOLENT_BCFT_INTERVAL)
    {
      sp.length = holent_gw_scalar (field (s, fn, "length"), fn,
                                    "BG.length");
      sp.has_saddle = 1;
      if (holent_bcft_saddle_of (saddle, &sp.saddle, &err))
        holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX, "%s",
                         err.reason);
    }
  if (holent_bcft_bg_make (bg, &sp, &err))
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                     "has inconsistent parameters (%s)", err.reason);
}

static mxArray *
row2 (const double v[2])
{
  mxArray *r = mxCreateDoubleMatrix (1, 2, mxREAL);
  mxGetPr (r)[0] = v[0];
  mxGetPr (r)[1] = v[1];
  return r;
}

/* ---- "bg": ads3_background's options ----------------------------- */

static const char *const opt_names[] = {
  "c", "G", "ell", "cutoff", "length", "beta", "T", "tension", "log_g",
  "saddle"
};
#define N_OPTS (sizeof opt_names / sizeof opt_names[0])

static int
same_lower (const char *a, const char *b)
{
  for (; *a && *b; a++, b++)
    if (tolower ((unsigned char) *a) != tolower ((unsigned char) *b))
      return 0;
  return *a == *b;
}

/* A real numeric option value: its elements (at most 2) as doubles.  */
static size_t
opt_numbers (const mxArray *v, const char *fn, const char *name,
             size_t maxn, double *out)
{
  size_t n = mxGetNumberOfElements (v);
  if (!mxIsNumeric (v) || mxIsComplex (v) || mxIsSparse (v) || n == 0
      || n > 8)
    holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                     "'%s' must be real numeric%s", name,
                     maxn == 1 ? " scalar" : "");
  if (maxn == 1 && n != 1)
    holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                     "'%s' must be a scalar", name);
  if (!mxIsDouble (v) && n != 1)
    holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                     "'%s' must be real double", name);
  for (size_t k = 0; k < n && k < maxn; k++)
    {
      out[k] = n == 1 ? mxGetScalar (v) : mxGetPr (v)[k];
      if (maxn == 1 && isnan (out[k]))   /* NaN stands for "not given" */
        holent_gw_raise (fn, HOLENT_ENAN, NULL, HOLENT_NOINDEX,
                         "'%s' must not be NaN", name);
    }
  return n;
}

static void
do_bg (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char fn[64], state[16], boundary[16], saddle[16];
  holent_err err;
  holent_gw_nargs (GW, nlhs, 1, nrhs, 4, 4 + 2 * (int) N_OPTS);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  holent_gw_string (prhs[2], fn, "STATE", state, sizeof state);
  if (!mxIsChar (prhs[3]) || mxGetM (prhs[3]) != 1
      || mxGetString (prhs[3], boundary, sizeof boundary) != 0)
    holent_gw_raise (fn, HOLENT_ETYPE, "BOUNDARY", HOLENT_NOINDEX,
                     "must be a string ('half_line' or 'interval')");
  for (char *p = boundary; *p; p++)
    *p = (char) tolower ((unsigned char) *p);
  holent_bcft_spec sp;
  memset (&sp, 0, sizeof sp);
  if (holent_bcft_kind_of (state, boundary, &sp.kind, &err))
    holent_gw_raise_err (fn, &err, NULL, 0);
  double x[N_OPTS][2];
  size_t nx[N_OPTS] = { 0 };
  if ((nrhs - 4) % 2)
    holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                     "options must come in name/value pairs");
  saddle[0] = '\0';
  for (int a = 4; a < nrhs; a += 2)
    {
      char nm[32];
      size_t k;
      if (!mxIsChar (prhs[a]) || mxGetM (prhs[a]) != 1
          || mxGetString (prhs[a], nm, sizeof nm) != 0)
        holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                         "option name %d must be a string", (a - 2) / 2);
      for (k = 0; k < N_OPTS; k++)
        if (same_lower (nm, opt_names[k]))
          break;
      if (k == N_OPTS)
        holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                         "unknown option '%s' (expected one of: c, G, ell, "
                         "cutoff, length, beta, T, tension, log_g, saddle)",
                         nm);
      if (nx[k])
        holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                         "option '%s' given twice", opt_names[k]);
      if (strcmp (opt_names[k], "saddle") == 0)
        {
          if (!mxIsChar (prhs[a + 1]) || mxGetM (prhs[a + 1]) > 1
              || mxGetString (prhs[a + 1], saddle, sizeof saddle) != 0)
            holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                             "'saddle' must be a string");
          nx[k] = 1;
        }
      else
        nx[k] = opt_numbers (prhs[a + 1], fn, opt_names[k],
                             k == 7 || k == 8 ? 2 : 1, x[k]);
    }
  double *dst[] = { &sp.c, &sp.G, &sp.ell, &sp.cutoff, &sp.length, &sp.beta,
                    &sp.T };
  for (size_t k = 0; k < 7; k++)
    *dst[k] = nx[k] ? x[k][0] : NAN;
  if (nx[7] && nx[8])
    holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                     "give either 'tension' or 'log_g', not both");
  sp.is_log_g = nx[8] > 0;
  sp.values = x[sp.is_log_g ? 8 : 7];
  sp.nvalues = nx[sp.is_log_g ? 8 : 7];
  if (nx[9])
    {
      sp.has_saddle = 1;
      if (holent_bcft_saddle_of (saddle, &sp.saddle, &err))
        holent_gw_raise_err (fn, &err, NULL, 0);
    }
  holent_bcft_bg bg;
  if (holent_bcft_bg_make (&bg, &sp, &err))
    holent_gw_raise_err (fn, &err, NULL, 0);
  static const char *names[] = {
    "state", "boundary", "bulk", "c", "G", "ell", "cutoff", "length",
    "beta", "T", "tension", "log_g", "rho", "saddle", "beta_c", "horizon",
    "S_H", "pure", "zh", "z0", "brane_profile"
  };
  mxArray *s = mxCreateStructMatrix (1, 1, 21, names);
  mxSetField (s, 0, "state", mxCreateString (holent_bcft_state_name (&bg)));
  mxSetField (s, 0, "boundary",
              mxCreateString (holent_bcft_boundary_name (&bg)));
  mxSetField (s, 0, "bulk", mxCreateString (holent_bcft_bulk_name (&bg)));
  mxSetField (s, 0, "c", mxCreateDoubleScalar (bg.c));
  mxSetField (s, 0, "G", mxCreateDoubleScalar (bg.G));
  mxSetField (s, 0, "ell", mxCreateDoubleScalar (bg.ell));
  mxSetField (s, 0, "cutoff", mxCreateDoubleScalar (bg.eps));
  mxSetField (s, 0, "length", mxCreateDoubleScalar (bg.length));
  mxSetField (s, 0, "beta", mxCreateDoubleScalar (bg.beta));
  mxSetField (s, 0, "T", mxCreateDoubleScalar (1.0 / bg.beta));
  mxSetField (s, 0, "tension", row2 (bg.tension));
  mxSetField (s, 0, "log_g", row2 (bg.log_g));
  mxSetField (s, 0, "rho", row2 (bg.rho));
  mxSetField (s, 0, "saddle",
              mxCreateString (holent_bcft_saddle_name (&bg)));
  mxSetField (s, 0, "beta_c", mxCreateDoubleScalar (bg.beta_c));
  mxSetField (s, 0, "horizon", mxCreateLogicalScalar (bg.btz != 0));
  mxSetField (s, 0, "S_H", mxCreateDoubleScalar (bg.S_H));
  mxSetField (s, 0, "pure", mxCreateLogicalScalar (bg.pure != 0));
  /* depths in units of ell, as every bulk length of holent */
  mxSetField (s, 0, "zh", mxCreateDoubleScalar (bg.zh * bg.ell));
  mxSetField (s, 0, "z0", mxCreateDoubleScalar (bg.z0 * bg.ell));
  mxSetField (s, 0, "brane_profile",
              mxCreateString (holent_bcft_profile_text (&bg)));
  plhs[0] = s;
}

/* ---- regions ------------------------------------------------------- */

/* Raise the core's report on region k of A (freeing the workspace).  */
static void
region_raise (const char *fn, const char *name, const mxArray *A, size_t k,
              holent_bcft_workspace *ws, const holent_err *err)
{
  char nm[96];
  holent_bcft_workspace_free (ws);
  if (err->arg == 0)
    holent_gw_region_name (nm, sizeof nm, name, A, k, err->index);
  else
    snprintf (nm, sizeof nm, "BG");
  holent_gw_raise (fn, err->status, nm, HOLENT_NOINDEX, "%s",
                   err->reason[0] ? err->reason
                                  : holent_strerror (err->status));
}

static holent_bcft_workspace *
ws_alloc (const char *fn, const char *name, size_t rows)
{
  if (rows > HOLENT_BCFT_MMAX / 2)
    holent_gw_raise (fn, HOLENT_ETOOBIG, name, HOLENT_NOINDEX,
                     "has more than %zu rows", (size_t) HOLENT_BCFT_MMAX / 2);
  holent_bcft_workspace *ws = holent_bcft_workspace_alloc (rows ? rows : 1);
  if (ws == NULL)
    holent_gw_raise (fn, HOLENT_ENOMEM, NULL, HOLENT_NOINDEX, NULL);
  return ws;
}

static const char *conf_fields[] = { "pairs", "pair_coords", "horizon",
                                     "endpoints", "intervals", "length",
                                     "brane" };

/* The brane endings of a configuration (1-based endpoint indices, their
   coordinates, the end of the BCFT, the landing points).  */
static mxArray *
brane_struct (const holent_bcft_result *r, const holent_bcft_bg *bg)
{
  static const char *bf[] = { "endpoint", "x", "end", "landing" };
  size_t nb = r->nbrane;
  mxArray *br = mxCreateStructMatrix (1, 1, 4, bf);
  mxArray *be = mxCreateDoubleMatrix (nb, 1, mxREAL);
  mxArray *bx = mxCreateDoubleMatrix (nb, 1, mxREAL);
  mxArray *bend = mxCreateDoubleMatrix (nb, 1, mxREAL);
  for (size_t i = 0; i < nb; i++)
    {
      mxGetPr (be)[i] = (double) r->brane[i] + 1.0;
      mxGetPr (bx)[i] = r->pts[r->brane[i]];
      mxGetPr (bend)[i] = r->brane_end[i] ? bg->length : 0.0;
    }
  mxSetField (br, 0, "endpoint", be);
  mxSetField (br, 0, "x", bx);
  mxSetField (br, 0, "end", bend);
  mxSetField (br, 0, "landing", holent_gw_columns (nb, r->brane_x,
                                                    r->brane_z));
  return br;
}

static void
conf_entry (mxArray *conf, size_t k, const holent_bcft_result *r,
            const holent_bcft_bg *bg)
{
  mxArray *coords;
  mxSetField (conf, k, "pairs", holent_gw_pairs (r->npairs, r->pairs, r->pts,
                                                 &coords));
  mxSetField (conf, k, "pair_coords", coords);
  mxSetField (conf, k, "horizon", mxCreateLogicalScalar (r->horizon != 0));
  mxSetField (conf, k, "endpoints", holent_gw_column (r->m, r->pts));
  mxSetField (conf, k, "intervals", holent_gw_columns (r->n, r->start,
                                                        r->end));
  mxSetField (conf, k, "length", mxCreateDoubleScalar (r->length));
  mxSetField (conf, k, "brane", brane_struct (r, bg));
}

static void
do_entropy (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char fn[64], name[32];
  holent_bcft_bg bg;
  holent_err err;
  holent_gw_nargs (GW, nlhs, 3, nrhs, 5, 5);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  holent_gw_string (prhs[2], fn, "NAME", name, sizeof name);
  unpack_bg (prhs[3], fn, &bg);
  const mxArray *A = prhs[4];
  size_t maxrows;
  size_t nreg = holent_gw_regions (A, fn, name, &maxrows);
  if (bg.kind == HOLENT_BCFT_TFD)
    holent_gw_raise (fn, HOLENT_EUNSUP, "BG", HOLENT_NOINDEX,
                     "is two-sided: use page_curve for its radiation "
                     "regions");
  holent_bcft_workspace *ws = ws_alloc (fn, name, maxrows);
  const holent_poll *poll = holent_gw_poll (fn);
  mxArray *Sout = holent_gw_per_region (A), *conf = NULL;
  if (nlhs > 2)
    conf = holent_gw_per_region_struct (A, 7, conf_fields);
  double *S = mxGetPr (Sout);
  size_t nshort = 0;
  for (size_t k = 0; k < nreg; k++)
    {
      const mxArray *a = holent_gw_region (A, k);
      size_t n = mxGetM (a);
      const double *p = mxGetPr (a);
      holent_bcft_result r;
      if (holent_bcft_entropy (ws, &bg, n, p, p + n, &r, &err, poll))
        {
          mxDestroyArray (Sout);
          if (conf)
            mxDestroyArray (conf);
          region_raise (fn, name, A, k, ws, &err);
        }
      S[k] = r.S;
      nshort += r.n_short;
      if (conf)
        conf_entry (conf, k, &r, &bg);
    }
  holent_gw_poll_end ();
  holent_bcft_workspace_free (ws);
  plhs[0] = Sout;
  if (nlhs > 1)
    plhs[1] = mxCreateDoubleScalar ((double) nshort);
  if (conf)
    plhs[2] = conf;
}

static void
do_check (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char fn[64];
  holent_bcft_bg bg;
  holent_gw_nargs (GW, nlhs, 3, nrhs, 4, 4);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  unpack_bg (prhs[2], fn, &bg);
  size_t n;
  const double *p = holent_gw_real (prhs[3], fn, "A", &n);
  double out[3] = { 0.0, 0.0, 0.0 };
  if (mxGetNumberOfDimensions (prhs[3]) != 2
      || (n > 0 && mxGetN (prhs[3]) != 2))
    out[0] = (double) HOLENT_ETYPE;
  else
    {
      n = mxGetM (prhs[3]);
      holent_region *reg = holent_region_alloc (n ? n : 1);
      if (reg == NULL)
        holent_gw_raise (fn, HOLENT_ENOMEM, NULL, HOLENT_NOINDEX, NULL);
      int st = holent_region_set (reg, 0, 0.0, n, p, p + n);
      out[0] = (double) st;
      if (st == HOLENT_EOVERLAP)
        {
          out[1] = (double) reg->bad[0] + 1.0;
          out[2] = (double) reg->bad[1] + 1.0;
        }
      holent_region_free (reg);
    }
  for (int k = 0; k < 3 && k < (nlhs > 1 ? nlhs : 1); k++)
    plhs[k] = mxCreateDoubleScalar (out[k]);
}

/* The island configuration's geodesics within a side, [x1, x2] rows.  */
static mxArray *
island_pairs (const holent_bcft_page *pg)
{
  size_t n = pg->n_island_pairs;
  mxArray *ip = mxCreateDoubleMatrix (n, 2, mxREAL);
  for (size_t i = 0; i < n; i++)
    for (size_t j = 0; j < 2; j++)
      mxGetPr (ip)[i + j * n] = pg->island_pairs[2 * i + j];
  return ip;
}

static void
do_page (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char fn[64];
  holent_bcft_bg bg;
  holent_err err;
  holent_gw_nargs (GW, nlhs, 5, nrhs, 5, 5);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  unpack_bg (prhs[2], fn, &bg);
  if (bg.kind != HOLENT_BCFT_TFD)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                     "must be a two-sided background, ads3_background "
                     "(\"bcft_tfd\", \"half_line\", ...)");
  const mxArray *R = prhs[3];
  if (mxIsCell (R))
    holent_gw_raise (fn, HOLENT_ETYPE, "R", HOLENT_NOINDEX,
                     "must be a real n x 2 matrix of [start, end] rows");
  size_t n, nt;
  holent_gw_regions (R, fn, "R", &n);
  const double *t = holent_gw_real (prhs[4], fn, "T", &nt);
  holent_bcft_workspace *ws = ws_alloc (fn, "R", n);
  const holent_poll *poll = holent_gw_poll (fn);
  holent_bcft_page pg;
  const double *p = mxGetPr (R);
  if (holent_bcft_page_prepare (ws, &bg, n, p, p + n, &pg, &err, poll))
    region_raise (fn, "R", R, 0, ws, &err);
  holent_gw_poll_end ();
  mxArray *out[4];
  for (int k = 0; k < 4; k++)
    out[k] = holent_gw_like (prhs[4]);
  if (holent_bcft_page_eval (ws, &bg, nt, t, mxGetPr (out[0]),
                             mxGetPr (out[1]), mxGetPr (out[2]),
                             mxGetPr (out[3]), &err))
    {
      for (int k = 0; k < 4; k++)
        mxDestroyArray (out[k]);
      holent_bcft_workspace_free (ws);
      holent_gw_raise (fn, err.status, "T", err.index, "%s", err.reason);
    }
  static const char *inf[] = { "page_time", "S_island", "island",
                               "island_endpoints", "island_pairs",
                               "n_short" };
  mxArray *info = mxCreateStructMatrix (1, 1, 6, inf);
  mxSetField (info, 0, "page_time", mxCreateDoubleScalar (pg.page_time));
  mxSetField (info, 0, "S_island", mxCreateDoubleScalar (pg.S_island));
  mxSetField (info, 0, "island", holent_gw_columns (pg.n_island, pg.island_x,
                                                     pg.island_z));
  mxSetField (info, 0, "island_endpoints",
              holent_gw_column (pg.n_island, pg.island_pt));
  mxSetField (info, 0, "island_pairs", island_pairs (&pg));
  mxSetField (info, 0, "n_short", mxCreateDoubleScalar ((double) pg.n_short));
  holent_bcft_workspace_free (ws);
  int nout = nlhs > 1 ? nlhs : 1;   /* plhs has room for nout only */
  for (int k = 0; k < 4; k++)
    if (k < nout)
      plhs[k] = out[k];
    else
      mxDestroyArray (out[k]);
  if (nout > 4)
    plhs[4] = info;
  else
    mxDestroyArray (info);
}

static void
do_profile (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char fn[64];
  holent_bcft_bg bg;
  holent_gw_nargs (GW, nlhs, 1, nrhs, 5, 5);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  unpack_bg (prhs[2], fn, &bg);
  size_t nz;
  const double *z = holent_gw_real (prhs[3], fn, "Z", &nz);
  double e = holent_gw_scalar (prhs[4], fn, "END");
  if (e != 0.0 && e != 1.0)
    holent_gw_raise (fn, HOLENT_EDOM, "END", HOLENT_NOINDEX,
                     "must be 0 or 1");
  if (e == 1.0 && bg.kind != HOLENT_BCFT_INTERVAL)
    holent_gw_raise (fn, HOLENT_EDOM, "END", HOLENT_NOINDEX,
                     "1 needs an interval background (a half line has one "
                     "brane)");
  plhs[0] = holent_gw_like (prhs[3]);
  double *x = mxGetPr (plhs[0]);
  for (size_t i = 0; i < nz; i++)
    if (holent_bcft_brane_x (&bg, (int) e, z[i], x + i))
      x[i] = NAN;
}

/* ---- "surface": the configuration as curves (rt_surface) ----------- */

static const char *surf_fields[] = {
  "picture", "curves", "S", "pairs", "horizon", "endpoints", "intervals",
  "brane", "brane_curves", "horizon_curve", "horizon_depth", "times",
  "sides"
};
#define N_SURF (sizeof surf_fields / sizeof surf_fields[0])

static mxArray *
curve_out (const holent_curve *c)
{
  return holent_gw_columns (c->n, c->x, c->y);
}

/* Curves of one configuration: NP pairs (2 NP coordinates, or indices
   into PTS when PTS is not NULL), NB brane endings from XB at ends BEND.
   Returns 0 or a core status (the surface workspace is the caller's).  */
static int
surf_curves (holent_surface_workspace *sw, const holent_bcft_bg *bg,
             size_t np, const size_t *pi, const double *pc, const double *pts,
             size_t nb, const double *xb, const int *bend, double tol,
             mxArray **out, double *zdeep)
{
  mxArray *cell = mxCreateCellMatrix (1, np + nb);
  *zdeep = 0.0;
  for (size_t i = 0; i < np + nb; i++)
    {
      int st;
      if (i < np)
        {
          double a = pts ? pts[pi[2 * i]] : pc[2 * i];
          double b = pts ? pts[pi[2 * i + 1]] : pc[2 * i + 1];
          st = holent_surface_geodesic (sw, &bg->geo, a < b ? a : b,
                                        a < b ? b : a, tol);
        }
      else
        st = holent_surface_bcft_brane_geodesic (sw, bg, xb[i - np],
                                                 bend ? bend[i - np] : 0, tol);
      if (st)
        {
          mxDestroyArray (cell);
          return st;
        }
      for (size_t q = 0; q < sw->cur.n; q++)
        if (sw->cur.y[q] > *zdeep)
          *zdeep = sw->cur.y[q];
      mxSetCell (cell, i, curve_out (&sw->cur));
    }
  *out = cell;
  return HOLENT_SUCCESS;
}

/* The branes of the picture, down to 1.5 times the deepest point.  */
static int
surf_branes (holent_surface_workspace *sw, const holent_bcft_bg *bg,
             double zdeep, double xscale, double tol, mxArray **out)
{
  int two = bg->kind == HOLENT_BCFT_INTERVAL && bg->btz;
  double zmax = 1.5 * (zdeep > xscale ? zdeep : xscale);
  mxArray *cell = mxCreateCellMatrix (1, two ? 2 : 1);
  for (int e = 0; e <= two; e++)
    {
      int st = holent_surface_bcft_brane (sw, bg, e, zmax, tol);
      if (st)
        {
          mxDestroyArray (cell);
          return st;
        }
      mxSetCell (cell, (size_t) e, curve_out (&sw->cur));
    }
  *out = cell;
  return HOLENT_SUCCESS;
}

/* The regions of A (named NAME), the workspaces for the largest and the
   output struct (one per region).  */
static size_t
surface_begin (const char *fn, const char *name, const mxArray *A,
               holent_bcft_workspace **ws, holent_surface_workspace **sw,
               mxArray **surf)
{
  size_t maxrows, nreg = holent_gw_regions (A, fn, name, &maxrows);
  *ws = ws_alloc (fn, name, maxrows);
  *sw = holent_surface_workspace_alloc ();
  if (*sw == NULL)
    {
      holent_bcft_workspace_free (*ws);
      holent_gw_raise (fn, HOLENT_ENOMEM, NULL, HOLENT_NOINDEX, NULL);
    }
  *surf = holent_gw_per_region_struct (A, N_SURF, surf_fields);
  return nreg;
}

/* ---- "surface" of a two-sided background at the time T ----------- */

/* The geodesic k of a page configuration from endpoint i of side si to
   endpoint j of side sj (0 left, 1 right) at time t, and its 1-based
   indices into [pts; pts] in row k of PP (np rows).  */
static int
page_pair (holent_surface_workspace *sw, const holent_bcft_bg *bg,
           const holent_bcft_result *r, size_t i, int si, size_t j, int sj,
           double t, double tol, double *pp, size_t np, size_t k)
{
  pp[k] = (double) (i + (size_t) si * r->m + 1);
  pp[k + np] = (double) (j + (size_t) sj * r->m + 1);
  return holent_surface_tfd (sw, &bg->tfd, r->pts[i], t, si, r->pts[j], t,
                             sj, 0.0, tol);
}

/* The configuration r of one side at time t and its mirror as Kruskal
   curves: pairs within the left side, within the right side, through the
   bridge (a left point to the same point on the right), then the brane
   endings of the left and of the right side.  *CELL and *PAIRS (1-based
   into [pts; pts]); returns 0 or the status of the curve *BAD.  */
static int
page_curves (holent_surface_workspace *sw, const holent_bcft_bg *bg,
             const holent_bcft_result *r, double t, double tol,
             mxArray **cell, mxArray **pairs, size_t *bad)
{
  size_t n2 = 2 * r->npairs, np = n2 + r->nbridge, nb = r->nbrane;
  *cell = mxCreateCellMatrix (1, np + 2 * nb);
  *pairs = mxCreateDoubleMatrix (np, 2, mxREAL);
  double *pp = mxGetPr (*pairs);
  for (size_t k = 0; k < np + 2 * nb; k++)
    {
      int st;
      if (k < n2)
        {
          const size_t *pq = r->pairs + 2 * (k % r->npairs);
          int side = k >= r->npairs;
          st = page_pair (sw, bg, r, pq[0], side, pq[1], side, t, tol, pp,
                          np, k);
        }
      else if (k < np)
        {
          size_t i = r->bridge[k - n2];
          st = page_pair (sw, bg, r, i, 0, i, 1, t, tol, pp, np, k);
        }
      else
        st = holent_surface_bcft_tfd_brane (sw, bg,
                                            r->pts[r->brane[(k - np) % nb]],
                                            t, k - np >= nb, tol);
      if (st)
        {
          *bad = k;
          return st;
        }
      mxSetCell (*cell, k, holent_gw_columns3 (sw->cur.n, sw->cur.x,
                                               sw->cur.y, sw->cur.t));
    }
  return HOLENT_SUCCESS;
}

/* The brane endings of both sides (the right ones mirror the left).  */
static mxArray *
page_branes (const holent_bcft_result *r)
{
  static const char *bf[] = { "endpoint", "x", "end", "landing" };
  size_t nb = r->nbrane;
  mxArray *br = mxCreateStructMatrix (1, 1, 4, bf);
  mxArray *be = mxCreateDoubleMatrix (2 * nb, 1, mxREAL);
  mxArray *bx = mxCreateDoubleMatrix (2 * nb, 1, mxREAL);
  mxArray *bl = mxCreateDoubleMatrix (2 * nb, 2, mxREAL);
  for (size_t i = 0; i < 2 * nb; i++)
    {
      size_t q = i % nb;
      mxGetPr (be)[i] = (double) (r->brane[q] + (i >= nb) * r->m + 1);
      mxGetPr (bx)[i] = r->pts[r->brane[q]];
      mxGetPr (bl)[i] = r->brane_x[q];
      mxGetPr (bl)[i + 2 * nb] = r->brane_z[q];
    }
  mxSetField (br, 0, "endpoint", be);
  mxSetField (br, 0, "x", bx);
  mxSetField (br, 0, "end", mxCreateDoubleMatrix (2 * nb, 1, mxREAL));
  mxSetField (br, 0, "landing", bl);
  return br;
}

static void
surface_page (const char *fn, mxArray *plhs[], const holent_bcft_bg *bg,
              const mxArray *A, double tol, int runner, double t)
{
  holent_err err;
  if (!isfinite (t))
    holent_gw_raise (fn, isnan (t) ? HOLENT_ENAN : HOLENT_EDOM, "t",
                     HOLENT_NOINDEX, "must be finite");
  holent_bcft_workspace *ws;
  holent_surface_workspace *sw;
  mxArray *surf;
  size_t nreg = surface_begin (fn, "A", A, &ws, &sw, &surf);
  const holent_poll *poll = holent_gw_poll (fn);
  for (size_t k = 0; k < nreg; k++)
    {
      const mxArray *a = holent_gw_region (A, k);
      size_t n = mxGetM (a), bad = 0;
      const double *p = mxGetPr (a);
      holent_bcft_page pg;
      holent_bcft_result r;
      mxArray *curves = NULL, *pairs = NULL;
      int st = holent_bcft_page_prepare (ws, bg, n, p, p + n, &pg, &err,
                                         poll);
      if (st)
        {
          holent_surface_workspace_free (sw);
          mxDestroyArray (surf);
          region_raise (fn, "A", A, k, ws, &err);
        }
      if ((st = holent_bcft_page_configuration (ws, bg, t, runner, &r, &err)))
        {
          holent_surface_workspace_free (sw);
          holent_bcft_workspace_free (ws);
          mxDestroyArray (surf);
          static const char *const tname[] = { "t" };
          holent_gw_raise_err (fn, &err, tname, 1);
        }
      st = page_curves (sw, bg, &r, t, tol, &curves, &pairs, &bad);
      if (st)
        {
          mxDestroyArray (curves);
          mxDestroyArray (pairs);
          mxDestroyArray (surf);
          holent_surface_workspace_free (sw);
          holent_bcft_workspace_free (ws);
          if (st == HOLENT_ETOOBIG || st == HOLENT_ERANGE)
            holent_gw_raise (fn, st, "t", HOLENT_NOINDEX, "must be nearer 0 "
                             "for the Kruskal picture, whose coordinates "
                             "grow like cosh(2 pi t/beta) (got %g; or take "
                             "a larger tol)", t);
          holent_gw_raise (fn, st, "geodesic", bad, NULL);
        }
      size_t m = r.m;
      mxArray *pts = mxCreateDoubleMatrix (2 * m, 1, mxREAL);
      mxArray *tp = mxCreateDoubleMatrix (2 * m, 1, mxREAL);
      mxArray *sd = mxCreateDoubleMatrix (2 * m, 1, mxREAL);
      for (size_t i = 0; i < 2 * m; i++)
        {
          mxGetPr (pts)[i] = r.pts[i % m];
          mxGetPr (tp)[i] = t;
          mxGetPr (sd)[i] = i >= m;
        }
      mxSetField (surf, k, "picture", mxCreateString ("kruskal"));
      mxSetField (surf, k, "curves", curves);
      mxSetField (surf, k, "S", mxCreateDoubleScalar (r.S));
      mxSetField (surf, k, "pairs", pairs);
      mxSetField (surf, k, "horizon", mxCreateLogicalScalar (0));
      mxSetField (surf, k, "endpoints", pts);
      mxSetField (surf, k, "times", tp);
      mxSetField (surf, k, "sides", sd);
      mxSetField (surf, k, "intervals", holent_gw_columns (n, p, p + n));
      mxSetField (surf, k, "brane", page_branes (&r));
      mxSetField (surf, k, "brane_curves", mxCreateCellMatrix (1, 0));
      mxSetField (surf, k, "horizon_curve", mxCreateDoubleMatrix (0, 3,
                                                                  mxREAL));
      mxSetField (surf, k, "horizon_depth", mxCreateDoubleScalar (NAN));
    }
  holent_gw_poll_end ();
  holent_surface_workspace_free (sw);
  holent_bcft_workspace_free (ws);
  plhs[0] = surf;
}

static void
do_surface (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char fn[64];
  holent_bcft_bg bg;
  holent_err err;
  holent_gw_nargs (GW, nlhs, 1, nrhs, 5, 7);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  unpack_bg (prhs[2], fn, &bg);
  const mxArray *A = prhs[3];
  double tol = holent_gw_scalar (prhs[4], fn, "tol");
  int runner = nrhs > 5 && holent_gw_scalar (prhs[5], fn, "RUNNER") != 0.0;
  int tfd = bg.kind == HOLENT_BCFT_TFD;
  if (nrhs > 6)
    {
      if (!tfd)
        holent_gw_raise (fn, HOLENT_EOPTION, "t", HOLENT_NOINDEX,
                         "applies to the two-sided \"bcft_tfd\" background "
                         "only (a one-sided BCFT background is static)");
      surface_page (fn, plhs, &bg, A, tol, runner,
                    holent_gw_scalar (prhs[6], fn, "t"));
      return;
    }
  if (runner && tfd)
    holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                     "configuration \"runner_up\" on a two-sided "
                     "\"bcft_tfd\" background needs the boundary time 't' "
                     "(without it the surface is the late-time island "
                     "configuration)");
  const char *name = "A";   /* rt_surface's argument, also on "bcft_tfd" */
  holent_bcft_workspace *ws;
  holent_surface_workspace *sw;
  mxArray *surf;
  size_t nreg = surface_begin (fn, name, A, &ws, &sw, &surf);
  const holent_poll *poll = holent_gw_poll (fn);
  int disk = holent_surface_bcft_picture (&bg);
  for (size_t k = 0; k < nreg; k++)
    {
      const mxArray *a = holent_gw_region (A, k);
      size_t n = mxGetM (a);
      const double *p = mxGetPr (a);
      holent_bcft_result r;
      holent_bcft_page pg;
      mxArray *curves = NULL, *branes = NULL;
      double zdeep, xscale = 0.0;
      int st = tfd ? holent_bcft_page_prepare (ws, &bg, n, p, p + n, &pg,
                                               &err, poll)
                   : holent_bcft_entropy (ws, &bg, n, p, p + n, &r, &err,
                                          poll);
      if (st)
        {
          holent_surface_workspace_free (sw);
          mxDestroyArray (surf);
          region_raise (fn, name, A, k, ws, &err);
        }
      if (runner && (st = holent_bcft_runner_up (ws, &bg, &r)))
        {
          holent_surface_workspace_free (sw);
          holent_bcft_workspace_free (ws);
          mxDestroyArray (surf);
          if (st == HOLENT_EDOM)
            holent_gw_raise (fn, st, NULL, HOLENT_NOINDEX, "the region has a "
                             "single RT candidate: there is no runner-up");
          holent_gw_raise (fn, st, name, k, "the runner-up is available for "
                           "at most %zu endpoints",
                           (size_t) HOLENT_BCFT_RUNNER_MMAX);
        }
      if (tfd)
        {
          /* the island configuration: pairs within a side, brane ends */
          memset (&r, 0, sizeof r);
          st = surf_curves (sw, &bg, pg.n_island_pairs, NULL,
                            pg.island_pairs, NULL, pg.n_island, pg.island_pt,
                            NULL, tol, &curves, &zdeep);
          mxArray *br = mxCreateStructMatrix (1, 1, 4, (const char *[]) {
                                                "endpoint", "x", "end",
                                                "landing" });
          mxSetField (br, 0, "x", holent_gw_column (pg.n_island,
                                                    pg.island_pt));
          mxSetField (br, 0, "end", mxCreateDoubleMatrix (pg.n_island, 1,
                                                          mxREAL));
          mxSetField (br, 0, "landing", holent_gw_columns (pg.n_island,
                                                            pg.island_x,
                                                            pg.island_z));
          mxSetField (br, 0, "endpoint", mxCreateDoubleMatrix (0, 1, mxREAL));
          mxSetField (surf, k, "brane", br);
          mxSetField (surf, k, "pairs", island_pairs (&pg));
          mxSetField (surf, k, "S", mxCreateDoubleScalar (pg.S_island));
          mxSetField (surf, k, "endpoints", mxCreateDoubleMatrix (0, 1,
                                                                  mxREAL));
        }
      else
        {
          double *bxs = mxMalloc ((r.nbrane + 1) * sizeof *bxs);
          for (size_t i = 0; i < r.nbrane; i++)
            bxs[i] = r.pts[r.brane[i]];
          st = surf_curves (sw, &bg, r.npairs, r.pairs, NULL, r.pts,
                            r.nbrane, bxs, r.brane_end, tol, &curves,
                            &zdeep);
          mxFree (bxs);
          mxSetField (surf, k, "brane", brane_struct (&r, &bg));
          mxSetField (surf, k, "pairs", holent_gw_pairs (r.npairs, r.pairs,
                                                         r.pts, NULL));
          mxSetField (surf, k, "S", mxCreateDoubleScalar (r.S));
          mxSetField (surf, k, "endpoints", holent_gw_column (r.m, r.pts));
        }
      for (size_t i = 0; i < n; i++)   /* the region's own scale */
        for (size_t j = 0; j < 2; j++)
          if (isfinite (p[i + j * n]) && fabs (p[i + j * n]) > xscale)
            xscale = fabs (p[i + j * n]);
      if (!st)
        st = surf_branes (sw, &bg, zdeep, xscale, tol, &branes);
      mxArray *hc = mxCreateDoubleMatrix (0, 2, mxREAL);
      double depth = NAN;
      if (!st && bg.btz && !disk)
        {
          /* the horizon between the branes (one brane: to the region) */
          double x0, x1 = isfinite (bg.length) ? bg.length : xscale;
          (void) holent_bcft_brane_x (&bg, 0, bg.zh * bg.ell, &x0);
          if (isfinite (bg.length))
            (void) holent_bcft_brane_x (&bg, 1, bg.zh * bg.ell, &x1);
          st = holent_surface_horizon (sw, &bg.geo, x0 / bg.ell,
                                       isfinite (bg.length) ? x1 / bg.ell
                                                            : 1.5 * x1,
                                       tol, &depth);
          if (!st && r.horizon)
            {
              mxDestroyArray (hc);
              hc = curve_out (&sw->cur);
            }
        }
      if (st)
        {
          if (curves)
            mxDestroyArray (curves);
          if (branes)
            mxDestroyArray (branes);
          mxDestroyArray (hc);
          mxDestroyArray (surf);
          holent_surface_workspace_free (sw);
          holent_bcft_workspace_free (ws);
          holent_gw_raise (fn, st, "tol", HOLENT_NOINDEX, NULL);
        }
      mxSetField (surf, k, "picture",
                  mxCreateString (disk ? "disk" : "half_plane"));
      mxSetField (surf, k, "curves", curves);
      mxSetField (surf, k, "horizon", mxCreateLogicalScalar (r.horizon != 0));
      mxSetField (surf, k, "intervals", tfd ? holent_gw_columns (n, p, p + n)
                                            : holent_gw_columns (r.n, r.start,
                                                                 r.end));
      mxSetField (surf, k, "brane_curves", branes);
      mxSetField (surf, k, "horizon_curve", hc);
      mxSetField (surf, k, "horizon_depth", mxCreateDoubleScalar (depth));
    }
  holent_gw_poll_end ();
  holent_surface_workspace_free (sw);
  holent_bcft_workspace_free (ws);
  plhs[0] = surf;
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16];
  holent_gw_init ();
  holent_gw_nargs (GW, nlhs, 5, nrhs, 2, 4 + 2 * (int) N_OPTS);
  holent_gw_string (prhs[0], GW, "MODE", mode, sizeof mode);
  if (strcmp (mode, "bg") == 0)
    do_bg (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "entropy") == 0)
    do_entropy (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "check") == 0)
    do_check (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "page") == 0)
    do_page (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "profile") == 0)
    do_profile (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "surface") == 0)
    do_surface (nlhs, plhs, nrhs, prhs);
  else
    holent_gw_raise (GW, HOLENT_EOPTION, "MODE", HOLENT_NOINDEX,
                     "unknown mode '%s'", mode);
}
