/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Gateway of holent_bcft: BCFT backgrounds with end-of-the-world branes.
 *
 *   INFO = __holent_bcft__ ("bg", FN, STATE, BOUNDARY, LENGTH, EPS, BETA,
 *                           VALS, IS_LOG_G, C, ELL, SADDLE)
 *       check the parameters once, in the core, and return the derived
 *       ones (saddle, btz, beta_c, S_H, tension, log_g, rho, zh, z0).
 *   OK = __holent_bcft__ ("bgcheck", FN, BG)        raise unless BG is valid
 *   [S, NSHORT, CONF] = __holent_bcft__ ("entropy", FN, NAME, BG, A)
 *       A an n x 2 matrix or a cell of them (as __holent_rt__).
 *   [STATUS, ROW1, ROW2] = __holent_bcft__ ("check", BG, A)   disjointness
 *   [S, KB, NB, SNO, INFO] = __holent_bcft__ ("page", FN, BG, R, T)
 *   X = __holent_bcft__ ("profile", FN, BG, Z, END)  (NaN where no brane)
 * Unpack, call the core, pack; no physics.  */
#include <stdio.h>
#include <string.h>
#include <math.h>
#include "holent_gw.h"
#include "core/holent_bcft.h"
#include "core/holent_region.h"

static const char GW[] = "__holent_bcft__";

typedef struct
{
  holent_bcft_workspace *ws;
  holent_region *reg;
  char id[32];
  char msg[512];
} gw_state;

static void
gw_raise (gw_state *g)
{
  holent_bcft_workspace_free (g->ws);
  holent_region_free (g->reg);
  g->ws = NULL;
  g->reg = NULL;
  mexErrMsgIdAndTxt (g->id, "%s", g->msg);
}

static const mxArray *
field (const mxArray *s, const char *fn, const char *name)
{
  const mxArray *f = mxGetField (s, 0, name);
  if (f == NULL)
    mexErrMsgIdAndTxt ("holent:background", "%s: BG is missing field '%s': "
                       "make it with ads3_background", fn, name);
  return f;
}

static holent_bcft_kind
kind_of (const char *fn, const char *state, const char *boundary)
{
  if (strcmp (state, "bcft_tfd") == 0 && strcmp (boundary, "half_line") == 0)
    return HOLENT_BCFT_TFD;
  if (strcmp (state, "bcft") == 0 && strcmp (boundary, "half_line") == 0)
    return HOLENT_BCFT_HALF_LINE;
  if (strcmp (state, "bcft") == 0 && strcmp (boundary, "interval") == 0)
    return HOLENT_BCFT_INTERVAL;
  mexErrMsgIdAndTxt ("holent:background", "%s: no BCFT background '%s' on "
                     "a '%s'", fn, state, boundary);
  return HOLENT_BCFT_HALF_LINE;
}

static holent_bcft_saddle
saddle_of (const char *fn, const char *s)
{
  if (s[0] == 0 || strcmp (s, "dominant") == 0)
    return HOLENT_BCFT_DOMINANT;
  if (strcmp (s, "btz") == 0)
    return HOLENT_BCFT_BTZ;
  if (strcmp (s, "thermal_ads") == 0)
    return HOLENT_BCFT_THERMAL_ADS;
  mexErrMsgIdAndTxt ("holent:option", "%s: saddle must be 'dominant', 'btz' "
                     "or 'thermal_ads', got '%s'", fn, s);
  return HOLENT_BCFT_DOMINANT;
}

/* Report a failed holent_bcft_bg_init.  */
static void
init_fail (const char *fn, int st, int bad, holent_bcft_kind kind,
           const char *tname)
{
  const char *id = st == HOLENT_EUNSUP ? "holent:unsupported"
                   : st == HOLENT_EINVAL ? "holent:nan" : "holent:domain";
  switch (bad)
    {
    case 0:
      mexErrMsgIdAndTxt (id, "%s: 'length' must be a finite positive "
                         "interval length", fn);
      break;
    case 1:
      mexErrMsgIdAndTxt (id, "%s: 'cutoff' must be finite and positive", fn);
      break;
    case 2:
      if (kind == HOLENT_BCFT_TFD)
        mexErrMsgIdAndTxt (id, "%s: the two-sided geometry needs a finite "
                           "positive 'beta' (or 'T')", fn);
      mexErrMsgIdAndTxt (id, "%s: 'beta' must be positive (Inf: zero "
                         "temperature; the BTZ saddle needs it finite)", fn);
      break;
    case 3:
      if (kind == HOLENT_BCFT_TFD)
        mexErrMsgIdAndTxt (id, "%s: '%s' must give a tension in [0, 1/ell) "
                           "for the two-sided geometry (a negative-tension "
                           "brane is crossed by the geodesics through the "
                           "Einstein-Rosen bridge)", fn, tname);
      mexErrMsgIdAndTxt (id, "%s: '%s' must give |T| < 1/ell at each end "
                         "(and, in a forced BTZ saddle, branes that do not "
                         "meet: length + (beta/2pi)(rho0 + rho1) > 0)", fn,
                         tname);
      break;
    case 4:
      if (st == HOLENT_EUNSUP)
        mexErrMsgIdAndTxt (id, "%s: unequal tensions at the two ends need "
                           "the BTZ saddle (finite beta): the thermal AdS "
                           "saddle has one connected brane of one tension",
                           fn);
      mexErrMsgIdAndTxt (id, "%s: '%s' must give |T| < 1/ell at each end", fn,
                         tname);
      break;
    case 5:
      mexErrMsgIdAndTxt (id, "%s: 'c' must be finite and positive", fn);
      break;
    default:
      mexErrMsgIdAndTxt ("holent:invalid", "%s: %s", fn, holent_strerror (st));
    }
}

/* The background of a BG struct, checked by the core.  */
static void
unpack_bg (const mxArray *s, const char *fn, holent_bcft_bg *bg, double *ell)
{
  char state[16], boundary[16], saddle[16];
  if (s == NULL || !mxIsStruct (s) || mxGetNumberOfElements (s) != 1)
    mexErrMsgIdAndTxt ("holent:background", "%s: BG must be a scalar struct "
                       "from ads3_background", fn);
  holent_gw_string (field (s, fn, "state"), fn, "BG.state", state,
                    sizeof state);
  holent_gw_string (field (s, fn, "boundary"), fn, "BG.boundary", boundary,
                    sizeof boundary);
  holent_gw_string (field (s, fn, "saddle"), fn, "BG.saddle", saddle,
                    sizeof saddle);
  holent_bcft_kind kind = kind_of (fn, state, boundary);
  size_t nt;
  const double *T = holent_gw_real (field (s, fn, "tension"), fn,
                                    "BG.tension", &nt);
  *ell = holent_gw_scalar (field (s, fn, "ell"), fn, "BG.ell");
  if (nt != 2 || !(*ell > 0.0 && isfinite (*ell)))
    mexErrMsgIdAndTxt ("holent:background", "%s: BG.tension must hold two "
                       "values and BG.ell be positive", fn);
  int bad;
  int st = holent_bcft_bg_init (
      bg, kind, holent_gw_scalar (field (s, fn, "length"), fn, "BG.length"),
      holent_gw_scalar (field (s, fn, "cutoff"), fn, "BG.cutoff"),
      holent_gw_scalar (field (s, fn, "beta"), fn, "BG.beta"),
      T[0] * *ell, T[1] * *ell,
      holent_gw_scalar (field (s, fn, "c"), fn, "BG.c"),
      saddle_of (fn, saddle), &bad);
  if (st)
    mexErrMsgIdAndTxt ("holent:background", "%s: BG has inconsistent "
                       "parameters (%s)", fn, holent_strerror (st));
}

static mxArray *
row2 (double a, double b)
{
  mxArray *r = mxCreateDoubleMatrix (1, 2, mxREAL);
  mxGetPr (r)[0] = a;
  mxGetPr (r)[1] = b;
  return r;
}

static void
do_bg (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char fn[64], state[16], boundary[16], saddle[16];
  holent_gw_nargs (GW, nlhs, 1, nrhs, 12, 12);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  holent_gw_string (prhs[2], fn, "STATE", state, sizeof state);
  holent_gw_string (prhs[3], fn, "BOUNDARY", boundary, sizeof boundary);
  holent_bcft_kind kind = kind_of (fn, state, boundary);
  double length = holent_gw_scalar (prhs[4], fn, "length");
  double eps = holent_gw_scalar (prhs[5], fn, "cutoff");
  double beta = holent_gw_scalar (prhs[6], fn, "beta");
  size_t nv;
  const double *v = holent_gw_real (prhs[7], fn, "tension", &nv);
  int is_g = mxIsLogicalScalarTrue (prhs[8]);
  double c = holent_gw_scalar (prhs[9], fn, "c");
  double ell = holent_gw_scalar (prhs[10], fn, "ell");
  holent_gw_string (prhs[11], fn, "saddle", saddle, sizeof saddle);
  const char *tname = is_g ? "log_g" : "tension";
  size_t want = kind == HOLENT_BCFT_INTERVAL ? 2 : 1;
  if (nv != 1 && nv != want)
    mexErrMsgIdAndTxt ("holent:size", "%s: '%s' must be %s", fn, tname,
                       want == 2 ? "a scalar or one value per end (1 x 2)"
                                 : "a scalar");
  double T[2];
  for (int k = 0; k < 2; k++)
    {
      double x = v[nv == 1 ? 0 : k];
      if (isnan (x))
        mexErrMsgIdAndTxt ("holent:nan", "%s: '%s' must not be NaN", fn,
                           tname);
      if (is_g)
        {
          int st = holent_bcft_tension_of_log_g (x, c, T + k);
          if (st)
            mexErrMsgIdAndTxt ("holent:domain", "%s: 'log_g' = %g is beyond "
                               "double precision (|T ell| rounds to 1) or c "
                               "is not positive", fn, x);
        }
      else
        T[k] = x * ell;
    }
  holent_bcft_bg bg;
  int bad;
  int st = holent_bcft_bg_init (&bg, kind, length, eps, beta, T[0], T[1], c,
                                saddle_of (fn, saddle), &bad);
  if (st)
    init_fail (fn, st, bad, kind, tname);
  static const char *names[] = {
    "saddle", "btz", "beta_c", "S_H", "tension", "log_g", "rho", "zh", "z0"
  };
  mxArray *s = mxCreateStructMatrix (1, 1, 9, names);
  const char *sad = kind == HOLENT_BCFT_INTERVAL
                    ? (bg.btz ? "btz" : "thermal_ads") : (bg.btz ? "btz" : "");
  mxSetField (s, 0, "saddle", mxCreateString (sad));
  mxSetField (s, 0, "btz", mxCreateLogicalScalar (bg.btz != 0));
  mxSetField (s, 0, "beta_c", mxCreateDoubleScalar (bg.beta_c));
  mxSetField (s, 0, "S_H", mxCreateDoubleScalar (bg.S_H));
  mxSetField (s, 0, "tension", row2 (bg.T[0] / ell, bg.T[1] / ell));
  mxSetField (s, 0, "log_g", row2 (bg.log_g[0], bg.log_g[1]));
  mxSetField (s, 0, "rho", row2 (bg.rho[0], bg.rho[1]));
  mxSetField (s, 0, "zh", mxCreateDoubleScalar (bg.zh));
  mxSetField (s, 0, "z0", mxCreateDoubleScalar (bg.z0));
  plhs[0] = s;
}

static void
region_name (char *buf, size_t sz, const char *name, int is_cell, size_t k)
{
  if (is_cell)
    snprintf (buf, sz, "%s{%zu}", name, k + 1);
  else
    snprintf (buf, sz, "%s", name);
}

/* Type and shape of one region; 0 with the message set if wrong.  */
static int
region_ok (gw_state *g, const mxArray *a, const char *fn, const char *nm,
           int allow_inf)
{
  if (a == NULL || !mxIsDouble (a) || mxIsComplex (a) || mxIsSparse (a)
      || mxGetNumberOfDimensions (a) != 2 || (mxGetM (a) > 0 && mxGetN (a) != 2))
    {
      snprintf (g->id, sizeof g->id, "holent:type");
      snprintf (g->msg, sizeof g->msg, "%s: %s must be a real n x 2 matrix "
                "of [start, end] rows", fn, nm);
      return 0;
    }
  if (mxGetM (a) == 0)
    {
      snprintf (g->id, sizeof g->id, "holent:empty");
      snprintf (g->msg, sizeof g->msg, "%s: %s has no intervals", fn, nm);
      return 0;
    }
  const double *p = mxGetPr (a);
  size_t n = mxGetM (a);
  for (size_t i = 0; i < 2 * n; i++)
    if (isnan (p[i]) || (isinf (p[i]) && !(allow_inf && i >= n && p[i] > 0)))
      {
        snprintf (g->id, sizeof g->id, isnan (p[i]) ? "holent:nan"
                                                    : "holent:domain");
        snprintf (g->msg, sizeof g->msg, "%s: %s(%zu,%zu) must be %s", fn, nm,
                  i % n + 1, i / n + 1, isnan (p[i]) ? "a number, not NaN"
                  : (allow_inf ? "finite (only an end may be Inf)" : "finite"));
        return 0;
      }
  return 1;
}

static void
region_fail (gw_state *g, int st, size_t bad, const char *fn, const char *nm,
             const holent_bcft_bg *bg)
{
  const char *id = "holent:invalid";
  char what[200];
  snprintf (what, sizeof what, "%s", holent_strerror (st));
  switch (st)
    {
    case HOLENT_EDOM:
      id = "holent:domain";
      if (bg->kind == HOLENT_BCFT_TFD)
        snprintf (what, sizeof what, "must lie on x > 0 (a radiation "
                  "region may not touch the boundary x = 0 of the BCFT) "
                  "with start < end");
      else if (bg->kind == HOLENT_BCFT_INTERVAL)
        snprintf (what, sizeof what, "must lie in the BCFT's interval "
                  "[0, %g] with start < end", bg->length);
      else
        snprintf (what, sizeof what, "must lie on the half line x >= 0 "
                  "(not past its boundary) with start < end");
      break;
    case HOLENT_EOVERLAP:
      id = "holent:overlap";
      snprintf (what, sizeof what, "overlaps another row (intervals of a "
                "region must be disjoint; touching ones are merged)");
      break;
    case HOLENT_EEMPTY:
      id = "holent:empty";
      snprintf (what, sizeof what, "is a zero-length interval");
      break;
    case HOLENT_ETOOBIG:
      id = "holent:toobig";
      break;
    case HOLENT_EUNSUP:
      id = "holent:unsupported";
      snprintf (what, sizeof what, "is on the two-sided background: use "
                "page_curve for its radiation regions");
      break;
    default:
      break;
    }
  snprintf (g->id, sizeof g->id, "%s", id);
  if (bad != (size_t) -1)
    snprintf (g->msg, sizeof g->msg, "%s: row %zu of %s %s", fn, bad + 1, nm,
              what);
  else
    snprintf (g->msg, sizeof g->msg, "%s: %s %s", fn, nm, what);
}

static void
conf_entry (mxArray *conf, size_t k, const holent_bcft_result *r,
            const holent_bcft_bg *bg)
{
  size_t np = r->npairs, nb = r->nbrane, m = r->m;
  mxArray *pairs = mxCreateDoubleMatrix (np, 2, mxREAL);
  mxArray *coords = mxCreateDoubleMatrix (np, 2, mxREAL);
  for (size_t i = 0; i < np; i++)
    {
      mxGetPr (pairs)[i] = (double) r->pairs[2 * i] + 1.0;
      mxGetPr (pairs)[i + np] = (double) r->pairs[2 * i + 1] + 1.0;
      mxGetPr (coords)[i] = r->pts[r->pairs[2 * i]];
      mxGetPr (coords)[i + np] = r->pts[r->pairs[2 * i + 1]];
    }
  mxArray *ep = mxCreateDoubleMatrix (m, 1, mxREAL);
  if (m)
    memcpy (mxGetPr (ep), r->pts, m * sizeof (double));
  mxArray *iv = mxCreateDoubleMatrix (r->n, 2, mxREAL);
  for (size_t i = 0; i < r->n; i++)
    {
      mxGetPr (iv)[i] = r->start[i];
      mxGetPr (iv)[i + r->n] = r->end[i];
    }
  static const char *bf[] = { "endpoint", "x", "end", "landing" };
  mxArray *br = mxCreateStructMatrix (1, 1, 4, bf);
  mxArray *be = mxCreateDoubleMatrix (nb, 1, mxREAL);
  mxArray *bx = mxCreateDoubleMatrix (nb, 1, mxREAL);
  mxArray *bend = mxCreateDoubleMatrix (nb, 1, mxREAL);
  mxArray *land = mxCreateDoubleMatrix (nb, 2, mxREAL);
  for (size_t i = 0; i < nb; i++)
    {
      mxGetPr (be)[i] = (double) r->brane[i] + 1.0;
      mxGetPr (bx)[i] = r->pts[r->brane[i]];
      mxGetPr (bend)[i] = r->brane_end[i] ? bg->length : 0.0;
      mxGetPr (land)[i] = r->brane_x[i];
      mxGetPr (land)[i + nb] = r->brane_z[i];
    }
  mxSetField (br, 0, "endpoint", be);
  mxSetField (br, 0, "x", bx);
  mxSetField (br, 0, "end", bend);
  mxSetField (br, 0, "landing", land);
  mxSetField (conf, k, "pairs", pairs);
  mxSetField (conf, k, "pair_coords", coords);
  mxSetField (conf, k, "horizon", mxCreateLogicalScalar (r->horizon != 0));
  mxSetField (conf, k, "endpoints", ep);
  mxSetField (conf, k, "intervals", iv);
  mxSetField (conf, k, "length", mxCreateDoubleScalar (r->length));
  mxSetField (conf, k, "brane", br);
}

static void
do_entropy (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char fn[64], name[32], nm[64];
  holent_bcft_bg bg;
  double ell;
  gw_state g = { 0 };
  holent_gw_nargs (GW, nlhs, 3, nrhs, 5, 5);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  holent_gw_string (prhs[2], GW, "NAME", name, sizeof name);
  unpack_bg (prhs[3], fn, &bg, &ell);
  const mxArray *A = prhs[4];
  int is_cell = mxIsCell (A);
  size_t ncell = is_cell ? mxGetNumberOfElements (A) : 1, maxrows = 1;
  for (size_t k = 0; k < ncell; k++)
    {
      const mxArray *a = is_cell ? mxGetCell (A, k) : A;
      region_name (nm, sizeof nm, name, is_cell, k);
      if (!region_ok (&g, a, fn, nm, 0))
        gw_raise (&g);
      if (mxGetM (a) > maxrows)
        maxrows = mxGetM (a);
    }
  if (bg.kind == HOLENT_BCFT_TFD)
    {
      region_fail (&g, HOLENT_EUNSUP, (size_t) -1, fn, "BG", &bg);
      gw_raise (&g);
    }
  if (maxrows > HOLENT_BCFT_MMAX / 2)
    mexErrMsgIdAndTxt ("holent:toobig", "%s: %s has more than %zu rows", fn,
                       name, (size_t) HOLENT_BCFT_MMAX / 2);
  g.ws = holent_bcft_workspace_alloc (maxrows);
  if (g.ws == NULL)
    {
      snprintf (g.id, sizeof g.id, "holent:nomem");
      snprintf (g.msg, sizeof g.msg, "%s: out of memory", fn);
      gw_raise (&g);
    }
  static const char *cf[] = { "pairs", "pair_coords", "horizon", "endpoints",
                              "intervals", "length", "brane" };
  if (is_cell)
    plhs[0] = mxCreateNumericArray (mxGetNumberOfDimensions (A),
                                    mxGetDimensions (A), mxDOUBLE_CLASS,
                                    mxREAL);
  else
    plhs[0] = mxCreateDoubleScalar (0.0);
  mxArray *conf = NULL;
  if (nlhs > 2)
    {
      if (is_cell)
        conf = mxCreateStructArray (mxGetNumberOfDimensions (A),
                                    mxGetDimensions (A), 7, cf);
      else
        conf = mxCreateStructMatrix (1, 1, 7, cf);
      plhs[2] = conf;
    }
  double *S = mxGetPr (plhs[0]);
  size_t nshort = 0;
  for (size_t k = 0; k < ncell; k++)
    {
      const mxArray *a = is_cell ? mxGetCell (A, k) : A;
      size_t n = mxGetM (a), bad;
      const double *p = mxGetPr (a);
      holent_bcft_result r;
      int st = holent_bcft_entropy (g.ws, &bg, n, p, p + n, &r, &bad, NULL);
      if (st)
        {
          region_name (nm, sizeof nm, name, is_cell, k);
          region_fail (&g, st, bad, fn, nm, &bg);
          gw_raise (&g);
        }
      S[k] = r.S;
      nshort += r.n_short;
      if (conf)
        conf_entry (conf, k, &r, &bg);
    }
  holent_bcft_workspace_free (g.ws);
  if (nlhs > 1)
    plhs[1] = mxCreateDoubleScalar ((double) nshort);
}

static void
do_check (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  holent_bcft_bg bg;
  double ell;
  holent_gw_nargs (GW, nlhs, 3, nrhs, 3, 3);
  unpack_bg (prhs[1], GW, &bg, &ell);
  size_t n;
  const double *p = holent_gw_real (prhs[2], GW, "A", &n);
  if (mxGetNumberOfDimensions (prhs[2]) != 2 || (n > 0 && mxGetN (prhs[2]) != 2))
    {
      plhs[0] = mxCreateDoubleScalar ((double) HOLENT_EINVAL);
      if (nlhs > 1)
        plhs[1] = mxCreateDoubleScalar (0.0);
      if (nlhs > 2)
        plhs[2] = mxCreateDoubleScalar (0.0);
      return;
    }
  n = mxGetM (prhs[2]);
  holent_region *reg = holent_region_alloc (n ? n : 1);
  if (reg == NULL)
    mexErrMsgIdAndTxt ("holent:nomem", "out of memory");
  int st = holent_region_set (reg, 0, 0.0, n, p, p + n);
  double r1 = 0, r2 = 0;
  if (st == HOLENT_EOVERLAP)
    {
      r1 = (double) reg->bad[0] + 1.0;
      r2 = (double) reg->bad[1] + 1.0;
    }
  holent_region_free (reg);
  plhs[0] = mxCreateDoubleScalar ((double) st);
  if (nlhs > 1)
    plhs[1] = mxCreateDoubleScalar (r1);
  if (nlhs > 2)
    plhs[2] = mxCreateDoubleScalar (r2);
}

static void
do_page (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char fn[64];
  holent_bcft_bg bg;
  double ell;
  gw_state g = { 0 };
  holent_gw_nargs (GW, nlhs, 5, nrhs, 5, 5);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  unpack_bg (prhs[2], fn, &bg, &ell);
  if (bg.kind != HOLENT_BCFT_TFD)
    mexErrMsgIdAndTxt ("holent:background", "%s: BG must be a two-sided "
                       "background, ads3_background (\"bcft_tfd\", "
                       "\"half_line\", ...)", fn);
  const mxArray *R = prhs[3];
  if (!region_ok (&g, R, fn, "R", 1))
    gw_raise (&g);
  size_t nt;
  const double *t = holent_gw_real (prhs[4], fn, "T", &nt);
  size_t n = mxGetM (R), bad;
  if (n > HOLENT_BCFT_MMAX / 2)
    mexErrMsgIdAndTxt ("holent:toobig", "%s: R has more than %zu rows", fn,
                       (size_t) HOLENT_BCFT_MMAX / 2);
  g.ws = holent_bcft_workspace_alloc (n);
  if (g.ws == NULL)
    {
      snprintf (g.id, sizeof g.id, "holent:nomem");
      snprintf (g.msg, sizeof g.msg, "%s: out of memory", fn);
      gw_raise (&g);
    }
  holent_bcft_page pg;
  const double *p = mxGetPr (R);
  int st = holent_bcft_page_prepare (g.ws, &bg, n, p, p + n, &pg, &bad, NULL);
  if (st)
    {
      region_fail (&g, st, bad, fn, "R", &bg);
      gw_raise (&g);
    }
  mxArray *out[4];
  for (int k = 0; k < 4; k++)
    out[k] = holent_gw_like (prhs[4]);
  st = holent_bcft_page_eval (g.ws, &bg, nt, t, mxGetPr (out[0]),
                              mxGetPr (out[1]), mxGetPr (out[2]),
                              mxGetPr (out[3]), &bad);
  if (st)
    {
      for (int k = 0; k < 4; k++)
        mxDestroyArray (out[k]);
      snprintf (g.id, sizeof g.id, "holent:domain");
      snprintf (g.msg, sizeof g.msg, "%s: T(%zu) must be a finite time", fn,
                bad + 1);
      gw_raise (&g);
    }
  static const char *inf[] = { "page_time", "S_island", "island",
                               "island_endpoints", "n_short" };
  mxArray *info = mxCreateStructMatrix (1, 1, 5, inf);
  mxArray *isl = mxCreateDoubleMatrix (pg.n_island, 2, mxREAL);
  mxArray *iep = mxCreateDoubleMatrix (pg.n_island, 1, mxREAL);
  for (size_t i = 0; i < pg.n_island; i++)
    {
      mxGetPr (isl)[i] = pg.island_x[i];
      mxGetPr (isl)[i + pg.n_island] = pg.island_z[i];
      mxGetPr (iep)[i] = pg.island_pt[i];
    }
  mxSetField (info, 0, "page_time", mxCreateDoubleScalar (pg.page_time));
  mxSetField (info, 0, "S_island", mxCreateDoubleScalar (pg.S_island));
  mxSetField (info, 0, "island", isl);
  mxSetField (info, 0, "island_endpoints", iep);
  mxSetField (info, 0, "n_short", mxCreateDoubleScalar ((double) pg.n_short));
  holent_bcft_workspace_free (g.ws);
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
  double ell;
  holent_gw_nargs (GW, nlhs, 1, nrhs, 5, 5);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  unpack_bg (prhs[2], fn, &bg, &ell);
  size_t nz;
  const double *z = holent_gw_real (prhs[3], fn, "Z", &nz);
  double e = holent_gw_scalar (prhs[4], fn, "END");
  if (e != 0.0 && e != 1.0)
    mexErrMsgIdAndTxt ("holent:domain", "%s: END must be 0 or 1", fn);
  if (e == 1.0 && bg.kind != HOLENT_BCFT_INTERVAL)
    mexErrMsgIdAndTxt ("holent:domain", "%s: END = 1 needs an interval "
                       "background (a half line has one brane)", fn);
  plhs[0] = holent_gw_like (prhs[3]);
  double *x = mxGetPr (plhs[0]);
  for (size_t i = 0; i < nz; i++)
    if (holent_bcft_brane_x (&bg, (int) e, z[i], x + i))
      x[i] = NAN;
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16];
  holent_gw_init ();
  if (nrhs < 1)
    mexErrMsgIdAndTxt ("holent:nargs", "a mode is required");
  holent_gw_string (prhs[0], GW, "MODE", mode, sizeof mode);
  if (strcmp (mode, "bg") == 0)
    do_bg (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "bgcheck") == 0)
    {
      char fn[64];
      holent_bcft_bg bg;
      double ell;
      holent_gw_nargs (GW, nlhs, 1, nrhs, 3, 3);
      holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
      unpack_bg (prhs[2], fn, &bg, &ell);
      plhs[0] = mxCreateLogicalScalar (1);
    }
  else if (strcmp (mode, "entropy") == 0)
    do_entropy (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "check") == 0)
    do_check (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "page") == 0)
    do_page (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "profile") == 0)
    do_profile (nlhs, plhs, nrhs, prhs);
  else
    mexErrMsgIdAndTxt ("holent:invalid", "unknown mode '%s'", mode);
}
