/* __holent_time__: time-dependent AdS3 states (covariant lengths, the
 * thermofield double with its shock, the global quench, bulk light
 * times).  Unpack, call the core (holent_hrt, holent_tfd, holent_quench,
 * holent_causal), pack; no physics.  FN is the public function's name:
 * every error is raised by holent_gw_raise under it.
 *
 *   BG = ("background", FN, STATE, BOUNDARY, C, G, ELL, CUTOFF, L, BETA,
 *         SHOCK_ALPHA, SHOCK_ENERGY, SHOCK_TIME)
 *       STATE "tfd" or "quench"; the shock values [] when not given.  The
 *       struct is built from the core constructor's result
 *       (holent_tfd_make, holent_quench_make); a struct passed back to any
 *       mode is rebuilt the same way and must match field by field.
 *   [RE, IM] = ("geodesic", FN, BG, X1, T1, S1, X2, T2, S2, CLS, TIMELIKE)
 *       equal-sized arrays; S1, S2 sides (0 left, 1 right) on a thermofield
 *       double (ignored elsewhere); on a quench T1 == T2 (the wrapper
 *       checks) is the time.  IM is pi on the timelike branch.
 *   [S, NCROSS, HORIZON] = ("entropy", FN, BG, A, T [, NAMES])
 *       A: a region (n x 2 or n x 4 matrix, or a struct with fields left
 *       and right) or a cell array of them; T a vector of times (shifts
 *       of every endpoint time; the time of a quench); NAMES a cell of
 *       numel (A) names for messages (default A, A{k}).  Outputs are
 *       numel(A) x numel(T).
 *   [S, BRANCH] = ("interval", FN, BG, L, DT, T, TIMELIKE)
 *       interval_entropy's time path: L, DT equal-sized (the core checks
 *       L against the boundary); S, BRANCH numel(L) x numel(T); S complex
 *       where TIMELIKE (0/1) and a pair is causal (the core's timelike
 *       entropy), BRANCH true where the horizon is part of the surface.
 *   [TB, TL] = ("light", FN, BG, X1, X2 [, TOL])  X1, X2 broadcast; TOL
 *       absent for the core's default
 *   DT = ("mi_zero", FN, BG, A [, TMAX])          A a struct (left, right),
 *       TMAX absent for the core's default
 *   [TSTAR, ALPHA] = ("scramble", FN, BG, A)      A a struct (left, right)
 *
 * Copyright (C) 2026 The holent developers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_array.h"
#include "holent_gw_poll.h"
#include "core/holent_causal.h"
#include "core/holent_hrt.h"
#include "core/holent_interval.h"
#include "core/holent_quench.h"
#include "core/holent_slab.h"
#include "core/holent_tfd.h"
#include "core/holent_surface.h"

typedef enum { BG_STATIC, BG_TFD, BG_QUENCH } bg_kind;

typedef struct
{
  bg_kind kind;
  holent_geo_bg geo;       /* static bulks; the one-sided exterior    */
  holent_tfd_bg tfd;
  holent_quench_bg quench;
  double shock_energy;     /* thermofield double: E of the shock      */
} time_bg;

/* Everything malloc'd, freed before any error.  */
typedef struct
{
  const char *fn;
  holent_region *reg;
  holent_rt_workspace *rt;
  holent_tfd_workspace *tw;
  holent_quench_scan *qs;  /* quench: chords kept from time to time */
  double *tp, *ts, *te;
  holent_surface_workspace *sw;  /* "surface" only                */
  size_t *pairs;                 /* "surface": the minimiser      */
  double *arcs;
  size_t m;                      /* geodesics of the last region  */
} gw_state;

static void
release (gw_state *g)
{
  holent_region_free (g->reg);
  holent_rt_workspace_free (g->rt);
  holent_tfd_workspace_free (g->tw);
  holent_quench_scan_free (g->qs);
  free (g->tp);
  free (g->ts);
  free (g->te);
  holent_surface_workspace_free (g->sw);
  free (g->pairs);
  free (g->arcs);
  g->reg = NULL;
  g->rt = NULL;
  g->tw = NULL;
  g->qs = NULL;
  g->tp = g->ts = g->te = NULL;
  g->sw = NULL;
  g->pairs = NULL;
  g->arcs = NULL;
}

/* Free everything, then raise through holent_gw_raise.  */
static void
fail (gw_state *g, int status, const char *name, size_t index,
       const char *fmt, ...)
#if defined(__GNUC__)
  __attribute__ ((noreturn, format (printf, 5, 6)))
#endif
  ;

static void
fail (gw_state *g, int status, const char *name, size_t index,
       const char *fmt, ...)
{
  char msg[600], nm[64];
  va_list ap;
  va_start (ap, fmt);
  vsnprintf (msg, sizeof msg, fmt, ap);
  va_end (ap);
  snprintf (nm, sizeof nm, "%s", name ? name : "");
  release (g);
  holent_gw_raise (g->fn, status, nm, index, "%s", msg);
}

/* ---- the background: built by the core, packed, re-checked ---- */

static const char *const tfd_names[HOLENT_TFD_NARGS] = {
  "circumference", "cutoff", "beta", "c", "ell", "shock_alpha",
  "shock_energy", "shock_time"
};

typedef struct
{
  int tfd, circle;
  double c, G, ell, eps, L, beta;
  holent_tfd_info info;
} bg_params;

/* The struct of a time-dependent background, field by field.  */
static mxArray *
pack_bg (const bg_params *p)
{
  static const char *f[] = {
    "state", "boundary", "bulk", "c", "G", "ell", "cutoff", "circumference",
    "beta", "T", "beta_L", "beta_R", "T_L", "T_R", "Omega", "alpha", "h",
    "saddle", "horizon", "pure", "S_BH", "entropy_density", "r_plus",
    "r_minus", "M", "J", "shock_alpha", "shock_energy", "shock_time",
    "shock_M"
  };
  int nf = p->tfd ? 30 : 26;
  mxArray *s = mxCreateStructMatrix (1, 1, nf, f);
  const holent_tfd_info *in = &p->info;
  double T = 1.0 / p->beta;
  const double num[] = {
    p->c, p->G, p->ell, p->eps, p->circle ? p->L : INFINITY, p->beta, T,
    p->beta, p->beta, T, T, 0.0, 1.0, 0.0
  };
  mxSetField (s, 0, "state", mxCreateString (p->tfd ? "tfd" : "quench"));
  mxSetField (s, 0, "boundary",
              mxCreateString (p->circle ? "circle" : "line"));
  mxSetField (s, 0, "bulk",
              mxCreateString (!p->tfd ? "vaidya"
                              : p->circle ? "btz" : "planar_btz"));
  for (int k = 0; k < 14; k++)
    mxSetFieldByNumber (s, 0, 3 + k, mxCreateDoubleScalar (num[k]));
  mxSetField (s, 0, "saddle", mxCreateString ("btz"));
  /* The quench is a pure state collapsing: S(A) = S(A^c).  */
  mxSetField (s, 0, "horizon", mxCreateLogicalScalar (p->tfd));
  mxSetField (s, 0, "pure", mxCreateLogicalScalar (!p->tfd));
  const double der[] = {
    p->tfd ? in->S_BH : 0.0, p->tfd ? in->entropy_density : 0.0,
    p->tfd ? in->r_plus : 0.0, 0.0, p->tfd ? in->M : 0.0, 0.0,
    in->shock_alpha, in->shock_energy, in->shock_time, in->shock_M
  };
  for (int k = 0; k < nf - 20; k++)
    mxSetFieldByNumber (s, 0, 20 + k, mxCreateDoubleScalar (der[k]));
  return s;
}

/* Build (core constructor) from the parameters in p; raise its reason.  */
static void
make_bg (const char *fn, bg_params *p, time_bg *b, int has_alpha,
         double alpha, int has_energy, double E, int has_time, double tw)
{
  holent_err err;
  int st;
  memset (&p->info, 0, sizeof p->info);
  if (p->tfd)
    {
      b->kind = BG_TFD;
      st = holent_tfd_make (&b->tfd, &p->info, p->circle, p->L, p->eps,
                            p->beta, p->c, p->ell, has_alpha, alpha,
                            has_energy, E, has_time, tw, &err);
      b->geo = b->tfd.side;
      b->shock_energy = p->info.shock_energy;
    }
  else
    {
      b->kind = BG_QUENCH;
      st = holent_quench_make (&b->quench, p->circle, p->L, p->eps, p->beta,
                               p->c, p->ell, &err);
      p->info.shock_time = NAN;
      b->geo = b->quench.vac;
    }
  if (st)
    holent_gw_raise_err (fn, &err, tfd_names, HOLENT_TFD_NARGS);
  if (!(p->G > 0.0) || !isfinite (p->G))
    holent_gw_raise (fn, HOLENT_EDOM, "G", HOLENT_NOINDEX,
                     "must be positive and finite");
}

static const mxArray *
field (const char *fn, const mxArray *s, const char *f)
{
  const mxArray *a = mxGetField (s, 0, f);
  if (a == NULL)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                     "is missing field '%s': make it with ads3_background",
                     f);
  return a;
}

static double
field_scalar (const char *fn, const mxArray *s, const char *f)
{
  char nm[40];
  snprintf (nm, sizeof nm, "BG.%s", f);
  const mxArray *a = field (fn, s, f);
  size_t n;
  const double *v = holent_gw_real (a, fn, nm, &n);
  if (n != 1)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, nm, HOLENT_NOINDEX,
                     "must be a scalar");
  return v[0];
}

/* 1 when the two arrays hold the same value (NaN equal to NaN).  */
static int
same_value (const mxArray *a, const mxArray *b)
{
  if (mxGetClassID (a) != mxGetClassID (b)
      || mxGetNumberOfElements (a) != mxGetNumberOfElements (b)
      || mxIsComplex (a) || mxIsSparse (a) || mxGetM (a) > 1)
    return 0;
  if (mxIsChar (a))
    {
      char x[64], y[64];
      return mxGetString (a, x, sizeof x) == 0
             && mxGetString (b, y, sizeof y) == 0 && strcmp (x, y) == 0;
    }
  if (mxIsLogical (a))
    return *mxGetLogicals (a) == *mxGetLogicals (b);
  double x = *mxGetPr (a), y = *mxGetPr (b);
  return x == y || (isnan (x) && isnan (y));
}

/* Unpack BG: static bulks by the shared unpacker; a thermofield double or
   a quench rebuilt by its core constructor from its parameters and
   compared with every field of the struct.  */
static void
get_bg (const char *fn, const mxArray *s, time_bg *b)
{
  char state[32] = "", bnd[16] = "";
  memset (b, 0, sizeof *b);
  const mxArray *f = s != NULL && mxIsStruct (s)
                     && mxGetNumberOfElements (s) == 1
                     ? mxGetField (s, 0, "state") : NULL;
  if (f != NULL && mxIsChar (f) && mxGetN (f) < sizeof state)
    mxGetString (f, state, sizeof state);
  int tfd = strcmp (state, "tfd") == 0;
  if (!tfd && strcmp (state, "quench") != 0)
    {
      /* every other struct (and what is not one) is the shared
         unpacker's: it is the one check of a static background */
      b->kind = BG_STATIC;
      holent_gw_bg (s, fn, &b->geo);
      return;
    }
  holent_gw_string (field (fn, s, "boundary"), fn, "BG.boundary", bnd,
                    sizeof bnd);
  bg_params p = { tfd, strcmp (bnd, "circle") == 0,
                  field_scalar (fn, s, "c"), field_scalar (fn, s, "G"),
                  field_scalar (fn, s, "ell"), field_scalar (fn, s, "cutoff"),
                  field_scalar (fn, s, "circumference"),
                  field_scalar (fn, s, "beta"), { 0, 0, 0, 0, 0, 0, 0, 0 } };
  double a = 0.0, E = 0.0, tw = NAN;
  if (tfd)
    {
      a = field_scalar (fn, s, "shock_alpha");
      E = field_scalar (fn, s, "shock_energy");
      tw = field_scalar (fn, s, "shock_time");
    }
  /* Made from an energy and a time, or from the shift.  */
  int et = !isnan (tw);
  make_bg (fn, &p, b, !et, a, et, E, et, tw);
  mxArray *ref = pack_bg (&p);
  int nf = mxGetNumberOfFields (ref);
  for (int k = 0; k < nf; k++)
    {
      const char *name = mxGetFieldNameByNumber (ref, k);
      const mxArray *given = field (fn, s, name);
      if (!same_value (mxGetFieldByNumber (ref, 0, k), given))
        {
          char nm[40];
          snprintf (nm, sizeof nm, "BG.%s", name);
          mxDestroyArray (ref);
          holent_gw_raise (fn, HOLENT_EBACKGROUND, nm, HOLENT_NOINDEX,
                           "does not match the background its parameters "
                           "make: build BG with ads3_background");
        }
    }
  mxDestroyArray (ref);
  if (mxGetNumberOfFields (s) != nf)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                     "has %d fields where a %s background has %d: build it "
                     "with ads3_background", mxGetNumberOfFields (s), state,
                     nf);
}

/* An optional scalar option ([] when absent).  */
static int
opt_scalar (const char *fn, const mxArray *a, const char *name, double *v)
{
  size_t n;
  const double *p = holent_gw_real (a, fn, name, &n);
  if (n == 0)
    return 0;
  if (n != 1)
    holent_gw_raise (fn, HOLENT_ETYPE, name, HOLENT_NOINDEX,
                     "must be a scalar");
  *v = p[0];
  return 1;
}

static void
do_background (const char *fn, mxArray *plhs[], const mxArray *prhs[])
{
  char state[16], bnd[16];
  time_bg b;
  holent_gw_string (prhs[2], fn, "STATE", state, sizeof state);
  holent_gw_string (prhs[3], fn, "BOUNDARY", bnd, sizeof bnd);
  int tfd = strcmp (state, "tfd") == 0;
  if (!tfd && strcmp (state, "quench") != 0)
    holent_gw_raise (fn, HOLENT_EOPTION, "STATE", HOLENT_NOINDEX,
                     "must be \"tfd\" or \"quench\"");
  if (strcmp (bnd, "line") != 0 && strcmp (bnd, "circle") != 0)
    holent_gw_raise (fn, HOLENT_EOPTION, "BOUNDARY", HOLENT_NOINDEX,
                     "must be \"line\" or \"circle\"");
  bg_params p = { tfd, strcmp (bnd, "circle") == 0,
                  holent_gw_scalar (prhs[4], fn, "c"),
                  holent_gw_scalar (prhs[5], fn, "G"),
                  holent_gw_scalar (prhs[6], fn, "ell"),
                  holent_gw_scalar (prhs[7], fn, "cutoff"),
                  holent_gw_scalar (prhs[8], fn, "circumference"),
                  holent_gw_scalar (prhs[9], fn, "beta"), { 0, 0, 0, 0, 0, 0, 0, 0 } };
  double a = 0.0, E = 0.0, tw = 0.0;
  int ha = opt_scalar (fn, prhs[10], "shock_alpha", &a);
  int he = opt_scalar (fn, prhs[11], "shock_energy", &E);
  int ht = opt_scalar (fn, prhs[12], "shock_time", &tw);
  if (!tfd && (ha || he || ht))
    holent_gw_raise (fn, HOLENT_EOPTION,
                     ha ? "shock_alpha" : he ? "shock_energy" : "shock_time",
                     HOLENT_NOINDEX, "applies to a thermofield double only");
  make_bg (fn, &p, &b, ha, a, he, E, ht, tw);
  plhs[0] = pack_bg (&p);
}

/* ---- lengths ---- */

static const double *
real_array (const char *fn, const mxArray *a, const char *name, size_t n)
{
  size_t m;
  const double *p = holent_gw_real (a, fn, name, &m);
  if (m != n)
    holent_gw_raise (fn, HOLENT_ESIZE, name, HOLENT_NOINDEX,
                     "must have %zu elements", n);
  return p;
}

/* One covariant length: X1 at T1 on side S1 to X2 at T2 on side S2 (0
   left, 1 right; a thermofield double only); IM is pi on the timelike
   branch.  */
static int
length_one (const time_bg *b, double x1, double t1, double s1, double x2,
            double t2, double s2, int cls, int tl, double *re, double *im)
{
  *im = 0.0;
  switch (b->kind)
    {
    case BG_TFD:
      if (s1 != s2)
        return s1 == 0.0
                 ? holent_tfd_cross_length (&b->tfd, x1, t1, x2, t2, re)
                 : holent_tfd_cross_length (&b->tfd, x2, t2, x1, t1, re);
      return holent_hrt_length (&b->tfd.side, x1, t1, x2, t2,
                                (holent_geo_class) cls, tl, re, im);
    case BG_QUENCH:
      return holent_quench_points_length (&b->quench, x1, x2, t1, re);
    default:
      return holent_hrt_length (&b->geo, x1, t1, x2, t2,
                                (holent_geo_class) cls, tl, re, im);
    }
}

/* A side option: [] when not given (the right side), else n values 0/1
   on a thermofield double only.  */
static const double *
side_array (const char *fn, const time_bg *b, const mxArray *a,
            const char *name, size_t n)
{
  if (mxIsEmpty (a))
    return NULL;
  if (b->kind != BG_TFD)
    holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                     "'%s' applies to a thermofield double "
                     "(ads3_background (\"tfd\", ...)) only", name);
  return real_array (fn, a, name, n);
}

/* The pairs [i0, i0 + m) of do_geodesic: one slab of holent_slab_run
   (Ctrl-C between slabs); the first failure is kept for the message.  */
typedef struct
{
  const time_bg *b;
  const double *x1, *t1, *s1, *x2, *t2, *s2;
  int cls, tl;
  double *re, *im;
  size_t bad;
} geo_job;

static int
geo_slab (void *ctx, size_t i0, size_t m)
{
  geo_job *j = ctx;
  for (size_t i = i0; i < i0 + m; i++)
    {
      int st = length_one (j->b, j->x1[i], j->t1[i], j->s1 ? j->s1[i] : 1.0,
                           j->x2[i], j->t2[i], j->s2 ? j->s2[i] : 1.0,
                           j->cls, j->tl, &j->re[i], &j->im[i]);
      if (st)
        {
          j->bad = i;
          return st;
        }
    }
  return HOLENT_SUCCESS;
}

/* Pairs per slab of the time path (0.2-2 us a pair): milliseconds.  */
#define GEO_SLAB 4096

static void
do_geodesic (const char *fn, mxArray *plhs[], const mxArray *prhs[])
{
  time_bg b;
  get_bg (fn, prhs[2], &b);
  size_t n;
  geo_job j;
  j.b = &b;
  j.x1 = holent_gw_real (prhs[3], fn, "X1", &n);
  j.t1 = real_array (fn, prhs[4], "t1", n);
  j.s1 = side_array (fn, &b, prhs[5], "side1", n);
  j.x2 = real_array (fn, prhs[6], "X2", n);
  j.t2 = real_array (fn, prhs[7], "t2", n);
  j.s2 = side_array (fn, &b, prhs[8], "side2", n);
  double cls = holent_gw_scalar (prhs[9], fn, "class");
  double tl = holent_gw_scalar (prhs[10], fn, "timelike");
  if (cls != 0.0 && cls != 1.0 && cls != 2.0)
    holent_gw_raise (fn, HOLENT_EOPTION, "class", HOLENT_NOINDEX,
                     "must be 0, 1 or 2");
  if (b.kind == BG_QUENCH)
    for (size_t i = 0; i < n; i++)
      if (j.t1[i] != j.t2[i])
        holent_gw_raise (fn, HOLENT_EUNSUP, NULL, HOLENT_NOINDEX,
                         "on a quench both ends live at the time 't' (t1 "
                         "and t2 must agree)");
  j.cls = (int) cls;
  j.tl = tl != 0.0;
  /* no copy or zero-fill of large results: pauses no poll can cut short
     (holent_gw_array.h) */
  mxArray *re = holent_gw_result_like (prhs[3]);
  mxArray *im = holent_gw_result_like (prhs[3]);
  j.re = mxGetPr (re);
  j.im = mxGetPr (im);
  j.bad = 0;
  int st = holent_slab_run (n, GEO_SLAB, geo_slab, &j, holent_gw_poll (fn));
  holent_gw_poll_end ();
  if (st)
    {
      mxDestroyArray (re);
      mxDestroyArray (im);
    }
  if (st == HOLENT_ETIMELIKE)
    holent_gw_raise (fn, st, "X2", j.bad,
                     "timelike or null separated from X1(%zu) on the "
                     "boundary (|t2 - t1| must be below their distance; "
                     "the option \"timelike\", true gives the timelike "
                     "entanglement branch)", j.bad + 1);
  if (st)  /* HOLENT_EINTR: raising it interrupts */
    holent_gw_raise (fn, st, "X2", j.bad, "%s (with X1(%zu))",
                     holent_strerror (st), j.bad + 1);
  plhs[0] = re;
  plhs[1] = im;
}

/* ---- regions ---- */

/* One region: a matrix (n x 2 or n x 4) or, on a thermofield double, a
   struct with fields left and right.  */
typedef struct
{
  const mxArray *side[2];  /* left, right (matrices or NULL) */
  char name[2][112];       /* their names in messages        */
} region_in;

static void
read_region (gw_state *g, const mxArray *a, const time_bg *b,
             const char *nm, region_in *r)
{
  int st = mxIsStruct (a);
  r->side[0] = r->side[1] = NULL;
  snprintf (r->name[0], sizeof r->name[0], "%s.left", nm);
  snprintf (r->name[1], sizeof r->name[1], st ? "%s.right" : "%s", nm);
  if (st)
    {
      if (b->kind != BG_TFD)
        fail (g, HOLENT_ETYPE, nm, HOLENT_NOINDEX,
               "a struct region (fields left, right) needs a thermofield "
               "double background (ads3_background (\"tfd\", ...))");
      if (mxGetNumberOfElements (a) != 1)
        fail (g, HOLENT_ETYPE, nm, HOLENT_NOINDEX,
               "must be a scalar struct");
      for (int k = 0; k < mxGetNumberOfFields (a); k++)
        {
          const char *f = mxGetFieldNameByNumber (a, k);
          if (strcmp (f, "left") && strcmp (f, "right"))
            fail (g, HOLENT_ETYPE, nm, HOLENT_NOINDEX,
                   "has a field '%s': the sides are 'left' and 'right'", f);
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
        fail (g, HOLENT_ETYPE, r->name[s], HOLENT_NOINDEX,
               "must be a real n x 2 matrix [start, end] or n x 4 "
               "[start, end, t_start, t_end]");
      if (mxGetM (m) == 0)
        r->side[s] = NULL;
      else if (mxGetN (m) == 4 && b->kind == BG_QUENCH)
        fail (g, HOLENT_EUNSUP, r->name[s], HOLENT_NOINDEX,
               "regions with their own times are not supported on a "
               "quench; give the time with the option \"t\"");
    }
  if (r->side[0] == NULL && r->side[1] == NULL)
    fail (g, HOLENT_EEMPTY, nm, HOLENT_NOINDEX, "has no intervals");
}

/* Columns of one side: a, b and times (zeros when n x 2).  */
static void
side_cols (gw_state *g, const mxArray *m, holent_tfd_side *sd, size_t off)
{
  size_t n = mxGetM (m);
  const double *p = mxGetPr (m);
  sd->n = n;
  sd->a = p;
  sd->b = p + n;
  if (mxGetN (m) == 4)
    {
      sd->ta = p + 2 * n;
      sd->tb = p + 3 * n;
    }
  else
    {
      for (size_t i = 0; i < n; i++)
        g->ts[off + i] = g->te[off + i] = 0.0;
      sd->ta = g->ts + off;
      sd->tb = g->te + off;
    }
}

/* The reason of a failed region, row (0-based) and second row.  */
static void
fail_region (gw_state *g, int st, const char *nm, size_t row, size_t row2)
{
  switch (st)
    {
    case HOLENT_EOVERLAP:
      if (row2 != HOLENT_NOINDEX && row2 != row)
        fail (g, st, nm, row, "overlaps or touches row %zu (intervals "
               "with times must be disjoint)", row2 + 1);
      fail (g, st, nm, row, "touches or overlaps another row (intervals "
             "with times must be disjoint)");
    case HOLENT_EEMPTY:
      fail (g, st, nm, row, "is a zero-length interval");
    case HOLENT_ETIMELIKE:
      fail (g, st, nm, HOLENT_NOINDEX, "two endpoints are timelike or "
             "null separated (a region must be achronal)");
    case HOLENT_EINVAL:
      fail (g, HOLENT_EDOM, nm, row, "must be finite");
    case HOLENT_EDOM:
      fail (g, st, nm, row, "must have start < end (line) or end - start "
             "<= circumference (circle)");
    default:
      fail (g, st, nm, HOLENT_NOINDEX, "%s", holent_strerror (st));
    }
}

/* S of one region at shift/time t.  */
static double
entropy_one (gw_state *g, const time_bg *b, const region_in *r, double t,
             size_t *ncross, int *horizon)
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
            side_cols (g, r->side[s], &sd[s], off);
            off += sd[s].n;
          }
      int bad_side = 1;
      size_t bad_row = HOLENT_NOINDEX;
      st = holent_tfd_entropy (g->tw, &b->tfd, &sd[0], &sd[1], t, &res,
                               ncross, &bad_side, &bad_row);
      if (st)
        fail_region (g, st, r->name[bad_side == 0 ? 0 : 1], bad_row,
                     HOLENT_NOINDEX);
    }
  else
    {
      holent_tfd_side sd;
      side_cols (g, r->side[1], &sd, 0);
      st = holent_region_set (g->reg, b->geo.circle, b->geo.L, sd.n, sd.a,
                              sd.b);
      if (st)
        fail_region (g, st, r->name[1], g->reg->bad[0], g->reg->bad[1]);
      if (b->kind == BG_QUENCH)
        st = holent_quench_entropy_scan (g->rt, &b->quench, g->reg, t,
                                         g->qs, &res, g->pairs, g->arcs);
      else
        {
          size_t bad = 0, bi, bj;
          st = holent_hrt_region_times (g->reg, sd.n, sd.ta, sd.tb, g->tp,
                                        &bad);
          if (st)
            fail_region (g, st, r->name[1], bad, HOLENT_NOINDEX);
          for (size_t i = 0; i < 2 * g->reg->n; i++)
            g->tp[i] += t;
          st = holent_hrt_entropy (g->rt, &b->geo, g->reg, g->tp, &res,
                                   g->pairs, g->arcs, &bi, &bj);
        }
      if (st)
        fail_region (g, st, r->name[1], HOLENT_NOINDEX, HOLENT_NOINDEX);
    }
  *horizon = res.horizon;
  g->m = res.m;
  return res.S;
}

static void
alloc_ws (gw_state *g, size_t nmax)
{
  if (nmax > HOLENT_RT_NMAX)
    fail (g, HOLENT_ETOOBIG, "A", HOLENT_NOINDEX,
           "at most %zu intervals per region", (size_t) HOLENT_RT_NMAX);
  g->reg = holent_region_alloc (nmax);
  g->rt = holent_rt_workspace_alloc_dp (nmax);
  g->tw = holent_tfd_workspace_alloc (nmax);
  g->tp = malloc (2 * nmax * sizeof (double));
  g->ts = malloc (nmax * sizeof (double));
  g->te = malloc (nmax * sizeof (double));
  if (!g->reg || !g->rt || !g->tw || !g->tp || !g->ts || !g->te)
    fail (g, HOLENT_ENOMEM, NULL, HOLENT_NOINDEX, "out of memory");

  /* the DP over many timed intervals runs long: Ctrl-C */
  const holent_poll *poll = holent_gw_poll (g->fn);
  holent_rt_set_poll (g->rt, poll);
  holent_tfd_workspace_set_poll (g->tw, poll);
}

static size_t
region_rows (const mxArray *a)
{
  if (a == NULL)
    return 0;
  if (mxIsStruct (a) && mxGetNumberOfElements (a) == 1)
    {
      const mxArray *l = mxGetField (a, 0, "left");
      const mxArray *r = mxGetField (a, 0, "right");
      return (l ? mxGetM (l) : 0) + (r ? mxGetM (r) : 0);
    }
  return mxGetM (a);
}

/* Work item W of a (region, time) batch of NT times, region by region:
   region *K at time *JT; nonzero when region *K is not the one read last
   (*CUR, valid once *HAVE), which it then becomes.  */
static int
batch_item (size_t w, size_t nt, size_t *k, size_t *jt, size_t *cur,
            int *have)
{
  *k = w / nt;
  *jt = w % nt;
  if (*have && *cur == *k)
    return 0;
  *cur = *k;
  *have = 1;
  return 1;
}

/* rt_entropy's time path in slabs: work item w is region k = w / NT at
   time j = w % NT, so each region is read once.  Failures are raised
   inside (read_region, entropy_one: tracked arrays freed by Octave).  */
typedef struct
{
  gw_state *g;
  const time_bg *b;
  const mxArray *A, *names;
  const double *t;
  size_t nreg, nt, k;
  int cell, have;
  double *S, *pc, *ph;
  region_in r;
} en_job;

/* (region, time) pairs per slab: microseconds to milliseconds a pair.  */
#define EN_SLAB 16

static int
en_slab (void *ctx, size_t w0, size_t m)
{
  en_job *j = ctx;
  for (size_t w = w0; w < w0 + m; w++)
    {
      size_t k, jt;
      if (batch_item (w, j->nt, &k, &jt, &j->k, &j->have))
        {
          char nm[96];
          if (j->names)
            holent_gw_string (mxGetCell (j->names, k), j->g->fn, "NAMES", nm,
                              sizeof nm);
          else if (j->cell)
            snprintf (nm, sizeof nm, "A{%zu}", k + 1);
          else
            snprintf (nm, sizeof nm, "A");
          const mxArray *a = j->cell ? mxGetCell (j->A, k) : j->A;
          if (a == NULL)
            fail (j->g, HOLENT_EEMPTY, nm, HOLENT_NOINDEX,
                  "has no intervals");
          read_region (j->g, a, j->b, nm, &j->r);
        }
      size_t ncross, i = k + j->nreg * jt;
      int horizon;
      j->S[i] = entropy_one (j->g, j->b, &j->r, j->t[jt], &ncross, &horizon);
      j->pc[i] = (double) ncross;
      j->ph[i] = horizon;
    }
  return HOLENT_SUCCESS;
}

static void
do_entropy (const char *fn, int nlhs, int nrhs, mxArray *plhs[],
            const mxArray *prhs[])
{
  gw_state g;
  time_bg b;
  memset (&g, 0, sizeof g);
  g.fn = fn;
  get_bg (fn, prhs[2], &b);
  const mxArray *A = prhs[3];
  size_t nt;
  const double *t = holent_gw_real (prhs[4], fn, "t", &nt);
  for (size_t k = 0; k < nt; k++)
    if (!isfinite (t[k]))
      holent_gw_raise (fn, isnan (t[k]) ? HOLENT_ENAN : HOLENT_EDOM, "t", k,
                       "must be finite");
  int cell = mxIsCell (A);
  size_t nreg = cell ? mxGetNumberOfElements (A) : 1, nmax = 1;
  const mxArray *names = nrhs > 5 ? prhs[5] : NULL;
  if (names && (!mxIsCell (names) || mxGetNumberOfElements (names) != nreg))
    holent_gw_raise (fn, HOLENT_ESIZE, "NAMES", HOLENT_NOINDEX,
                     "must be a cell of %zu names", nreg);
  char nm[96];
  for (size_t k = 0; k < nreg; k++)
    {
      size_t m = region_rows (cell ? mxGetCell (A, k) : A);
      nmax = m > nmax ? m : nmax;
      if (names)  /* checked before anything is allocated */
        holent_gw_string (mxGetCell (names, k), fn, "NAMES", nm, sizeof nm);
    }
  alloc_ws (&g, nmax);
  /* a quench at several times keeps its chords (optional: without the
     memory the scan is only slower) */
  if (b.kind == BG_QUENCH && nt > 1 && nmax <= HOLENT_QUENCH_SCAN_NMAX)
    g.qs = holent_quench_scan_alloc (nmax);
  plhs[0] = mxCreateDoubleMatrix (nreg, nt, mxREAL);
  mxArray *nc = mxCreateDoubleMatrix (nreg, nt, mxREAL);
  mxArray *hz = mxCreateDoubleMatrix (nreg, nt, mxREAL);
  en_job j = { .g = &g, .b = &b, .A = A, .names = names, .t = t,
               .nreg = nreg, .nt = nt, .cell = cell, .S = mxGetPr (plhs[0]),
               .pc = mxGetPr (nc), .ph = mxGetPr (hz) };
  /* every (region, time) pair, region by region, in slabs (Ctrl-C between
     them; large regions also poll inside the minimiser) */
  int st = holent_slab_run (nreg * nt, EN_SLAB, en_slab, &j,
                            holent_gw_poll (fn));
  holent_gw_poll_end ();
  if (st)  /* only HOLENT_EINTR: the others are raised inside */
    fail (&g, st, NULL, HOLENT_NOINDEX, "%s", holent_strerror (st));
  release (&g);
  if (nlhs > 1)
    plhs[1] = nc;
  else
    mxDestroyArray (nc);
  if (nlhs > 2)
    plhs[2] = hz;
  else
    mxDestroyArray (hz);
}

/* ---- surfaces (rt_surface's time path) ---- */

/* One sampled curve as a k x 3 array [X, Y, third].  */
static mxArray *
curve3 (const holent_curve *c)
{
  mxArray *a = mxCreateDoubleMatrix (c->n, 3, mxREAL);
  double *p = mxGetPr (a);
  memcpy (p, c->x, c->n * sizeof *p);
  memcpy (p + c->n, c->y, c->n * sizeof *p);
  memcpy (p + 2 * c->n, c->t, c->n * sizeof *p);
  return a;
}

/* [C, PTS, TP, SIDE, PAIRS, ARCS, S, HOR, HC, PICTURE, WIND] =
   ("surface", FN, BG, A, T, TOL[, RUNNER]): the minimiser of the one
   region A at shift/time T and its geodesics sampled to TOL
   (holent_surface); WIND the winding of each geodesic through the bridge
   of a thermofield double on a circle (else 0).  RUNNER true: the best
   other candidate instead (the line's thermofield double only,
   holent_surface_tfd_runner_up).  */
static void
do_surface (const char *fn, int nlhs, mxArray *plhs[], int nrhs,
            const mxArray *prhs[])
{
  gw_state g;
  time_bg b;
  memset (&g, 0, sizeof g);
  g.fn = fn;
  (void) nlhs;
  get_bg (fn, prhs[2], &b);
  const mxArray *A = prhs[3];
  double t = holent_gw_scalar (prhs[4], fn, "t");
  double tol = holent_gw_scalar (prhs[5], fn, "tol");
  int runner = nrhs > 6 && holent_gw_scalar (prhs[6], fn, "runner") != 0.0;
  if (!isfinite (t))
    holent_gw_raise (fn, isnan (t) ? HOLENT_ENAN : HOLENT_EDOM, "t",
                     HOLENT_NOINDEX, "must be finite");
  size_t nmax = region_rows (A);
  alloc_ws (&g, nmax > 0 ? nmax : 1);
  g.sw = holent_surface_workspace_alloc ();
  g.pairs = malloc (2 * (nmax + 1) * sizeof *g.pairs);
  g.arcs = malloc ((nmax + 1) * sizeof *g.arcs);
  if (!g.sw || !g.pairs || !g.arcs)
    fail (&g, HOLENT_ENOMEM, NULL, HOLENT_NOINDEX, "out of memory");
  region_in r;
  read_region (&g, A, &b, "A", &r);
  size_t ncross;
  int horizon;
  double S = entropy_one (&g, &b, &r, t, &ncross, &horizon);
  /* the endpoints, their times and sides, the pairs */
  size_t np;
  const double *x, *tp, *arcs = g.arcs;
  const size_t *pairs = g.pairs;
  const int *side = NULL;
  const long *wind = NULL;
  if (b.kind == BG_TFD)
    {
      holent_tfd_config cf;
      int st = holent_tfd_minimiser (g.tw, &cf);
      if (st)
        fail (&g, st, "A", HOLENT_NOINDEX, "%s", holent_strerror (st));
      np = cf.npts;
      x = cf.x;
      tp = cf.t;
      side = cf.side;
      pairs = cf.pairs;
      arcs = cf.arcs;
      wind = cf.winding;
    }
  else
    {
      np = 2 * g.reg->n;
      x = g.reg->pts;
      if (b.kind == BG_QUENCH)
        for (size_t i = 0; i < np; i++)
          g.tp[i] = t;
      tp = g.tp;
    }
  if (runner)
    {
      /* the best other candidate: g.pairs and g.arcs hold 2 (rows + 1)
         and rows + 1 entries, room for np and np/2 (the minimiser's pairs
         are read before they are overwritten) */
      int st;
      if (b.kind == BG_TFD)
        st = holent_surface_tfd_runner_up (g.sw, &b.tfd, np, x, tp, side,
                                           pairs, g.pairs, &S);
      else if (b.kind == BG_QUENCH)
        st = holent_surface_quench_runner_up (g.sw, &b.quench, np, x, t,
                                              pairs, g.pairs, &S);
      else
        st = holent_surface_hrt_runner_up (g.sw, &b.geo, np, x, tp, pairs,
                                           g.pairs, &S);
      if (st == HOLENT_EUNSUP)
        fail (&g, st, NULL, HOLENT_NOINDEX, "configuration \"runner_up\" "
              "is not available for %s on a circle (its %s); on a line it "
              "is", b.kind == BG_TFD ? "a thermofield double"
                                     : "regions with times",
              b.kind == BG_TFD ? "annulus has windings and the horizon"
                               : "faces and horizon");
      if (st == HOLENT_EDOM)
        fail (&g, st, "A", HOLENT_NOINDEX, "has a single candidate "
              "configuration: there is no runner-up");
      if (st == HOLENT_ETOOBIG)
        fail (&g, st, "A", HOLENT_NOINDEX, "must have at most %zu "
              "intervals in all for the runner-up (a brute force)",
              (size_t) HOLENT_SURFACE_RUNNER_NMAX);
      if (st)
        fail (&g, st, "A", HOLENT_NOINDEX, "%s", holent_strerror (st));
      pairs = g.pairs;
      for (size_t k = 0; k < np / 2; k++)
        g.arcs[k] = b.kind == BG_TFD ? NAN
                                     : x[pairs[2 * k + 1]] - x[pairs[2 * k]];
      arcs = g.arcs;
      wind = NULL;
      horizon = 0;
    }
  size_t m = g.m;
  mxArray *cell = mxCreateCellMatrix (1, m);
  for (size_t k = 0; k < m; k++)
    {
      size_t i = pairs[2 * k], j = pairs[2 * k + 1];
      int st;
      if (b.kind == BG_TFD)
        {
          if (side[i] == side[j] && x[j] < x[i])   /* sorted within a side */
            {
              size_t q = i;
              i = j;
              j = q;
            }
          st = holent_surface_tfd_winding (g.sw, &b.tfd, x[i], tp[i],
                                           side[i], x[j], tp[j], side[j],
                                           arcs[k], wind ? wind[k] : 0, tol);
        }
      else if (b.kind == BG_QUENCH)
        st = holent_surface_quench (g.sw, &b.quench, x[i], x[j], t, tol);
      else
        st = holent_surface_pair (g.sw, &b.geo, x[i], tp[i], x[j], tp[j],
                                  arcs[k], tol);
      if ((st == HOLENT_ERANGE || st == HOLENT_ETOOBIG) && b.kind == BG_TFD)
        fail (&g, st, "t", HOLENT_NOINDEX, "must be nearer 0 for the "
              "Kruskal picture, whose coordinates grow like "
              "cosh(2 pi t/beta) (geodesic %zu; or take a larger tol)",
              k + 1);
      if (st)
        fail (&g, st, "geodesic", k, "%s", holent_strerror (st));
      mxSetCell (cell, k, curve3 (&g.sw->cur));
    }
  /* the horizon when it is part of the surface */
  mxArray *hc = mxCreateDoubleMatrix (0, 3, mxREAL);
  if (horizon)
    {
      double depth;
      int st = b.kind == BG_TFD
                 ? holent_surface_tfd_horizon (g.sw, &b.tfd, 0.0, b.tfd.side.L)
                 : holent_surface_horizon (g.sw, &b.geo, 0.0, 0.0, tol,
                                           &depth);
      if (st)
        fail (&g, st, "horizon", HOLENT_NOINDEX, "%s", holent_strerror (st));
      mxDestroyArray (hc);
      hc = curve3 (&g.sw->cur);
    }
  mxArray *P = mxCreateDoubleMatrix (np, 1, mxREAL);
  mxArray *T = mxCreateDoubleMatrix (np, 1, mxREAL);
  mxArray *SD = mxCreateDoubleMatrix (np, 1, mxREAL);
  mxArray *PR = mxCreateDoubleMatrix (m, 2, mxREAL);
  mxArray *AR = mxCreateDoubleMatrix (m, 1, mxREAL);
  mxArray *WD = mxCreateDoubleMatrix (m, 1, mxREAL);
  for (size_t i = 0; i < np; i++)
    {
      mxGetPr (P)[i] = x[i];
      mxGetPr (T)[i] = tp[i];
      mxGetPr (SD)[i] = side ? side[i] : 1.0;
    }
  for (size_t k = 0; k < m; k++)
    {
      mxGetPr (PR)[k] = (double) pairs[2 * k] + 1;
      mxGetPr (PR)[k + m] = (double) pairs[2 * k + 1] + 1;
      mxGetPr (AR)[k] = arcs[k];
      mxGetPr (WD)[k] = wind ? (double) wind[k] : 0.0;
    }
  int circle = b.kind == BG_TFD ? b.tfd.side.circle : b.geo.circle;
  release (&g);
  plhs[0] = cell;
  plhs[1] = P;
  plhs[2] = T;
  plhs[3] = SD;
  plhs[4] = PR;
  plhs[5] = AR;
  plhs[6] = mxCreateDoubleScalar (S);
  plhs[7] = mxCreateLogicalScalar (horizon != 0);
  plhs[8] = hc;
  plhs[9] = mxCreateString (b.kind == BG_TFD ? "kruskal"
                            : circle ? "disk" : "half_plane");
  if (nlhs > 10)
    plhs[10] = WD;
  else
    mxDestroyArray (WD);
}

/* ---- single intervals ---- */

/* interval_entropy's time path in slabs: work item w is interval
   k = w / NT at time j = w % NT, so one interval's region is read once.
   A failure of the timelike entropy is kept for the message; the others
   are raised inside (entropy_one), tracked arrays freed by Octave.  */
typedef struct
{
  gw_state *g;
  const time_bg *b;
  const double *l, *dt, *t;
  size_t n, nt;
  int tl;
  double *sr, *si;
  mxLogical *pb;
  mxArray *row;
  size_t bad, k;      /* the failed interval; the interval read   */
  int any_im, have;   /* some pair causal; region k is read       */
  region_in r;
} iv_job;

/* (interval, time) pairs per slab (about 5 us a pair): milliseconds.  */
#define IV_SLAB 256

static int
iv_slab (void *ctx, size_t w0, size_t m)
{
  iv_job *j = ctx;
  const time_bg *b = j->b;
  for (size_t w = w0; w < w0 + m; w++)
    {
      size_t k, jt;
      if (batch_item (w, j->nt, &k, &jt, &j->k, &j->have))
        {
          char nm[32];
          double *pr = mxGetPr (j->row);
          snprintf (nm, sizeof nm, "L(%zu)", k + 1);
          pr[0] = 0.0;
          pr[1] = j->l[k];
          if (b->kind != BG_QUENCH)
            {
              pr[2] = 0.0;
              pr[3] = j->dt[k];
            }
          read_region (j->g, j->row, b, nm, &j->r);
        }
      size_t i = k + j->n * jt;
      int causal = 0;
      if (j->tl && b->kind != BG_QUENCH)
        {
          int st = holent_hrt_timelike_entropy (&b->geo, j->l[k], j->t[jt],
                                                j->dt[k], &j->sr[i],
                                                &j->si[i], &causal);
          if (st)
            {
              j->bad = k;
              return st;
            }
        }
      if (causal)
        {
          j->any_im = 1;
          continue;
        }
      size_t ncross;
      int horizon;
      j->sr[i] = entropy_one (j->g, b, &j->r, j->t[jt], &ncross, &horizon);
      if (j->si)
        j->si[i] = 0.0;
      j->pb[i] = horizon != 0;
    }
  return HOLENT_SUCCESS;
}

/* interval_entropy's time path: the interval [0, L(k)] with its right end
   DT(k) later, at each shift/time T(j); TIMELIKE: causal pairs give the
   timelike entropy.  */
static void
do_interval (const char *fn, int nlhs, mxArray *plhs[],
             const mxArray *prhs[])
{
  static const char *const lname[] = { "L" };
  gw_state g;
  time_bg b;
  holent_err err;
  memset (&g, 0, sizeof g);
  g.fn = fn;
  get_bg (fn, prhs[2], &b);
  size_t n, nt;
  const double *l = holent_gw_real (prhs[3], fn, "L", &n);
  const double *dt = real_array (fn, prhs[4], "dt", n);
  const double *t = holent_gw_real (prhs[5], fn, "t", &nt);
  int tl = holent_gw_scalar (prhs[6], fn, "timelike") != 0.0;
  for (size_t k = 0; k < n; k++)
    if (holent_interval_check (&b.geo, k, l[k], &err))
      holent_gw_raise_err (fn, &err, lname, 1);
  for (size_t k = 0; k < n; k++)
    {
      if (!isfinite (dt[k]))
        holent_gw_raise (fn, isnan (dt[k]) ? HOLENT_ENAN : HOLENT_EDOM, "dt",
                         k, "must be finite");
      if (b.kind == BG_QUENCH && dt[k] != 0.0)
        holent_gw_raise (fn, HOLENT_EUNSUP, NULL, HOLENT_NOINDEX,
                         "'dt' is not supported on a quench: the interval "
                         "lives at the time 't'");
    }
  for (size_t j = 0; j < nt; j++)
    if (!isfinite (t[j]))
      holent_gw_raise (fn, isnan (t[j]) ? HOLENT_ENAN : HOLENT_EDOM, "t", j,
                       "must be finite");
  alloc_ws (&g, 1);
  mxArray *S = mxCreateDoubleMatrix (n, nt, tl ? mxCOMPLEX : mxREAL);
  mxArray *br = mxCreateLogicalMatrix (n, nt);
  /* one row [0, L, 0, DT] (a quench: [0, L]) */
  mxArray *row = mxCreateDoubleMatrix (1, b.kind == BG_QUENCH ? 2 : 4,
                                       mxREAL);
  iv_job j = { .g = &g, .b = &b, .l = l, .dt = dt, .t = t, .n = n,
               .nt = nt, .tl = tl, .sr = mxGetPr (S),
               .si = tl ? mxGetPi (S) : NULL, .pb = mxGetLogicals (br),
               .row = row, .bad = HOLENT_NOINDEX };
  /* every (interval, time) pair, interval by interval, in slabs (Ctrl-C
     between them) */
  int st = holent_slab_run (n * nt, IV_SLAB, iv_slab, &j,
                            holent_gw_poll (fn));
  holent_gw_poll_end ();
  if (st)
    {
      mxDestroyArray (S);
      mxDestroyArray (br);
      mxDestroyArray (row);
      /* Ctrl-C (HOLENT_EINTR) too: fail frees, and raising it interrupts */
      fail (&g, st, "L", j.bad, "%s", st == HOLENT_ETIMELIKE
             ? "the ends of the interval are causally related "
               "and have no timelike entropy (a null pair, or "
               "a geodesic without a timelike branch)"
             : holent_strerror (st));
    }
  double *sr = j.sr;
  mxDestroyArray (row);
  release (&g);
  if (tl && !j.any_im)
    {
      /* all spacelike: a real array, as without the option */
      mxArray *R = mxCreateDoubleMatrix (n, nt, mxREAL);
      memcpy (mxGetPr (R), sr, n * nt * sizeof (double));
      mxDestroyArray (S);
      S = R;
    }
  plhs[0] = S;
  if (nlhs > 1)
    plhs[1] = br;
  else
    mxDestroyArray (br);
}

/* ---- causality ---- */

/* One slab of do_light; S1, S2: 0 for a scalar X1, X2 (repeated).  */
typedef struct
{
  const time_bg *b;
  const double *x1, *x2;
  size_t s1, s2;
  double tol, *tb, *tl;
  size_t bad;
} light_job;

/* Pairs per slab (well under a microsecond a pair).  */
#define LIGHT_SLAB ((size_t) 1 << 16)

static int
light_slab (void *ctx, size_t i0, size_t m)
{
  light_job *j = ctx;
  for (size_t i = i0; i < i0 + m; i++)
    {
      int st = holent_causal_times (&j->b->geo, j->x1[i * j->s1],
                                    j->x2[i * j->s2], j->tol, &j->tb[i],
                                    &j->tl[i]);
      if (st)
        {
          j->bad = i;
          return st;
        }
      if (j->b->kind != BG_STATIC)
        j->tb[i] = INFINITY;  /* behind a horizon (doc/bulk_causality.md) */
    }
  return HOLENT_SUCCESS;
}

/* X1 and X2 broadcast (equal sizes, or one of them a scalar).  */
static void
do_light (const char *fn, int nrhs, mxArray *plhs[],
          const mxArray *prhs[])
{
  time_bg b;
  get_bg (fn, prhs[2], &b);
  size_t n1, n2;
  const double *x1 = holent_gw_real (prhs[3], fn, "X1", &n1);
  const double *x2 = holent_gw_real (prhs[4], fn, "X2", &n2);
  const mxArray *shape = n1 == 1 ? prhs[4] : prhs[3];
  if (n1 != 1 && n2 != 1
      && (mxGetNumberOfDimensions (prhs[3])
            != mxGetNumberOfDimensions (prhs[4])
          || memcmp (mxGetDimensions (prhs[3]), mxGetDimensions (prhs[4]),
                     mxGetNumberOfDimensions (prhs[3]) * sizeof (mwSize))))
    holent_gw_raise (fn, HOLENT_ESIZE, "X2", HOLENT_NOINDEX,
                     "must have the size of X1 or be a scalar (X1 and X2 "
                     "do not broadcast)");
  double tol = -1.0;  /* absent: the core's default */
  if (nrhs > 5)
    {
      tol = holent_gw_scalar (prhs[5], fn, "tol");
      if (!(tol >= 0.0) || isinf (tol))
        holent_gw_raise (fn, HOLENT_EDOM, "tol", HOLENT_NOINDEX,
                         "must be nonnegative and finite");
    }
  mxArray *tb = holent_gw_result_like (shape);
  mxArray *tl = holent_gw_result_like (shape);
  light_job j = { &b, x1, x2, n1 == 1 ? 0 : 1, n2 == 1 ? 0 : 1, tol,
                  mxGetPr (tb), mxGetPr (tl), 0 };
  int st = holent_slab_run (mxGetNumberOfElements (shape), LIGHT_SLAB,
                            light_slab, &j, holent_gw_poll (fn));
  holent_gw_poll_end ();
  if (st)
    {
      mxDestroyArray (tb);
      mxDestroyArray (tl);
    }
  if (st == HOLENT_EINTR)
    holent_gw_interrupt ();
  if (st)
    {
      size_t i1 = j.bad * j.s1, i2 = j.bad * j.s2;
      int one = !isfinite (x1[i1]);
      double v = one ? x1[i1] : x2[i2];
      holent_gw_raise (fn, isnan (v) ? HOLENT_ENAN : HOLENT_EDOM,
                       one ? "X1" : "X2", one ? i1 : i2,
                       isnan (v) ? "must not be NaN"
                       : "must be finite, and X2 - X1 too");
    }
  plhs[0] = tb;
  plhs[1] = tl;
}

/* ---- two-sided mutual information ---- */

/* The two sides of a struct region, for the mutual-information zeros.  */
static void
two_sides (gw_state *g, const time_bg *b, const mxArray *a,
           holent_tfd_side sd[2])
{
  region_in r;
  if (b->kind != BG_TFD)
    fail (g, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
           "must be a thermofield double (ads3_background (\"tfd\", ...))");
  if (!mxIsStruct (a))
    fail (g, HOLENT_ETYPE, "A", HOLENT_NOINDEX,
           "must be a struct with fields left and right");
  read_region (g, a, b, "A", &r);
  size_t off = 0;
  for (int s = 0; s < 2; s++)
    {
      if (r.side[s] == NULL)
        fail (g, HOLENT_EEMPTY, r.name[s], HOLENT_NOINDEX,
               "has no intervals");
      side_cols (g, r.side[s], &sd[s], off);
      off += sd[s].n;
    }
}

static void
do_mi (const char *fn, int nlhs, int nrhs, mxArray *plhs[],
       const mxArray *prhs[], int scramble)
{
  gw_state g;
  time_bg b;
  holent_tfd_side sd[2];
  memset (&g, 0, sizeof g);
  g.fn = fn;
  get_bg (fn, prhs[2], &b);
  double tmax = -1.0;  /* absent: the core's default */
  if (!scramble && nrhs > 4)
    {
      tmax = holent_gw_scalar (prhs[4], fn, "tmax");
      if (!(tmax > 0.0) || isinf (tmax))
        holent_gw_raise (fn, HOLENT_EDOM, "tmax", HOLENT_NOINDEX,
                         "must be positive and finite");
    }
  alloc_ws (&g, region_rows (prhs[3]) + 1);
  two_sides (&g, &b, prhs[3], sd);
  double x, ts = NAN;
  int st;
  if (scramble)
    st = holent_tfd_scrambling (g.tw, &b.tfd, &sd[0], &sd[1], b.shock_energy,
                                &x, &ts);
  else
    st = holent_tfd_mi_zero (g.tw, &b.tfd, &sd[0], &sd[1], tmax, &x);
  if (st)
    fail_region (&g, st, "A", HOLENT_NOINDEX, HOLENT_NOINDEX);
  release (&g);
  if (scramble)
    {
      plhs[0] = mxCreateDoubleScalar (ts);
      if (nlhs > 1)
        plhs[1] = mxCreateDoubleScalar (x);
    }
  else
    plhs[0] = mxCreateDoubleScalar (x);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16], fn[64];
  holent_gw_init ();
  if (nrhs < 2)
    holent_gw_raise ("__holent_time__", HOLENT_ENARGS, NULL, HOLENT_NOINDEX,
                     "expected a mode and the public function's name");
  holent_gw_string (prhs[1], "__holent_time__", "FN", fn, sizeof fn);
  holent_gw_string (prhs[0], fn, "MODE", mode, sizeof mode);
  if (strcmp (mode, "background") == 0)
    {
      holent_gw_nargs (fn, nlhs, 1, nrhs, 13, 13);
      do_background (fn, plhs, prhs);
    }
  else if (strcmp (mode, "geodesic") == 0)
    {
      holent_gw_nargs (fn, nlhs, 2, nrhs, 11, 11);
      do_geodesic (fn, plhs, prhs);
    }
  else if (strcmp (mode, "entropy") == 0)
    {
      holent_gw_nargs (fn, nlhs, 3, nrhs, 5, 6);
      do_entropy (fn, nlhs, nrhs, plhs, prhs);
    }
  else if (strcmp (mode, "surface") == 0)
    {
      holent_gw_nargs (fn, nlhs, 11, nrhs, 6, 7);
      do_surface (fn, nlhs, plhs, nrhs, prhs);
    }
  else if (strcmp (mode, "interval") == 0)
    {
      holent_gw_nargs (fn, nlhs, 2, nrhs, 7, 7);
      do_interval (fn, nlhs, plhs, prhs);
    }
  else if (strcmp (mode, "light") == 0)
    {
      holent_gw_nargs (fn, nlhs, 2, nrhs, 5, 6);
      do_light (fn, nrhs, plhs, prhs);
    }
  else if (strcmp (mode, "mi_zero") == 0)
    {
      holent_gw_nargs (fn, nlhs, 1, nrhs, 4, 5);
      do_mi (fn, nlhs, nrhs, plhs, prhs, 0);
    }
  else if (strcmp (mode, "scramble") == 0)
    {
      holent_gw_nargs (fn, nlhs, 2, nrhs, 4, 4);
      do_mi (fn, nlhs, nrhs, plhs, prhs, 1);
    }
  else
    holent_gw_raise (fn, HOLENT_EOPTION, "MODE", HOLENT_NOINDEX,
                     "unknown mode '%s'", mode);
}
