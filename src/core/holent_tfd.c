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

int
holent_tfd_cross_length (const holent_tfd_bg *b, double xL, double tL,
                         double xR, double tR, double *len)
{
  if (b == NULL || len == NULL)
    return HOLENT_EINVAL;
  if (!isfinite (xL) || !isfinite (tL) || !isfinite (xR) || !isfinite (tR)
      || !isfinite (xR - xL) || !isfinite (tL + tR))
    return HOLENT_EINVAL;
  double dx = xR - xL, k = M_PI / b->beta, T = tL + tR;
  if (b->side.circle)
    {
      /* Shortest winding: the length grows with |dx|.  */
      dx = remainder (dx, b->side.L);
    }
  /* log of sqrt(cosh cosh), then add the shock term in log space.  */
  double g = 0.5 * (lncosh (k * (T + dx)) + lncosh (k * (T - dx)));
  if (b->alpha > 0.0)
    {
      double h = log (0.5 * b->alpha) + k * (tL - tR);
      g = g > h ? g + log1p (exp (h - g)) : h + log1p (exp (g - h));
    }
  *len = b->side.pref + 2.0 * g;
  return isfinite (*len) ? HOLENT_SUCCESS : HOLENT_EDOM;
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
  int *side;
  double *fa, *fb;     /* rows of the stand-in region              */
  size_t *pairs;
  double *arcs;        /* one-sided: the arcs of the minimiser      */
  size_t nconf;        /* endpoints of the last minimiser (0: none) */
};

int
holent_tfd_workspace_set_poll (holent_tfd_workspace *w,
                               const holent_poll *poll)
{
  if (w == NULL)
    return HOLENT_EINVAL;
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
  w->side = malloc (N * sizeof (int));
  w->fa = malloc (nmax * sizeof (double));
  w->fb = malloc (nmax * sizeof (double));
  w->pairs = malloc (N * sizeof (size_t));
  w->arcs = malloc (nmax * sizeof (double));
  if (!w->arcs || !w->rt || !w->reg[0] || !w->reg[1] || !w->fake || !w->tp[0]
      || !w->tp[1] || !w->x || !w->t || !w->side || !w->fa || !w->fb
      || !w->pairs)
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
  free (w->side);
  free (w->fa);
  free (w->fb);
  free (w->pairs);
  free (w->arcs);
  free (w);
}

typedef struct
{
  const holent_tfd_bg *b;
  const double *x, *t;
  const int *side;
} tfd_ctx;

/* Lengths for the minimiser: within a side, or through the bridge.  */
static int
tfd_cost (void *vctx, size_t i, size_t j, double arc, double *len)
{
  const tfd_ctx *c = vctx;
  (void) arc;
  if (c->side[i] == c->side[j])
    return holent_tfd_side_length (c->b, c->x[i], c->t[i], c->x[j],
                                   c->t[j], HOLENT_GEO_SHORTER, len);
  size_t l = c->side[i] == 0 ? i : j, r = c->side[i] == 0 ? j : i;
  return holent_tfd_cross_length (c->b, c->x[l], c->t[l], c->x[r], c->t[r],
                                  len);
}

/* Normalise one side into w->reg[s] and w->tp[s].  */
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
  st = holent_hrt_region_times (r, in->n, in->ta, in->tb, w->tp[s], &bad);
  if (st)
    {
      *bad_row = bad;
      return st;
    }
  for (size_t i = 0; i < 2 * r->n; i++)
    w->tp[s][i] += dt;
  return HOLENT_SUCCESS;
}

int
holent_tfd_entropy (holent_tfd_workspace *w, const holent_tfd_bg *b,
                    const holent_tfd_side *left,
                    const holent_tfd_side *right, double dt,
                    holent_rt_result *res, size_t *ncross, int *bad_side,
                    size_t *bad_row)
{
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
  if (left->n == 0 || right->n == 0)
    {
      /* One side: the one-sided BTZ problem (times do not matter to the
         static exterior beyond their differences).  */
      int s = left->n == 0;
      size_t bi, bj, np = 2 * w->reg[s]->n;
      int st = holent_hrt_entropy (w->rt, &b->side, w->reg[s], w->tp[s],
                                   res, w->pairs, w->arcs, &bi, &bj);
      if (st)
        *bad_side = s;
      else   /* the minimiser, for holent_tfd_configuration */
        for (size_t i = 0; i < np; i++, w->nconf++)
          {
            w->x[i] = w->reg[s]->pts[i];
            w->t[i] = w->tp[s][i];
            w->side[i] = s;
          }
      return st;
    }
  if (b->side.circle)
    return HOLENT_EUNSUP;

  /* Bridge order: right ascending, then left descending.  */
  size_t N = 0;
  const holent_region *R = w->reg[1], *Lr = w->reg[0];
  for (size_t i = 0; i < 2 * R->n; i++, N++)
    {
      w->x[N] = R->pts[i];
      w->t[N] = w->tp[1][i];
      w->side[N] = 1;
    }
  for (size_t i = 2 * Lr->n; i-- > 0; N++)
    {
      w->x[N] = Lr->pts[i];
      w->t[N] = w->tp[0][i];
      w->side[N] = 0;
    }
  /* Each side must be achronal.  */
  for (size_t i = 0; i < N; i++)
    for (size_t j = i + 1; j < N && w->side[j] == w->side[i]; j++)
      if (!holent_hrt_spacelike (&b->side, w->x[i], w->t[i], w->x[j],
                                 w->t[j]))
        {
          *bad_side = w->side[i];
          return HOLENT_ETIMELIKE;
        }
  /* A stand-in region on a line with the same number of endpoints, so
     the minimiser runs its linear case over our order.  */
  size_t n = N / 2;
  for (size_t k = 0; k < n; k++)
    {
      w->fa[k] = 2.0 * k;
      w->fb[k] = 2.0 * k + 1.0;
    }
  int st = holent_region_set (w->fake, 0, 0.0, n, w->fa, w->fb);
  if (st)
    return st;
  holent_geo_bg line;
  st = holent_geo_bg_init (&line, HOLENT_BULK_POINCARE, 0.0, 1e-3, 0, 0, 1,
                           b->side.c);
  if (st)
    return st;
  tfd_ctx c = { b, w->x, w->t, w->side };
  st = holent_rt_entropy_cost (w->rt, &line, w->fake, tfd_cost, &c, res,
                               w->pairs, NULL);
  if (st)
    return st;
  w->nconf = N;
  for (size_t k = 0; k < n; k++)
    w->arcs[k] = NAN;
  res->n_short = 0;
  for (size_t i = 0; i + 1 < N; i++)
    res->n_short += w->side[i] == w->side[i + 1]
                    && fabs (w->x[i + 1] - w->x[i]) <= 2.0 * b->side.eps;
  if (ncross)
    for (size_t k = 0; k < n; k++)
      *ncross += w->side[w->pairs[2 * k]] != w->side[w->pairs[2 * k + 1]];
  return HOLENT_SUCCESS;
}

typedef struct
{
  holent_tfd_workspace *w;
  holent_tfd_bg b;
  const holent_tfd_side *left, *right;
  int mode;    /* 0: shift dt, 1: shock alpha */
  int status;
} mi_ctx;

/* 1 when I(A_L : A_R) > 0 at shift x (mode 0) or shock x (mode 1), i.e.
   when the minimiser uses a geodesic through the bridge; the one-sided
   candidates give S(A_L) + S(A_R) exactly.  */
static int
mi_positive (mi_ctx *m, double x)
{
  holent_rt_result r;
  size_t nc = 0;
  double dt = 0.0;
  if (m->mode == 0)
    dt = x;
  else
    m->b.alpha = x;
  int st = holent_tfd_entropy (m->w, &m->b, m->left, m->right, dt, &r, &nc,
                               NULL, NULL);
  if (st && !m->status)
    m->status = st;
  return nc > 0;
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
  if (p1)
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
  if (E > 0.0 && *alpha > 0.0)
    st = holent_tfd_shock_time (b->side.circle, b->side.circle ? b->side.L
                                                               : 1.0,
                                b->beta, b->side.c, E, *alpha, t_star);
  return st;
}

int
holent_tfd_configuration (const holent_tfd_workspace *w, size_t *npts,
                          const double **x, const double **t,
                          const int **side, const size_t **pairs,
                          const double **arcs)
{
  if (w == NULL || npts == NULL || x == NULL || t == NULL || side == NULL
      || pairs == NULL || arcs == NULL)
    return HOLENT_EINVAL;
  if (w->nconf == 0)
    return HOLENT_EEMPTY;
  *npts = w->nconf;
  *x = w->x;
  *t = w->t;
  *side = w->side;
  *pairs = w->pairs;
  *arcs = w->arcs;
  return HOLENT_SUCCESS;
}
