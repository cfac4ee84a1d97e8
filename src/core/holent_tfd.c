/* holent_tfd.c: two-sided BTZ (thermofield double), the shock wave and
 * two-sided region minimisation.  Derivations: doc/tfd_shock.md.
 *
 * Copyright (C) 2026 The holent developers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <float.h>
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include "holent_tfd.h"
#include "holent_hrt.h"
#include "holent_thermo.h"

int
holent_tfd_init (holent_tfd_bg *b, int circle, double L, double eps,
                 double beta, double c, double alpha)
{
  if (b == NULL || isnan (alpha) || isnan (beta))
    return HOLENT_EINVAL;
  if (!(alpha >= 0.0) || !isfinite (alpha))
    return HOLENT_EDOM;
  int st = holent_geo_bg_init (&b->side,
                               circle ? HOLENT_BULK_BTZ
                                      : HOLENT_BULK_PLANAR_BTZ,
                               L, eps, beta, beta, 1.0, c);
  if (st)
    return st;
  b->beta = beta;
  b->alpha = alpha;
  return HOLENT_SUCCESS;
}

static int
black_hole_energy (int circle, double L, double beta, double c, double *M)
{
  if (isnan (L) || isnan (beta) || isnan (c))
    return HOLENT_EINVAL;
  if (!(beta > 0.0) || !(c > 0.0) || !isfinite (beta) || !isfinite (c)
      || (circle && (!(L > 0.0) || !isfinite (L))))
    return HOLENT_EDOM;
  /* E(T) = (pi c/6) L T^2: the thermal energy of the CFT, i.e. the BTZ
     mass r_+^2/(8G) above the massless BTZ (doc/tfd_shock.md).  */
  *M = M_PI * c / (6.0 * beta * beta) * (circle ? L : 1.0);
  return HOLENT_SUCCESS;
}

int
holent_tfd_shock_alpha (int circle, double L, double beta, double c,
                        double E, double tw, double *alpha, double *M)
{
  double m;
  if (alpha == NULL || isnan (E) || isnan (tw))
    return HOLENT_EINVAL;
  int st = black_hole_energy (circle, L, beta, c, &m);
  if (st)
    return st;
  if (!(E >= 0.0) || !isfinite (E) || !isfinite (tw))
    return HOLENT_EDOM;
  double la = log (E / (4.0 * m)) + 2.0 * M_PI * tw / beta;
  if (la > log (DBL_MAX))
    return HOLENT_EDOM;
  *alpha = E > 0.0 ? exp (la) : 0.0;
  if (M)
    *M = m;
  return HOLENT_SUCCESS;
}

int
holent_tfd_shock_time (int circle, double L, double beta, double c,
                       double E, double alpha, double *tw)
{
  double m;
  if (tw == NULL || isnan (E) || isnan (alpha))
    return HOLENT_EINVAL;
  int st = black_hole_energy (circle, L, beta, c, &m);
  if (st)
    return st;
  if (!(E > 0.0) || !(alpha > 0.0) || !isfinite (E) || !isfinite (alpha))
    return HOLENT_EDOM;
  *tw = beta / (2.0 * M_PI) * log (4.0 * m * alpha / E);
  return HOLENT_SUCCESS;
}

/* A positive finite parameter, or the reason why not.  */
static int
positive (holent_err *err, int arg, double v, const char *what)
{
  if (isnan (v))
    return holent_err_set (err, HOLENT_ENAN, arg, HOLENT_NOINDEX,
                           "%s must not be NaN", what);
  if (!(v > 0.0) || !isfinite (v))
    return holent_err_set (err, HOLENT_EDOM, arg, HOLENT_NOINDEX,
                           "%s must be positive and finite, got %g", what,
                           v);
  return HOLENT_SUCCESS;
}

int
holent_tfd_make (holent_tfd_bg *b, holent_tfd_info *info, int circle,
                 double L, double eps, double beta, double c, double ell,
                 int has_alpha,
                 double alpha, int has_energy, double E, int has_time,
                 double tw, holent_err *err)
{
  int st;
  holent_err_clear (err);
  if (b == NULL || info == NULL)
    return holent_err_set (err, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  if ((circle && (st = positive (err, HOLENT_TFD_ARG_L, L, "circumference")))
      || (st = positive (err, HOLENT_TFD_ARG_EPS, eps, "cutoff"))
      || (st = positive (err, HOLENT_TFD_ARG_BETA, beta, "beta"))
      || (st = positive (err, HOLENT_TFD_ARG_C, c, "c"))
      || (st = positive (err, HOLENT_TFD_ARG_ELL, ell, "ell")))
    return st;
  if (has_alpha && (has_energy || has_time))
    return holent_err_set (err, HOLENT_EOPTION, HOLENT_TFD_ARG_ALPHA,
                           HOLENT_NOINDEX,
                           "give 'shock_alpha' or 'shock_energy' with "
                           "'shock_time', not both");
  if (has_energy != has_time)
    return holent_err_set (err, HOLENT_EOPTION, has_energy
                           ? HOLENT_TFD_ARG_ENERGY : HOLENT_TFD_ARG_TIME,
                           HOLENT_NOINDEX,
                           "'shock_energy' and 'shock_time' go together");
  if (has_alpha && (isnan (alpha) || !(alpha >= 0.0) || !isfinite (alpha)))
    return holent_err_set (err, isnan (alpha) ? HOLENT_ENAN : HOLENT_EDOM,
                           HOLENT_TFD_ARG_ALPHA, HOLENT_NOINDEX,
                           "must be a nonnegative finite shift, got %g",
                           alpha);
  if (has_energy && (isnan (E) || !(E >= 0.0) || !isfinite (E)))
    return holent_err_set (err, isnan (E) ? HOLENT_ENAN : HOLENT_EDOM,
                           HOLENT_TFD_ARG_ENERGY, HOLENT_NOINDEX,
                           "must be a nonnegative finite energy, got %g", E);
  if (has_time && !isfinite (tw))
    return holent_err_set (err, isnan (tw) ? HOLENT_ENAN : HOLENT_EDOM,
                           HOLENT_TFD_ARG_TIME, HOLENT_NOINDEX,
                           "must be a finite time, got %g", tw);
  double a = has_alpha ? alpha : 0.0, m;
  st = holent_tfd_shock_alpha (circle, circle ? L : 1.0, beta, c,
                               has_energy ? E : 0.0, has_time ? tw : 0.0,
                               has_energy ? &a : &m, &m);
  if (st)
    return holent_err_set (err, HOLENT_ERANGE, HOLENT_TFD_ARG_TIME,
                           HOLENT_NOINDEX,
                           "the shift (E/(4M)) exp(2 pi tw/beta) overflows "
                           "double precision");
  if (!has_energy)
    a = has_alpha ? alpha : 0.0;
  st = holent_tfd_init (b, circle, L, eps, beta, c, a);
  if (st)
    return holent_err_set (err, HOLENT_EINCONSISTENT, -1, HOLENT_NOINDEX,
                           "the parameters give no black hole (%s)",
                           holent_strerror (st));
  info->entropy_density = M_PI * c / (3.0 * beta);
  info->r_plus = (circle ? L : 2.0 * M_PI) / beta;
  info->S_BH = INFINITY;
  info->M = INFINITY;
  if (circle)
    {
      holent_thermo_state th;
      int why;
      st = holent_thermo_state_from (c, ell, L, HOLENT_THERMO_BETA_LR, beta,
                                     beta, &th, &why);
      if (st || !isfinite (th.S) || !isfinite (th.M))
        return holent_err_set (err, HOLENT_ERANGE, HOLENT_TFD_ARG_BETA,
                               HOLENT_NOINDEX,
                               "the horizon entropy or energy is out of "
                               "double precision range");
      info->S_BH = th.S;
      info->M = th.M;
      info->r_plus = th.r_plus;
    }
  info->shock_alpha = a;
  info->shock_energy = has_energy ? E : 0.0;
  info->shock_time = has_time ? tw : NAN;
  info->shock_M = m;
  return HOLENT_SUCCESS;
}

/* log cosh x without overflow.  */
static double
lncosh (double x)
{
  x = fabs (x);
  return x + log1p (exp (-2.0 * x)) - M_LN2;
}

/* log(e^p + e^q) without overflow.  */
static double
logaddexp (double p, double q)
{
  return p > q ? p + log1p (exp (q - p)) : q + log1p (exp (p - q));
}

/* The bridge geodesic for a lifted separation dx = xR - xL (no
   reduction: on a circle each winding class has its own dx).  */
static int
cross_len (const holent_tfd_bg *b, double dx, double tL, double tR,
           double *len)
{
  double k = M_PI / b->beta, T = tL + tR;
  if (!isfinite (dx) || !isfinite (T))
    return HOLENT_EINVAL;
  /* log of sqrt(cosh cosh), then add the shock term in log space.  */
  double g = 0.5 * (lncosh (k * (T + dx)) + lncosh (k * (T - dx)));
  if (b->alpha > 0.0)
    {
      double h = log (0.5 * b->alpha) + k * (tL - tR);
      g = logaddexp (g, h);
    }
  *len = b->side.pref + 2.0 * g;
  return isfinite (*len) ? HOLENT_SUCCESS : HOLENT_EDOM;
}

int
holent_tfd_cross_length (const holent_tfd_bg *b, double xL, double tL,
                         double xR, double tR, double *len)
{
  if (b == NULL || len == NULL)
    return HOLENT_EINVAL;
  if (!isfinite (xL) || !isfinite (tL) || !isfinite (xR) || !isfinite (tR)
      || !isfinite (xR - xL))
    return HOLENT_EINVAL;
  double dx = xR - xL;
  /* Shortest winding: the length grows with |dx|.  */
  if (b->side.circle)
    dx = remainder (dx, b->side.L);
  return cross_len (b, dx, tL, tR, len);
}

int
holent_tfd_cross_length_winding (const holent_tfd_bg *b, double xL,
                                 double tL, double xR, double tR,
                                 long winding, double *len)
{
  if (b == NULL || len == NULL)
    return HOLENT_EINVAL;
  if (!isfinite (xL) || !isfinite (tL) || !isfinite (xR) || !isfinite (tR)
      || !isfinite (xR - xL))
    return HOLENT_EINVAL;
  if (winding != 0 && !b->side.circle)
    return HOLENT_EDOM;
  return cross_len (b, (xR - xL) + (double) winding * b->side.L, tL, tR,
                    len);
}

int
holent_tfd_shock_crossing (const holent_tfd_bg *b, double xL, double tL,
                           double xR, double tR, double *x, double *v)
{
  if (b == NULL || x == NULL || v == NULL)
    return HOLENT_EINVAL;
  if (!isfinite (xL) || !isfinite (tL) || !isfinite (xR) || !isfinite (tR)
      || !isfinite (xR - xL))
    return HOLENT_EINVAL;
  /* Kruskal R in boundary units: R x and R t are 2 pi x/beta, 2 pi t/beta
     on the line and on the circle alike.  The crossing (u = 0, v, x) in
     the right coordinates, (0, v + alpha, x) in the left ones; the legs'
     -X.P are cosh(R(x - xR)) - a v and cosh(R(x - xL)) + b (v + alpha),
     a = e^{-R tR}, b = e^{R tL} (doc/tfd_shock.md, section 2).  Their
     product is stationary at v = (b C_R - a C_L - a b alpha)/(2ab) (a
     maximum) and, after that, at the x minimising b C_R + a C_L:
     e^{2R(x - xm)} = (b e^{R h} + a e^{-R h})/(b e^{-R h} + a e^{R h}),
     xm and h the midpoint and half the separation (kept apart so that
     large x lose nothing).  */
  double R = 2.0 * M_PI / b->beta, xm = 0.5 * (xL + xR), h = 0.5 * (xR - xL);
  double y = 0.5 * (logaddexp (R * (tL + h), -R * (tR + h))
                    - logaddexp (R * (tL - h), R * (h - tR)));
  *x = xm + y / R;
  /* v = C_R/(2a) - C_L/(2b) - alpha/2 */
  *v = 0.5 * (exp (R * tR) * cosh (y - R * h) - exp (-R * tL) * cosh (y + R * h)
              - b->alpha);
  return isfinite (*x) && isfinite (*v) ? HOLENT_SUCCESS : HOLENT_ERANGE;
}

int
holent_tfd_side_length (const holent_tfd_bg *b, double x1, double t1,
                        double x2, double t2, holent_geo_class cls,
                        double *len)
{
  double im;
  if (b == NULL || len == NULL)
    return HOLENT_EINVAL;
  return holent_hrt_length (&b->side, x1, t1, x2, t2, cls, 0, len, &im);
}

struct holent_tfd_workspace
{
  size_t nmax;
  holent_rt_workspace *rt;
  holent_region *reg[2], *fake;
  double *tp[2];       /* endpoint times of each side              */
  double *x, *t;       /* combined endpoints in the bridge order   */
  double *lift;        /* multiples of L added to x (circle)       */
  size_t *idx;         /* sorted endpoint index within its side    */
  double *pmin;        /* half the cheapest length at each point   */
  int *side;
  double *fa, *fb;     /* rows of the stand-in region              */
  size_t *pairs;
  holent_poll poll;    /* between the cuts of the annulus          */
  double *arcs;        /* one-sided: the arcs of the minimiser      */
  size_t nconf;        /* endpoints of the last minimiser           */
  int have_conf;       /* a minimiser is kept                       */
  int annulus;         /* the last minimiser was the circle's annulus */
  /* the annulus' minimiser (holent_tfd_minimiser): per side and face of
     the hole (0 outside A_s, 1 inside) the one-sided pairs and arcs; the
     configuration in the bridge order, its windings, the horizon */
  size_t *spairs[2][2];
  double *sarcs[2][2];
  double *cx, *ct, *carcs;
  int *cside;
  size_t *cpairs;
  long *cwind;
  int chorizon, chside;
};

int
holent_tfd_workspace_set_poll (holent_tfd_workspace *w,
                               const holent_poll *poll)
{
  if (w == NULL)
    return HOLENT_EINVAL;
  w->poll.fn = poll ? poll->fn : NULL;
  w->poll.ctx = poll ? poll->ctx : NULL;
  return holent_rt_set_poll (w->rt, poll);
}

holent_tfd_workspace *
holent_tfd_workspace_alloc (size_t nmax)
{
  if (nmax == 0 || nmax > HOLENT_RT_NMAX)
    return NULL;
  holent_tfd_workspace *w = calloc (1, sizeof *w);
  if (w == NULL)
    return NULL;
  size_t N = 2 * nmax;
  w->nmax = nmax;
  w->rt = holent_rt_workspace_alloc_dp (nmax);
  w->reg[0] = holent_region_alloc (nmax);
  w->reg[1] = holent_region_alloc (nmax);
  w->fake = holent_region_alloc (nmax);
  w->tp[0] = malloc (N * sizeof (double));
  w->tp[1] = malloc (N * sizeof (double));
  w->x = malloc (N * sizeof (double));
  w->t = malloc (N * sizeof (double));
  w->lift = malloc (N * sizeof (double));
  w->idx = malloc (N * sizeof (size_t));
  w->pmin = malloc (N * sizeof (double));
  w->side = malloc (N * sizeof (int));
  w->fa = malloc (nmax * sizeof (double));
  w->fb = malloc (nmax * sizeof (double));
  w->pairs = malloc (N * sizeof (size_t));
  w->arcs = malloc (nmax * sizeof (double));
  int fail = 0;
  for (int s = 0; s < 2; s++)
    for (int f = 0; f < 2; f++)
      {
        w->spairs[s][f] = malloc (N * sizeof (size_t));
        w->sarcs[s][f] = malloc (nmax * sizeof (double));
        fail |= !w->spairs[s][f] || !w->sarcs[s][f];
      }
  w->cx = malloc (N * sizeof (double));
  w->ct = malloc (N * sizeof (double));
  w->carcs = malloc (nmax * sizeof (double));
  w->cside = malloc (N * sizeof (int));
  w->cpairs = malloc (N * sizeof (size_t));
  w->cwind = malloc (nmax * sizeof (long));
  fail |= !w->cx || !w->ct || !w->carcs || !w->cside || !w->cpairs
          || !w->cwind;
  if (fail || !w->arcs || !w->rt || !w->reg[0] || !w->reg[1] || !w->fake || !w->tp[0]
      || !w->tp[1] || !w->x || !w->t || !w->lift || !w->idx || !w->pmin || !w->side || !w->fa
      || !w->fb || !w->pairs)
    {
      holent_tfd_workspace_free (w);
      return NULL;
    }
  return w;
}

void
holent_tfd_workspace_free (holent_tfd_workspace *w)
{
  if (w == NULL)
    return;
  holent_rt_workspace_free (w->rt);
  holent_region_free (w->reg[0]);
  holent_region_free (w->reg[1]);
  holent_region_free (w->fake);
  free (w->tp[0]);
  free (w->tp[1]);
  free (w->x);
  free (w->t);
  free (w->lift);
  free (w->idx);
  free (w->pmin);
  free (w->side);
  free (w->fa);
  free (w->fb);
  free (w->pairs);
  free (w->arcs);
  for (int s = 0; s < 2; s++)
    for (int f = 0; f < 2; f++)
      {
        free (w->spairs[s][f]);
        free (w->sarcs[s][f]);
      }
  free (w->cx);
  free (w->ct);
  free (w->carcs);
  free (w->cside);
  free (w->cpairs);
  free (w->cwind);
  free (w);
}

/* Windings of the lifted separations in the annulus' cuts: lifts of
   the right points 0 or 1, of the left ones m or m + 1 with |m| <= 2.  */
#define TFD_WMAX 3

/* Lengths of the annulus, computed once for all its cuts: per side
   (sorted indices i != j) the geodesic over the arc from i to j in the
   positive sense, and per left-right pair and winding the bridge.  */
typedef struct
{
  size_t n[2];
  double *arc[2];   /* n[s] x n[s]                              */
  double *cross;    /* n[0] x n[1] x (2 TFD_WMAX + 1)            */
} tfd_table;

typedef struct
{
  const holent_tfd_bg *b;
  const double *x, *t, *lift;
  const size_t *idx;
  const int *side;
  const tfd_table *tab;  /* NULL: evaluate each length */
} tfd_ctx;

/* Lengths for the minimiser over the bridge order (right ascending, then
   left descending; coordinates x + lift L): within a side, the geodesic
   over the arc between the two lifted points (the one that does not
   cross a cut); through the bridge, the winding of the lifted
   separation.  */
static int
tfd_cost (void *vctx, size_t i, size_t j, double arc, double *len)
{
  const tfd_ctx *c = vctx;
  double im, L = c->b->side.L;
  (void) arc;
  if (c->side[i] == c->side[j])
    {
      /* lo has the smaller lifted x: first on the right, last on the
         left.  */
      size_t lo = (i < j) == (c->side[i] == 1) ? i : j, hi = i + j - lo;
      if (c->tab)
        {
          const int s = c->side[i];
          *len = c->tab->arc[s][c->idx[lo] * c->tab->n[s] + c->idx[hi]];
          return HOLENT_SUCCESS;
        }
      return holent_hrt_length (&c->b->side, c->x[lo], c->t[lo], c->x[hi],
                                c->t[hi], c->b->side.circle
                                ? HOLENT_GEO_POSITIVE : HOLENT_GEO_SHORTER,
                                0, len, &im);
    }
  size_t l = c->side[i] == 0 ? i : j, r = i + j - l;
  double wd = c->lift[r] - c->lift[l];
  if (c->tab && fabs (wd) <= TFD_WMAX)
    {
      size_t k = (c->idx[l] * c->tab->n[1] + c->idx[r])
                 * (2 * TFD_WMAX + 1) + (size_t) (wd + TFD_WMAX);
      *len = c->tab->cross[k];
      return HOLENT_SUCCESS;
    }
  double dx = c->x[r] - c->x[l];
  if (c->b->side.circle)
    dx += (c->lift[r] - c->lift[l]) * L;
  return cross_len (c->b, dx, c->t[l], c->t[r], len);
}

/* Normalise one side into w->reg[s] and w->tp[s]; a whole circle has no
   endpoints and so no times.  */
static int
set_side (holent_tfd_workspace *w, const holent_tfd_bg *b, int s,
          const holent_tfd_side *in, double dt, size_t *bad_row)
{
  holent_region *r = w->reg[s];
  size_t bad = 0;
  int st = holent_region_set (r, b->side.circle, b->side.L, in->n, in->a,
                              in->b);
  if (st)
    {
      *bad_row = r->bad[0];
      return st;
    }
  if (r->whole)
    return HOLENT_SUCCESS;
  st = holent_hrt_region_times (r, in->n, in->ta, in->tb, w->tp[s], &bad);
  if (st)
    {
      *bad_row = bad;
      return st;
    }
  for (size_t i = 0; i < 2 * r->n; i++)
    w->tp[s][i] += dt;
  /* Each side must be achronal.  */
  for (size_t i = 0; i < 2 * r->n; i++)
    for (size_t j = i + 1; j < 2 * r->n; j++)
      if (!holent_hrt_spacelike (&b->side, r->pts[i], w->tp[s][i],
                                 r->pts[j], w->tp[s][j]))
        return HOLENT_ETIMELIKE;
  return HOLENT_SUCCESS;
}

/* Point k of the bridge order: side s, sorted endpoint i, lifted by m.  */
static void
put_point (holent_tfd_workspace *w, size_t k, int s, size_t i, double m)
{
  w->x[k] = w->reg[s]->pts[i];
  w->t[k] = w->tp[s][i];
  w->side[k] = s;
  w->lift[k] = m;
  w->idx[k] = i;
}

static void
table_free (tfd_table *T)
{
  free (T->arc[0]);
  free (T->arc[1]);
  free (T->cross);
}

/* Fill T for the two sides in w (HOLENT_ENOMEM: evaluate each length
   instead).  The same calls as tfd_cost makes, so the same numbers.  */
static int
table_fill (holent_tfd_workspace *w, const holent_tfd_bg *b, tfd_table *T)
{
  const size_t nl = 2 * w->reg[0]->n, nr = 2 * w->reg[1]->n;
  const size_t nw = 2 * TFD_WMAX + 1;
  T->n[0] = nl;
  T->n[1] = nr;
  T->arc[0] = T->arc[1] = T->cross = NULL;
  /* Past some 10^7 entries the tables cost more memory than they save
     (and the cuts take hours anyway).  */
  if ((double) (nl * nl + nr * nr + nw * nl * nr) > 1e7)
    return HOLENT_ENOMEM;
  T->arc[0] = malloc (nl * nl * sizeof (double));
  T->arc[1] = malloc (nr * nr * sizeof (double));
  T->cross = malloc (nw * nl * nr * sizeof (double));
  if (!T->arc[0] || !T->arc[1] || !T->cross)
    {
      table_free (T);
      return HOLENT_ENOMEM;
    }
  for (int s = 0; s < 2; s++)
    {
      const holent_region *r = w->reg[s];
      const size_t n = T->n[s];
      for (size_t i = 0; i < n; i++)
        for (size_t j = 0; j < n; j++)
          {
            double im, *v = &T->arc[s][i * n + j];
            *v = INFINITY;
            if (i != j)
              {
                int st = holent_hrt_length (&b->side, r->pts[i],
                                            w->tp[s][i], r->pts[j],
                                            w->tp[s][j], HOLENT_GEO_POSITIVE,
                                            0, v, &im);
                if (st)
                  {
                    table_free (T);
                    return st;
                  }
              }
          }
    }
  const double *xl = w->reg[0]->pts, *xr = w->reg[1]->pts;
  for (size_t i = 0; i < nl; i++)
    for (size_t j = 0; j < nr; j++)
      for (size_t k = 0; k < nw; k++)
        {
          double dx = (xr[j] - xl[i]) + ((double) k - TFD_WMAX) * b->side.L;
          int st = cross_len (b, dx, w->tp[0][i], w->tp[1][j],
                              &T->cross[(i * nr + j) * nw + k]);
          if (st)
            {
              table_free (T);
              return st;
            }
        }
  return HOLENT_SUCCESS;
}

/* The stand-in region: n intervals on a line, so the minimiser runs its
   linear case (every non-crossing pairing) over the bridge order.  */
static int
set_fake (holent_tfd_workspace *w, size_t n, holent_geo_bg *line,
          double c)
{
  for (size_t k = 0; k < n; k++)
    {
      w->fa[k] = 2.0 * k;
      w->fb[k] = 2.0 * k + 1.0;
    }
  int st = holent_region_set (w->fake, 0, 0.0, n, w->fa, w->fb);
  if (st)
    return st;
  return holent_geo_bg_init (line, HOLENT_BULK_POINCARE, 0.0, 1e-3, 0, 0, 1,
                             c);
}

/* Geodesics through the bridge among the minimiser's pairs.  */
static size_t
count_cross (const holent_tfd_workspace *w, size_t n)
{
  size_t k, nc = 0;
  for (k = 0; k < n; k++)
    nc += w->side[w->pairs[2 * k]] != w->side[w->pairs[2 * k + 1]];
  return nc;
}

/* The one-sided values of side s on the annulus (lengths): sig[0] the
   best candidate whose horizon face lies outside A_s, sig[1] the best
   whose face lies in A_s (which is sig[0] of the complement: the same
   endpoints with the other parity).  The whole circle: Inf and 0 (it is
   itself homologous to the horizon).  */
static int
side_sigmas (holent_tfd_workspace *w, const holent_tfd_bg *b, int s,
             double sig[2], double *count, double *lcount)
{
  const holent_region *r = w->reg[s];
  *count = 1.0;
  *lcount = 0.0;
  if (r->whole)
    {
      sig[0] = INFINITY;
      sig[1] = 0.0;
      return HOLENT_SUCCESS;
    }
  holent_geo_bg g = b->side;
  g.S_BH = INFINITY;  /* never the horizon: the face outside A */
  holent_region comp = *r;
  comp.start0 = !r->start0;
  for (int h = 0; h < 2; h++)
    {
      holent_rt_result res;
      size_t bi, bj;
      int st = holent_hrt_entropy (w->rt, &g, h ? &comp : r, w->tp[s], &res,
                                   w->spairs[s][h], w->sarcs[s][h], &bi,
                                   &bj);
      if (st)
        return st;
      sig[h] = res.length;
    }
  return holent_rt_count (&b->side, r->n, count, lcount);
}

/* log(e^a + e^b).  */
static double
log_add (double a, double b)
{
  double m = fmax (a, b);
  return m + log1p (exp (-fabs (a - b)));
}

/* Whether the minimum lies strictly below S(A_L) + S(A_R) (the mutual
   information is positive): corr[0] at these times, corr[1] without any
   geodesic through the bridge (its limit at late times or large
   shocks).  */
typedef struct
{
  int now, late;
} tfd_corr;

/* Index of sorted endpoint i of side s in the bridge order of the
   annulus' configuration: right ascending, then left descending.  */
static size_t
conf_index (const holent_tfd_workspace *w, int s, size_t i)
{
  const size_t nr = 2 * w->reg[1]->n, nl = 2 * w->reg[0]->n;
  return s ? i : nr + (nl - 1 - i);
}

/* Pair k of the annulus' configuration: sorted endpoints i of side si and
   j of side sj, the arc within a side (NaN across), the winding.  */
static void
conf_pair (holent_tfd_workspace *w, size_t k, int si, size_t i, int sj,
           size_t j, double arc, long winding)
{
  size_t a = conf_index (w, si, i), c = conf_index (w, sj, j);
  w->cpairs[2 * k] = a < c ? a : c;
  w->cpairs[2 * k + 1] = a < c ? c : a;
  w->carcs[k] = arc;
  w->cwind[k] = winding;
}

/* The minimiser of the cut along the bridge (right i, left j) of lifted
   separation xR - xL - m L: that bridge and the n1 pairs of w->pairs over
   the cut's lifted points (doc/tfd_shock.md, section 3).  */
static void
conf_cut (holent_tfd_workspace *w, size_t i, size_t j, double m, size_t n1,
          double Lc)
{
  conf_pair (w, 0, 1, i, 0, j, NAN, -(long) m);
  for (size_t k = 0; k < n1; k++)
    {
      size_t p = w->pairs[2 * k], q = w->pairs[2 * k + 1];
      if (w->side[p] == w->side[q])
        conf_pair (w, k + 1, w->side[p], w->idx[p], w->side[q], w->idx[q],
                   fabs ((w->x[q] + w->lift[q] * Lc)
                         - (w->x[p] + w->lift[p] * Lc)), 0);
      else
        {
          size_t l = w->side[p] == 0 ? p : q, r = p + q - l;
          conf_pair (w, k + 1, 1, w->idx[r], 0, w->idx[l], NAN,
                     (long) (w->lift[r] - w->lift[l]));
        }
    }
  w->chorizon = 0;
  w->chside = -1;
}

/* The minimiser without bridges: side s with the face of the hole
   outside (f[s] = 0) or inside A_s (the complement's pairs).  */
static void
conf_sides (holent_tfd_workspace *w, const int f[2], int horizon)
{
  size_t k = 0;
  for (int s = 0; s < 2; s++)
    for (size_t q = 0; q < w->reg[s]->n; q++, k++)
      conf_pair (w, k, s, w->spairs[s][f[s]][2 * q], s,
                 w->spairs[s][f[s]][2 * q + 1], w->sarcs[s][f[s]][q], 0);
  w->chorizon = horizon;
  w->chside = horizon ? (f[1] ? 1 : 0) : -1;
}

/* Sort the m pairs of the annulus' configuration by first index (with
   their arcs and windings).  */
static void
conf_sort (holent_tfd_workspace *w, size_t m)
{
  /* insertion, once per minimisation: O(m^2) at worst, nothing beside
     the O(N^3) minimiser */
  for (size_t k = 1; k < m; k++)
    {
      size_t a = w->cpairs[2 * k], b = w->cpairs[2 * k + 1], q = k;
      double arc = w->carcs[k];
      long wd = w->cwind[k];
      for (; q > 0 && w->cpairs[2 * (q - 1)] > a; q--)
        {
          w->cpairs[2 * q] = w->cpairs[2 * (q - 1)];
          w->cpairs[2 * q + 1] = w->cpairs[2 * (q - 1) + 1];
          w->carcs[q] = w->carcs[q - 1];
          w->cwind[q] = w->cwind[q - 1];
        }
      w->cpairs[2 * q] = a;
      w->cpairs[2 * q + 1] = b;
      w->carcs[q] = arc;
      w->cwind[q] = wd;
    }
}

/* The configurations with geodesics through the bridge: every cut
   (doc/tfd_shock.md, section 3); res and *ncross are updated where a cut
   beats them.  */
static int
annulus_cuts (holent_tfd_workspace *w, const holent_tfd_bg *b,
              const tfd_ctx *c, holent_rt_result *res, size_t *ncross)
{
  const holent_region *R = w->reg[1], *Lr = w->reg[0];
  const size_t nr = 2 * R->n, nl = 2 * Lr->n;
  const double c6 = b->side.c / 6.0, Lc = b->side.L;
  /* Cut along a bridge (rb, lb): the rest is a disk whose boundary, in
     the bridge order, is the right circle from rb up to rb + L and the
     left circle from lb + L down to lb.  rb and lb must be of the same
     kind (both starts or both ends) for the faces beside the cut to agree
     with A.  */
  holent_geo_bg line;
  const size_t n1 = (nr + nl) / 2 - 1;
  int st = set_fake (w, n1, &line, b->side.c);
  if (st)
    return st;
  double cut_count, cut_lcount;
  st = holent_rt_count (&line, n1, &cut_count, &cut_lcount);
  if (st)
    return st;
  /* A lower bound on the rest of a cut, from the dual of the matching
     LP: point weights y with y_p + y_q <= the cheapest length of any
     pair (any class or winding of the tables) give sum y <= the cost of
     every perfect matching of any subset of the points, crossing or not
     (weak duality of the matching LP; common practice).  Start from half the cheapest length at each
     point, then raise each y_p to min_q (w(p, q) - y_q) in two sweeps
     (coordinate ascent: feasibility is kept).  Cuts that cannot beat the
     best so far are skipped (with a margin above the rounding of the
     sums), which prunes most of them.  */
  double *mins = w->pmin;  /* left points, then right ones */
  double lb_all = 0.0, lb_abs = 0.0;
  int prune = c->tab != NULL;
  for (int sweep = 0; prune && sweep < 3; sweep++)
    for (size_t q = 0; q < nl + nr; q++)
      {
        const int s = q < nl ? 0 : 1;
        const size_t p = s ? q - nl : q, n = c->tab->n[s];
        const size_t nw = 2 * TFD_WMAX + 1, off = s ? nl : 0;
        const size_t ooff = s ? 0 : nl;
        double m = INFINITY;
        for (size_t u = 0; u < n; u++)
          if (u != p)
            m = fmin (m, fmin (c->tab->arc[s][p * n + u],
                               c->tab->arc[s][u * n + p])
                           - (sweep ? mins[off + u] : 0.0));
        for (size_t u = 0; u < (s ? nl : nr); u++)
          {
            double mc = INFINITY;
            for (size_t k = 0; k < nw; k++)
              mc = fmin (mc, c->tab->cross[(s ? u * nr + p : p * nr + u)
                                           * nw + k]);
            m = fmin (m, mc - (sweep ? mins[ooff + u] : 0.0));
          }
        /* sweep 0: half the cheapest; later: the largest feasible */
        mins[q] = sweep ? m : 0.5 * m;
      }
  for (size_t q = 0; prune && q < nl + nr; q++)
    {
      lb_all += mins[q];
      lb_abs += fabs (mins[q]);
    }
  const double total = (double) nr * (double) nl;
  for (size_t i = 0; i < nr; i++)
    {
      if (w->poll.fn && w->poll.fn (w->poll.ctx, (double) i * nl, total))
        return HOLENT_EINTR;
      int kind_r = ((i & 1) == 0) == (R->start0 != 0);
      for (size_t j = 0; j < nl; j++)
        {
          int kind_l = ((j & 1) == 0) == (Lr->start0 != 0);
          if (kind_r != kind_l)
            continue;
          /* The shortest winding (and the other one at a tie): an
             optimum always has a bridge of |dx| <= L/2, section 3.  */
          double d0 = Lr->pts[j] - R->pts[i];
          double m0 = -nearbyint (d0 / Lc);
          for (int alt = 0; alt < 2; alt++)
            {
              double m = m0, dd = d0 + m0 * Lc;
              if (alt)
                {
                  m = m0 + (dd > 0.0 ? -1.0 : 1.0);
                  dd = d0 + m * Lc;
                  if (fabs (dd) > 0.5 * Lc * (1.0 + 1e-9))
                    continue;
                }
              double lb;
              st = cross_len (b, -dd, w->tp[0][j], w->tp[1][i], &lb);
              if (st)
                return st;
              res->candidates += cut_count;
              res->log_candidates = log_add (res->log_candidates,
                                             cut_lcount);
              if (prune)
                {
                  double rest = lb_all - mins[j] - mins[nl + i];
                  double tol = 1e-12 * (c6 * (fabs (lb) + 2.0 * lb_abs)
                                        + fabs (res->S));
                  if (c6 * (lb + rest) > res->S + tol)
                    continue;
                }
              size_t k = 0;
              for (size_t p = i + 1; p < nr; p++)
                put_point (w, k++, 1, p, 0.0);
              for (size_t p = 0; p < i; p++)
                put_point (w, k++, 1, p, 1.0);
              for (size_t p = j; p-- > 0;)
                put_point (w, k++, 0, p, m + 1.0);
              for (size_t p = nl; p-- > j + 1;)
                put_point (w, k++, 0, p, m);
              holent_rt_result r1;
              st = holent_rt_entropy_cost (w->rt, &line, w->fake, tfd_cost,
                                           (void *) c, &r1, w->pairs,
                                           NULL);
              if (st)
                return st;
              double S = c6 * (lb + r1.length);
              if (S < res->S)
                {
                  res->S = S;
                  res->length = lb + r1.length;
                  res->horizon = 0;
                  if (ncross)
                    *ncross = 1 + count_cross (w, n1);
                  conf_cut (w, i, j, m, n1, Lc);
                }
            }
        }
    }
  return HOLENT_SUCCESS;
}

/* The annulus (both sides of a circle; doc/tfd_shock.md, section 3).  */
static int
annulus_entropy (holent_tfd_workspace *w, const holent_tfd_bg *b,
                 holent_rt_result *res, size_t *ncross, tfd_corr *corr,
                 int *bad_side)
{
  const double c6 = b->side.c / 6.0, SBH = b->side.S_BH, Lc = b->side.L;
  double sig[2][2], cnt[2], lcnt[2];
  for (int s = 0; s < 2; s++)
    {
      int st = side_sigmas (w, b, s, sig[s], &cnt[s], &lcnt[s]);
      if (st)
        {
          *bad_side = s;
          return st;
        }
    }
  /* No bridge: each side's face of the hole in or out of A_s; the
     horizon exactly when one (not both) is in: Z2 homology.  */
  const double len[4] = { sig[0][0] + sig[1][0], sig[0][1] + sig[1][1],
                          sig[0][0] + sig[1][1], sig[0][1] + sig[1][0] };
  int hbest = 0;
  double best = INFINITY;
  for (int h = 0; h < 4; h++)
    {
      double S = c6 * len[h] + (h >= 2 ? SBH : 0.0);
      if (S < best)
        {
          best = S;
          hbest = h;
        }
    }
  /* S(A_L) + S(A_R) one-sided: the same sums, but both faces inside
     need a horizon on each side.  */
  double one = c6 * len[1] + 2.0 * SBH;
  for (int h = 0; h < 4; h++)
    if (h != 1)
      one = fmin (one, c6 * len[h] + (h >= 2 ? SBH : 0.0));
  corr->late = best < one;
  const holent_region *R = w->reg[1], *Lr = w->reg[0];
  const size_t nr = 2 * R->n, nl = 2 * Lr->n;
  res->S = best;
  res->length = len[hbest];
  res->horizon = hbest >= 2;
  res->m = (nr + nl) / 2;
  res->candidates = cnt[0] * cnt[1];
  res->log_candidates = lcnt[0] + lcnt[1];
  /* the configuration's endpoints in the bridge order, and the best
     without bridges (the cuts replace it when they beat it) */
  for (int s = 0; s < 2; s++)
    for (size_t i = 0; i < 2 * w->reg[s]->n; i++)
      {
        size_t k = conf_index (w, s, i);
        w->cx[k] = w->reg[s]->pts[i];
        w->ct[k] = w->tp[s][i];
        w->cside[k] = s;
      }
  const int face[2] = { hbest == 1 || hbest == 3, hbest == 1 || hbest == 2 };
  conf_sides (w, face, hbest >= 2);
  res->n_short = 0;
  for (int s = 0; s < 2; s++)
    {
      const holent_region *r = w->reg[s];
      size_t np = 2 * r->n;
      for (size_t i = 0; i < np; i++)
        res->n_short += (i + 1 < np ? r->pts[i + 1] : r->pts[0] + Lc)
                        - r->pts[i] <= 2.0 * b->side.eps;
    }
  w->nconf = nr + nl;
  if (nr == 0 || nl == 0)
    {
      corr->now = corr->late;
      conf_sort (w, res->m);
      return HOLENT_SUCCESS;
    }

  tfd_table T;
  int st = table_fill (w, b, &T);
  if (st && st != HOLENT_ENOMEM)
    return st;
  tfd_ctx c = { b, w->x, w->t, w->lift, w->idx, w->side, st ? NULL : &T };
  st = annulus_cuts (w, b, &c, res, ncross);
  if (c.tab)
    table_free (&T);
  if (st)
    return st;
  conf_sort (w, res->m);
  corr->now = res->S < one;
  return HOLENT_SUCCESS;
}

/* holent_tfd_entropy, and whether the mutual information is positive.  */
static int
tfd_entropy (holent_tfd_workspace *w, const holent_tfd_bg *b,
             const holent_tfd_side *left, const holent_tfd_side *right,
             double dt, holent_rt_result *res, size_t *ncross,
             tfd_corr *corr, int *bad_side, size_t *bad_row)
{
  tfd_corr dummy_corr;
  if (corr == NULL)
    corr = &dummy_corr;
  corr->now = corr->late = 0;
  size_t dummy_row;
  int dummy_side;
  if (bad_row == NULL)
    bad_row = &dummy_row;
  if (bad_side == NULL)
    bad_side = &dummy_side;
  *bad_side = -1;
  *bad_row = (size_t) -1;
  if (w == NULL || b == NULL || left == NULL || right == NULL
      || res == NULL || !isfinite (dt))
    return HOLENT_EINVAL;
  const holent_tfd_side *in[2] = { left, right };
  size_t ntot = left->n + right->n;
  if (ntot == 0)
    return HOLENT_EEMPTY;
  if (ntot > w->nmax)
    return HOLENT_ETOOBIG;
  for (int s = 0; s < 2; s++)
    if (in[s]->n > 0)
      {
        int st = set_side (w, b, s, in[s], dt, bad_row);
        if (st)
          {
            *bad_side = s;
            return st;
          }
      }
  if (ncross)
    *ncross = 0;
  w->nconf = 0;
  w->annulus = 0;
  w->have_conf = 0;
  w->chorizon = 0;
  w->chside = -1;
  if (left->n == 0 || right->n == 0)
    {
      /* One side: the one-sided BTZ problem (times do not matter to the
         static exterior beyond their differences).  */
      int s = left->n == 0;
      size_t bi, bj, np = 2 * w->reg[s]->n;
      int st = holent_hrt_entropy (w->rt, &b->side, w->reg[s], w->tp[s],
                                   res, w->pairs, w->arcs, &bi, &bj);
      if (st)
        {
          *bad_side = s;
          return st;
        }
      /* the minimiser, for holent_tfd_minimiser */
      for (size_t i = 0; i < np; i++, w->nconf++)
        {
          w->x[i] = w->reg[s]->pts[i];
          w->t[i] = w->tp[s][i];
          w->side[i] = s;
        }
      for (size_t k = 0; k < np / 2; k++)
        w->cwind[k] = 0;
      w->chorizon = res->horizon;
      w->chside = res->horizon ? s : -1;
      w->have_conf = 1;
      return HOLENT_SUCCESS;
    }
  if (b->side.circle)
    {
      w->annulus = 1;  /* its configuration is kept apart (w->cx, ...) */
      int st = annulus_entropy (w, b, res, ncross, corr, bad_side);
      w->have_conf = st == HOLENT_SUCCESS;
      return st;
    }

  /* The line: bridge order, right ascending, then left descending.  */
  size_t N = 0;
  const holent_region *R = w->reg[1], *Lr = w->reg[0];
  for (size_t i = 0; i < 2 * R->n; i++)
    put_point (w, N++, 1, i, 0.0);
  for (size_t i = 2 * Lr->n; i-- > 0;)
    put_point (w, N++, 0, i, 0.0);
  size_t n = N / 2;
  holent_geo_bg line;
  int st = set_fake (w, n, &line, b->side.c);
  if (st)
    return st;
  tfd_ctx c = { b, w->x, w->t, w->lift, w->idx, w->side, NULL };
  st = holent_rt_entropy_cost (w->rt, &line, w->fake, tfd_cost, &c, res,
                               w->pairs, NULL);
  if (st)
    return st;
  w->nconf = N;
  w->have_conf = 1;
  for (size_t k = 0; k < n; k++)
    {
      w->arcs[k] = NAN;
      w->cwind[k] = 0;
    }
  res->n_short = 0;
  for (size_t i = 0; i + 1 < N; i++)
    res->n_short += w->side[i] == w->side[i + 1]
                    && fabs (w->x[i + 1] - w->x[i]) <= 2.0 * b->side.eps;
  /* The one-sided candidates give S(A_L) + S(A_R) exactly: the mutual
     information is positive when a bridge geodesic is used.  */
  size_t nc = count_cross (w, n);
  if (ncross)
    *ncross = nc;
  corr->now = nc > 0;
  return HOLENT_SUCCESS;
}

int
holent_tfd_entropy (holent_tfd_workspace *w, const holent_tfd_bg *b,
                    const holent_tfd_side *left,
                    const holent_tfd_side *right, double dt,
                    holent_rt_result *res, size_t *ncross, int *bad_side,
                    size_t *bad_row)
{
  return tfd_entropy (w, b, left, right, dt, res, ncross, NULL, bad_side,
                      bad_row);
}

typedef struct
{
  holent_tfd_workspace *w;
  holent_tfd_bg b;
  const holent_tfd_side *left, *right;
  int mode;    /* 0: shift dt, 1: shock alpha */
  int status;
  int late;    /* I > 0 without the bridge: it never vanishes */
} mi_ctx;

/* 1 when I(A_L : A_R) > 0 at shift x (mode 0) or shock x (mode 1), from
   the same sums as the minimum: on the line exactly when a geodesic
   through the bridge is used; on a circle also when both faces of the
   hole lie in A without a horizon (then m->late is set).  */
static int
mi_positive (mi_ctx *m, double x)
{
  holent_rt_result r;
  tfd_corr corr = { 0, 0 };
  double dt = 0.0;
  if (m->mode == 0)
    dt = x;
  else
    m->b.alpha = x;
  int st = tfd_entropy (m->w, &m->b, m->left, m->right, dt, &r, NULL, &corr,
                        NULL, NULL);
  if (st && !m->status)
    m->status = st;
  m->late = corr.late;
  return corr.now;
}

static int
mi_setup (mi_ctx *m, holent_tfd_workspace *w, const holent_tfd_bg *b,
          const holent_tfd_side *left, const holent_tfd_side *right,
          int mode)
{
  if (w == NULL || b == NULL || left == NULL || right == NULL)
    return HOLENT_EINVAL;
  if (left->n == 0 || right->n == 0)
    return HOLENT_EEMPTY;
  m->w = w;
  m->b = *b;
  m->left = left;
  m->right = right;
  m->mode = mode;
  m->status = HOLENT_SUCCESS;
  m->late = 0;
  return HOLENT_SUCCESS;
}

/* First x in (lo, hi] where I vanishes, given I(lo) > 0 = I(hi).  I is
   zero on a whole half-line beyond the transition, so a sign-change root
   finder does not apply: bisection on the predicate, to 1e-14 relative. */
static int
mi_first_zero (mi_ctx *m, double lo, double hi, double *x)
{
  for (int it = 0; it < 2000 && hi - lo > 1e-14 * fmax (fabs (hi), 1e-300);
       it++)
    {
      double mid = 0.5 * (lo + hi);
      if (mid <= lo || mid >= hi)
        break;
      if (mi_positive (m, mid))
        lo = mid;
      else
        hi = mid;
      if (m->status)
        return m->status;
    }
  *x = hi;
  return HOLENT_SUCCESS;
}

int
holent_tfd_mi_zero (holent_tfd_workspace *w, const holent_tfd_bg *b,
                    const holent_tfd_side *left,
                    const holent_tfd_side *right, double tmax, double *dt)
{
  mi_ctx m;
  if (dt == NULL || isnan (tmax))
    return HOLENT_EINVAL;
  if (tmax < 0.0)
    tmax = 100.0 * b->beta;  /* the default: far past any vanishing */
  if (!(tmax > 0.0) || !isfinite (tmax))
    return HOLENT_EDOM;
  int st = mi_setup (&m, w, b, left, right, 0);
  if (st)
    return st;
  int p0 = mi_positive (&m, 0.0), p1 = mi_positive (&m, tmax);
  if (m.status)
    return m.status;
  if (!p0)
    {
      *dt = 0.0;
      return HOLENT_SUCCESS;
    }
  if (p1 || m.late)
    {
      *dt = INFINITY;
      return HOLENT_SUCCESS;
    }
  return mi_first_zero (&m, 0.0, tmax, dt);
}

int
holent_tfd_mi_zero_alpha (holent_tfd_workspace *w, const holent_tfd_bg *b,
                          const holent_tfd_side *left,
                          const holent_tfd_side *right, double *alpha)
{
  mi_ctx m;
  if (alpha == NULL)
    return HOLENT_EINVAL;
  int st = mi_setup (&m, w, b, left, right, 1);
  if (st)
    return st;
  if (!mi_positive (&m, 0.0) || m.status)
    {
      *alpha = 0.0;
      return m.status;
    }
  if (m.late)
    {
      *alpha = INFINITY;  /* no shock removes it */
      return HOLENT_SUCCESS;
    }
  /* Each bridge geodesic grows like 2 log(alpha): a bracket exists.  */
  double lo = 0.0, hi = 1.0;
  while (mi_positive (&m, hi) && !m.status)
    {
      lo = hi;
      hi *= 4.0;
      if (hi > 1e300)
        return HOLENT_ENOCONV;
    }
  if (m.status)
    return m.status;
  return mi_first_zero (&m, lo, hi, alpha);
}

int
holent_tfd_scrambling (holent_tfd_workspace *w, const holent_tfd_bg *b,
                       const holent_tfd_side *left,
                       const holent_tfd_side *right, double E, double *alpha,
                       double *t_star)
{
  if (b == NULL || alpha == NULL || t_star == NULL || isnan (E))
    return HOLENT_EINVAL;
  if (!(E >= 0.0) || !isfinite (E))
    return HOLENT_EDOM;
  int st = holent_tfd_mi_zero_alpha (w, b, left, right, alpha);
  if (st)
    return st;
  *t_star = NAN;
  if (E > 0.0 && isinf (*alpha))
    *t_star = INFINITY;
  else if (E > 0.0 && *alpha > 0.0)
    st = holent_tfd_shock_time (b->side.circle, b->side.circle ? b->side.L
                                                               : 1.0,
                                b->beta, b->side.c, E, *alpha, t_star);
  return st;
}

int
holent_tfd_minimiser (const holent_tfd_workspace *w, holent_tfd_config *conf)
{
  if (w == NULL || conf == NULL)
    return HOLENT_EINVAL;
  if (!w->have_conf)
    return HOLENT_EEMPTY;
  const int a = w->annulus;
  conf->npts = w->nconf;
  conf->x = a ? w->cx : w->x;
  conf->t = a ? w->ct : w->t;
  conf->side = a ? w->cside : w->side;
  conf->pairs = a ? w->cpairs : w->pairs;
  conf->arcs = a ? w->carcs : w->arcs;
  conf->winding = w->cwind;
  conf->horizon = w->chorizon;
  conf->horizon_side = w->chside;
  return HOLENT_SUCCESS;
}

int
holent_tfd_configuration (const holent_tfd_workspace *w, size_t *npts,
                          const double **x, const double **t,
                          const int **side, const size_t **pairs,
                          const double **arcs)
{
  holent_tfd_config c;
  if (npts == NULL || x == NULL || t == NULL || side == NULL
      || pairs == NULL || arcs == NULL)
    return HOLENT_EINVAL;
  int st = holent_tfd_minimiser (w, &c);
  if (st)
    return st;
  if (c.npts == 0)
    return HOLENT_EEMPTY;
  *npts = c.npts;
  *x = c.x;
  *t = c.t;
  *side = c.side;
  *pairs = c.pairs;
  *arcs = c.arcs;
  return HOLENT_SUCCESS;
}
