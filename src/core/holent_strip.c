/* holent_strip.c: RT strips in planar AdS_{d+1}.  See holent_strip.h and
 * doc/higher_dimensional.md.  SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_integration.h>
#include <gsl/gsl_sf_gamma.h>
#include "holent_strip.h"
#include "holent_hd_size.h"

#define QAG_LIMIT 1000
#define QAG_EPSREL 1e-12
#define QAG_EPSABS 1e-15

struct holent_strip_workspace
{
  gsl_integration_workspace *iw;
  holent_hd_size_workspace *size;
  const holent_poll *poll;  /* the caller's, or NULL */
};

void
holent_strip_workspace_set_poll (holent_strip_workspace *w,
                                 const holent_poll *poll)
{
  if (w)
    w->poll = poll;
}

double
holent_strip_uv (int d, double z)
{
  /* d = 2: the limit d -> 2 of (z^(2-d) - 1)/(d - 2) */
  return d == 2 ? -log (z) : pow (z, 2 - d) / (d - 2);
}

double
holent_strip_divergence (const holent_hd_bg *bg, double Lperp)
{
  int d = bg->d;
  return 2 * pow (bg->ell, d - 1) * pow (Lperp, d - 2)
         * holent_strip_uv (d, bg->eps) / (4 * bg->G);
}

holent_strip_workspace *
holent_strip_workspace_alloc (void)
{
  holent_strip_workspace *w = calloc (1, sizeof *w);
  if (w == NULL)
    return NULL;
  w->iw = gsl_integration_workspace_alloc (QAG_LIMIT);
  w->size = holent_hd_size_workspace_alloc ();
  if (!w->iw || !w->size)
    {
      holent_strip_workspace_free (w);
      return NULL;
    }
  return w;
}

void
holent_strip_workspace_free (holent_strip_workspace *w)
{
  if (w == NULL)
    return;
  if (w->iw)
    gsl_integration_workspace_free (w->iw);
  holent_hd_size_workspace_free (w->size);
  free (w);
}

double
holent_strip_ratio (int d)
{
  double a = 1.0 / (2.0 * (d - 1));
  return 2 * sqrt (M_PI) * gsl_sf_gamma (d * a) / gsl_sf_gamma (a);
}

double
holent_strip_vacuum_j (int d)
{
  double a = 1.0 / (2.0 * (d - 1));
  if (d == 2)  /* int_0^1 (1/sqrt(1 - u^2) - 1) du/u */
    return M_LN2;
  return sqrt (M_PI) * gsl_sf_gamma ((2.0 - d) * a)
         / (2.0 * (d - 1) * gsl_sf_gamma (a));
}

double
holent_strip_vacuum_fin (int d, double zs)
{
  /* d = 2: J is scale-free and the log of the cutoff leaves log(zs) */
  double jv = holent_strip_vacuum_j (d);
  return d == 2 ? jv + log (zs) : jv * pow (zs, 2 - d);
}


/* ------------------------------------------------------------------ */
/* Strips                                                              */

typedef struct
{
  const holent_hd_bg *bg;
  double zs, w, a, sa;
  double ftip;  /* f at the turning point */
  int pw;
  int excess;  /* weigh by 1 - sqrt(f): the integrand minus the vacuum's */
} spar;

/* The turning-point end in the variable v = 1 - u = a sinh^2(tau): the
   1/sqrt(v (v + a)) behaviour of 1/sqrt(f(z* u) (1 - u^(2d-2))) becomes
   a smooth integrand in tau (a ~ f(z*)/(|f'(z*)| z*) tracks the horizon).  */
static double
tau_integrand (double tau, void *p)
{
  const spar *q = p;
  const holent_hd_bg *bg = q->bg;
  double em = expm1 (tau), e = em + 1;
  double sh = em * (em + 2) / (2 * e), ch = 0.5 * (e + 1 / e);
  double v = q->a * sh * sh;
  if (v > 1)
    v = 1;
  double u = 1 - v, qv = 1;
  for (int k = 1; k <= 2 * bg->d - 3; k++)   /* (1 - u^(2d-2))/(1 - u) */
    qv = 1 + u * qv;
  double f = holent_hd_bg_fval (bg, q->zs * u, q->w + q->zs * v);
  if (!(f > 0))
    return NAN;
  double r = 2 * q->sa * ch / sqrt (f * qv) * gsl_pow_int (u, q->pw);
  if (q->excess)  /* 1/sqrt(f) - 1 = (1 - f)/(sqrt f (1 + sqrt f)) */
    r *= holent_hd_bg_omf (bg, q->zs * u) / (1 + sqrt (f));
  return r;
}

/* u^(1-d) (1/sqrt(f) - 1)/sqrt(1 - u^(2d-2)) on [0, 1/2]: the excess of the
   area integrand over the vacuum's at the same z*.  */
static double
u_excess (double u, void *p)
{
  const spar *q = p;
  const holent_hd_bg *bg = q->bg;
  int d = bg->d;
  double z = q->zs * u, f = 1 - holent_hd_bg_omf (bg, z), sf = sqrt (f);
  double up = gsl_pow_int (u, d - 1);
  if (!(f > 0))
    return NAN;
  return gsl_pow_int (q->zs, d) * u * holent_hd_bg_mcoef (bg, z)
         / (sqrt (1 - up * up) * sf * (1 + sf));
}

/* u^(1-d) (1/sqrt(f (1 - u^(2d-2))) - 1) with no cancellation near u = 0.  */
static double
u_integrand (double u, void *p)
{
  const spar *q = p;
  const holent_hd_bg *bg = q->bg;
  int d = bg->d;
  double z = q->zs * u;
  double om = holent_hd_bg_omf (bg, z), f = 1 - om, up = gsl_pow_int (u, d - 1);
  double qq = f * (1 - up * up), sq = sqrt (qq);
  if (!(qq > 0))
    return NAN;
  double num = gsl_pow_int (q->zs, d) * u * holent_hd_bg_mcoef (bg, z) + f * up;
  return num / (sq * (1 + sq));
}

static int
qag (holent_strip_workspace *w, double (*fn) (double, void *), spar *p,
     double a, double b, double *out)
{
  gsl_function F = { fn, p };
  double err;
  if (!(b > a))
    {
      *out = 0;
      return HOLENT_SUCCESS;
    }
  /* A tabulated f is a spline through data of accuracy noise: asking
     more of the quadrature than the data holds only costs subdivisions
     on the spline's knots (and fails on noisy data).  */
  double rel = fmax (QAG_EPSREL, p->bg->noise);
  int st = gsl_integration_qag (&F, a, b, QAG_EPSABS, rel, QAG_LIMIT,
                                GSL_INTEG_GAUSS21, w->iw, out, &err);
  /* Roundoff in f (tabulated, next to a horizon) can stop QAG short of
     its goal (roundoff detected, or the subdivision limit reached);
     accept what it reached if its error estimate is still within 1e-9,
     or within 100 times the data's relative accuracy where f is least:
     noise sigma in f is sigma/f(z*) relative at the tip, where the
     integrand ~ f^(-1/2) peaks (a tip near a noisy double zero).  Only
     for f(z*) >= 1e-3: closer to a horizon a failure ends the table of
     sizes instead (holent_hd_size.c), as it always did.  */
  double ft = p->ftip;
  double acc = 100 * p->bg->noise / (ft >= 1e-3 ? fmin (1.0, ft) : 1.0);
  if ((st == GSL_EROUND || st == GSL_EMAXITER)
      && err <= fmax (1e-9, acc) * fabs (*out) + QAG_EPSABS)
    st = GSL_SUCCESS;
  if (st || !isfinite (*out))
    return HOLENT_ENOCONV;
  return HOLENT_SUCCESS;
}

static int
strip_setup (const holent_hd_bg *bg, double zs, double w, spar *p)
{
  double f, fp;
  p->bg = bg;
  p->zs = zs;
  p->w = w;
  p->excess = 0;
  if (zs > bg->zmax)
    return HOLENT_EDOM;
  if (holent_hd_bg_f (bg, zs, &f, &fp))
    return HOLENT_EDOM;
  f = holent_hd_bg_fval (bg, zs, w);
  if (!(f > 0))
    return HOLENT_EDOM;
  p->ftip = f;
  p->a = 1;
  if (fp < 0)
    p->a = fmin (1.0, f / (-fp * zs));
  p->sa = sqrt (p->a);
  return HOLENT_SUCCESS;
}

/* Width l of the strip turning at zs (w = Z - zs).  */
static int
strip_width (const holent_hd_bg *bg, holent_strip_workspace *ws, double zs,
             double w, double *l)
{
  spar p;
  double K;
  int st = strip_setup (bg, zs, w, &p);
  if (st)
    return st;
  p.pw = bg->d - 1;
  st = qag (ws, tau_integrand, &p, 0, asinh (sqrt (1 / p.a)), &K);
  *l = 2 * zs * K;
  return st;
}

/* Area integrals J (finite: eps -> 0; cut: at the cutoff) with
   A = 2 ell^(d-1) Lperp^(d-2) zs^(2-d) J, written as the vacuum's J plus
   the excess dJ of the integrand at the same z* (no cancellation), and
   *ddel = zs^(d-2) (A_fin - A_fin,vac(same width)) / (2 ell^(d-1) Lperp^(d-2)),
   using the width's excess dK: l = 2 zs (K_vac + dK).  */
static int
strip_area (const holent_hd_bg *bg, holent_strip_workspace *ws, double zs,
            double w, double *jfin, double *jcut, double *ddel)
{
  spar p;
  int d = bg->d, st = strip_setup (bg, zs, w, &p);
  double jt, ju, i0 = 0, dK = 0, del = bg->eps / zs;
  double jv = holent_strip_vacuum_j (d), kv = 0.5 * holent_strip_ratio (d);
  if (st)
    return st;
  p.excess = 1;
  p.pw = 1 - d;
  if ((st = qag (ws, tau_integrand, &p, 0, asinh (sqrt (0.5 / p.a)), &jt)))
    return st;
  if ((st = qag (ws, u_excess, &p, 0, 0.5, &ju)))
    return st;
  p.pw = d - 1;
  if ((st = qag (ws, tau_integrand, &p, 0, asinh (sqrt (1 / p.a)), &dK)))
    return st;
  p.excess = 0;
  double dJ = jt + ju;
  *jfin = jv + dJ;
  /* d = 2: the vacuum of the same width has log(l) = log(2 zs) +
     log1p(dK/kv) in place of the power */
  *ddel = d == 2 ? dJ - log1p (dK / kv)
                 : dJ - jv * expm1 ((2 - d) * log1p (dK / kv));
  if (del < 0.5)
    {
      if ((st = qag (ws, u_integrand, &p, 0, del, &i0)))
        return st;
      *jcut = *jfin + holent_strip_uv (d, del) - i0;
    }
  else if (del < 1)
    {
      p.pw = 1 - d;
      st = qag (ws, tau_integrand, &p, 0, asinh (sqrt ((1 - del) / p.a)),
                jcut);
    }
  else
    *jcut = 0;
  return st;
}

typedef struct
{
  const holent_hd_bg *bg;
  holent_strip_workspace *ws;
} sctx;

static int
strip_size (void *ctx, double zs, double w, double *l)
{
  const sctx *c = ctx;
  return strip_width (c->bg, c->ws, zs, w, l);
}

static int
strip_eval (void *ctx, double zs, double w, double *fin, double *cut,
            double *extra)
{
  const sctx *c = ctx;
  int st = strip_area (c->bg, c->ws, zs, w, fin, cut, extra);
  if (st)
    return st;
  /* per unit 2 ell^(d-1) Lperp^(d-2)/(4G) */
  int d = c->bg->d;
  double sc = pow (zs, 2 - d);
  /* the cutoff's divergence holent_strip_uv (eps) taken off: in d = 2
     uv(eps/zs) = uv(eps) + log(zs) leaves log(zs) */
  *fin = *fin * sc + (d == 2 ? log (zs) : 0);
  *cut *= sc;
  *extra *= sc;
  return HOLENT_SUCCESS;
}

int
holent_strip_entropy (const holent_hd_bg *bg, holent_strip_workspace *ws,
                      double Lperp, size_t n, const double *l, double *S,
                      double *fin, double *delta, double *zstar, size_t *bad,
                      double *reach)
{
  double lmin, lmax, rch = INFINITY;
  int st;
  sctx ctx = { bg, ws };
  holent_hd_size_problem pb = { strip_size, strip_eval, &ctx, 0, 0 };
  if (bg == NULL || ws == NULL || (n > 0 && (l == NULL || S == NULL))
      || isnan (Lperp))
    return HOLENT_EINVAL;
  if (!(Lperp > 0) || !isfinite (Lperp))
    return HOLENT_EDOM;
  if ((st = holent_hd_size_check (n, l, bad, &lmin, &lmax)))
    return st;
  if (n == 0)
    return HOLENT_SUCCESS;
  int d = bg->d;
  double ratio = holent_strip_ratio (d);
  double pref = 2 * pow (bg->ell, d - 1) * pow (Lperp, d - 2) / (4 * bg->G);
  if (bg->kind != HOLENT_HD_VACUUM)
    {
      pb.fine = bg->kind == HOLENT_HD_TABULATED;
      st = holent_hd_size_table (bg, ws->size, &pb, lmin, lmax, ratio,
                                 bg->wmin, &rch);
      if (st)
        return st;
    }
  if (reach)
    *reach = rch;
  for (size_t i = 0; i < n; i++)
    {
      double jf, jc, zs, extra;
      if (ws->poll && ws->poll->fn
          && ws->poll->fn (ws->poll->ctx, (double) i, (double) n))
        return HOLENT_EINTR;
      if (l[i] > rch)
        {
          if (bad)
            *bad = i;
          return HOLENT_EDOM;
        }
      if (bg->kind == HOLENT_HD_VACUUM)
        {
          zs = l[i] / ratio;
          if ((st = strip_area (bg, ws, zs, 0, &jf, &jc, &extra)))
            return st;
          jf = holent_strip_vacuum_fin (d, zs);
          jc *= pow (zs, 2 - d);
          extra = 0;
        }
      else if ((st = holent_hd_size_solve (bg, ws->size, &pb, l[i], &jf, &jc,
                                           &extra, &zs)))
        {
          if (bad)
            *bad = i;
          return st;
        }
      S[i] = pref * jc;
      if (!isfinite (S[i]) || !isfinite (pref * jf)
          || !isfinite (pref * extra))
        {
          if (bad)
            *bad = i;
          return HOLENT_ERANGE;  /* a tiny width or cutoff: too large */
        }
      if (fin)
        fin[i] = pref * jf;
      if (delta)
        delta[i] = pref * extra;
      if (zstar)
        zstar[i] = zs;
    }
  return HOLENT_SUCCESS;
}


typedef struct
{
  holent_strip_workspace *ws;
  double Lperp;
} actx;

static int
strip_fin (const holent_hd_bg *bg, void *ctx, size_t n, const double *l,
           double *S, double *fin)
{
  const actx *c = ctx;
  return holent_strip_entropy (bg, c->ws, c->Lperp, n, l, S, fin, NULL, NULL,
                               NULL, NULL);
}

int
holent_strip_accuracy (const holent_hd_bg *bg, holent_strip_workspace *ws,
                       double Lperp, size_t n, const double *l,
                       const double *fin, double *acc)
{
  actx c = { ws, Lperp };
  if (ws == NULL)
    return HOLENT_EINVAL;
  return holent_hd_size_accuracy (bg, strip_fin, &c, n, l, fin, acc);
}
