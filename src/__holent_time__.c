/* __holent_time__: time-dependent AdS3 states (covariant lengths, the
 * thermofield double with its shock, the global quench, bulk light
 * times).  Unpack, call the core (holent_hrt, holent_tfd, holent_quench,
 * holent_causal), pack; no physics.
 *
 *   [RE, IM] = ("geodesic", BG, X1, T1, S1, X2, T2, S2, CLS, TIMELIKE)
 *       equal-sized arrays; S1, S2 sides (0 left, 1 right) on a thermofield
 *       double (ignored elsewhere); on a quench T1 == T2 (the wrapper
 *       checks) is the time.  IM is pi on the timelike branch.
 *   [S, NCROSS, HORIZON] = ("entropy", BG, A, T)
 *       A: a region (n x 2 or n x 4 matrix, or a struct with fields left
 *       and right) or a cell array of them; T a vector of times (shifts
 *       of every endpoint time; the time of a quench).  Outputs are
 *       numel(A) x numel(T).
 *   [TB, TL] = ("light", BG, X1, X2, TOL)
 *   DT = ("mi_zero", BG, A, TMAX)             A a struct (left, right)
 *   ALPHA = ("scramble", BG, A)                A a struct (left, right)
 *   [ALPHA, M] = ("shock", CIRCLE, L, BETA, C, E, TW)
 *
 * Copyright (C) 2026 The holent developers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include "holent_gw.h"
#include "core/holent_causal.h"
#include "core/holent_hrt.h"
#include "core/holent_quench.h"
#include "core/holent_tfd.h"

typedef enum { BG_STATIC, BG_TFD, BG_QUENCH } bg_kind;

typedef struct
{
  bg_kind kind;
  holent_geo_bg geo;       /* static bulks; the one-sided exterior    */
  holent_tfd_bg tfd;
  holent_quench_bg quench;
} time_bg;

/* Everything malloc'd, freed before any error.  */
typedef struct
{
  holent_region *reg;
  holent_rt_workspace *rt;
  holent_tfd_workspace *tw;
  double *tp, *ts, *te;
  char id[32];
  char msg[400];
} gw_state;

static void
release (gw_state *g)
{
  holent_region_free (g->reg);
  holent_rt_free (g->rt);
  holent_tfd_workspace_free (g->tw);
  free (g->tp);
  free (g->ts);
  free (g->te);
  memset (g, 0, sizeof *g);
}

static void
raise (gw_state *g, const char *id, const char *fmt, ...)
{
  va_list ap;
  va_start (ap, fmt);
  vsnprintf (g->msg, sizeof g->msg, fmt, ap);
  va_end (ap);
  snprintf (g->id, sizeof g->id, "%s", id);
  char id2[32], msg2[400];
  memcpy (id2, g->id, sizeof id2);
  memcpy (msg2, g->msg, sizeof msg2);
  release (g);
  mexErrMsgIdAndTxt (id2, "%s", msg2);
}

static const char *
status_id (int st)
{
  switch (st)
    {
    case HOLENT_EINVAL: return "holent:invalid";
    case HOLENT_EDOM: return "holent:domain";
    case HOLENT_ENOMEM: return "holent:nomem";
    case HOLENT_EOVERLAP: return "holent:overlap";
    case HOLENT_EEMPTY: return "holent:empty";
    case HOLENT_ENOCONV: return "holent:noconv";
    case HOLENT_EUNSUP: return "holent:unsupported";
    case HOLENT_ETOOBIG: return "holent:toobig";
    case HOLENT_ECOINCIDE: return "holent:coincident";
    case HOLENT_ETIMELIKE: return "holent:timelike";
    default: return "holent:internal";
    }
}

static double
field_scalar (const mxArray *s, const char *f)
{
  const mxArray *a = mxGetField (s, 0, f);
  if (a == NULL)
    mexErrMsgIdAndTxt ("holent:background",
                       "BG is missing field '%s': make it with ads3_background",
                       f);
  char nm[40];
  snprintf (nm, sizeof nm, "BG.%s", f);
  return holent_gw_scalar (a, "", nm);
}

static void
get_bg (const mxArray *s, time_bg *b)
{
  char state[32] = "";
  const mxArray *f;
  if (s == NULL || !mxIsStruct (s) || mxGetNumberOfElements (s) != 1)
    mexErrMsgIdAndTxt ("holent:background",
                       "BG must be a scalar struct from ads3_background");
  f = mxGetField (s, 0, "state");
  if (f != NULL)
    holent_gw_string (f, "", "BG.state", state, sizeof state);
  int circle = 0;
  f = mxGetField (s, 0, "boundary");
  if (f != NULL)
    {
      char bnd[16];
      holent_gw_string (f, "", "BG.boundary", bnd, sizeof bnd);
      circle = strcmp (bnd, "circle") == 0;
    }
  int st = HOLENT_SUCCESS;
  if (strcmp (state, "tfd") == 0)
    {
      b->kind = BG_TFD;
      st = holent_tfd_init (&b->tfd, circle,
                            circle ? field_scalar (s, "circumference") : 0.0,
                            field_scalar (s, "cutoff"),
                            field_scalar (s, "beta"), field_scalar (s, "c"),
                            field_scalar (s, "shock_alpha"));
      b->geo = b->tfd.side;
    }
  else if (strcmp (state, "quench") == 0)
    {
      b->kind = BG_QUENCH;
      st = holent_quench_init (&b->quench, circle,
                               circle ? field_scalar (s, "circumference")
                                      : 0.0,
                               field_scalar (s, "cutoff"),
                               field_scalar (s, "beta"),
                               field_scalar (s, "c"));
      b->geo = b->quench.vac;
    }
  else
    {
      b->kind = BG_STATIC;
      holent_gw_bg (s, "", &b->geo);
    }
  if (st)
    mexErrMsgIdAndTxt ("holent:background",
                       "BG has inconsistent parameters (%s)",
                       holent_strerror (st));
}

static const double *
real_array (const mxArray *a, const char *name, size_t n)
{
  size_t m;
  const double *p = holent_gw_real (a, "", name, &m);
  if (m != n)
    mexErrMsgIdAndTxt ("holent:size", "%s must have %zu elements", name, n);
  return p;
}

static void
do_geodesic (int nlhs, mxArray *plhs[], const mxArray *prhs[])
{
  time_bg b;
  get_bg (prhs[1], &b);
  size_t n;
  const double *x1 = holent_gw_real (prhs[2], "", "X1", &n);
  const double *t1 = real_array (prhs[3], "T1", n);
  const double *s1 = real_array (prhs[4], "SIDE1", n);
  const double *x2 = real_array (prhs[5], "X2", n);
  const double *t2 = real_array (prhs[6], "T2", n);
  const double *s2 = real_array (prhs[7], "SIDE2", n);
  double cls = holent_gw_scalar (prhs[8], "", "CLASS");
  double tl = holent_gw_scalar (prhs[9], "", "TIMELIKE");
  if (cls != 0.0 && cls != 1.0 && cls != 2.0)
    mexErrMsgIdAndTxt ("holent:invalid", "CLASS must be 0, 1 or 2");
  plhs[0] = holent_gw_like (prhs[2]);
  plhs[1] = holent_gw_like (prhs[2]);
  double *re = mxGetPr (plhs[0]), *im = mxGetPr (plhs[1]);
  (void) nlhs;
  for (size_t i = 0; i < n; i++)
    {
      int st;
      im[i] = 0.0;
      switch (b.kind)
        {
        case BG_TFD:
          if (s1[i] != s2[i])
            st = s1[i] == 0.0
                   ? holent_tfd_cross_length (&b.tfd, x1[i], t1[i], x2[i],
                                              t2[i], &re[i])
                   : holent_tfd_cross_length (&b.tfd, x2[i], t2[i], x1[i],
                                              t1[i], &re[i]);
          else
            st = holent_hrt_length (&b.tfd.side, x1[i], t1[i], x2[i], t2[i],
                                    (holent_geo_class) cls, tl != 0.0,
                                    &re[i], &im[i]);
          break;
        case BG_QUENCH:
          {
            double d = x2[i] - x1[i];
            if (b.quench.vac.circle)
              {
                d = fmod (d, b.quench.vac.L);
                if (d < 0.0)
                  d += b.quench.vac.L;
              }
            st = isfinite (x1[i]) && isfinite (x2[i]) && d == 0.0
                   ? HOLENT_ECOINCIDE
                   : holent_quench_length (&b.quench, fabs (d), t1[i],
                                           &re[i], NULL);
            break;
          }
        default:
          st = holent_hrt_length (&b.geo, x1[i], t1[i], x2[i], t2[i],
                                  (holent_geo_class) cls, tl != 0.0, &re[i],
                                  &im[i]);
          break;
        }
      if (st == HOLENT_ETIMELIKE)
        mexErrMsgIdAndTxt ("holent:timelike",
                           "points %zu are timelike or null separated on the "
                           "boundary (|t2 - t1| must be below their "
                           "distance; the option \"timelike\", true gives "
                           "the timelike entanglement branch)", i + 1);
      if (st)
        holent_gw_fail (st, "", "X1, X2", i);
    }
}

/* One region: a matrix (n x 2 or n x 4) or, on a thermofield double, a
   struct with fields left and right.  */
typedef struct
{
  const mxArray *side[2];  /* left, right (matrices or NULL) */
} region_in;

static void
read_region (gw_state *g, const mxArray *a, const time_bg *b,
             const char *nm, region_in *r)
{
  r->side[0] = r->side[1] = NULL;
  if (mxIsStruct (a))
    {
      if (b->kind != BG_TFD)
        raise (g, "holent:type",
               "%s: a struct region (fields left, right) needs a thermofield "
               "double background (ads3_background (\"tfd\", ...))", nm);
      if (mxGetNumberOfElements (a) != 1)
        raise (g, "holent:type", "%s must be a scalar struct", nm);
      for (int k = 0; k < mxGetNumberOfFields (a); k++)
        {
          const char *f = mxGetFieldNameByNumber (a, k);
          if (strcmp (f, "left") && strcmp (f, "right"))
            raise (g, "holent:type",
                   "%s has a field '%s': the sides are 'left' and 'right'",
                   nm, f);
        }
      r->side[0] = mxGetField (a, 0, "left");
      r->side[1] = mxGetField (a, 0, "right");
    }
  else
    r->side[1] = a;
  for (int s = 0; s < 2; s++)
    {
      const mxArray *m = r->side[s];
      if (m == NULL)
        continue;
      if (!mxIsDouble (m) || mxIsComplex (m) || mxIsSparse (m)
          || mxGetNumberOfDimensions (m) != 2
          || (mxGetM (m) > 0 && mxGetN (m) != 2 && mxGetN (m) != 4))
        raise (g, "holent:type",
               "%s%s must be a real n x 2 matrix [start, end] or n x 4 "
               "[start, end, t_start, t_end]", nm,
               mxIsStruct (a) ? (s ? ".right" : ".left") : "");
      if (mxGetM (m) == 0)
        r->side[s] = NULL;
      else if (mxGetN (m) == 4 && b->kind == BG_QUENCH)
        raise (g, "holent:unsupported",
               "%s: regions with their own times are not supported on a "
               "quench; give the time with the option \"t\"", nm);
    }
  if (r->side[0] == NULL && r->side[1] == NULL)
    raise (g, "holent:empty", "%s has no intervals", nm);
}

static size_t
rows_of (const mxArray *m)
{
  return m ? mxGetM (m) : 0;
}

/* Columns of one side: a, b and times (zeros when n x 2).  */
static void
side_cols (gw_state *g, const mxArray *m, const double **a, const double **b,
           const double **ta, const double **tb, size_t off)
{
  size_t n = mxGetM (m);
  const double *p = mxGetPr (m);
  *a = p;
  *b = p + n;
  if (mxGetN (m) == 4)
    {
      *ta = p + 2 * n;
      *tb = p + 3 * n;
    }
  else
    {
      for (size_t i = 0; i < n; i++)
        g->ts[off + i] = g->te[off + i] = 0.0;
      *ta = g->ts + off;
      *tb = g->te + off;
    }
}

static void
fail_region (gw_state *g, int st, const char *nm, const char *side,
             size_t row, const holent_region *r)
{
  switch (st)
    {
    case HOLENT_EOVERLAP:
      if (r && r->bad[1] != (size_t) -1 && r->bad[1] != row)
        raise (g, "holent:overlap", "%s%s: rows %zu and %zu overlap", nm,
               side, r->bad[0] + 1, r->bad[1] + 1);
      raise (g, "holent:overlap",
             "%s%s: row %zu touches or overlaps another row (intervals with "
             "times must be disjoint)", nm, side, row + 1);
      break;
    case HOLENT_EEMPTY:
      raise (g, "holent:empty", "%s%s: row %zu is a zero-length interval",
             nm, side, row + 1);
      break;
    case HOLENT_ETIMELIKE:
      raise (g, "holent:timelike",
             "%s%s: two endpoints are timelike or null separated (a region "
             "must be achronal)", nm, side);
      break;
    case HOLENT_EINVAL:
      raise (g, "holent:domain", "%s%s: row %zu must be finite", nm, side,
             row + 1);
      break;
    case HOLENT_EDOM:
      raise (g, "holent:domain",
             "%s%s: row %zu must have start < end (line) or end - start <= "
             "circumference (circle)", nm, side, row + 1);
      break;
    default:
      raise (g, status_id (st), "%s%s: %s", nm, side, holent_strerror (st));
    }
}

/* S of one region at shift/time t.  */
static double
entropy_one (gw_state *g, const time_bg *b, const region_in *r,
             const char *nm, double t, size_t *ncross, int *horizon)
{
  holent_rt_result res;
  int st;
  *ncross = 0;
  if (b->kind == BG_TFD)
    {
      holent_tfd_side sd[2] = { { 0, NULL, NULL, NULL, NULL },
                                { 0, NULL, NULL, NULL, NULL } };
      size_t off = 0;
      for (int s = 0; s < 2; s++)
        if (r->side[s])
          {
            sd[s].n = rows_of (r->side[s]);
            side_cols (g, r->side[s], &sd[s].a, &sd[s].b, &sd[s].ta,
                       &sd[s].tb, off);
            off += sd[s].n;
          }
      int bad_side = -1;
      size_t bad_row = 0;
      st = holent_tfd_entropy (g->tw, &b->tfd, &sd[0], &sd[1], t, &res,
                               ncross, &bad_side, &bad_row);
      if (st == HOLENT_EUNSUP)
        raise (g, "holent:unsupported",
               "%s: regions on both sides of a thermofield double on a "
               "circle are not supported (use the line, or one side)", nm);
      if (st)
        fail_region (g, st, nm, bad_side == 0 ? ".left" : (bad_side == 1 && r->side[0] ? ".right" : ""),
                     bad_row, NULL);
    }
  else
    {
      const mxArray *m = r->side[1];
      size_t n = mxGetM (m);
      const double *a, *bb, *ta, *tb;
      side_cols (g, m, &a, &bb, &ta, &tb, 0);
      st = holent_region_set (g->reg, b->geo.circle, b->geo.L, n, a, bb);
      if (st)
        fail_region (g, st, nm, "", g->reg->bad[0], g->reg);
      if (b->kind == BG_QUENCH)
        st = holent_quench_entropy (g->rt, &b->quench, g->reg, t, &res,
                                    NULL, NULL);
      else
        {
          size_t bad = 0, bi, bj;
          st = holent_hrt_region_times (g->reg, n, ta, tb, g->tp, &bad);
          if (st)
            fail_region (g, st, nm, "", bad, NULL);
          for (size_t i = 0; i < 2 * g->reg->n; i++)
            g->tp[i] += t;
          st = holent_hrt_entropy (g->rt, &b->geo, g->reg, g->tp, &res, NULL,
                                   NULL, &bi, &bj);
        }
      if (st)
        fail_region (g, st, nm, "", 0, NULL);
    }
  *horizon = res.horizon;
  return res.S;
}

static void
alloc_ws (gw_state *g, size_t nmax)
{
  if (nmax > HOLENT_RT_NMAX)
    raise (g, "holent:toobig", "at most %zu intervals per region",
           (size_t) HOLENT_RT_NMAX);
  g->reg = holent_region_alloc (nmax);
  g->rt = holent_rt_alloc_dp (nmax);
  g->tw = holent_tfd_workspace_alloc (nmax);
  g->tp = malloc (2 * nmax * sizeof (double));
  g->ts = malloc (nmax * sizeof (double));
  g->te = malloc (nmax * sizeof (double));
  if (!g->reg || !g->rt || !g->tw || !g->tp || !g->ts || !g->te)
    raise (g, "holent:nomem", "out of memory");
}

static size_t
region_rows (const mxArray *a)
{
  if (mxIsStruct (a) && mxGetNumberOfElements (a) == 1)
    {
      const mxArray *l = mxGetField (a, 0, "left");
      const mxArray *r = mxGetField (a, 0, "right");
      return (l ? mxGetM (l) : 0) + (r ? mxGetM (r) : 0);
    }
  return mxGetM (a);
}

static void
do_entropy (int nlhs, mxArray *plhs[], const mxArray *prhs[])
{
  gw_state g;
  time_bg b;
  memset (&g, 0, sizeof g);
  get_bg (prhs[1], &b);
  const mxArray *A = prhs[2];
  size_t nt;
  const double *t = holent_gw_real (prhs[3], "", "T", &nt);
  for (size_t k = 0; k < nt; k++)
    if (!isfinite (t[k]))
      mexErrMsgIdAndTxt ("holent:domain", "T(%zu) must be finite", k + 1);
  int cell = mxIsCell (A);
  size_t nreg = cell ? mxGetNumberOfElements (A) : 1, nmax = 1;
  for (size_t k = 0; k < nreg; k++)
    {
      const mxArray *a = cell ? mxGetCell (A, k) : A;
      if (a == NULL)
        mexErrMsgIdAndTxt ("holent:empty", "A{%zu} has no intervals", k + 1);
      size_t m = region_rows (a);
      nmax = m > nmax ? m : nmax;
    }
  alloc_ws (&g, nmax);
  plhs[0] = mxCreateDoubleMatrix (nreg, nt, mxREAL);
  mxArray *nc = mxCreateDoubleMatrix (nreg, nt, mxREAL);
  mxArray *hz = mxCreateDoubleMatrix (nreg, nt, mxREAL);
  double *S = mxGetPr (plhs[0]), *pc = mxGetPr (nc), *ph = mxGetPr (hz);
  for (size_t k = 0; k < nreg; k++)
    {
      char nm[32];
      if (cell)
        snprintf (nm, sizeof nm, "A{%zu}", k + 1);
      else
        snprintf (nm, sizeof nm, "A");
      region_in r;
      read_region (&g, cell ? mxGetCell (A, k) : A, &b, nm, &r);
      for (size_t j = 0; j < nt; j++)
        {
          size_t ncross;
          int horizon;
          S[k + nreg * j] = entropy_one (&g, &b, &r, nm, t[j], &ncross,
                                         &horizon);
          pc[k + nreg * j] = (double) ncross;
          ph[k + nreg * j] = horizon;
        }
    }
  release (&g);
  if (nlhs > 1)
    plhs[1] = nc;
  if (nlhs > 2)
    plhs[2] = hz;
}

static void
do_light (mxArray *plhs[], const mxArray *prhs[])
{
  time_bg b;
  get_bg (prhs[1], &b);
  size_t n;
  const double *x1 = holent_gw_real (prhs[2], "", "X1", &n);
  const double *x2 = real_array (prhs[3], "X2", n);
  double tol = holent_gw_scalar (prhs[4], "", "TOL");
  plhs[0] = holent_gw_like (prhs[2]);
  plhs[1] = holent_gw_like (prhs[2]);
  double *tb = mxGetPr (plhs[0]), *tl = mxGetPr (plhs[1]);
  for (size_t i = 0; i < n; i++)
    {
      int st = holent_causal_times (&b.geo, x1[i], x2[i], tol, &tb[i],
                                    &tl[i]);
      if (st)
        holent_gw_fail (st, "", "X1, X2", i);
      if (b.kind != BG_STATIC)
        tb[i] = INFINITY;  /* behind a horizon (doc/bulk_causality.md) */
    }
}

/* The two sides of a struct region, for the mutual-information zeros.  */
static void
two_sides (gw_state *g, const time_bg *b, const mxArray *a,
           holent_tfd_side sd[2])
{
  region_in r;
  if (b->kind != BG_TFD)
    raise (g, "holent:background",
           "BG must be a thermofield double (ads3_background (\"tfd\", ...))");
  if (!mxIsStruct (a))
    raise (g, "holent:type", "A must be a struct with fields left and right");
  read_region (g, a, b, "A", &r);
  size_t off = 0;
  for (int s = 0; s < 2; s++)
    {
      if (r.side[s] == NULL)
        raise (g, "holent:empty", "A.%s has no intervals",
               s ? "right" : "left");
      sd[s].n = mxGetM (r.side[s]);
      side_cols (g, r.side[s], &sd[s].a, &sd[s].b, &sd[s].ta, &sd[s].tb,
                 off);
      off += sd[s].n;
    }
}

static void
do_mi (mxArray *plhs[], const mxArray *prhs[], int scramble)
{
  gw_state g;
  time_bg b;
  holent_tfd_side sd[2];
  memset (&g, 0, sizeof g);
  get_bg (prhs[1], &b);
  double tmax = scramble ? 1.0 : holent_gw_scalar (prhs[3], "", "TMAX");
  alloc_ws (&g, region_rows (prhs[2]) + 1);
  two_sides (&g, &b, prhs[2], sd);
  double x;
  int st;
  if (scramble)
    st = holent_tfd_mi_zero_alpha (g.tw, &b.tfd, &sd[0], &sd[1], &x);
  else
    st = holent_tfd_mi_zero (g.tw, &b.tfd, &sd[0], &sd[1], tmax, &x);
  if (st == HOLENT_EUNSUP)
    raise (&g, "holent:unsupported",
           "regions on both sides of a thermofield double on a circle are "
           "not supported (use the line)");
  if (st)
    fail_region (&g, st, "A", "", 0, NULL);
  release (&g);
  plhs[0] = mxCreateDoubleScalar (x);
}

/* [ALPHA, M] = ("shock", CIRCLE, L, BETA, C, E, TW): the shift of a shell
   of energy E sent at left time -TW (holent_tfd_shock_alpha).  */
static void
do_shock (mxArray *plhs[], const mxArray *prhs[])
{
  double v[6], alpha, M;
  static const char *nm[6] = { "CIRCLE", "L", "BETA", "C", "shock_energy",
                               "shock_time" };
  for (int k = 0; k < 6; k++)
    v[k] = holent_gw_scalar (prhs[k + 1], "", nm[k]);
  int st = holent_tfd_shock_alpha (v[0] != 0.0, v[1], v[2], v[3], v[4], v[5],
                                   &alpha, &M);
  if (st)
    mexErrMsgIdAndTxt ("holent:domain",
                       "shock_energy = %g and shock_time = %g must be finite "
                       "with shock_energy >= 0, and the shift must not "
                       "overflow", v[4], v[5]);
  plhs[0] = mxCreateDoubleScalar (alpha);
  plhs[1] = mxCreateDoubleScalar (M);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char cmd[16];
  holent_gw_init ();
  if (nrhs < 1)
    mexErrMsgIdAndTxt ("holent:nargs", "expected a command");
  holent_gw_string (prhs[0], "", "CMD", cmd, sizeof cmd);
  if (strcmp (cmd, "geodesic") == 0)
    {
      holent_gw_nargs ("", nlhs, 2, nrhs, 10, 10);
      do_geodesic (nlhs, plhs, prhs);
    }
  else if (strcmp (cmd, "entropy") == 0)
    {
      holent_gw_nargs ("", nlhs, 3, nrhs, 4, 4);
      do_entropy (nlhs, plhs, prhs);
    }
  else if (strcmp (cmd, "light") == 0)
    {
      holent_gw_nargs ("", nlhs, 2, nrhs, 5, 5);
      do_light (plhs, prhs);
    }
  else if (strcmp (cmd, "mi_zero") == 0)
    {
      holent_gw_nargs ("", nlhs, 1, nrhs, 4, 4);
      do_mi (plhs, prhs, 0);
    }
  else if (strcmp (cmd, "scramble") == 0)
    {
      holent_gw_nargs ("", nlhs, 1, nrhs, 3, 3);
      do_mi (plhs, prhs, 1);
    }
  else if (strcmp (cmd, "shock") == 0)
    {
      holent_gw_nargs ("", nlhs, 2, nrhs, 7, 7);
      do_shock (plhs, prhs);
    }
  else
    mexErrMsgIdAndTxt ("holent:invalid", "unknown command '%s'", cmd);
}
